import { afterAll, beforeEach, beforeAll, describe, expect, it } from 'vitest';
import { PlantRoom } from '@/server/models/plant-room.model';
import { createOrganisation, giveViewerEverySite, setupTestApp, tokenFor, type OrgUsers, type TestApp } from '@/test/setup/app';
import { as, assetBody, created, roomBody, siteBody, type Client } from '@/test/server/support/register';

let t: TestApp;
let alder: OrgUsers;
let birchAdmin: Client;
let siteId: number;
let otherSiteId: number;
const c = {} as Record<'admin' | 'supervisor' | 'engineer' | 'engineer2' | 'viewer', Client>;

beforeAll(async () => {
  t = await setupTestApp();
  alder = (await createOrganisation('alder')).users;
  const birch = (await createOrganisation('birch')).users;
  for (const role of ['admin', 'supervisor', 'engineer', 'engineer2', 'viewer'] as const) c[role] = as(t, await tokenFor(t.app, alder[role]));
  birchAdmin = as(t, await tokenFor(t.app, birch.admin));
  siteId = (await created(c.admin.post('/api/sites', siteBody('Cedar Court')))).id;
  otherSiteId = (await created(c.admin.post('/api/sites', siteBody('Cedar Annexe')))).id;
});
afterAll(() => t.close());
// The viewer here stands for any reader: it is given every site (site limits are tested in test/server/services/site-access.test.ts).
beforeEach(() => giveViewerEverySite(alder.viewer));

describe('POST /api/plant-rooms', () => {
  it('lets an engineer add a plant room with its safety locations', async () => {
    const res = await c.engineer.post('/api/plant-rooms', roomBody(siteId, 'Boiler house'));
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      siteId,
      siteName: 'Cedar Court',
      name: 'Boiler house',
      floorArea: 'Basement',
      safety: { emergencyStop: 'By the door', gasIsolation: 'On the meter', electricalIsolator: 'Panel CP-01', firstAid: 'Reception', exits: 'Door and stair' },
      assetCount: 0,
      photos: [],
      createdBy: { id: alder.engineer.id, name: 'alder engineer' },
    });
    const row = await PlantRoom.findByPk(res.body.id);
    expect(row).toMatchObject({ organisationId: alder.engineer.organisationId, gasIsolation: 'On the meter', createdBy: alder.engineer.id });
  });

  it('names the bad fields (422) and names siteId for another organisation’s site', async () => {
    const res = await c.engineer.post('/api/plant-rooms', { siteId, name: '', safety: { exits: 'x'.repeat(401) } });
    expect(res.status).toBe(422);
    expect(res.body.error.fields).toHaveProperty('name');
    expect(res.body.error.fields).toHaveProperty('safety.exits');
    const birchSite = await created(birchAdmin.post('/api/sites', siteBody('Birch Site')));
    const foreign = await c.engineer.post('/api/plant-rooms', roomBody(birchSite.id, 'Sneaky room'));
    expect(foreign.status).toBe(422);
    expect(foreign.body.error.fields).toHaveProperty('siteId');
    expect(await PlantRoom.count({ where: { name: 'Sneaky room' } })).toBe(0);
  });

  it('refuses a viewer (403)', async () => {
    expect((await c.viewer.post('/api/plant-rooms', roomBody(siteId, 'Viewer room'))).status).toBe(403);
    expect(await PlantRoom.count({ where: { name: 'Viewer room' } })).toBe(0);
  });

  it('refuses a duplicate name on the same site (409), allows it on another site', async () => {
    await created(c.engineer.post('/api/plant-rooms', roomBody(siteId, 'Tank room')));
    const again = await c.engineer2.post('/api/plant-rooms', roomBody(siteId, 'Tank room'));
    expect(again.status).toBe(409);
    expect(again.body.error.fields).toHaveProperty('name');
    expect((await c.engineer2.post('/api/plant-rooms', roomBody(otherSiteId, 'Tank room'))).status).toBe(201);
  });
});

describe('GET /api/sites/:id/plant-rooms and /api/plant-rooms/:id', () => {
  it('lists the site’s rooms by name with their item counts', async () => {
    const room = await created(c.engineer.post('/api/plant-rooms', roomBody(siteId, 'Attic plant')));
    await created(c.engineer.post('/api/assets', assetBody(siteId, 'P-01', { plantRoomId: room.id })));
    const res = await c.viewer.get(`/api/sites/${siteId}/plant-rooms`);
    expect(res.status).toBe(200);
    const names = res.body.items.map((r: { name: string }) => r.name);
    expect(names).toEqual([...names].sort((a: string, b: string) => a.localeCompare(b)));
    expect(res.body.items.find((r: { id: number }) => r.id === room.id)).toMatchObject({ assetCount: 1 });
    expect((await c.viewer.get(`/api/plant-rooms/${room.id}`)).body).toMatchObject({ name: 'Attic plant', assetCount: 1 });
    const site = (await c.viewer.get(`/api/sites/${siteId}`)).body;
    expect(site.assetCount).toBe(1);
  });

  it('answers 404 to another organisation', async () => {
    const room = await created(c.engineer.post('/api/plant-rooms', roomBody(siteId, 'Private room')));
    const res = await birchAdmin.get(`/api/plant-rooms/${room.id}`);
    expect(res.status).toBe(404);
    expect(res.body).toEqual((await birchAdmin.get('/api/plant-rooms/999999')).body);
    expect((await birchAdmin.patch(`/api/plant-rooms/${room.id}`, { name: 'Taken over' })).status).toBe(404);
    expect((await PlantRoom.findByPk(room.id))!.name).toBe('Private room');
  });
});

describe('PATCH /api/plant-rooms/:id', () => {
  it('lets the engineer who added it change it, one safety location at a time', async () => {
    const room = await created(c.engineer.post('/api/plant-rooms', roomBody(siteId, 'Pump room')));
    const res = await c.engineer.patch(`/api/plant-rooms/${room.id}`, { accessNotes: 'Code 1234 from security', safety: { exits: 'Door only' } });
    expect(res.status).toBe(200);
    expect(res.body.accessNotes).toBe('Code 1234 from security');
    expect(res.body.safety).toEqual({ emergencyStop: 'By the door', gasIsolation: 'On the meter', electricalIsolator: 'Panel CP-01', firstAid: 'Reception', exits: 'Door only' });
    expect((await PlantRoom.findByPk(room.id))!.exits).toBe('Door only');
  });

  it('refuses another engineer (403) but lets a supervisor edit anything', async () => {
    const room = await created(c.engineer.post('/api/plant-rooms', roomBody(siteId, 'Meter room')));
    const refused = await c.engineer2.patch(`/api/plant-rooms/${room.id}`, { floorArea: 'Roof' });
    expect(refused.status).toBe(403);
    expect((await PlantRoom.findByPk(room.id))!.floorArea).toBe('Basement');
    expect((await c.viewer.patch(`/api/plant-rooms/${room.id}`, { floorArea: 'Roof' })).status).toBe(403);
    const ok = await c.supervisor.patch(`/api/plant-rooms/${room.id}`, { floorArea: 'Roof' });
    expect(ok.status).toBe(200);
    expect((await PlantRoom.findByPk(room.id))!.floorArea).toBe('Roof');
  });

  it('refuses a rename onto another room’s name (409) and has no delete', async () => {
    const room = await created(c.engineer.post('/api/plant-rooms', roomBody(siteId, 'Switch room')));
    const res = await c.engineer.patch(`/api/plant-rooms/${room.id}`, { name: 'Boiler house' });
    expect(res.status).toBe(409);
    expect((await c.admin.delete(`/api/plant-rooms/${room.id}`)).status).toBe(404);
    expect(await PlantRoom.findByPk(room.id)).not.toBeNull();
  });
});
