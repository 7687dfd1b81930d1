/**
 * The one id parser: a record id is a positive whole number written in plain digits, within the range a
 * JavaScript number holds exactly. Anything else (`abc`, `1e999`, `0x1f`, `-3`, `1.5`, `Infinity`) is not an id.
 */
export function parseId(raw: unknown): number | null {
  if (typeof raw === 'number') return Number.isSafeInteger(raw) && raw > 0 ? raw : null;
  if (typeof raw !== 'string' || !/^\s*[0-9]{1,16}\s*$/.test(raw)) return null;
  const id = Number(raw);
  return Number.isSafeInteger(id) && id > 0 ? id : null;
}

/** A comma-separated list of ids (`?assetIds=3,4,9`); null when any part is not an id. */
export function parseIdList(raw: unknown): number[] | null {
  const parts = String(raw ?? '').split(',').map((s) => s.trim()).filter(Boolean);
  const ids = parts.map(parseId);
  return ids.every((id): id is number => id !== null) ? ids : null;
}
