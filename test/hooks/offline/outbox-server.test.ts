import 'fake-indexeddb/auto';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import jwt from 'jsonwebtoken';
import sharp from 'sharp';
import request from 'supertest';
import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { Photo } from '@/server/models/photo.model';
import { Reading } from '@/server/models/reading.model';
import { TagEvent } from '@/server/models/tag-event.model';
import { Tag } from '@/server/models/tag.model';
import { TEST_JWT_SECRET, createOrganisation, setupTestApp, tokenFor, type OrgUsers, type TestApp } from '@/test/setup/app';
import { createSiteWithAssets } from '@/test/setup/register-fixtures';
import type { OutboxEntry } from '@/hooks/offline/outbox-types';

// The browser's outbox store (IndexedDB, here fake-indexeddb), as the web bundle picks it, instead of native's in-memory one.
vi.mock('@/hooks/offline/outbox-store', () => import('@/hooks/offline/outbox-store.web'));

type Client = typeof import('@/hooks/offline/send-or-queue') & typeof import('@/hooks/api/request');

let t: TestApp;
let u: OrgUsers;
let plant: Awaited<ReturnType<typeof createSiteWithAssets>>;
let server: http.Server;
let port = 0;
let client: Client;

/** The client modules as a page loads them: a fresh copy is a reload (the outbox then reads IndexedDB again). */
async function loadClient(): Promise<Client> {
  vi.resetModules();
  const [queue, req] = await Promise.all([import('@/hooks/offline/send-or-queue'), import('@/hooks/api/request')]);
  return { ...queue, ...req };
}

/** The server listening on its one port: the signal is there. */
function signal(): Promise<void> {
  return new Promise((resolve) => { server = http.createServer(t.app).listen(port, '127.0.0.1', () => { port = (server.address() as AddressInfo).port; resolve(); }); });
}

/** Nothing listening on that port any more: every request fails to connect, as with no signal. */
function noSignal(): Promise<void> {
  return new Promise((resolve) => { server.close(() => resolve()); server.closeAllConnections(); });
}

async function signInAs(who: keyof OrgUsers) {
  client.setRequestToken(await tokenFor(t.app, u[who]));
}

const as = (who: keyof OrgUsers) => ({
  post: async (path: string, body: object = {}) => request(t.app).post(`/api${path}`).set('Authorization', `Bearer ${await tokenFor(t.app, u[who])}`).send(body),
});

const inHours = (h: number) => new Date(Date.now() + h * 3600_000).toISOString();
const allChecks = { workComplete: true, guardsRefitted: true, personnelClear: true, testedSafe: true };
const raiseBody = () => ({
  kind: 'isolation', reason: 'Replace the pump 1 starter contactor', expiresAt: inHours(8), energySources: ['electrical'],
  points: [{ description: 'MCC-1 way 4 isolator', method: 'isolator-locked' }], lockNumber: 'PL-031',
});

/** Runs an action through the client as a form does; answers 'queued' when it went to the outbox. */
async function act<T>(run: () => Promise<T>): Promise<T | 'queued'> {
  try {
    return await run();
  } catch (err) {
    if (err instanceof client.QueuedError) return 'queued';
    throw err;
  }
}

const raise = (assetId: number) =>
  client.sendOrQueue<{ id: number }>(`/assets/${assetId}/tags`, { method: 'POST', body: raiseBody() }, { kind: 'raise-tag', summary: 'raise isolation tag', assetId });
const tagAction = (tagId: number, action: string, body: object, kind: OutboxEntry['kind']) =>
  client.sendOrQueue<{ id: number }>(`/tags/${tagId}/${action}`, { method: 'POST', body }, { kind, summary: `${action} (tag ${tagId})`, tagId });
const logReading = (assetId: number, flowTemperatureC: number) =>
  client.sendOrQueue(`/assets/${assetId}/readings`, { method: 'POST', body: { flowTemperatureC, returnTemperatureC: 62 } }, { kind: 'reading', summary: 'log readings', assetId });
async function addPhoto(assetId: number) {
  const jpeg = await sharp({ create: { width: 32, height: 24, channels: 3, background: '#406080' } }).jpeg().toBuffer();
  const form = new FormData();
  form.append('photo', new Blob([new Uint8Array(jpeg)], { type: 'image/jpeg' }), 'starter.jpg');
  return client.sendOrQueue(`/assets/${assetId}/photos`, { method: 'POST', body: form }, { kind: 'photo', summary: 'add a photo', assetId });
}

const eventTypes = async (tagId: number) => (await TagEvent.findAll({ where: { tagId }, order: [['id', 'ASC']] })).map((e) => e.type);
const mine = (who: keyof OrgUsers) => `${u[who].organisationId}:${u[who].id}`;

beforeAll(async () => {
  t = await setupTestApp();
  const org = await createOrganisation('alder');
  u = org.users;
  plant = await createSiteWithAssets(org.organisation.id, u.supervisor.id);
  await signal();
  // The web bundle calls the API on its own origin; here it is told where the server listens.
  process.env.EXPO_PUBLIC_API_URL = `http://127.0.0.1:${port}`;
});
afterAll(async () => {
  if (server.listening) await noSignal();
  await t.close();
});
beforeEach(async () => {
  client = await loadClient();
  if (!server.listening) await signal();
  // Each test starts with an empty outbox on the device.
  await client.outbox.load();
  for (const e of [...client.outbox.snapshot()]) await client.outbox.remove(e.key);
});

describe('the outbox against the real server', () => {
  it('sends actions taken with no signal in the order taken, once each, when the signal returns; a replayed queue changes nothing', async () => {
    await signInAs('engineer');
    // With a signal the action goes straight through.
    const tag = await raise(plant.isolator.id);
    expect(tag).not.toBe('queued');
    const tagId = (tag as { id: number }).id;
    const readingsBefore = await Reading.count({ where: { assetId: plant.boiler.id } });
    const photosBefore = await Photo.count({ where: { assetId: plant.pump.id } });

    await noSignal();
    expect(await act(() => tagAction(tagId, 'notes', { text: 'Contactor ordered; pump on standby' }, 'tag-note'))).toBe('queued');
    expect(await act(() => tagAction(tagId, 'prove', { method: 'absence-of-voltage', instrument: 'Two-pole tester TP-7', reading: '0 V' }, 'tag-prove'))).toBe('queued');
    expect(await act(() => logReading(plant.boiler.id, 71))).toBe('queued');
    expect(await act(() => addPhoto(plant.pump.id))).toBe('queued');
    expect(await act(() => tagAction(tagId, 'handover', { toUserId: u.engineer2.id, note: 'End of shift' }, 'tag-handover'))).toBe('queued');
    const queued = client.outbox.snapshot();
    expect(queued.map((e) => e.kind)).toEqual(['tag-note', 'tag-prove', 'reading', 'photo', 'tag-handover']);
    expect(new Set(queued.map((e) => e.key)).size).toBe(5);

    // Tried again with no signal: nothing reaches the server, nothing is dropped, each try is counted.
    // (Each action queued behind another also tried the queue at once, so a try may already be under way: wait for it.)
    await client.flushOutbox();
    expect(await client.flushOutbox()).toEqual({ sent: 0, refused: 0, waiting: 5 });
    expect(client.outbox.snapshot().map((e) => e.state)).toEqual(['waiting', 'waiting', 'waiting', 'waiting', 'waiting']);
    // The first is tried each time; the rest are never sent ahead of it.
    expect(client.outbox.snapshot()[0].attempts).toBeGreaterThanOrEqual(2);
    expect(client.outbox.snapshot().slice(1).map((e) => e.attempts)).toEqual([0, 0, 0, 0]);
    expect(await eventTypes(tagId)).toEqual(['raised']);

    await signal();
    expect(await client.flushOutbox()).toEqual({ sent: 5, refused: 0, waiting: 0 });
    expect(client.outbox.snapshot()).toEqual([]);
    // In the order taken: the note before the proof before the offer.
    expect(await eventTypes(tagId)).toEqual(['raised', 'note-added', 'proved', 'handover-offered']);
    expect(await Reading.count({ where: { assetId: plant.boiler.id } })).toBe(readingsBefore + 1);
    expect(await Photo.count({ where: { assetId: plant.pump.id } })).toBe(photosBefore + 1);
    const row = await Tag.findByPk(tagId);
    expect(row).toMatchObject({ holderId: u.engineer.id, offerToId: u.engineer2.id });

    // The same queue sent twice more (a restored backup, a second tab): the keys keep it one of each.
    for (let round = 0; round < 2; round += 1) {
      for (const e of queued) await client.outbox.add({ ...e });
      expect(await client.flushOutbox()).toEqual({ sent: 5, refused: 0, waiting: 0 });
    }
    expect(await eventTypes(tagId)).toEqual(['raised', 'note-added', 'proved', 'handover-offered']);
    expect(await Reading.count({ where: { assetId: plant.boiler.id } })).toBe(readingsBefore + 1);
    expect(await Photo.count({ where: { assetId: plant.pump.id } })).toBe(photosBefore + 1);

    // The colleague accepts the hand-over with no signal; it is sent under their own session.
    await signInAs('engineer2');
    await noSignal();
    expect(await act(() => tagAction(tagId, 'handover/accept', { lockNumber: 'PL-044' }, 'tag-handover'))).toBe('queued');
    await signal();
    expect(await client.flushOutbox()).toEqual({ sent: 1, refused: 0, waiting: 0 });
    expect(await Tag.findByPk(tagId)).toMatchObject({ holderId: u.engineer2.id, lockNumber: 'PL-044', offerToId: null });
    expect((await eventTypes(tagId)).at(-1)).toBe('handed-over');
  });

  it('keeps a refusal on its entry with the server’s message, sends the rest, and the queued clearance writes nothing', async () => {
    await signInAs('engineer');
    const tagId = ((await raise(plant.isolator.id)) as { id: number }).id;

    await noSignal();
    expect(await act(() => tagAction(tagId, 'clear', { reason: 'Valve repacked and tested tight', checks: allChecks }, 'tag-clear'))).toBe('queued');
    expect(await act(() => logReading(plant.boiler.id, 69))).toBe('queued');
    expect(await act(() => logReading(plant.pump.id, 55))).toBe('queued');
    // Meanwhile, on another device with a signal: the holder clears the tag, and a supervisor archives the pump.
    expect((await as('engineer').post(`/tags/${tagId}/clear`, { reason: 'Cleared from the office terminal', checks: allChecks })).status).toBe(200);
    expect((await as('supervisor').post(`/assets/${plant.pump.id}/archive`)).status).toBe(200);
    const boilerReadings = await Reading.count({ where: { assetId: plant.boiler.id } });

    await signal();
    expect(await client.flushOutbox()).toEqual({ sent: 1, refused: 2, waiting: 0 });
    const left = client.outbox.snapshot();
    expect(left.map((e) => [e.kind, e.state, e.refusal?.status, e.refusal?.code])).toEqual([
      ['tag-clear', 'refused', 409, 'already-cleared'],
      ['reading', 'refused', 409, 'conflict'],
    ]);
    expect(left[0].refusal?.message).toBe('This tag has already been cleared.');
    expect(left[1].refusal?.message).toBe('This item is archived; readings can no longer be logged on it.');
    expect(left[1].assetId).toBe(plant.pump.id);
    expect(await Reading.count({ where: { assetId: plant.boiler.id } })).toBe(boilerReadings + 1);
    // The queued clearance wrote nothing: the one clearance on record is the office terminal's.
    expect(await eventTypes(tagId)).toEqual(['raised', 'cleared']);
    const cleared = await TagEvent.findOne({ where: { tagId, type: 'cleared' } });
    expect((cleared!.data as { reason: string }).reason).toBe('Cleared from the office terminal');

    // A refused entry is kept until the person removes it: sending again does not drop it.
    expect(await client.flushOutbox()).toEqual({ sent: 0, refused: 0, waiting: 0 });
    expect(client.outbox.snapshot()).toHaveLength(2);
  });

  it('keeps the queue through a reload and sends it from the reloaded page', async () => {
    await signInAs('engineer');
    const readings = await Reading.count({ where: { assetId: plant.boiler.id } });
    await noSignal();
    expect(await act(() => logReading(plant.boiler.id, 74))).toBe('queued');
    expect(await act(() => logReading(plant.boiler.id, 75))).toBe('queued');
    const keys = client.outbox.snapshot().map((e) => e.key);

    // The page is reloaded: new modules, a new outbox object, the same IndexedDB database.
    client = await loadClient();
    await client.outbox.load();
    expect(client.outbox.snapshot().map((e) => e.key)).toEqual(keys);
    await signInAs('engineer');
    await signal();
    expect(await client.flushOutbox()).toEqual({ sent: 2, refused: 0, waiting: 0 });
    const rows = await Reading.findAll({ where: { assetId: plant.boiler.id }, order: [['id', 'ASC']] });
    expect(rows).toHaveLength(readings + 2);
    // Stored in the order taken, each under its own key.
    expect(rows.slice(-2).map((r) => r.idempotencyKey)).toEqual(keys);
  });

  it('keeps the queue when the session expires with no signal, and sends it after the next sign-in', async () => {
    await signInAs('engineer');
    const tagId = ((await raise(plant.isolator.id)) as { id: number }).id;
    await noSignal();
    expect(await act(() => tagAction(tagId, 'notes', { text: 'Flue inspected; burner off' }, 'tag-note'))).toBe('queued');
    expect(await act(() => tagAction(tagId, 'extend', { expiresAt: inHours(20), reason: 'Burner parts arrive tomorrow morning' }, 'tag-extend'))).toBe('queued');

    // The session runs out while the engineer is still below ground: a real token, past its expiry.
    const row = (await t.db.sequelize.query('SELECT token_version AS ver FROM users WHERE id = ?', { replacements: [u.engineer.id], plain: true })) as { ver: number };
    const expired = jwt.sign({ sub: String(u.engineer.id), org: u.engineer.organisationId, ver: row.ver, exp: Math.floor(Date.now() / 1000) - 60 }, TEST_JWT_SECRET, { algorithm: 'HS256' });
    client.setRequestToken(expired);
    let signedOut = 0;
    client.setUnauthenticatedHandler(() => { signedOut += 1; });
    // (The try the second action started with no signal ends first.)
    await client.flushOutbox();
    await signal();
    expect(await client.flushOutbox()).toEqual({ sent: 0, refused: 0, waiting: 2 });
    expect(signedOut).toBe(1);
    expect(client.outbox.snapshot().map((e) => [e.kind, e.state, e.owner])).toEqual([['tag-note', 'waiting', mine('engineer')], ['tag-extend', 'waiting', mine('engineer')]]);
    expect(await eventTypes(tagId)).toEqual(['raised']);

    // Signed out: nothing is sent. Someone else signing in on the device does not send it either.
    client.setRequestToken(null);
    expect(await client.flushOutbox()).toEqual({ sent: 0, refused: 0, waiting: 0 });
    await signInAs('engineer2');
    expect(await client.flushOutbox()).toEqual({ sent: 0, refused: 0, waiting: 0 });
    expect(client.outbox.snapshot()).toHaveLength(2);

    // The engineer signs in again: the queue goes, in order.
    await signInAs('engineer');
    expect(await client.flushOutbox()).toEqual({ sent: 2, refused: 0, waiting: 0 });
    expect(await eventTypes(tagId)).toEqual(['raised', 'note-added', 'extended']);
  });

  it('stores a queued reading with the time it was taken, and a form submitted twice while waiting as one action', async () => {
    await signInAs('engineer');
    const tagId = ((await raise(plant.isolator.id)) as { id: number }).id;
    await noSignal();
    const queuedAt = Date.now();
    expect(await act(() => logReading(plant.boiler.id, 66))).toBe('queued');
    // A second tap on the still-open form: the same action, not a second one.
    expect(await act(() => logReading(plant.boiler.id, 66))).toBe('queued');
    expect(await act(() => tagAction(tagId, 'notes', { text: 'Panel door left locked' }, 'tag-note'))).toBe('queued');
    expect(await act(() => tagAction(tagId, 'notes', { text: 'Panel door left locked' }, 'tag-note'))).toBe('queued');
    expect(client.outbox.snapshot().map((e) => e.kind)).toEqual(['reading', 'tag-note']);
    await client.flushOutbox();

    // The signal returns well after the reading was taken.
    await new Promise((r) => setTimeout(r, 1500));
    await signal();
    const sentAt = Date.now();
    expect(await client.flushOutbox()).toEqual({ sent: 2, refused: 0, waiting: 0 });
    const [row] = await Reading.findAll({ where: { assetId: plant.boiler.id, createdBy: u.engineer.id }, order: [['id', 'DESC']], limit: 1 });
    expect(row.takenAt.getTime()).toBeGreaterThanOrEqual(queuedAt - 1000);
    expect(row.takenAt.getTime()).toBeLessThan(sentAt - 1000);
    expect(await eventTypes(tagId)).toEqual(['raised', 'note-added']);
  });

  it('holds a new action behind waiting ones, so the server never sees them out of order', async () => {
    await signInAs('engineer');
    const tagId = ((await raise(plant.isolator.id)) as { id: number }).id;
    await noSignal();
    expect(await act(() => tagAction(tagId, 'notes', { text: 'First: pump stopped at the panel' }, 'tag-note'))).toBe('queued');
    await signal();
    // The signal is back but the first note has not gone yet: the second waits behind it instead of overtaking.
    expect(await act(() => tagAction(tagId, 'notes', { text: 'Second: starter cover off' }, 'tag-note'))).toBe('queued');
    await vi.waitFor(() => expect(client.outbox.snapshot()).toEqual([]));
    const notes = await TagEvent.findAll({ where: { tagId, type: 'note-added' }, order: [['id', 'ASC']] });
    expect(notes.map((n) => (n.data as { text: string }).text)).toEqual(['First: pump stopped at the panel', 'Second: starter cover off']);
  });
});
