import fc from 'fast-check';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { clock } from '@/server/lib/clock';
import { createOrganisation, setupTestApp, tokenFor, type OrgUsers, type TestApp } from '@/test/setup/app';
import { as, assetBody, created, roomBody, siteBody } from '@/test/server/support/register';
import { jpegWithGps } from '@/test/server/support/images';
import { insertTag } from '@/test/server/support/tag-fixtures';
import { apiRoutes } from '@/test/server/support/api-routes';

/*
 * Walks every route the API has (read from the app's own router, so a new route is fuzzed without being listed here)
 * as each role and as another organisation's admin, with generated bad input in the path, the query and the body.
 * It passes when nothing answers 5xx and a refused request (4xx) changes no row. The seed is fixed and printed;
 * replay a failure with FUZZ_SEED=<seed>.
 */
const SEED = Number(process.env.FUZZ_SEED ?? 20261202);
const RUNS = Number(process.env.FUZZ_RUNS ?? 16);

let t: TestApp;
let u: OrgUsers;
const tokens: Record<string, string> = {};
const ids: Record<string, number | string> = {};
let tables: string[] = [];

// Values that are wrong for almost every field: wrong types, absurd numbers, long and odd strings.
const badScalar = fc.oneof(
  fc.constantFrom('abc', '1e999', '-1', '0', '1.5', 'NaN', 'Infinity', '-Infinity', '0x1f', ' 7 ', '', '9'.repeat(40), '1e300', '%00', 'null', 'true'),
  fc.constantFrom('\u202Eevil', '\u0000', 'e\u0301', '💥🔥', '\uFEFF', 'a\u200Bb', "'; DROP TABLE users; --", '=HYPERLINK("x")', '../../etc/passwd'),
  fc.string({ maxLength: 20, unit: 'binary' }),
  fc.constant('x'.repeat(20_000)),
);
const badJson = fc.oneof(
  badScalar,
  fc.constantFrom(1e308, -1e308, -1, 0, 2 ** 53 + 1, 1.5, -0.0001, 99999999999),
  fc.boolean(),
  fc.constant(null),
  fc.array(badScalar, { maxLength: 3 }),
  fc.dictionary(fc.constantFrom('a', 'id', 'name'), badScalar, { maxKeys: 2 }),
);
// Field names the API's bodies and queries use, so the bad values land where validation must catch them.
const FIELDS = [
  'id', 'name', 'email', 'password', 'token', 'role', 'active', 'siteId', 'siteIds', 'plantRoomId', 'assetId', 'assetIds', 'plantId', 'type',
  'kind', 'reason', 'expiresAt', 'energySources', 'points', 'contactPhone', 'lockNumber', 'normalState', 'leftState', 'checks', 'note', 'text',
  'holderId', 'timeZone', 'address', 'floorArea', 'safety', 'attributes', 'flowTemperatureC', 'returnTemperatureC', 'systemPressureGaugePa',
  'surfaceTemperatures', 'page', 'pageSize', 'q', 'sort', 'status', 'dryRun', 'layout', 'fromAssetId', 'toAssetId', 'medium', 'purpose',
  'jobReference', 'notifications', 'designDeltaTK', 'includeArchived', 'from', 'to', 'caption', 'serviceIntervalMonths', 'installDate',
];
const badFields = fc.dictionary(fc.constantFrom(...FIELDS), badJson, { maxKeys: 6 });
const badQuery = fc.dictionary(fc.constantFrom(...FIELDS), fc.oneof(badScalar, fc.array(badScalar, { minLength: 2, maxLength: 3 })), { maxKeys: 4 });

/** A path parameter: usually a bad one, sometimes a real id of this organisation so the query and body are reached. */
function pathValue(path: string, param: string) {
  const head = path.split('/')[2];
  const real = param === 'code' ? ids.label : param === 'name' ? 'LTHW' : ids[head] ?? ids.assets;
  return fc.oneof({ weight: 2, arbitrary: badScalar.map((v) => encodeURIComponent(v)) }, { weight: 1, arbitrary: fc.constant(String(real)) }, { weight: 1, arbitrary: fc.constant(String(ids.foreign)) });
}

/** A fingerprint of every table but the audit log (which records refused attempts on purpose). */
async function fingerprint(): Promise<string> {
  const rows = await t.db.rootQuery<{ Table: string; Checksum: number }[]>(`CHECKSUM TABLE ${tables.join(', ')}`);
  return rows.map((r) => `${r.Table}=${r.Checksum}`).join(';');
}

/** Puts the people back as they were (a generated request may have changed a role or signed someone out). */
async function restorePeople() {
  for (const [key, user] of Object.entries(u)) {
    await t.db.rootQuery(`UPDATE users SET active = 1, role = '${key === 'engineer2' ? 'engineer' : key}', token_version = ${user.tokenVersion} WHERE id = ${user.id}`);
  }
}

beforeAll(async () => {
  t = await setupTestApp({ loginRateLimit: { max: 1_000_000, windowMs: 60_000 } });
  const org = await createOrganisation('fuzz');
  u = org.users;
  const other = await createOrganisation('other');
  for (const k of ['admin', 'supervisor', 'engineer', 'viewer'] as const) tokens[k] = await tokenFor(t.app, u[k]);
  tokens.foreignAdmin = await tokenFor(t.app, other.users.admin);
  const admin = as(t, tokens.admin);
  const site = await created(admin.post('/api/sites', siteBody('Fuzz Works')));
  const room = await created(admin.post('/api/plant-rooms', roomBody(site.id, 'Fuzz room')));
  const asset = await created<{ labelCode: string }>(admin.post('/api/assets', assetBody(site.id, 'F-1', { plantRoomId: room.id, system: 'LTHW' })));
  const tag = await insertTag({ organisationId: org.organisation.id, assetId: asset.id, holderId: u.engineer.id, now: clock.now(), expiresInHours: 4 });
  const photo = await created(admin.upload(`/api/assets/${asset.id}/photos`, 'photo', await jpegWithGps(), 'p.jpg', 'image/jpeg'));
  const reading = await created(as(t, tokens.engineer).post(`/api/assets/${asset.id}/readings`, { flowTemperatureC: 70 }));
  const foreignSite = await created(as(t, tokens.foreignAdmin).post('/api/sites', siteBody('Other Works')));
  await admin.put(`/api/users/${u.viewer.id}/sites`, { siteIds: [site.id] });
  Object.assign(ids, {
    sites: site.id, 'plant-rooms': room.id, assets: asset.id, tags: tag.id, photos: photo.id, readings: reading.id, users: u.engineer.id,
    label: asset.labelCode, foreign: foreignSite.id,
  });
  tables = (await t.db.rootQuery<{ name: string }[]>(
    "SELECT table_name AS name FROM information_schema.tables WHERE table_schema = DATABASE() AND table_type = 'BASE TABLE' AND table_name NOT IN ('audit_events', 'SequelizeMeta')",
  )).map((r) => `\`${r.name}\``);
}, 120_000);
afterAll(() => t.close());

describe('API fuzz', () => {
  it(`answers every route, role and bad input without a 5xx, and a refused request changes no row (seed ${SEED})`, async () => {
    console.log(`API fuzz: seed ${SEED}, ${RUNS} runs per route (replay with FUZZ_SEED=${SEED}); tables watched: ${(await fingerprint()).slice(0, 160)}…`);
    const routes = apiRoutes(t.app).filter((r) => r.path !== '/api/auth/logout');
    expect(routes.length).toBeGreaterThan(50);
    const failures: string[] = [];
    let requests = 0;
    for (const route of routes) {
      const params = [...route.path.matchAll(/:(\w+)/g)].map((m) => m[1]);
      const input = fc.record({
        who: fc.constantFrom('admin', 'supervisor', 'engineer', 'viewer', 'foreignAdmin', 'none'),
        path: fc.tuple(...params.map((p) => pathValue(route.path, p))),
        query: badQuery,
        body: fc.oneof(badFields, fc.constant({}), fc.array(badJson, { maxLength: 2 })),
      });
      await fc.assert(
        fc.asyncProperty(input, async ({ who, path, query, body }) => {
          let url = route.path;
          params.forEach((p, i) => { url = url.replace(`:${p}`, (path as string[])[i] || 'x'); });
          const writes = route.method !== 'get';
          const before = writes ? await fingerprint() : '';
          let req = request(t.app)[route.method](url).query(query as Record<string, string>);
          if (who !== 'none') req = req.set('Authorization', `Bearer ${tokens[who]}`);
          const res = writes ? await req.send(body as object) : await req;
          requests += 1;
          const problem =
            res.status >= 500 ? `${res.status} ${JSON.stringify(res.body).slice(0, 200)}`
              : writes && res.status >= 400 && (await fingerprint()) !== before ? `refused with ${res.status} but changed a row`
                : null;
          if (problem) failures.push(`${route.method.toUpperCase()} ${url}?${new URLSearchParams(query as Record<string, string>)} as ${who} body ${JSON.stringify(body).slice(0, 200)}: ${problem}`);
          return problem === null;
        }),
        { seed: SEED, numRuns: RUNS, endOnFailure: true },
      ).catch(() => undefined);
      await restorePeople();
    }
    console.log(`API fuzz: ${routes.length} routes, ${requests} requests, ${failures.length} failures`);
    expect(failures).toEqual([]);
  }, 600_000);
});
