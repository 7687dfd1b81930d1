import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import mariadb from 'mariadb';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startLocalCluster, type LocalCluster } from '@/scripts/lib/local-cluster';
import { readConfig, readMailConfig } from '@/server/config';
import type { Sequelize } from 'sequelize';
import { createSequelize, openSequelize } from '@/server/db';
import { runDigests } from '@/server/mail/digest';
import { createOrganisation, TEST_JWT_SECRET, TEST_PASSWORD } from '@/test/setup/app';
import { jpegWithGps } from '@/test/server/support/images';
import { createSiteWithAssets } from '@/test/setup/register-fixtures';
import { MailInbox } from '@/test/support/mail-inbox';

// `npm run cluster`'s own code: three Galera nodes and two app server processes on loopback, server 1 on node1, 2 on node2.
let dataDir: string;
let cluster: LocalCluster;
/** The test's own connection for fixtures (each app server runs in a process of its own). */
let fixtures: Sequelize;
let inbox: MailInbox;
let a: string;
let b: string;
let token: string;
let plant: Awaited<ReturnType<typeof createSiteWithAssets>>;
let org: Awaited<ReturnType<typeof createOrganisation>>;
const log: string[] = [];

/** `count` consecutive free loopback ports from a random base, away from the usual ones. */
async function freeRun(count: number): Promise<number> {
  for (;;) {
    const base = 20000 + Math.floor(Math.random() * 20000);
    const checks = await Promise.all(Array.from({ length: count }, (_, i) => isFree(base + i)));
    if (checks.every(Boolean)) return base;
  }
}
function isFree(port: number): Promise<boolean> {
  return import('node:net').then((net) => new Promise((resolve) => {
    const s = net.createServer().once('error', () => resolve(false)).listen(port, '127.0.0.1', () => s.close(() => resolve(true)));
  }));
}

const json = { 'content-type': 'application/json' };
const call = async (base: string, method: string, url: string, body?: object, bearer = token) => {
  const started = Date.now();
  const res = await fetch(`${base}${url}`, { method, headers: { ...json, authorization: `Bearer ${bearer}` }, body: body ? JSON.stringify(body) : undefined, signal: AbortSignal.timeout(30_000) });
  const text = await res.text();
  return { status: res.status, body: text ? JSON.parse(text) : null, ms: Date.now() - started };
};
const expiresAt = new Date(Date.now() + 6 * 3600_000).toISOString();
const override = (n: string) => ({ kind: 'override', reason: `Boiler held on for flue analysis ${n}`, expiresAt, normalState: 'Time clock', leftState: 'Held on' });
const raiseOn = (base: string, n: string) => fetch(`${base}/api/assets/${plant.boiler.id}/tags`, {
  method: 'POST', headers: { ...json, authorization: `Bearer ${token}`, 'idempotency-key': n }, body: JSON.stringify(override(n)), signal: AbortSignal.timeout(30_000),
}).then(async (res) => ({ key: n, status: res.status, body: await res.json() }));

const onNode = async <T,>(i: number, sql: string, values?: unknown[]): Promise<T> => {
  const conn = await mariadb.createConnection(cluster.nodeUrls[i]);
  try {
    return (await conn.query(sql, values)) as T;
  } finally {
    await conn.end();
  }
};

beforeAll(async () => {
  dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'isoledger-cluster-'));
  inbox = await new MailInbox().start();
  const appPort = await freeRun(2);
  const config = readConfig({ DATA_DIR: dataDir }, {
    port: appPort, jwtSecret: TEST_JWT_SECRET, webDir: null, bcryptCost: 10, mail: { ...readMailConfig({}), port: inbox.smtpPort, pollMs: 100 },
  });
  cluster = await startLocalCluster({ config, sqlBase: await freeRun(3), groupBase: await freeRun(9), log: (line) => log.push(line) });
  [a, b] = cluster.servers.map((s) => s.url);
  fixtures = createSequelize(cluster.nodeUrls[0]);
  org = await createOrganisation('hazel');
  plant = await createSiteWithAssets(org.organisation.id, org.users.supervisor.id, { name: 'Hazel Wharf' });
  const login = await fetch(`${a}/api/auth/login`, { method: 'POST', headers: json, body: JSON.stringify({ email: org.users.engineer.email, password: TEST_PASSWORD }) });
  token = ((await login.json()) as { token: string }).token;
}, 240_000);
afterAll(async () => {
  await fixtures?.close();
  await cluster?.stop();
  await inbox?.stop();
  fs.rmSync(dataDir, { recursive: true, force: true });
});

describe('two app servers on a three-node Galera cluster', () => {
  it('reports the cluster size and each node’s state in /api/health', async () => {
    for (const base of [a, b]) {
      const health = await (await fetch(`${base}/api/health`)).json();
      // MariaDB KB, Galera status variables: wsrep_cluster_size, and wsrep_local_state_comment is Synced on a node serving clients
      expect(health).toMatchObject({ ok: true, db: 'up', cluster: { size: 3, state: 'Synced' } });
    }
  });

  it('shows a tag raised on one server on the other, and lets one of two clears sent to different servers win', async () => {
    const raised = await raiseOn(a, 'clear-race');
    expect(raised.status).toBe(201);
    expect((await call(b, 'GET', `/api/tags/${raised.body.id}`)).body).toMatchObject({ id: raised.body.id, status: 'live' });
    const body = { reason: 'Flue analysis finished, time clock back in control', checks: { workComplete: true, guardsRefitted: true, personnelClear: true, testedSafe: true } };
    const clears = await Promise.all([call(a, 'POST', `/api/tags/${raised.body.id}/clear`, body), call(b, 'POST', `/api/tags/${raised.body.id}/clear`, body)]);
    // OSHA 29 CFR 1910.147(e)(3): removed once, by the person who applied it
    expect(clears.map((c) => c.status).sort()).toEqual([200, 409]);
    const [events] = await onNode<{ n: bigint }[]>(0, "SELECT COUNT(*) AS n FROM tag_events WHERE tag_id = ? AND type = 'cleared'", [raised.body.id]);
    expect(Number(events.n)).toBe(1);
  });

  it('sends each e-mail once with an outbox worker on both servers', async () => {
    const raised = await Promise.all(['mail-1', 'mail-2', 'mail-3'].map((n, i) => raiseOn(i % 2 ? b : a, n)));
    expect(raised.map((r) => r.status)).toEqual([201, 201, 201]);
    const subject = 'Override raised: B-01 Boiler 1 (Hazel Wharf)';
    let mails: Awaited<ReturnType<MailInbox['to']>> = [];
    for (let i = 0; i < 100 && mails.filter((m) => m.subject === subject).length < 4; i++) {
      await new Promise((r) => setTimeout(r, 100));
      mails = await inbox.to(org.users.supervisor.email);
    }
    await new Promise((r) => setTimeout(r, 1500)); // both workers have polled many times since
    mails = await inbox.to(org.users.supervisor.email);
    // one raised earlier in this file, three here: each once
    expect(mails.filter((m) => m.subject === subject)).toHaveLength(4);
    const [pending] = await onNode<{ n: bigint }[]>(1, 'SELECT COUNT(*) AS n FROM outbox WHERE sent_at IS NULL');
    expect(Number(pending.n)).toBe(0);
  });

  it('honours a sign-out on one server at the other', async () => {
    const login = await fetch(`${a}/api/auth/login`, { method: 'POST', headers: json, body: JSON.stringify({ email: org.users.engineer2.email, password: TEST_PASSWORD }) });
    const other = ((await login.json()) as { token: string }).token;
    expect((await call(b, 'GET', '/api/me', undefined, other)).status).toBe(200);
    expect((await call(b, 'POST', '/api/auth/logout', undefined, other)).status).toBeLessThan(300);
    expect((await call(a, 'GET', '/api/me', undefined, other)).status).toBe(401);
  });

  it('sends the morning digest once when two servers run it at the same moment on different nodes', async () => {
    const [one, two] = [openSequelize(cluster.nodeUrls[0]), openSequelize(cluster.nodeUrls[1])];
    try {
      // 07:30 at a London site in winter: inside the digest's morning window
      const morning = new Date('2025-01-15T07:30:00.000Z');
      const results = await Promise.all([runDigests(morning, { sequelize: one, name: 'server-1' }), runDigests(morning, { sequelize: two, name: 'server-2' })]);
      const [claimed] = await onNode<{ n: bigint }[]>(2, "SELECT COUNT(*) AS n FROM digest_runs WHERE local_date = '2025-01-15'");
      // supervisor and admin of the one organisation, each once
      expect(Number(claimed.n)).toBe(2);
      expect(results.reduce((sum, r) => sum + r.sent + r.empty, 0)).toBe(2);
    } finally {
      await one.close();
      await two.close();
    }
  });

  it('serves a photo uploaded through one server, and label PDFs and CSV exports, from the other', async () => {
    const login = await fetch(`${b}/api/auth/login`, { method: 'POST', headers: json, body: JSON.stringify({ email: org.users.supervisor.email, password: TEST_PASSWORD }) });
    const supervisor = ((await login.json()) as { token: string }).token;
    const form = new FormData();
    form.append('photo', new Blob([new Uint8Array(await jpegWithGps())], { type: 'image/jpeg' }), 'boiler.jpg');
    const upload = await fetch(`${a}/api/assets/${plant.boiler.id}/photos`, { method: 'POST', headers: { authorization: `Bearer ${supervisor}` }, body: form });
    expect(upload.status).toBe(201);
    const photo = (await upload.json()) as { url: string };
    const served = await fetch(`${b}${photo.url}`, { headers: { authorization: `Bearer ${supervisor}` } });
    expect(served.status).toBe(200);
    expect(served.headers.get('content-type')).toMatch(/^image\//);
    const pdf = await fetch(`${b}/api/labels.pdf?siteId=${plant.site.id}`, { headers: { authorization: `Bearer ${supervisor}` } });
    expect(pdf.status).toBe(200);
    // ISO 32000-1 §7.5.2: a PDF file begins with the %PDF- header
    expect(Buffer.from(await pdf.arrayBuffer()).subarray(0, 5).toString()).toBe('%PDF-');
    const csv = await fetch(`${a}/api/assets/export.csv`, { headers: { authorization: `Bearer ${supervisor}` } });
    expect(csv.status).toBe(200);
    expect(await csv.text()).toContain('B-01');
  });

  it('carries on through the death of a node in a burst of raises; the node rejoins, catches up and serves the same data', async () => {
    const sent: { key: string; status: number; ms: number; node3Up: boolean }[] = [];
    let n = 0;
    let killed = false;
    // Each sender is a client with idempotency keys: it retries a 503 after its Retry-After (shortened here).
    const sender = async (base: string) => {
      while (n < 40) {
        const key = `burst-${n++}`;
        for (;;) {
          const started = Date.now();
          const answer = await raiseOn(base, key);
          sent.push({ key, status: answer.status, ms: Date.now() - started, node3Up: cluster.galera.nodes[2].status().up });
          if (!killed && sent.length >= 8) {
            killed = true;
            process.kill(cluster.galera.nodes[2].pid()!, 'SIGKILL');
          }
          if (answer.status !== 503) break;
          await new Promise((r) => setTimeout(r, 300));
        }
      }
    };
    await Promise.all([sender(a), sender(b), sender(a), sender(b)]);
    expect(killed).toBe(true);
    // While the two remaining nodes re-form the primary component a request may get 503, never a 500 or a hang.
    // RFC 9110 §15.6.4: 503 Service Unavailable
    expect([...new Set(sent.map((s) => s.status))].filter((s) => s !== 201 && s !== 200 && s !== 503)).toEqual([]);
    expect(Math.max(...sent.map((s) => s.ms))).toBeLessThan(15_000);
    // …and then carry on: raises acknowledged while node3 was still down.
    expect(sent.filter((s) => s.status === 201 && !s.node3Up).length).toBeGreaterThan(0);

    // The launcher restarts node3; it rejoins by IST (or SST) and is Synced again.
    let state = '';
    // The launcher sees it ready on its own next probe, which may come a moment after the node answers Synced.
    for (let i = 0; i < 120 && !(state === 'Synced' && cluster.galera.nodes[2].status().up); i++) {
      await new Promise((r) => setTimeout(r, 500));
      state = await onNode<{ Value: string }[]>(2, "SHOW GLOBAL STATUS LIKE 'wsrep_local_state_comment'").then((rows) => rows[0]?.Value ?? '', () => '');
    }
    expect(state).toBe('Synced');
    expect(cluster.galera.nodes[2].status()).toMatchObject({ up: true, restarts: 1 });
    const errLog = fs.readFileSync(path.join(cluster.galera.nodes[2].dataDir, 'mariadbd.err'), 'utf8');
    // After the restart (the last start in its log) it received the cluster's state again.
    expect(errLog.split(/Starting MariaDB/).at(-1)).toMatch(/SST received|IST received/);

    const keys = (i: number) => onNode<{ k: string; n: bigint }[]>(i, "SELECT idempotency_key AS k, COUNT(*) AS n FROM tags WHERE idempotency_key LIKE 'burst-%' GROUP BY idempotency_key ORDER BY k");
    const [one, three] = [await keys(0), await keys(2)];
    expect(one.map((r) => Number(r.n))).toEqual(Array.from({ length: 40 }, () => 1));
    expect(three.map((r) => [r.k, Number(r.n)])).toEqual(one.map((r) => [r.k, Number(r.n)]));
  }, 120_000);
});
