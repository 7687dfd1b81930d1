import request from 'supertest';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { clock } from '@/server/lib/clock';
import { Tag } from '@/server/models/tag.model';
import { TagEvent } from '@/server/models/tag-event.model';
import { HANDOVER_OFFER_MINUTES } from '@/shared/rules/tag-handover';
import { createOrganisation, setupTestApp, tokenFor, type OrgUsers, type TestApp } from '@/test/setup/app';
import { createSiteWithAssets } from '@/test/setup/register-fixtures';

let t: TestApp;
let u: OrgUsers;
let birch: OrgUsers;
let plant: Awaited<ReturnType<typeof createSiteWithAssets>>;
const tok: Record<string, string> = {};

beforeAll(async () => {
  t = await setupTestApp();
  const org = await createOrganisation('hazel');
  u = org.users;
  birch = (await createOrganisation('birch')).users;
  plant = await createSiteWithAssets(org.organisation.id, u.supervisor.id);
  for (const k of ['admin', 'supervisor', 'engineer', 'engineer2', 'viewer'] as const) tok[k] = await tokenFor(t.app, u[k]);
  tok.birch = await tokenFor(t.app, birch.engineer);
});
afterAll(() => t.close());
afterEach(() => { clock.now = () => new Date(); });

const as = (who: string) => ({
  get: (path: string) => request(t.app).get(path).set('Authorization', `Bearer ${tok[who]}`),
  post: (path: string, body: object = {}, headers: Record<string, string> = {}) => request(t.app).post(path).set('Authorization', `Bearer ${tok[who]}`).set(headers).send(body),
});
const inHours = (h: number) => new Date(clock.now().getTime() + h * 3600_000).toISOString();
const allChecks = { workComplete: true, guardsRefitted: true, personnelClear: true, testedSafe: true };
const raise = async (who = 'engineer') => {
  const res = await as(who).post(`/api/assets/${plant.isolator.id}/tags`, {
    kind: 'isolation', reason: 'Rewire pump 1 starter', expiresAt: inHours(8), energySources: ['electrical'],
    points: [{ description: 'MCC-1 way 4 isolator', method: 'isolator-locked' }], lockNumber: 'PL-031',
  });
  expect(res.status).toBe(201);
  return res.body as { id: number };
};
const eventTypes = async (id: number) => (await as('supervisor').get(`/api/tags/${id}`)).body.events.map((e: { type: string }) => e.type);

describe('POST /api/tags/:id/handover (offer) and /handover/accept', () => {
  it('transfers the tag only when the named colleague accepts with their own lock, both people recorded in one event', async () => {
    const tag = await raise('engineer');
    const offer = await as('engineer').post(`/api/tags/${tag.id}/handover`, { toUserId: u.engineer2.id, note: 'Starter half rewired; terminals 3–6 still loose' });
    expect(offer.status).toBe(200);
    // Offering changes nothing about who holds it.
    expect(offer.body).toMatchObject({ holder: { id: u.engineer.id }, lockNumber: 'PL-031', handoverOffer: { to: { id: u.engineer2.id, name: 'hazel engineer2' }, note: expect.stringMatching(/terminals/) } });
    const lapse = Date.parse(offer.body.handoverOffer.lapsesAt) - Date.parse(offer.body.handoverOffer.offeredAt);
    expect(lapse).toBe(HANDOVER_OFFER_MINUTES * 60_000);
    // The colleague sees the offer in their list.
    expect((await as('engineer2').get('/api/tags?offeredTo=me')).body.items.map((x: { id: number }) => x.id)).toEqual([tag.id]);

    // OSHA 29 CFR 1910.147(f)(4): orderly transfer between off-going and on-coming employees; the on-coming lock goes on first.
    const noLock = await as('engineer2').post(`/api/tags/${tag.id}/handover/accept`, {});
    expect(noLock.status).toBe(422);
    expect(noLock.body.error.fields).toHaveProperty('lockNumber');
    const accepted = await as('engineer2').post(`/api/tags/${tag.id}/handover/accept`, { lockNumber: 'PL-044' });
    expect(accepted.status).toBe(200);
    // OSHA 29 CFR 1910.147(c)(5)(ii)(D): the device identifies the employee applying it – the record now names the new holder and their lock.
    expect(accepted.body).toMatchObject({ holder: { id: u.engineer2.id }, raisedBy: { id: u.engineer.id }, lockNumber: 'PL-044', handoverOffer: null });
    const event = accepted.body.events.at(-1);
    expect(event).toMatchObject({
      type: 'handed-over', by: { id: u.engineer2.id },
      data: { from: { id: u.engineer.id, name: 'hazel engineer' }, to: { id: u.engineer2.id }, fromLockNumber: 'PL-031', lockNumber: 'PL-044', note: expect.stringMatching(/terminals/) },
    });
    const row = await Tag.findByPk(tag.id);
    expect(row).toMatchObject({ holderId: u.engineer2.id, lockNumber: 'PL-044', offerToId: null });
    // OSHA 29 CFR 1910.147(e)(3): only the person whose lock is on removes it – the off-going engineer no longer can.
    expect((await as('engineer').post(`/api/tags/${tag.id}/clear`, { reason: 'Clearing my old tag', checks: allChecks })).status).toBe(403);
    expect((await as('engineer2').post(`/api/tags/${tag.id}/clear`, { reason: 'Starter rewired and tested', checks: allChecks })).status).toBe(200);
  });

  it('refuses everyone else with 403 naming the holder, and a viewer, another organisation and a self-offer', async () => {
    const tag = await raise('engineer');
    // Nobody takes a colleague's tag in one step any more: the old take-over is refused.
    const takeOver = await as('engineer2').post(`/api/tags/${tag.id}/handover`, { toUserId: u.engineer2.id });
    expect(takeOver.status).toBe(403);
    expect(takeOver.body.error.message).toMatch(/held by hazel engineer/);
    expect((await as('engineer2').post(`/api/tags/${tag.id}/handover/accept`, { lockNumber: 'PL-099' })).body.error.message).toMatch(/held by hazel engineer/);
    expect((await as('engineer').post(`/api/tags/${tag.id}/handover`, { toUserId: u.engineer.id })).status).toBe(422);
    expect((await as('engineer').post(`/api/tags/${tag.id}/handover`, { toUserId: u.viewer.id })).status).toBe(422);
    expect((await as('engineer').post(`/api/tags/${tag.id}/handover`, { toUserId: birch.engineer.id })).status).toBe(422);
    expect((await as('birch').post(`/api/tags/${tag.id}/handover/accept`, { lockNumber: 'X-1' })).status).toBe(404);

    expect((await as('engineer').post(`/api/tags/${tag.id}/handover`, { toUserId: u.engineer2.id })).status).toBe(200);
    // A supervisor who was not named cannot accept either.
    const sup = await as('supervisor').post(`/api/tags/${tag.id}/handover/accept`, { lockNumber: 'PL-050' });
    expect(sup.status).toBe(403);
    expect(sup.body.error.message).toMatch(/held by hazel engineer/);
    expect((await as('viewer').post(`/api/tags/${tag.id}/handover/withdraw`)).status).toBe(403);
    expect((await as('engineer2').post(`/api/tags/${tag.id}/handover/withdraw`)).status).toBe(403);
    expect((await Tag.findByPk(tag.id))!.holderId).toBe(u.engineer.id);
  });

  it('lets the holder withdraw the offer, after which the colleague cannot accept', async () => {
    const tag = await raise('engineer');
    await as('engineer').post(`/api/tags/${tag.id}/handover`, { toUserId: u.engineer2.id, note: 'Shift change' });
    expect((await as('engineer').post(`/api/tags/${tag.id}/handover`, { toUserId: u.supervisor.id })).status).toBe(409);
    const withdrawn = await as('engineer').post(`/api/tags/${tag.id}/handover/withdraw`);
    expect(withdrawn.status).toBe(200);
    expect(withdrawn.body.handoverOffer).toBeNull();
    expect((await as('engineer2').post(`/api/tags/${tag.id}/handover/accept`, { lockNumber: 'PL-044' })).status).toBe(403);
    expect(await eventTypes(tag.id)).toEqual(['raised', 'handover-offered', 'handover-withdrawn']);
  });

  it(`lets an unanswered offer lapse after ${HANDOVER_OFFER_MINUTES} minutes`, async () => {
    const tag = await raise('engineer');
    await as('engineer').post(`/api/tags/${tag.id}/handover`, { toUserId: u.engineer2.id });
    const start = Date.now();
    clock.now = () => new Date(start + (HANDOVER_OFFER_MINUTES + 1) * 60_000);
    expect((await as('engineer').get(`/api/tags/${tag.id}`)).body.handoverOffer).toBeNull();
    const late = await as('engineer2').post(`/api/tags/${tag.id}/handover/accept`, { lockNumber: 'PL-044' });
    expect(late.status).toBe(409);
    expect(late.body.error.code).toBe('offer-lapsed');
    // The holder may offer again once it has lapsed.
    expect((await as('engineer').post(`/api/tags/${tag.id}/handover`, { toUserId: u.engineer2.id })).status).toBe(200);
  });

  it('writes one event for a retried offer or acceptance with the same Idempotency-Key; a different body gets 422', async () => {
    const tag = await raise('engineer');
    const key = { 'Idempotency-Key': `offer-${tag.id}` };
    const first = await as('engineer').post(`/api/tags/${tag.id}/handover`, { toUserId: u.engineer2.id, note: 'A' }, key);
    const again = await as('engineer').post(`/api/tags/${tag.id}/handover`, { toUserId: u.engineer2.id, note: 'A' }, key);
    expect([first.status, again.status]).toEqual([200, 200]);
    expect((await as('engineer').post(`/api/tags/${tag.id}/handover`, { toUserId: u.supervisor.id, note: 'B' }, key)).status).toBe(422);
    const acceptKey = { 'Idempotency-Key': `accept-${tag.id}` };
    await as('engineer2').post(`/api/tags/${tag.id}/handover/accept`, { lockNumber: 'PL-044' }, acceptKey);
    expect((await as('engineer2').post(`/api/tags/${tag.id}/handover/accept`, { lockNumber: 'PL-044' }, acceptKey)).status).toBe(200);
    expect(await TagEvent.count({ where: { tagId: tag.id, type: 'handover-offered' } })).toBe(1);
    expect(await TagEvent.count({ where: { tagId: tag.id, type: 'handed-over' } })).toBe(1);
  });
});

describe('POST /api/tags/:id/reassign-in-absence', () => {
  const evidence = { reason: 'Holder off sick, work continues', holderNotOnSite: true, contactAttempts: 'Phoned 07700 900311 at 08:05 and 08:30; texted; office rang home' };

  it('lets a supervisor move an absent holder’s tag only with the absence evidence; the holder is told and must acknowledge', async () => {
    const tag = await raise('engineer');
    expect((await as('engineer2').post(`/api/tags/${tag.id}/reassign-in-absence`, { ...evidence, toUserId: u.engineer2.id, lockNumber: 'PL-060' })).status).toBe(403);
    const noEvidence = await as('supervisor').post(`/api/tags/${tag.id}/reassign-in-absence`, { reason: 'Holder off sick, work continues', toUserId: u.engineer2.id, lockNumber: 'PL-060' });
    expect(noEvidence.status).toBe(422);
    expect(Object.keys(noEvidence.body.error.fields)).toEqual(expect.arrayContaining(['holderNotOnSite', 'contactAttempts']));
    expect((await as('supervisor').post(`/api/tags/${tag.id}/reassign-in-absence`, { ...evidence, toUserId: u.engineer2.id })).status).toBe(422);

    // OSHA 29 CFR 1910.147(e)(3)(i)–(iii): verified not on site, reasonable efforts to reach them, told before resuming work.
    const ok = await as('supervisor').post(`/api/tags/${tag.id}/reassign-in-absence`, { ...evidence, toUserId: u.engineer2.id, lockNumber: 'PL-060' });
    expect(ok.status).toBe(200);
    expect(ok.body).toMatchObject({ status: 'live', holder: { id: u.engineer2.id }, lockNumber: 'PL-060' });
    expect(ok.body.events.at(-1)).toMatchObject({
      type: 'reassigned-in-absence', by: { id: u.supervisor.id },
      data: { holderNotOnSite: true, from: { id: u.engineer.id }, to: { id: u.engineer2.id }, fromLockNumber: 'PL-031', holderToBeInformed: true },
    });
    expect((await as('engineer').get('/api/tag-notices')).body).toEqual([expect.objectContaining({ tagId: tag.id, kind: 'reassigned-in-absence' })]);
    // Until the old holder acknowledges, they cannot raise, extend, clear or accept anything.
    const other = await raiseAs('engineer2');
    await as('engineer2').post(`/api/tags/${other}/handover`, { toUserId: u.engineer.id });
    for (const attempt of [
      as('engineer').post(`/api/assets/${plant.isolator.id}/tags`, { kind: 'override', reason: 'Starter on hand', expiresAt: inHours(2), normalState: 'Auto', leftState: 'Hand' }),
      as('engineer').post(`/api/tags/${other}/handover/accept`, { lockNumber: 'PL-031' }),
    ]) {
      const res = await attempt;
      expect(res.status).toBe(409);
      expect(res.body.error.code).toBe('acknowledge-first');
    }
    const ack = await as('engineer').post(`/api/tags/${tag.id}/acknowledge`);
    expect(ack.body.events.at(-1)).toMatchObject({ type: 'acknowledged', by: { id: u.engineer.id } });
    expect((await as('engineer').post(`/api/tags/${other}/handover/accept`, { lockNumber: 'PL-031' })).status).toBe(200);
  });
});

async function raiseAs(who: string) {
  return (await raise(who)).id;
}
