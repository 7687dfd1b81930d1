import { parse } from 'csv-parse/sync';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { UserSiteAccess } from '@/server/models/user-site-access.model';
import { clock } from '@/server/lib/clock';
import { createOrganisation, setupTestApp, tokenFor, type OrgUsers, type TestApp } from '@/test/setup/app';
import { as, assetBody, created, roomBody, siteBody, type Client } from '@/test/server/support/register';
import { jpegWithGps } from '@/test/server/support/images';
import { insertTag } from '@/test/server/support/tag-fixtures';

// A viewer given site "Given" only; "Other" is a site of the same organisation they were not given.
let t: TestApp;
let u: OrgUsers;
let viewer: Client;
let supervisor: Client;
let bare: Client;
const ids = {} as Record<'given' | 'other', { site: number; room: number; asset: number; tag: number; photo: number; roomPhoto: number; tagPhoto: number; label: string }>;

beforeAll(async () => {
  t = await setupTestApp();
  const org = await createOrganisation('larch');
  u = org.users;
  const admin = as(t, await tokenFor(t.app, u.admin));
  const engineer = as(t, await tokenFor(t.app, u.engineer));
  for (const key of ['given', 'other'] as const) {
    const site = await created(admin.post('/api/sites', siteBody(`Larch ${key}`)));
    const room = await created(admin.post('/api/plant-rooms', roomBody(site.id, `Room ${key}`)));
    const asset = await created<{ labelCode: string }>(admin.post('/api/assets', assetBody(site.id, `P-${key}`, { plantRoomId: room.id })));
    const tag = await insertTag({ organisationId: org.organisation.id, assetId: asset.id, holderId: u.engineer.id, now: clock.now(), expiresInHours: 4, reason: `Work on ${key}` });
    expect((await engineer.post(`/api/assets/${asset.id}/readings`, { flowTemperatureC: 70, returnTemperatureC: 55 })).status).toBe(201);
    const photo = await created(engineer.upload(`/api/assets/${asset.id}/photos`, 'photo', await jpegWithGps(), 'p.jpg', 'image/jpeg'));
    const roomPhoto = await created(engineer.upload(`/api/plant-rooms/${room.id}/photos`, 'photo', await jpegWithGps(), 'r.jpg', 'image/jpeg'));
    const tagged = await engineer.upload(`/api/tags/${tag.id}/photos`, 'photo', await jpegWithGps(), 't.jpg', 'image/jpeg');
    expect(tagged.status).toBe(201);
    const tagPhoto = tagged.body.photos[0].id as number;
    ids[key] = { site: site.id, room: room.id, asset: asset.id, tag: tag.id, photo: photo.id, roomPhoto: roomPhoto.id, tagPhoto, label: asset.labelCode };
  }
  expect((await admin.put(`/api/users/${u.viewer.id}/sites`, { siteIds: [ids.given.site] })).status).toBe(200);
  viewer = as(t, await tokenFor(t.app, u.viewer));
  supervisor = as(t, await tokenFor(t.app, u.supervisor));
  // A second viewer given no site at all.
  await UserSiteAccess.destroy({ where: { userId: u.engineer2.id } });
  await u.engineer2.update({ role: 'viewer' });
  bare = as(t, await tokenFor(t.app, u.engineer2));
});
afterAll(() => t.close());

/** Every read route that names one record, for a site's records. */
const recordRoutes = (k: 'given' | 'other') => [
  `/api/sites/${ids[k].site}`,
  `/api/sites/${ids[k].site}/plant-rooms`,
  `/api/sites/${ids[k].site}/systems`,
  `/api/plant-rooms/${ids[k].room}`,
  `/api/assets/${ids[k].asset}`,
  `/api/assets/${ids[k].asset}/readings`,
  `/api/assets/${ids[k].asset}/label/retired`,
  `/api/assets/${ids[k].asset}/connections`,
  `/api/assets/${ids[k].asset}/isolation-plan`,
  `/api/assets/${ids[k].asset}/closing-affects`,
  `/api/plant-rooms/${ids[k].room}/diagram`,
  `/api/sites/${ids[k].site}/since-my-last-visit`,
  `/api/plant-rooms/${ids[k].room}/since-my-last-visit`,
  `/api/tags/${ids[k].tag}`,
  `/api/photos/${ids[k].photo}`,
  `/api/photos/${ids[k].photo}/thumbnail`,
  `/api/photos/${ids[k].roomPhoto}`,
  `/api/photos/${ids[k].tagPhoto}/thumbnail`,
  `/api/labels/${ids[k].label}`,
  `/api/labels.pdf?siteId=${ids[k].site}`,
  `/api/labels.pdf?plantRoomId=${ids[k].room}`,
  `/api/labels.pdf?assetIds=${ids[k].asset}`,
];

describe('a viewer limited to some sites', () => {
  it('reads every record of a given site', async () => {
    for (const path of recordRoutes('given')) expect([path, (await viewer.get(path)).status]).toEqual([path, 200]);
  });

  it('gets 404 for every record of a site not given, exactly as for a missing one', async () => {
    for (const path of recordRoutes('other')) {
      const res = await viewer.get(path);
      expect([path, res.status]).toEqual([path, 404]);
    }
    // The same routes answer a supervisor, so the 404s are the limit and nothing else.
    for (const path of recordRoutes('other')) expect([path, (await supervisor.get(path)).status]).toEqual([path, 200]);
  });

  it('sees only given sites in every list, whatever filter is asked for', async () => {
    const sites = await viewer.get('/api/sites');
    expect(sites.body.items.map((s: { id: number }) => s.id)).toEqual([ids.given.site]);
    expect(sites.body.total).toBe(1);
    const assets = await viewer.get('/api/assets');
    expect(assets.body.items.map((a: { id: number }) => a.id)).toEqual([ids.given.asset]);
    expect((await viewer.get(`/api/assets?siteId=${ids.other.site}`)).body.items).toEqual([]);
    expect((await viewer.get(`/api/assets?q=P-other`)).body.items).toEqual([]);
    const tags = await viewer.get('/api/tags');
    expect(tags.body.items.map((x: { id: number }) => x.id)).toEqual([ids.given.tag]);
    expect((await viewer.get(`/api/tags?siteId=${ids.other.site}`)).body.items).toEqual([]);
    expect((await viewer.get(`/api/tags?assetId=${ids.other.asset}`)).body.items).toEqual([]);
    const board = await viewer.get('/api/board');
    expect(board.body.items.map((r: { id: number }) => r.id)).toEqual([ids.given.tag]);
    // Nothing of the other site (its name, its tag's reason) appears anywhere.
    const all = JSON.stringify([sites.body, assets.body, tags.body, board.body]);
    expect(all).not.toContain('Larch other');
    expect(all).not.toContain('Work on other');
  });

  it('exports only given sites (register CSV and board CSV), even when asked for another', async () => {
    const register = await viewer.get('/api/assets/export.csv');
    const rows = parse(register.text, { bom: true, columns: true }) as Record<string, string>[];
    expect(rows.map((r) => r.plantId)).toEqual(['P-GIVEN']);
    const asked = parse((await viewer.get(`/api/assets/export.csv?siteId=${ids.other.site}`)).text, { bom: true, columns: true });
    expect(asked).toEqual([]);
    const connections = await viewer.get('/api/connections/export.csv');
    expect(connections.status).toBe(200);
    expect(connections.text).not.toContain('Larch other');
    const board = await viewer.get('/api/board.csv');
    expect(board.status).toBe(200);
    expect(board.text).toContain('Larch given');
    expect(board.text).not.toContain('Larch other');
  });

  it('prints labels only for items of given sites', async () => {
    const both = await viewer.get(`/api/labels.pdf?assetIds=${ids.given.asset},${ids.other.asset}`);
    expect(both.status).toBe(200);
    const supervisorBoth = await supervisor.get(`/api/labels.pdf?assetIds=${ids.given.asset},${ids.other.asset}`);
    // Two labels make a larger file than one; the viewer's PDF carries one.
    expect(Number(both.headers['content-length'])).toBeLessThan(Number(supervisorBoth.headers['content-length']));
  });
});

describe('a viewer given no site', () => {
  it('sees nothing at all', async () => {
    expect((await bare.get('/api/sites')).body).toMatchObject({ items: [], total: 0 });
    expect((await bare.get('/api/assets')).body.items).toEqual([]);
    expect((await bare.get('/api/tags')).body.items).toEqual([]);
    for (const path of recordRoutes('given')) expect([path, (await bare.get(path)).status]).toEqual([path, 404]);
  });
});
