import { newPoint, type RaiseValues } from '@/components/tags/raise-form-values';
import type { IsolationPlan } from '@/shared/types/connections';

/**
 * A raise form filled from an isolation plan: the planned sources ticked and one point per planned isolating item
 * with its method, nearest first. Every field stays editable; a gap in the plan adds nothing, so the engineer
 * records how that path is isolated on site.
 */
export function withPlan(values: RaiseValues, plan: IsolationPlan | undefined): RaiseValues {
  if (!plan || values.kind !== 'isolation') return values;
  const seen = new Set<number>();
  const points = plan.sources.flatMap((s) => s.points).filter((p) => !seen.has(p.item.id) && seen.add(p.item.id))
    .map((p) => ({ ...newPoint({ id: p.item.id, plantId: p.item.plantId, name: p.item.name }), method: p.method }));
  return {
    ...values,
    energySources: plan.sources.map((s) => s.source),
    points: points.length ? points : values.points,
  };
}
