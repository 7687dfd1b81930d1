import fs from 'node:fs';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { adminConnection, freePort } from '@/scripts/lib/mariadb';
import { startLocalDatabase } from '@/scripts/lib/local-db';
import { readConfig } from '@/server/config';
import { prepareDatabase } from '@/server/db';
import { startServer } from '@/server/index';
import { createOrganisation, TEST_JWT_SECRET, TEST_PASSWORD } from '@/test/setup/app';
import { createSiteWithAssets } from '@/test/setup/register-fixtures';

// The launcher `npm start` uses, with a real server listening on a port: nothing here is simulated but the crash.
let dataDir: string;
let local: Awaited<ReturnType<typeof startLocalDatabase>>;
let running: Awaited<ReturnType<typeof startServer>>;
let base: string;
const launcherLog: string[] = [];

beforeAll(async () => {
  dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'isoledger-fault-'));
  local = await startLocalDatabase(dataDir, await freePort(), (line) => launcherLog.push(line));
  await prepareDatabase(local.ownerUrl, local.serverUrl);
  const config = readConfig({}, { port: 0, jwtSecret: TEST_JWT_SECRET, webDir: null, bcryptCost: 10, dataDir });
  running = await startServer(config, local.serverUrl, { launcher: local.db.status });
  base = `http://127.0.0.1:${(running.server.address() as AddressInfo).port}`;
});
afterAll(async () => {
  await running?.close();
  await local?.db.stop();
  fs.rmSync(dataDir, { recursive: true, force: true });
});

interface Sent { key: string; status: number; ms: number; retryAfter: string | null }

describe('the private MariaDB dies in the middle of a burst of raises', () => {
  it('is restarted by the launcher; every acknowledged raise exists once, and the outage answered 503, never 500 or a hang', async () => {
    const org = await createOrganisation('rowan');
    const plant = await createSiteWithAssets(org.organisation.id, org.users.supervisor.id, { name: 'Rowan Court' });
    const login = await fetch(`${base}/api/auth/login`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email: org.users.engineer.email, password: TEST_PASSWORD }) });
    const { token } = (await login.json()) as { token: string };
    // One body per key, so that a retry is the same request.
    const expiresAt = new Date(Date.now() + 3600_000).toISOString();
    const raise = async (key: string): Promise<Sent> => {
      const started = Date.now();
      const res = await fetch(`${base}/api/assets/${plant.boiler.id}/tags`, {
        method: 'POST',
        headers: { 'content-type': 'application/json', authorization: `Bearer ${token}`, 'idempotency-key': key },
        body: JSON.stringify({ kind: 'override', reason: `Boiler held on for flue analysis ${key}`, expiresAt, normalState: 'Time clock', leftState: 'Held on' }),
        signal: AbortSignal.timeout(30_000),
      });
      await res.arrayBuffer();
      return { key, status: res.status, ms: Date.now() - started, retryAfter: res.headers.get('retry-after') };
    };

    const sent: Sent[] = [];
    let killed = false;
    let n = 0;
    // Three senders keep raises in flight; the database is killed after the tenth answer, and the burst goes on
    // until the restarted database has acknowledged five more.
    const sender = async () => {
      while (sent.length < 200) {
        const answer = await raise(`burst-${n++}`);
        sent.push(answer);
        if (!killed && sent.length >= 10) {
          killed = true;
          process.kill(local.db.pid()!, 'SIGKILL');
        }
        const afterKill = sent.slice(sent.findIndex((s) => s.status !== 201));
        if (killed && afterKill.filter((s) => s.status === 201).length >= 5) return;
        if (answer.status === 503) await new Promise((r) => setTimeout(r, 250));
      }
    };
    await Promise.all([sender(), sender(), sender()]);

    const statuses = new Set(sent.map((s) => s.status));
    // RFC 9110 §15.6.4: 503 Service Unavailable, with Retry-After (§10.2.3) saying when to try again
    expect([...statuses].sort()).toEqual([201, 503]);
    for (const s of sent.filter((x) => x.status === 503)) expect(s.retryAfter, s.key).toMatch(/^\d+$/);
    // Socket, connect and pool timeouts (server/db.ts) bound every answer well under 15 s.
    expect(Math.max(...sent.map((s) => s.ms))).toBeLessThan(15_000);

    const health = await (await fetch(`${base}/api/health`)).json();
    expect(health).toMatchObject({ ok: true, db: 'up', launcher: { up: true, restarts: 1, lastExit: { signal: 'SIGKILL' } } });
    expect(launcherLog.some((line) => /exited \(SIGKILL\); restarting in 1 s/.test(line))).toBe(true);
    expect(launcherLog.some((line) => /is back \(restart 1\)/.test(line))).toBe(true);

    // A client retries each 503 with its key: a raise that committed just before the crash is not made twice.
    for (const s of sent.filter((x) => x.status === 503)) expect([200, 201]).toContain((await raise(s.key)).status);
    const conn = await adminConnection(local.db.socketPath, 'isoledger');
    try {
      const rows = (await conn.query('SELECT idempotency_key AS k, COUNT(*) AS n FROM tags WHERE raised_by_id = ? GROUP BY idempotency_key', [org.users.engineer.id])) as { k: string; n: bigint }[];
      const counts = new Map(rows.map((r) => [r.k, Number(r.n)]));
      expect(new Set(counts.values())).toEqual(new Set([1]));
      expect([...counts.keys()].sort()).toEqual([...new Set(sent.map((s) => s.key))].sort());
    } finally {
      await conn.end();
    }
  }, 120_000);
});
