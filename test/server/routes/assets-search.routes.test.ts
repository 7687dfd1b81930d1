import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildAssetListSql } from '@/server/services/assets.query';
import { assetListQuery } from '@/shared/schemas/queries';
import { generateLabelCode } from '@/shared/rules/label-code';
import { createOrganisation, setupTestApp, tokenFor, type TestApp } from '@/test/setup/app';
import { as, assetBody, created, roomBody, siteBody, type Client } from '@/test/server/support/register';

let t: TestApp;
let c: Client;
let birch: Client;
let orgId: number;
let adminId: number;
let schoolId: number;
let poolId: number;
let roomId: number;

const plantIds = (res: { body: { items: { plantId: string }[] } }) => res.body.items.map((i) => i.plantId);

beforeAll(async () => {
  t = await setupTestApp();
  const alder = await createOrganisation('alder');
  orgId = alder.organisation.id;
  adminId = alder.users.admin.id;
  c = as(t, await tokenFor(t.app, alder.users.admin));
  birch = as(t, await tokenFor(t.app, (await createOrganisation('birch')).users.admin));
  schoolId = (await created(c.post('/api/sites', siteBody('Rowan School')))).id;
  poolId = (await created(c.post('/api/sites', siteBody('Rowan Pool')))).id;
  roomId = (await created(c.post('/api/plant-rooms', roomBody(schoolId, 'Boiler house')))).id;
  const items: [number, string, object][] = [
    [schoolId, 'B-01', { name: 'Boiler 1', type: 'boiler', system: 'LTHW primary', plantRoomId: roomId, serialNumber: 'QX-7781', serviceIntervalMonths: 12, lastServiceDate: '2020-05-01' }],
    [schoolId, 'B-02', { name: 'Boiler 2', type: 'boiler', system: 'LTHW primary', plantRoomId: roomId, serviceIntervalMonths: 12, lastServiceDate: '2020-03-01' }],
    [schoolId, 'P-01A', { name: 'Primary pump A', system: 'LTHW primary', plantRoomId: roomId }],
    [schoolId, 'P-02A', { name: 'Heating circuit 1 pump', system: 'LTHW heating circuit 1' }],
    [schoolId, 'P-03A', { name: 'Heating circuit 2 pump', system: 'LTHW heating circuit 2' }],
    [schoolId, 'CAL-01', { name: 'DHW storage', type: 'water-heater', system: 'DHW primary', serialNumber: 'QX-9001' }],
    [schoolId, 'V_12', { name: 'Mixing valve', type: 'valve', system: 'LTHW heating circuit 1' }],
    [poolId, 'P-10A', { name: 'Cold water booster pump', system: 'Cold water boosting' }],
    [poolId, 'FCU-3', { name: 'Reception fan coil', type: 'terminal-unit', system: 'LTHW heating circuit 2' }],
    [poolId, 'B-01', { name: 'Pool boiler', type: 'boiler', system: 'LTHW primary', serviceIntervalMonths: 6, lastServiceDate: '2020-01-01' }],
  ];
  for (const [site, plantId, extra] of items) await created(c.post('/api/assets', assetBody(site, plantId, extra)));
  const birchSite = await created(birch.post('/api/sites', siteBody('Birch Boiler Works')));
  await created(birch.post('/api/assets', assetBody(birchSite.id, 'B-01', { name: 'Birch boiler', type: 'boiler' })));
});
afterAll(() => t.close());

describe('GET /api/assets search', () => {
  it.each([
    ['plant ID prefix, any case', 'p-0', ['P-01A', 'P-02A', 'P-03A']],
    ['serial prefix', 'qx-9', ['CAL-01']],
    ['a word of the name', 'mixing', ['V_12']],
    ['a word prefix in the system, with a short word narrowing it', 'circuit 2', ['FCU-3', 'P-03A']],
    ['the start of the system', 'cold wat', ['P-10A']],
    ['a type by its label ("calorifier" is in the water heater label)', 'calorif', ['CAL-01']],
    ['LIKE wildcards taken literally', 'V_1', ['V_12']],
    ['a % matches nothing in particular', '%', []],
  ])('finds by %s', async (_what, q, expected) => {
    const res = await c.get(`/api/assets?q=${encodeURIComponent(q)}`);
    expect(res.status).toBe(200);
    expect(plantIds(res).sort()).toEqual([...expected].sort());
  });

  it('never returns another organisation’s items', async () => {
    const res = await c.get('/api/assets?q=boiler&pageSize=200');
    expect(res.body.items.map((i: { name: string }) => i.name).sort()).toEqual(['Boiler 1', 'Boiler 2', 'Pool boiler']);
    expect((await birch.get('/api/assets?q=boiler')).body.items.map((i: { name: string }) => i.name)).toEqual(['Birch boiler']);
  });

  it('filters by site, plant room and type together with a search', async () => {
    expect(plantIds(await c.get(`/api/assets?q=b-01&siteId=${poolId}`))).toEqual(['B-01']);
    expect((await c.get(`/api/assets?q=b-01&siteId=${poolId}`)).body.items[0].siteName).toBe('Rowan Pool');
    expect(plantIds(await c.get(`/api/assets?plantRoomId=${roomId}`))).toEqual(['B-01', 'B-02', 'P-01A']);
    expect(plantIds(await c.get(`/api/assets?type=boiler&siteId=${schoolId}`))).toEqual(['B-01', 'B-02']);
  });
});

describe('GET /api/assets paging and order', () => {
  it('pages with total, page and pageSize, and caps the page size at 200', async () => {
    const first = await c.get('/api/assets?pageSize=4&page=1');
    const third = await c.get('/api/assets?pageSize=4&page=3');
    expect(first.body).toMatchObject({ total: 10, page: 1, pageSize: 4 });
    expect(first.body.items).toHaveLength(4);
    expect(third.body.items).toHaveLength(2);
    const all = plantIds(await c.get('/api/assets?pageSize=1000'));
    expect((await c.get('/api/assets?pageSize=1000')).body.pageSize).toBe(200);
    expect([...plantIds(first), ...plantIds(await c.get('/api/assets?pageSize=4&page=2')), ...plantIds(third)]).toEqual(all);
  });

  it('sorts by plant ID, name, type and next service due in both directions', async () => {
    const ids = plantIds(await c.get('/api/assets?pageSize=200'));
    expect(ids).toEqual(['B-01', 'B-01', 'B-02', 'CAL-01', 'FCU-3', 'P-01A', 'P-02A', 'P-03A', 'P-10A', 'V_12']);
    expect(plantIds(await c.get('/api/assets?sort=-plantId'))[0]).toBe('V_12');
    const names = (await c.get('/api/assets?sort=name')).body.items.map((i: { name: string }) => i.name);
    expect(names).toEqual([...names].sort((a: string, b: string) => a.toLowerCase().localeCompare(b.toLowerCase())));
    expect((await c.get('/api/assets?sort=type')).body.items[0].type).toBe('boiler');
    expect((await c.get('/api/assets?sort=-type')).body.items[0].type).toBe('water-heater');
    // Pool boiler due 2020-07-01, B-02 2021-03-01, B-01 2021-05-01; items without a date last.
    expect(plantIds(await c.get('/api/assets?sort=nextServiceDue')).slice(0, 4)).toEqual(['B-01', 'B-02', 'B-01', 'CAL-01']);
    expect((await c.get('/api/assets?sort=nextServiceDue')).body.items.slice(0, 3).map((i: { nextServiceDue: string }) => i.nextServiceDue))
      .toEqual(['2020-07-01', '2021-03-01', '2021-05-01']);
    expect(plantIds(await c.get('/api/assets?sort=-nextServiceDue')).slice(0, 3)).toEqual(['B-01', 'B-02', 'B-01']);
  });

  it('refuses an unknown sort or type and a bad id filter (400 naming the parameter)', async () => {
    for (const [query, field] of [['sort=colour', 'sort'], ['type=kettle', 'type'], ['siteId=abc', 'siteId']]) {
      const res = await c.get(`/api/assets?${query}`);
      expect(res.status).toBe(400);
      expect(res.body.error.fields).toHaveProperty(field);
    }
  });
});

describe('search query plan', () => {
  it('answers each part of a search from an index, not a scan of the table', async () => {
    // Enough rows that a table scan would be the optimiser's choice if an index were missing.
    const rows = Array.from({ length: 3000 }, (_, i) => [
      orgId, poolId, `Z-${String(i).padStart(4, '0')}`, generateLabelCode(), `Filler pump ${i}`, 'pump', `Filler circuit ${i % 50}`, '[]', `SN${i}`, '', '{}', adminId,
    ]);
    await t.db.rootQuery(
      `INSERT INTO assets (organisation_id, site_id, plant_id, label_code, name, type, system, energy_sources, serial_number, notes, attributes, created_by, created_at, updated_at)
       VALUES ${rows.map(() => '(?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, NOW(3), NOW(3))').join(', ')}`,
      rows.flat(),
    );
    await t.db.rootQuery('ANALYZE TABLE assets');
    const sql = buildAssetListSql(orgId, assetListQuery.validateSync({ q: 'mixing valve' }), { pageSize: 50, offset: 0 });
    expect(sql.idsSql).toContain('MATCH(name, system)');
    const plan = await t.db.sequelize.query<{ table: string; type: string; key: string | null }>(`EXPLAIN ${sql.idsSql}`, {
      replacements: sql.replacements,
      type: QueryTypes.SELECT,
    });
    const branches = plan.filter((p) => p.table === 'assets');
    if (process.env.SHOW_PLAN) console.log(plan);
    expect(branches.length).toBeGreaterThanOrEqual(5);
    for (const p of branches) expect(p, JSON.stringify(p)).toMatchObject({ key: expect.stringMatching(/^assets_/) });
    expect(branches.some((p) => p.type === 'fulltext')).toBe(true);
  });

  it('pages the unfiltered list in plant ID order straight from an index, without sorting the table', async () => {
    const sql = buildAssetListSql(orgId, assetListQuery.validateSync({}), { pageSize: 50, offset: 0 });
    const plan = await t.db.sequelize.query<{ table: string; key: string | null; Extra: string }>(`EXPLAIN ${sql.idsSql}`, {
      replacements: sql.replacements,
      type: QueryTypes.SELECT,
    });
    if (process.env.SHOW_PLAN) console.log(plan);
    expect(plan).toHaveLength(1);
    expect(plan[0].key).toBe('assets_org_plant_id');
    expect(plan[0].Extra).not.toMatch(/filesort/);
  });
});
