import type { GraphItem, GraphLink } from '@/server/lib/isolation/plant-graph';
import type { Medium } from '@/shared/rules/connections';
import type { AssetType } from '@/shared/rules/register';

const ATTRS: Partial<Record<string, Record<string, unknown>>> = {
  valve: { isolation: 'manual' },
  'control-valve': { isolation: 'none' },
};

/**
 * A hand-drawn plant: items as "PLANT-ID:type" (type "control-valve" = a valve that does not isolate) and links
 * as "A>B:medium". Ids are given in order from 1.
 */
export function plant(itemSpecs: string[], linkSpecs: string[]) {
  const items: GraphItem[] = itemSpecs.map((spec, i) => {
    const [plantId, kind] = spec.split(':');
    const type = (kind === 'control-valve' ? 'valve' : kind) as AssetType;
    return { id: i + 1, plantId, name: plantId, type, plantRoomId: 1, energySources: [], attributes: ATTRS[kind] ?? {} };
  });
  const id = (plantId: string) => {
    const item = items.find((i) => i.plantId === plantId);
    if (!item) throw new Error(`no item ${plantId} in the drawing`);
    return item.id;
  };
  const links: GraphLink[] = linkSpecs.map((spec) => {
    const [ends, medium] = spec.split(':');
    const [a, b] = ends.split('>');
    return { fromId: id(a), toId: id(b), medium: medium as Medium };
  });
  const names = (ids: (string | number)[]) => ids.map((k) => items.find((i) => i.id === Number(k))?.plantId ?? String(k)).sort();
  return { items, links, id, names };
}
