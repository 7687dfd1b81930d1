import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { createApp } from '@/server/app';
import { createPhotoStorage } from '@/server/lib/create-photo-storage';
import { readConfig, readMailConfig } from '@/server/config';
import { createOutboxWorker } from '@/server/mail/outbox-worker';
import { MailInbox } from '@/test/support/mail-inbox';
import { createSequelize, prepareDatabase } from '@/server/db';
import { seedDemo } from '@/server/seed/demo';
import { freePort, startPrivateMariaDb } from '@/scripts/lib/mariadb';
import { localAccounts, provisionDatabase } from '@/scripts/lib/local-db';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    /** maildev's web port: every e-mail the app sends lands in this fake inbox. */
    mailWebPort: number;
  }
}

/** The product as `npm start` runs it — demo data, built web app — on a throwaway MariaDB and a free port. */
export default async function setup(project: TestProject) {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'isoledger-e2e-'));
  const dbPort = await freePort();
  const db = await startPrivateMariaDb({ dataDir: path.join(dataDir, 'mariadb'), port: dbPort });
  // The same two accounts as npm start: migrations as the owner, the app on the server's restricted account.
  const { ownerUrl, serverUrl } = await provisionDatabase(db, localAccounts(dataDir));
  await prepareDatabase(ownerUrl, serverUrl);
  const sequelize = createSequelize(serverUrl);
  const port = await freePort();
  const baseUrl = `http://127.0.0.1:${port}`;
  // Every e2e test signs the demo users in afresh; the sign-in rate limit itself is covered by the API tests.
  const inbox = await new MailInbox().start();
  const config = readConfig({ PORT: String(port), DATA_DIR: dataDir }, {
    jwtSecret: 'e2e-secret', publicUrl: baseUrl, loginRateLimit: { max: 10_000, windowMs: 60_000 },
    mail: { ...readMailConfig({}), port: inbox.smtpPort, pollMs: 500 },
  });
  // Demo photos go where this app reads them (the throwaway DATA_DIR), not the environment's default.
  await seedDemo(sequelize, { storage: createPhotoStorage(config) });
  if (!fs.existsSync(path.join(config.webDir!, 'index.html'))) throw new Error('dist/index.html is missing: build the web app first (npm test does)');
  const app = createApp({ sequelize, config });
  const server = await new Promise<import('node:http').Server>((resolve) => {
    const s = app.listen(port, '127.0.0.1', () => resolve(s));
  });
  // Mail goes out as under npm start: the outbox worker sends it over SMTP to the fake inbox.
  const worker = createOutboxWorker({ sequelize, mail: config.mail, publicUrl: baseUrl, name: 'e2e-worker' });
  worker.start();
  project.provide('baseUrl', baseUrl);
  project.provide('mailWebPort', inbox.webPort);
  return async () => {
    await worker.stop();
    await inbox.stop();
    server.closeAllConnections();
    await new Promise((r) => server.close(r));
    await sequelize.close();
    await db.stop();
    fs.rmSync(dataDir, { recursive: true, force: true });
  };
}
