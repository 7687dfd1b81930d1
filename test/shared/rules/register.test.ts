import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { addMonths, ENERGY_SOURCES, ENERGY_SOURCE_LABELS, isServiceOverdue, nextServiceDue } from '@/shared/rules/register';

describe('ENERGY_SOURCES', () => {
  it('names the energy kinds an isolation must account for, each with a label', () => {
    // OSHA 29 CFR 1910.147(b) "Energy source": electrical, mechanical, hydraulic, pneumatic, chemical, thermal, or other energy.
    expect(ENERGY_SOURCES).toEqual(expect.arrayContaining(['electrical', 'mechanical', 'pneumatic', 'chemical', 'hot-water']));
    // OSHA 29 CFR 1910.147(d)(5)(i): stored or residual energy (such as that in capacitors, springs, air, gas, steam, or water pressure) shall be relieved.
    expect(ENERGY_SOURCES).toEqual(expect.arrayContaining(['stored-charge', 'stored-pressure']));
    // common practice, no published source: fuel oil, a mains make-up feed that re-pressurises a section, and refrigerant circuits are isolated separately in building services.
    expect(ENERGY_SOURCES).toEqual(expect.arrayContaining(['oil', 'mains-make-up', 'refrigerant']));
    for (const s of ENERGY_SOURCES) expect(ENERGY_SOURCE_LABELS[s].length).toBeGreaterThan(2);
  });
});

describe('nextServiceDue', () => {
  it.each([
    ['2024-03-15', 12, '2025-03-15'],
    ['2024-11-30', 3, '2025-02-28'],
    ['2023-10-31', 1, '2023-11-30'],
    ['2024-08-31', 6, '2025-02-28'],
    ['2019-05-20', 120, '2029-05-20'],
  ])('%s + %i months → %s', (last, months, due) => {
    // Gregorian calendar month lengths (ISO 8601 calendar dates); a day past the month's end clamps to its last day.
    expect(nextServiceDue(last, months)).toBe(due);
  });

  it('clamps 31 January to the end of February, 29th in a leap year', () => {
    // Gregorian calendar: 2024 is a leap year (divisible by 4, not by 100), 2023 and 2100 are not.
    expect(nextServiceDue('2024-01-31', 1)).toBe('2024-02-29');
    expect(nextServiceDue('2023-01-31', 1)).toBe('2023-02-28');
    expect(nextServiceDue('2100-01-31', 1)).toBe('2100-02-28');
    // 2000 is divisible by 400, so it is a leap year.
    expect(nextServiceDue('2000-01-31', 1)).toBe('2000-02-29');
  });

  it('is null without a last service date or an interval', () => {
    expect(nextServiceDue(null, 12)).toBeNull();
    expect(nextServiceDue('2024-01-01', null)).toBeNull();
  });

  it('lands in the right month on the same day, or on that month’s last day when the day does not exist', () => {
    fc.assert(
      fc.property(fc.date({ min: new Date('1990-01-01'), max: new Date('2080-12-31'), noInvalidDate: true }), fc.integer({ min: 1, max: 120 }), (d, months) => {
        const last = d.toISOString().slice(0, 10);
        const due = nextServiceDue(last, months)!;
        const [y, m, day] = last.split('-').map(Number);
        const [dy, dm, dd] = due.split('-').map(Number);
        expect((dy - y) * 12 + (dm - m)).toBe(months);
        const daysInDueMonth = new Date(Date.UTC(dy, dm, 0)).getUTCDate();
        expect(dd).toBe(Math.min(day, daysInDueMonth));
      }),
    );
  });
});

describe('addMonths and isServiceOverdue', () => {
  it('goes back as well as forward', () => {
    expect(addMonths('2024-03-31', -1)).toBe('2024-02-29');
    expect(addMonths('2024-01-15', -13)).toBe('2022-12-15');
  });

  it('is overdue only after the due date', () => {
    expect(isServiceOverdue('2024-05-01', '2024-05-01')).toBe(false);
    expect(isServiceOverdue('2024-05-01', '2024-05-02')).toBe(true);
    expect(isServiceOverdue(null, '2024-05-02')).toBe(false);
  });
});
