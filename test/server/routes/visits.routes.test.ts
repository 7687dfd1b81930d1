import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { Organisation } from '@/server/models/organisation.model';
import { PlantRoom } from '@/server/models/plant-room.model';
import { UserSiteAccess } from '@/server/models/user-site-access.model';
import { Visit } from '@/server/models/visit.model';
import { VisitDecision } from '@/server/models/visit-decision.model';
import { TagEvent } from '@/server/models/tag-event.model';
import { Tag } from '@/server/models/tag.model';
import { createOrganisation, giveViewerEverySite, tokenFor, type OrgUsers } from '@/test/setup/app';
import { createSiteWithAssets } from '@/test/setup/register-fixtures';
import { outboxRows, setupMailTestApp } from '@/test/server/support/mail-test-app';

let env: Awaited<ReturnType<typeof setupMailTestApp>>;
let u: OrgUsers;
let plant: Awaited<ReturnType<typeof createSiteWithAssets>>;
let otherPlant: Awaited<ReturnType<typeof createSiteWithAssets>>;
let room: PlantRoom;
const tok: Record<string, string> = {};

beforeAll(async () => {
  env = await setupMailTestApp();
  const org = await createOrganisation('hazel');
  u = org.users;
  const other = await createOrganisation('larch');
  plant = await createSiteWithAssets(org.organisation.id, u.supervisor.id, { name: 'Hazel Primary' });
  otherPlant = await createSiteWithAssets(other.organisation.id, other.users.admin.id, { name: 'Larch Offices' });
  room = await PlantRoom.create({ organisationId: org.organisation.id, siteId: plant.site.id, name: 'Basement boiler room', accessNotes: '', createdBy: u.supervisor.id });
  for (const a of [plant.pump, plant.boiler, plant.valve, plant.isolator]) await a.update({ plantRoomId: room.id });
  for (const k of ['admin', 'supervisor', 'engineer', 'engineer2', 'viewer'] as const) tok[k] = await tokenFor(env.t.app, u[k]);
  tok.larch = await tokenFor(env.t.app, other.users.supervisor);
});
afterAll(() => env.close());
// The viewer here stands for any reader: it is given every site (site limits are tested in test/server/services/site-access.test.ts).
beforeEach(() => giveViewerEverySite(u.viewer));

const as = (who: string) => ({
  get: (p: string) => request(env.t.app).get(p).set('Authorization', `Bearer ${tok[who]}`),
  post: (p: string, body: object = {}) => request(env.t.app).post(p).set('Authorization', `Bearer ${tok[who]}`).send(body),
});
const inHours = (h: number) => new Date(Date.now() + h * 3600_000).toISOString();
const override = {
  kind: 'override', reason: 'Boiler 1 held on manual while the flue is inspected', expiresAt: inHours(8),
  normalState: 'Auto, sequenced by the BMS', leftState: 'Hand, firing on low fire', contactPhone: '+44 7700 900444',
};
const allChecks = { workComplete: true, guardsRefitted: true, personnelClear: true, testedSafe: true };
const isolation = {
  kind: 'isolation', reason: 'Seal change on heating pump 1', expiresAt: inHours(4), energySources: ['electrical'], lockNumber: 'PL-12',
  proof: { method: 'absence-of-voltage', instrument: 'Two-pole tester TV-2', reading: '0 V' },
  omittedSources: ['mechanical', 'hot-water', 'stored-pressure'].map((source) => ({ source, reason: 'Pump valved off both sides and drained down' })),
  points: [{ assetId: null as number | null, method: 'isolator-locked' }], contactPhone: '+44 7700 900555',
};

let visitId = 0;
let overrideId = 0;
let isolationId = 0;

describe('POST /api/sites/:id/visits', () => {
  it('starts a visit for an engineer with what they came for (201)', async () => {
    const res = await as('engineer').post(`/api/sites/${plant.site.id}/visits`, { purpose: 'Annual boiler service', jobReference: 'JOB-2231' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ site: { id: plant.site.id, name: 'Hazel Primary' }, person: { id: u.engineer.id }, purpose: 'Annual boiler service', jobReference: 'JOB-2231', inProgress: true, endedAt: null });
    visitId = res.body.id;
    expect((await Visit.findByPk(visitId))!.userId).toBe(u.engineer.id);
  });

  it('refuses a second visit in progress (409) and the database refuses one written past the service', async () => {
    const res = await as('engineer').post(`/api/sites/${plant.site.id}/visits`, { purpose: 'Another job' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('visit-in-progress');
    await expect(env.t.db.rootQuery(
      'INSERT INTO visits (organisation_id, site_id, user_id, purpose, started_at, created_at, updated_at) VALUES (?, ?, ?, ?, NOW(3), NOW(3), NOW(3))',
      [u.engineer.organisationId, plant.site.id, u.engineer.id, 'sneaked in'],
    )).rejects.toThrow(/Duplicate entry/);
  });

  it('refuses a viewer (403), another organisation’s site (404) and an empty purpose (422)', async () => {
    expect((await as('viewer').post(`/api/sites/${plant.site.id}/visits`, { purpose: 'Look round' })).status).toBe(403);
    expect((await as('engineer2').post(`/api/sites/${otherPlant.site.id}/visits`, { purpose: 'Look round' })).status).toBe(404);
    const bad = await as('engineer2').post(`/api/sites/${plant.site.id}/visits`, { purpose: ' ' });
    expect(bad.status).toBe(422);
    expect(bad.body.error.fields.purpose).toBeTruthy();
  });
});

describe('GET /api/plant-rooms/:id, GET /api/sites/:id and GET /api/me/tags', () => {
  it('shows live tags with holder, phone and reason to every role, and counts them per room', async () => {
    const o = await as('engineer').post(`/api/assets/${plant.boiler.id}/tags`, override);
    expect(o.status).toBe(201);
    overrideId = o.body.id;
    const i = await as('engineer').post(`/api/assets/${plant.pump.id}/tags`, { ...isolation, points: [{ assetId: plant.isolator.id, method: 'isolator-locked' }] });
    expect(i.status).toBe(201);
    isolationId = i.body.id;
    for (const who of ['viewer', 'engineer2', 'supervisor']) {
      const r = await as(who).get(`/api/plant-rooms/${room.id}`);
      expect(r.status).toBe(200);
      expect(r.body.liveTagCount).toBe(2);
      const tag = r.body.liveTags.find((x: { id: number }) => x.id === overrideId);
      expect(tag).toMatchObject({ kind: 'override', reason: override.reason, contactPhone: '+44 7700 900444', asset: { plantId: 'B-01' } });
      expect(tag.author?.name ?? tag.holder?.name).toBe('hazel engineer');
    }
    const site = await as('viewer').get(`/api/sites/${plant.site.id}`);
    expect(site.body.liveTags.map((x: { id: number }) => x.id).sort()).toEqual([overrideId, isolationId].sort());
    const list = await as('engineer').get(`/api/sites/${plant.site.id}/plant-rooms`);
    expect(list.body.items[0].liveTagCount).toBe(2);
    expect((await as('larch').get(`/api/plant-rooms/${room.id}`)).status).toBe(404);
  });

  it('lists only the signed-in person’s live tags, the one past its expiry first', async () => {
    await Tag.update({ expiresAt: new Date(Date.now() - 3600_000) }, { where: { id: overrideId } });
    const mine = await as('engineer').get('/api/me/tags');
    expect(mine.status).toBe(200);
    expect(mine.body.items.map((x: { id: number }) => x.id)).toEqual([overrideId, isolationId]);
    expect(mine.body.items[0].overdue).toBe(true);
    expect((await as('engineer2').get('/api/me/tags')).body.items).toEqual([]);
    await Tag.update({ expiresAt: new Date(inHours(8)) }, { where: { id: overrideId } });
  });
});

describe('POST /api/visits/:id/end', () => {
  it('refuses to end while live tags are undecided (422) and names every one of them', async () => {
    const res = await as('engineer').post(`/api/visits/${visitId}/end`, { decisions: [] });
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('undecided-tags');
    expect(Object.keys(res.body.error.fields).sort()).toEqual([`tags.${isolationId}`, `tags.${overrideId}`].sort());
    expect(res.body.error.message).toContain('B-01');
    expect(res.body.error.message).toContain('P-01');
    expect((await Visit.findByPk(visitId))!.endedAt).toBeNull();
  });

  it('refuses to leave an override without a note (422)', async () => {
    const res = await as('engineer').post(`/api/visits/${visitId}/end`, { decisions: [
      { tagId: overrideId, action: 'leave', note: '' },
      { tagId: isolationId, action: 'clear', note: 'Seal changed and pump tested', checks: allChecks },
    ] });
    expect(res.status).toBe(422);
    expect(res.body.error.fields[`tags.${overrideId}`]).toMatch(/note/);
    expect((await Tag.findByPk(isolationId))!.status).toBe('live');
  });

  it('refuses someone else’s visit (403) and another organisation’s (404)', async () => {
    expect((await as('engineer2').post(`/api/visits/${visitId}/end`, { decisions: [] })).status).toBe(403);
    expect((await as('supervisor').post(`/api/visits/${visitId}/end`, { decisions: [] })).status).toBe(403);
    expect((await as('larch').post(`/api/visits/${visitId}/end`, { decisions: [] })).status).toBe(404);
  });

  it('ends with every tag decided: the override left with its note, the isolation cleared; the summary is queued', async () => {
    const note = 'Left on hand until the flue engineer signs off; return to auto after';
    const res = await as('engineer').post(`/api/visits/${visitId}/end`, { note: 'Service done', decisions: [
      { tagId: overrideId, action: 'leave', note },
      { tagId: isolationId, action: 'clear', note: 'Seal changed and pump tested', checks: allChecks },
    ] });
    expect(res.status).toBe(200);
    expect(res.body.inProgress).toBe(false);
    expect(res.body.decisions).toEqual(expect.arrayContaining([expect.objectContaining({ tagId: overrideId, action: 'leave', note })]));
    expect(res.body.activity.tagEvents.map((e: { type: string }) => e.type)).toEqual(expect.arrayContaining(['raised', 'cleared', 'note-added']));
    expect(await VisitDecision.count({ where: { visitId } })).toBe(2);
    expect((await Tag.findByPk(isolationId))!.status).toBe('cleared');
    expect((await Tag.findByPk(overrideId))!.status).toBe('live');
    const notes = await TagEvent.findAll({ where: { tagId: overrideId, type: 'note-added' } });
    expect(notes.map((n) => n.data.text).join()).toContain(note);
    const mails = await outboxRows(env.t, "kind = 'visit-summary'");
    expect(mails.map((m) => m.to_email).sort()).toEqual(['admin@hazel.test', 'supervisor@hazel.test']);
    expect(JSON.stringify(mails[0].payload)).toContain(override.reason);
  });

  it('refuses a second end (409), and the database refuses to change or delete an ended visit', async () => {
    expect((await as('engineer').post(`/api/visits/${visitId}/end`, { decisions: [] })).status).toBe(409);
    await expect(env.t.db.rootQuery('UPDATE visits SET purpose = ? WHERE id = ?', ['rewritten', visitId])).rejects.toThrow(/ended visit/);
    await expect(env.t.db.rootQuery('DELETE FROM visits WHERE id = ?', [visitId])).rejects.toThrow(/never deleted/);
    await expect(env.t.db.rootQuery('DELETE FROM visit_decisions WHERE visit_id = ?', [visitId])).rejects.toThrow(/append-only/);
  });
});

describe('GET /api/visits/:id and GET /api/visits/:id/report.pdf', () => {
  it('lets the visitor and supervisors read it, refuses another engineer and a viewer (403) and another organisation (404)', async () => {
    expect((await as('engineer').get(`/api/visits/${visitId}`)).status).toBe(200);
    expect((await as('supervisor').get(`/api/visits/${visitId}`)).body.person.id).toBe(u.engineer.id);
    expect((await as('engineer2').get(`/api/visits/${visitId}`)).status).toBe(403);
    expect((await as('viewer').get(`/api/visits/${visitId}`)).status).toBe(403);
    expect((await as('larch').get(`/api/visits/${visitId}`)).status).toBe(404);
    expect((await as('larch').get(`/api/visits/${visitId}/report.pdf`)).status).toBe(404);
  });

  it('makes a one- or two-page PDF that carries the override’s reason and the note left with it', async () => {
    const res = await as('supervisor').get(`/api/visits/${visitId}/report.pdf`).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toContain('application/pdf');
    const file = path.join(fs.mkdtempSync(path.join(os.tmpdir(), 'visit-pdf-')), 'visit.pdf');
    fs.writeFileSync(file, res.body as Buffer);
    const info = execFileSync('pdfinfo', [file]).toString();
    expect(Number(/Pages:\s+(\d+)/.exec(info)![1])).toBeLessThanOrEqual(2);
    const text = execFileSync('pdftotext', ['-layout', file, '-']).toString().replace(/\s+/g, ' ');
    expect(text).toContain(override.reason);
    expect(text).toContain('Left on hand until the flue engineer signs off');
    expect(text).toContain('JOB-2231');
  });
});

describe('GET /api/sites/:id/visits', () => {
  it('gives supervisors every visit with filters, an engineer only their own, refuses viewers (403) and other organisations (404)', async () => {
    const v2 = await as('engineer2').post(`/api/sites/${plant.site.id}/visits`, { purpose: 'Pressurisation unit check' });
    expect(v2.status).toBe(201);
    const all = await as('supervisor').get(`/api/sites/${plant.site.id}/visits`);
    expect(all.body.total).toBe(2);
    const byPerson = await as('supervisor').get(`/api/sites/${plant.site.id}/visits?userId=${u.engineer.id}`);
    expect(byPerson.body.items.map((v: { id: number }) => v.id)).toEqual([visitId]);
    const open = await as('supervisor').get(`/api/sites/${plant.site.id}/visits?open=true`);
    expect(open.body.items.map((v: { id: number }) => v.id)).toEqual([v2.body.id]);
    const own = await as('engineer').get(`/api/sites/${plant.site.id}/visits?userId=${u.engineer2.id}`);
    expect(own.body.items.map((v: { id: number }) => v.id)).toEqual([visitId]);
    expect((await as('viewer').get(`/api/sites/${plant.site.id}/visits`)).status).toBe(403);
    expect((await as('larch').get(`/api/sites/${plant.site.id}/visits`)).status).toBe(404);
    expect((await as('supervisor').get(`/api/sites/${plant.site.id}/visits?from=yesterday`)).status).toBe(400);
  });
});

describe('GET /api/sites/:id/since-my-last-visit', () => {
  it('shows what others changed since the person last left the site', async () => {
    const raised = await as('engineer2').post(`/api/assets/${plant.valve.id}/tags`, { ...override, reason: 'Valve left cracked open for venting' });
    expect(raised.status).toBe(201);
    const res = await as('engineer').get(`/api/sites/${plant.site.id}/since-my-last-visit`);
    expect(res.status).toBe(200);
    expect(res.body.since).toBeTruthy();
    expect(res.body.raised.map((e: { reason: string }) => e.reason)).toEqual(['Valve left cracked open for venting']);
    const roomRes = await as('engineer').get(`/api/plant-rooms/${room.id}/since-my-last-visit`);
    expect(roomRes.body.raised).toHaveLength(1);
    const never = await as('supervisor').get(`/api/sites/${plant.site.id}/since-my-last-visit`);
    expect(never.body).toMatchObject({ since: null, raised: [] });
    expect((await as('larch').get(`/api/sites/${plant.site.id}/since-my-last-visit`)).status).toBe(404);
  });
});

describe('end-of-visit summary to the site’s client contact', () => {
  it('goes to the client contact only once the organisation turns it on', async () => {
    await plant.site.update({ clientContactEmail: 'estates@hazel-primary.test', clientContactName: 'Estates office' });
    const open = await as('engineer2').get('/api/me/visit');
    const held = await as('engineer2').get('/api/me/tags');
    const decisions = held.body.items.map((t: { id: number }) => ({ tagId: t.id, action: 'handover', toUserId: u.engineer.id, note: 'Valve left open for venting until tomorrow' }));
    await Organisation.update({ visitSummaryToClient: true }, { where: { id: u.engineer2.organisationId } });
    // OSHA 29 CFR 1910.147(f)(4): a hand-over names the on-coming person; without one the visit does not end.
    const unnamed = await as('engineer2').post(`/api/visits/${open.body.visit.id}/end`, { decisions: decisions.map((d: object) => ({ ...d, toUserId: null })) });
    expect(unnamed.status).toBe(422);
    expect(Object.values(unnamed.body.error.fields).join(' ')).toMatch(/name the colleague/);
    expect((await as('engineer2').get('/api/me/visit')).body.visit.id).toBe(open.body.visit.id);
    const res = await as('engineer2').post(`/api/visits/${open.body.visit.id}/end`, { decisions });
    expect(res.status).toBe(200);
    // OSHA 29 CFR 1910.147(f)(4): continuity at a change of personnel; the tag is offered to a named colleague.
    expect((await Tag.findByPk(held.body.items[0].id))!.offerToId).toBe(u.engineer.id);
    const toClient = await outboxRows(env.t, "kind = 'visit-summary' AND to_email = 'estates@hazel-primary.test'");
    expect(toClient).toHaveLength(1);
    expect(toClient[0].payload).toMatchObject({ forClient: true, recipientName: 'Estates office' });
    // The earlier visit, ended while the setting was off, sent the client nothing.
    expect(JSON.stringify(toClient[0].payload)).not.toContain('JOB-2231');
  });
});

describe('GET /api/me/recent-places', () => {
  it('lists the places the person opened, newest first, and drops a site a viewer may no longer see', async () => {
    const mine = await as('viewer').get('/api/me/recent-places');
    expect(mine.status).toBe(200);
    expect(mine.body.items.map((p: { type: string; id: number }) => `${p.type}:${p.id}`)).toEqual([`site:${plant.site.id}`, `plant-room:${room.id}`]);
    expect(mine.body.items[1]).toMatchObject({ name: 'Basement boiler room', siteName: 'Hazel Primary' });
    await UserSiteAccess.destroy({ where: { userId: u.viewer.id } });
    expect((await as('viewer').get('/api/me/recent-places')).body.items).toEqual([]);
    expect((await as('larch').get('/api/me/recent-places')).body.items).toEqual([]);
  });
});
