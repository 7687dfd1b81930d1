import request from 'supertest';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { clock } from '@/server/lib/clock';
import { Photo } from '@/server/models/photo.model';
import { TagPoint } from '@/server/models/tag-point.model';
import { TagProof } from '@/server/models/tag-proof.model';
import { createOrganisation, setupTestApp, tokenFor, type OrgUsers, type TestApp } from '@/test/setup/app';
import { createSiteWithAssets } from '@/test/setup/register-fixtures';
import { insertTag } from '@/test/server/support/tag-fixtures';

/* A scanned label answers the item's record: its state, live tags and point uses, each read once. */

const NOW = new Date('2025-09-01T07:30:00.000Z');
let t: TestApp;
let u: OrgUsers;
let plant: Awaited<ReturnType<typeof createSiteWithAssets>>;
const tok: Record<string, string> = {};
const ids: Record<string, number> = {};

beforeAll(async () => {
  t = await setupTestApp();
  const org = await createOrganisation('willow');
  u = org.users;
  const organisationId = org.organisation.id;
  plant = await createSiteWithAssets(organisationId, u.supervisor.id, { name: 'Willow Mill' });
  const tag = (assetId: number, expiresInHours: number, extra: Partial<Parameters<typeof insertTag>[0]> = {}) =>
    insertTag({ organisationId, assetId, holderId: u.engineer.id, now: NOW, expiresInHours, ...extra });
  // The pump's history: three cleared tags, then an overdue isolation, a proved isolation and an override, all live.
  const cleared = [];
  for (const hours of [-500, -300, -100]) cleared.push(await tag(plant.pump.id, hours, { status: 'cleared', raisedHoursAgo: -hours + 10 }));
  ids.overdue = (await tag(plant.pump.id, -1, { reason: 'Seal leaking at the gland', raisedHoursAgo: 20 })).id;
  ids.proved = (await tag(plant.pump.id, 30, { reason: 'Coupling change', raisedHoursAgo: 3 })).id;
  ids.override = (await tag(plant.pump.id, 6, { kind: 'override', reason: 'Run-on timer bypassed', raisedHoursAgo: 1 })).id;
  await TagProof.create({ tagId: ids.proved, organisationId, method: 'try-start', instrument: '', reading: 'No start', note: '', byId: u.engineer.id, at: NOW });
  // Photos of the locks in place: two on the proved isolation, one on a cleared tag, one of the pump itself.
  const photo = (owner: { tagId?: number; assetId?: number }, n: number) => Photo.create({
    organisationId, assetId: owner.assetId ?? null, plantRoomId: null, tagId: owner.tagId ?? null, storageKey: `k${n}`, thumbnailKey: `t${n}`,
    width: 640, height: 480, bytes: 1000, caption: null, createdBy: u.engineer.id,
  });
  await photo({ tagId: ids.proved }, 1);
  await photo({ tagId: ids.proved }, 2);
  await photo({ tagId: cleared[0].id }, 3);
  ids.pumpPhoto = (await photo({ assetId: plant.pump.id }, 4)).id;
  // The pump's local isolator is locked off for work on the boiler.
  ids.boiler = (await tag(plant.boiler.id, 12, { reason: 'Burner strip-down' })).id;
  await TagPoint.create({ tagId: ids.boiler, assetId: plant.isolator.id, description: 'Local isolator', method: 'isolator-locked', lockNumber: 'PL-7' });
  tok.engineer = await tokenFor(t.app, u.engineer);
});
afterAll(() => t.close());
afterEach(() => { clock.now = () => new Date(); });

/** The statements the server sends while answering one request. */
async function statementsDuring(run: () => Promise<unknown>): Promise<string[]> {
  const options = (t.db.sequelize as unknown as { options: { logging: unknown } }).options;
  const before = options.logging;
  const seen: string[] = [];
  options.logging = (sql: string) => { seen.push(sql); };
  try {
    await run();
  } finally {
    options.logging = before;
  }
  return seen;
}

describe('GET /api/labels/:code answers the record', () => {
  it("with the item's state and live tags, newest first, reading its tags once", async () => {
    clock.now = () => NOW;
    let body: Record<string, unknown> = {};
    const statements = await statementsDuring(async () => {
      const res = await request(t.app).get(`/api/labels/${plant.pump.labelCode}`).set('Authorization', `Bearer ${tok.engineer}`);
      expect(res.status).toBe(200);
      body = res.body;
    });
    // OSHA 29 CFR 1910.147(d)(6): an isolation counts as unproved until its verification is recorded.
    expect(body).toMatchObject({ id: plant.pump.id, state: 'isolated', liveIsolations: 2, liveOverrides: 1, unprovedIsolations: 1, overdue: true, pointUses: [] });
    const live = body.liveTags as { id: number; proved: boolean | null; overdue: boolean; photoCount: number }[];
    expect(live.map((x) => x.id)).toEqual([ids.override, ids.proved, ids.overdue]);
    expect(live.map((x) => [x.proved, x.overdue, x.photoCount])).toEqual([[null, false, 0], [true, false, 2], [false, true, 0]]);
    expect(body).toMatchObject({ thumbnailUrl: `/api/photos/${ids.pumpPhoto}/thumbnail`, photos: [{ id: ids.pumpPhoto }] });
    // The item's tags are read in one statement (state and list alike); the rest are the session, the label, the
    // item, its photos, the live tags' photo counts and the point uses.
    expect(statements.filter((s) => /FROM `tags` AS `Tag`/.test(s))).toHaveLength(1);
    expect(statements.length).toBeLessThanOrEqual(7);
  });

  it('with the live tags elsewhere for which the item is locked as an isolation point', async () => {
    clock.now = () => NOW;
    const res = await request(t.app).get(`/api/labels/${plant.isolator.labelCode}`).set('Authorization', `Bearer ${tok.engineer}`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ state: 'normal', liveTags: [], liveIsolations: 0 });
    expect(res.body.pointUses).toEqual([
      { tagId: ids.boiler, method: 'isolator-locked', lockNumber: 'PL-7', forAsset: { id: plant.boiler.id, plantId: 'B-01', name: 'Boiler 1' }, holder: { id: u.engineer.id, name: 'willow engineer' } },
    ]);
  });
});
