/*
 * Times GET /api/board over the demo data plus extra tags, in a throwaway database on a private MariaDB.
 *   npx tsx scripts/bench-board.ts            (BENCH_LIVE=2000 BENCH_CLEARED=20000 BENCH_REQUESTS=60 to change the sizes)
 * Prints min / median / p95 / max per scenario, a burst of simultaneous refreshes, and the query plan.
 */
import fs from 'node:fs';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { QueryTypes } from 'sequelize';
import { createApp } from '@/server/app';
import { readConfig } from '@/server/config';
import { createSequelize, prepareDatabase } from '@/server/db';
import { createPhotoStorage } from '@/server/lib/create-photo-storage';
import { User } from '@/server/models/user.model';
import { UserSiteAccess } from '@/server/models/user-site-access.model';
import { DEMO_PASSWORD, seedDemo } from '@/server/seed/demo';
import { getBoard } from '@/server/services/board.service';
import { boardQuery } from '@/shared/schemas/queries';
import { seedBenchTags } from '@/scripts/lib/bench-tags';
import { freePort, startPrivateMariaDb } from '@/scripts/lib/mariadb';
import { localAccounts, provisionDatabase } from '@/scripts/lib/local-db';

const LIVE = Number(process.env.BENCH_LIVE ?? 2000);
const CLEARED = Number(process.env.BENCH_CLEARED ?? 20000);
const REQUESTS = Number(process.env.BENCH_REQUESTS ?? 60);
const BURST = Number(process.env.BENCH_BURST ?? 25);
const say = (line: string) => console.log(`[bench-board] ${line}`);

const stats = (ms: number[]) => {
  const s = [...ms].sort((a, b) => a - b);
  const at = (q: number) => s[Math.min(s.length - 1, Math.floor(q * s.length))];
  return `min ${s[0].toFixed(1)}  median ${at(0.5).toFixed(1)}  p95 ${at(0.95).toFixed(1)}  max ${s[s.length - 1].toFixed(1)} ms`;
};

async function main() {
  const tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'isoledger-bench-'));
  const db = await startPrivateMariaDb({ dataDir: path.join(tmp, 'db'), port: await freePort() });
  const { ownerUrl, serverUrl } = await provisionDatabase(db, { ...localAccounts(tmp), database: 'bench' });
  await prepareDatabase(ownerUrl, serverUrl);
  const sequelize = createSequelize(serverUrl);
  let server: import('node:http').Server | null = null;
  try {
    const config = readConfig({ DATA_DIR: tmp }, { jwtSecret: 'bench-secret-not-for-production', webDir: null, bcryptCost: 10, loginRateLimit: { max: 1000, windowMs: 60_000 } });
    await seedDemo(sequelize, { storage: createPhotoStorage(config) });
    const supervisor = (await User.findOne({ where: { email: 'supervisor@example.test' } }))!;
    const viewer = (await User.findOne({ where: { email: 'viewer@example.test' } }))!;
    const size = await seedBenchTags(supervisor.organisationId, LIVE, CLEARED);
    const siteIds = (await sequelize.query<{ id: number }>('SELECT id FROM sites ORDER BY id', { type: QueryTypes.SELECT })).map((r) => r.id);
    await UserSiteAccess.bulkCreate(siteIds.slice(0, Math.max(1, Math.floor(siteIds.length / 2))).map((siteId) => ({ userId: viewer.id, siteId, grantedBy: null })));
    say(`demo data + ${LIVE} live and ${CLEARED} cleared tags over ${size.assets} items on ${size.sites} sites`);

    server = createApp({ sequelize, config }).listen(0, '127.0.0.1');
    await new Promise((r) => server!.once('listening', r));
    const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
    const login = async (email: string) => ((await (await fetch(`${base}/api/auth/login`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email, password: DEMO_PASSWORD }) })).json()) as { token: string }).token;
    const tokens = { supervisor: await login('supervisor@example.test'), viewer: await login('viewer@example.test') };
    const get = async (who: keyof typeof tokens, query: string) => {
      const t0 = performance.now();
      const res = await fetch(`${base}/api/board${query}`, { headers: { authorization: `Bearer ${tokens[who]}` } });
      if (res.status !== 200) throw new Error(`${query}: ${res.status}`);
      await res.arrayBuffer();
      return performance.now() - t0;
    };
    const scenarios: [string, keyof typeof tokens, string][] = [
      ['default view (50 rows, counts)', 'supervisor', ''],
      ['overdue only', 'supervisor', '?state=overdue'],
      ['one site, sorted by holder', 'supervisor', `?siteId=${siteIds[0]}&sort=holder`],
      ['search "seal"', 'supervisor', '?q=seal'],
      ['page 10, sorted by raised desc', 'supervisor', '?page=10&sort=-raised'],
      ['viewer (half the sites)', 'viewer', ''],
    ];
    for (const [label, who, query] of scenarios) {
      for (let i = 0; i < 5; i += 1) await get(who, query);
      const times: number[] = [];
      for (let i = 0; i < REQUESTS; i += 1) times.push(await get(who, query));
      say(`${label.padEnd(34)} ${stats(times)}`);
    }
    const actor = { id: supervisor.id, organisationId: supervisor.organisationId, role: supervisor.role, name: supervisor.name, email: supervisor.email };
    const inProcess: number[] = [];
    for (let i = 0; i < REQUESTS; i += 1) {
      const t1 = performance.now();
      await getBoard(sequelize, actor, boardQuery.validateSync({}), { page: 1, pageSize: 50, offset: 0 });
      inProcess.push(performance.now() - t1);
    }
    say(`${'default view, service only (no HTTP)'.padEnd(34)} ${stats(inProcess)}`);
    const t0 = performance.now();
    const burst = await Promise.all(Array.from({ length: BURST }, () => get('supervisor', '')));
    say(`${`${BURST} simultaneous refreshes`.padEnd(34)} ${stats(burst)}  (all done in ${(performance.now() - t0).toFixed(0)} ms)`);

    const plan = await sequelize.query<Record<string, unknown>>(
      `EXPLAIN SELECT STRAIGHT_JOIN t.id FROM tags t JOIN assets a ON a.id = t.asset_id JOIN sites s ON s.id = a.site_id LEFT JOIN plant_rooms r ON r.id = a.plant_room_id
       JOIN users h ON h.id = t.holder_id WHERE t.organisation_id = ? AND t.status = 'live' ORDER BY t.expires_at, t.id LIMIT 50`,
      { replacements: [supervisor.organisationId], type: QueryTypes.SELECT },
    );
    for (const row of plan) say(`plan: ${row.table} type=${row.type} key=${row.key} rows=${row.rows} ${row.Extra ?? ''}`);
  } finally {
    if (server) await new Promise((r) => server!.close(r));
    await sequelize.close();
    await db.stop();
    fs.rmSync(tmp, { recursive: true, force: true });
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
