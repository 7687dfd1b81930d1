import request from 'supertest';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { clock } from '@/server/lib/clock';
import { createOrganisation, setupTestApp, tokenFor, type OrgUsers, type TestApp } from '@/test/setup/app';
import { createSiteWithAssets } from '@/test/setup/register-fixtures';

let t: TestApp;
let u: OrgUsers;
let site: Awaited<ReturnType<typeof createSiteWithAssets>>['site'];
let foreignSite: Awaited<ReturnType<typeof createSiteWithAssets>>['site'];
const tok: Record<string, string> = {};

beforeAll(async () => {
  t = await setupTestApp();
  const org = await createOrganisation('larch');
  u = org.users;
  site = (await createSiteWithAssets(org.organisation.id, u.supervisor.id, { name: 'Larch Pool' })).site;
  const other = await createOrganisation('yew');
  foreignSite = (await createSiteWithAssets(other.organisation.id, other.users.admin.id, { name: 'Yew Hall' })).site;
  for (const k of ['admin', 'supervisor', 'engineer', 'viewer'] as const) tok[k] = await tokenFor(t.app, u[k]);
});
afterAll(() => t.close());
afterEach(() => { clock.now = () => new Date(); });

const post = (who: string, siteId: number, body: object) => request(t.app).post(`/api/sites/${siteId}/procedure-reviews`).set('Authorization', `Bearer ${tok[who]}`).send(body);
const get = (who: string, siteId: number) => request(t.app).get(`/api/sites/${siteId}/procedure-reviews`).set('Authorization', `Bearer ${tok[who]}`);
const review = (over: object = {}) => ({
  reviewedOn: '2025-02-10', observedUserIds: [u.engineer.id, u.engineer2.id],
  deviations: 'Engineer 2 did not try-start the pump after locking off', corrections: 'Retrained on site; try-start added to the plant-room card', signedOff: true, ...over,
});

describe('/api/sites/:id/procedure-reviews', () => {
  it('records a supervisor’s yearly review with the engineers observed, and shows it overdue 12 months on (controlled clock)', async () => {
    clock.now = () => new Date('2025-02-12T09:00:00Z');
    expect((await get('supervisor', site.id)).body).toMatchObject({ items: [], lastReviewedOn: null, overdue: true });
    const res = await post('supervisor', site.id, review());
    // OSHA 29 CFR 1910.147(c)(6)(i)–(ii): periodic inspection, at least annually, identifying the equipment, date, employees and inspector.
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      siteId: site.id, reviewedOn: '2025-02-10', reviewer: { id: u.supervisor.id, name: 'larch supervisor' },
      observed: [{ id: u.engineer.id, name: 'larch engineer' }, { id: u.engineer2.id, name: 'larch engineer2' }], deviations: expect.stringMatching(/try-start/),
    });
    expect((await get('engineer', site.id)).body).toMatchObject({ lastReviewedOn: '2025-02-10', dueOn: '2026-02-10', overdue: false });
    const board = () => request(t.app).get('/api/board').set('Authorization', `Bearer ${tok.supervisor}`);
    expect((await board()).body.reviewsOverdue).toEqual([]);
    clock.now = () => new Date('2026-02-10T12:00:00Z');
    expect((await get('supervisor', site.id)).body.overdue).toBe(false);
    clock.now = () => new Date('2026-02-11T09:00:00Z');
    expect((await get('supervisor', site.id)).body.overdue).toBe(true);
    expect((await board()).body.reviewsOverdue).toEqual([{ siteId: site.id, siteName: 'Larch Pool', lastReviewedOn: '2025-02-10' }]);
  });

  it('refuses an engineer or viewer (403), the reviewer among the observed, no sign-off, a future date, and another organisation’s site', async () => {
    clock.now = () => new Date('2025-02-12T09:00:00Z');
    expect((await post('engineer', site.id, review())).status).toBe(403);
    expect((await post('viewer', site.id, review())).status).toBe(403);
    // OSHA 29 CFR 1910.147(c)(6)(i)(A): performed by an authorized employee other than the one(s) utilizing the procedure.
    const self = await post('supervisor', site.id, review({ observedUserIds: [u.supervisor.id, u.engineer.id] }));
    expect(self.status).toBe(422);
    expect(self.body.error.fields.observedUserIds).toMatch(/reviewer/);
    expect((await post('admin', site.id, review({ signedOff: false }))).body.error.fields).toHaveProperty('signedOff');
    expect((await post('admin', site.id, review({ observedUserIds: [] }))).status).toBe(422);
    expect((await post('admin', site.id, review({ reviewedOn: '2025-03-01' }))).body.error.fields).toHaveProperty('reviewedOn');
    expect((await post('admin', foreignSite.id, review())).status).toBe(404);
    expect((await get('admin', foreignSite.id)).status).toBe(404);
    await expect(t.db.rootQuery("UPDATE procedure_reviews SET deviations = 'None' WHERE site_id = ?", [site.id])).rejects.toThrow(/append-only/);
  });
});
