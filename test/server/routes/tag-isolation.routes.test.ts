import request from 'supertest';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Tag } from '@/server/models/tag.model';
import { TagEvent } from '@/server/models/tag-event.model';
import { TagProof } from '@/server/models/tag-proof.model';
import { createOrganisation, setupTestApp, tokenFor, type OrgUsers, type TestApp } from '@/test/setup/app';
import { createSiteWithAssets } from '@/test/setup/register-fixtures';

let t: TestApp;
let u: OrgUsers;
let plant: Awaited<ReturnType<typeof createSiteWithAssets>>;
const tok: Record<string, string> = {};

beforeAll(async () => {
  t = await setupTestApp();
  const org = await createOrganisation('rowan');
  u = org.users;
  plant = await createSiteWithAssets(org.organisation.id, u.supervisor.id);
  for (const k of ['supervisor', 'engineer', 'engineer2', 'viewer'] as const) tok[k] = await tokenFor(t.app, u[k]);
});
afterAll(() => t.close());

const as = (who: string) => ({
  get: (path: string) => request(t.app).get(path).set('Authorization', `Bearer ${tok[who]}`),
  post: (path: string, body: object, headers: Record<string, string> = {}) => request(t.app).post(path).set('Authorization', `Bearer ${tok[who]}`).set(headers).send(body),
});
const inHours = (h: number) => new Date(Date.now() + h * 3600_000).toISOString();
// The boiler is recorded with gas, electrical, hot water and stored pressure.
const boilerIsolation = (over: object = {}) => ({
  kind: 'isolation', reason: 'Replace flame failure probe', expiresAt: inHours(6), lockNumber: 'PL-207',
  energySources: ['gas', 'electrical'],
  omittedSources: [
    { source: 'hot-water', reason: 'Boiler valved off flow and return, cooled below 40 °C' },
    { source: 'stored-pressure', reason: 'Boiler drained at the drain cock to zero' },
  ],
  points: [
    { description: 'Boiler gas cock', method: 'valve-locked', lockNumber: 'PL-207' },
    { assetId: plant.isolator.id, method: 'isolator-locked' },
  ],
  ...over,
});
const raiseOn = (body: object, who = 'engineer', headers: Record<string, string> = {}) => as(who).post(`/api/assets/${plant.boiler.id}/tags`, body, headers);

describe('every energy source accounted for', () => {
  it('refuses a gas boiler isolation that names only electrical (422 naming the missing sources)', async () => {
    const before = await Tag.count();
    const res = await raiseOn(boilerIsolation({ energySources: ['electrical'], omittedSources: [] }));
    // OSHA 29 CFR 1910.147(d)(3)–(d)(4): all energy isolating devices needed to control the energy are operated and locked.
    expect(res.status).toBe(422);
    expect(res.body.error.message).toMatch(/gas, hot-water, stored-pressure/);
    expect(res.body.error.fields.energySources).toMatch(/Gas, Hot water or steam, Stored pressure/);
    expect(await Tag.count()).toBe(before);
  });

  it('accepts a source left out only with a reason of at least 10 characters, and keeps the reasons', async () => {
    const short = await raiseOn(boilerIsolation({ omittedSources: [{ source: 'hot-water', reason: 'cold' }, { source: 'stored-pressure', reason: 'Boiler drained at the drain cock to zero' }] }));
    expect(short.status).toBe(422);
    expect(short.body.error.fields['omittedSources[0].reason']).toMatch(/At least 10/);
    const both = await raiseOn(boilerIsolation({ omittedSources: [{ source: 'gas', reason: 'Listed twice on purpose here' }, ...boilerIsolation().omittedSources] }));
    expect(both.body.error.fields.omittedSources).toMatch(/Gas/);
    const foreign = await raiseOn(boilerIsolation({ omittedSources: [...boilerIsolation().omittedSources, { source: 'refrigerant', reason: 'There is no refrigerant circuit' }] }));
    expect(foreign.body.error.fields.energySources).toMatch(/refrigerant/);
    const ok = await raiseOn(boilerIsolation());
    expect(ok.status).toBe(201);
    expect(ok.body.omittedSources).toEqual(boilerIsolation().omittedSources);
    expect(ok.body.points.map((p: { lockNumber: string }) => p.lockNumber)).toEqual(['PL-207', '']);
  });

  it('wants a lock number on an isolation, not on an override', async () => {
    const res = await raiseOn(boilerIsolation({ lockNumber: '  ' }));
    // OSHA 29 CFR 1910.147(c)(5)(ii)(D): the device identifies the employee who applied it.
    expect(res.status).toBe(422);
    expect(res.body.error.fields.lockNumber).toMatch(/personal lock/);
    const override = await raiseOn({ kind: 'override', reason: 'Flow setpoint raised for a test', expiresAt: inHours(2), normalState: '80 °C', leftState: '82 °C' }, 'engineer2');
    expect(override.status).toBe(201);
    expect(override.body.proved).toBeNull();
  });
});

describe('proving an isolation', () => {
  it('is not proved until a proof is recorded; the proof names method, instrument, reading, who and when', async () => {
    const tag = (await raiseOn(boilerIsolation())).body;
    expect(tag.proved).toBe(false);
    expect((await as('engineer2').get(`/api/assets/${plant.boiler.id}`)).body.unprovedIsolations).toBeGreaterThanOrEqual(1);
    expect((await as('engineer').post(`/api/tags/${tag.id}/prove`, { method: 'absence-of-voltage' })).body.error.fields).toHaveProperty('instrument');
    expect((await as('engineer2').post(`/api/tags/${tag.id}/prove`, { method: 'try-start' })).status).toBe(403);
    // OSHA 29 CFR 1910.147(d)(6): before work, the employee verifies that isolation and de-energisation have been accomplished.
    // HSE HSG253: prove the isolation (test for dead, check pressure has gone) before breaking into plant.
    const res = await as('engineer').post(`/api/tags/${tag.id}/prove`, { method: 'absence-of-voltage', instrument: 'Two-pole tester TV-11, proved on a proving unit before and after', reading: '0 V L–N, L–E, N–E' });
    expect(res.status).toBe(201);
    expect(res.body.proved).toBe(true);
    expect(res.body.proofs).toEqual([expect.objectContaining({ method: 'absence-of-voltage', instrument: expect.stringMatching(/TV-11/), reading: '0 V L–N, L–E, N–E', by: { id: u.engineer.id, name: 'rowan engineer' } })]);
    expect(Date.parse(res.body.proofs[0].at)).toBeGreaterThan(Date.now() - 60_000);
    expect(res.body.events.at(-1)).toMatchObject({ type: 'proved', by: { id: u.engineer.id } });
  });

  it('takes the proof in the raise body', async () => {
    const res = await raiseOn(boilerIsolation({ proof: { method: 'pressure-at-zero', instrument: 'Gas test point gauge GT-2', reading: '0 mbar' } }), 'engineer2');
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ proved: true, proofs: [expect.objectContaining({ method: 'pressure-at-zero', reading: '0 mbar' })] });
    expect(res.body.events.map((e: { type: string }) => e.type)).toEqual(['raised', 'proved']);
  });
});

describe('Idempotency-Key on every tag action', () => {
  it('refuses a used key replayed with a different body or for a different item (422), and creates nothing', async () => {
    const key = { 'Idempotency-Key': 'raise-boiler-5d1e' };
    const body = boilerIsolation();
    const first = await raiseOn(body, 'engineer', key);
    expect(first.status).toBe(201);
    const replay = await raiseOn(body, 'engineer', key);
    expect(replay.status).toBe(200);
    expect(replay.body.id).toBe(first.body.id);
    const before = await Tag.count();
    const otherBody = await raiseOn({ ...body, reason: 'Something else entirely' }, 'engineer', key);
    expect(otherBody.status).toBe(422);
    expect(otherBody.body.error.code).toBe('idempotency-key-reused');
    const otherItem = await as('engineer').post(`/api/assets/${plant.isolator.id}/tags`, body, key);
    expect(otherItem.status).toBe(422);
    expect(await Tag.count()).toBe(before);
  });

  it('writes one event for a retried note, extension, proof or photo', async () => {
    const tag = (await raiseOn(boilerIsolation())).body;
    const inHoursFixed = inHours(9);
    const png = await sharp({ create: { width: 32, height: 32, channels: 3, background: { r: 200, g: 30, b: 30 } } }).png().toBuffer();
    for (let i = 0; i < 2; i++) {
      expect((await as('engineer').post(`/api/tags/${tag.id}/notes`, { text: 'Probe on order' }, { 'Idempotency-Key': `note-${tag.id}` })).status).toBe(201);
      expect((await as('engineer').post(`/api/tags/${tag.id}/extend`, { expiresAt: inHoursFixed, reason: 'Probe arrives later' }, { 'Idempotency-Key': `extend-${tag.id}` })).status).toBe(200);
      expect((await as('engineer').post(`/api/tags/${tag.id}/prove`, { method: 'try-start', note: 'Boiler called for heat, no ignition' }, { 'Idempotency-Key': `prove-${tag.id}` })).status).toBe(201);
      expect((await request(t.app).post(`/api/tags/${tag.id}/photos`).set('Authorization', `Bearer ${tok.engineer}`).set('Idempotency-Key', `photo-${tag.id}`).attach('photo', png, 'lock.png')).status).toBe(201);
    }
    const counts = Object.fromEntries(await Promise.all(['note-added', 'extended', 'proved', 'photo-added'].map(async (type) => [type, await TagEvent.count({ where: { tagId: tag.id, type } })])));
    expect(counts).toEqual({ 'note-added': 1, extended: 1, proved: 1, 'photo-added': 1 });
    expect(await TagProof.count({ where: { tagId: tag.id } })).toBe(1);
    expect((await as('engineer').post(`/api/tags/${tag.id}/notes`, { text: 'A different note' }, { 'Idempotency-Key': `note-${tag.id}` })).status).toBe(422);
  });
});

describe('the database keeps the record as it was written', () => {
  it('refuses to rewrite a tag’s identity, bring a cleared tag back to live, or change points and proofs', async () => {
    const tag = (await raiseOn(boilerIsolation({ proof: { method: 'vented-drained', instrument: '', reading: '' } }))).body;
    // OSHA 29 CFR 1910.147(c)(5)(ii)(D) / (e)(3): the record of who applied the device, and why, stays as written.
    for (const sql of [
      'UPDATE tags SET reason = ? WHERE id = ?',
      'UPDATE tags SET raised_by_id = raised_by_id + 1 + 0 * LENGTH(?) WHERE id = ?',
      'UPDATE tags SET raised_at = NOW() + 0 * LENGTH(?) WHERE id = ?',
      'UPDATE tags SET asset_id = asset_id + 0 * LENGTH(?) + 1 WHERE id = ?',
      "UPDATE tags SET kind = IF(? = '', 'override', 'override') WHERE id = ?",
    ]) {
      await expect(t.db.rootQuery(sql, ['Rewritten', tag.id])).rejects.toThrow(/identity/);
    }
    await expect(t.db.rootQuery('UPDATE tag_points SET lock_number = ? WHERE tag_id = ?', ['X', tag.id])).rejects.toThrow(/fixed/);
    await expect(t.db.rootQuery('DELETE FROM tag_points WHERE tag_id = ?', [tag.id])).rejects.toThrow(/fixed/);
    await expect(t.db.rootQuery('UPDATE tag_proofs SET reading = ? WHERE tag_id = ?', ['X', tag.id])).rejects.toThrow(/append-only/);
    await expect(t.db.rootQuery('DELETE FROM tag_proofs WHERE tag_id = ?', [tag.id])).rejects.toThrow(/append-only/);
    const allChecks = { workComplete: true, guardsRefitted: true, personnelClear: true, testedSafe: true };
    expect((await as('engineer').post(`/api/tags/${tag.id}/clear`, { reason: 'Probe replaced and boiler fired', checks: allChecks })).status).toBe(200);
    await expect(t.db.rootQuery("UPDATE tags SET status = 'live', cleared_at = NULL WHERE id = ?", [tag.id])).rejects.toThrow(/back to live/);
    await expect(t.db.rootQuery('UPDATE tags SET expires_at = NOW() WHERE id = ?', [tag.id])).rejects.toThrow(/final/);
    expect((await Tag.findByPk(tag.id))!.status).toBe('cleared');
  });
});
