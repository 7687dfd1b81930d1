import jwt from 'jsonwebtoken';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent } from '@/server/models/audit-event.model';
import { User } from '@/server/models/user.model';
import { createApp } from '@/server/app';
import { TEST_PASSWORD, createOrganisation, setupTestApp, tokenFor, type OrgUsers, type TestApp } from '@/test/setup/app';

let t: TestApp;
let users: OrgUsers;

beforeAll(async () => {
  t = await setupTestApp();
  ({ users } = await createOrganisation('alder'));
});
afterAll(() => t.close());

describe('POST /api/auth/login', () => {
  it('signs in with the right password and returns a token and the user', async () => {
    const res = await request(t.app).post('/api/auth/login').send({ email: 'Engineer@Alder.test ', password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ id: users.engineer.id, email: 'engineer@alder.test', role: 'engineer', name: 'alder engineer' });
    const claims = jwt.decode(res.body.token) as jwt.JwtPayload;
    // One 12-hour shift at most.
    expect(claims.exp! - claims.iat!).toBeLessThanOrEqual(12 * 3600);
    const events = await AuditEvent.findAll({ where: { userId: users.engineer.id, type: 'sign-in' } });
    expect(events.length).toBeGreaterThan(0);
  });

  it('stores passwords as bcrypt hashes with a cost of at least 10', async () => {
    const user = await User.findByPk(users.engineer.id);
    const cost = Number(/^\$2[aby]\$(\d+)\$/.exec(user!.passwordHash!)![1]);
    expect(cost).toBeGreaterThanOrEqual(10);
  });

  it('answers a wrong password and an unknown e-mail identically', async () => {
    const wrong = await request(t.app).post('/api/auth/login').send({ email: 'engineer@alder.test', password: 'nope-nope' });
    const unknown = await request(t.app).post('/api/auth/login').send({ email: 'nobody@alder.test', password: 'nope-nope' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(unknown.body).toEqual(wrong.body);
    expect(wrong.body.error.code).toBe('invalid-credentials');
    const failed = await AuditEvent.findAll({ where: { type: 'sign-in-failed' } });
    expect(failed.map((e) => e.detail?.email)).toEqual(expect.arrayContaining(['engineer@alder.test', 'nobody@alder.test']));
  });

  it('names the fields that are missing or malformed (422)', async () => {
    const res = await request(t.app).post('/api/auth/login').send({ email: 'not-an-address' });
    expect(res.status).toBe(422);
    expect(res.body.error.fields).toMatchObject({ email: expect.any(String), password: expect.any(String) });
  });

  it('refuses malformed JSON with a 400 in the error format and no stack trace', async () => {
    const res = await request(t.app).post('/api/auth/login').set('Content-Type', 'application/json').send('{"email": ');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('entity.parse.failed');
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.(ts|js):\d+/);
  });

  it('refuses an oversized body with 413', async () => {
    const res = await request(t.app).post('/api/auth/login').send({ email: 'a@b.test', password: 'x'.repeat(300_000) });
    expect(res.status).toBe(413);
  });

  it('limits repeated attempts with 429 and Retry-After', async () => {
    const limited = createApp({ sequelize: t.db.sequelize, config: { ...t.config, loginRateLimit: { max: 3, windowMs: 60_000 } } });
    const attempt = () => request(limited).post('/api/auth/login').send({ email: 'viewer@alder.test', password: 'wrong-password' });
    for (let i = 0; i < 3; i++) expect((await attempt()).status).toBe(401);
    const res = await attempt();
    expect(res.status).toBe(429);
    expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
    expect(res.body.error.code).toBe('rate-limited');
    // Even the right password is refused until the window passes.
    const right = await request(limited).post('/api/auth/login').send({ email: 'viewer@alder.test', password: TEST_PASSWORD });
    expect(right.status).toBe(429);
  });
});

describe('GET /api/me', () => {
  it('returns the signed-in user', async () => {
    const token = await tokenFor(t.app, users.supervisor);
    const res = await request(t.app).get('/api/me').set('Authorization', `Bearer ${token}`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id: users.supervisor.id, role: 'supervisor', organisation: { name: 'alder Test Services' } });
  });

  it('refuses a request without a token', async () => {
    const res = await request(t.app).get('/api/me');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('unauthenticated');
  });

  it('refuses an expired token', async () => {
    const token = jwt.sign({ org: users.engineer.organisationId, ver: 0, exp: Math.floor(Date.now() / 1000) - 60 }, t.config.jwtSecret, { subject: String(users.engineer.id) });
    const res = await request(t.app).get('/api/me').set('Authorization', `Bearer ${token}`);
    expect(res.status).toBe(401);
    expect(res.body.error.message).toMatch(/expired/i);
  });

  it('refuses a tampered token (role or subject changed without the key)', async () => {
    const token = await tokenFor(t.app, users.viewer);
    const [header, , signature] = token.split('.');
    const forged = Buffer.from(JSON.stringify({ sub: String(users.admin.id), org: users.admin.organisationId, ver: 0, exp: Math.floor(Date.now() / 1000) + 3600 })).toString('base64url');
    const res = await request(t.app).get('/api/me').set('Authorization', `Bearer ${header}.${forged}.${signature}`);
    expect(res.status).toBe(401);
    const otherKey = jwt.sign({ org: users.admin.organisationId, ver: 0 }, 'another-secret', { subject: String(users.admin.id) });
    expect((await request(t.app).get('/api/me').set('Authorization', `Bearer ${otherKey}`)).status).toBe(401);
    const none = jwt.sign({ org: users.admin.organisationId, ver: 0 }, '', { subject: String(users.admin.id), algorithm: 'none' });
    expect((await request(t.app).get('/api/me').set('Authorization', `Bearer ${none}`)).status).toBe(401);
  });

  it('refuses a token after sign-out', async () => {
    const token = await tokenFor(t.app, users.engineer2);
    expect((await request(t.app).get('/api/me').set('Authorization', `Bearer ${token}`)).status).toBe(200);
    const out = await request(t.app).post('/api/auth/logout').set('Authorization', `Bearer ${token}`);
    expect(out.status).toBe(204);
    const res = await request(t.app).get('/api/me').set('Authorization', `Bearer ${token}`);
    expect(res.status).toBe(401);
    expect(await AuditEvent.count({ where: { userId: users.engineer2.id, type: 'sign-out' } })).toBe(1);
  });

  it('refuses a deactivated user at once, and their sign-in', async () => {
    const token = await tokenFor(t.app, users.viewer);
    await User.update({ active: false }, { where: { id: users.viewer.id } });
    expect((await request(t.app).get('/api/me').set('Authorization', `Bearer ${token}`)).status).toBe(401);
    const login = await request(t.app).post('/api/auth/login').send({ email: users.viewer.email, password: TEST_PASSWORD });
    expect(login.status).toBe(401);
    expect(login.body.error.code).toBe('invalid-credentials');
    await User.update({ active: true }, { where: { id: users.viewer.id } });
  });
});

describe('security headers', () => {
  it('sends a Content-Security-Policy that allows only our own origin', async () => {
    const res = await request(t.app).get('/api/health');
    expect(res.headers['content-security-policy']).toContain("script-src 'self'");
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['x-powered-by']).toBeUndefined();
  });

  it('answers an unknown API path with a JSON 404', async () => {
    const res = await request(t.app).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not-found');
  });
});
