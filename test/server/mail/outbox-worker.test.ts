import request from 'supertest';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { clock } from '@/server/lib/clock';
import { enqueueMail } from '@/server/mail/outbox';
import { createOutboxWorker, MAX_REFUSALS, outboxMessageId } from '@/server/mail/outbox-worker';
import { createMailTransport } from '@/server/mail/transport';
import { createOrganisation, tokenFor, type OrgUsers } from '@/test/setup/app';
import { outboxRows, setupMailTestApp, TEST_PUBLIC_URL } from '@/test/server/support/mail-test-app';
import { startRefusingSmtp } from '@/test/support/refusing-smtp';

let env: Awaited<ReturnType<typeof setupMailTestApp>>;
let u: OrgUsers;

beforeAll(async () => {
  env = await setupMailTestApp();
  u = (await createOrganisation('sorrel')).users;
});
afterAll(() => env.close());
beforeEach(async () => {
  await env.worker.runOnce();
  await env.inbox.clear();
});
afterEach(() => { clock.now = () => new Date(); });

const sequelize = () => env.t.db.sequelize;
const resetMail = (to: string, token = `tok-${to}`) => ({
  organisationId: u.admin.organisationId, kind: 'password-reset' as const, toEmail: to, toUserId: null,
  payload: { recipientName: 'Someone', token, expiresAt: new Date(Date.now() + 3600_000).toISOString() },
});
const rowFor = async (to: string) => (await outboxRows(env.t, `to_email = '${to}'`))[0];
const createdAt = async (id: number) => (await env.t.db.rootQuery<{ created_at: Date }[]>(`SELECT created_at FROM outbox WHERE id = ${id}`))[0].created_at;

/**
 * Makes the statement that records a message as sent fail `times` times, as a connection dropped at that moment
 * would (the database itself is real; only this one statement is interrupted).
 */
function failSentMarks(times: number) {
  const db = sequelize();
  const real = db.query.bind(db);
  let left = times;
  db.query = ((sql: unknown, options?: unknown) => {
    if (left > 0 && typeof sql === 'string' && /SET sent_at = \?/.test(sql)) {
      left -= 1;
      return Promise.reject(new Error('Connection lost: The server closed the connection.'));
    }
    return real(sql as string, options as never);
  }) as typeof db.query;
  return () => { db.query = real as typeof db.query; };
}

describe('outbox worker', () => {
  it('gives each e-mail a Message-ID of its own outbox row, the same on every attempt', async () => {
    await enqueueMail(sequelize(), [resetMail('mid@sorrel.test')], null);
    const row = await rowFor('mid@sorrel.test');
    expect(await env.worker.runOnce()).toMatchObject({ sent: 1 });
    const [mail] = await env.inbox.to('mid@sorrel.test');
    const expected = outboxMessageId({ id: row.id, created_at: await createdAt(row.id) }, env.t.config.mail.from);
    // RFC 5322 §3.6.4: msg-id = "<" id-left "@" id-right ">"
    expect(expected).toMatch(/^<outbox\.\d+\.[0-9a-z]+@isoledger\.example>$/);
    expect((mail as unknown as { headers: Record<string, string> }).headers['message-id']).toBe(expected);
    expect(outboxMessageId({ id: row.id, created_at: await createdAt(row.id) }, env.t.config.mail.from)).toBe(expected);
  });

  it('sends once when the database fails right after the mail server accepted: the mark is kept and written later', async () => {
    await enqueueMail(sequelize(), [resetMail('once@sorrel.test')], null);
    const restore = failSentMarks(3);
    try {
      expect(await env.worker.runOnce()).toMatchObject({ sent: 1, failed: 0 });
    } finally {
      restore();
    }
    // Not yet recorded, but still claimed: another process finds nothing to send, even with its clock ten minutes fast.
    let row = await rowFor('once@sorrel.test');
    expect(row.sent_at).toBeNull();
    clock.now = () => new Date(Date.now() + 10 * 60_000);
    const other = createOutboxWorker({ sequelize: sequelize(), mail: env.t.config.mail, publicUrl: TEST_PUBLIC_URL, name: 'other' });
    expect(await other.runOnce()).toEqual({ sent: 0, failed: 0 });
    // The next batch of the first worker writes the mark first.
    await env.worker.runOnce();
    row = await rowFor('once@sorrel.test');
    expect(row.sent_at).not.toBeNull();
    expect(row.attempts).toBe(1);
    expect('token' in row.payload).toBe(false);
    expect(await other.runOnce()).toEqual({ sent: 0, failed: 0 });
    expect(await env.inbox.to('once@sorrel.test')).toHaveLength(1);
  });

  it('a single failed mark is retried at once and never turns into a second attempt', async () => {
    await enqueueMail(sequelize(), [resetMail('retry@sorrel.test')], null);
    const restore = failSentMarks(1);
    try {
      expect(await env.worker.runOnce()).toMatchObject({ sent: 1, failed: 0 });
    } finally {
      restore();
    }
    const row = await rowFor('retry@sorrel.test');
    expect([row.attempts, row.sent_at !== null, row.last_error]).toEqual([1, true, null]);
    expect(await env.inbox.to('retry@sorrel.test')).toHaveLength(1);
  });

  it('reckons leases on the database clock, whatever the clock of the process says', async () => {
    await enqueueMail(sequelize(), [resetMail('lease@sorrel.test')], null);
    // This process's clock is an hour fast: the lease it writes is still two minutes from the database's now.
    const fast = Date.now() + 3600_000;
    let release!: () => void;
    const held = new Promise<void>((resolve) => { release = resolve; });
    const real = createMailTransport(env.t.config.mail);
    const slow = createOutboxWorker({
      sequelize: sequelize(), mail: env.t.config.mail, publicUrl: TEST_PUBLIC_URL, name: 'slow',
      transport: { sendMail: async (m) => { await held; return real.sendMail(m); } },
    });
    clock.now = () => new Date(fast);
    const running = slow.runOnce();
    await new Promise((r) => setTimeout(r, 300));
    const [lease] = await env.t.db.rootQuery<{ ahead: number }[]>(
      "SELECT TIMESTAMPDIFF(SECOND, UTC_TIMESTAMP(3), claimed_until) AS ahead FROM outbox WHERE to_email = 'lease@sorrel.test'",
    );
    expect(Number(lease.ahead)).toBeGreaterThan(100);
    expect(Number(lease.ahead)).toBeLessThanOrEqual(120);
    // A second process whose clock is an hour fast too does not think the lease has run out.
    const other = createOutboxWorker({ sequelize: sequelize(), mail: env.t.config.mail, publicUrl: TEST_PUBLIC_URL, name: 'other' });
    expect(await other.runOnce()).toEqual({ sent: 0, failed: 0 });
    release();
    expect(await running).toEqual({ sent: 1, failed: 0 });
    expect(await env.inbox.to('lease@sorrel.test')).toHaveLength(1);
  });

  it('gives up after repeated refusals, drops the link token, and shows the e-mail to admins and in /api/health', async () => {
    const refusing = await startRefusingSmtp();
    try {
      await enqueueMail(sequelize(), [resetMail('nobody@sorrel.test', 'secret-link-token')], null);
      const worker = createOutboxWorker({ sequelize: sequelize(), mail: { ...env.t.config.mail, port: refusing.port }, publicUrl: TEST_PUBLIC_URL, name: 'refused' });
      let at = Date.now();
      for (let i = 0; i < MAX_REFUSALS; i++) {
        clock.now = () => new Date(at);
        await worker.runOnce();
        at += 2 * 3600_000;
      }
      expect(refusing.refusals()).toBe(MAX_REFUSALS);
      const [row] = await env.t.db.rootQuery<{ failed_at: Date | null; payload: string; last_error: string }[]>(
        "SELECT failed_at, payload, last_error FROM outbox WHERE to_email = 'nobody@sorrel.test'",
      );
      expect(row.failed_at).not.toBeNull();
      expect(row.last_error).toMatch(/550/);
      expect(JSON.stringify(row.payload)).not.toContain('secret-link-token');

      const admin = await tokenFor(env.t.app, u.admin);
      const listed = await request(env.t.app).get('/api/team/undelivered-mail').set('Authorization', `Bearer ${admin}`);
      expect(listed.status).toBe(200);
      expect(listed.body.total).toBe(1);
      expect(listed.body.items[0]).toMatchObject({ kind: 'password-reset', toEmail: 'nobody@sorrel.test', attempts: MAX_REFUSALS });
      expect(listed.body.items[0].lastError).toMatch(/550/);
      const supervisor = await tokenFor(env.t.app, u.supervisor);
      expect((await request(env.t.app).get('/api/team/undelivered-mail').set('Authorization', `Bearer ${supervisor}`)).status).toBe(403);
      // Another organisation's admin sees none of it.
      const other = (await createOrganisation('teasel')).users.admin;
      const theirs = await request(env.t.app).get('/api/team/undelivered-mail').set('Authorization', `Bearer ${await tokenFor(env.t.app, other)}`);
      expect(theirs.body).toEqual({ items: [], total: 0 });

      const health = await request(env.t.app).get('/api/health');
      expect(health.body.mail.givenUp).toBe(1);
    } finally {
      await refusing.stop();
    }
  });
});
