/*
 * npm run bench — the speed and size figures, each printed with its ratio or target:
 *   board at 5,000 live + 100,000 cleared tags (HTTP) against the same SQL sent raw through the mariadb driver, the two
 *   taking turns; label lookup and item record over a register of several sites, plant rooms and items; JavaScript
 *   before first render (sign-in, a label's page) against a near-blank Expo Router app built in the same run;
 *   scan-to-record in Chromium with a fake camera.
 * Needs a built web app (npm run build:web). BENCH_LIVE, BENCH_CLEARED, BENCH_REQUESTS change the sizes;
 * BENCH_ONLY=pages measures only the JavaScript and the scan (no tags seeded, no database timings); BENCH_ONLY=db only
 * the database figures (no web build needed).
 */
import '@/scripts/lib/bench-env';
import fs from 'node:fs';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import QRCode from 'qrcode';
import { createApp } from '@/server/app';
import { readConfig } from '@/server/config';
import { createSequelize, prepareDatabase } from '@/server/db';
import { createPhotoStorage } from '@/server/lib/create-photo-storage';
import { Asset } from '@/server/models/asset.model';
import { User } from '@/server/models/user.model';
import { DEMO_PASSWORD, seedDemo } from '@/server/seed/demo';
import { labelUrl } from '@/shared/rules/label-code';
import { captureBoardSql, getter, rawBoard, timeInTurns, timeIt } from '@/scripts/lib/bench-db';
import { buildBlankApp, launchChromium, scriptsBeforeFirstRender, serveDist, type ScriptBytes } from '@/scripts/lib/bench-js';
import { seedBenchRegister, seedBenchTags } from '@/scripts/lib/bench-tags';
import { localAccounts, provisionDatabase } from '@/scripts/lib/local-db';
import { freePort, startPrivateMariaDb } from '@/scripts/lib/mariadb';
import { writeY4mFromPng } from '@/test/e2e/support/y4m';

const LIVE = Number(process.env.BENCH_LIVE ?? 5000);
const CLEARED = Number(process.env.BENCH_CLEARED ?? 100_000);
const REQUESTS = Number(process.env.BENCH_REQUESTS ?? 100);
const ONLY_PAGES = process.env.BENCH_ONLY === 'pages';
const ONLY_DB = process.env.BENCH_ONLY === 'db';
const DIST = path.resolve(__dirname, '../dist');
const say = (line: string) => console.log(`[bench] ${line}`);
const ms = (n: number) => `${n.toFixed(1)} ms`;
const kb = (n: number) => `${(n / 1024).toFixed(0)} KB`;
const verdict = (ok: boolean) => (ok ? 'meets target' : 'MISSES target');

async function main() {
  if (!ONLY_DB && !fs.existsSync(path.join(DIST, 'index.html'))) throw new Error('dist/index.html is missing: npm run build:web first');
  const tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'isoledger-bench-'));
  const db = await startPrivateMariaDb({ dataDir: path.join(tmp, 'db'), port: await freePort() });
  // The server's own restricted account, as npm start uses it; the raw queries go through the same account.
  const { ownerUrl, serverUrl } = await provisionDatabase(db, { ...localAccounts(tmp), database: 'bench' });
  await prepareDatabase(ownerUrl, serverUrl);
  const sequelize = createSequelize(serverUrl);
  const closers: (() => Promise<unknown>)[] = [];
  try {
    const config = readConfig({ DATA_DIR: tmp }, { jwtSecret: 'bench-secret-not-for-production-use-only', webDir: DIST, bcryptCost: 10, loginRateLimit: { max: 1000, windowMs: 60_000 } });
    await seedDemo(sequelize, { storage: createPhotoStorage(config) });
    const supervisor = (await User.findOne({ where: { email: 'supervisor@example.test' } }))!;
    if (!ONLY_PAGES) {
      say(`seeding a register and ${LIVE} live and ${CLEARED} cleared tags…`);
      const register = await seedBenchRegister(supervisor.organisationId, supervisor.id);
      const seeded = await seedBenchTags(sequelize, supervisor.organisationId, LIVE, CLEARED);
      say(`seeded ${seeded.sites} sites, ${register.rooms} bench plant rooms, ${seeded.items} items; ${seeded.points} isolation points, ${seeded.proofs} proofs, ${seeded.events} tag events`);
    }

    const server = createApp({ sequelize, config }).listen(0, '127.0.0.1');
    await new Promise((r) => server.once('listening', r));
    closers.push(() => new Promise((r) => server.close(r)));
    const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
    const login = async (email: string) => ((await (await fetch(`${base}/api/auth/login`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email, password: DEMO_PASSWORD }) })).json()) as { token: string }).token;
    const token = await login('supervisor@example.test');
    const get = getter(base, token);

    // Board: the API against its own SQL sent raw.
    const actor = { id: supervisor.id, organisationId: supervisor.organisationId, role: supervisor.role, name: supervisor.name, email: supervisor.email };
    // Items spread over the whole register (the demo's and the bench's, with their tag history).
    const everyItem = await Asset.findAll({ attributes: ['id'], where: { organisationId: supervisor.organisationId }, order: [['id', 'ASC']] });
    const step = Math.max(1, Math.floor(everyItem.length / 50));
    const items = await Asset.findAll({ where: { id: everyItem.filter((_, i) => i % step === 0).slice(0, 50).map((a) => a.id) }, order: [['id', 'ASC']] });
    if (!ONLY_PAGES) await databaseFigures();
    if (ONLY_DB) return;
    async function databaseFigures() {
      say(`load average while measuring: ${os.loadavg().map((l) => l.toFixed(2)).join(' ')} (${os.cpus().length} cores)`);
      const statements = await captureBoardSql(sequelize, actor);
      const raw = rawBoard(serverUrl, statements);
      closers.push(raw.close);
      const [board, direct] = await timeInTurns(REQUESTS, () => get('/board'), raw.run);
      say(`board, ${LIVE} live + ${CLEARED} cleared tags (GET /api/board, default view)   p50 ${ms(board.p50)}   p95 ${ms(board.p95)}`);
      say(`board, the same ${statements.length} statements raw through the mariadb driver, in turns   p50 ${ms(direct.p50)}   p95 ${ms(direct.p95)}`);
      const ratio = board.p95 / direct.p95;
      say(`board p95 ratio ${ratio.toFixed(2)}× raw (target ≤ 1.5×: ${verdict(ratio <= 1.5)}); p95 ${ms(board.p95)} (target ≤ 50 ms: ${verdict(board.p95 <= 50)})`);

      // Label lookup (what a scan waits for: the item's record by its label code) and the record by id.
      let n = 0;
      const label = await timeIt(REQUESTS, () => get(`/labels/${items[(n += 1) % items.length].labelCode}`));
      say(`label lookup (GET /api/labels/:code, ${items.length} items in turn)   p50 ${ms(label.p50)}   p95 ${ms(label.p95)} (aim ≤ 50 ms: ${verdict(label.p95 <= 50)})`);
      const record = await timeIt(REQUESTS, () => get(`/assets/${items[(n += 1) % items.length].id}`));
      say(`item record (GET /api/assets/:id)   p50 ${ms(record.p50)}   p95 ${ms(record.p95)} (aim ≤ 50 ms: ${verdict(record.p95 <= 50)})`);
      say(`load average after: ${os.loadavg().map((l) => l.toFixed(2)).join(' ')}`);
    }

    // JavaScript before first render.
    const blankDist = buildBlankApp(say);
    const blank = await serveDist(blankDist);
    closers.push(blank.close);
    const browser = await launchChromium();
    closers.push(() => browser.close());
    const item = items[0];
    const pages: [string, ScriptBytes][] = [
      ['near-blank Expo Router app (one QR code)', await scriptsBeforeFirstRender(browser, blank.url, 'blank-qr')],
      ['sign-in page', await scriptsBeforeFirstRender(browser, `${base}/sign-in`, 'sign-in-email')],
      ["a label's page (signed in)", await scriptsBeforeFirstRender(browser, `${base}/l/${item.labelCode}`, 'asset-state-banner', token)],
    ];
    const reference = pages[0][1];
    for (const [name, bytes] of pages) {
      const r = bytes.decoded / reference.decoded;
      const wire = bytes.transferred / reference.transferred;
      say(`JS before first render, ${name.padEnd(42)} ${kb(bytes.decoded).padStart(8)} ${r.toFixed(2)}× blank${name === pages[0][0] ? '' : ` (target ≤ 1.3×: ${verdict(r <= 1.3)})`}; on the wire ${kb(bytes.transferred)} brotli ${wire.toFixed(2)}×, ${bytes.files} files`);
    }

    // Scan to record with a fake camera showing the item's label.
    const png = await QRCode.toBuffer(labelUrl(base, item.labelCode), { errorCorrectionLevel: 'M', margin: 4, width: 320 });
    const video = path.join(tmp, 'label.y4m');
    writeY4mFromPng(png, video, { width: 640, height: 480, frames: 10, fps: 10 });
    const camera = await launchChromium(['--use-fake-ui-for-media-stream', '--use-fake-device-for-media-stream', `--use-file-for-fake-video-capture=${video}`]);
    closers.push(() => camera.close());
    const scans: number[] = [];
    for (let i = 0; i < 5; i += 1) {
      const context = await camera.newContext({ viewport: { width: 390, height: 844 } });
      await context.addInitScript((t) => window.localStorage.setItem('isoledger.token', t), token);
      const page = await context.newPage();
      await page.goto(`${base}/scan`);
      await page.getByTestId('scan-camera').or(page.getByTestId('scan-allow-camera')).first().waitFor({ timeout: 60_000 });
      if (await page.getByTestId('scan-allow-camera').isVisible()) await page.getByTestId('scan-allow-camera').click();
      await page.getByTestId('scan-camera').waitFor();
      const t0 = performance.now();
      await page.waitForURL(`${base}/assets/${item.id}`, { timeout: 30_000 });
      await page.getByTestId('asset-state-banner').waitFor();
      scans.push(performance.now() - t0);
      await context.close();
    }
    scans.sort((a, b) => a - b);
    say(`scan to record (camera shown → item record, fake camera, ${scans.length} runs)   median ${ms(scans[Math.floor(scans.length / 2)])}   worst ${ms(scans[scans.length - 1])}`);
  } finally {
    for (const close of closers.reverse()) await close().catch(() => undefined);
    await sequelize.close();
    await db.stop();
    fs.rmSync(tmp, { recursive: true, force: true });
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
