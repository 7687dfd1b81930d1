import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '@/server/app';
import { passwordWork } from '@/server/lib/passwords';
import { TEST_PASSWORD, createOrganisation, setupTestApp, type OrgUsers, type TestApp } from '@/test/setup/app';

let t: TestApp;
let users: OrgUsers;

beforeAll(async () => {
  t = await setupTestApp();
  ({ users } = await createOrganisation('hazel'));
});
afterAll(() => t.close());

// The app trusts X-Forwarded-For from loopback (a local proxy), which stands here for requests from many addresses.
const limitedApp = (max: number) => createApp({ sequelize: t.db.sequelize, config: { ...t.config, loginRateLimit: { max, windowMs: 60_000 } } });
const signIn = (app: ReturnType<typeof createApp>, email: string, password: string, from: string) =>
  request(app).post('/api/auth/login').set('X-Forwarded-For', from).send({ email, password });

describe('POST /api/auth/login limits', () => {
  it('limits one account across many addresses: the fourth wrong password is refused whatever address it comes from', async () => {
    const app = limitedApp(3);
    for (let i = 1; i <= 3; i++) expect((await signIn(app, users.engineer.email, 'wrong-password', `198.51.100.${i}`)).status).toBe(401);
    const fourth = await signIn(app, users.engineer.email, 'wrong-password', '198.51.100.99');
    expect(fourth.status).toBe(429);
    expect(fourth.body.error.code).toBe('rate-limited');
    // Another account from the same fresh address is not held up by it.
    expect((await signIn(app, users.viewer.email, TEST_PASSWORD, '198.51.100.99')).status).toBe(200);
  });

  it('limits one address across many accounts: one password tried on many accounts is stopped after five times the allowance', async () => {
    const app = limitedApp(2);
    for (let i = 0; i < 10; i++) expect((await signIn(app, `someone${i}@hazel.test`, 'Summer2026!', '203.0.113.7')).status).toBe(401);
    const next = await signIn(app, users.admin.email, 'Summer2026!', '203.0.113.7');
    expect(next.status).toBe(429);
    expect(Number(next.headers['retry-after'])).toBeGreaterThan(0);
    // The same account from another address still gets its own answer.
    expect((await signIn(app, users.admin.email, TEST_PASSWORD, '203.0.113.8')).status).toBe(200);
  });

  it('does not count successful sign-ins, so an office behind one address is not locked out by its own work', async () => {
    const app = limitedApp(2);
    for (let i = 0; i < 15; i++) expect((await signIn(app, users.supervisor.email, TEST_PASSWORD, '192.0.2.50')).status).toBe(200);
  });

  it('bounds the password work of a flood: two hashes at once, a short queue, and 503 with Retry-After beyond it', async () => {
    const app = limitedApp(10_000);
    // Fill both running places and the whole queue with work that waits on a gate, so the refusal does not depend on timing.
    let open!: () => void;
    const gate = new Promise<void>((resolve) => { open = resolve; });
    const held = Array.from({ length: 34 }, () => passwordWork.run(() => gate));
    const refused = await signIn(app, 'flood-held@hazel.test', 'guess-guess', '198.18.1.1');
    expect(refused.status).toBe(503);
    expect(refused.headers['retry-after']).toBe('5');
    expect(refused.body.error.code).toBe('busy');
    open();
    await Promise.all(held);
    let most = 0;
    const sampler = setInterval(() => { most = Math.max(most, passwordWork.stats.running); }, 2);
    const answers = await Promise.all(Array.from({ length: 40 }, (_, i) => signIn(app, `flood${i}@hazel.test`, 'guess-guess', `198.18.0.${i + 1}`)));
    clearInterval(sampler);
    const statuses = answers.map((r) => r.status);
    expect(statuses.every((s) => s === 401 || s === 503)).toBe(true);
    // However the flood is timed, every answer beyond the queue is the same 503, and no more than two hashes ever run at once.
    for (const busy of answers.filter((r) => r.status === 503)) expect(busy.headers['retry-after']).toBe('5');
    expect(most).toBeLessThanOrEqual(2);
  });
});

describe('POST /api/auth/password/reset-request limits', () => {
  it('limits requests for one address across many addresses, so an inbox cannot be flooded', async () => {
    const app = limitedApp(2);
    const ask = (from: string) => request(app).post('/api/auth/password/reset-request').set('X-Forwarded-For', from).send({ email: users.viewer.email });
    expect((await ask('198.51.100.20')).status).toBe(202);
    expect((await ask('198.51.100.21')).status).toBe(202);
    expect((await ask('198.51.100.22')).status).toBe(429);
  });
});
