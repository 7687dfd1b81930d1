import { Graph, layout } from '@dagrejs/dagre';
import type { Medium } from '@/shared/rules/connections';
import type { PlantRoomDiagram } from '@/shared/types/connections';

export const NODE_SIZE = { width: 176, height: 80 } as const;

type DiagramItem = PlantRoomDiagram['items'][number];
export interface PlacedItem { item: DiagramItem; x: number; y: number }
export interface PlacedLink { id: number; medium: Medium; points: { x: number; y: number }[] }
interface DiagramLayout { items: PlacedItem[]; links: PlacedLink[]; width: number; height: number }

/** Places items in layers from supplies down to what they feed (dagre's layered layout; loops are allowed). */
export function layoutDiagram(d: PlantRoomDiagram): DiagramLayout {
  const g = new Graph({ multigraph: true });
  g.setGraph({ rankdir: 'TB', nodesep: 28, ranksep: 64, edgesep: 12, marginx: 24, marginy: 24 });
  g.setDefaultEdgeLabel(() => ({}));
  for (const i of d.items) g.setNode(String(i.id), { width: NODE_SIZE.width, height: NODE_SIZE.height });
  for (const c of d.connections) g.setEdge(String(c.fromId), String(c.toId), {}, String(c.id));
  layout(g);
  const items = d.items.map((item) => {
    const n = g.node(String(item.id));
    return { item, x: n.x - NODE_SIZE.width / 2, y: n.y - NODE_SIZE.height / 2 };
  });
  const links = d.connections.map((c) => ({
    id: c.id,
    medium: c.medium,
    points: g.edge({ v: String(c.fromId), w: String(c.toId), name: String(c.id) }).points ?? [],
  }));
  const { width = 0, height = 0 } = g.graph();
  return { items, links, width, height };
}
