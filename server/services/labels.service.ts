import { Op, type Sequelize, type WhereOptions } from 'sequelize';
import { clock } from '@/server/lib/clock';
import { HttpError, notFound } from '@/server/lib/http-error';
import { assertCanEdit } from '@/server/services/register.lookup';
import { renderLabelsPdf } from '@/server/lib/label-pdf';
import { insertWithLabelCode } from '@/server/lib/unique-clash';
import { ensurePermission, type AuthUser } from '@/server/middleware/auth';
import { Asset } from '@/server/models/asset.model';
import { PlantRoom } from '@/server/models/plant-room.model';
import { RetiredLabel } from '@/server/models/retired-label.model';
import { Site } from '@/server/models/site.model';
import { labelUrl, normaliseLabelCode } from '@/shared/rules/label-code';
import { siteWhere } from '@/server/services/site-access.service';
import type { LabelLayout } from '@/shared/schemas/queries';

export const MAX_LABELS_PER_PDF = 500;

/** The id of the item a label code belongs to; a malformed, retired or foreign code is "no such label" (404). */
export async function assetIdForLabel(actor: AuthUser, raw: string): Promise<number> {
  const code = normaliseLabelCode(raw);
  const asset = code ? await Asset.findOne({ attributes: ['id'], where: { labelCode: code, organisationId: actor.organisationId, ...siteWhere(actor) } }) : null;
  if (!asset) throw new HttpError(404, 'no-such-label', 'No such label.');
  return asset.id;
}

/**
 * Issues a new code for a damaged or lost label; the old code is retired (kept in retired_labels, whose unique index
 * refuses it twice) and stops opening the item. A clash with a live code is retried by the register's own mechanism.
 */
export async function replaceLabel(sequelize: Sequelize, actor: AuthUser, assetId: number): Promise<{ labelCode: string; retiredCode: string }> {
  ensurePermission(actor, 'replaceLabel', 'Viewers cannot replace labels.');
  return sequelize.transaction(async (transaction) => {
    const asset = Number.isSafeInteger(assetId)
      ? await Asset.findOne({ where: { id: assetId, organisationId: actor.organisationId }, transaction, lock: transaction.LOCK.UPDATE })
      : null;
    if (!asset) throw notFound('Plant item');
    // A new code kills the printed one: only someone who may edit the item may do that.
    assertCanEdit(actor, asset.createdBy, 'item');
    const retiredCode = asset.labelCode;
    await RetiredLabel.create({ organisationId: asset.organisationId, assetId: asset.id, code: retiredCode, retiredAt: clock.now(), retiredBy: actor.id }, { transaction });
    const labelCode = await insertWithLabelCode(async (code) => {
      await asset.update({ labelCode: code }, { transaction });
      return code;
    });
    return { labelCode, retiredCode };
  });
}

export async function retiredLabels(actor: AuthUser, assetId: number) {
  const rows = await RetiredLabel.findAll({ where: { assetId, organisationId: actor.organisationId }, order: [['retiredAt', 'DESC']] });
  return rows.map((r) => ({ code: r.code, retiredAt: r.retiredAt.toISOString(), retiredBy: r.retiredBy }));
}

export interface LabelSelection {
  assetIds?: number[];
  plantRoomId?: number;
  siteId?: number;
}

/** A PDF of labels for the chosen items (archived items excluded), ordered by site, plant room and plant ID. */
export async function labelsPdf(actor: AuthUser, selection: LabelSelection, layout: LabelLayout, publicUrl: string): Promise<Buffer> {
  const where: WhereOptions<Asset> = { organisationId: actor.organisationId, archivedAt: null, ...siteWhere(actor) };
  if (selection.assetIds?.length) Object.assign(where, { id: { [Op.in]: selection.assetIds } });
  else if (selection.plantRoomId) Object.assign(where, { plantRoomId: selection.plantRoomId });
  else if (selection.siteId) Object.assign(where, { siteId: selection.siteId });
  else throw new HttpError(400, 'no-selection', 'Choose the items to print: assetIds, plantRoomId or siteId.');
  const assets = await Asset.findAll({
    where,
    include: [{ model: Site, as: 'site' }, { model: PlantRoom, as: 'plantRoom' }],
    order: [[{ model: Site, as: 'site' }, 'name', 'ASC'], [{ model: PlantRoom, as: 'plantRoom' }, 'name', 'ASC'], ['plantId', 'ASC']],
    limit: MAX_LABELS_PER_PDF + 1,
  });
  if (!assets.length) throw notFound('Plant items for these labels');
  if (assets.length > MAX_LABELS_PER_PDF) throw new HttpError(413, 'too-many-labels', `At most ${MAX_LABELS_PER_PDF} labels in one PDF; choose fewer items.`);
  return renderLabelsPdf(
    assets.map((a) => ({ code: a.labelCode, url: labelUrl(publicUrl, a.labelCode), plantId: a.plantId, name: a.name, site: a.site?.name ?? '' })),
    layout,
  );
}
