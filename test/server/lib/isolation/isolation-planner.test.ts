import { describe, expect, it } from 'vitest';
import { closingAffects, planIsolation } from '@/server/lib/isolation/isolation-planner';
import { plant } from '@/test/server/lib/isolation/plant-fixture';

// Small plants drawn by hand; the expected answer is written beside each drawing.

const planFor = (p: ReturnType<typeof plant>, target: string, source: Parameters<typeof planIsolation>[3][number]) => {
  const result = planIsolation(p.items, p.links, p.id(target), [source]);
  const s = result.sources[0];
  return {
    points: p.names(s.points.map((x) => x.key)),
    gaps: s.gaps.map((g) => p.names([g.supply])[0]),
    gapPaths: s.gaps.map((g) => g.path.map((k) => p.names([k])[0])),
    stored: p.names(s.storedEnergy),
    affects: p.names(result.affects),
    pointAffects: Object.fromEntries(s.points.map((x) => [p.names([x.key])[0], p.names(x.affects)])),
    unrecorded: s.unrecorded,
  };
};

describe('isolation planner on hand-drawn plants', () => {
  it('two valves in series: the one nearest the item is enough', () => {
    // GAS ─> V1 ─> V2 ─> B            answer: points {V2}; no gap
    const p = plant(['GAS:gas-supply', 'V1:valve', 'V2:valve', 'B:boiler'], ['GAS>V1:gas', 'V1>V2:gas', 'V2>B:gas']);
    // from memory: HSE HSG253 (2006) asks for isolation as close as practicable to the equipment worked on
    expect(planFor(p, 'B', 'gas')).toMatchObject({ points: ['V2'], gaps: [], affects: [] });
  });

  it('a bypass around a valve: that valve alone does not isolate, so the plan closes the bypass too', () => {
    // GAS ─> V1 ─> V2 ─> B
    //          └─> BV ───┘               answer: points {V2, BV} (V1 upstream of both would also cut, but is farther)
    const p = plant(['GAS:gas-supply', 'V1:valve', 'V2:valve', 'BV:valve', 'B:boiler'], ['GAS>V1:gas', 'V1>V2:gas', 'V2>B:gas', 'V1>BV:gas', 'BV>B:gas']);
    // common practice, no published source: a bypass must be isolated as well as the main line
    expect(planFor(p, 'B', 'gas').points).toEqual(['BV', 'V2']);
  });

  it('a bypass with no valve on it: the upstream valve is the nearest single point that cuts both', () => {
    // GAS ─> V1 ─> V2 ─> P ─> B
    //          └──────────────┘          answer: points {V1}; V2 dropped because V1 cuts its path as well
    const p = plant(['GAS:gas-supply', 'V1:valve', 'V2:valve', 'P:pipework', 'B:boiler'], ['GAS>V1:gas', 'V1>V2:gas', 'V2>P:gas', 'P>B:gas', 'V1>B:gas']);
    const plan = planFor(p, 'B', 'gas');
    expect(plan.points).toEqual(['V1']);
    // The pipe section between V1 and the boiler holds gas and must be purged.
    expect(plan.stored).toEqual(['P']);
  });

  it('two supplies of one medium: each gets its own point', () => {
    // DB1 ─> ISO1 ─┐
    // DB2 ─> ISO2 ─┴─> PANEL             answer: points {ISO1, ISO2}
    const p = plant(['DB1:distribution-board', 'DB2:distribution-board', 'ISO1:isolator', 'ISO2:isolator', 'PANEL:control-panel'],
      ['DB1>ISO1:electrical', 'ISO1>PANEL:electrical', 'DB2>ISO2:electrical', 'ISO2>PANEL:electrical']);
    // from memory: BS 7671 (Chapter 53, isolation) — every circuit able to feed the equipment is isolated
    expect(planFor(p, 'PANEL', 'electrical')).toMatchObject({ points: ['ISO1', 'ISO2'], gaps: [] });
  });

  it('a path with no isolator is reported as a gap, with the path', () => {
    // GAS ─> V1 ─> B
    // GAS ─> P ───┘                      answer: gap from GAS through P; V1 is not needed (the gap feeds B anyway)
    const p = plant(['GAS:gas-supply', 'V1:valve', 'P:pipework', 'B:boiler'], ['GAS>V1:gas', 'V1>B:gas', 'GAS>P:gas', 'P>B:gas']);
    const plan = planFor(p, 'B', 'gas');
    expect(plan.gaps).toEqual(['GAS']);
    expect(plan.gapPaths).toEqual([['GAS', 'P', 'B']]);
    expect(plan.points).toEqual([]);
  });

  it('a control valve is not an isolation point', () => {
    // GAS ─> CV(control) ─> B            answer: gap; no point
    const p = plant(['GAS:gas-supply', 'CV:control-valve', 'B:boiler'], ['GAS>CV:gas', 'CV>B:gas']);
    expect(planFor(p, 'B', 'gas')).toMatchObject({ points: [], gaps: ['GAS'] });
  });

  it('affects on a shared header: closing the header valve takes every boiler off it', () => {
    // GAS ─> VH ─> HDR ─> B1
    //                  ├─> B2            answer for B1 (no local valve): point {VH}, affects {B2, B3}
    //                  └─> GV3 ─> B3
    const p = plant(['GAS:gas-supply', 'VH:valve', 'HDR:pipework', 'B1:boiler', 'B2:boiler', 'GV3:valve', 'B3:boiler'],
      ['GAS>VH:gas', 'VH>HDR:gas', 'HDR>B1:gas', 'HDR>B2:gas', 'HDR>GV3:gas', 'GV3>B3:gas']);
    const plan = planFor(p, 'B1', 'gas');
    expect(plan.points).toEqual(['VH']);
    // Pipework and valves lose gas too, but only the items that use it are listed.
    expect(plan.affects).toEqual(['B2', 'B3']);
    // B3 has its own valve: closing only that takes nothing else off.
    expect(planFor(p, 'B3', 'gas')).toMatchObject({ points: ['GV3'], affects: [] });
    // On the header valve's record: closing it affects the header and everything on it.
    expect(closingAffects(p.items, p.links, p.id('VH')).map((a) => ({ source: a.source, items: p.names(a.items) })))
      .toEqual([{ source: 'gas', items: ['B1', 'B2', 'B3'] }]);
  });

  it('a wet item needs its flow and its return closed: water reaches it from both sides', () => {
    // B ─flow─> FV ─> P ─> RV ─return─> B   answer for P: points {FV, RV}; the vessel between them must be drained
    //                 └─> EV
    const p = plant(['B:boiler', 'FV:valve', 'P:pump', 'RV:valve', 'EV:vessel'],
      ['B>FV:heating-flow', 'FV>P:heating-flow', 'P>RV:heating-return', 'RV>B:heating-return', 'P>EV:heating-flow']);
    // common practice, no published source: a pump is isolated on both its suction and its discharge side
    expect(planFor(p, 'P', 'hot-water')).toMatchObject({ points: ['FV', 'RV'], gaps: [], stored: ['EV'], affects: [] });
  });

  it('says when the register has no link of that source to the item', () => {
    const p = plant(['GAS:gas-supply', 'V1:valve', 'B:boiler'], ['GAS>V1:gas', 'V1>B:gas']);
    expect(planFor(p, 'B', 'electrical')).toMatchObject({ points: [], gaps: [], unrecorded: true });
  });
});
