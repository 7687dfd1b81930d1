import { describe, expect, it } from 'vitest';
import { endOfDayInZone, isValidTimeZone, localDate, zonedTimeToUtc } from '@/shared/rules/time-zone';

describe('endOfDayInZone (default tag expiry: end of the current day at the site)', () => {
  it('ends a London summer day at 22:59:59 UTC and a winter day at 23:59:59 UTC', () => {
    // IANA tz database, Europe/London: BST = UTC+1 from the last Sunday of March to the last Sunday of October.
    expect(endOfDayInZone(new Date('2026-07-15T09:00:00Z'), 'Europe/London').toISOString()).toBe('2026-07-15T22:59:59.000Z');
    expect(endOfDayInZone(new Date('2026-12-02T09:00:00Z'), 'Europe/London').toISOString()).toBe('2026-12-02T23:59:59.000Z');
  });

  it('uses the site’s calendar day, not UTC’s', () => {
    // IANA tz database, America/New_York: EST = UTC−5 in December. 03:00 UTC on 3 Dec is still 2 Dec in New York.
    expect(endOfDayInZone(new Date('2026-12-03T03:00:00Z'), 'America/New_York').toISOString()).toBe('2026-12-03T04:59:59.000Z');
    // IANA tz database, Australia/Sydney: AEDT = UTC+11 in December. 20:00 UTC on 2 Dec is already 3 Dec in Sydney.
    expect(localDate(new Date('2026-12-02T20:00:00Z'), 'Australia/Sydney')).toBe('2026-12-03');
    expect(endOfDayInZone(new Date('2026-12-02T20:00:00Z'), 'Australia/Sydney').toISOString()).toBe('2026-12-03T12:59:59.000Z');
  });

  it('handles the day the clocks change', () => {
    // IANA tz database: on 2026-03-29 London moves from GMT to BST at 01:00 UTC, so that day ends at 22:59:59 UTC.
    expect(endOfDayInZone(new Date('2026-03-29T00:30:00Z'), 'Europe/London').toISOString()).toBe('2026-03-29T22:59:59.000Z');
    // Round trip of a wall-clock time away from the change.
    expect(zonedTimeToUtc(2026, 10, 25, 12, 0, 0, 'Europe/London').toISOString()).toBe('2026-10-25T12:00:00.000Z');
  });

  it('knows a real zone from a made-up one', () => {
    expect(isValidTimeZone('Europe/London')).toBe(true);
    expect(isValidTimeZone('Mars/Olympus_Mons')).toBe(false);
  });
});
