import { parse } from 'csv-parse/sync';
import { stringify } from 'csv-stringify/sync';
import { ASSET_TYPES } from '@/shared/rules/register';
import { attributeSchemas } from '@/shared/schemas/register';
import type { ImportRowError } from '@/shared/types/register';

/*
 * The register as CSV: one row per plant item; export and import use the same columns, so an exported
 * file imports back unchanged.
 *   site                   site name (the site must exist)
 *   plantRoom              plant room name on that site; empty = not in a room; a new name creates the room
 *   plantId                plant ID, unique within the site; site + plant ID identify the row on re-import
 *   name, type             type as its key (pressurisation-unit) or its label (Pressurisation unit)
 *   system, manufacturer, model, serialNumber, notes
 *   energySources          keys separated by ";" (gas;electrical)
 *   installDate, lastServiceDate   YYYY-MM-DD
 *   serviceIntervalMonths  whole months
 *   attributes.<key>       one flat column per type-specific key of any type (shared/schemas/register.ts);
 *                          only the keys of the row's type may be filled, e.g. attributes.ratedOutputKw
 * Headers match ignoring case, spaces, "_" and "-", and attribute columns may omit "attributes.".
 * Columns left out of an import keep the stored values of updated items.
 */
export const BASE_COLUMNS = [
  'site', 'plantRoom', 'plantId', 'name', 'type', 'system', 'energySources', 'manufacturer', 'model',
  'serialNumber', 'installDate', 'serviceIntervalMonths', 'lastServiceDate', 'notes',
] as const;
export const REQUIRED_COLUMNS = ['site', 'plantId', 'name', 'type'] as const;

/** Every attribute key of every type, in type order, each once (valves and actuators share theirs). */
export const ATTRIBUTE_KEYS: string[] = [...new Set(ASSET_TYPES.flatMap((t) => Object.keys(attributeSchemas[t].fields)))];
export const REGISTER_COLUMNS: string[] = [...BASE_COLUMNS, ...ATTRIBUTE_KEYS.map((k) => `attributes.${k}`)];

export const MAX_IMPORT_ROWS = 5000;
/** Every register column plus the export-only ones fit well within this; more is not a register file. */
export const MAX_IMPORT_COLUMNS = 200;
/** The longest row, in characters: 200 columns of generous notes. */
export const MAX_IMPORT_ROW_CHARS = 64 * 1024;

const squash = (s: string) => s.trim().toLowerCase().replace(/[\s_-]+/g, '');
const HEADER_LOOKUP = new Map<string, string>([
  ...REGISTER_COLUMNS.map((c) => [squash(c), c] as [string, string]),
  ...ATTRIBUTE_KEYS.map((k) => [squash(k), `attributes.${k}`] as [string, string]),
]);

// A cell starting with = + - @ (or tab/CR) is run as a formula by spreadsheet programs (OWASP "CSV
// Injection"): the export puts a ' in front, and the import takes it off again, so the round trip holds.
// A value that itself starts with ' before such a character gets one more, so it too comes back as it was.
const FORMULA_START = /^'*[=+\-@\t\r]/;
export const guardCell = (s: string) => (FORMULA_START.test(s) ? `'${s}` : s);
export const unguardCell = (s: string) => (s.startsWith("'") && FORMULA_START.test(s) ? s.slice(1) : s);

/** UTF-8 with a byte-order mark, so spreadsheet programs read °C and accents correctly. */
/**
 * Writes the register; `extraColumns` (e.g. the latest readings) are for reading only: an import skips them,
 * so an exported file still imports back unchanged.
 */
export function writeRegisterCsv(rows: Record<string, string>[], extraColumns: string[] = []): string {
  const columns = [...REGISTER_COLUMNS, ...extraColumns];
  const body = stringify([columns, ...rows.map((r) => columns.map((c) => guardCell(r[c] ?? '')))], { record_delimiter: '\r\n' });
  return `\uFEFF${body}`;
}

const exportOnly = new Set<string>();
/** Registers columns that exports carry for information and imports ignore. */
export function registerExportOnlyColumns(headers: string[]) {
  for (const h of headers) exportOnly.add(squash(h));
}

export interface CsvRecord {
  /** Spreadsheet row number, the header being row 1. */
  row: number;
  /** Only the columns present in the file, by canonical name. */
  cells: Record<string, string>;
}

/** Parses an upload into records keyed by canonical column; a header problem comes back as errors on row 1. */
export function readRegisterCsv(input: Buffer): { records: CsvRecord[]; columns: string[]; errors: ImportRowError[] } {
  let table: string[][];
  try {
    // Blank lines are kept (and skipped below) so record numbers stay spreadsheet row numbers.
    table = parse(input, {
      bom: true,
      relax_column_count: true,
      skip_empty_lines: false,
      max_record_size: MAX_IMPORT_ROW_CHARS,
      // Refused while parsing, so a row of a million empty cells never becomes a million strings.
      on_record: (record: string[], { lines }: { lines: number }) => {
        if (record.length > MAX_IMPORT_COLUMNS) throw Object.assign(new Error(`Row ${lines} has ${record.length} columns; a register file has at most ${MAX_IMPORT_COLUMNS}.`), { lines });
        return record;
      },
    });
  } catch (err) {
    const line = (err as { lines?: number }).lines;
    return { records: [], columns: [], errors: [{ row: line ?? 1, column: '', message: `The file is not valid CSV: ${(err as Error).message}` }] };
  }
  const errors: ImportRowError[] = [];
  const header = table[0] ?? [];
  const columns: (string | null)[] = header.map((h) => HEADER_LOOKUP.get(squash(h)) ?? null);
  header.forEach((h, i) => {
    if (!h.trim() || exportOnly.has(squash(h))) return;
    if (!columns[i]) errors.push({ row: 1, column: h, message: `Unknown column. Columns: ${REGISTER_COLUMNS.join(', ')}.` });
    else if (columns.indexOf(columns[i]) !== i) errors.push({ row: 1, column: h, message: 'This column appears twice.' });
  });
  for (const required of REQUIRED_COLUMNS) {
    if (!columns.includes(required)) errors.push({ row: 1, column: required, message: 'This column is required.' });
  }
  const dataRows = table.length - 1;
  if (dataRows > MAX_IMPORT_ROWS) errors.push({ row: 1, column: '', message: `At most ${MAX_IMPORT_ROWS} rows per import; this file has ${dataRows}. Split it.` });
  if (errors.length) return { records: [], columns: [], errors };

  const records: CsvRecord[] = [];
  table.slice(1).forEach((values, i) => {
    if (values.every((v) => !v.trim())) return;
    const cells: Record<string, string> = {};
    columns.forEach((c, j) => { if (c) cells[c] = unguardCell(values[j] ?? ''); });
    records.push({ row: i + 2, cells });
  });
  return { records, columns: columns.filter((c): c is string => !!c), errors };
}
