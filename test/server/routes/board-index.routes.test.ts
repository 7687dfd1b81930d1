import request from 'supertest';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { clock } from '@/server/lib/clock';
import { BOARD_INDEX } from '@/server/migrations/0016-board-indexes';
import { Tag } from '@/server/models/tag.model';
import { TagProof } from '@/server/models/tag-proof.model';
import type { AuthUser } from '@/server/middleware/auth';
import type { User } from '@/server/models/user.model';
import { captureBoardSql } from '@/scripts/lib/bench-db';
import { BOARD_SORT_KEYS } from '@/shared/rules/board';
import type { BoardResponse } from '@/shared/types/board';
import { createOrganisation, setupTestApp, tokenFor, type OrgUsers, type TestApp } from '@/test/setup/app';
import { createSiteWithAssets } from '@/test/setup/register-fixtures';

/*
 * What keeps the board fast, checked on a real database: the index of migration 0016, a page read from it alone,
 * the cleared tags never read, and the page chosen before the display joins in one total order for every sort.
 */

const NOW = new Date('2025-06-10T08:00:00.000Z');
const HOUR = 3600_000;
const LIVE = 90;
const CLEARED = 600;
let t: TestApp;
let u: OrgUsers;
let sites: Awaited<ReturnType<typeof createSiteWithAssets>>[];
const tok: Record<string, string> = {};

beforeAll(async () => {
  t = await setupTestApp();
  const org = await createOrganisation('rowan');
  u = org.users;
  const orgId = org.organisation.id;
  sites = [
    await createSiteWithAssets(orgId, u.supervisor.id, { name: 'Rowan Works' }),
    await createSiteWithAssets(orgId, u.supervisor.id, { name: 'Hazel Yard' }),
    await createSiteWithAssets(orgId, u.supervisor.id, { name: 'Larch Court' }),
  ];
  const items = sites.flatMap((s) => [s.pump, s.boiler, s.valve, s.isolator]);
  const holders = [u.engineer, u.engineer2, u.supervisor];
  // Expiries repeat (every 7th hour), so the tie-break on id decides part of the order.
  const tag = (i: number, status: 'live' | 'cleared') => {
    const expiresAt = new Date(NOW.getTime() + ((i % 7) * 9 - 20) * HOUR);
    return {
      organisationId: orgId, assetId: items[(i * 5) % items.length].id, kind: i % 4 === 0 ? 'override' as const : 'isolation' as const, status,
      reason: `Job ${i % 11}`, raisedById: holders[i % 3].id, holderId: holders[i % 3].id, raisedAt: new Date(expiresAt.getTime() - ((i % 5) + 10) * HOUR),
      expiresAt, contactPhone: '+44 7700 900123', lockNumber: '', energySources: [], normalState: '', leftState: '', idempotencyKey: null,
      ...(status === 'cleared' ? { clearedAt: NOW, clearedById: holders[i % 3].id, clearance: 'normal' as const } : {}),
    };
  };
  await Tag.bulkCreate(Array.from({ length: CLEARED }, (_, i) => tag(i, 'cleared')));
  const live = await Tag.bulkCreate(Array.from({ length: LIVE }, (_, i) => tag(i, 'live')));
  await TagProof.bulkCreate(live.filter((x, i) => x.kind === 'isolation' && i % 3 === 0).map((x) => ({
    tagId: x.id, organisationId: orgId, method: 'absence-of-voltage' as const, instrument: 'Two-pole tester', reading: '0 V', note: '', byId: x.holderId, at: NOW,
  })));
  await t.db.rootQuery('ANALYZE TABLE tags, tag_proofs, assets, sites, users');
  for (const k of ['supervisor', 'viewer', 'admin'] as const) tok[k] = await tokenFor(t.app, u[k]);
});
afterAll(() => t.close());
afterEach(() => { clock.now = () => new Date(); });

const board = async (query = '', who = 'supervisor') => {
  clock.now = () => NOW;
  const res = await request(t.app).get(`/api/board${query}`).set('Authorization', `Bearer ${tok[who]}`);
  expect(res.status).toBe(200);
  return res.body as BoardResponse;
};
const actorOf = (user: User, siteIds?: number[]): AuthUser => ({ id: user.id, organisationId: user.organisationId, role: user.role, name: user.name, email: user.email, siteIds });

interface PlanTable { table_name: string; key?: string; r_rows?: number; r_loops?: number }

/** Every table access in an ANALYZE FORMAT=JSON plan. */
function tablesOf(plan: unknown, out: PlanTable[] = []): PlanTable[] {
  if (Array.isArray(plan)) plan.forEach((p) => tablesOf(p, out));
  else if (plan && typeof plan === 'object') {
    const o = plan as Record<string, unknown>;
    if (o.table && typeof o.table === 'object') out.push(o.table as PlanTable);
    Object.values(o).forEach((v) => tablesOf(v, out));
  }
  return out;
}

async function analyse(sql: string): Promise<PlanTable[]> {
  const [row] = await t.db.rootQuery<Record<string, string>[]>(`ANALYZE FORMAT=JSON ${sql}`);
  return tablesOf(JSON.parse(Object.values(row)[0]));
}

describe('the board index (migration 0016)', () => {
  it('holds live tags per organisation in expiry order with the item, kind and holder, in place of the narrower one', async () => {
    const rows = await t.db.rootQuery<{ name: string; column: string }[]>(
      `SELECT INDEX_NAME AS name, COLUMN_NAME AS \`column\` FROM information_schema.STATISTICS
       WHERE TABLE_SCHEMA = DATABASE() AND TABLE_NAME = 'tags' ORDER BY INDEX_NAME, SEQ_IN_INDEX`,
    );
    expect(rows.filter((r) => r.name === BOARD_INDEX).map((r) => r.column)).toEqual(['organisation_id', 'status', 'expires_at', 'id', 'asset_id', 'kind', 'holder_id']);
    expect(rows.map((r) => r.name)).not.toContain('tags_organisation_id_status_expires_at');
  });

  it('reads one page of index entries for the default view, and never the cleared tags for the page or the counts', async () => {
    clock.now = () => NOW;
    const statements = await captureBoardSql(t.db.sequelize, actorOf(u.supervisor));
    const reads = await Promise.all(statements.map(analyse));
    const tagReads = reads.flat().filter((r) => r.table_name === 't');
    // The page, the counts and the display join read tags; only the display join (by primary key) reads full rows.
    expect(tagReads.filter((r) => r.key === BOARD_INDEX)).toHaveLength(2);
    for (const r of tagReads) expect(r.key === BOARD_INDEX || r.key === 'PRIMARY').toBe(true);
    const [page, counts] = tagReads.filter((r) => r.key === BOARD_INDEX);
    expect(page.r_rows).toBe(50);
    expect(counts.r_rows).toBe(LIVE);
    const displayed = tagReads.find((r) => r.key === 'PRIMARY')!;
    expect((displayed.r_loops ?? 0) * (displayed.r_rows ?? 0)).toBe(50);
  });

  it('sends the statements the bench replays raw, and they give the same page and counts', async () => {
    clock.now = () => NOW;
    const statements = await captureBoardSql(t.db.sequelize, actorOf(u.supervisor));
    expect(statements).toHaveLength(3);
    const [page, perSite] = await Promise.all(statements.slice(0, 2).map((sql) => t.db.rootQuery<Record<string, unknown>[]>(sql)));
    const api = await board();
    expect(page.map((r) => Number(r.id))).toEqual(api.items.map((r) => r.id));
    expect(perSite.map((r) => ({ siteId: Number(r.siteId), total: Number(r.total), notProved: Number(r.notProved) })))
      .toEqual(api.counts.perSite.map((s) => ({ siteId: s.siteId, total: s.total, notProved: s.notProved })));
  });
});

describe('the board page, chosen before the display joins', () => {
  it.each(BOARD_SORT_KEYS.flatMap((k) => [k, `-${k}`]))('pages by %s in one total order that matches the single page', async (sort) => {
    const whole = await board(`?sort=${sort}&pageSize=200`);
    expect(whole.items).toHaveLength(LIVE);
    expect(whole.total).toBe(LIVE);
    const paged: number[] = [];
    for (let page = 1; page <= Math.ceil(LIVE / 13); page += 1) {
      const res = await board(`?sort=${sort}&pageSize=13&page=${page}`);
      expect(res.total).toBe(LIVE);
      paged.push(...res.items.map((r) => r.id));
    }
    expect(paged).toEqual(whole.items.map((r) => r.id));
    expect(new Set(paged).size).toBe(LIVE);
  });

  it('counts what the filters match as the view total, beside the counts for every site', async () => {
    const all = await board('?pageSize=200');
    const engineerHeld = all.items.filter((r) => r.holder.id === u.engineer.id && r.kind === 'isolation');
    const res = await board(`?holderId=${u.engineer.id}&kind=isolation&pageSize=5`);
    expect(res.total).toBe(engineerHeld.length);
    expect(res.items.map((r) => r.id)).toEqual(engineerHeld.slice(0, 5).map((r) => r.id));
    expect(res.counts).toEqual(all.counts);
    const words = await board('?q=job%203&pageSize=200');
    expect(words.items.map((r) => r.id)).toEqual(all.items.filter((r) => r.reason === 'Job 3').map((r) => r.id));
    expect(words.total).toBe(words.items.length);
  });

  it("applies a viewer's sites to the page, the view total and the counts alike", async () => {
    const grant = await request(t.app).put(`/api/users/${u.viewer.id}/sites`).set('Authorization', `Bearer ${tok.admin}`).send({ siteIds: [sites[1].site.id] });
    expect(grant.status).toBe(200);
    const all = await board('?pageSize=200');
    const hazel = all.items.filter((r) => r.siteId === sites[1].site.id);
    const seen = await board('?pageSize=200&sort=-holder', 'viewer');
    expect(seen.items.map((r) => r.siteId).every((id) => id === sites[1].site.id)).toBe(true);
    expect(seen.total).toBe(hazel.length);
    expect(seen.counts.perSite.map((s) => s.siteId)).toEqual([sites[1].site.id]);
    expect(seen.counts.total).toBe(hazel.length);
    expect((await board(`?siteId=${sites[0].site.id}`, 'viewer')).total).toBe(0);
  });
});
