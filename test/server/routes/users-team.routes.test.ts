import request from 'supertest';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { clock } from '@/server/lib/clock';
import { AuditEvent } from '@/server/models/audit-event.model';
import { User } from '@/server/models/user.model';
import { createOrganisation, tokenFor, TEST_PASSWORD, type OrgUsers } from '@/test/setup/app';
import { createSiteWithAssets } from '@/test/setup/register-fixtures';
import { setupMailTestApp, TEST_PUBLIC_URL } from '@/test/server/support/mail-test-app';

let env: Awaited<ReturnType<typeof setupMailTestApp>>;
let u: OrgUsers;
let other: OrgUsers;
let siteIds: number[] = [];
let foreignSiteId = 0;
const tok: Record<string, string> = {};

beforeAll(async () => {
  env = await setupMailTestApp();
  const org = await createOrganisation('linden');
  u = org.users;
  other = (await createOrganisation('maple')).users;
  siteIds = [(await createSiteWithAssets(org.organisation.id, u.admin.id, { name: 'North Pool' })).site.id, (await createSiteWithAssets(org.organisation.id, u.admin.id, { name: 'South Pool' })).site.id];
  foreignSiteId = (await createSiteWithAssets(other.admin.organisationId, other.admin.id, { name: 'Maple Hall' })).site.id;
  for (const k of ['admin', 'supervisor', 'engineer', 'engineer2', 'viewer'] as const) tok[k] = await tokenFor(env.t.app, u[k]);
});
afterAll(() => env.close());
afterEach(() => { clock.now = () => new Date(); });

const as = (who: string) => ({
  get: (path: string) => request(env.t.app).get(path).set('Authorization', `Bearer ${tok[who]}`),
  post: (path: string, body: object = {}) => request(env.t.app).post(path).set('Authorization', `Bearer ${tok[who]}`).send(body),
  patch: (path: string, body: object) => request(env.t.app).patch(path).set('Authorization', `Bearer ${tok[who]}`).send(body),
  put: (path: string, body: object) => request(env.t.app).put(path).set('Authorization', `Bearer ${tok[who]}`).send(body),
});
const auditOf = (type: string, userId: number) => AuditEvent.findAll({ where: { type, userId }, order: [['id', 'ASC']] });
const linkToken = (text: string) => {
  const match = new RegExp(`${TEST_PUBLIC_URL.replace(/[.:/]/g, '\\$&')}/set-password\\?token=([A-Za-z0-9_-]+)`).exec(text);
  expect(match).not.toBeNull();
  return match![1];
};
const setPassword = (token: string, password = 'a-long-new-password') => request(env.t.app).post('/api/auth/password/set').send({ token, password });
const signIn = (email: string, password: string) => request(env.t.app).post('/api/auth/login').send({ email, password });

describe('POST /api/users/invite', () => {
  it('adds the person, e-mails a one-time link that sets their password once, and records both in the audit log', async () => {
    const res = await as('admin').post('/api/users/invite', { name: 'Wren Alcott', email: 'Wren@Linden.test', role: 'engineer' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ name: 'Wren Alcott', email: 'wren@linden.test', role: 'engineer', active: true, invitePending: true, siteIds: [] });
    expect(await env.worker.runOnce()).toEqual({ sent: 1, failed: 0 });
    const [mail] = await env.inbox.to('wren@linden.test');
    expect(mail.subject).toBe('linden admin invited you to Isoledger');
    expect(mail.html).toContain(`${TEST_PUBLIC_URL}/set-password?token=`);
    const token = linkToken(mail.text!);

    expect((await setPassword(token, 'too-short')).status).toBe(422);
    const ok = await setPassword(token);
    expect(ok.status).toBe(200);
    expect(ok.body).toEqual({ email: 'wren@linden.test' });
    expect((await signIn('wren@linden.test', 'a-long-new-password')).status).toBe(200);
    const again = await setPassword(token, 'another-long-password');
    expect(again.status).toBe(400);
    expect(again.body.error.code).toBe('link-invalid');
    expect((await signIn('wren@linden.test', 'another-long-password')).status).toBe(401);

    const audit = await as('admin').get('/api/audit?pageSize=200');
    const types = audit.body.items.filter((e: { userId: number }) => e.userId === res.body.id).map((e: { type: string }) => e.type);
    expect(types).toEqual(expect.arrayContaining(['user-invited', 'password-reset']));
    expect((await auditOf('user-invited', res.body.id))[0]).toMatchObject({ actorId: u.admin.id, detail: { email: 'wren@linden.test', role: 'engineer' } });
  });

  it('lets an invitation link lapse after 7 days', async () => {
    const start = Date.now();
    clock.now = () => new Date(start);
    const res = await as('admin').post('/api/users/invite', { name: 'Ilse Varga', email: 'ilse@linden.test', role: 'viewer' });
    await env.worker.runOnce();
    const token = linkToken((await env.inbox.to('ilse@linden.test'))[0].text!);
    clock.now = () => new Date(start + 7 * 86400_000 + 60_000);
    expect((await setPassword(token)).status).toBe(400);
    expect((await User.findByPk(res.body.id))!.passwordHash).toBeNull();
    // A fresh invitation works, and the lapsed one stays dead.
    clock.now = () => new Date(start);
    expect((await as('admin').post(`/api/users/${res.body.id}/invite`)).status).toBe(200);
    await env.worker.runOnce();
    const mails = await env.inbox.to('ilse@linden.test');
    const fresh = linkToken(mails[mails.length - 1].text!);
    clock.now = () => new Date(start + 6 * 86400_000);
    expect((await setPassword(fresh)).status).toBe(200);
  });

  it('refuses a taken address (409), bad input (422) and anyone but an admin (403)', async () => {
    const taken = await as('admin').post('/api/users/invite', { name: 'Someone', email: other.engineer.email, role: 'engineer' });
    expect(taken.status).toBe(409);
    expect(taken.body.error.fields).toHaveProperty('email');
    // Another organisation's address is answered exactly as an address already on this team, and never "has an account".
    const ours = await as('admin').post('/api/users/invite', { name: 'Someone', email: u.engineer.email, role: 'engineer' });
    expect([ours.status, ours.body]).toEqual([taken.status, taken.body]);
    expect(JSON.stringify(taken.body)).not.toMatch(/account/i);
    const bad = await as('admin').post('/api/users/invite', { name: '', email: 'not-an-address', role: 'boss' });
    expect(bad.status).toBe(422);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['email', 'name', 'role']);
    expect((await as('supervisor').post('/api/users/invite', { name: 'X Y', email: 'x@linden.test', role: 'engineer' })).status).toBe(403);
  });
});

describe('PATCH /api/users/:id', () => {
  it('deactivates a user, whose token is refused at once, and reactivates them; both audited', async () => {
    expect((await as('engineer2').get('/api/me')).status).toBe(200);
    const before = (await User.findByPk(u.engineer2.id))!.tokenVersion;
    const res = await as('admin').patch(`/api/users/${u.engineer2.id}`, { active: false });
    expect(res.status).toBe(200);
    expect(res.body.active).toBe(false);
    const refused = await as('engineer2').get('/api/me');
    expect(refused.status).toBe(401);
    expect((await User.findByPk(u.engineer2.id))!.tokenVersion).toBe(before + 1);
    expect((await signIn(u.engineer2.email, TEST_PASSWORD)).status).toBe(401);
    expect(await auditOf('user-deactivated', u.engineer2.id)).toHaveLength(1);

    expect((await as('admin').patch(`/api/users/${u.engineer2.id}`, { active: true })).body.active).toBe(true);
    expect((await as('engineer2').get('/api/me')).status).toBe(401);
    expect((await signIn(u.engineer2.email, TEST_PASSWORD)).status).toBe(200);
    expect(await auditOf('user-reactivated', u.engineer2.id)).toHaveLength(1);
  });

  it('changes a role and records from and to', async () => {
    const res = await as('admin').patch(`/api/users/${u.engineer.id}`, { role: 'supervisor' });
    expect(res.body.role).toBe('supervisor');
    expect((await as('engineer').get('/api/board')).status).toBe(200);
    const [entry] = await auditOf('role-change', u.engineer.id);
    expect(entry).toMatchObject({ actorId: u.admin.id, detail: { from: 'engineer', to: 'supervisor' } });
    await as('admin').patch(`/api/users/${u.engineer.id}`, { role: 'engineer' });
    expect((await as('engineer').get('/api/board')).status).toBe(403);
  });

  it('refuses changing yourself, another organisation’s user, an empty change and a non-admin', async () => {
    expect((await as('admin').patch(`/api/users/${u.admin.id}`, { active: false })).body.error.code).toBe('self');
    expect((await as('admin').patch(`/api/users/${u.admin.id}`, { role: 'viewer' })).status).toBe(409);
    expect((await as('admin').patch(`/api/users/${other.engineer.id}`, { active: false })).status).toBe(404);
    expect((await as('admin').patch(`/api/users/${u.engineer.id}`, {})).status).toBe(422);
    expect((await as('supervisor').patch(`/api/users/${u.engineer.id}`, { role: 'viewer' })).status).toBe(403);
  });

  it('keeps one active admin when two admins deactivate each other at the same moment', async () => {
    const second = await User.create({ organisationId: u.admin.organisationId, name: 'Second Admin', email: 'admin2@linden.test', role: 'admin', passwordHash: u.admin.passwordHash });
    const tokenB = await tokenFor(env.t.app, second);
    const [a, b] = await Promise.all([
      as('admin').patch(`/api/users/${second.id}`, { active: false }),
      request(env.t.app).patch(`/api/users/${u.admin.id}`).set('Authorization', `Bearer ${tokenB}`).send({ active: false }),
    ]);
    const statuses = [a.status, b.status].sort();
    // The loser is refused inside the transaction (403), or at sign-in check if it arrived after the other committed (401).
    expect(statuses[0]).toBe(200);
    expect([401, 403]).toContain(statuses[1]);
    expect(await User.count({ where: { organisationId: u.admin.organisationId, role: 'admin', active: true } })).toBe(1);
    // Whoever lost, put things back so the rest of the file runs as the first admin.
    await User.update({ active: true }, { where: { id: u.admin.id } });
    tok.admin = await tokenFor(env.t.app, u.admin);
  });
});

describe('PUT /api/users/:id/sites', () => {
  it('sets a viewer’s sites, shows them in the team list and audits what changed', async () => {
    const res = await as('admin').put(`/api/users/${u.viewer.id}/sites`, { siteIds: [siteIds[1], siteIds[0], siteIds[1]] });
    expect(res.status).toBe(200);
    expect(res.body.siteIds).toEqual([...siteIds].sort((a, b) => a - b));
    const list = await as('admin').get('/api/users?pageSize=200');
    expect(list.body.items.find((m: { id: number }) => m.id === u.viewer.id).siteIds).toEqual(res.body.siteIds);
    await as('admin').put(`/api/users/${u.viewer.id}/sites`, { siteIds: [siteIds[0]] });
    const entries = await auditOf('site-access-change', u.viewer.id);
    expect(entries.map((e) => e.detail)).toEqual([
      { added: [...siteIds].sort((a, b) => a - b), removed: [], siteIds: [...siteIds].sort((a, b) => a - b) },
      { added: [], removed: [siteIds[1]], siteIds: [siteIds[0]] },
    ]);
  });

  it('refuses another organisation’s site and a role that sees every site (422)', async () => {
    expect((await as('admin').put(`/api/users/${u.viewer.id}/sites`, { siteIds: [foreignSiteId] })).body.error.fields).toHaveProperty('siteIds');
    expect((await as('admin').put(`/api/users/${u.supervisor.id}/sites`, { siteIds: [siteIds[0]] })).status).toBe(422);
  });
});
