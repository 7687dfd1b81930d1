import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { planSource } from '@/server/lib/isolation/isolation-planner';
import { buildSourceGraph, isStandIn, key } from '@/server/lib/isolation/plant-graph';
import { plant } from '@/test/server/lib/isolation/plant-fixture';
import { MEDIUM_SOURCE, ONE_WAY_MEDIA, type Medium } from '@/shared/rules/connections';
import type { EnergySource } from '@/shared/rules/register';

const TYPES = ['gas-supply', 'valve', 'control-valve', 'pipework', 'boiler', 'isolator', 'distribution-board', 'pump'];
const MEDIA: Medium[] = ['gas', 'electrical', 'heating-flow', 'heating-return'];

const randomPlant = fc.integer({ min: 2, max: 11 }).chain((n) =>
  fc.record({
    types: fc.array(fc.constantFrom(...TYPES), { minLength: n, maxLength: n }),
    links: fc.array(fc.tuple(fc.nat(n - 1), fc.nat(n - 1), fc.constantFrom(...MEDIA)), { maxLength: n * 2 }),
    target: fc.nat(n - 1),
    source: fc.constantFrom<EnergySource>('gas', 'electrical', 'hot-water'),
  }),
);

/** A breadth-first search written apart from the planner: is `to` reachable from `from` without entering `closed`? */
function pathExists(adj: Map<string, string[]>, from: string, to: string, closed: Set<string>): boolean {
  const seen = new Set([from]);
  const queue = [from];
  while (queue.length) {
    const at = queue.shift()!;
    if (at === to) return true;
    for (const next of adj.get(at) ?? []) {
      if (seen.has(next) || (closed.has(next) && next !== to)) continue;
      seen.add(next);
      queue.push(next);
    }
  }
  return false;
}

describe('isolation planner on random plants (fast-check)', () => {
  it('closing the points leaves no path from any supply, and no point can be left out', () => {
    fc.assert(
      fc.property(randomPlant, ({ types, links, target, source }) => {
        const p = plant(types.map((t, i) => `I${i}:${t}`), links.filter(([a, b]) => a !== b).map(([a, b, m]) => `I${a}>I${b}:${m}`));
        const g = buildSourceGraph(p.items, p.links, source);
        const t = key(target + 1);
        const plan = planSource(g, t);
        // The adjacency of this source's links, as energy travels: one-way media as drawn, the others both ways.
        const adj = new Map<string, string[]>();
        const add = (a: string, b: string) => adj.set(a, [...(adj.get(a) ?? []), b]);
        for (const l of p.links) {
          if (MEDIUM_SOURCE[l.medium] !== source) continue;
          add(key(l.fromId), key(l.toId));
          if (!ONE_WAY_MEDIA.has(l.medium)) add(key(l.toId), key(l.fromId));
        }
        for (const s of g.supplies) if (isStandIn(s)) add(s, s.slice(3));
        const points = new Set(plan.points.map((x) => x.key));
        const gaps = new Set(plan.gaps.map((x) => x.supply));
        const allIsolating = new Set(g.isolating.keys());
        allIsolating.delete(t);
        const supplies = [...g.supplies].filter((s) => s !== t);

        for (const pt of points) expect(g.isolating.has(pt) && pt !== t).toBe(true);
        for (const s of supplies) {
          // A gap really has a path with no isolating item on it; every other supply is cut by the points.
          if (gaps.has(s)) expect(pathExists(adj, s, t, allIsolating)).toBe(true);
          else expect(pathExists(adj, s, t, points)).toBe(false);
        }
        // Minimal: give back any one point and some supply that is not a gap reaches the item again.
        for (const pt of points) {
          const rest = new Set([...points].filter((x) => x !== pt));
          expect(supplies.some((s) => !gaps.has(s) && pathExists(adj, s, t, rest))).toBe(true);
        }
      }),
      { numRuns: 400 },
    );
  });
});
