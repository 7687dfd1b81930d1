import { Op, UniqueConstraintError, type Transaction } from 'sequelize';
import { HttpError, conflict, notFound, unprocessable } from '@/server/lib/http-error';
import type { AuthUser } from '@/server/middleware/auth';
import { Asset } from '@/server/models/asset.model';
import { Connection } from '@/server/models/connection.model';
import { User } from '@/server/models/user.model';
import { assertCanEdit } from '@/server/services/register.lookup';
import { MEDIUM_LABELS, canCarry, type Medium } from '@/shared/rules/connections';
import { ASSET_TYPE_LABELS } from '@/shared/rules/register';
import type { ConnectionInput } from '@/shared/schemas/connections';
import type { AssetConnections, Connection as ConnectionDto, ItemRef } from '@/shared/types/connections';
import { siteWhere } from '@/server/services/site-access.service';

const ITEM_ATTRIBUTES = ['id', 'plantId', 'name', 'type', 'plantRoomId', 'siteId', 'organisationId', 'archivedAt', 'energySources', 'attributes'];
const include = [
  { model: Asset, as: 'fromAsset', attributes: ITEM_ATTRIBUTES },
  { model: Asset, as: 'toAsset', attributes: ITEM_ATTRIBUTES },
  { model: User, as: 'creator', attributes: ['id', 'name'] },
];

export const toItemRef = (a: Pick<Asset, 'id' | 'plantId' | 'name' | 'type' | 'plantRoomId'>): ItemRef =>
  ({ id: a.id, plantId: a.plantId, name: a.name, type: a.type, plantRoomId: a.plantRoomId });

function toConnectionDto(c: Connection): ConnectionDto {
  return {
    id: c.id,
    medium: c.medium,
    from: toItemRef(c.fromAsset!),
    to: toItemRef(c.toAsset!),
    createdAt: c.createdAt.toISOString(),
    createdBy: { id: c.createdBy, name: c.creator?.name ?? '' },
  };
}

/** An item of the actor's organisation, or 404 (another organisation's item is answered like a missing one). */
export async function findOwnAsset(actor: AuthUser, id: number, transaction?: Transaction): Promise<Asset> {
  const asset = await Asset.findOne({ where: { id, organisationId: actor.organisationId, ...siteWhere(actor) }, transaction });
  if (!asset) throw notFound('Plant item');
  return asset;
}

const refused = (field: string, message: string) => unprocessable(message, { [field]: message });

/** The checks a new link must pass; each refusal is a 422 that says what is wrong. Shared by the API and CSV import. */
export async function checkLink(actor: AuthUser, input: ConnectionInput, transaction?: Transaction): Promise<{ from: Asset; to: Asset }> {
  if (input.fromAssetId === input.toAssetId) throw refused('toAssetId', 'An item cannot supply itself: choose another item.');
  const [from, to] = await Promise.all([input.fromAssetId, input.toAssetId].map((id) => Asset.findOne({ where: { id, organisationId: actor.organisationId }, transaction })));
  // Another organisation's item is refused exactly like a missing one: nothing is revealed about it.
  if (!from) throw refused('fromAssetId', 'Choose one of your plant items as the supplying item.');
  if (!to) throw refused('toAssetId', 'Choose one of your plant items as the supplied item.');
  if (from.siteId !== to.siteId) throw refused('toAssetId', `${from.plantId} and ${to.plantId} are on different sites; a connection joins items of one site.`);
  for (const [field, item] of [['fromAssetId', from], ['toAssetId', to]] as const) {
    if (item.archivedAt) throw refused(field, `${item.plantId} is archived; archived items take no new connections.`);
    const medium = input.medium as Medium;
    if (!canCarry(item.type, medium)) {
      throw refused('medium', `A ${ASSET_TYPE_LABELS[item.type].toLowerCase()} (${item.plantId}) does not carry ${MEDIUM_LABELS[medium].toLowerCase()}: choose a medium both items carry.`);
    }
  }
  return { from, to };
}

export async function insertConnection(actor: AuthUser, input: ConnectionInput, transaction?: Transaction): Promise<Connection> {
  const { from, to } = await checkLink(actor, input, transaction);
  try {
    return await Connection.create(
      { organisationId: actor.organisationId, siteId: from.siteId, fromAssetId: from.id, toAssetId: to.id, medium: input.medium as Medium, createdBy: actor.id },
      { transaction },
    );
  } catch (err) {
    if (err instanceof UniqueConstraintError) throw conflict(`${from.plantId} already supplies ${to.plantId} with ${MEDIUM_LABELS[input.medium as Medium].toLowerCase()}.`);
    throw err;
  }
}

export async function createConnection(actor: AuthUser, input: ConnectionInput): Promise<ConnectionDto> {
  const created = await insertConnection(actor, input);
  return toConnectionDto((await Connection.findByPk(created.id, { include }))!);
}

/** Engineers remove links they added; supervisors and admins any. */
export async function deleteConnection(actor: AuthUser, id: number): Promise<void> {
  const connection = await Connection.findOne({ where: { id, organisationId: actor.organisationId } });
  if (!connection) throw notFound('Connection');
  assertCanEdit(actor, connection.createdBy, 'connection');
  await connection.destroy();
}

export async function listAssetConnections(actor: AuthUser, assetId: number): Promise<AssetConnections> {
  await findOwnAsset(actor, assetId);
  const rows = await Connection.findAll({
    where: { organisationId: actor.organisationId, [Op.or]: [{ fromAssetId: assetId }, { toAssetId: assetId }] },
    include,
    order: [['medium', 'ASC'], ['id', 'ASC']],
  });
  return {
    from: rows.filter((c) => c.toAssetId === assetId).map(toConnectionDto),
    to: rows.filter((c) => c.fromAssetId === assetId).map(toConnectionDto),
  };
}

/** Every item in service on a site and the links between them, for the planner and the diagram. */
export async function siteNetwork(organisationId: number, siteId: number) {
  const items = await Asset.findAll({ where: { organisationId, siteId, archivedAt: null }, attributes: ITEM_ATTRIBUTES, order: [['plantId', 'ASC']] });
  const ids = new Set(items.map((i) => i.id));
  const links = (await Connection.findAll({ where: { organisationId, siteId }, order: [['id', 'ASC']] }))
    .filter((c) => ids.has(c.fromAssetId) && ids.has(c.toAssetId));
  return { items, links };
}

/** Moving a connected item to another site would leave links between sites (the database refuses it too). */
export async function assertMayChangeSite(assetId: number) {
  const linked = await Connection.count({ where: { [Op.or]: [{ fromAssetId: assetId }, { toAssetId: assetId }] } });
  if (linked) throw new HttpError(409, 'conflict', 'This item has connections on its site. Remove them before moving it to another site.', { siteId: 'Remove its connections before moving it to another site.' });
}
