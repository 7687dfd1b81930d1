import { stringify } from 'csv-stringify/sync';
import { guardCell } from '@/server/lib/register-csv';
import { BOARD_STATE_LABELS } from '@/shared/rules/board';
import type { BoardRow } from '@/shared/types/board';

export const BOARD_CSV_COLUMNS = [
  'Site', 'Plant room', 'Plant ID', 'Item', 'Kind', 'Reason', 'Holder', 'Raised (site time)', 'Expires (site time)', 'Time zone', 'State', 'Proof of isolation', 'Contact phone', 'Tag',
] as const;

/** "2025-03-04 14:05" as the clock reads on site. */
export function siteTime(iso: string, timeZone: string): string {
  const parts = Object.fromEntries(
    new Intl.DateTimeFormat('en-GB', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' })
      .formatToParts(new Date(iso)).map((p) => [p.type, p.value]),
  );
  return `${parts.year}-${parts.month}-${parts.day} ${parts.hour}:${parts.minute}`;
}

/** Isolations say whether a proof is recorded (OSHA 29 CFR 1910.147(d)(6)); overrides have none to give. */
const proofCell = (proved: boolean | null) => (proved === null ? '' : proved ? 'Proved' : 'Not proved');

/** UTF-8 with a byte-order mark so spreadsheet programs read accents; cells guarded against formula injection. */
export function writeBoardCsv(rows: BoardRow[], publicUrl: string): string {
  const lines = rows.map((r) => [
    r.siteName, r.plantRoomName ?? '', r.plantId, r.assetName, r.kind, r.reason, r.holder.name,
    siteTime(r.raisedAt, r.timeZone), siteTime(r.expiresAt, r.timeZone), r.timeZone, BOARD_STATE_LABELS[r.state], proofCell(r.proved), r.contactPhone, `${publicUrl}/tags/${r.id}`,
  ].map(guardCell));
  return `\uFEFF${stringify([[...BOARD_CSV_COLUMNS], ...lines], { record_delimiter: '\r\n' })}`;
}
