import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '@/server/app';
import { readConfig } from '@/server/config';
import { createSequelize, prepareDatabase } from '@/server/db';
import { freePort, startPrivateMariaDb, type PrivateMariaDb } from '@/scripts/lib/mariadb';
import { localAccounts, provisionDatabase } from '@/scripts/lib/local-db';

// This file stops and restarts a database, so it uses a private MariaDB of its own, not the shared test server.
let dataDir: string;
let port: number;
let db: PrivateMariaDb;

beforeAll(async () => {
  dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'isoledger-health-'));
  port = await freePort();
  db = await startPrivateMariaDb({ dataDir, port, restart: false });
});
afterAll(async () => {
  await db.stop();
  fs.rmSync(dataDir, { recursive: true, force: true });
});

describe('GET /api/health', () => {
  it('reports up, 503 while the database is stopped, and up again after it restarts', async () => {
    const urls = await provisionDatabase(db, localAccounts(dataDir));
    await prepareDatabase(urls.ownerUrl, urls.serverUrl);
    const sequelize = createSequelize(urls.serverUrl);
    const app = createApp({ sequelize, config: readConfig({}, { jwtSecret: 'x', webDir: null }) });
    try {
      const up = await request(app).get('/api/health');
      expect(up.status).toBe(200);
      expect(up.body).toEqual({ ok: true, db: 'up', mail: { waiting: 0, givenUp: 0 } });

      await db.stop();
      const down = await request(app).get('/api/health');
      expect(down.status).toBe(503);
      expect(down.body).toEqual({ ok: false, db: 'down' });

      db = await startPrivateMariaDb({ dataDir, port, restart: false });
      let again = await request(app).get('/api/health');
      // The pool may hand out one stale connection first; it must recover on its own within a few checks.
      for (let i = 0; i < 5 && again.status !== 200; i++) again = await request(app).get('/api/health');
      expect(again.status).toBe(200);
      expect(again.body).toEqual({ ok: true, db: 'up', mail: { waiting: 0, givenUp: 0 } });
    } finally {
      await sequelize.close();
    }
  });
});
