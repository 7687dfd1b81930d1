import Graph from 'graphology';
import { bfsFromNode } from 'graphology-traversal';
import { GENERATOR_TYPES, MEDIUM_SOURCE, ONE_WAY_MEDIA, SUPPLY_TYPES, isolatingKind, type IsolatingKind, type Medium } from '@/shared/rules/connections';
import type { AssetType, EnergySource } from '@/shared/rules/register';

export interface GraphItem {
  id: number;
  plantId: string;
  name: string;
  type: AssetType;
  plantRoomId: number | null;
  energySources: EnergySource[];
  attributes: Record<string, unknown>;
}

export interface GraphLink {
  fromId: number;
  toId: number;
  medium: Medium;
}

/**
 * The links of one energy source, twice over:
 *  - `reach` says where that energy can come from: one-way media as drawn, wet media both ways
 *    (graphology mixed graph: directed edges for gas/oil/electrical, undirected ones for the rest);
 *  - `flow` says what each item is fed by, every link as drawn; closing a point starves what it fed.
 */
export interface SourceGraph {
  source: EnergySource;
  reach: Graph;
  flow: Graph;
  items: Map<string, GraphItem>;
  /** Where this energy enters: incoming supplies, generators and items nothing upstream feeds. */
  supplies: Set<string>;
  isolating: Map<string, IsolatingKind>;
}

export const key = (id: number) => String(id);
/** The stand-in for an unrecorded supply upstream of item `n`. */
export const upstreamKey = (n: string) => `up:${n}`;
export const isStandIn = (n: string) => n.startsWith('up:');

export function buildSourceGraph(items: GraphItem[], links: GraphLink[], source: EnergySource): SourceGraph {
  const reach = new Graph({ type: 'mixed', multi: true, allowSelfLoops: false });
  const flow = new Graph({ type: 'directed', multi: true, allowSelfLoops: false });
  const byKey = new Map(items.map((i) => [key(i.id), i]));
  for (const l of links) {
    if (MEDIUM_SOURCE[l.medium] !== source) continue;
    const [a, b] = [key(l.fromId), key(l.toId)];
    if (!byKey.has(a) || !byKey.has(b) || a === b) continue;
    for (const g of [reach, flow]) { g.mergeNode(a); g.mergeNode(b); }
    if (ONE_WAY_MEDIA.has(l.medium)) reach.addDirectedEdge(a, b);
    else reach.addUndirectedEdge(a, b);
    flow.addDirectedEdge(a, b);
  }
  const supplies = new Set<string>();
  const isolating = new Map<string, IsolatingKind>();
  for (const n of flow.nodes()) {
    const item = byKey.get(n)!;
    const kind = isolatingKind(item);
    if (kind) isolating.set(n, kind);
    const generates = GENERATOR_TYPES[item.type]?.includes(source) ?? false;
    if (SUPPLY_TYPES.has(item.type) || generates) supplies.add(n);
    else if (flow.inDegree(n) === 0) {
      // Nothing recorded upstream: the energy enters here, as far as the register knows. An isolating item
      // with nothing upstream gets a stand-in supply in front of it, so it can still be the point that cuts it.
      if (!kind) supplies.add(n);
      else {
        const up = upstreamKey(n);
        for (const g of [reach, flow]) { g.addNode(up); g.addDirectedEdge(up, n); }
        supplies.add(up);
      }
    }
  }
  return { source, reach, flow, items: byKey, supplies, isolating };
}

/**
 * Nodes reachable from `start` in `mode`, entering but never passing through `blocked` nodes, with their
 * depth (links from `start`). graphology-traversal's BFS stops expanding a node when the callback returns true.
 */
export function reachable(graph: Graph, start: string, mode: 'inbound' | 'outbound', blocked: (n: string) => boolean): Map<string, number> {
  const depth = new Map<string, number>();
  if (!graph.hasNode(start)) return depth;
  bfsFromNode(graph, start, (n, _attrs, d) => {
    depth.set(n, d);
    return n !== start && blocked(n);
  }, { mode });
  return depth;
}

/** Items fed (as drawn) from any supply when the `closed` items are shut; the supplies themselves included. */
export function fedItems(g: SourceGraph, closed: ReadonlySet<string>): Set<string> {
  const fed = new Set<string>();
  for (const s of g.supplies) {
    if (closed.has(s) || fed.has(s)) continue;
    for (const [n] of reachable(g.flow, s, 'outbound', (x) => closed.has(x))) if (!closed.has(n)) fed.add(n);
  }
  return fed;
}

/** Items that had this supply and lose it when `closed` are shut (the closed items and `except` left out). */
export function starvedBy(g: SourceGraph, closed: ReadonlySet<string>, except: ReadonlySet<string> = new Set()): string[] {
  const before = fedItems(g, new Set());
  const after = fedItems(g, closed);
  return [...before].filter((n) => !after.has(n) && !closed.has(n) && !except.has(n));
}
