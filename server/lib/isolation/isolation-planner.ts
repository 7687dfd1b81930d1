import { KIND_METHOD, MEDIUM_SOURCE, STORED_ENERGY_TYPES, SUPPLY_ISOLATION_HINT, type IsolatingKind } from '@/shared/rules/connections';
import { ENERGY_SOURCE_LABELS, type EnergySource } from '@/shared/rules/register';
import { buildSourceGraph, isStandIn, key, reachable, starvedBy, type GraphItem, type GraphLink, type SourceGraph } from '@/server/lib/isolation/plant-graph';

/*
 * The isolation planner: a nearest-isolator search, then one pruning pass.
 *
 * 1. Walk back from the item along the links that can bring this energy to it (graphology BFS), entering an
 *    isolating item but never walking past it. The isolating items met are the candidates: for every path from a
 *    supply, the isolating item nearest the item on that path is met, so closing all candidates cuts every path.
 *    A supply met without passing any isolating item is a gap: no isolation point on that path.
 * 2. Pruning, farthest candidate first: leave a candidate out when the others still cut every supply that can be
 *    cut (no path opens from a supply that is not a gap). One pass is enough: if a point could be left out of a
 *    smaller set it could be left out of every larger one, so nothing kept can be dropped afterwards. What remains
 *    is minimal (remove any one point and a path reopens) and, since candidates are the nearest isolating items
 *    and far ones are tried first, it keeps the points nearest the item.
 */

/** Pipework and isolating items lose supply too, but only items that use the energy are listed as affected. */
const PASSIVE = new Set(['pipework', 'valve', 'isolator']);
const users = (g: SourceGraph, keys: string[]) => keys.filter((k) => !isStandIn(k) && !PASSIVE.has(g.items.get(k)?.type ?? ''));

export interface PlannedPoint { key: string; kind: IsolatingKind; distance: number; affects: string[] }
export interface PlannedGap { supply: string; path: string[] }
export interface PlannedSource {
  source: EnergySource;
  points: PlannedPoint[];
  gaps: PlannedGap[];
  storedEnergy: string[];
  section: Set<string>;
  /** No link of this source reaches the item. */
  unrecorded: boolean;
}

function holdsStoredEnergy(item: GraphItem, source: EnergySource): boolean {
  if (source === 'hot-water' || source === 'stored-pressure') {
    return STORED_ENERGY_TYPES.has(item.type) || item.energySources.includes('stored-pressure') || (source === 'hot-water' && item.energySources.includes('hot-water'));
  }
  // Drive capacitors hold charge after the supply is off (OSHA 29 CFR 1910.147(d)(5)).
  if (source === 'electrical') return item.energySources.includes('stored-charge');
  // Gas, oil, refrigerant or air left in a section of pipe must be purged, drained or recovered.
  return item.type === 'pipework';
}

export function planSource(g: SourceGraph, target: string): PlannedSource {
  const empty = { source: g.source, points: [], gaps: [], storedEnergy: [], section: new Set([target]) };
  if (!g.reach.hasNode(target)) return { ...empty, unrecorded: true };
  const supplies = new Set([...g.supplies].filter((s) => s !== target));
  const back = (blocked: (n: string) => boolean) => reachable(g.reach, target, 'inbound', blocked);

  // 1. Nearest isolating items on every path, and the supplies reached with none on the way (gaps).
  const near = back((n) => g.isolating.has(n));
  const candidates = [...near.keys()].filter((n) => n !== target && g.isolating.has(n));
  const gapSupplies = [...supplies].filter((s) => near.has(s));
  const reached = back(() => false);
  const cuttable = [...supplies].filter((s) => reached.has(s) && !near.has(s));
  // Linked, but no supply of this energy reaches it as far as the register knows.
  if (!cuttable.length && !gapSupplies.length) return { ...empty, unrecorded: true };

  // 2. One pruning pass, farthest first.
  const kept = new Set(candidates);
  const cuts = (closed: Set<string>) => { const r = back((n) => closed.has(n)); return cuttable.every((s) => !r.has(s)); };
  for (const c of [...candidates].sort((a, b) => near.get(b)! - near.get(a)!)) {
    kept.delete(c);
    if (!cuts(kept)) kept.add(c);
  }

  // The isolated section: what the points shut in with the item. It is part of the work, not "affected".
  const section = new Set([...back((n) => kept.has(n) || supplies.has(n)).keys()].filter((n) => !kept.has(n) && !supplies.has(n) && !isStandIn(n)));
  const points = [...kept].map((k) => ({ key: k, kind: g.isolating.get(k)!, distance: near.get(k)!, affects: users(g, starvedBy(g, new Set([k]), section)) }));
  const gaps = gapSupplies.map((s) => ({ supply: s, path: pathTo(g, near, s, target) }));
  const storedEnergy = [...section].filter((n) => holdsStoredEnergy(g.items.get(n)!, g.source));
  return { source: g.source, points, gaps, storedEnergy, section, unrecorded: false };
}

/** The shortest path from a gap's supply to the item, walking down the BFS depths (no isolating item on it). */
function pathTo(g: SourceGraph, depth: Map<string, number>, from: string, target: string): string[] {
  const path = [from];
  let at = from;
  while (at !== target) {
    const d = depth.get(at)!;
    at = g.reach.outboundNeighbors(at).find((n) => depth.get(n) === d - 1 && (n === target || !g.isolating.has(n)))!;
    path.push(at);
  }
  return path;
}

/** Plans each requested source for one item; `affects` is what closing all the points together starves. */
export function planIsolation(items: GraphItem[], links: GraphLink[], targetId: number, sources: EnergySource[]) {
  const target = key(targetId);
  const planned = sources.map((source) => {
    const g = buildSourceGraph(items, links, source);
    const plan = planSource(g, target);
    const together = users(g, starvedBy(g, new Set(plan.points.map((p) => p.key)), plan.section));
    return { plan, together };
  });
  const affects = [...new Set(planned.flatMap((p) => p.together))];
  return { sources: planned.map((p) => p.plan), affects };
}

/** What closing this item starves, per energy source of the links through it. */
export function closingAffects(items: GraphItem[], links: GraphLink[], itemId: number) {
  const k = key(itemId);
  const sources = [...new Set(links.filter((l) => l.fromId === itemId || l.toId === itemId).map((l) => MEDIUM_SOURCE[l.medium]))];
  return sources.map((source) => {
    const g = buildSourceGraph(items, links, source);
    return { source, items: users(g, starvedBy(g, new Set([k]))) };
  });
}

export const gapMessage = (supply: GraphItem | undefined, standInFor: GraphItem | undefined, target: GraphItem, source: EnergySource) => {
  const what = ENERGY_SOURCE_LABELS[source].toLowerCase();
  if (!supply) return `Nothing upstream of ${standInFor?.plantId ?? 'this item'} is recorded for ${what}: find where it is fed from on site, or check the register.`;
  const hint = SUPPLY_ISOLATION_HINT[supply.type] ?? 'look on site for an isolating point the register does not show';
  return `No isolation point between ${supply.plantId} (${supply.name}) and ${target.plantId} for ${what}: ${hint}, or check the register.`;
};

export const methodFor = (kind: IsolatingKind) => KIND_METHOD[kind];
