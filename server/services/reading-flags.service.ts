// The latest flags of a site's items: per item, its newest current (not superseded) reading set,
// listed when that set carries a flag. Flags are computed by the server when a set is stored and
// kept with it (readings.flags, readings.worst_flag), so any part of the product can query them.
import { QueryTypes, type Transaction } from 'sequelize';
import type { AuthUser } from '@/server/middleware/auth';
import { Asset } from '@/server/models/asset.model';
import { PlantRoom } from '@/server/models/plant-room.model';
import { Reading } from '@/server/models/reading.model';
import { User } from '@/server/models/user.model';
import { findSite } from '@/server/services/register.lookup';
import type { CheckFlagLevel } from '@/shared/calc';
import type { LatestFlaggedReading } from '@/shared/types/readings';

const RANK: Record<CheckFlagLevel, number> = { danger: 0, caution: 1, info: 2 };

/**
 * Ids of the newest current set of each item in `assetIds` (one per item, whether flagged or not).
 * For other services, such as a visit record that gathers the readings of the items it covered.
 */
export async function latestCurrentReadingIds(assetIds: number[], transaction?: Transaction): Promise<number[]> {
  if (!assetIds.length) return [];
  const rows = await Reading.sequelize!.query<{ id: number }>(
    `SELECT id FROM (
       SELECT r.id, ROW_NUMBER() OVER (PARTITION BY r.asset_id ORDER BY r.taken_at DESC, r.id DESC) AS rn
       FROM readings r
       WHERE r.asset_id IN (:assetIds)
         AND NOT EXISTS (SELECT 1 FROM readings c WHERE c.supersedes_id = r.id)
     ) latest WHERE rn = 1`,
    { type: QueryTypes.SELECT, replacements: { assetIds }, transaction },
  );
  return rows.map((r) => Number(r.id));
}

/** The site's items whose latest set carries a flag, danger first, then caution, then info; newest first within each. */
export async function latestSiteFlags(actor: AuthUser, siteId: number): Promise<LatestFlaggedReading[]> {
  // A viewer's site limits apply here as everywhere (findSite answers 404 outside them).
  const site = await findSite(actor, siteId);
  const assets = await Asset.findAll({
    where: { organisationId: actor.organisationId, siteId: site.id, archivedAt: null },
    attributes: ['id', 'plantId', 'name', 'plantRoomId'],
    include: [{ model: PlantRoom, as: 'plantRoom', attributes: ['name'] }],
  });
  const byId = new Map(assets.map((a) => [a.id, a]));
  const ids = await latestCurrentReadingIds([...byId.keys()]);
  if (!ids.length) return [];
  const rows = await Reading.findAll({
    where: { id: ids },
    attributes: ['id', 'assetId', 'takenAt', 'flags', 'worstFlag', 'createdBy'],
    include: [{ model: User, as: 'creator', attributes: ['id', 'name'] }],
  });
  return rows
    .filter((r) => r.worstFlag !== null)
    .map((r) => {
      const asset = byId.get(r.assetId)!;
      return {
        assetId: asset.id,
        plantId: asset.plantId,
        assetName: asset.name,
        plantRoomName: asset.plantRoom?.name ?? null,
        readingId: r.id,
        takenAt: r.takenAt.toISOString(),
        takenBy: r.creator?.name ?? '',
        worstFlag: r.worstFlag!,
        flags: [...r.flags].sort((a, b) => RANK[a.level] - RANK[b.level]),
      };
    })
    .sort((a, b) => RANK[a.worstFlag] - RANK[b.worstFlag] || b.takenAt.localeCompare(a.takenAt));
}
