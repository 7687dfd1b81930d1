import { WorkLimit } from '@/server/lib/work-limit';
import { Op, type Sequelize, type Transaction } from 'sequelize';
import { ValidationError } from 'yup';
import { ATTRIBUTE_KEYS, BASE_COLUMNS, readRegisterCsv, registerExportOnlyColumns, writeRegisterCsv } from '@/server/lib/register-csv';
import { READING_EXPORT_COLUMNS, latestReadingsForExport } from '@/server/services/readings.export';
import type { AssetListFilters } from '@/server/services/assets.query';
import type { AuthUser } from '@/server/middleware/auth';
import { Asset } from '@/server/models/asset.model';
import { PlantRoom } from '@/server/models/plant-room.model';
import { Site } from '@/server/models/site.model';
import { insertAsset } from '@/server/services/assets.service';
import { assetAsInput, assetColumns, sameAsStored, validateAsset, type ValidAsset } from '@/server/services/assets.validation';
import { ASSET_TYPES, ASSET_TYPE_LABELS, type AssetType } from '@/shared/rules/register';
import { attributeSchemas } from '@/shared/schemas/register';
import type { ImportResult, ImportRowError } from '@/shared/types/register';
import { siteWhere } from '@/server/services/site-access.service';

const key = (s: string) => s.trim().toLowerCase();
registerExportOnlyColumns(READING_EXPORT_COLUMNS.map((c) => c.header));
const TYPE_LOOKUP = new Map<string, AssetType>(ASSET_TYPES.flatMap((t) => [[key(t), t], [key(ASSET_TYPE_LABELS[t]), t]] as [string, AssetType][]));

/** The register (items in service) as CSV rows; archived items are left out. */
export async function exportRegisterCsv(actor: AuthUser, filters: Pick<AssetListFilters, 'siteId' | 'plantRoomId' | 'type'>): Promise<string> {
  const assets = await Asset.findAll({
    where: {
      organisationId: actor.organisationId,
      archivedAt: null,
      ...siteWhere(actor),
      ...(filters.siteId ? { siteId: filters.siteId } : {}),
      ...(filters.plantRoomId ? { plantRoomId: filters.plantRoomId } : {}),
      ...(filters.type ? { type: filters.type } : {}),
    },
    include: [{ model: Site, as: 'site', attributes: ['name'] }, { model: PlantRoom, as: 'plantRoom', attributes: ['name'] }],
    order: [[{ model: Site, as: 'site' }, 'name', 'ASC'], ['plantId', 'ASC']],
  });
  const text = (v: unknown) => (v === null || v === undefined ? '' : String(v));
  const readings = await latestReadingsForExport(actor.organisationId);
  return writeRegisterCsv(
    assets.map((a) => ({
      ...Object.fromEntries(READING_EXPORT_COLUMNS.map((c) => [c.header, c.value(readings.get(a.id))])),
      site: a.site!.name,
      plantRoom: a.plantRoom?.name ?? '',
      plantId: a.plantId,
      name: a.name,
      type: a.type,
      system: a.system,
      energySources: a.energySources.join(';'),
      manufacturer: a.manufacturer,
      model: a.model,
      serialNumber: a.serialNumber,
      installDate: text(a.installDate),
      serviceIntervalMonths: text(a.serviceIntervalMonths),
      lastServiceDate: text(a.lastServiceDate),
      notes: a.notes,
      ...Object.fromEntries(ATTRIBUTE_KEYS.map((k) => [`attributes.${k}`, text(a.attributes[k])])),
    })),
    READING_EXPORT_COLUMNS.map((c) => c.header),
  );
}

interface PlannedRow {
  row: number;
  value: ValidAsset;
  existing: Asset | null;
  /** Name of a plant room this row needs created on its site. */
  newRoom: string | null;
}

/** A yup path as the CSV column it came from. */
function columnOf(path: string | undefined): string {
  const p = (path ?? '').replace(/\[\d+\]$/, '');
  if (p === 'siteId') return 'site';
  if (p === 'plantRoomId') return 'plantRoom';
  return p;
}

/** One row laid over the stored item (or a blank one): only the columns present in the file count. */
function rowInput(cells: Record<string, string>, siteId: number, existing: Asset | null, errors: ImportRowError[], row: number) {
  const input: Record<string, unknown> = existing ? { ...assetAsInput(existing) } : {};
  input.siteId = siteId;
  for (const column of BASE_COLUMNS) {
    const cell = cells[column];
    if (cell === undefined || column === 'site' || column === 'plantRoom') continue;
    const v = cell.trim();
    if (column === 'energySources') input.energySources = v.split(';').map((s) => s.trim().toLowerCase()).filter(Boolean);
    else if (column === 'type') input.type = TYPE_LOOKUP.get(key(v)) ?? v;
    else if (column === 'installDate' || column === 'lastServiceDate' || column === 'serviceIntervalMonths') input[column] = v === '' ? null : v;
    else input[column] = cell;
  }
  const type = input.type as AssetType;
  const keysOfType = ASSET_TYPES.includes(type) ? Object.keys(attributeSchemas[type].fields) : [];
  const attributes: Record<string, unknown> = existing && existing.type === type ? { ...existing.attributes } : {};
  for (const k of ATTRIBUTE_KEYS) {
    const cell = cells[`attributes.${k}`];
    if (cell === undefined) continue;
    const v = cell.trim();
    if (v === '') { delete attributes[k]; continue; }
    if (!keysOfType.includes(k)) {
      errors.push({ row, column: `attributes.${k}`, message: `Not a field of ${ASSET_TYPE_LABELS[type] ?? 'this type'}; leave it empty.` });
      continue;
    }
    attributes[k] = v;
  }
  input.attributes = attributes;
  return input;
}

async function plan(actor: AuthUser, records: ReturnType<typeof readRegisterCsv>['records'], transaction?: Transaction) {
  const errors: ImportRowError[] = [];
  const sites = await Site.findAll({ where: { organisationId: actor.organisationId }, transaction });
  const siteByName = new Map(sites.map((s) => [key(s.name), s]));
  const rooms = await PlantRoom.findAll({ where: { organisationId: actor.organisationId }, transaction });
  const roomByName = new Map(rooms.map((r) => [`${r.siteId}|${key(r.name)}`, r]));
  const plantIds = [...new Set(records.map((r) => (r.cells.plantId ?? '').trim().toUpperCase()).filter(Boolean))];
  const stored = plantIds.length ? await Asset.findAll({ where: { organisationId: actor.organisationId, plantId: { [Op.in]: plantIds } }, transaction }) : [];
  const storedByKey = new Map(stored.map((a) => [`${a.siteId}|${a.plantId.toUpperCase()}`, a]));
  const seen = new Map<string, number>();
  const planned: PlannedRow[] = [];

  for (const { row, cells } of records) {
    const rowErrors: ImportRowError[] = [];
    const site = siteByName.get(key(cells.site ?? ''));
    if (!site) {
      rowErrors.push({ row, column: 'site', message: cells.site?.trim() ? `No site called "${cells.site.trim()}" in your organisation; add the site first.` : 'Name the site.' });
      errors.push(...rowErrors);
      continue;
    }
    const plantId = (cells.plantId ?? '').trim().toUpperCase();
    const rowKey = `${site.id}|${plantId}`;
    const existing = plantId ? storedByKey.get(rowKey) ?? null : null;
    if (plantId && seen.has(rowKey)) rowErrors.push({ row, column: 'plantId', message: `Plant ID ${plantId} at this site is also on row ${seen.get(rowKey)}.` });
    if (plantId) seen.set(rowKey, seen.get(rowKey) ?? row);
    if (existing?.archivedAt) rowErrors.push({ row, column: 'plantId', message: `Plant ID ${plantId} belongs to an archived item at this site; choose another plant ID.` });

    const input = rowInput(cells, site.id, existing, rowErrors, row);
    let newRoom: string | null = null;
    if (cells.plantRoom !== undefined) {
      const roomName = cells.plantRoom.trim();
      const room = roomName ? roomByName.get(`${site.id}|${key(roomName)}`) : null;
      input.plantRoomId = room?.id ?? null;
      if (roomName && !room) newRoom = roomName;
    }
    try {
      const value = await validateAsset(input);
      if (!rowErrors.length) planned.push({ row, value, existing, newRoom });
    } catch (err) {
      if (!(err instanceof ValidationError)) throw err;
      for (const e of err.inner.length ? err.inner : [err]) rowErrors.push({ row, column: columnOf(e.path), message: e.message });
    }
    errors.push(...rowErrors);
  }
  return { planned, errors };
}

/**
 * Imports register rows: with dryRun nothing is written and the answer says what would happen; otherwise
 * everything is written in one transaction, or nothing when any row has an error. Rows match stored items
 * by site + plant ID, so importing the same file again updates instead of duplicating.
 */
/** One import at a time, one more waiting: each parses up to 5 MB and checks thousands of rows in one transaction. */
export const importWork = new WorkLimit({ concurrency: 1, queue: 1, retryAfterSeconds: 15, busyMessage: 'Another import is running. Try again in a few seconds.' });

export function importRegisterCsv(actor: AuthUser, sequelize: Sequelize, file: Buffer, dryRun: boolean): Promise<ImportResult> {
  return importWork.run(() => importNow(actor, sequelize, file, dryRun));
}

async function importNow(actor: AuthUser, sequelize: Sequelize, file: Buffer, dryRun: boolean): Promise<ImportResult> {
  const parsed = readRegisterCsv(file);
  const result: ImportResult = { dryRun, rows: parsed.records.length, created: 0, updated: 0, unchanged: 0, newPlantRooms: [], errors: parsed.errors };
  if (parsed.errors.length) return result;

  const run = async (transaction?: Transaction) => {
    const { planned, errors } = await plan(actor, parsed.records, transaction);
    result.errors = errors;
    if (errors.length) return;
    const siteNames = new Map((await Site.findAll({ where: { organisationId: actor.organisationId }, transaction })).map((s) => [s.id, s.name]));
    const newRooms = new Map<string, { siteId: number; name: string }>();
    for (const p of planned) if (p.newRoom) newRooms.set(`${p.value.siteId}|${key(p.newRoom)}`, { siteId: p.value.siteId, name: p.newRoom });
    result.newPlantRooms = [...newRooms.values()].map((r) => ({ site: siteNames.get(r.siteId) ?? '', name: r.name }));
    for (const p of planned) {
      if (!p.existing) result.created++;
      else if (!p.newRoom && sameAsStored(p.existing, assetColumns(p.value))) result.unchanged++;
      else result.updated++;
    }
    if (dryRun) return;

    const roomIds = new Map<string, number>();
    for (const [k, r] of newRooms) {
      const room = await PlantRoom.create({ organisationId: actor.organisationId, siteId: r.siteId, name: r.name, accessNotes: '', createdBy: actor.id }, { transaction });
      roomIds.set(k, room.id);
    }
    for (const p of planned) {
      const value = p.newRoom ? { ...p.value, plantRoomId: roomIds.get(`${p.value.siteId}|${key(p.newRoom)}`)! } : p.value;
      if (!p.existing) await insertAsset(actor, value, transaction);
      else if (!sameAsStored(p.existing, assetColumns(value))) await p.existing.update(assetColumns(value), { transaction });
    }
  };

  if (dryRun) await run();
  else await sequelize.transaction((transaction) => run(transaction));
  return result;
}
