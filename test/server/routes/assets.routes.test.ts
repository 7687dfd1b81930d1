import { afterAll, beforeEach, beforeAll, describe, expect, it } from 'vitest';
import { Asset } from '@/server/models/asset.model';
import { isLabelCode } from '@/shared/rules/label-code';
import { addMonths } from '@/shared/rules/register';
import { localDate } from '@/shared/rules/time-zone';
import { createOrganisation, giveViewerEverySite, setupTestApp, tokenFor, type OrgUsers, type TestApp } from '@/test/setup/app';
import { as, assetBody, created, roomBody, siteBody, type Client } from '@/test/server/support/register';

let t: TestApp;
let alder: OrgUsers;
let birchAdmin: Client;
let siteId: number;
let otherSiteId: number;
let roomId: number;
const c = {} as Record<'admin' | 'supervisor' | 'engineer' | 'engineer2' | 'viewer', Client>;
const today = () => localDate(new Date(), 'Europe/London');

beforeAll(async () => {
  t = await setupTestApp();
  alder = (await createOrganisation('alder')).users;
  const birch = (await createOrganisation('birch')).users;
  for (const role of ['admin', 'supervisor', 'engineer', 'engineer2', 'viewer'] as const) c[role] = as(t, await tokenFor(t.app, alder[role]));
  birchAdmin = as(t, await tokenFor(t.app, birch.admin));
  siteId = (await created(c.admin.post('/api/sites', siteBody('Willow School')))).id;
  otherSiteId = (await created(c.admin.post('/api/sites', siteBody('Willow Pool')))).id;
  roomId = (await created(c.engineer.post('/api/plant-rooms', roomBody(siteId, 'Boiler house')))).id;
});
afterAll(() => t.close());
// The viewer here stands for any reader: it is given every site (site limits are tested in test/server/services/site-access.test.ts).
beforeEach(() => giveViewerEverySite(alder.viewer));

describe('POST /api/assets', () => {
  it('creates an item with a label code, typed attributes and the next service date', async () => {
    const res = await c.engineer.post('/api/assets', {
      siteId, plantRoomId: roomId, plantId: 'b-01', name: 'Boiler 1', type: 'boiler', system: 'LTHW primary',
      energySources: ['hot-water', 'gas', 'gas', 'electrical'], manufacturer: 'Maker A', serialNumber: 'SN-1',
      installDate: '2015-06-01', serviceIntervalMonths: 12, lastServiceDate: '2024-01-31',
      attributes: { fuel: 'natural-gas', ratedOutputKw: '320', flowSetpointC: 80, colour: 'red' },
    });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      siteName: 'Willow School', plantRoomName: 'Boiler house', plantId: 'B-01', type: 'boiler',
      energySources: ['gas', 'electrical', 'hot-water'],
      nextServiceDue: '2025-01-31', serviceOverdue: true, archived: false, photos: [], thumbnailUrl: null,
      attributes: { fuel: 'natural-gas', ratedOutputKw: 320, flowSetpointC: 80 },
      createdBy: { id: alder.engineer.id },
    });
    expect(res.body.attributes).not.toHaveProperty('colour');
    expect(isLabelCode(res.body.labelCode)).toBe(true);
    const row = await Asset.findByPk(res.body.id);
    expect(row).toMatchObject({ plantId: 'B-01', labelCode: res.body.labelCode, nextServiceDue: '2025-01-31', createdBy: alder.engineer.id });
  });

  it('reports every bad field at once, attributes by their form name (422)', async () => {
    const res = await c.engineer.post('/api/assets', {
      siteId, plantId: 'B 02!', name: '', type: 'boiler', installDate: '2024-02-30', serviceIntervalMonths: 0,
      energySources: ['steam'], attributes: { ratedOutputKw: -5, fuel: 'coal' },
    });
    expect(res.status).toBe(422);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(
      ['attributes.fuel', 'attributes.ratedOutputKw', 'energySources[0]', 'installDate', 'name', 'plantId', 'serviceIntervalMonths'],
    );
    expect(await Asset.count({ where: { siteId, name: '' } })).toBe(0);
  });

  it('refuses a plant room on another site (422 plantRoomId) and a site of another organisation (422 siteId)', async () => {
    const wrongRoom = await c.engineer.post('/api/assets', assetBody(otherSiteId, 'P-09', { plantRoomId: roomId }));
    expect(wrongRoom.status).toBe(422);
    expect(wrongRoom.body.error.fields).toHaveProperty('plantRoomId');
    const birchSite = await created(birchAdmin.post('/api/sites', siteBody('Birch Works')));
    const foreign = await c.engineer.post('/api/assets', assetBody(birchSite.id, 'P-09'));
    expect(foreign.status).toBe(422);
    expect(foreign.body.error.fields).toHaveProperty('siteId');
    expect(await Asset.count({ where: { plantId: 'P-09' } })).toBe(0);
  });

  it('keeps plant IDs unique within a site (409 on plantId), not across sites', async () => {
    await created(c.engineer.post('/api/assets', assetBody(siteId, 'P-01A')));
    const again = await c.engineer2.post('/api/assets', assetBody(siteId, 'p-01a'));
    expect(again.status).toBe(409);
    expect(again.body.error.fields).toHaveProperty('plantId');
    expect((await c.engineer2.post('/api/assets', assetBody(otherSiteId, 'P-01A'))).status).toBe(201);
    expect(await Asset.count({ where: { siteId, plantId: 'P-01A' } })).toBe(1);
  });

  it('refuses a viewer (403)', async () => {
    expect((await c.viewer.post('/api/assets', assetBody(siteId, 'V-77'))).status).toBe(403);
    expect(await Asset.count({ where: { plantId: 'V-77' } })).toBe(0);
  });
});

describe('GET /api/assets/:id', () => {
  it('flags an item overdue only when its next service date is before today at the site', async () => {
    const due = addMonths(today(), 1);
    const current = await created(c.engineer.post('/api/assets', assetBody(siteId, 'P-20', { serviceIntervalMonths: 12, lastServiceDate: addMonths(due, -12) })));
    const late = await created(c.engineer.post('/api/assets', assetBody(siteId, 'P-21', { serviceIntervalMonths: 6, lastServiceDate: addMonths(today(), -7) })));
    expect((await c.viewer.get(`/api/assets/${current.id}`)).body).toMatchObject({ nextServiceDue: due, serviceOverdue: false, photos: [] });
    expect((await c.viewer.get(`/api/assets/${late.id}`)).body).toMatchObject({ nextServiceDue: addMonths(today(), -1), serviceOverdue: true });
  });

  it('answers 404 for another organisation’s item, the same as for a missing one', async () => {
    const item = await created(c.engineer.post('/api/assets', assetBody(siteId, 'P-30')));
    const res = await birchAdmin.get(`/api/assets/${item.id}`);
    expect(res.status).toBe(404);
    expect(res.body).toEqual((await birchAdmin.get('/api/assets/999999')).body);
    expect((await birchAdmin.patch(`/api/assets/${item.id}`, { name: 'Mine now' })).status).toBe(404);
    expect((await birchAdmin.post(`/api/assets/${item.id}/archive`)).status).toBe(404);
    expect(await Asset.findByPk(item.id)).toMatchObject({ name: 'Item P-30', archivedAt: null });
  });
});

describe('PATCH /api/assets/:id', () => {
  it('lets the engineer who added it change it and recomputes the next service date', async () => {
    const item = await created(c.engineer.post('/api/assets', assetBody(siteId, 'P-40', { serviceIntervalMonths: 1, lastServiceDate: '2024-01-31' })));
    const res = await c.engineer.patch(`/api/assets/${item.id}`, { name: 'Circuit 1 pump', lastServiceDate: '2023-01-31' });
    expect(res.status).toBe(200);
    // 2023 is not a leap year: 31 Jan + 1 month clamps to 28 Feb (Gregorian calendar).
    expect(res.body).toMatchObject({ name: 'Circuit 1 pump', nextServiceDue: '2023-02-28', system: 'LTHW heating circuit 1', plantId: 'P-40' });
    expect(await Asset.findByPk(item.id)).toMatchObject({ name: 'Circuit 1 pump', nextServiceDue: '2023-02-28' });
  });

  it('refuses another engineer’s edit (403) and lets a supervisor edit anything', async () => {
    const item = await created(c.engineer.post('/api/assets', assetBody(siteId, 'P-41')));
    const refused = await c.engineer2.patch(`/api/assets/${item.id}`, { name: 'Not yours' });
    expect(refused.status).toBe(403);
    expect((await c.viewer.patch(`/api/assets/${item.id}`, { name: 'Not yours' })).status).toBe(403);
    expect((await Asset.findByPk(item.id))!.name).toBe('Item P-41');
    expect((await c.supervisor.patch(`/api/assets/${item.id}`, { name: 'Checked' })).status).toBe(200);
  });

  it('checks the attributes against the new type when the type changes', async () => {
    const item = await created(c.engineer.post('/api/assets', assetBody(siteId, 'EV-01', { type: 'vessel', attributes: { capacityL: 300, preChargeBar: 1.5 } })));
    const bad = await c.engineer.patch(`/api/assets/${item.id}`, { attributes: { preChargeBar: 99 } });
    expect(bad.status).toBe(422);
    expect(bad.body.error.fields).toHaveProperty('attributes.preChargeBar');
    const retyped = await c.engineer.patch(`/api/assets/${item.id}`, { type: 'pressurisation-unit', attributes: { fillPressureBar: 1.8 } });
    expect(retyped.status).toBe(200);
    expect(retyped.body.attributes).toEqual({ fillPressureBar: 1.8 });
  });

  it('moves an item to another site out of its old plant room', async () => {
    const item = await created(c.engineer.post('/api/assets', assetBody(siteId, 'P-50', { plantRoomId: roomId })));
    const res = await c.supervisor.patch(`/api/assets/${item.id}`, { siteId: otherSiteId });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ siteId: otherSiteId, plantRoomId: null, siteName: 'Willow Pool' });
  });
});

describe('POST /api/assets/:id/archive', () => {
  it('is refused to engineers (403), archives for a supervisor, hides the item from lists and never deletes it', async () => {
    const item = await created(c.engineer.post('/api/assets', assetBody(siteId, 'X-99')));
    expect((await c.engineer.post(`/api/assets/${item.id}/archive`)).status).toBe(403);
    expect((await c.viewer.post(`/api/assets/${item.id}/archive`)).status).toBe(403);
    const res = await c.supervisor.post(`/api/assets/${item.id}/archive`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ archived: true });
    const row = await Asset.findByPk(item.id);
    expect(row!.archivedAt).toBeInstanceOf(Date);
    expect(row!.archivedBy).toBe(alder.supervisor.id);
    expect((await c.viewer.get('/api/assets?q=X-99')).body.total).toBe(0);
    expect((await c.viewer.get('/api/assets?q=X-99&includeArchived=true')).body.items[0]).toMatchObject({ id: item.id, archived: true });
    const edit = await c.supervisor.patch(`/api/assets/${item.id}`, { name: 'Back again' });
    expect(edit.status).toBe(409);
    expect((await c.admin.post(`/api/assets/${item.id}/archive`)).status).toBe(200);
    expect((await Asset.findByPk(item.id))!.archivedAt!.getTime()).toBe(row!.archivedAt!.getTime());
    expect((await c.admin.delete(`/api/assets/${item.id}`)).status).toBe(404);
    expect(await Asset.findByPk(item.id)).not.toBeNull();
  });
});
