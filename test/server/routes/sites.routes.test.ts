import { afterAll, beforeEach, beforeAll, describe, expect, it } from 'vitest';
import { Site } from '@/server/models/site.model';
import { createOrganisation, giveViewerEverySite, setupTestApp, tokenFor, type OrgUsers, type TestApp } from '@/test/setup/app';
import { as, created, roomBody, siteBody, type Client } from '@/test/server/support/register';

let t: TestApp;
let alder: OrgUsers;
let birchAdmin: Client;
const c = {} as Record<'admin' | 'supervisor' | 'engineer' | 'viewer', Client>;

beforeAll(async () => {
  t = await setupTestApp();
  alder = (await createOrganisation('alder')).users;
  const birch = (await createOrganisation('birch')).users;
  for (const role of ['admin', 'supervisor', 'engineer', 'viewer'] as const) c[role] = as(t, await tokenFor(t.app, alder[role]));
  birchAdmin = as(t, await tokenFor(t.app, birch.admin));
});
afterAll(() => t.close());
// The viewer here stands for any reader: it is given every site (site limits are tested in test/server/services/site-access.test.ts).
beforeEach(() => giveViewerEverySite(alder.viewer));

describe('POST /api/sites', () => {
  it('creates a site for a supervisor, with the time zone in its IANA spelling', async () => {
    const res = await c.supervisor.post('/api/sites', siteBody('Elm Street School', { timeZone: 'europe/london', clientContactEmail: '' }));
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ name: 'Elm Street School', timeZone: 'Europe/London', clientContactEmail: null, plantRoomCount: 0, assetCount: 0 });
    const row = await Site.findByPk(res.body.id);
    expect(row).toMatchObject({ organisationId: alder.supervisor.organisationId, createdBy: alder.supervisor.id, timeZone: 'Europe/London' });
  });

  it('refuses an unknown time zone (422 naming timeZone) and stores nothing', async () => {
    const res = await c.admin.post('/api/sites', siteBody('Nowhere Depot', { timeZone: 'Mars/Olympus_Mons' }));
    expect(res.status).toBe(422);
    expect(res.body.error.fields).toHaveProperty('timeZone');
    expect(await Site.count({ where: { name: 'Nowhere Depot' } })).toBe(0);
  });

  it('names every bad field in a 422', async () => {
    const res = await c.admin.post('/api/sites', { name: 'x', timeZone: 'not a zone', clientContactEmail: 'nope' });
    expect(res.status).toBe(422);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['clientContactEmail', 'name', 'timeZone']);
  });

  it('refuses a second site with the same name in the organisation (409 on name), not in another organisation', async () => {
    await created(c.admin.post('/api/sites', siteBody('Harbour Offices')));
    const again = await c.supervisor.post('/api/sites', siteBody('Harbour Offices'));
    expect(again.status).toBe(409);
    expect(again.body.error.fields).toHaveProperty('name');
    expect((await birchAdmin.post('/api/sites', siteBody('Harbour Offices'))).status).toBe(201);
  });

  it.each(['engineer', 'viewer'] as const)('refuses a %s (403)', async (role) => {
    const res = await c[role].post('/api/sites', siteBody(`By ${role}`));
    expect(res.status).toBe(403);
    expect(await Site.count({ where: { name: `By ${role}` } })).toBe(0);
  });
});

describe('GET /api/sites', () => {
  it('lists the organisation’s sites by name, paged, with counts, and caps the page size at 200', async () => {
    const site = await created(c.admin.post('/api/sites', siteBody('Aardvark Hall')));
    await created(c.engineer.post('/api/plant-rooms', roomBody(site.id, 'Plant room 1')));
    await giveViewerEverySite(alder.viewer);
    const page = await c.viewer.get('/api/sites?pageSize=1&page=1');
    expect(page.status).toBe(200);
    expect(page.body).toMatchObject({ page: 1, pageSize: 1 });
    expect(page.body.items[0]).toMatchObject({ name: 'Aardvark Hall', plantRoomCount: 1, assetCount: 0 });
    const all = await c.viewer.get('/api/sites?pageSize=5000');
    expect(all.body.pageSize).toBe(200);
    expect(all.body.total).toBe(all.body.items.length);
    const birchSites = (await birchAdmin.get('/api/sites')).body.items.map((s: { name: string }) => s.name);
    expect(birchSites).toEqual(['Harbour Offices']);
  });

  it('answers 404 for another organisation’s site, the same as for a missing one; 400 for a non-numeric id', async () => {
    const foreign = (await birchAdmin.get('/api/sites')).body.items[0].id;
    const res = await c.admin.get(`/api/sites/${foreign}`);
    const missing = await c.admin.get('/api/sites/999999');
    expect(res.status).toBe(404);
    expect(res.body).toEqual(missing.body);
    expect((await c.admin.get(`/api/sites/${foreign}/plant-rooms`)).status).toBe(404);
    expect((await c.admin.get('/api/sites/abc')).status).toBe(400);
  });
});

describe('PATCH /api/sites/:id', () => {
  it('changes only the fields sent', async () => {
    const site = await created(c.admin.post('/api/sites', siteBody('Patchwork Library', { clientContactName: 'Sam Doe' })));
    const res = await c.supervisor.patch(`/api/sites/${site.id}`, { address: '2 New Road' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ name: 'Patchwork Library', address: '2 New Road', clientContactName: 'Sam Doe', timeZone: 'Europe/London' });
    expect((await Site.findByPk(site.id))!.address).toBe('2 New Road');
  });

  it('refuses engineers (403) and other organisations (404), and an unknown zone (422)', async () => {
    const site = await created(c.admin.post('/api/sites', siteBody('Guarded Depot')));
    expect((await c.engineer.patch(`/api/sites/${site.id}`, { address: 'x' })).status).toBe(403);
    expect((await birchAdmin.patch(`/api/sites/${site.id}`, { address: 'x' })).status).toBe(404);
    const bad = await c.admin.patch(`/api/sites/${site.id}`, { timeZone: 'Europe/Atlantis' });
    expect(bad.status).toBe(422);
    expect(bad.body.error.fields).toHaveProperty('timeZone');
    expect((await Site.findByPk(site.id))!.address).toBe('1 Test Lane');
  });

  it('has no way to delete a site', async () => {
    const site = await created(c.admin.post('/api/sites', siteBody('Permanent House')));
    expect((await c.admin.delete(`/api/sites/${site.id}`)).status).toBe(404);
    expect(await Site.findByPk(site.id)).not.toBeNull();
  });
});
