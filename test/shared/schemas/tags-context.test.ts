import { describe, expect, it } from 'vitest';
import { validateFields } from '@/shared/schemas/field-errors';
import { clearTagSchema, extendTagSchema, handoverAcceptSchema, raiseTagSchema, reassignInAbsenceSchema } from '@/shared/schemas/tags';

const now = new Date('2026-03-02T10:00:00Z');
const hoursLater = (h: number) => new Date(now.getTime() + h * 3600_000);
const unchecked = { workComplete: true, guardsRefitted: false, personnelClear: true, testedSafe: false };

describe('tag schemas with the tag and the actor as context', () => {
  it('asks for every release check on an isolation only', async () => {
    const body = { reason: 'Seal replaced and tested', checks: unchecked };
    // OSHA 29 CFR 1910.147(e)(1)–(e)(2): each release check before the isolation comes off
    expect(await validateFields(clearTagSchema, body, { kind: 'isolation' })).toEqual({
      'checks.guardsRefitted': 'Confirm this before clearing.',
      'checks.testedSafe': 'Confirm this before clearing.',
    });
    expect(await validateFields(clearTagSchema, body, { kind: 'override' })).toEqual({});
    expect(await validateFields(clearTagSchema, body)).toEqual({});
  });

  it('asks for the new lock number on an isolation hand-over or reassignment', async () => {
    expect(await validateFields(handoverAcceptSchema, { lockNumber: ' ', contactPhone: '' }, { kind: 'isolation' })).toEqual({ lockNumber: 'Put your own lock on first, then give its number.' });
    expect(await validateFields(handoverAcceptSchema, { lockNumber: '', contactPhone: '' }, { kind: 'override' })).toEqual({});
    const reassign = { toUserId: 4, lockNumber: '', holderNotOnSite: true, contactAttempts: 'Called twice and the site office', reason: 'Holder off sick, work complete' };
    expect(await validateFields(reassignInAbsenceSchema, reassign, { kind: 'isolation' })).toEqual({ lockNumber: 'The new holder’s lock number.' });
    expect(await validateFields(reassignInAbsenceSchema, reassign, { kind: 'override' })).toEqual({});
  });

  it('keeps an expiry within what the role may set, and asks for a changed one', async () => {
    const reason = 'Parts delayed until tomorrow';
    // common practice, no published source: how far ahead each role may set an expiry is the organisation's choice (limits in shared/rules/tags.ts)
    expect(await validateFields(extendTagSchema, { expiresAt: hoursLater(24 * 20), reason }, { role: 'engineer', now })).toEqual({ expiresAt: 'The expiry may be at most 14 days ahead for your role.' });
    expect(await validateFields(extendTagSchema, { expiresAt: hoursLater(24 * 20), reason }, { role: 'supervisor', now })).toEqual({});
    expect(await validateFields(extendTagSchema, { expiresAt: hoursLater(-1), reason }, { role: 'supervisor', now })).toEqual({ expiresAt: 'The expiry must be in the future.' });
    const current = hoursLater(4).toISOString();
    expect(await validateFields(extendTagSchema, { expiresAt: current, reason }, { role: 'engineer', now, currentExpiry: current })).toEqual({ expiresAt: 'Choose a new expiry.' });
    expect(await validateFields(extendTagSchema, { expiresAt: hoursLater(-1), reason }, { role: 'engineer', now, currentExpiry: hoursLater(-1).toISOString() })).toEqual({ expiresAt: 'The expiry must be in the future.' });
  });

  it('accounts for every energy source recorded on the item', async () => {
    const raise = {
      kind: 'isolation', reason: 'Replace the pump seal', expiresAt: hoursLater(4), lockNumber: 'L-12',
      energySources: ['electrical'], omittedSources: [], proof: null,
      points: [{ assetId: null, description: 'DB-2 way 7', method: 'isolator-locked', lockNumber: '' }],
    };
    // OSHA 29 CFR 1910.147(d)(3)–(d)(4): every energy source is isolated, or left out with the reason it is safe
    expect(await validateFields(raiseTagSchema, raise, { role: 'engineer', now, itemSources: ['electrical', 'hot-water'] })).toEqual({
      energySources: 'Not accounted for: Hot water or steam. Isolate each one, or say why it needs no isolation.',
    });
    const omitted = { ...raise, omittedSources: [{ source: 'hot-water', reason: 'Drained down at the valves either side' }] };
    expect(await validateFields(raiseTagSchema, omitted, { role: 'engineer', now, itemSources: ['electrical', 'hot-water'] })).toEqual({});
    expect(await validateFields(raiseTagSchema, raise)).toEqual({});
  });
});
