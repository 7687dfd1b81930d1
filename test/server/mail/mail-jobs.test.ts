import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readMailConfig } from '@/server/config';
import { startServer } from '@/server/index';
import { createOrganisation, setupTestApp, TEST_PASSWORD, type TestApp } from '@/test/setup/app';
import { createSiteWithAssets } from '@/test/setup/register-fixtures';
import { MailInbox } from '@/test/support/mail-inbox';

let t: TestApp;
let inbox: MailInbox;
let running: Awaited<ReturnType<typeof startServer>>;

beforeAll(async () => {
  inbox = await new MailInbox().start();
  t = await setupTestApp();
  const config = { ...t.config, port: 0, publicUrl: 'http://isoledger.test', mail: { ...readMailConfig({}), port: inbox.smtpPort, pollMs: 100 } };
  running = await startServer(config, t.db.url);
});
afterAll(async () => {
  await running.close();
  await t.close();
  await inbox.stop();
});

describe('startServer', () => {
  it('runs the outbox worker itself: a raised tag’s e-mail arrives without anyone calling it', async () => {
    const org = await createOrganisation('poplar');
    const plant = await createSiteWithAssets(org.organisation.id, org.users.supervisor.id, { name: 'Poplar Baths' });
    const login = await request(running.server).post('/api/auth/login').send({ email: org.users.engineer.email, password: TEST_PASSWORD });
    const token = login.body.token as string;
    const res = await request(running.server).post(`/api/assets/${plant.boiler.id}/tags`).set('Authorization', `Bearer ${token}`).send({
      kind: 'override', reason: 'Boiler held on for flue analysis', expiresAt: new Date(Date.now() + 3600_000).toISOString(), normalState: 'Time clock', leftState: 'Held on',
    });
    expect(res.status).toBe(201);
    let mails: Awaited<ReturnType<MailInbox['to']>> = [];
    for (let i = 0; i < 100 && mails.length === 0; i += 1) {
      await new Promise((r) => setTimeout(r, 100));
      mails = await inbox.to(org.users.supervisor.email);
    }
    expect(mails.map((m) => m.subject)).toEqual(['Override raised: B-01 Boiler 1 (Poplar Baths)']);
    expect(mails[0].text).toContain(`http://isoledger.test/tags/${res.body.id}`);
  });
});
