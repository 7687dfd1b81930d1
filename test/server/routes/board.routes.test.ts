import request from 'supertest';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { clock } from '@/server/lib/clock';
import type { Tag } from '@/server/models/tag.model';
import { createOrganisation, setupTestApp, tokenFor, type OrgUsers, type TestApp } from '@/test/setup/app';
import { createSiteWithAssets } from '@/test/setup/register-fixtures';
import { insertTag } from '@/test/server/support/tag-fixtures';
import { TagProof } from '@/server/models/tag-proof.model';
import type { BoardResponse } from '@/shared/types/board';

const NOW = new Date('2025-03-04T10:00:00.000Z');
let t: TestApp;
let u: OrgUsers;
let ash: Awaited<ReturnType<typeof createSiteWithAssets>>;
let beech: Awaited<ReturnType<typeof createSiteWithAssets>>;
const tags: Record<string, Tag> = {};
const tok: Record<string, string> = {};

beforeAll(async () => {
  t = await setupTestApp();
  const org = await createOrganisation('oak');
  u = org.users;
  const orgId = org.organisation.id;
  ash = await createSiteWithAssets(orgId, u.supervisor.id, { name: 'Ash Court' });
  beech = await createSiteWithAssets(orgId, u.supervisor.id, { name: 'Beech House', timeZone: 'America/New_York' });
  const other = await createOrganisation('elm');
  const elm = await createSiteWithAssets(other.organisation.id, other.users.admin.id, { name: 'Elm Yard' });
  const make = (assetId: number, holderId: number, expiresInHours: number, extra: object = {}) => insertTag({ organisationId: orgId, assetId, holderId, now: NOW, expiresInHours, ...extra });
  tags.overdueAsh = await make(ash.pump.id, u.engineer.id, -2, { reason: 'Replace mechanical seal', raisedHoursAgo: 30 });
  tags.dueSoonAsh = await make(ash.boiler.id, u.engineer2.id, 3, { kind: 'override', reason: 'Flow setpoint raised for commissioning', raisedHoursAgo: 2 });
  tags.liveAsh = await make(ash.valve.id, u.supervisor.id, 48, { reason: 'Valve gland repacking', raisedHoursAgo: 5 });
  await TagProof.create({ tagId: tags.liveAsh.id, organisationId: orgId, method: 'pressure-at-zero', instrument: 'Gauge PG-3 on the strainer', reading: '0.0 bar', note: '', byId: u.supervisor.id, at: NOW });
  tags.liveBeech = await make(beech.pump.id, u.engineer2.id, 30, { reason: 'Coupling alignment', raisedHoursAgo: 1 });
  tags.overdueBeech = await make(beech.boiler.id, u.engineer.id, -1, { reason: 'Burner service 100% strip-down', raisedHoursAgo: 20 });
  await make(beech.isolator.id, u.engineer.id, 5, { status: 'cleared' });
  await insertTag({ organisationId: other.organisation.id, assetId: elm.pump.id, holderId: other.users.engineer.id, now: NOW, expiresInHours: 2 });
  for (const k of ['admin', 'supervisor', 'engineer', 'viewer'] as const) tok[k] = await tokenFor(t.app, u[k]);
});
afterAll(() => t.close());
afterEach(() => { clock.now = () => new Date(); });

const board = async (who: string, query = '') => {
  clock.now = () => NOW;
  const res = await request(t.app).get(`/api/board${query}`).set('Authorization', `Bearer ${tok[who]}`);
  return res;
};
const ids = (res: { body: BoardResponse }) => res.body.items.map((r) => r.id);

describe('GET /api/board', () => {
  it('lists every live tag of the organisation, soonest expiry first, with states and counts', async () => {
    const res = await board('supervisor');
    expect(res.status).toBe(200);
    expect(ids(res)).toEqual([tags.overdueAsh.id, tags.overdueBeech.id, tags.dueSoonAsh.id, tags.liveBeech.id, tags.liveAsh.id]);
    expect(res.body.items.map((r: { state: string }) => r.state)).toEqual(['overdue', 'overdue', 'due-soon', 'live', 'live']);
    expect(res.body.items[0]).toMatchObject({
      siteName: 'Ash Court', plantId: 'P-01', assetName: 'Heating pump 1', kind: 'isolation', reason: 'Replace mechanical seal',
      holder: { id: u.engineer.id, name: 'oak engineer' }, proved: false, contactPhone: '+44 7700 900111', timeZone: 'Europe/London', plantRoomName: null,
      expiresAt: '2025-03-04T08:00:00.000Z', raisedAt: '2025-03-03T04:00:00.000Z',
    });
    // OSHA 29 CFR 1910.147(d)(6): isolation is verified before work; the board counts isolations with no proof recorded.
    expect(res.body.items.map((r: { id: number; proved: boolean | null }) => [r.id, r.proved])).toEqual([
      [tags.overdueAsh.id, false], [tags.overdueBeech.id, false], [tags.dueSoonAsh.id, null], [tags.liveBeech.id, false], [tags.liveAsh.id, true],
    ]);
    expect(res.body.counts).toEqual({
      total: 5, overdue: 2, dueSoon: 1, notProved: 3,
      perSite: [
        { siteId: ash.site.id, siteName: 'Ash Court', total: 3, overdue: 1, dueSoon: 1, notProved: 1 },
        { siteId: beech.site.id, siteName: 'Beech House', total: 2, overdue: 1, dueSoon: 0, notProved: 2 },
      ],
    });
    // OSHA 29 CFR 1910.147(c)(6)(i): at least an annual review of the procedure; none is recorded for either site.
    expect(res.body.reviewsOverdue).toEqual([
      { siteId: ash.site.id, siteName: 'Ash Court', lastReviewedOn: null },
      { siteId: beech.site.id, siteName: 'Beech House', lastReviewedOn: null },
    ]);
    expect(res.body).toMatchObject({ total: 5, page: 1, pageSize: 50, asOf: NOW.toISOString() });
  });

  it.each([
    ['site', () => `?siteId=${beech.site.id}`, () => [tags.overdueBeech.id, tags.liveBeech.id]],
    ['kind', () => '?kind=override', () => [tags.dueSoonAsh.id]],
    ['holder', () => `?holderId=${u.engineer.id}`, () => [tags.overdueAsh.id, tags.overdueBeech.id]],
    ['state overdue', () => '?state=overdue', () => [tags.overdueAsh.id, tags.overdueBeech.id]],
    ['state due-soon', () => '?state=due-soon', () => [tags.dueSoonAsh.id]],
    ['state live', () => '?state=live', () => [tags.liveBeech.id, tags.liveAsh.id]],
    ['search on reason', () => '?q=setpoint', () => [tags.dueSoonAsh.id]],
    ['search on plant ID', () => '?q=p-01', () => [tags.overdueAsh.id, tags.liveBeech.id]],
    ['search on item name', () => '?q=boiler', () => [tags.overdueBeech.id, tags.dueSoonAsh.id]],
    ['search on holder name', () => '?q=engineer2', () => [tags.dueSoonAsh.id, tags.liveBeech.id]],
    ['search, every word must match', () => '?q=engineer2%20coupling', () => [tags.liveBeech.id]],
    ['search with a literal %', () => '?q=100%25', () => [tags.overdueBeech.id]],
    ['filters combined', () => `?siteId=${ash.site.id}&state=overdue`, () => [tags.overdueAsh.id]],
  ])('filters by %s and keeps the counts for the whole board', async (_label, query, expected) => {
    const res = await board('admin', query());
    expect(res.status).toBe(200);
    expect(ids(res)).toEqual(expected());
    expect(res.body.total).toBe(expected().length);
    expect(res.body.counts.total).toBe(5);
  });

  it.each([
    ['-raised', ['liveBeech', 'dueSoonAsh', 'liveAsh', 'overdueBeech', 'overdueAsh']],
    ['raised', ['overdueAsh', 'overdueBeech', 'liveAsh', 'dueSoonAsh', 'liveBeech']],
    ['-expires', ['liveAsh', 'liveBeech', 'dueSoonAsh', 'overdueBeech', 'overdueAsh']],
    ['site', ['overdueAsh', 'dueSoonAsh', 'liveAsh', 'overdueBeech', 'liveBeech']],
    ['holder', ['overdueAsh', 'overdueBeech', 'dueSoonAsh', 'liveBeech', 'liveAsh']],
    ['name', ['overdueBeech', 'dueSoonAsh', 'overdueAsh', 'liveBeech', 'liveAsh']],
    ['kind', ['overdueAsh', 'overdueBeech', 'liveBeech', 'liveAsh', 'dueSoonAsh']],
    ['state', ['overdueAsh', 'overdueBeech', 'dueSoonAsh', 'liveBeech', 'liveAsh']],
    ['not-a-column', ['overdueAsh', 'overdueBeech', 'dueSoonAsh', 'liveBeech', 'liveAsh']],
  ])('sorts by %s', async (sort, expected) => {
    const res = await board('supervisor', `?sort=${sort}`);
    expect(ids(res)).toEqual(expected.map((k) => tags[k].id));
  });

  it('pages the filtered list', async () => {
    const res = await board('supervisor', '?pageSize=2&page=2');
    expect(ids(res)).toEqual([tags.dueSoonAsh.id, tags.liveBeech.id]);
    expect(res.body).toMatchObject({ total: 5, page: 2, pageSize: 2 });
    expect(ids(await board('supervisor', '?pageSize=2&page=3'))).toEqual([tags.liveAsh.id]);
  });

  it('refuses an unknown kind or state (400) and an engineer (403), and wants a session (401)', async () => {
    expect((await board('admin', '?kind=padlock')).status).toBe(400);
    expect((await board('admin', '?state=late')).body.error.fields).toHaveProperty('state');
    expect((await board('admin', '?siteId=abc')).status).toBe(400);
    const engineer = await board('engineer');
    expect(engineer.status).toBe(403);
    expect(engineer.body.error.code).toBe('forbidden');
    expect((await request(t.app).get('/api/board.csv').set('Authorization', `Bearer ${tok.engineer}`)).status).toBe(403);
    expect((await request(t.app).get('/api/board')).status).toBe(401);
  });

  it('shows a viewer only the sites an admin has given them, counts included', async () => {
    const none = await board('viewer');
    expect(none.status).toBe(200);
    expect(none.body).toMatchObject({ total: 0, items: [], counts: { total: 0, overdue: 0, dueSoon: 0, notProved: 0, perSite: [] }, reviewsOverdue: [] });
    const grant = await request(t.app).put(`/api/users/${u.viewer.id}/sites`).set('Authorization', `Bearer ${tok.admin}`).send({ siteIds: [ash.site.id] });
    expect(grant.status).toBe(200);
    const some = await board('viewer');
    expect(ids(some)).toEqual([tags.overdueAsh.id, tags.dueSoonAsh.id, tags.liveAsh.id]);
    expect(some.body.counts).toEqual({ total: 3, overdue: 1, dueSoon: 1, notProved: 1, perSite: [{ siteId: ash.site.id, siteName: 'Ash Court', total: 3, overdue: 1, dueSoon: 1, notProved: 1 }] });
    expect(some.body.reviewsOverdue.map((r: { siteId: number }) => r.siteId)).toEqual([ash.site.id]);
    expect((await board('viewer', `?siteId=${beech.site.id}`)).body.total).toBe(0);
    await request(t.app).put(`/api/users/${u.viewer.id}/sites`).set('Authorization', `Bearer ${tok.admin}`).send({ siteIds: [] });
    expect((await board('viewer')).body.total).toBe(0);
  });
});

describe('GET /api/board.csv', () => {
  it('exports the current view, every page, with site-local times and guarded cells', async () => {
    clock.now = () => NOW;
    const res = await request(t.app).get(`/api/board.csv?siteId=${beech.site.id}&pageSize=1`).set('Authorization', `Bearer ${tok.supervisor}`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    expect(res.headers['content-disposition']).toMatch(/attachment; filename="isoledger-board-/);
    const lines = res.text.replace(/^\uFEFF/, '').trim().split('\r\n');
    expect(lines[0]).toBe('Site,Plant room,Plant ID,Item,Kind,Reason,Holder,Raised (site time),Expires (site time),Time zone,State,Proof of isolation,Contact phone,Tag');
    expect(lines).toHaveLength(3);
    // 2025-03-04 09:00 UTC is 04:00 in New York (EST, UTC−5, until the second Sunday of March) — IANA tz database via Intl.
    expect(lines[1]).toBe(`Beech House,,B-01,Boiler 1,isolation,Burner service 100% strip-down,oak engineer,2025-03-03 09:00,2025-03-04 04:00,America/New_York,Past expiry,Not proved,'+44 7700 900111,${t.config.publicUrl}/tags/${tags.overdueBeech.id}`);
    expect(lines[2]).toContain(`/tags/${tags.liveBeech.id}`);
  });
});
