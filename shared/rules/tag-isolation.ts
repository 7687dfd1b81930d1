import type { EnergySource } from '@/shared/rules/register';

/**
 * How an isolation was proved before work started (OSHA 29 CFR 1910.147(d)(6): verify isolation and
 * de-energisation; HSE HSG253 (The safe isolation of plant and equipment) also asks that the isolation be proved).
 */
export const PROOF_METHODS = ['absence-of-voltage', 'pressure-at-zero', 'vented-drained', 'try-start', 'other'] as const;
export type ProofMethod = (typeof PROOF_METHODS)[number];

export const PROOF_METHOD_LABELS: Record<ProofMethod, string> = {
  'absence-of-voltage': 'Absence of voltage tested',
  'pressure-at-zero': 'Pressure at zero on a named gauge',
  'vented-drained': 'Vented or drained, nothing at the vent',
  'try-start': 'Try-start: operating controls tried, nothing moved',
  other: 'Other (described)',
};

/** Methods that only mean something with the instrument or gauge named. */
export const PROOF_NEEDS_INSTRUMENT: readonly ProofMethod[] = ['absence-of-voltage', 'pressure-at-zero'];

/** A source left out of an isolation must say why, in at least this many characters. */
export const MIN_OMISSION_REASON = 10;

export interface OmittedSource {
  source: EnergySource;
  reason: string;
}

/**
 * The item's energy sources that the isolation neither isolates nor names as left out with a reason
 * (OSHA 29 CFR 1910.147(d)(3)–(d)(4): every energy isolating device needed to control the energy is operated
 * and locked). An empty list means every source is accounted for.
 */
export function sourcesNotAccounted(itemSources: readonly EnergySource[], isolated: readonly EnergySource[], omitted: readonly OmittedSource[]): EnergySource[] {
  const named = new Set<EnergySource>([...isolated, ...omitted.filter((o) => o.reason.trim().length >= MIN_OMISSION_REASON).map((o) => o.source)]);
  return itemSources.filter((s) => !named.has(s));
}
