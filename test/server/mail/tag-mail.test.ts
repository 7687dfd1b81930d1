import request from 'supertest';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { clock } from '@/server/lib/clock';
import { createOutboxWorker } from '@/server/mail/outbox-worker';
import { enqueueMail } from '@/server/mail/outbox';
import { createOrganisation, tokenFor, type OrgUsers } from '@/test/setup/app';
import { createSiteWithAssets } from '@/test/setup/register-fixtures';
import { outboxRows, setupMailTestApp, TEST_PUBLIC_URL } from '@/test/server/support/mail-test-app';

let env: Awaited<ReturnType<typeof setupMailTestApp>>;
let u: OrgUsers;
let plant: Awaited<ReturnType<typeof createSiteWithAssets>>;
const tok: Record<string, string> = {};

beforeAll(async () => {
  env = await setupMailTestApp();
  const org = await createOrganisation('rowan');
  u = org.users;
  plant = await createSiteWithAssets(org.organisation.id, u.supervisor.id, { name: 'Rowan Library' });
  for (const k of ['admin', 'supervisor', 'engineer', 'engineer2', 'viewer'] as const) tok[k] = await tokenFor(env.t.app, u[k]);
});
afterAll(() => env.close());
beforeEach(() => env.inbox.clear());
afterEach(() => { clock.now = () => new Date(); });

const post = (who: string, path: string, body: object) => request(env.t.app).post(path).set('Authorization', `Bearer ${tok[who]}`).send(body);
const inHours = (h: number) => new Date(clock.now().getTime() + h * 3600_000).toISOString();
const allChecks = { workComplete: true, guardsRefitted: true, personnelClear: true, testedSafe: true };
const raise = async (who = 'engineer', assetId = plant.pump.id) => {
  const res = await post(who, `/api/assets/${assetId}/tags`, {
    kind: 'isolation', reason: 'Replace mechanical seal', expiresAt: inHours(6), energySources: ['electrical'], lockNumber: 'RW-12',
    omittedSources: ['mechanical', 'hot-water', 'stored-pressure'].map((source) => ({ source, reason: 'Pump valved off and drained; nothing can turn it' })),
    points: [{ assetId: plant.isolator.id, method: 'isolator-locked' }], contactPhone: '+44 7700 900222',
  });
  expect(res.status).toBe(201);
  return res.body as { id: number };
};
const deliver = async () => {
  const r = await env.worker.runOnce();
  expect(r.failed).toBe(0);
  return r;
};
const subjectsFor = async (email: string) => (await env.inbox.to(email)).map((m) => m.subject);

describe('tag e-mails over SMTP', () => {
  it('tells supervisors and admins, not the raiser or a viewer, when an isolation is raised, with a link to the tag', async () => {
    const tag = await raise();
    expect(await deliver()).toEqual({ sent: 2, failed: 0 });
    const [toSupervisor] = await env.inbox.to(u.supervisor.email);
    expect(toSupervisor.subject).toBe('Isolation raised: P-01 Heating pump 1 (Rowan Library)');
    expect(toSupervisor.from[0].address).toBe('no-reply@isoledger.example');
    expect(toSupervisor.text).toContain(`${TEST_PUBLIC_URL}/tags/${tag.id}`);
    expect(toSupervisor.text).toContain(`${TEST_PUBLIC_URL}/assets/${plant.pump.id}`);
    expect(toSupervisor.text).toContain('Holder: rowan engineer');
    expect(toSupervisor.html).toContain(`href="${TEST_PUBLIC_URL}/tags/${tag.id}"`);
    expect(await subjectsFor(u.admin.email)).toEqual(['Isolation raised: P-01 Heating pump 1 (Rowan Library)']);
    expect(await subjectsFor(u.engineer.email)).toEqual([]);
    expect(await subjectsFor(u.viewer.email)).toEqual([]);
    const rows = await outboxRows(env.t, `JSON_VALUE(payload, '$.tag.id') = ${tag.id}`);
    expect(rows.every((r) => r.sent_at !== null && r.attempts === 1)).toBe(true);
  });

  it('respects a supervisor who turned raised e-mails off', async () => {
    const off = await request(env.t.app).patch('/api/me/settings').set('Authorization', `Bearer ${tok.supervisor}`).send({ notifications: { raised: false } });
    expect(off.body.notifications).toMatchObject({ raised: false, cleared: true });
    await raise();
    await deliver();
    expect(await subjectsFor(u.supervisor.email)).toEqual([]);
    expect(await subjectsFor(u.admin.email)).toHaveLength(1);
    await request(env.t.app).patch('/api/me/settings').set('Authorization', `Bearer ${tok.supervisor}`).send({ notifications: { raised: true } });
  });

  it('tells supervisors when the holder clears, with the reason', async () => {
    const tag = await raise();
    await deliver();
    await env.inbox.clear();
    expect((await post('engineer', `/api/tags/${tag.id}/clear`, { reason: 'Seal replaced and pump run on test', checks: allChecks })).status).toBe(200);
    await deliver();
    const [mail] = await env.inbox.to(u.supervisor.email);
    expect(mail.subject).toBe('Isolation cleared: P-01 Heating pump 1 (Rowan Library)');
    expect(mail.text).toContain('Clearance reason: Seal replaced and pump run on test');
    expect(mail.text).toContain(`${TEST_PUBLIC_URL}/tags/${tag.id}`);
    expect(await subjectsFor(u.engineer.email)).toEqual([]);
  });

  it('tells the holder, with a caution and whatever their settings, and the other supervisors when a tag is cleared in the holder’s absence', async () => {
    const tag = await raise();
    await deliver();
    await env.inbox.clear();
    await request(env.t.app).patch('/api/me/settings').set('Authorization', `Bearer ${tok.engineer}`).send({ notifications: { myTags: false } });
    const res = await post('supervisor', `/api/tags/${tag.id}/clear-in-absence`, {
      reason: 'Holder off site, pump needed for heating', holderNotOnSite: true, contactAttempts: 'Phoned twice at 09:10 and 09:25, no answer', checks: allChecks,
    });
    expect(res.status).toBe(200);
    await deliver();
    const [toHolder] = await env.inbox.to(u.engineer.email);
    expect(toHolder.subject).toBe('Your isolation on P-01 Heating pump 1 (Rowan Library) was cleared in your absence');
    expect(toHolder.text).toContain(`${TEST_PUBLIC_URL}/tags/${tag.id}`);
    // OSHA 29 CFR 1910.147(e)(3)(iii): the authorized employee is to know the device was removed before resuming work.
    expect(toHolder.text).toMatch(/CAUTION: Do not resume work on this item until you have spoken to rowan supervisor/);
    expect(await subjectsFor(u.admin.email)).toEqual(['Isolation cleared in the holder’s absence: P-01 Heating pump 1 (Rowan Library)']);
    expect(await subjectsFor(u.supervisor.email)).toEqual([]);
    await request(env.t.app).patch('/api/me/settings').set('Authorization', `Bearer ${tok.engineer}`).send({ notifications: { myTags: true } });
    expect((await post('engineer', `/api/tags/${tag.id}/acknowledge`, {})).status).toBe(200);
  });

  it('tells the previous holder when their colleague accepts the hand-over, and no one else', async () => {
    const tag = await raise();
    await deliver();
    await env.inbox.clear();
    expect((await post('engineer', `/api/tags/${tag.id}/handover`, { toUserId: u.engineer2.id, note: 'Shift change, lock RW-12 coming off after yours' })).status).toBe(200);
    expect((await post('engineer2', `/api/tags/${tag.id}/handover/accept`, { lockNumber: 'RW-31' })).status).toBe(200);
    await deliver();
    const [mail] = await env.inbox.to(u.engineer.email);
    expect(mail.subject).toBe('Your isolation on P-01 Heating pump 1 (Rowan Library) was handed over to rowan engineer2');
    expect(mail.text).toContain('Hand-over note: Shift change, lock RW-12 coming off after yours');
    expect(mail.text).toContain(`${TEST_PUBLIC_URL}/tags/${tag.id}`);
    expect((await env.inbox.all()).map((m) => m.to[0].address)).toEqual([u.engineer.email]);
  });

  it('tells both people when a supervisor reassigns a tag in the holder’s absence, whatever their settings', async () => {
    const tag = await raise();
    await deliver();
    await env.inbox.clear();
    for (const who of ['engineer', 'engineer2']) {
      await request(env.t.app).patch('/api/me/settings').set('Authorization', `Bearer ${tok[who]}`).send({ notifications: { myTags: false } });
    }
    const res = await post('supervisor', `/api/tags/${tag.id}/reassign-in-absence`, {
      reason: 'Holder off sick, seal job continues', holderNotOnSite: true, contactAttempts: 'Phoned at 09:10 and 09:25, texted, no answer', toUserId: u.engineer2.id, lockNumber: 'RW-77',
    });
    expect(res.status).toBe(200);
    await deliver();
    // OSHA 29 CFR 1910.147(e)(3)(iii): the person whose lock was removed is told before resuming work.
    expect(await subjectsFor(u.engineer.email)).toEqual(['Your isolation on P-01 Heating pump 1 (Rowan Library) was reassigned in your absence']);
    const [toTaker] = await env.inbox.to(u.engineer2.email);
    expect(toTaker.subject).toBe('You now hold the isolation on P-01 Heating pump 1 (Rowan Library)');
    expect(toTaker.text).toContain('with lock RW-77');
    expect(toTaker.text).toContain('Reason: Holder off sick, seal job continues');
    expect(toTaker.text).toMatch(/CAUTION: Before anyone works on this item, check on site that your own lock is on every isolation point/);
    expect(toTaker.text).toContain(`${TEST_PUBLIC_URL}/tags/${tag.id}`);
    expect(await subjectsFor(u.supervisor.email)).toEqual([]);
    for (const who of ['engineer', 'engineer2']) {
      await request(env.t.app).patch('/api/me/settings').set('Authorization', `Bearer ${tok[who]}`).send({ notifications: { myTags: true } });
    }
    expect((await post('engineer', `/api/tags/${tag.id}/acknowledge`, {})).status).toBe(200);
  });

  it('writes no mail for an action that fails', async () => {
    const before = (await outboxRows(env.t)).length;
    expect((await post('engineer', `/api/assets/${plant.pump.id}/tags`, { kind: 'isolation', reason: '', expiresAt: inHours(2) })).status).toBe(422);
    const tag = await raise();
    expect((await post('engineer2', `/api/tags/${tag.id}/clear`, { reason: 'Not mine to clear at all', checks: allChecks })).status).toBe(403);
    expect((await outboxRows(env.t)).length).toBe(before + 2);
  });
});

describe('outbox worker', () => {
  it('keeps the action and the mail when the mail server is down, and delivers after it comes back', async () => {
    await env.worker.runOnce();
    await env.inbox.stop();
    const tag = await raise();
    const mine = `JSON_VALUE(payload, '$.tag.id') = ${tag.id}`;
    // The server is unreachable: one attempt, and the rest of the batch is handed back for the next poll.
    expect(await env.worker.runOnce()).toEqual({ sent: 0, failed: 1 });
    expect((await outboxRows(env.t, mine)).map((r) => r.attempts)).toEqual([1, 0]);
    expect(await env.worker.runOnce()).toEqual({ sent: 0, failed: 1 });
    let rows = await outboxRows(env.t, mine);
    expect(rows.map((r) => [r.attempts, r.sent_at])).toEqual([[1, null], [1, null]]);
    expect(rows[0].last_error).toMatch(/ECONNREFUSED|ESOCKET|ECONNECTION/);
    expect(new Date(rows[0].next_attempt_at).getTime()).toBeGreaterThan(Date.now() + 20_000);
    // Backing off: nothing is due yet.
    expect(await env.worker.runOnce()).toEqual({ sent: 0, failed: 0 });

    await env.inbox.start();
    const later = Date.now() + 45_000;
    clock.now = () => new Date(later);
    expect(await env.worker.runOnce()).toEqual({ sent: 2, failed: 0 });
    rows = await outboxRows(env.t, mine);
    expect(rows.map((r) => r.attempts)).toEqual([2, 2]);
    expect(await subjectsFor(u.supervisor.email)).toEqual(['Isolation raised: P-01 Heating pump 1 (Rowan Library)']);
  });

  it('sends each message once when two workers claim at the same moment', async () => {
    await env.worker.runOnce();
    await env.inbox.clear();
    const mails = Array.from({ length: 12 }, (_, i) => ({
      organisationId: u.admin.organisationId, kind: 'password-reset' as const, toEmail: `parallel-${i}@rowan.test`, toUserId: null,
      payload: { recipientName: `Person ${i}`, token: `token-${i}`, expiresAt: new Date(Date.now() + 3600_000).toISOString() },
    }));
    await enqueueMail(env.t.db.sequelize, mails, null);
    const a = createOutboxWorker({ sequelize: env.t.db.sequelize, mail: env.t.config.mail, publicUrl: TEST_PUBLIC_URL, name: 'a', batchSize: 8 });
    const b = createOutboxWorker({ sequelize: env.t.db.sequelize, mail: env.t.config.mail, publicUrl: TEST_PUBLIC_URL, name: 'b', batchSize: 8 });
    const results = await Promise.all([a.runOnce(), b.runOnce(), a.runOnce(), b.runOnce()]);
    expect(results.reduce((n, r) => n + r.sent, 0)).toBe(12);
    const received = (await env.inbox.all()).map((m) => m.to[0].address).sort();
    expect(received).toEqual(mails.map((m) => m.toEmail).sort());
    // The link token is not kept once the mail has gone.
    const rows = await outboxRows(env.t, "to_email LIKE 'parallel-%'");
    expect(rows).toHaveLength(12);
    expect(rows.every((r) => r.sent_at && !('token' in r.payload))).toBe(true);
  });
});
