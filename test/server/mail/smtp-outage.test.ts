import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { clock } from '@/server/lib/clock';
import { createOutboxWorker } from '@/server/mail/outbox-worker';
import { createOrganisation, tokenFor, type OrgUsers } from '@/test/setup/app';
import { createSiteWithAssets } from '@/test/setup/register-fixtures';
import { outboxRows, setupMailTestApp, TEST_PUBLIC_URL } from '@/test/server/support/mail-test-app';

let env: Awaited<ReturnType<typeof setupMailTestApp>>;
let u: OrgUsers;
let plant: Awaited<ReturnType<typeof createSiteWithAssets>>;
let engineer: string;

beforeAll(async () => {
  env = await setupMailTestApp();
  const org = await createOrganisation('yarrow');
  u = org.users;
  plant = await createSiteWithAssets(org.organisation.id, u.supervisor.id, { name: 'Yarrow Baths' });
  engineer = await tokenFor(env.t.app, u.engineer);
});
afterAll(async () => {
  clock.now = () => new Date();
  await env.close();
});

const post = (path: string, body: object) => request(env.t.app).post(path).set('Authorization', `Bearer ${engineer}`).send(body);
const allChecks = { workComplete: true, guardsRefitted: true, personnelClear: true, testedSafe: true };

async function until(what: string, check: () => Promise<boolean>, ms = 20_000) {
  const end = Date.now() + ms;
  while (!(await check())) {
    if (Date.now() > end) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

describe('mail server outage', () => {
  it('keeps every tag e-mail through an outage and delivers each exactly once when the server is back', async () => {
    const worker = createOutboxWorker({ sequelize: env.t.db.sequelize, mail: { ...env.t.config.mail, pollMs: 100 }, publicUrl: TEST_PUBLIC_URL, name: 'running' });
    worker.start();
    try {
      await env.inbox.stop();
      const raised: number[] = [];
      for (const assetId of [plant.pump.id, plant.boiler.id, plant.valve.id]) {
        const res = await post(`/api/assets/${assetId}/tags`, {
          kind: 'override', reason: 'Held on for commissioning', expiresAt: new Date(Date.now() + 4 * 3600_000).toISOString(),
          normalState: 'Time clock', leftState: 'Hand', contactPhone: '+44 7700 900333',
        });
        expect(res.status).toBe(201);
        raised.push(res.body.id);
      }
      for (const id of raised.slice(0, 2)) {
        expect((await post(`/api/tags/${id}/clear`, { reason: 'Commissioning finished, back on time clock', checks: allChecks })).status).toBe(200);
      }
      // Raised and cleared tell the supervisor and the admin: 3 raised + 2 cleared, two people each.
      const expected = (await outboxRows(env.t)).length;
      expect(expected).toBe(10);
      await until('a failed attempt', async () => (await outboxRows(env.t)).some((r) => r.attempts > 0));
      expect((await outboxRows(env.t)).every((r) => r.sent_at === null)).toBe(true);

      await env.inbox.start();
      // The worker backs off after a failure; jump past the longest wait it could have set.
      clock.now = () => new Date(Date.now() + 2 * 3600_000);
      await until('every e-mail sent', async () => (await outboxRows(env.t)).every((r) => r.sent_at !== null));
      await new Promise((r) => setTimeout(r, 500));

      const received = await env.inbox.all();
      expect(received).toHaveLength(expected);
      const ids = received.map((m) => (m as unknown as { headers: Record<string, string> }).headers['message-id']);
      expect(new Set(ids).size).toBe(expected);
      const subjects = received.map((m) => m.subject);
      expect(subjects.filter((s) => s.startsWith('Override raised'))).toHaveLength(6);
      expect(subjects.filter((s) => s.startsWith('Override cleared'))).toHaveLength(4);
    } finally {
      await worker.stop();
    }
  });
});
