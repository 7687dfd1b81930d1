/** Time-zone arithmetic with the platform's Intl (IANA database); no library needed for these two questions. */

// One formatter per zone: building one costs far more than using it, and lists and the board ask per row or site.
const formatters = new Map<string, Intl.DateTimeFormat>();

function formatterFor(timeZone: string): Intl.DateTimeFormat {
  let fmt = formatters.get(timeZone);
  if (!fmt) {
    fmt = new Intl.DateTimeFormat('en-GB', {
      timeZone,
      hourCycle: 'h23',
      year: 'numeric', month: '2-digit', day: '2-digit', hour: '2-digit', minute: '2-digit', second: '2-digit',
    });
    formatters.set(timeZone, fmt);
  }
  return fmt;
}

function partsInZone(instant: Date, timeZone: string) {
  const fmt = formatterFor(timeZone);
  const p = Object.fromEntries(fmt.formatToParts(instant).map((x) => [x.type, x.value]));
  return { year: Number(p.year), month: Number(p.month), day: Number(p.day), hour: Number(p.hour), minute: Number(p.minute), second: Number(p.second) };
}

/** Offset of the zone from UTC at that instant, in milliseconds (positive east of Greenwich). */
function zoneOffsetMs(instant: Date, timeZone: string): number {
  const p = partsInZone(instant, timeZone);
  const asUtc = Date.UTC(p.year, p.month - 1, p.day, p.hour, p.minute, p.second);
  return asUtc - Math.floor(instant.getTime() / 1000) * 1000;
}

/** The UTC instant of a wall-clock time in the zone (for a time skipped by a DST change, the instant just after). */
export function zonedTimeToUtc(year: number, month: number, day: number, hour: number, minute: number, second: number, timeZone: string): Date {
  const guess = Date.UTC(year, month - 1, day, hour, minute, second);
  let result = guess - zoneOffsetMs(new Date(guess), timeZone);
  // A second pass settles instants near a DST change.
  result = guess - zoneOffsetMs(new Date(result), timeZone);
  return new Date(result);
}

/** 23:59:59 of the current day at the site: the default expiry of a new tag. */
export function endOfDayInZone(now: Date, timeZone: string): Date {
  const p = partsInZone(now, timeZone);
  return zonedTimeToUtc(p.year, p.month, p.day, 23, 59, 59, timeZone);
}

/** The calendar date (YYYY-MM-DD) of an instant at the site. */
export function localDate(instant: Date, timeZone: string): string {
  const p = partsInZone(instant, timeZone);
  return `${p.year}-${String(p.month).padStart(2, '0')}-${String(p.day).padStart(2, '0')}`;
}

export function isValidTimeZone(timeZone: string): boolean {
  try {
    new Intl.DateTimeFormat('en-GB', { timeZone });
    return true;
  } catch {
    return false;
  }
}
