import { describe, expect, it } from 'vitest';
import { clearancePermission, mayExtend, mayReassignInAbsence } from '@/shared/rules/permissions';
import { assetStateFromTags, clearanceReasonProblem, expiryProblem, isDueSoon, isOverdue } from '@/shared/rules/tags';
import { HANDOVER_OFFER_MINUTES, handoverRole, offerLapsesAt } from '@/shared/rules/tag-handover';
import { sourcesNotAccounted } from '@/shared/rules/tag-isolation';
import { clearInAbsenceSchema, clearTagSchema, raiseTagSchema } from '@/shared/schemas/tags';

const now = new Date('2026-12-02T10:00:00Z');
const tag = (over: Partial<{ kind: 'isolation' | 'override'; status: 'live' | 'cleared'; expiresAt: string; holderId: number }> = {}) => ({
  kind: 'isolation' as const, status: 'live' as const, expiresAt: '2026-12-02T23:59:59Z', holderId: 7, ...over,
});

describe('item state from its tags', () => {
  it('is isolated while any isolation is live, whatever the overrides', () => {
    expect(assetStateFromTags([tag(), tag({ kind: 'override' })], now)).toEqual({ state: 'isolated', liveIsolations: 1, liveOverrides: 1, unprovedIsolations: 1, overdue: false });
    expect(assetStateFromTags([tag({ kind: 'override' })], now).state).toBe('overridden');
    expect(assetStateFromTags([tag({ status: 'cleared' })], now).state).toBe('normal');
    expect(assetStateFromTags([], now).state).toBe('normal');
  });

  it('stays isolated until the last of a group of isolation tags is cleared', () => {
    // OSHA 29 CFR 1910.147(f)(3)(ii)(D): each authorized employee affixes a personal lockout or tagout device to the group mechanism; the equipment stays isolated while any one remains.
    const group = [tag({ holderId: 1 }), tag({ holderId: 2 }), tag({ holderId: 3 })];
    expect(assetStateFromTags(group, now)).toMatchObject({ state: 'isolated', liveIsolations: 3 });
    group[0].status = 'cleared';
    group[1].status = 'cleared';
    expect(assetStateFromTags(group, now)).toMatchObject({ state: 'isolated', liveIsolations: 1 });
    group[2].status = 'cleared';
    expect(assetStateFromTags(group, now).state).toBe('normal');
  });

  it('never clears a tag at its expiry: past it the tag is still live, and overdue', () => {
    // common practice, no published source: an expired tag keeps marking the hazard until a person removes it.
    const expired = tag({ expiresAt: '2026-12-01T17:00:00Z' });
    expect(isOverdue(expired, now)).toBe(true);
    expect(assetStateFromTags([expired], now)).toEqual({ state: 'isolated', liveIsolations: 1, liveOverrides: 0, unprovedIsolations: 1, overdue: true });
    expect(isOverdue({ ...expired, status: 'cleared' }, now)).toBe(false);
  });

  it('calls a tag due soon within 24 hours of its expiry', () => {
    expect(isDueSoon(tag({ expiresAt: '2026-12-03T09:59:00Z' }), now)).toBe(true);
    expect(isDueSoon(tag({ expiresAt: '2026-12-03T10:01:00Z' }), now)).toBe(false);
    expect(isDueSoon(tag({ expiresAt: '2026-12-02T09:00:00Z' }), now)).toBe(false);
  });
});

describe('who may clear, extend and take over', () => {
  it('lets only the holder clear their own tag', () => {
    // OSHA 29 CFR 1910.147(e)(3): each lockout or tagout device shall be removed from each energy isolating device by the employee who applied the device.
    expect(clearancePermission({ id: 7, role: 'engineer' }, tag())).toBe('own');
    expect(clearancePermission({ id: 8, role: 'engineer' }, tag())).toBe('none');
    expect(clearancePermission({ id: 8, role: 'viewer' }, tag())).toBe('none');
  });

  it('lets a supervisor clear another’s tag only through the removal-in-absence procedure', () => {
    // OSHA 29 CFR 1910.147(e)(3)(i)–(iii): exception when the authorized employee who applied the device is not available, under a specific documented procedure.
    expect(clearancePermission({ id: 9, role: 'supervisor' }, tag())).toBe('in-absence');
    expect(clearancePermission({ id: 9, role: 'admin' }, tag())).toBe('in-absence');
    expect(clearancePermission({ id: 7, role: 'supervisor' }, tag({ holderId: 7 }))).toBe('own');
    expect(clearancePermission({ id: 7, role: 'engineer' }, tag({ status: 'cleared' }))).toBe('none');
  });

  it('lets the holder or a supervisor extend; a hand-over needs the holder’s offer and the named colleague’s acceptance', () => {
    expect(mayExtend({ id: 7, role: 'engineer' }, tag())).toBe(true);
    expect(mayExtend({ id: 8, role: 'engineer' }, tag())).toBe(false);
    expect(mayExtend({ id: 9, role: 'supervisor' }, tag())).toBe(true);
    // OSHA 29 CFR 1910.147(f)(4): specific procedures ensure the continuity of lockout or tagout protection during shift or personnel changes, including the orderly transfer between off-going and on-coming employees.
    const offered = { ...tag(), toUserId: 8, lapsesAt: offerLapsesAt(now) };
    expect(handoverRole({ id: 7, role: 'engineer' }, offered, now)).toBe('holder');
    expect(handoverRole({ id: 8, role: 'engineer' }, offered, now)).toBe('offered');
    expect(handoverRole({ id: 9, role: 'supervisor' }, offered, now)).toBe('none');
    expect(handoverRole({ id: 8, role: 'engineer' }, { ...tag(), toUserId: null, lapsesAt: null }, now)).toBe('none');
    const later = new Date(now.getTime() + HANDOVER_OFFER_MINUTES * 60_000 + 1);
    expect(handoverRole({ id: 8, role: 'engineer' }, offered, later)).toBe('none');
    // OSHA 29 CFR 1910.147(e)(3)(i)–(iii): moving someone else's tag is a supervisor's absence procedure.
    expect(mayReassignInAbsence({ id: 9, role: 'supervisor' }, tag())).toBe(true);
    expect(mayReassignInAbsence({ id: 8, role: 'engineer' }, tag())).toBe(false);
    expect(mayReassignInAbsence({ id: 7, role: 'supervisor' }, tag())).toBe(false);
  });

  it('accounts for every energy source of the item: isolated, or left out with a reason of 10 characters or more', () => {
    // OSHA 29 CFR 1910.147(d)(3)–(d)(4): every energy isolating device needed to control the energy is operated and locked.
    expect(sourcesNotAccounted(['gas', 'electrical', 'hot-water'], ['electrical'], [])).toEqual(['gas', 'hot-water']);
    expect(sourcesNotAccounted(['gas', 'electrical', 'hot-water'], ['electrical', 'gas'], [{ source: 'hot-water', reason: 'drained down' }])).toEqual([]);
    expect(sourcesNotAccounted(['gas', 'hot-water'], ['gas'], [{ source: 'hot-water', reason: ' cold     ' }])).toEqual(['hot-water']);
  });
});

describe('expiry and reasons', () => {
  it('wants an expiry in the future and at most 14 days ahead for an engineer', () => {
    expect(expiryProblem(new Date('2026-12-02T09:00:00Z'), now, 'engineer')).toMatch(/future/);
    expect(expiryProblem(new Date('2026-12-16T09:59:00Z'), now, 'engineer')).toBeNull();
    expect(expiryProblem(new Date('2026-12-16T10:01:00Z'), now, 'engineer')).toMatch(/14 days/);
    expect(expiryProblem(new Date('2026-12-30T10:00:00Z'), now, 'supervisor')).toBeNull();
  });

  it('refuses a blank, whitespace or short clearance reason', () => {
    expect(clearanceReasonProblem('')).toMatch(/reason/);
    expect(clearanceReasonProblem('        \n  ')).toMatch(/reason/);
    expect(clearanceReasonProblem('123456789')).toMatch(/at least 10/);
    expect(clearanceReasonProblem(' 1234567890 ')).toBeNull();
  });

  it('shares the same limits in the yup schemas the form and the server use', async () => {
    await expect(clearTagSchema.validate({ reason: '  too short ' })).rejects.toThrow(/At least 10/);
    await expect(clearTagSchema.validate({ reason: 'Pump seal replaced, tested' })).resolves.toMatchObject({ checks: { workComplete: false } });
    await expect(clearInAbsenceSchema.validate({ reason: 'Holder on leave, work done', holderNotOnSite: false, contactAttempts: 'Phoned twice at 09:00' })).rejects.toThrow(/not on site/);
  });

  it('asks an isolation for energy sources and points, an override for its normal and left states', async () => {
    const base = { reason: 'Replace pump seal', expiresAt: '2026-12-02T23:59:59Z' };
    const iso = await raiseTagSchema.validate({ ...base, kind: 'isolation' }, { abortEarly: false }).catch((e) => e.errors);
    expect(iso).toEqual(expect.arrayContaining(['Choose at least one energy source that is isolated.', 'Add at least one isolation point and its method.']));
    const ovr = await raiseTagSchema.validate({ ...base, kind: 'override' }, { abortEarly: false }).catch((e) => e.errors);
    expect(ovr).toEqual(expect.arrayContaining(['Say what the normal state is.', 'Say the state it was left in.']));
    await expect(raiseTagSchema.validate({ ...base, kind: 'override', normalState: 'Setpoint 80 °C', leftState: 'Setpoint 85 °C' })).resolves.toBeTruthy();
    await expect(raiseTagSchema.validate({ ...base, kind: 'isolation', energySources: ['electrical'], points: [{ method: 'isolator-locked' }] })).rejects.toThrow(/Choose a plant item or describe/);
  });
});
