import request from 'supertest';
import sharp from 'sharp';
import { afterAll, beforeEach, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { clock } from '@/server/lib/clock';
import { Tag } from '@/server/models/tag.model';
import { TagEvent } from '@/server/models/tag-event.model';
import { createOrganisation, giveViewerEverySite, setupTestApp, tokenFor, type OrgUsers, type TestApp } from '@/test/setup/app';
import { createSiteWithAssets } from '@/test/setup/register-fixtures';

let t: TestApp;
let u: OrgUsers;
let other: OrgUsers;
let plant: Awaited<ReturnType<typeof createSiteWithAssets>>;
let otherPlant: Awaited<ReturnType<typeof createSiteWithAssets>>;
const tok: Record<string, string> = {};

beforeAll(async () => {
  t = await setupTestApp();
  const org = await createOrganisation('alder');
  u = org.users;
  other = (await createOrganisation('birch')).users;
  plant = await createSiteWithAssets(org.organisation.id, u.supervisor.id);
  otherPlant = await createSiteWithAssets(other.admin.organisationId, other.admin.id, { name: 'Birch Site' });
  for (const k of ['admin', 'supervisor', 'engineer', 'engineer2', 'viewer'] as const) tok[k] = await tokenFor(t.app, u[k]);
  tok.birch = await tokenFor(t.app, other.supervisor);
});
afterAll(() => t.close());
// The viewer here stands for any reader: it is given every site (site limits are tested in test/server/services/site-access.test.ts).
beforeEach(() => giveViewerEverySite(u.viewer));
afterEach(() => { clock.now = () => new Date(); });

const as = (who: string) => ({
  get: (path: string) => request(t.app).get(path).set('Authorization', `Bearer ${tok[who]}`),
  post: (path: string, body: object, headers: Record<string, string> = {}) => request(t.app).post(path).set('Authorization', `Bearer ${tok[who]}`).set(headers).send(body),
});
const inHours = (h: number) => new Date(Date.now() + h * 3600_000).toISOString();
const isolation = (over: object = {}) => ({
  kind: 'isolation',
  reason: 'Replace mechanical seal on heating pump 1',
  expiresAt: inHours(6),
  energySources: ['electrical', 'hot-water'],
  omittedSources: [
    { source: 'mechanical', reason: 'Pump stopped by the locked isolator; impeller cannot turn' },
    { source: 'stored-pressure', reason: 'Section drained down to the open drain cock' },
  ],
  points: [
    { assetId: plant.isolator.id, method: 'isolator-locked' },
    { assetId: plant.valve.id, method: 'valve-locked' },
    { description: 'Return valve under the pump, no label', method: 'valve-locked' },
  ],
  lockNumber: 'L-117',
  contactPhone: '+44 7700 900103',
  ...over,
});
const allChecks = { workComplete: true, guardsRefitted: true, personnelClear: true, testedSafe: true };
const raise = async (who = 'engineer', body: object = isolation(), assetId = plant.pump.id) => {
  const res = await as(who).post(`/api/assets/${assetId}/tags`, body);
  expect(res.status).toBe(201);
  return res.body as { id: number; status: string; holder: { id: number } };
};

describe('POST /api/assets/:id/tags', () => {
  it('raises an isolation with its points, sets the holder from the session and records a raised event', async () => {
    const res = await as('engineer').post(`/api/assets/${plant.pump.id}/tags`, { ...isolation(), holder: { id: u.admin.id }, holderId: u.admin.id });
    expect(res.status).toBe(201);
    // OSHA 29 CFR 1910.147(c)(5)(ii)(D): lockout and tagout devices shall indicate the identity of the employee applying the device.
    expect(res.body).toMatchObject({ kind: 'isolation', status: 'live', overdue: false, holder: { id: u.engineer.id, name: 'alder engineer' }, assetId: plant.pump.id });
    expect(res.body.points).toHaveLength(3);
    expect(res.body.points[0]).toMatchObject({ assetId: plant.isolator.id, method: 'isolator-locked', asset: { plantId: 'E-01' } });
    const detail = await as('viewer').get(`/api/tags/${res.body.id}`);
    expect(detail.body.events).toEqual([expect.objectContaining({ type: 'raised', by: { id: u.engineer.id, name: 'alder engineer' } })]);
    expect(new Date(detail.body.events[0].at).toISOString()).toBe(detail.body.events[0].at);
  });

  it.each([
    ['reason', { reason: '' }],
    ['expiresAt', { expiresAt: undefined }],
    ['kind', { kind: 'padlock' }],
    ['energySources', { energySources: [] }],
    ['points', { points: [] }],
  ])('refuses an isolation without a valid %s (422 naming the field) and creates nothing', async (field, over) => {
    const before = await Tag.count();
    const res = await as('engineer').post(`/api/assets/${plant.pump.id}/tags`, isolation(over));
    expect(res.status).toBe(422);
    expect(res.body.error.fields).toHaveProperty(field);
    expect(await Tag.count()).toBe(before);
  });

  it('wants the normal and left states for an override', async () => {
    const res = await as('engineer').post(`/api/assets/${plant.boiler.id}/tags`, { kind: 'override', reason: 'Setpoint raised for testing', expiresAt: inHours(3) });
    expect(res.status).toBe(422);
    expect(Object.keys(res.body.error.fields)).toEqual(expect.arrayContaining(['normalState', 'leftState']));
    const ok = await as('engineer').post(`/api/assets/${plant.boiler.id}/tags`, { kind: 'override', reason: 'Setpoint raised for testing', expiresAt: inHours(3), normalState: 'Flow setpoint 80 °C', leftState: 'Flow setpoint 85 °C' });
    expect(ok.status).toBe(201);
    expect(ok.body).toMatchObject({ normalState: 'Flow setpoint 80 °C', leftState: 'Flow setpoint 85 °C', energySources: [] });
  });

  it('refuses an expiry in the past or more than 14 days ahead for an engineer, and an energy source the item does not have', async () => {
    expect((await as('engineer').post(`/api/assets/${plant.pump.id}/tags`, isolation({ expiresAt: inHours(-1) }))).body.error.fields.expiresAt).toMatch(/future/);
    expect((await as('engineer').post(`/api/assets/${plant.pump.id}/tags`, isolation({ expiresAt: inHours(15 * 24) }))).body.error.fields.expiresAt).toMatch(/14 days/);
    expect((await as('supervisor').post(`/api/assets/${plant.pump.id}/tags`, isolation({ expiresAt: inHours(15 * 24) }))).status).toBe(201);
    const gas = await as('engineer').post(`/api/assets/${plant.pump.id}/tags`, isolation({ energySources: ['electrical', 'hot-water', 'gas'] }));
    expect(gas.status).toBe(422);
    expect(gas.body.error.fields.energySources).toMatch(/gas/);
  });

  it('creates one tag for a retried raise with the same Idempotency-Key and body, even when the retries race', async () => {
    const before = await Tag.count();
    const key = { 'Idempotency-Key': 'raise-7f1c2b' };
    // A retry sends the very same request again: same key, same body.
    const body = isolation({ energySources: [], points: [{ description: 'Handle chained', method: 'valve-locked' }], kind: 'override', normalState: 'Open', leftState: 'Shut' });
    const [a, b, c] = await Promise.all([1, 2, 3].map(() => as('engineer2').post(`/api/assets/${plant.valve.id}/tags`, body, key)));
    const ids = new Set([a.body.id, b.body.id, c.body.id]);
    expect(ids.size).toBe(1);
    expect([a.status, b.status, c.status].sort()).toEqual([200, 200, 201]);
    expect(await Tag.count()).toBe(before + 1);
  });

  it('is refused to a viewer (403) and answers 404 for another organisation’s item', async () => {
    expect((await as('viewer').post(`/api/assets/${plant.pump.id}/tags`, isolation())).status).toBe(403);
    expect((await as('engineer').post(`/api/assets/${otherPlant.pump.id}/tags`, isolation())).status).toBe(404);
  });
});

describe('POST /api/tags/:id/clear', () => {
  it.each([
    ['no reason', {}],
    ['an empty reason', { reason: '' }],
    ['a whitespace reason', { reason: '      \t   \n ' }],
    ['a 9-character reason', { reason: 'Done now.' }],
  ])('refuses a clearance with %s (422) and leaves the tag live with no new event', async (_label, body) => {
    const tag = await raise();
    const res = await as('engineer').post(`/api/tags/${tag.id}/clear`, { ...body, checks: allChecks });
    expect(res.status).toBe(422);
    expect(res.body.error.fields.reason).toMatch(/reason|At least 10/);
    expect((await Tag.findByPk(tag.id))!.status).toBe('live');
    expect(await TagEvent.count({ where: { tagId: tag.id } })).toBe(1);
  });

  it('refuses another engineer (403): only the person who applied it may remove it', async () => {
    const tag = await raise();
    // OSHA 29 CFR 1910.147(e)(3): each lockout or tagout device shall be removed by the employee who applied the device.
    const res = await as('engineer2').post(`/api/tags/${tag.id}/clear`, { reason: 'Looks finished to me', checks: allChecks });
    expect(res.status).toBe(403);
    expect((await Tag.findByPk(tag.id))!.status).toBe('live');
    const sup = await as('supervisor').post(`/api/tags/${tag.id}/clear`, { reason: 'Supervisor clearing it', checks: allChecks });
    expect(sup.status).toBe(403);
    expect(sup.body.error.message).toMatch(/clearance in absence/);
  });

  it('wants every release check for an isolation before it clears, then records them', async () => {
    const tag = await raise();
    // OSHA 29 CFR 1910.147(e)(1)–(e)(2): before energy is restored, the work area is inspected, components are operationally intact, and employees are safely positioned and notified.
    const partial = await as('engineer').post(`/api/tags/${tag.id}/clear`, { reason: 'Seal replaced and pump run', checks: { ...allChecks, testedSafe: false } });
    expect(partial.status).toBe(422);
    expect(partial.body.error.fields).toHaveProperty(['checks.testedSafe']);
    const ok = await as('engineer').post(`/api/tags/${tag.id}/clear`, { reason: 'Seal replaced and pump run', checks: allChecks });
    expect(ok.status).toBe(200);
    expect(ok.body).toMatchObject({ status: 'cleared', clearedBy: { id: u.engineer.id }, checks: allChecks });
    const detail = await as('engineer').get(`/api/tags/${tag.id}`);
    expect(detail.body.events.map((e: { type: string }) => e.type)).toEqual(['raised', 'cleared']);
    expect(detail.body.events[1].data.reason).toBe('Seal replaced and pump run');
  });

  it('lets exactly one of two simultaneous clearances through; the other gets 409', async () => {
    const tag = await raise();
    const body = { reason: 'Work complete and tested', checks: allChecks };
    const results = await Promise.all([as('engineer').post(`/api/tags/${tag.id}/clear`, body), as('engineer').post(`/api/tags/${tag.id}/clear`, body)]);
    expect(results.map((r) => r.status).sort()).toEqual([200, 409]);
    expect(await TagEvent.count({ where: { tagId: tag.id, type: 'cleared' } })).toBe(1);
  });
});

describe('POST /api/tags/:id/clear-in-absence', () => {
  it('lets a supervisor clear another’s tag only with the absence and contact attempts recorded', async () => {
    const tag = await raise('engineer2');
    const incomplete = await as('supervisor').post(`/api/tags/${tag.id}/clear-in-absence`, { reason: 'Holder off site, work finished', checks: allChecks });
    expect(incomplete.status).toBe(422);
    expect(Object.keys(incomplete.body.error.fields)).toEqual(expect.arrayContaining(['holderNotOnSite', 'contactAttempts']));
    expect((await as('engineer').post(`/api/tags/${tag.id}/clear-in-absence`, { reason: 'Holder off site, work finished', holderNotOnSite: true, contactAttempts: 'Phoned twice', checks: allChecks })).status).toBe(403);
    // OSHA 29 CFR 1910.147(e)(3)(i)–(iii): verification that the employee is not at the facility; all reasonable efforts to contact them; they are informed before resuming work.
    const ok = await as('supervisor').post(`/api/tags/${tag.id}/clear-in-absence`, {
      reason: 'Holder off site, work finished and verified',
      holderNotOnSite: true,
      contactAttempts: 'Phoned 07700 900104 at 09:10 and 09:40, texted, asked the site office',
      checks: allChecks,
    });
    expect(ok.status).toBe(200);
    const detail = await as('engineer2').get(`/api/tags/${tag.id}`);
    const event = detail.body.events.at(-1);
    expect(event).toMatchObject({ type: 'cleared-in-absence', by: { id: u.supervisor.id }, data: { holderNotOnSite: true, holderId: u.engineer2.id, holderToBeInformed: true } });
    expect(event.data.contactAttempts).toMatch(/09:10/);
    // OSHA 29 CFR 1910.147(e)(3)(iii): the holder is informed before resuming work; until they acknowledge, they take on nothing else.
    const blocked = await as('engineer2').post(`/api/assets/${plant.pump.id}/tags`, isolation());
    expect(blocked.status).toBe(409);
    expect(blocked.body.error.code).toBe('acknowledge-first');
    expect((await as('engineer2').get('/api/tag-notices')).body).toEqual([expect.objectContaining({ tagId: tag.id, kind: 'cleared-in-absence', by: { id: u.supervisor.id, name: 'alder supervisor' } })]);
    expect((await as('engineer').post(`/api/tags/${tag.id}/acknowledge`, {})).status).toBe(409);
    const ack = await as('engineer2').post(`/api/tags/${tag.id}/acknowledge`, {});
    expect(ack.status).toBe(200);
    expect(ack.body.events.at(-1)).toMatchObject({ type: 'acknowledged', by: { id: u.engineer2.id } });
    expect((await as('engineer2').get('/api/tag-notices')).body).toEqual([]);
    await expect(t.db.rootQuery('UPDATE tag_notices SET acknowledged_at = NULL WHERE tag_id = ?', [tag.id])).rejects.toThrow(/acknowledged, once/);
  });
});

describe('extend and notes', () => {
  it('extends by the holder or a supervisor, with a reason, and keeps both expiries in the history', async () => {
    const tag = await raise();
    const newExpiry = inHours(30);
    expect((await as('engineer2').post(`/api/tags/${tag.id}/extend`, { expiresAt: newExpiry, reason: 'Parts delayed' })).status).toBe(403);
    expect((await as('engineer').post(`/api/tags/${tag.id}/extend`, { expiresAt: newExpiry })).status).toBe(422);
    const ok = await as('engineer').post(`/api/tags/${tag.id}/extend`, { expiresAt: newExpiry, reason: 'Parts delayed until tomorrow' });
    expect(ok.status).toBe(200);
    expect(ok.body.expiresAt).toBe(newExpiry);
    expect((await as('supervisor').post(`/api/tags/${tag.id}/extend`, { expiresAt: inHours(40), reason: 'Agreed with client' })).status).toBe(200);
    const events = (await as('engineer').get(`/api/tags/${tag.id}`)).body.events;
    expect(events.filter((e: { type: string }) => e.type === 'extended')).toHaveLength(2);
    expect(events[1].data).toMatchObject({ to: newExpiry, reason: 'Parts delayed until tomorrow' });
  });

  it('lets anyone but a viewer add a note to a live tag', async () => {
    const tag = await raise();
    expect((await as('engineer2').post(`/api/tags/${tag.id}/notes`, { text: 'Spare seal kit is in the store' })).status).toBe(201);
    expect((await as('viewer').post(`/api/tags/${tag.id}/notes`, { text: 'Hello' })).status).toBe(403);
    expect((await as('engineer2').post(`/api/tags/${tag.id}/notes`, { text: '   ' })).status).toBe(422);
  });
});

describe('state, overdue and history', () => {
  it('keeps a group isolation isolated until the last tag is cleared', async () => {
    const asset = plant.isolator.id;
    const body = isolation({ energySources: ['electrical'], omittedSources: [], points: [{ description: 'DB-2 way 7', method: 'fuse-withdrawn' }] });
    // OSHA 29 CFR 1910.147(f)(3): group lockout, each authorized employee with a personal device.
    const a = await raise('engineer', body, asset);
    const b = await raise('engineer2', body, asset);
    let list = (await as('viewer').get(`/api/tags?assetId=${asset}&status=live`)).body;
    expect(list.total).toBe(2);
    await as('engineer').post(`/api/tags/${a.id}/clear`, { reason: 'My part of the job is done', checks: allChecks });
    list = (await as('viewer').get(`/api/tags?assetId=${asset}&status=live`)).body;
    expect(list.items.map((x: { id: number }) => x.id)).toEqual([b.id]);
  });

  it('shows a live tag past its expiry as overdue by the server’s clock, and never clears it', async () => {
    const tag = await raise('engineer', isolation({ expiresAt: inHours(2) }));
    clock.now = () => new Date(Date.now() + 3 * 3600_000);
    // common practice, no published source: a tag never clears itself at expiry; it stays live and shows as overdue.
    const res = await as('supervisor').get(`/api/tags/${tag.id}`);
    expect(res.body).toMatchObject({ status: 'live', overdue: true });
    expect((await Tag.findByPk(tag.id))!.status).toBe('live');
  });

  it('answers 404 for another organisation’s tag', async () => {
    const tag = await raise();
    expect((await as('birch').get(`/api/tags/${tag.id}`)).status).toBe(404);
    expect((await as('birch').post(`/api/tags/${tag.id}/clear-in-absence`, { reason: 'Not ours to clear', holderNotOnSite: true, contactAttempts: 'None at all, foreign', checks: allChecks })).status).toBe(404);
    expect((await as('birch').get('/api/tags?status=live')).body.total).toBe(0);
  });

  it('has a history the database refuses to change or delete', async () => {
    const tag = await raise();
    await expect(t.db.rootQuery('UPDATE tag_events SET type = ? WHERE tag_id = ?', ['cleared', tag.id])).rejects.toThrow(/append-only/);
    await expect(t.db.rootQuery('DELETE FROM tag_events WHERE tag_id = ?', [tag.id])).rejects.toThrow(/append-only/);
    await expect(t.db.rootQuery('DELETE FROM tags WHERE id = ?', [tag.id])).rejects.toThrow(/never deleted/);
    expect(await TagEvent.count({ where: { tagId: tag.id, type: 'raised' } })).toBe(1);
  });
});

describe('item state in the register', () => {
  it('shows isolated with the count, the live tags, and "isolation point for" on the point item', async () => {
    const fresh = await createSiteWithAssets(u.admin.organisationId, u.admin.id, { name: 'State Site' });
    await giveViewerEverySite(u.viewer);
    const body = isolation({ points: [{ assetId: fresh.valve.id, method: 'valve-locked' }] });
    await raise('engineer', body, fresh.pump.id);
    await raise('engineer2', body, fresh.pump.id);
    await raise('engineer', { kind: 'override', reason: 'Setpoint raised for testing', expiresAt: inHours(1), normalState: '80 °C', leftState: '85 °C' }, fresh.boiler.id);
    const pump = (await as('viewer').get(`/api/assets/${fresh.pump.id}`)).body;
    expect(pump).toMatchObject({ state: 'isolated', liveIsolations: 2, liveOverrides: 0, overdue: false });
    expect(pump.liveTags).toHaveLength(2);
    const valve = (await as('viewer').get(`/api/assets/${fresh.valve.id}`)).body;
    expect(valve.state).toBe('normal');
    expect(valve.pointUses).toEqual([
      expect.objectContaining({ method: 'valve-locked', forAsset: expect.objectContaining({ id: fresh.pump.id, plantId: 'P-01' }) }),
      expect.objectContaining({ method: 'valve-locked', forAsset: expect.objectContaining({ id: fresh.pump.id }) }),
    ]);
    const list = (await as('viewer').get(`/api/assets?siteId=${fresh.site.id}&sort=plantId`)).body.items;
    const byPlantId = Object.fromEntries(list.map((a: { plantId: string; state: string }) => [a.plantId, a.state]));
    expect(byPlantId).toEqual({ 'B-01': 'overridden', 'E-01': 'normal', 'P-01': 'isolated', 'V-01': 'normal' });
    clock.now = () => new Date(Date.now() + 8 * 3600_000);
    expect((await as('viewer').get(`/api/assets/${fresh.pump.id}`)).body).toMatchObject({ state: 'isolated', overdue: true });
  });
});

describe('POST /api/tags/:id/photos', () => {
  it('adds a photo of the lock in place to a live tag and records it in the history', async () => {
    const tag = await raise();
    const png = await sharp({ create: { width: 64, height: 48, channels: 3, background: { r: 200, g: 30, b: 30 } } }).png().toBuffer();
    expect((await request(t.app).post(`/api/tags/${tag.id}/photos`).set('Authorization', `Bearer ${tok.viewer}`).attach('photo', png, 'lock.png')).status).toBe(403);
    const res = await request(t.app).post(`/api/tags/${tag.id}/photos`).set('Authorization', `Bearer ${tok.engineer}`).attach('photo', png, 'lock.png');
    expect(res.status).toBe(201);
    expect(res.body.photoCount).toBe(1);
    expect(res.body.photos[0]).toMatchObject({ width: 64, height: 48, url: expect.stringMatching(/^\/api\/photos\/\d+$/) });
    expect(res.body.events.at(-1)).toMatchObject({ type: 'photo-added', by: { id: u.engineer.id } });
    const img = await request(t.app).get(res.body.photos[0].url).set('Authorization', `Bearer ${tok.viewer}`);
    expect(img.status).toBe(200);
    expect(img.headers['content-type']).toBe('image/jpeg');
    expect((await as('viewer').get(`/api/tags?assetId=${plant.pump.id}&status=live`)).body.items.find((x: { id: number }) => x.id === tag.id).photoCount).toBe(1);
    await as('engineer').post(`/api/tags/${tag.id}/clear`, { reason: 'Seal replaced and tested', checks: allChecks });
    expect((await request(t.app).post(`/api/tags/${tag.id}/photos`).set('Authorization', `Bearer ${tok.engineer}`).attach('photo', png, 'lock.png')).status).toBe(409);
  });
});

