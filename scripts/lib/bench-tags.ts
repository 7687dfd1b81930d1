import { QueryTypes, type Sequelize } from 'sequelize';
import { Asset } from '@/server/models/asset.model';
import { PlantRoom } from '@/server/models/plant-room.model';
import { Site } from '@/server/models/site.model';
import { Tag } from '@/server/models/tag.model';
import { User } from '@/server/models/user.model';
import { generateLabelCode } from '@/shared/rules/label-code';

/*
 * The bench's register and tag history, shaped like a large maintenance contract (invented names only): several
 * sites, each with plant rooms full of items, the live tags spread over them, and behind them a long history of
 * cleared tags, each with its isolation points, proofs and events, as the service writes them.
 */

export interface BenchShape {
  sites: number;
  roomsPerSite: number;
  itemsPerRoom: number;
}

export const BENCH_SHAPE: BenchShape = { sites: 10, roomsPerSite: 8, itemsPerRoom: 50 };

const ITEM_KINDS = [
  { type: 'boiler', name: 'Boiler', sources: ['gas', 'electrical'] },
  { type: 'pump', name: 'Heating pump', sources: ['electrical'] },
  { type: 'valve', name: 'Isolating valve', sources: [] },
  { type: 'ahu', name: 'Air handling unit', sources: ['electrical'] },
] as const;

/** Adds `shape.sites` sites with their plant rooms and items to the organisation, in bulk. */
export async function seedBenchRegister(organisationId: number, createdBy: number, shape: BenchShape = BENCH_SHAPE) {
  const sites = await Site.bulkCreate(
    Array.from({ length: shape.sites }, (_, s) => ({
      organisationId, name: `Bench estate ${String(s + 1).padStart(2, '0')}`, address: `${s + 1} Bench Row`, timeZone: 'Europe/London',
      clientContactName: null, clientContactPhone: null, clientContactEmail: null, createdBy,
    })),
  );
  const rooms = await PlantRoom.bulkCreate(
    sites.flatMap((site) => Array.from({ length: shape.roomsPerSite }, (_, r) => ({
      organisationId, siteId: site.id, name: `Plant room ${r + 1}`, accessNotes: 'Key from the site office.', createdBy,
    }))),
  );
  let n = 0;
  const items = rooms.flatMap((room) => Array.from({ length: shape.itemsPerRoom }, (_, i) => {
    const kind = ITEM_KINDS[(n += 1) % ITEM_KINDS.length];
    return {
      organisationId, siteId: room.siteId, plantRoomId: room.id, plantId: `R${room.id}-${kind.type.toUpperCase()}-${i + 1}`, labelCode: generateLabelCode(),
      name: `${kind.name} ${i + 1}`, type: kind.type, system: 'LTHW', energySources: [...kind.sources], manufacturer: '', model: '', serialNumber: `SN-${room.id}-${i}`,
      installDate: null, serviceIntervalMonths: 12, lastServiceDate: null, nextServiceDue: null, notes: '', attributes: {}, createdBy,
    };
  }));
  for (let i = 0; i < items.length; i += 1000) await Asset.bulkCreate(items.slice(i, i + 1000) as never[]);
  return { sites: sites.length, rooms: rooms.length, items: items.length };
}

/**
 * Adds `live` live and `cleared` cleared tags over the organisation's items (tags first, in batches of a thousand),
 * then, in a few INSERT … SELECT statements over those tags, what the service writes beside each: one or two
 * isolation points per isolation, a proof for every cleared isolation and two of three live ones, and the events
 * (raised; proved; a note on half; an extension on a fifth; cleared).
 */
export async function seedBenchTags(sequelize: Sequelize, organisationId: number, live: number, cleared: number) {
  const assets = await Asset.findAll({ attributes: ['id', 'siteId'], where: { organisationId }, order: [['id', 'ASC']] });
  const people = await User.findAll({ where: { organisationId } });
  const holders = people.filter((p) => p.role !== 'viewer');
  const now = Date.now();
  const hour = 3600_000;
  const make = (i: number, status: 'live' | 'cleared') => {
    const holder = holders[i % holders.length];
    // Live tags expire from two days ago to ten days ahead, so every board state is well represented; cleared ones
    // were raised over the last three years.
    const expiresAt = status === 'live' ? new Date(now + (((i * 7919) % (12 * 24)) - 48) * hour) : new Date(now - ((i * 7919) % (3 * 365 * 24)) * hour);
    return {
      organisationId, assetId: assets[(i * 7907) % assets.length].id, kind: i % 3 === 0 ? 'override' as const : 'isolation' as const, status,
      reason: `Bench tag ${i}: ${i % 2 ? 'seal replacement on the flow side' : 'controls fault finding'}`, raisedById: holder.id, holderId: holder.id,
      raisedAt: new Date(expiresAt.getTime() - 30 * hour), expiresAt, contactPhone: '+44 7700 900199', lockNumber: `L-${i}`,
      energySources: [], omittedSources: [], normalState: '', leftState: '', idempotencyKey: null, requestHash: null,
      ...(status === 'cleared' ? { clearedAt: new Date(expiresAt.getTime() - hour), clearedById: holder.id, clearance: 'normal' as const } : {}),
    };
  };
  // History first, as it accumulated; the live tags are the newest rows.
  for (let i = 0; i < live + cleared; i += 1000) {
    const rows = Array.from({ length: Math.min(1000, live + cleared - i) }, (_, k) => make(i + k, i + k < cleared ? 'cleared' : 'live'));
    await Tag.bulkCreate(rows);
  }
  const bench = `t.organisation_id = ${Number(organisationId)} AND t.reason LIKE 'Bench tag %'`;
  const run = (sql: string) => sequelize.query(sql, { type: QueryTypes.INSERT });
  // Points: the item itself, and on one isolation in two a second, upstream point.
  await run(`INSERT INTO tag_points (tag_id, asset_id, description, method, lock_number)
    SELECT t.id, t.asset_id, 'Local isolator', 'isolator-locked', t.lock_number FROM tags t WHERE ${bench} AND t.kind = 'isolation'`);
  await run(`INSERT INTO tag_points (tag_id, asset_id, description, method, lock_number)
    SELECT t.id, NULL, 'Flow and return valves', 'valve-locked', CONCAT(t.lock_number, '-2') FROM tags t WHERE ${bench} AND t.kind = 'isolation' AND t.id % 2 = 0`);
  const provedWhere = `${bench} AND t.kind = 'isolation' AND (t.status = 'cleared' OR t.id % 3 <> 0)`;
  await run(`INSERT INTO tag_proofs (tag_id, organisation_id, method, instrument, reading, note, by_id, at)
    SELECT t.id, t.organisation_id, 'absence-of-voltage', 'Two-pole tester', '0 V', '', t.holder_id, t.raised_at + INTERVAL 10 MINUTE FROM tags t WHERE ${provedWhere}`);
  const event = (type: string, at: string, data: string, where: string) =>
    run(`INSERT INTO tag_events (tag_id, organisation_id, type, at, by_id, data) SELECT t.id, t.organisation_id, '${type}', ${at}, t.holder_id, ${data} FROM tags t WHERE ${where}`);
  await event('raised', 't.raised_at', "JSON_OBJECT('reason', t.reason, 'kind', t.kind)", bench);
  await event('proved', 't.raised_at + INTERVAL 10 MINUTE', "JSON_OBJECT('method', 'absence-of-voltage', 'reading', '0 V')", provedWhere);
  await event('note-added', 't.raised_at + INTERVAL 2 HOUR', "JSON_OBJECT('text', 'Parts ordered; back tomorrow.')", `${bench} AND t.id % 2 = 0`);
  await event('extended', 't.raised_at + INTERVAL 20 HOUR', "JSON_OBJECT('reason', 'Parts delayed')", `${bench} AND t.id % 5 = 0`);
  await event('cleared', 't.cleared_at', "JSON_OBJECT('reason', 'Work complete')", `${bench} AND t.status = 'cleared'`);
  const [counts] = await sequelize.query<{ events: number; proofs: number; points: number }>(
    `SELECT (SELECT COUNT(*) FROM tag_events WHERE organisation_id = ?) AS events, (SELECT COUNT(*) FROM tag_proofs WHERE organisation_id = ?) AS proofs,
       (SELECT COUNT(*) FROM tag_points p JOIN tags t ON t.id = p.tag_id WHERE t.organisation_id = ?) AS points`,
    { replacements: [organisationId, organisationId, organisationId], type: QueryTypes.SELECT },
  );
  return {
    items: assets.length, sites: new Set(assets.map((a) => a.siteId)).size,
    events: Number(counts.events), proofs: Number(counts.proofs), points: Number(counts.points),
  };
}
