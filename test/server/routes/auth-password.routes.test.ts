import request from 'supertest';
import { backgroundSettled } from '@/server/lib/background';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { clock } from '@/server/lib/clock';
import { AuditEvent } from '@/server/models/audit-event.model';
import { User } from '@/server/models/user.model';
import { createOrganisation, tokenFor, TEST_PASSWORD, type OrgUsers } from '@/test/setup/app';
import { outboxRows, setupMailTestApp, TEST_PUBLIC_URL } from '@/test/server/support/mail-test-app';

let env: Awaited<ReturnType<typeof setupMailTestApp>>;
let u: OrgUsers;

beforeAll(async () => {
  env = await setupMailTestApp();
  u = (await createOrganisation('yew')).users;
});
afterAll(() => env.close());
beforeEach(() => env.inbox.clear());
afterEach(() => { clock.now = () => new Date(); });

// The link is issued after the answer has gone; wait for that work before looking at the outbox.
const resetRequest = async (email: string) => {
  const res = await request(env.t.app).post('/api/auth/password/reset-request').send({ email });
  await backgroundSettled();
  return res;
};
const setPassword = (token: string, password: string) => request(env.t.app).post('/api/auth/password/set').send({ token, password });
const signIn = (email: string, password: string) => request(env.t.app).post('/api/auth/login').send({ email, password });
const tokenIn = (text: string) => /\/set-password\?token=([A-Za-z0-9_-]+)/.exec(text)![1];

describe('POST /api/auth/password/reset-request', () => {
  it('answers an unknown address exactly as a known one, and sends nothing for it', async () => {
    const before = (await outboxRows(env.t)).length;
    const unknown = await resetRequest('nobody@yew.test');
    const known = await resetRequest(u.engineer.email);
    expect(unknown.status).toBe(202);
    expect(known.status).toBe(202);
    expect(unknown.body).toEqual(known.body);
    expect(unknown.body.message).toMatch(/If that address belongs to an active account/);
    const rows = await outboxRows(env.t);
    expect(rows.length).toBe(before + 1);
    expect(rows[rows.length - 1]).toMatchObject({ kind: 'password-reset', to_email: u.engineer.email });
    await env.worker.runOnce();
    expect(await env.inbox.to('nobody@yew.test')).toEqual([]);
    expect(await env.inbox.to(u.engineer.email)).toHaveLength(1);
  });

  it('sends nothing to a deactivated account, with the same answer', async () => {
    await User.update({ active: false }, { where: { id: u.viewer.id } });
    const res = await resetRequest(u.viewer.email);
    expect(res.status).toBe(202);
    expect((await outboxRows(env.t, `to_email = '${u.viewer.email}'`)).length).toBe(0);
    await User.update({ active: true }, { where: { id: u.viewer.id } });
  });
});

describe('POST /api/auth/password/set with a reset link', () => {
  it('works once within the hour, ends existing sessions, and is audited', async () => {
    const session = await tokenFor(env.t.app, u.engineer2);
    const start = Date.now();
    clock.now = () => new Date(start);
    expect((await resetRequest(u.engineer2.email)).status).toBe(202);
    await env.worker.runOnce();
    const [mail] = await env.inbox.to(u.engineer2.email);
    expect(mail.subject).toBe('Reset your Isoledger password');
    expect(mail.text).toContain(`${TEST_PUBLIC_URL}/set-password?token=`);
    const token = tokenIn(mail.text!);

    clock.now = () => new Date(start + 59 * 60_000);
    expect((await setPassword(token, 'fresh-password-2025')).status).toBe(200);
    expect((await setPassword(token, 'second-password-2025')).body.error.code).toBe('link-invalid');
    expect((await signIn(u.engineer2.email, TEST_PASSWORD)).status).toBe(401);
    expect((await signIn(u.engineer2.email, 'fresh-password-2025')).status).toBe(200);
    expect((await request(env.t.app).get('/api/me').set('Authorization', `Bearer ${session}`)).status).toBe(401);
    const audit = await AuditEvent.findAll({ where: { type: 'password-reset', userId: u.engineer2.id }, order: [['id', 'ASC']] });
    expect(audit.map((e) => e.detail)).toEqual([{ stage: 'link-sent' }, { stage: 'password-set', purpose: 'reset' }]);
  });

  it('refuses a link after one hour, and an earlier link once a newer one is sent', async () => {
    const start = Date.now();
    clock.now = () => new Date(start);
    await resetRequest(u.supervisor.email);
    await resetRequest(u.supervisor.email);
    await env.worker.runOnce();
    const [older, newer] = (await env.inbox.to(u.supervisor.email)).map((m) => tokenIn(m.text!));
    expect(older).not.toBe(newer);
    expect((await setPassword(older, 'replacement-password')).status).toBe(400);
    clock.now = () => new Date(start + 61 * 60_000);
    expect((await setPassword(newer, 'replacement-password')).status).toBe(400);
    expect((await signIn(u.supervisor.email, TEST_PASSWORD)).status).toBe(200);
  });

  it('refuses a made-up token and a short password', async () => {
    expect((await setPassword('not-a-real-token', 'long-enough-password')).status).toBe(400);
    const short = await setPassword('whatever', 'short');
    expect(short.status).toBe(422);
    expect(short.body.error.fields).toHaveProperty('password');
  });

  it('refuses a password over 72 bytes with a message saying so, rather than letting bcrypt cut it', async () => {
    // OpenBSD bcrypt(3): only the first 72 bytes of the key are used.
    const accents = 'é'.repeat(37); // 37 letters, 74 bytes in UTF-8
    const res = await setPassword('whatever', accents);
    expect(res.status).toBe(422);
    expect(res.body.error.fields.password).toMatch(/72 bytes/);
    expect((await setPassword('whatever', 'a'.repeat(73))).body.error.fields.password).toMatch(/72 bytes/);
    // 72 bytes exactly passes the form check and reaches the link check.
    expect((await setPassword('not-a-real-token', 'a'.repeat(72))).status).toBe(400);
  });
});

describe('GET/PATCH /api/me/settings', () => {
  it('starts with every e-mail the role can receive on, and saves changes and the contact phone', async () => {
    const sup = await tokenFor(env.t.app, u.supervisor);
    const first = await request(env.t.app).get('/api/me/settings').set('Authorization', `Bearer ${sup}`);
    expect(first.body).toEqual({ email: u.supervisor.email, contactPhone: null, notifications: { raised: true, cleared: true, digest: true, myTags: true }, available: ['raised', 'cleared', 'digest', 'myTags'] });
    const saved = await request(env.t.app).patch('/api/me/settings').set('Authorization', `Bearer ${sup}`).send({ contactPhone: '+44 7700 900555', notifications: { digest: false } });
    expect(saved.body).toMatchObject({ contactPhone: '+44 7700 900555', notifications: { raised: true, digest: false } });
    expect((await User.findByPk(u.supervisor.id))!.phone).toBe('+44 7700 900555');
    expect((await request(env.t.app).patch('/api/me/settings').set('Authorization', `Bearer ${sup}`).send({ contactPhone: 'call me' })).status).toBe(422);
  });

  it('offers an engineer only the e-mails about their own tags, and ignores the rest', async () => {
    const token = await tokenFor(env.t.app, u.engineer);
    const res = await request(env.t.app).patch('/api/me/settings').set('Authorization', `Bearer ${token}`).send({ notifications: { raised: true, myTags: false } });
    expect(res.body).toMatchObject({ available: ['myTags'], notifications: { raised: false, cleared: false, digest: false, myTags: false } });
  });
});
