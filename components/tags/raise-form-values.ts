import type { EnergySource } from '@/shared/rules/register';
import { expiryProblem, type IsolationMethod, type TagKind } from '@/shared/rules/tags';
import type { Role } from '@/shared/rules/roles';
import { raiseTagSchema, type RaiseTagInput } from '@/shared/schemas/tags';
import { validateWith, type FieldErrors } from '@/components/tags/validate-with';

export interface PointDraft {
  key: string;
  /** A plant item of the same site used as the point, or null for a described point. */
  asset: { id: number; plantId: string; name: string } | null;
  description: string;
  method: IsolationMethod | '';
}

export interface RaiseValues {
  kind: TagKind;
  reason: string;
  energySources: EnergySource[];
  points: PointDraft[];
  lockNumber: string;
  normalState: string;
  leftState: string;
  expiresAt: string;
  contactPhone: string;
}

let pointSeq = 0;
export const newPoint = (asset: PointDraft['asset'] = null): PointDraft => ({ key: `p${++pointSeq}`, asset, description: '', method: '' });

export function initialRaiseValues(kind: TagKind, expiresAt: Date, energySources: EnergySource[]): RaiseValues {
  return {
    kind,
    reason: '',
    // An item with a single energy source: that is the one being isolated.
    energySources: energySources.length === 1 ? [...energySources] : [],
    points: [newPoint()],
    lockNumber: '',
    normalState: '',
    leftState: '',
    expiresAt: expiresAt.toISOString(),
    contactPhone: '',
  };
}

/** The request body: only the fields of the chosen kind. */
export function toRaiseInput(v: RaiseValues): RaiseTagInput {
  const isolation = v.kind === 'isolation';
  return {
    kind: v.kind,
    reason: v.reason.trim(),
    expiresAt: v.expiresAt as unknown as Date,
    contactPhone: v.contactPhone.trim(),
    lockNumber: v.lockNumber.trim(),
    energySources: isolation ? v.energySources : [],
    points: isolation ? v.points.map((p) => ({ assetId: p.asset?.id ?? null, description: p.description.trim(), method: (p.method || undefined) as IsolationMethod })) : [],
    normalState: isolation ? '' : v.normalState.trim(),
    leftState: isolation ? '' : v.leftState.trim(),
  };
}

/** The shared schema, plus the expiry limits the server applies with its own clock. */
export async function validateRaise(v: RaiseValues, role: Role): Promise<FieldErrors> {
  const errors = await validateWith(raiseTagSchema, toRaiseInput(v));
  if (!errors.expiresAt) {
    const problem = expiryProblem(new Date(v.expiresAt), new Date(), role);
    if (problem) errors.expiresAt = problem;
  }
  return errors;
}

export const RAISE_STEPS = ['What and why', 'Details', 'Expiry and contact', 'Review and raise'] as const;

/** Which step a field (as the server or schema names it) is entered on. */
export function stepOf(path: string): number {
  if (path === 'kind' || path === 'reason') return 0;
  if (path === 'expiresAt' || path === 'contactPhone') return 2;
  if (/^(energySources|points|lockNumber|normalState|leftState)/.test(path)) return 1;
  return 3;
}

export const firstStepWithError = (errors: FieldErrors) => Math.min(3, ...Object.keys(errors).map(stepOf));
