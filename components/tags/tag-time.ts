/** Times on tags: shown at the site, in the site's zone and named, so a night-shift reading is never ambiguous. */
import { deviceZone } from '@/components/places/zone';
import { endOfDayInZone, localDate, zonedTimeToUtc } from '@/shared/rules/time-zone';

const parts = (instant: Date, timeZone: string) =>
  Object.fromEntries(
    new Intl.DateTimeFormat('en-GB', { timeZone, hourCycle: 'h23', year: 'numeric', month: '2-digit', day: '2-digit', hour: '2-digit', minute: '2-digit' })
      .formatToParts(instant)
      .map((p) => [p.type, p.value]),
  );

/** "Europe/London" → "Europe/London"; "America/New_York" → "America/New York". */
export const zoneName = (timeZone: string) => timeZone.replace(/_/g, ' ');

/**
 * "Tue 14 May, 23:59 (Europe/London)"; the year only when it is not this year at the site, and the zone only
 * when the site's differs from the viewer's own.
 */
export function formatInZone(iso: string | Date, timeZone: string, now = new Date(), viewerZone = deviceZone()): string {
  const instant = typeof iso === 'string' ? new Date(iso) : iso;
  if (Number.isNaN(instant.getTime())) return '—';
  const p = Object.fromEntries(
    new Intl.DateTimeFormat('en-GB', { timeZone, hourCycle: 'h23', weekday: 'short', day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' })
      .formatToParts(instant)
      .map((x) => [x.type, x.value]),
  );
  // Put together from parts: the platforms' own patterns differ in their commas.
  const year = p.year === parts(now, timeZone).year ? '' : ` ${p.year}`;
  const zone = timeZone === viewerZone ? '' : ` (${zoneName(timeZone)})`;
  return `${p.weekday} ${p.day} ${p.month}${year}, ${p.hour}:${p.minute}${zone}`;
}

/** The wall-clock date and time at the site, for the precise-entry fields. */
export function localFields(instant: Date, timeZone: string): { date: string; time: string } {
  const p = parts(instant, timeZone);
  return { date: `${p.year}-${p.month}-${p.day}`, time: `${p.hour}:${p.minute}` };
}

/** A site-local date (YYYY-MM-DD) and time (HH:MM) as a UTC instant, or null when either cannot be read. */
export function parseLocal(date: string, time: string, timeZone: string): Date | null {
  const d = /^(\d{4})-(\d{1,2})-(\d{1,2})$/.exec(date.trim());
  const t = /^(\d{1,2})[:.](\d{2})$/.exec(time.trim());
  if (!d || !t) return null;
  const [y, m, day, h, min] = [Number(d[1]), Number(d[2]), Number(d[3]), Number(t[1]), Number(t[2])];
  if (m < 1 || m > 12 || h > 23 || min > 59) return null;
  const lastDay = new Date(Date.UTC(y, m, 0)).getUTCDate();
  if (day < 1 || day > lastDay) return null;
  return zonedTimeToUtc(y, m, day, h, min, 0, timeZone);
}

/** 3 h 20 min, 30 h, 2 d 4 h: coarse enough to read at a glance. */
export function humanDuration(ms: number): string {
  const minutes = Math.floor(Math.abs(ms) / 60_000);
  if (minutes < 1) return 'less than a minute';
  if (minutes < 60) return `${minutes} min`;
  const hours = Math.floor(minutes / 60);
  if (hours < 10) return minutes % 60 ? `${hours} h ${minutes % 60} min` : `${hours} h`;
  if (hours < 48) return `${hours} h`;
  const days = Math.floor(hours / 24);
  return hours % 24 ? `${days} d ${hours % 24} h` : `${days} d`;
}

/** "expires in 3 h" or "past expiry by 2 h" for a live tag (a late service is "overdue"; a tag is not). */
export function expiryPhrase(expiresAt: string, now: Date): string {
  const left = new Date(expiresAt).getTime() - now.getTime();
  return left >= 0 ? `expires in ${humanDuration(left)}` : `past expiry by ${humanDuration(left)}`;
}

/** "3 h ago" for history lines. */
export const agoPhrase = (iso: string, now: Date) => {
  const gone = now.getTime() - new Date(iso).getTime();
  return gone < 60_000 ? 'just now' : `${humanDuration(gone)} ago`;
};

export type QuickExpiry = 'end-today' | 'plus-4h' | 'end-tomorrow';

/** Quick expiries, worked out at the site: "end of today" is 23:59:59 there, whatever the phone's own zone. */
export function quickExpiry(choice: QuickExpiry, now: Date, timeZone: string): Date {
  if (choice === 'end-today') return endOfDayInZone(now, timeZone);
  // Rounded up to the whole minute, as the time fields show it.
  if (choice === 'plus-4h') return new Date(Math.ceil((now.getTime() + 4 * 3600_000) / 60_000) * 60_000);
  const [y, m, d] = localDate(now, timeZone).split('-').map(Number);
  // Date.UTC inside rolls day 32 over into the next month.
  return zonedTimeToUtc(y, m, d + 1, 23, 59, 59, timeZone);
}
