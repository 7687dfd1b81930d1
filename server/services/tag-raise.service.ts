/** Raising a tag: the checks an isolation must pass (every energy source accounted for) and the new tag with its points. */
import { Op, type Sequelize, type Transaction } from 'sequelize';
import { clock } from '@/server/lib/clock';
import { requireTagRules } from '@/server/lib/tag-rules';
import { HttpError, notFound, unprocessable } from '@/server/lib/http-error';
import { ensurePermission, type AuthUser } from '@/server/middleware/auth';
import { Asset } from '@/server/models/asset.model';
import { Tag } from '@/server/models/tag.model';
import { TagPoint } from '@/server/models/tag-point.model';
import { enqueueTagMail } from '@/server/mail/tag-mail';
import { siteWhere } from '@/server/services/site-access.service';
import { recordProof } from '@/server/services/tag-actions.service';
import { appendEvent, once, type Idempotency } from '@/server/services/tag-history.service';
import { requireNoPendingNotices } from '@/server/services/tag-notices.service';
import { getTag } from '@/server/services/tags.service';
import { ENERGY_SOURCE_LABELS } from '@/shared/rules/register';
import { sourcesNotAccounted } from '@/shared/rules/tag-isolation';
import { raiseTagSchema, type RaiseTagInput } from '@/shared/schemas/tags';
import type { Tag as TagDto } from '@/shared/types/tags';

async function findAsset(actor: AuthUser, assetId: number, transaction?: Transaction) {
  const asset = await Asset.findOne({ where: { id: assetId, organisationId: actor.organisationId, ...siteWhere(actor) }, transaction });
  if (!asset) throw notFound('Plant item');
  return asset;
}

/**
 * Raises a tag. The holder is the signed-in user, never the input. With an Idempotency-Key, a retried request
 * returns the tag the first one created instead of creating a second; the same key with a different body or item
 * is refused (422).
 */
export async function raiseTag(sequelize: Sequelize, actor: AuthUser, assetId: number, input: RaiseTagInput, idem: Idempotency | null): Promise<{ tag: TagDto; created: boolean }> {
  ensurePermission(actor, 'raiseTag', 'Viewers cannot raise tags.');
  const { tagId, replayed } = await once(actor, idem, async () => {
    await requireNoPendingNotices(actor);
    const asset = await findAsset(actor, assetId);
    if (asset.archivedAt) throw new HttpError(409, 'archived', 'This item is archived; tags cannot be raised on it.');
    const now = clock.now();
    const expiresAt = new Date(input.expiresAt);
    await requireTagRules(raiseTagSchema, input, { role: actor.role, now }, 'Check the expiry.');
    if (input.kind === 'isolation') await checkIsolation(actor, asset, input);
    return sequelize.transaction(async (transaction) => {
      const isolation = input.kind === 'isolation';
      const tag = await Tag.create(
        {
          organisationId: actor.organisationId,
          assetId: asset.id,
          kind: input.kind,
          reason: input.reason,
          raisedById: actor.id,
          holderId: actor.id,
          raisedAt: now,
          expiresAt,
          contactPhone: input.contactPhone,
          lockNumber: isolation ? input.lockNumber : '',
          energySources: isolation ? input.energySources : [],
          omittedSources: isolation ? input.omittedSources : [],
          normalState: isolation ? '' : input.normalState,
          leftState: isolation ? '' : input.leftState,
          idempotencyKey: idem?.key ?? null,
          requestHash: idem?.hash ?? null,
        },
        { transaction },
      );
      if (isolation) {
        await TagPoint.bulkCreate(input.points.map((p) => ({ tagId: tag.id, assetId: p.assetId ?? null, description: p.description, method: p.method, lockNumber: p.lockNumber })), { transaction });
      }
      await appendEvent(tag, 'raised', actor, { reason: input.reason, expiresAt: expiresAt.toISOString(), kind: input.kind }, transaction, idem);
      if (isolation && input.proof) await recordProof(tag, actor, input.proof, transaction);
      await enqueueTagMail('raised', tag, actor, transaction);
      return tag.id;
    });
  });
  return { tag: await getTag(actor, tagId), created: !replayed };
}

/**
 * Every energy source recorded on the item is isolated or named as left out with a reason (OSHA 29 CFR
 * 1910.147(d)(3)–(d)(4)); sources the item does not have, and points on items that do not exist, are refused.
 */
async function checkIsolation(actor: AuthUser, asset: Asset, input: RaiseTagInput) {
  const fields: Record<string, string> = {};
  const label = (s: string) => ENERGY_SOURCE_LABELS[s as keyof typeof ENERGY_SOURCE_LABELS] ?? s;
  const named = [...input.energySources, ...input.omittedSources.map((o) => o.source)];
  const foreign = named.filter((s) => !asset.energySources.includes(s));
  if (foreign.length) fields.energySources = `This item is not recorded with these energy sources: ${foreign.join(', ')}.`;
  const both = input.omittedSources.filter((o) => input.energySources.includes(o.source)).map((o) => o.source);
  if (both.length) fields.omittedSources = `A source is either isolated or left out, not both: ${both.map(label).join(', ')}.`;
  const missing = sourcesNotAccounted(asset.energySources, input.energySources, input.omittedSources);
  if (missing.length && !fields.energySources) {
    fields.energySources = `Not accounted for: ${missing.map(label).join(', ')}. Isolate each one, or leave it out with the reason it is safe (${missing.join(', ')}).`;
  }
  const pointAssetIds = input.points.map((p) => p.assetId).filter((x): x is number => !!x);
  if (pointAssetIds.length) {
    const found = await Asset.count({ where: { id: { [Op.in]: pointAssetIds }, organisationId: actor.organisationId } });
    if (found !== new Set(pointAssetIds).size) fields.points = 'An isolation point refers to a plant item that does not exist.';
  }
  if (Object.keys(fields).length) throw unprocessable(missing.length ? `Every energy source of the item must be accounted for: ${missing.join(', ')}.` : 'Some fields need attention.', fields);
}

