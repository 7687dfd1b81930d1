import { describe, expect, it } from 'vitest';
import { expiryPhrase, formatInZone, humanDuration, localFields, parseLocal, quickExpiry } from '@/components/tags/tag-time';

const LONDON = 'Europe/London';
const at = (iso: string) => new Date(iso);

describe('quick expiries at the site', () => {
  it('ends today at 23:59:59 site time in summer, when the site is an hour ahead of UTC', () => {
    // Directive 2000/84/EC Art. 2–3: summer time runs from 01:00 UTC on the last Sunday in March to 01:00 UTC on the last Sunday in October (UK: Summer Time Act 1972 as amended).
    expect(quickExpiry('end-today', at('2025-07-01T21:30:00Z'), LONDON).toISOString()).toBe('2025-07-01T22:59:59.000Z');
  });

  it('uses the site’s date, not UTC’s, just after midnight at the site', () => {
    // 23:30 UTC on 1 July is 00:30 on 2 July in London (UTC+1 in summer, Directive 2000/84/EC).
    expect(quickExpiry('end-today', at('2025-07-01T23:30:00Z'), LONDON).toISOString()).toBe('2025-07-02T22:59:59.000Z');
  });

  it('ends tomorrow across a month end and across the change to summer time', () => {
    expect(quickExpiry('end-tomorrow', at('2025-01-31T12:00:00Z'), LONDON).toISOString()).toBe('2025-02-01T23:59:59.000Z');
    // Directive 2000/84/EC Art. 2: summer time began at 01:00 UTC on Sunday 30 March 2025, so 23:59:59 that day is 22:59:59 UTC.
    expect(quickExpiry('end-tomorrow', at('2025-03-29T12:00:00Z'), LONDON).toISOString()).toBe('2025-03-30T22:59:59.000Z');
  });

  it('adds four hours rounded up to the whole minute', () => {
    expect(quickExpiry('plus-4h', at('2025-07-01T09:00:20Z'), LONDON).toISOString()).toBe('2025-07-01T13:01:00.000Z');
  });
});

describe('site-local entry', () => {
  it('reads a date and 24-hour time typed at the site', () => {
    expect(parseLocal('2025-07-01', '09:05', LONDON)?.toISOString()).toBe('2025-07-01T08:05:00.000Z');
    expect(parseLocal('2025-1-6', '7.30', LONDON)?.toISOString()).toBe('2025-01-06T07:30:00.000Z');
    expect(parseLocal('2025-07-01', '09:05', 'America/New_York')?.toISOString()).toBe('2025-07-01T13:05:00.000Z');
  });

  it('refuses dates and times that do not exist', () => {
    expect(parseLocal('2025-02-29', '10:00', LONDON)).toBeNull();
    expect(parseLocal('2025-13-01', '10:00', LONDON)).toBeNull();
    expect(parseLocal('2025-07-01', '24:00', LONDON)).toBeNull();
    expect(parseLocal('01/07/2025', '10:00', LONDON)).toBeNull();
    expect(parseLocal('2025-07-01', '', LONDON)).toBeNull();
  });

  it('fills the fields back from an instant, in site time', () => {
    expect(localFields(at('2025-07-01T22:59:59Z'), LONDON)).toEqual({ date: '2025-07-01', time: '23:59' });
    expect(localFields(at('2025-07-01T23:30:00Z'), LONDON)).toEqual({ date: '2025-07-02', time: '00:30' });
  });
});

describe('times in words', () => {
  it('names the site’s zone and leaves out the year when it is this year at the site', () => {
    expect(formatInZone('2025-07-01T22:59:59Z', LONDON, at('2025-06-01T00:00:00Z'), 'UTC')).toBe('Tue 1 Jul, 23:59 (Europe/London)');
    expect(formatInZone('2026-01-02T08:00:00Z', 'America/New_York', at('2025-06-01T00:00:00Z'), 'UTC')).toBe('Fri 2 Jan 2026, 03:00 (America/New York)');
    // common practice, no published source: a zone is named only when the site's clock differs from the reader's.
    expect(formatInZone('2025-07-01T22:59:59Z', LONDON, at('2025-06-01T00:00:00Z'), LONDON)).toBe('Tue 1 Jul, 23:59');
  });

  it('gives durations coarse enough to read at a glance', () => {
    expect(humanDuration(30_000)).toBe('less than a minute');
    expect(humanDuration(25 * 60_000)).toBe('25 min');
    expect(humanDuration(200 * 60_000)).toBe('3 h 20 min');
    expect(humanDuration(30 * 3600_000 + 5 * 60_000)).toBe('30 h');
    expect(humanDuration(52 * 3600_000)).toBe('2 d 4 h');
  });

  it('says how long until expiry, or how long overdue', () => {
    const now = at('2025-07-01T12:00:00Z');
    expect(expiryPhrase('2025-07-01T15:00:00Z', now)).toBe('expires in 3 h');
    expect(expiryPhrase('2025-07-01T10:00:00Z', now)).toBe('past expiry by 2 h');
  });
});
