import { parse } from 'csv-parse/sync';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { REGISTER_COLUMNS } from '@/server/lib/register-csv';
import { READING_EXPORT_COLUMNS } from '@/server/services/readings.export';

// The export adds the latest readings after the register columns; imports skip them.
const EXPORT_COLUMNS = [...REGISTER_COLUMNS, ...READING_EXPORT_COLUMNS.map((c) => c.header)];
import { Asset } from '@/server/models/asset.model';
import { PlantRoom } from '@/server/models/plant-room.model';
import { createOrganisation, giveViewerEverySite, setupTestApp, tokenFor, type OrgUsers, type TestApp } from '@/test/setup/app';
import { as, assetBody, created, roomBody, siteBody, type Client } from '@/test/server/support/register';

let t: TestApp;
let alder: OrgUsers;
let orgId: number;
const c = {} as Record<'admin' | 'supervisor' | 'engineer' | 'viewer', Client>;
let birch: Client;

const HEADER = 'site,plantRoom,plantId,name,type,system,energySources,serviceIntervalMonths,lastServiceDate,attributes.ratedOutputKw,attributes.capacityL';
const csv = (...rows: string[]) => Buffer.from([HEADER, ...rows].join('\n') + '\n');
const importFile = (who: Client, file: Buffer, dryRun: boolean) => who.upload(`/api/assets/import?dryRun=${dryRun}`, 'file', file, 'register.csv', 'text/csv');
const assetCount = () => Asset.count({ where: { organisationId: orgId } });

beforeAll(async () => {
  t = await setupTestApp();
  const org = await createOrganisation('alder');
  alder = org.users;
  orgId = org.organisation.id;
  for (const role of ['admin', 'supervisor', 'engineer', 'viewer'] as const) c[role] = as(t, await tokenFor(t.app, alder[role]));
  birch = as(t, await tokenFor(t.app, (await createOrganisation('birch')).users.admin));
  const school = await created(c.admin.post('/api/sites', siteBody('Oak School')));
  await created(c.admin.post('/api/sites', siteBody('Oak Pool')));
  await created(c.engineer.post('/api/plant-rooms', roomBody(school.id, 'Boiler house')));
  await created(birch.post('/api/sites', siteBody('Birch Yard')));
});
afterAll(() => t.close());
// The viewer here stands for any reader: it is given every site (site limits are tested in test/server/services/site-access.test.ts).
beforeEach(() => giveViewerEverySite(alder.viewer));

describe('POST /api/assets/import', () => {
  it('imports nothing from a file with bad rows and names every bad row, column and problem', async () => {
    const file = csv(
      'Oak School,Boiler house,B-01,Boiler 1,boiler,LTHW primary,gas;electrical,12,2024-01-31,320,', // good
      'Nowhere,Boiler house,B-02,Boiler 2,boiler,LTHW primary,gas,12,,,', // unknown site
      'Oak School,Boiler house,P-01,Pump 1,kettle,LTHW primary,electrical,,,,', // bad type
      '',
      'Oak School,,P-02,Pump 2,pump,LTHW primary,electrical;steam,,2024-02-30,,', // bad energy source and date
      'Oak School,,P-03,Pump 3,pump,LTHW primary,,,,,50', // attribute of another type
      'Oak School,,B-01,Boiler again,boiler,,,,,abc,', // duplicate plant ID and a number that is not
      'Birch Yard,,X-01,Foreign,other,,,,,,', // another organisation's site is unknown here
    );
    const before = await assetCount();
    const res = await importFile(c.supervisor, file, false);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ dryRun: false, rows: 7, created: 0, updated: 0 });
    const errs = res.body.errors.map((e: { row: number; column: string }) => `${e.row}:${e.column}`);
    // Row numbers count the header as row 1; the blank line is row 5.
    expect(errs).toEqual([
      '3:site', '4:type', '6:energySources', '6:lastServiceDate', '7:attributes.capacityL', '8:plantId', '8:attributes.ratedOutputKw', '9:site',
    ]);
    expect(res.body.errors.find((e: { row: number; column: string }) => e.row === 8 && e.column === 'plantId').message).toMatch(/row 2/);
    expect(await assetCount()).toBe(before);
  });

  it('previews with dryRun (nothing written), then commits, creating a plant room named in the file', async () => {
    const file = csv(
      'Oak School,Boiler house,B-01,Boiler 1,boiler,LTHW primary,gas;electrical,12,2024-01-31,320,',
      'Oak School,Boiler house,CAL-01,Calorifier,Water heater / calorifier,DHW primary,hot-water,6,2024-03-01,,1500',
      'oak pool,Pool plant room,P-20A,Pool pump A,pump,Pool water circulation,electrical;mechanical,,,,',
    );
    const preview = await importFile(c.supervisor, file, true);
    expect(preview.body).toEqual({ dryRun: true, rows: 3, created: 3, updated: 0, unchanged: 0, newPlantRooms: [{ site: 'Oak Pool', name: 'Pool plant room' }], errors: [] });
    expect(await assetCount()).toBe(0);
    expect(await PlantRoom.count({ where: { name: 'Pool plant room' } })).toBe(0);

    const commit = await importFile(c.supervisor, file, false);
    expect(commit.body).toMatchObject({ dryRun: false, created: 3, updated: 0, errors: [] });
    expect(await assetCount()).toBe(3);
    const cal = await Asset.findOne({ where: { plantId: 'CAL-01' } });
    expect(cal).toMatchObject({ type: 'water-heater', attributes: { capacityL: 1500, setpointC: null }, nextServiceDue: '2024-09-01', createdBy: alder.supervisor.id });
    const pump = await Asset.findOne({ where: { plantId: 'P-20A' }, include: [{ model: PlantRoom, as: 'plantRoom' }] });
    expect(pump!.plantRoom!.name).toBe('Pool plant room');
  });

  it('updates by site + plant ID on re-import, never duplicating', async () => {
    const file = csv(
      'Oak School,Boiler house,B-01,Boiler 1,boiler,LTHW primary,gas;electrical,12,2024-01-31,320,',
      'Oak School,Boiler house,CAL-01,Calorifier,water-heater,DHW primary,hot-water,6,2024-03-01,,1500',
      'Oak Pool,Pool plant room,P-20A,Pool pump A,pump,Pool water circulation,electrical;mechanical,,,,',
    );
    const again = await importFile(c.admin, file, false);
    expect(again.body).toMatchObject({ created: 0, updated: 0, unchanged: 3, newPlantRooms: [], errors: [] });
    const changed = csv('Oak School,Boiler house,b-01,Boiler 1 (lead),boiler,LTHW primary,gas;electrical,12,2024-01-31,350,');
    const res = await importFile(c.admin, changed, false);
    expect(res.body).toMatchObject({ created: 0, updated: 1, unchanged: 0 });
    expect(await assetCount()).toBe(3);
    // Columns the file leaves out keep their stored values.
    const b01 = await Asset.findOne({ where: { plantId: 'B-01' } });
    expect(b01).toMatchObject({ name: 'Boiler 1 (lead)', attributes: { ratedOutputKw: 350, fuel: '' } });
  });

  it('refuses a header without a required column or with an unknown one (row 1), and a broken file', async () => {
    const res = await importFile(c.admin, Buffer.from('site,plantId,name,colour\nOak School,Z-1,Thing,red\n'), true);
    expect(res.body.errors).toEqual([
      expect.objectContaining({ row: 1, column: 'colour' }),
      expect.objectContaining({ row: 1, column: 'type', message: 'This column is required.' }),
    ]);
    const broken = await importFile(c.admin, Buffer.from('site,plantId,name,type\n"Oak School,Z-1,Thing,pump\n'), true);
    expect(broken.body.errors[0].message).toMatch(/not valid CSV/);
  });

  it('is for supervisors and admins (403 for engineers) and needs the file field', async () => {
    expect((await importFile(c.engineer, csv(), true)).status).toBe(403);
    expect((await importFile(c.viewer, csv(), true)).status).toBe(403);
    const none = await c.admin.post('/api/assets/import?dryRun=true', {});
    expect(none.status).toBe(400);
    expect(none.body.error.fields).toHaveProperty('file');
  });
});

describe('GET /api/assets/export.csv', () => {
  it('exports the import columns and imports back unchanged (round trip)', async () => {
    const site = (await c.admin.get('/api/sites')).body.items.find((s: { name: string }) => s.name === 'Oak School');
    await created(c.engineer.post('/api/assets', assetBody(site.id, 'O-01', {
      type: 'other', notes: '=HYPERLINK("http://example.test","click")\nSecond line, with "quotes"', manufacturer: '+Maker', serialNumber: "'=odd",
    })));
    await created(c.engineer.post('/api/assets', assetBody(site.id, 'EV-01', { type: 'vessel', attributes: { capacityL: 80, preChargeBar: 1.5 }, installDate: '2019-04-01' })));
    const archived = await created(c.engineer.post('/api/assets', assetBody(site.id, 'OLD-1')));
    await c.supervisor.post(`/api/assets/${archived.id}/archive`);

    const exported = await c.viewer.get('/api/assets/export.csv').buffer(true);
    expect(exported.status).toBe(200);
    expect(exported.headers['content-type']).toMatch(/^text\/csv/);
    expect(exported.headers['content-disposition']).toMatch(/attachment; filename="isoledger-register-\d{4}-\d{2}-\d{2}\.csv"/);
    const text = exported.text;
    const table: string[][] = parse(text, { bom: true });
    expect(table[0]).toEqual(EXPORT_COLUMNS);
    expect(table.slice(1).map((r) => r[2]).sort()).toEqual(['B-01', 'CAL-01', 'EV-01', 'O-01', 'P-20A']);
    const o01 = table.find((r) => r[2] === 'O-01')!;
    // Cells a spreadsheet would run as formulas start with ' (OWASP, "CSV Injection").
    expect(o01[REGISTER_COLUMNS.indexOf('notes')]).toMatch(/^'=HYPERLINK/);
    expect(o01[REGISTER_COLUMNS.indexOf('manufacturer')]).toBe("'+Maker");

    const before = await Asset.findAll({ where: { organisationId: orgId }, order: [['id', 'ASC']], raw: true });
    const back = await importFile(c.supervisor, Buffer.from(text), false);
    expect(back.body).toMatchObject({ rows: 5, created: 0, updated: 0, unchanged: 5, errors: [] });
    const after = await Asset.findAll({ where: { organisationId: orgId }, order: [['id', 'ASC']], raw: true });
    expect(after).toEqual(before);
    expect((await Asset.findOne({ where: { plantId: 'O-01' } }))!).toMatchObject({ manufacturer: '+Maker', serialNumber: "'=odd" });
    expect((await c.viewer.get('/api/assets/export.csv')).text).toBe(text);
  });

  it('exports only the caller’s organisation', async () => {
    const text = (await birch.get('/api/assets/export.csv')).text;
    expect(parse(text, { bom: true })).toEqual([EXPORT_COLUMNS]);
  });
});
