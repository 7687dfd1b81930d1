import { validateWithSchema } from '@/components/forms/submit';
import type { EnergySource } from '@/shared/rules/register';
import type { IsolationMethod, TagKind } from '@/shared/rules/tags';
import type { ProofMethod } from '@/shared/rules/tag-isolation';
import type { Role } from '@/shared/rules/roles';
import { raiseTagSchema, type RaiseTagInput } from '@/shared/schemas/tags';

export interface PointDraft {
  key: string;
  /** A plant item of the same site used as the point, or null for a described point. */
  asset: { id: number; plantId: string; name: string } | null;
  description: string;
  method: IsolationMethod | '';
  /** This point's own lock or tag number, when it differs from the tag's (a lock box, a hasp). */
  lockNumber: string;
}

/** How the isolation was proved, if it has been by the time of raising ('' = not yet: the tag shows "not proved"). */
export interface ProofDraft {
  method: ProofMethod | '';
  instrument: string;
  reading: string;
  note: string;
}
export const noProof = (): ProofDraft => ({ method: '', instrument: '', reading: '', note: '' });

/** The proof as the API takes it (no method yet: left for the schema to ask for). */
export const proofInput = (p: ProofDraft) => ({ method: p.method || undefined, instrument: p.instrument.trim(), reading: p.reading.trim(), note: p.note.trim() });

export interface RaiseValues {
  kind: TagKind;
  reason: string;
  energySources: EnergySource[];
  /** Why each of the item's sources that is not isolated needs no isolation. */
  omitted: Partial<Record<EnergySource, string>>;
  points: PointDraft[];
  proof: ProofDraft;
  lockNumber: string;
  normalState: string;
  leftState: string;
  expiresAt: string;
  contactPhone: string;
}

let pointSeq = 0;
export const newPoint = (asset: PointDraft['asset'] = null): PointDraft => ({ key: `p${++pointSeq}`, asset, description: '', method: '', lockNumber: '' });

export function initialRaiseValues(kind: TagKind, expiresAt: Date, energySources: EnergySource[]): RaiseValues {
  return {
    kind,
    reason: '',
    // An item with a single energy source: that is the one being isolated.
    energySources: energySources.length === 1 ? [...energySources] : [],
    omitted: {},
    points: [newPoint()],
    proof: noProof(),
    lockNumber: '',
    normalState: '',
    leftState: '',
    expiresAt: expiresAt.toISOString(),
    contactPhone: '',
  };
}

/** The request body: only the fields of the chosen kind; a reason is sent only for sources not isolated. */
export function toRaiseInput(v: RaiseValues): RaiseTagInput {
  const isolation = v.kind === 'isolation';
  const omittedSources = (Object.entries(v.omitted) as [EnergySource, string][])
    .filter(([source, reason]) => !v.energySources.includes(source) && reason.trim())
    .map(([source, reason]) => ({ source, reason: reason.trim() }));
  const proof = isolation && v.proof.method ? (proofInput(v.proof) as RaiseTagInput['proof']) : null;
  return {
    kind: v.kind,
    reason: v.reason.trim(),
    expiresAt: v.expiresAt as unknown as Date,
    contactPhone: v.contactPhone.trim(),
    lockNumber: v.lockNumber.trim(),
    energySources: isolation ? v.energySources : [],
    omittedSources: isolation ? omittedSources : [],
    proof,
    points: isolation ? v.points.map((p) => ({ assetId: p.asset?.id ?? null, description: p.description.trim(), method: (p.method || undefined) as IsolationMethod, lockNumber: p.lockNumber.trim() })) : [],
    normalState: isolation ? '' : v.normalState.trim(),
    leftState: isolation ? '' : v.leftState.trim(),
  };
}

/** The shared schema on the request body, with the actor's role and the time (expiry limits) and the item's energy sources. */
export const validateRaise = (role: Role, itemSources: readonly EnergySource[]) =>
  validateWithSchema<RaiseValues>(raiseTagSchema, toRaiseInput, () => ({ role, now: new Date(), itemSources }));

export const RAISE_STEPS = ['What and why', 'Details', 'Expiry and contact', 'Review and raise'] as const;

/** Which step a field (as the server or schema names it) is entered on. */
export function stepOf(path: string): number {
  if (path === 'kind' || path === 'reason') return 0;
  if (path === 'expiresAt' || path === 'contactPhone') return 2;
  if (/^(energySources|omittedSources|points|lockNumber|normalState|leftState|proof)/.test(path)) return 1;
  return 3;
}

/** The first step holding any of these errors (flat or nested: their top-level names decide). */
export const firstStepWithError = (errors: object) => Math.min(3, ...Object.keys(errors).map(stepOf));
