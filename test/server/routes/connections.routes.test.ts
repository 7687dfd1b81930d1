import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { Connection } from '@/server/models/connection.model';
import { createOrganisation, giveViewerEverySite, setupTestApp, tokenFor, type OrgUsers, type TestApp } from '@/test/setup/app';
import { as, assetBody, created, roomBody, siteBody, type Client } from '@/test/server/support/register';

let t: TestApp;
let alder: OrgUsers;
const c = {} as Record<'admin' | 'supervisor' | 'engineer' | 'viewer', Client>;
let birch: Client;
let siteId: number;
let roomId: number;
const id: Record<string, number> = {};

/*
 * Willow School boiler house, as recorded for these tests:
 *   GS-01 ─gas─> V-01 ─gas─> HDR ─gas─> B-01
 *                              └─gas─> GV-02 ─gas─> B-02
 *   DB-01 ─electrical─> B-01                  (no isolator: a gap)
 *   DB-01 ─electrical─> ISO-02 ─electrical─> B-02
 */
beforeAll(async () => {
  t = await setupTestApp();
  alder = (await createOrganisation('alder')).users;
  for (const role of ['admin', 'supervisor', 'engineer', 'viewer'] as const) c[role] = as(t, await tokenFor(t.app, alder[role]));
  const birchUsers = (await createOrganisation('birch')).users;
  birch = as(t, await tokenFor(t.app, birchUsers.admin));
  siteId = (await created(c.admin.post('/api/sites', siteBody('Willow School')))).id;
  const poolId = (await created(c.admin.post('/api/sites', siteBody('Willow Pool')))).id;
  roomId = (await created(c.supervisor.post('/api/plant-rooms', roomBody(siteId, 'Boiler house')))).id;
  const item = async (plantId: string, type: string, attributes: object = {}, site = siteId) =>
    (id[plantId] = (await created(c.supervisor.post('/api/assets', assetBody(site, plantId, { type, plantRoomId: site === siteId ? roomId : null, energySources: [], attributes })))).id);
  await item('GS-01', 'gas-supply');
  await item('V-01', 'valve', { isolation: 'manual' });
  await item('HDR', 'pipework');
  await item('B-01', 'boiler');
  await item('GV-02', 'valve', { isolation: 'manual' });
  await item('B-02', 'boiler');
  await item('DB-01', 'distribution-board');
  await item('ISO-02', 'isolator', { isolatorForm: 'switch-disconnector' });
  await item('CP-01', 'control-panel');
  await item('POOL-P', 'pump', {}, poolId);
  id.BIRCH = (await created(birch.post('/api/assets', assetBody((await created(birch.post('/api/sites', siteBody('Birch Hall')))).id, 'BX-1')))).id;
  const link = (a: string, b: string, medium: string) => created(c.supervisor.post('/api/connections', { fromAssetId: id[a], toAssetId: id[b], medium }));
  await link('GS-01', 'V-01', 'gas');
  await link('V-01', 'HDR', 'gas');
  await link('HDR', 'B-01', 'gas');
  await link('HDR', 'GV-02', 'gas');
  await link('GV-02', 'B-02', 'gas');
  await link('DB-01', 'B-01', 'electrical');
  await link('DB-01', 'ISO-02', 'electrical');
  await link('ISO-02', 'B-02', 'electrical');
});
afterAll(() => t.close());
// The viewer here stands for any reader: it is given every site (site limits are tested in test/server/services/site-access.test.ts).
beforeEach(() => giveViewerEverySite(alder.viewer));

const post = (client: Client, a: number, b: number, medium: string) => client.post('/api/connections', { fromAssetId: a, toAssetId: b, medium });

describe('POST /api/connections', () => {
  it('records "A supplies B" in a medium (201) and the row', async () => {
    const res = await post(c.engineer, id['DB-01'], id['CP-01'], 'electrical');
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ medium: 'electrical', from: { id: id['DB-01'], plantId: 'DB-01' }, to: { id: id['CP-01'], plantId: 'CP-01' }, createdBy: { id: alder.engineer.id } });
    expect(await Connection.findByPk(res.body.id)).toMatchObject({ fromAssetId: id['DB-01'], toAssetId: id['CP-01'], medium: 'electrical', siteId });
  });

  it.each([
    ['a link from an item to itself', () => post(c.engineer, id['B-01'], id['B-01'], 'gas'), /cannot supply itself/],
    ['a link between sites', () => post(c.engineer, id['DB-01'], id['POOL-P'], 'electrical'), /different sites/],
    ['a link to another organisation’s item', () => post(c.engineer, id['DB-01'], id.BIRCH, 'electrical'), /Choose one of your plant items/],
    ['a medium the supplying end cannot carry', () => post(c.engineer, id['ISO-02'], id['B-01'], 'gas'), /isolator.*does not carry gas/],
    ['a medium neither end can carry', () => post(c.engineer, id['CP-01'], id['DB-01'], 'refrigerant'), /does not carry refrigerant/],
  ])('refuses %s (422) with a clear message, writing nothing', async (_what, send, message) => {
    const before = await Connection.count();
    const res = await send();
    expect(res.status).toBe(422);
    expect(res.body.error.message).toMatch(message);
    expect(await Connection.count()).toBe(before);
  });

  it('refuses an unknown medium (422) naming the field', async () => {
    const res = await post(c.engineer, id['GS-01'], id['V-01'], 'steam');
    expect(res.status).toBe(422);
    expect(res.body.error.fields.medium).toMatch(/Unknown medium/);
  });

  it('answers another organisation’s item exactly like a missing one', async () => {
    const foreign = await post(c.engineer, id.BIRCH, id['B-01'], 'gas');
    const missing = await post(c.engineer, 999999, id['B-01'], 'gas');
    expect([foreign.status, missing.status]).toEqual([422, 422]);
    expect(foreign.body).toEqual(missing.body);
  });

  it('refuses the same link twice (409) and a viewer (403)', async () => {
    expect((await post(c.engineer, id['GS-01'], id['V-01'], 'gas')).status).toBe(409);
    expect((await post(c.viewer, id['DB-01'], id['CP-01'], 'electrical')).status).toBe(403);
  });

  it('the database itself refuses a link across sites', async () => {
    await expect(Connection.create({ organisationId: alder.admin.organisationId, siteId, fromAssetId: id['DB-01'], toAssetId: id['POOL-P'], medium: 'electrical', createdBy: alder.admin.id }))
      .rejects.toThrow(/its own site/);
  });

  it('keeps a connected item on its site (409)', async () => {
    const other = (await created(c.admin.post('/api/sites', siteBody('Willow Annexe')))).id;
    const res = await c.supervisor.patch(`/api/assets/${id['B-01']}`, { siteId: other });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/Remove them before moving/);
  });
});

describe('GET /api/assets/:id/connections', () => {
  it('lists what supplies the item and what it supplies', async () => {
    const res = await c.viewer.get(`/api/assets/${id.HDR}/connections`);
    expect(res.status).toBe(200);
    expect(res.body.from.map((x: { from: { plantId: string } }) => x.from.plantId)).toEqual(['V-01']);
    expect(res.body.to.map((x: { to: { plantId: string } }) => x.to.plantId).sort()).toEqual(['B-01', 'GV-02']);
  });

  it('answers 404 for another organisation’s item', async () => {
    expect((await birch.get(`/api/assets/${id.HDR}/connections`)).status).toBe(404);
    expect((await birch.get(`/api/assets/${id['B-01']}/isolation-plan`)).status).toBe(404);
    expect((await birch.get(`/api/assets/${id['V-01']}/closing-affects`)).status).toBe(404);
    expect((await birch.get(`/api/plant-rooms/${roomId}/diagram`)).status).toBe(404);
  });
});

describe('DELETE /api/connections/:id', () => {
  it('answers 404 to another organisation, 403 to an engineer for a link a supervisor added, and removes it for its author', async () => {
    const link = await created(post(c.supervisor, id['GS-01'], id.HDR, 'gas'));
    expect((await birch.delete(`/api/connections/${link.id}`)).status).toBe(404);
    expect((await c.engineer.delete(`/api/connections/${link.id}`)).status).toBe(403);
    expect(await Connection.findByPk(link.id)).not.toBeNull();
    expect((await c.supervisor.delete(`/api/connections/${link.id}`)).status).toBe(204);
    expect(await Connection.findByPk(link.id)).toBeNull();
  });
});

describe('GET /api/assets/:id/isolation-plan', () => {
  const names = (items: { plantId: string }[]) => items.map((i) => i.plantId);

  it('closes the header valve for a boiler with no valve of its own, and says what else that takes off', async () => {
    const res = await c.engineer.get(`/api/assets/${id['B-01']}/isolation-plan?sources=gas,electrical`);
    expect(res.status).toBe(200);
    const [gas, electrical] = res.body.sources;
    expect(gas.source).toBe('gas');
    expect(gas.points.map((p: { item: { plantId: string }; method: string }) => [p.item.plantId, p.method])).toEqual([['V-01', 'valve-locked']]);
    expect(names(gas.points[0].affects)).toEqual(['B-02']);
    // The header between the valve and the boiler holds gas.
    expect(names(gas.storedEnergy)).toEqual(['HDR']);
    expect(electrical.points).toEqual([]);
    expect(electrical.gaps[0].message).toMatch(/No isolation point between DB-01 .* and B-01/);
    expect(names(electrical.gaps[0].path)).toEqual(['DB-01', 'B-01']);
    expect(names(res.body.affects)).toEqual(['B-02']);
    expect(res.body.caution).toMatch(/only as good as the register/);
  });

  it('uses the boiler’s own valve and isolator when it has them, affecting nothing else', async () => {
    const res = await c.engineer.get(`/api/assets/${id['B-02']}/isolation-plan?sources=gas,electrical`);
    expect(res.body.sources.map((s: { points: { item: { plantId: string } }[] }) => s.points.map((p) => p.item.plantId))).toEqual([['GV-02'], ['ISO-02']]);
    expect(res.body.sources[1].points[0].method).toBe('isolator-locked');
    expect(res.body.affects).toEqual([]);
  });

  it('refuses an unknown energy source (400, a bad query)', async () => {
    const res = await c.engineer.get(`/api/assets/${id['B-01']}/isolation-plan?sources=gas,steam`);
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/Unknown energy source steam/);
  });
});

describe('closing affects and the diagram', () => {
  it('says what closing the header valve takes off', async () => {
    const res = await c.viewer.get(`/api/assets/${id['V-01']}/closing-affects`);
    expect(res.body).toMatchObject({ isolating: true, affects: [{ source: 'gas', items: [{ plantId: 'B-01' }, { plantId: 'B-02' }] }] });
  });

  it('draws the room from its links, with each item’s state', async () => {
    const res = await c.viewer.get(`/api/plant-rooms/${roomId}/diagram`);
    expect(res.status).toBe(200);
    expect(res.body.items.find((i: { plantId: string }) => i.plantId === 'B-01')).toMatchObject({ state: 'normal', inRoom: true });
    expect(res.body.connections.length).toBeGreaterThanOrEqual(8);
  });
});

describe('connections CSV', () => {
  it('exports links that import back unchanged, and reports bad rows by row and column', async () => {
    const exported = await c.supervisor.get('/api/connections/export.csv');
    expect(exported.status).toBe(200);
    expect(exported.text).toContain('site,from,to,medium');
    expect(exported.text).toContain('Willow School,GS-01,V-01,gas');
    const back = await c.supervisor.upload('/api/connections/import?dryRun=false', 'file', Buffer.from(exported.text), 'c.csv', 'text/csv');
    expect(back.body).toMatchObject({ created: 0, errors: [] });
    expect(back.body.unchanged).toBe(back.body.rows);

    const bad = 'site,from,to,medium\r\nWillow School,GS-01,NOPE,gas\r\nWillow School,DB-01,B-01,steam\r\nWillow School,CP-01,DB-01,gas\r\n';
    const res = await c.supervisor.upload('/api/connections/import?dryRun=false', 'file', Buffer.from(bad), 'c.csv', 'text/csv');
    expect(res.body.errors.map((e: { row: number; column: string }) => [e.row, e.column])).toEqual([[2, 'to'], [3, 'medium'], [4, 'medium']]);
    expect(res.body.created).toBe(0);
  });

  it('adds new links on a real import, never on a preview', async () => {
    const csv = 'Site,From,To,Medium\r\nWillow School,GS-01,HDR,Gas\r\n';
    const preview = await c.supervisor.upload('/api/connections/import', 'file', Buffer.from(csv), 'c.csv', 'text/csv');
    expect(preview.body).toMatchObject({ dryRun: true, created: 1 });
    expect(await Connection.count({ where: { fromAssetId: id['GS-01'], toAssetId: id.HDR } })).toBe(0);
    await c.supervisor.upload('/api/connections/import?dryRun=false', 'file', Buffer.from(csv), 'c.csv', 'text/csv');
    expect(await Connection.count({ where: { fromAssetId: id['GS-01'], toAssetId: id.HDR } })).toBe(1);
  });
});
