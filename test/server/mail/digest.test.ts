import request from 'supertest';
import { Sequelize } from 'sequelize';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { clock } from '@/server/lib/clock';
import { runDigests } from '@/server/mail/digest';
import { createOrganisation, tokenFor, type OrgUsers } from '@/test/setup/app';
import { createSiteWithAssets } from '@/test/setup/register-fixtures';
import { insertTag } from '@/test/server/support/tag-fixtures';
import { ProcedureReview } from '@/server/models/procedure-review.model';
import { outboxRows, setupMailTestApp, TEST_PUBLIC_URL } from '@/test/server/support/mail-test-app';

// 07:02 on 15 January in London (GMT, UTC+0 in winter); 16:02 the same day in Tokyo (UTC+9, no DST) — IANA tz database via Intl.
const LONDON_MORNING = new Date('2025-01-15T07:02:00.000Z');
// 07:05 on 16 January in Tokyo.
const TOKYO_MORNING = new Date('2025-01-15T22:05:00.000Z');

let env: Awaited<ReturnType<typeof setupMailTestApp>>;
let u: OrgUsers;
let quiet: OrgUsers;
let second: Sequelize;
let ids: Record<string, number> = {};

beforeAll(async () => {
  env = await setupMailTestApp();
  const org = await createOrganisation('hazel');
  u = org.users;
  const london = await createSiteWithAssets(org.organisation.id, u.supervisor.id, { name: 'Hazel School' });
  const tokyo = await createSiteWithAssets(org.organisation.id, u.supervisor.id, { name: 'Hazel Annex', timeZone: 'Asia/Tokyo' });
  const tag = (assetId: number, holderId: number, expiresInHours: number) => insertTag({ organisationId: org.organisation.id, assetId, holderId, now: LONDON_MORNING, expiresInHours });
  ids = {
    overdue: (await tag(london.pump.id, u.engineer.id, -3)).id,
    dueToday: (await tag(london.boiler.id, u.engineer2.id, 10)).id,
    tomorrow: (await tag(london.valve.id, u.engineer.id, 20)).id,
    tokyoToday: (await tag(tokyo.pump.id, u.engineer.id, 24)).id,
  };
  const review = (organisationId: number, siteId: number, reviewerId: number, reviewedOn: string) => ProcedureReview.create({
    organisationId, siteId, reviewedOn, reviewerId, observed: [{ id: u.engineer.id, name: 'hazel engineer' }], deviations: 'None found', corrections: 'None needed', signedOffAt: LONDON_MORNING,
  });
  await review(org.organisation.id, london.site.id, u.supervisor.id, '2024-03-01');
  await review(org.organisation.id, tokyo.site.id, u.supervisor.id, '2023-12-01');
  // An organisation with a site and no live tags: its supervisors' runs are recorded and nothing is sent.
  const q = await createOrganisation('quiet');
  quiet = q.users;
  const depot = await createSiteWithAssets(q.organisation.id, quiet.supervisor.id, { name: 'Quiet Depot' });
  await review(q.organisation.id, depot.site.id, quiet.supervisor.id, '2024-09-10');
  // A second, independent connection pool to the same database, standing for a second server process.
  second = new Sequelize(env.t.db.url, { dialect: 'mariadb', logging: false, timezone: '+00:00' });
});
afterAll(async () => {
  await second.close();
  await env.close();
});
afterEach(() => { clock.now = () => new Date(); });

const runs = () => env.t.db.rootQuery<{ user_id: number; time_zone: string; local_date: string | Date; tag_count: number }[]>('SELECT user_id, time_zone, local_date, tag_count FROM digest_runs ORDER BY user_id, time_zone');

describe('runDigests', () => {
  it('sends nothing before 07:00 site time', async () => {
    const early = new Date('2025-01-15T06:58:00.000Z');
    expect(await runDigests(early, { sequelize: env.t.db.sequelize })).toEqual({ sent: 0, empty: 0, skipped: 0 });
    expect(await runs()).toHaveLength(0);
  });

  it('sends one digest per supervisor and admin even when two processes run it at the same moment', async () => {
    const off = await request(env.t.app).patch('/api/me/settings').set('Authorization', `Bearer ${await tokenFor(env.t.app, quiet.admin)}`).send({ notifications: { digest: false } });
    expect(off.status).toBe(200);
    const [a, b] = await Promise.all([
      runDigests(LONDON_MORNING, { sequelize: env.t.db.sequelize, name: 'process-a' }),
      runDigests(LONDON_MORNING, { sequelize: second, name: 'process-b' }),
    ]);
    // hazel: supervisor and admin get one each (London); quiet: the supervisor's run is empty, the admin opted out.
    expect(a.sent + b.sent).toBe(2);
    expect(a.empty + b.empty).toBe(1);
    const digestRows = await outboxRows(env.t, "kind = 'digest'");
    expect(digestRows.map((r) => r.to_email).sort()).toEqual([u.admin.email, u.supervisor.email].sort());
    expect((await runs()).map((r) => [r.user_id, r.time_zone, r.tag_count])).toEqual([
      [u.admin.id, 'Europe/London', 2],
      [u.supervisor.id, 'Europe/London', 2],
      [quiet.supervisor.id, 'Europe/London', 0],
    ].sort((x, y) => Number(x[0]) - Number(y[0])));

    // Later the same morning: already done, nothing new.
    const again = await runDigests(new Date(LONDON_MORNING.getTime() + 5 * 60_000), { sequelize: second });
    expect(again.sent).toBe(0);
    expect((await outboxRows(env.t, "kind = 'digest'")).length).toBe(2);

    clock.now = () => LONDON_MORNING;
    expect(await env.worker.runOnce()).toEqual({ sent: 2, failed: 0 });
    const [mail] = await env.inbox.to(u.supervisor.email);
    expect((await env.inbox.to(u.supervisor.email)).length).toBe(1);
    expect(mail.subject).toBe('Tags for 2025-01-15: 1 past expiry, 1 due today');
    expect(mail.text).toContain(`${TEST_PUBLIC_URL}/tags/${ids.overdue}`);
    expect(mail.text).toContain(`${TEST_PUBLIC_URL}/tags/${ids.dueToday}`);
    expect(mail.text).not.toContain(`/tags/${ids.tomorrow}`);
    expect(mail.text).not.toContain(`/tags/${ids.tokyoToday}`);
    expect(mail.html).toContain(`href="${TEST_PUBLIC_URL}/tags/${ids.overdue}"`);
    expect(await env.inbox.to(u.engineer.email)).toEqual([]);
    expect(await env.inbox.to(u.viewer.email)).toEqual([]);
    expect(await env.inbox.to(quiet.supervisor.email)).toEqual([]);
  });

  it('sends the Tokyo sites’ digest at 07:00 Tokyo time, listing only those sites', async () => {
    await env.inbox.clear();
    const results = await Promise.all([1, 2, 3].map((i) => runDigests(TOKYO_MORNING, { sequelize: i === 2 ? second : env.t.db.sequelize })));
    expect(results.reduce((n, r) => n + r.sent, 0)).toBe(2);
    clock.now = () => TOKYO_MORNING;
    await env.worker.runOnce();
    const mails = await env.inbox.to(u.admin.email);
    expect(mails).toHaveLength(1);
    // OSHA 29 CFR 1910.147(c)(6)(i): reviewed at least annually; the Tokyo site's last review (2023-12-01) is over 12 months old.
    expect(mails[0].subject).toBe('Tags for 2025-01-16: 0 past expiry, 1 due today, 1 procedure review overdue');
    expect(mails[0].text).toContain('Hazel Annex · last review 2023-12-01');
    expect(mails[0].text).toContain(`${TEST_PUBLIC_URL}/tags/${ids.tokyoToday}`);
    expect(mails[0].text).toContain('Asia/Tokyo');
    expect(mails[0].text).not.toContain(`/tags/${ids.overdue}`);
  });

  it('lists a site’s procedure review as overdue from the day after it is 12 months old, by the site’s own date', async () => {
    await env.inbox.clear();
    // 2025-03-01 in London is exactly 12 months after the 2024-03-01 review: due, not yet overdue.
    const dueDay = new Date('2025-03-01T07:02:00.000Z');
    await runDigests(dueDay, { sequelize: env.t.db.sequelize });
    clock.now = () => dueDay;
    await env.worker.runOnce();
    const [onTime] = await env.inbox.to(u.supervisor.email);
    expect(onTime.text).not.toContain('Hazel School · last review');
    await env.inbox.clear();
    // OSHA 29 CFR 1910.147(c)(6)(i): "at least annually" – the next morning it is overdue.
    const nextDay = new Date('2025-03-02T07:02:00.000Z');
    await runDigests(nextDay, { sequelize: env.t.db.sequelize });
    clock.now = () => nextDay;
    await env.worker.runOnce();
    const [late] = await env.inbox.to(u.supervisor.email);
    expect(late.subject).toMatch(/1 procedure review overdue$/);
    expect(late.text).toContain('Hazel School · last review 2024-03-01');
  });

  it('skips a morning it missed entirely rather than sending it in the afternoon', async () => {
    const afternoon = new Date('2025-01-17T14:00:00.000Z');
    expect((await runDigests(afternoon, { sequelize: env.t.db.sequelize })).sent).toBe(0);
  });
});
