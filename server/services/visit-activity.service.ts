import { QueryTypes, type Transaction } from 'sequelize';
import { Tag } from '@/server/models/tag.model';
import type { TagEventType, TagKind } from '@/shared/rules/tags';
import type { PhotoActivity, ReadingActivity, TagActivity, VisitActivity } from '@/shared/types/visits';

/**
 * A visit collects nothing itself: what a person did at a site is read back from the records they made there
 * (tag history, readings, photos) by person, place and time window.
 */
interface ActivityWindow {
  organisationId: number;
  siteId: number;
  plantRoomId?: number;
  /** Only what this person did; omitted for everyone's changes ("since I was last here"). */
  userId?: number;
  from: Date;
  to?: Date | null;
}

const db = () => Tag.sequelize!;

function conditions(w: ActivityWindow, at: string, by: string) {
  const where = ['a.organisation_id = :organisationId', 'a.site_id = :siteId', `${at} >= :from`];
  if (w.plantRoomId) where.push('a.plant_room_id = :plantRoomId');
  if (w.userId) where.push(`${by} = :userId`);
  if (w.to) where.push(`${at} <= :to`);
  return where.join(' AND ');
}

const replacements = (w: ActivityWindow) => ({ organisationId: w.organisationId, siteId: w.siteId, plantRoomId: w.plantRoomId ?? null, userId: w.userId ?? null, from: w.from, to: w.to ?? null });
const json = <T>(v: unknown): T => (typeof v === 'string' ? JSON.parse(v) : v) as T;
const iso = (d: Date | string) => new Date(d).toISOString();

/** The words given with a tag event: a note, a clearance or extension reason, a hand-over note. */
function eventText(data: Record<string, unknown>): string | null {
  for (const key of ['text', 'note', 'reason']) {
    const v = data[key];
    if (typeof v === 'string' && v.trim()) return v;
  }
  return null;
}

export async function tagActivity(w: ActivityWindow, transaction?: Transaction): Promise<TagActivity[]> {
  const rows = await db().query<{ tagId: number; type: TagEventType; at: Date; byId: number; byName: string | null; kind: TagKind; reason: string; assetId: number; plantId: string; assetName: string; data: unknown }>(
    `SELECT e.tag_id AS tagId, e.type, e.at, e.by_id AS byId, u.name AS byName, t.kind, t.reason, a.id AS assetId, a.plant_id AS plantId, a.name AS assetName, e.data
     FROM tag_events e JOIN tags t ON t.id = e.tag_id JOIN assets a ON a.id = t.asset_id LEFT JOIN users u ON u.id = e.by_id
     WHERE e.organisation_id = :organisationId AND ${conditions(w, 'e.at', 'e.by_id')} ORDER BY e.at, e.id`,
    { replacements: replacements(w), type: QueryTypes.SELECT, transaction },
  );
  return rows.map((r) => ({
    tagId: Number(r.tagId), type: r.type, at: iso(r.at), by: { id: Number(r.byId), name: r.byName ?? 'Unknown' }, kind: r.kind, reason: r.reason,
    item: { id: Number(r.assetId), plantId: r.plantId, name: r.assetName }, text: eventText(json(r.data)),
  }));
}

export async function readingActivity(w: ActivityWindow, opts: { flaggedOnly?: boolean } = {}, transaction?: Transaction): Promise<ReadingActivity[]> {
  const flagged = opts.flaggedOnly ? " AND r.worst_flag IN ('caution', 'danger')" : '';
  const rows = await db().query<{ id: number; takenAt: Date; byId: number; byName: string | null; assetId: number; plantId: string; assetName: string; flags: unknown; note: string }>(
    `SELECT r.id, r.taken_at AS takenAt, r.created_by AS byId, u.name AS byName, a.id AS assetId, a.plant_id AS plantId, a.name AS assetName, r.flags, r.note
     FROM readings r JOIN assets a ON a.id = r.asset_id LEFT JOIN users u ON u.id = r.created_by
     WHERE ${conditions(w, 'r.created_at', 'r.created_by')}${flagged} ORDER BY r.created_at, r.id`,
    { replacements: replacements(w), type: QueryTypes.SELECT, transaction },
  );
  return rows.map((r) => ({
    id: Number(r.id), takenAt: iso(r.takenAt), by: { id: Number(r.byId), name: r.byName ?? 'Unknown' },
    item: { id: Number(r.assetId), plantId: r.plantId, name: r.assetName },
    flags: json<{ level: string; message: string }[]>(r.flags ?? []).filter((f) => f.level !== 'info').map((f) => ({ level: f.level, message: f.message })),
    note: r.note,
  }));
}

/** Photos of items, plant rooms and tags on the site; the item or room is found through whichever the photo is of. */
async function photoActivity(w: ActivityWindow, transaction?: Transaction): Promise<PhotoActivity[]> {
  const roomFilter = w.plantRoomId ? ' AND COALESCE(a.plant_room_id, pr.id) = :plantRoomId' : '';
  const rows = await db().query<{ id: number; at: Date; caption: string | null; plantId: string | null; assetName: string | null; roomName: string | null; tagId: number | null }>(
    `SELECT p.id, p.created_at AS at, p.caption, a.plant_id AS plantId, a.name AS assetName, pr.name AS roomName, p.tag_id AS tagId
     FROM photos p
     LEFT JOIN tags t ON t.id = p.tag_id
     LEFT JOIN assets a ON a.id = COALESCE(p.asset_id, t.asset_id)
     LEFT JOIN plant_rooms pr ON pr.id = p.plant_room_id
     WHERE p.organisation_id = :organisationId AND COALESCE(a.site_id, pr.site_id) = :siteId AND p.created_at >= :from
       ${w.to ? 'AND p.created_at <= :to' : ''} ${w.userId ? 'AND p.created_by = :userId' : ''}${roomFilter}
     ORDER BY p.created_at, p.id`,
    { replacements: replacements(w), type: QueryTypes.SELECT, transaction },
  );
  return rows.map((r) => ({
    id: Number(r.id), at: iso(r.at), caption: r.caption,
    subject: r.tagId ? `Tag on ${r.plantId} ${r.assetName}` : r.plantId ? `${r.plantId} ${r.assetName}` : `Plant room ${r.roomName ?? ''}`.trim(),
  }));
}

export async function activityFor(w: ActivityWindow, transaction?: Transaction): Promise<VisitActivity> {
  const [tagEvents, readings, photos] = await Promise.all([tagActivity(w, transaction), readingActivity(w, {}, transaction), photoActivity(w, transaction)]);
  return { tagEvents, readings, photos };
}
