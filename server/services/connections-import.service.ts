import { parse } from 'csv-parse/sync';
import { stringify } from 'csv-stringify/sync';
import type { Sequelize } from 'sequelize';
import { HttpError } from '@/server/lib/http-error';
import { guardCell, unguardCell } from '@/server/lib/register-csv';
import type { AuthUser } from '@/server/middleware/auth';
import { Asset } from '@/server/models/asset.model';
import { Connection } from '@/server/models/connection.model';
import { Site } from '@/server/models/site.model';
import { checkLink, insertConnection } from '@/server/services/connections.service';
import { MEDIA, MEDIUM_LABELS, type Medium } from '@/shared/rules/connections';
import type { ConnectionImportResult } from '@/shared/types/connections';
import type { ImportRowError } from '@/shared/types/register';
import { siteWhere } from '@/server/services/site-access.service';

/*
 * Connections as CSV, one row per link; export and import use the same columns, so an exported file imports back
 * unchanged:
 *   site     site name
 *   from     plant ID of the supplying item on that site
 *   to       plant ID of the supplied item on that site
 *   medium   its key (heating-flow) or its label (Heating flow)
 * Headers match ignoring case and spaces. Rows are only ever added: an import never removes a link.
 */
const CONNECTION_COLUMNS = ['site', 'from', 'to', 'medium'] as const;
const MAX_ROWS = 5000;
const squash = (s: string) => s.trim().toLowerCase().replace(/[\s_-]+/g, '');
const MEDIUM_LOOKUP = new Map<string, Medium>(MEDIA.flatMap((m) => [[squash(m), m], [squash(MEDIUM_LABELS[m]), m]] as [string, Medium][]));

export async function exportConnectionsCsv(actor: AuthUser, siteId: number | null): Promise<string> {
  const rows = await Connection.findAll({
    where: { organisationId: actor.organisationId, ...siteWhere(actor), ...(siteId ? { siteId } : {}) },
    include: [{ model: Asset, as: 'fromAsset', attributes: ['plantId'] }, { model: Asset, as: 'toAsset', attributes: ['plantId'] }],
    order: [['siteId', 'ASC'], ['id', 'ASC']],
  });
  const sites = new Map((await Site.findAll({ where: { organisationId: actor.organisationId }, attributes: ['id', 'name'] })).map((s) => [s.id, s.name]));
  const table = rows.map((c) => [sites.get(c.siteId) ?? '', c.fromAsset!.plantId, c.toAsset!.plantId, c.medium].map(guardCell));
  // UTF-8 with a byte-order mark, as the register export, so spreadsheet programs read it correctly.
  return `\uFEFF${stringify([[...CONNECTION_COLUMNS], ...table], { record_delimiter: '\r\n' })}`;
}

function readTable(input: Buffer): { rows: { row: number; cells: Record<string, string> }[]; errors: ImportRowError[] } {
  let table: string[][];
  try {
    table = parse(input, { bom: true, relax_column_count: true, skip_empty_lines: false });
  } catch (err) {
    return { rows: [], errors: [{ row: (err as { lines?: number }).lines ?? 1, column: '', message: `The file is not valid CSV: ${(err as Error).message}` }] };
  }
  const header = (table[0] ?? []).map(squash);
  const errors: ImportRowError[] = CONNECTION_COLUMNS.filter((c) => !header.includes(c)).map((c) => ({ row: 1, column: c, message: `This column is required. Columns: ${CONNECTION_COLUMNS.join(', ')}.` }));
  if (table.length - 1 > MAX_ROWS) errors.push({ row: 1, column: '', message: `At most ${MAX_ROWS} rows per import; this file has ${table.length - 1}. Split it.` });
  if (errors.length) return { rows: [], errors };
  const rows = table.slice(1).map((values, i) => ({
    row: i + 2,
    cells: Object.fromEntries(CONNECTION_COLUMNS.map((c) => [c, unguardCell(values[header.indexOf(c)] ?? '').trim()])),
  })).filter((r) => Object.values(r.cells).some(Boolean));
  return { rows, errors: [] };
}

/** Checks every row with the same rules as the API; writes only when there is no error and `dryRun` is false. */
export async function importConnectionsCsv(actor: AuthUser, sequelize: Sequelize, input: Buffer, dryRun: boolean): Promise<ConnectionImportResult> {
  const { rows, errors } = readTable(input);
  const result: ConnectionImportResult = { dryRun, rows: rows.length, created: 0, unchanged: 0, errors };
  if (errors.length) return result;
  const sites = new Map((await Site.findAll({ where: { organisationId: actor.organisationId }, attributes: ['id', 'name'] })).map((s) => [squash(s.name), s.id]));
  const items = await Asset.findAll({ where: { organisationId: actor.organisationId }, attributes: ['id', 'siteId', 'plantId'] });
  const itemId = (siteId: number, plantId: string) => items.find((i) => i.siteId === siteId && i.plantId === plantId.toUpperCase())?.id;
  const toWrite: { row: number; input: { fromAssetId: number; toAssetId: number; medium: Medium } }[] = [];
  const seen = new Set<string>();
  for (const { row, cells } of rows) {
    const fail = (column: string, message: string) => errors.push({ row, column, message });
    const siteId = sites.get(squash(cells.site));
    if (!siteId) { fail('site', `No site named "${cells.site}".`); continue; }
    const fromAssetId = itemId(siteId, cells.from);
    const toAssetId = itemId(siteId, cells.to);
    const medium = MEDIUM_LOOKUP.get(squash(cells.medium));
    if (!fromAssetId) fail('from', `No item with plant ID "${cells.from}" at ${cells.site}.`);
    if (!toAssetId) fail('to', `No item with plant ID "${cells.to}" at ${cells.site}.`);
    if (!medium) fail('medium', `Unknown medium "${cells.medium}": use one of ${MEDIA.join(', ')}.`);
    if (!fromAssetId || !toAssetId || !medium) continue;
    const link = { fromAssetId, toAssetId, medium };
    try {
      await checkLink(actor, link);
    } catch (err) {
      if (!(err instanceof HttpError)) throw err;
      const column = Object.keys(err.fields ?? {})[0] === 'medium' ? 'medium' : 'to';
      fail(column, err.message);
      continue;
    }
    const k = `${fromAssetId}>${toAssetId}:${medium}`;
    if (seen.has(k) || (await Connection.count({ where: link }))) { result.unchanged++; continue; }
    seen.add(k);
    toWrite.push({ row, input: link });
  }
  result.created = toWrite.length;
  if (errors.length || dryRun || !toWrite.length) return { ...result, created: errors.length ? 0 : result.created };
  await sequelize.transaction(async (transaction) => {
    for (const w of toWrite) await insertConnection(actor, w.input, transaction);
  });
  return result;
}
