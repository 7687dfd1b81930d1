import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { PHONE, launch, openPage, screenshot, signIn, type Session } from '@/test/e2e/support/browser';
import { api, apiToken } from '@/test/e2e/support/api';
import type { Asset } from '@/shared/types/register';
import type { Tag } from '@/shared/types/tags';
import type { ListResponse } from '@/shared/types/user';

let session: Session;
const baseUrl = inject('baseUrl');
let token: string;
let item: Asset;

const tagsOn = async (assetId: number) => (await api<ListResponse<Tag>>(baseUrl, token, `/tags?assetId=${assetId}&pageSize=200`)).items;

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
    if ((await tagsOn(a.id)).length === 0) { item = a; break; }
  }
  expect(item).toBeDefined();
});
afterAll(() => session.close());

describe('in a plant room with no signal, on a phone', () => {
  it('opens a record seen earlier, queues a tag, and sends it once when the signal returns', async () => {
    const { page, context, errors, offsite } = await openPage(session.browser, PHONE);
    await signIn(page, baseUrl, 'engineer2@example.test');
    await page.getByTestId('home-engineer').waitFor();
    // The label opens the record with a signal; the service worker takes control and precaches the app meanwhile.
    await page.goto(`${baseUrl}/l/${item.labelCode}`);
    await page.getByTestId('asset-state-banner').waitFor();
    await page.evaluate(async () => { await navigator.serviceWorker.ready; });
    await page.waitForFunction(() => !!navigator.serviceWorker.controller);
    // The cache is written to IndexedDB about a second after the last answer.
    await page.waitForTimeout(2500);

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
    expect(await tagsOn(item.id)).toHaveLength(0);
    const queued = await readOutbox(page);
    expect(queued).toHaveLength(1);
    expect(queued[0].value.kind).toBe('raise-tag');

    // Pending actions list shows it too, and the queue survives a reload with no signal.
    await page.reload();
    await page.getByTestId('pending-banner').click();
    await page.getByTestId('pending-list').waitFor();
    await expect(page.getByTestId('pending-entry').innerText()).resolves.toMatch(/Waiting to send: raise override tag/);
    await screenshot(page, 'offline-pending-list-phone');

    // Signal back: sent once, and the entry leaves the list.
    await context.setOffline(false);
    await page.getByText('Nothing is waiting on this device.').waitFor({ timeout: 30_000 });
    const tags = await tagsOn(item.id);
    expect(tags).toHaveLength(1);
    expect(tags[0].kind).toBe('override');
    expect(tags[0].status).toBe('live');
    expect(await readOutbox(page)).toEqual([]);
    await screenshot(page, 'offline-pending-sent-phone');

    // The same queue replayed twice (a restored backup, a second tab): the idempotency key keeps it one tag.
    for (let round = 0; round < 2; round += 1) {
      await putOutboxEntry(page, queued[0]);
      await page.reload();
      await page.getByTestId('pending-list').or(page.getByText('Nothing is waiting on this device.')).first().waitFor();
      await page.getByText('Nothing is waiting on this device.').waitFor({ timeout: 30_000 });
      expect(await readOutbox(page)).toEqual([]);
      expect(await tagsOn(item.id)).toHaveLength(1);
    }
    // Chromium reports the failed requests of the offline reload as console errors; nothing else may appear.
    expect(errors.filter((e) => !/ERR_INTERNET_DISCONNECTED|Failed to load resource|Failed to fetch/.test(e))).toEqual([]);
    expect(offsite).toEqual([]);
    await context.close();
  });
});
