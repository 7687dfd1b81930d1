import type { Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it, onTestFailed } from 'vitest';
import { DESKTOP, PHONE, expectClean, launch, openPage, screenshot, signIn, type Session } from '@/test/e2e/support/browser';
import { api, apiToken } from '@/test/e2e/support/api';
import type { Asset } from '@/shared/types/register';
import type { ReadingList } from '@/shared/types/readings';
import type { Tag } from '@/shared/types/tags';
import type { ListResponse } from '@/shared/types/user';

let session: Session;
const baseUrl = inject('baseUrl');
let token: string;
let item: Asset;

const tagsOn = async (assetId: number) => (await api<ListResponse<Tag>>(baseUrl, token, `/tags?assetId=${assetId}&pageSize=200`)).items;
const readingsOn = async (assetId: number) => (await api<ReadingList>(baseUrl, token, `/assets/${assetId}/readings?pageSize=200`)).items;
const notesOn = async (tagId: number) => (await api<Tag>(baseUrl, token, `/tags/${tagId}`)).events!.filter((e) => e.type === 'note-added');
// The console errors Chromium logs for requests made with no signal; nothing else may appear.
const NO_SIGNAL_NOISE = [/ERR_INTERNET_DISCONNECTED/, /Failed to load resource/, /Failed to fetch/];
const inHours = (h: number) => new Date(Date.now() + h * 3600_000).toISOString();

/** An override raised by the engineer with a signal (through the API), as if earlier in the visit. */
const raiseOverride = (assetId: number, reason: string) =>
  api<Tag>(baseUrl, token, `/assets/${assetId}/tags`, {
    method: 'POST',
    body: { kind: 'override', reason, expiresAt: inHours(6), normalState: 'Auto, on the BMS schedule', leftState: 'Hand, running' },
  });

/** Waits until the page's react-query cache has been written to IndexedDB (about a second after the last answer). */
const cacheWritten = (page: Page) => page.waitForTimeout(2500);

/** The outbox's entries as IndexedDB holds them (idb-keyval: database isoledger-outbox, store entries). */
function readOutbox(page: Page): Promise<{ key: string; value: Record<string, unknown> }[]> {
  return page.evaluate(
    () =>
      new Promise((resolve, reject) => {
        const open = indexedDB.open('isoledger-outbox');
        open.onerror = () => reject(open.error);
        open.onsuccess = () => {
          const store = open.result.transaction('entries').objectStore('entries');
          const keys = store.getAllKeys();
          const values = store.getAll();
          values.onsuccess = () => { resolve(values.result.map((value, i) => ({ key: String(keys.result[i]), value }))); open.result.close(); };
        };
      }),
  );
}

/** A phone signed in as the engineer, with a screenshot of what it showed if a later step fails. */
async function engineerPhone() {
  const watched = await openPage(session.browser, PHONE);
  onTestFailed(async () => { await screenshot(watched.page, `offline-failed-${Date.now()}`); });
  await signIn(watched.page, baseUrl, 'engineer2@example.test');
  await watched.page.getByTestId('home-engineer').waitFor();
  return watched;
}

/** Opens a screen with a signal, then waits until the service worker controls the page and the cache is on the device. */
async function openWithSignal(page: Page, path: string, shown: (page: Page) => Locator) {
  await page.goto(`${baseUrl}${path}`);
  await shown(page).waitFor();
  await page.evaluate(async () => { await navigator.serviceWorker.ready; });
  await page.waitForFunction(() => !!navigator.serviceWorker.controller);
  await cacheWritten(page);
}

function putOutboxEntry(page: Page, entry: { key: string; value: Record<string, unknown> }) {
  return page.evaluate(
    (e) =>
      new Promise<void>((resolve, reject) => {
        const open = indexedDB.open('isoledger-outbox');
        open.onsuccess = () => {
          const tx = open.result.transaction('entries', 'readwrite');
          tx.objectStore('entries').put(e.value, e.key);
          tx.oncomplete = () => { open.result.close(); resolve(); };
          tx.onerror = () => reject(tx.error);
        };
      }),
    entry,
  );
}

beforeAll(async () => {
  session = await launch();
  token = await apiToken(baseUrl, 'engineer2@example.test');
  const pumps = await api<ListResponse<Asset>>(baseUrl, token, '/assets?q=P-&pageSize=50');
  for (const a of pumps.items.filter((x) => x.type === 'pump').reverse()) {
    if (a.plantRoomId && (await tagsOn(a.id)).length === 0) { item = a; break; }
  }
  expect(item).toBeDefined();
});
afterAll(() => session.close());

describe('in a plant room with no signal, on a phone', () => {
  it('opens a record seen earlier, queues a tag, a reading and a note, and sends each once when the signal returns', async () => {
    const earlier = await raiseOverride(item.id, 'Pump held on hand for the commissioning engineer');
    const readingsBefore = (await readingsOn(item.id)).length;
    const phone = await engineerPhone();
    const { page, context } = phone;
    // The tag raised earlier is opened with a signal too, so a note can be added to it below ground.
    await openWithSignal(page, `/tags/${earlier.id}`, (p) => p.getByTestId('tag-header'));
    // The label opens the record with a signal; the service worker takes control and precaches the app meanwhile.
    await openWithSignal(page, `/l/${item.labelCode}`, (p) => p.getByTestId('asset-readings'));
    await page.getByTestId('asset-state-banner').waitFor();

    await context.setOffline(true);
    await page.reload();
    await page.getByTestId('asset-state-banner').waitFor();
    await expect(page.getByText(`${item.plantId} · ${item.name}`).first().isVisible()).resolves.toBe(true);
    await screenshot(page, 'offline-record-no-signal-phone');

    // Raise an override with no signal: it waits on the device and the form does not claim it was raised.
    await page.getByTestId('raise-override').click();
    await page.getByTestId('raise-tag-form').waitFor();
    await page.getByTestId('raise-reason').fill('Pump held on hand while the controls are replaced');
    await page.getByTestId('raise-next').click();
    await page.getByTestId('raise-normal-state').fill('Auto, on the BMS schedule');
    await page.getByTestId('raise-left-state').fill('Hand, running');
    await page.getByTestId('raise-next').click();
    await page.getByTestId('raise-contact-phone').fill('+44 7700 900104');
    await page.getByTestId('raise-next').click();
    await page.getByTestId('raise-submit').click();
    await page.getByText(/waiting to send/i).first().waitFor();
    await page.getByTestId('pending-banner').waitFor();
    await expect(page.getByTestId('pending-banner').innerText()).resolves.toMatch(/1 waiting to send/);
    await screenshot(page, 'offline-raise-waiting-phone');
    expect(await tagsOn(item.id)).toHaveLength(1);

    // A reading set on the item's record, with no signal: the form says it is not sent, and it waits.
    await page.goto(`${baseUrl}/assets/${item.id}`);
    await page.getByTestId('asset-readings').waitFor();
    await page.getByTestId('readings-log').click();
    await page.getByTestId('reading-flowTemperatureC').fill('74');
    await page.getByTestId('reading-returnTemperatureC').fill('63');
    await page.getByTestId('readings-save').click();
    await page.getByTestId('readings-form').getByText(/waiting to send/i).waitFor();
    // Queued is not a refusal: the form's banner says no signal, not "Not sent".
    await expect(page.getByTestId('readings-form').getByText('No signal', { exact: true }).count()).resolves.toBe(1);
    await expect(page.getByTestId('readings-form').getByText('Not sent', { exact: true }).count()).resolves.toBe(0);
    // A second tap on the still-open form is the same action, not a second set.
    await page.getByTestId('readings-save').click();
    await page.getByTestId('readings-cancel').click();

    // A note on the tag raised earlier.
    await page.goto(`${baseUrl}/tags/${earlier.id}`);
    await page.getByTestId('tag-action-note').click();
    await page.getByTestId('note-text').fill('Controls contractor on site until 15:00');
    await page.getByTestId('note-submit').click();
    await page.getByTestId('action-refusal').getByText(/waiting to send/i).waitFor();
    await expect(page.getByTestId('pending-entry').innerText()).resolves.toMatch(/Waiting to send: add a note/);

    // The item's record lists all three as waiting, its tag and the item still as the server last said.
    await page.goto(`${baseUrl}/assets/${item.id}`);
    await page.getByTestId('asset-state-banner').waitFor();
    await expect(page.getByTestId('pending-entry').count()).resolves.toBe(3);
    const onItem = await page.getByTestId('pending-entry').allInnerTexts();
    expect(onItem.map((t) => t.split('\n').find((line) => line.includes('to send')))).toEqual([
      expect.stringMatching(/^Waiting to send: raise override tag/),
      'Waiting to send: log readings',
      expect.stringMatching(/^Waiting to send: add a note \(tag \d+\)/),
    ]);
    await page.getByTestId('pending-entry').first().scrollIntoViewIfNeeded();
    await screenshot(page, 'offline-item-waiting-phone');
    const queued = await readOutbox(page);
    expect(queued.map((e) => e.value.kind).sort()).toEqual(['raise-tag', 'reading', 'tag-note']);
    expect(await tagsOn(item.id)).toHaveLength(1);
    expect(await readingsOn(item.id)).toHaveLength(readingsBefore);
    expect(await notesOn(earlier.id)).toHaveLength(0);

    // Pending actions list shows them too, and the queue survives a reload with no signal.
    await page.reload();
    await page.getByTestId('pending-banner').click();
    await page.getByTestId('pending-list').waitFor();
    await expect(page.getByTestId('pending-banner').innerText()).resolves.toMatch(/3 waiting to send/);
    await expect(page.getByTestId('pending-entry').first().innerText()).resolves.toMatch(/Waiting to send: raise override tag/);
    await expect(page.getByTestId('pending-entry').count()).resolves.toBe(3);
    await screenshot(page, 'offline-pending-list-phone');

    // Signal back: each sent once, and the entries leave the list.
    await context.setOffline(false);
    await page.getByText('Nothing is waiting on this device.').waitFor({ timeout: 30_000 });
    const oneOfEach = async () => {
      const tags = await tagsOn(item.id);
      expect(tags).toHaveLength(2);
      expect(tags.filter((t) => t.id !== earlier.id).map((t) => [t.kind, t.status])).toEqual([['override', 'live']]);
      const readings = await readingsOn(item.id);
      expect(readings).toHaveLength(readingsBefore + 1);
      expect(readings[0].values.flowTemperatureC).toBe(74);
      expect(await notesOn(earlier.id)).toHaveLength(1);
    };
    await oneOfEach();
    expect(await readOutbox(page)).toEqual([]);
    await screenshot(page, 'offline-pending-sent-phone');

    // The same queue replayed twice (a restored backup, a second tab): the idempotency keys keep it one of each.
    for (let round = 0; round < 2; round += 1) {
      for (const entry of queued) await putOutboxEntry(page, entry);
      await page.reload();
      await page.getByTestId('pending-list').or(page.getByText('Nothing is waiting on this device.')).first().waitFor();
      await page.getByText('Nothing is waiting on this device.').waitFor({ timeout: 30_000 });
      expect(await readOutbox(page)).toEqual([]);
      await oneOfEach();
    }
    // Chromium reports the failed requests of the offline reload as console errors; nothing else may appear.
    expectClean(phone, NO_SIGNAL_NOISE);
    await context.close();
  });

  it('opens a label of a plant room visited earlier, keeps a clearance waiting, and shows the server’s refusal on it', async () => {
    expect(item.plantRoomId).not.toBeNull();
    const room = (await api<ListResponse<Asset>>(baseUrl, token, `/assets?plantRoomId=${item.plantRoomId}&pageSize=200`)).items;
    const other = room.find((a) => a.id !== item.id && !a.archived)!;
    expect(other).toBeDefined();
    const tag = await raiseOverride(item.id, 'Pump left running on hand for the flushing contractor');

    const phone = await engineerPhone();
    const { page, context } = phone;
    // With a signal: the plant room (its list of items) and the tag. The other item's own record is never opened.
    await openWithSignal(page, `/plant-rooms/${item.plantRoomId}`, (p) => p.getByText(other.plantId, { exact: false }).first());
    await openWithSignal(page, `/tags/${tag.id}`, (p) => p.getByTestId('tag-header'));

    // No signal: the label on the other item is scanned (its address opened) and its record opens from the room's list.
    await context.setOffline(true);
    await page.goto(`${baseUrl}/l/${other.labelCode}`);
    await page.waitForURL(`**/assets/${other.id}`);
    await page.getByText(`${other.plantId} · ${other.name}`).first().waitFor();
    await screenshot(page, 'offline-label-no-signal-phone');

    // A clearance with no signal: the form says it is not sent, the tag stays live, and the entry says the clearance waits.
    await page.goto(`${baseUrl}/tags/${tag.id}`);
    await page.getByTestId('tag-action-clear').click();
    await page.getByTestId('clear-reason').fill('Flushing finished, pump back on auto');
    await page.getByTestId('clear-submit').click();
    await page.getByTestId('action-refusal').getByText(/waiting to send/i).waitFor();
    await expect(page.getByText('Tag cleared. The item’s state is updated.').count()).resolves.toBe(0);
    await expect(page.getByTestId('tag-status-word').innerText()).resolves.toBe('Live');
    await expect(page.getByTestId('pending-entry').innerText()).resolves.toMatch(/Clearance waiting to send: clear the tag[\s\S]*stays live on record until the server confirms/);
    await screenshot(page, 'offline-clearance-waiting-phone');

    // Meanwhile the engineer clears it from the office terminal, with a signal.
    await api(baseUrl, token, `/tags/${tag.id}/clear`, { method: 'POST', body: { reason: 'Cleared from the office terminal after flushing' } });

    // Signal back: the queued clearance is refused, and the refusal stays on the entry in the server's words.
    await context.setOffline(false);
    await page.goto(`${baseUrl}/pending`);
    await page.getByText('Refused by the server').waitFor({ timeout: 30_000 });
    await expect(page.getByTestId('pending-entry').innerText()).resolves.toMatch(/This tag has already been cleared\./);
    await expect(page.getByTestId('pending-banner').innerText()).resolves.toMatch(/1 refused/);
    await screenshot(page, 'offline-pending-refused-phone');
    await page.setViewportSize(DESKTOP);
    await screenshot(page, 'offline-pending-refused-desktop');
    await page.setViewportSize(PHONE);
    // The one clearance on record is the terminal's; the refused one wrote nothing.
    const events = (await api<Tag>(baseUrl, token, `/tags/${tag.id}`)).events!.filter((e) => e.type === 'cleared');
    expect(events).toHaveLength(1);
    expect(events[0].data).toMatchObject({ reason: 'Cleared from the office terminal after flushing' });

    // Still there after a reload; removed only when the person says so.
    await page.reload();
    await page.getByText('This tag has already been cleared.').waitFor();
    await page.getByTestId('pending-remove').click();
    await page.getByText('Nothing is waiting on this device.').waitFor();
    expect(await readOutbox(page)).toEqual([]);
    expectClean(phone, NO_SIGNAL_NOISE);
    await context.close();
  });

  it('keeps the queue when the session ends with no signal, and sends it after the next sign-in', async () => {
    const tag = await raiseOverride(item.id, 'Pump on hand while the pressure switch is swapped');
    const phone = await engineerPhone();
    const { page, context } = phone;
    await openWithSignal(page, `/tags/${tag.id}`, (p) => p.getByTestId('tag-header'));

    await context.setOffline(true);
    await page.reload();
    await page.getByTestId('tag-action-note').click();
    await page.getByTestId('note-text').fill('Pressure switch fitted; waiting for the controls engineer');
    await page.getByTestId('note-submit').click();
    await page.getByTestId('action-refusal').getByText(/waiting to send/i).waitFor();

    // Meanwhile the session ends (signed out everywhere from the office), so the signal comes back to a dead session.
    expect((await fetch(`${baseUrl}/api/auth/logout`, { method: 'POST', headers: { Authorization: `Bearer ${token}` } })).status).toBe(204);
    token = await apiToken(baseUrl, 'engineer2@example.test');
    await context.setOffline(false);
    await page.waitForURL('**/sign-in**', { timeout: 30_000 });
    const kept = await readOutbox(page);
    expect(kept.map((e) => [e.value.kind, e.value.state])).toEqual([['tag-note', 'waiting']]);
    expect(await notesOn(tag.id)).toHaveLength(0);

    // Signed in again: the note goes, once.
    await signIn(page, baseUrl, 'engineer2@example.test');
    await page.getByTestId('home-engineer').waitFor();
    await expect.poll(() => notesOn(tag.id), { timeout: 30_000 }).toHaveLength(1);
    await expect.poll(() => readOutbox(page)).toEqual([]);
    expectClean(phone, NO_SIGNAL_NOISE);
    await context.close();
  });
});
