import { closingAffects, gapMessage, methodFor, planIsolation } from '@/server/lib/isolation/isolation-planner';
import { isStandIn, key, type GraphItem, type GraphLink } from '@/server/lib/isolation/plant-graph';
import { HttpError } from '@/server/lib/http-error';
import type { AuthUser } from '@/server/middleware/auth';
import type { Asset } from '@/server/models/asset.model';
import type { Connection } from '@/server/models/connection.model';
import { findOwnAsset, siteNetwork, toItemRef } from '@/server/services/connections.service';
import { findPlantRoom } from '@/server/services/register.lookup';
import { tagSummaries } from '@/server/services/live-tags.service';
import { isolatingKind } from '@/shared/rules/connections';
import { ENERGY_SOURCES, ENERGY_SOURCE_LABELS, type EnergySource } from '@/shared/rules/register';
import type { ClosingAffects, IsolationPlan, ItemRef, PlantRoomDiagram } from '@/shared/types/connections';

/** Shown with every plan, on screen and in the API. */
const PLAN_CAUTION =
  'This plan is only as good as the register. Labels and flow arrows on site can be wrong and pipework may not be recorded: ' +
  'verify every point on site, follow the site’s isolation procedure, and prove the isolation before work starts.';

const graphItem = (a: Asset): GraphItem => ({
  id: a.id, plantId: a.plantId, name: a.name, type: a.type, plantRoomId: a.plantRoomId, energySources: a.energySources, attributes: a.attributes,
});
const graphLink = (c: Connection): GraphLink => ({ fromId: c.fromAssetId, toId: c.toAssetId, medium: c.medium });

async function network(organisationId: number, siteId: number) {
  const { items, links } = await siteNetwork(organisationId, siteId);
  const byKey = new Map(items.map((i) => [key(i.id), i]));
  const ref = (k: string): ItemRef => toItemRef(byKey.get(k)!);
  const refs = (keys: string[]) => keys.filter((k) => !isStandIn(k) && byKey.has(k)).map(ref).sort((a, b) => a.plantId.localeCompare(b.plantId));
  return { items, links, byKey, ref, refs };
}

/** `sources=gas,electrical`; none given = every energy source recorded on the item. */
function readPlanSources(raw: unknown, fallback: EnergySource[]): EnergySource[] {
  if (raw === undefined || raw === '') return fallback;
  const list = String(raw).split(',').map((s) => s.trim()).filter(Boolean);
  const unknown = list.filter((s) => !(ENERGY_SOURCES as readonly string[]).includes(s));
  if (unknown.length || !list.length) {
    // A bad query is the request's fault (400), as for every other query string.
    throw new HttpError(400, 'bad-query', `Unknown energy source ${unknown.join(', ') || '(none)'}: use ${ENERGY_SOURCES.join(', ')}.`, { sources: `Use ${ENERGY_SOURCES.join(', ')}.` });
  }
  return [...new Set(list)] as EnergySource[];
}

export async function getIsolationPlan(actor: AuthUser, assetId: number, rawSources: unknown): Promise<IsolationPlan> {
  const asset = await findOwnAsset(actor, assetId);
  const sources = readPlanSources(rawSources, asset.energySources);
  const net = await network(actor.organisationId, asset.siteId);
  const plan = planIsolation(net.items.map(graphItem), net.links.map(graphLink), asset.id, sources);
  const target = graphItem(asset);
  return {
    asset: toItemRef(asset),
    sources: plan.sources.map((s) => ({
      source: s.source,
      points: s.points.map((p) => ({ item: net.ref(p.key), kind: p.kind, method: methodFor(p.kind), distance: p.distance, affects: net.refs(p.affects) }))
        .sort((a, b) => a.distance - b.distance || a.item.plantId.localeCompare(b.item.plantId)),
      gaps: s.gaps.map((g) => {
        const supply = net.byKey.get(g.supply);
        const standInFor = isStandIn(g.supply) ? net.byKey.get(g.supply.slice(3)) : undefined;
        return {
          supply: supply ? toItemRef(supply) : net.ref(g.supply.slice(3)),
          path: g.path.filter((k) => !isStandIn(k)).map(net.ref),
          message: gapMessage(supply ? graphItem(supply) : undefined, standInFor ? graphItem(standInFor) : undefined, target, s.source),
        };
      }),
      storedEnergy: net.refs(s.storedEnergy),
      unrecorded: s.unrecorded ? `The register records no ${ENERGY_SOURCE_LABELS[s.source].toLowerCase()} supply that reaches ${asset.plantId}. Record its supplies, or find this source's isolation points on site.` : null,
    })),
    affects: net.refs(plan.affects),
    caution: PLAN_CAUTION,
  };
}

export async function getClosingAffects(actor: AuthUser, assetId: number): Promise<ClosingAffects> {
  const asset = await findOwnAsset(actor, assetId);
  const net = await network(actor.organisationId, asset.siteId);
  const affects = closingAffects(net.items.map(graphItem), net.links.map(graphLink), asset.id);
  return { asset: toItemRef(asset), isolating: !!isolatingKind(asset), affects: affects.map((a) => ({ source: a.source, items: net.refs(a.items) })) };
}

/** A plant room's items, the items outside it that they link to, and those links, with each item's tag state. */
export async function getPlantRoomDiagram(actor: AuthUser, roomId: number): Promise<PlantRoomDiagram> {
  const room = await findPlantRoom(actor, roomId);
  const net = await network(actor.organisationId, room.siteId);
  const inRoom = new Set(net.items.filter((i) => i.plantRoomId === room.id).map((i) => i.id));
  const links = net.links.filter((l) => inRoom.has(l.fromAssetId) || inRoom.has(l.toAssetId));
  const shown = new Set([...inRoom, ...links.flatMap((l) => [l.fromAssetId, l.toAssetId])]);
  const items = net.items.filter((i) => shown.has(i.id));
  const states = await tagSummaries(actor.organisationId, items.map((i) => i.id));
  return {
    items: items.map((i) => ({ ...toItemRef(i), state: states.get(i.id)?.state ?? 'normal', overdue: states.get(i.id)?.overdue ?? false, inRoom: inRoom.has(i.id) })),
    connections: links.map((l) => ({ id: l.id, fromId: l.fromAssetId, toId: l.toAssetId, medium: l.medium })),
  };
}
