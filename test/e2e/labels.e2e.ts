import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import QRCode from 'qrcode';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { labelUrl } from '@/shared/rules/label-code';
import type { Asset } from '@/shared/types/register';
import { api, apiToken } from '@/test/e2e/support/api';
import { PHONE, launch, openPage, screenshot, type Session } from '@/test/e2e/support/browser';
import { writeY4mFromPng } from '@/test/e2e/support/y4m';

const baseUrl = inject('baseUrl');
let token: string;
let pump: Asset;
let tmp: string;

beforeAll(async () => {
  token = await apiToken(baseUrl, 'engineer@example.test');
  const list = await api<{ items: Asset[] }>(baseUrl, token, '/assets?type=pump&pageSize=5');
  pump = list.items[0];
  tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'isoledger-scan-'));
});
afterAll(() => fs.rmSync(tmp, { recursive: true, force: true }));

async function signInHere(page: import('playwright-core').Page, email: string) {
  await page.getByTestId('sign-in-email').fill(email);
  await page.getByTestId('sign-in-password').fill('isoledger-demo');
  await page.getByTestId('sign-in-submit').click();
}

describe('opening an item from its label URL', () => {
  let session: Session;
  beforeAll(async () => { session = await launch(); });
  afterAll(() => session.close());

  it('signed out → sign in → the item’s record', async () => {
    const { page, errors, offsite, context } = await openPage(session.browser, PHONE);
    await page.goto(labelUrl(baseUrl, pump.labelCode));
    await page.getByTestId('sign-in-email').waitFor();
    await signInHere(page, 'engineer@example.test');
    await page.waitForURL(`${baseUrl}/assets/${pump.id}`);
    await page.getByText(pump.name).first().waitFor();
    await screenshot(page, 'labels-item-from-label-phone');
    expect(errors).toEqual([]);
    expect(offsite).toEqual([]);
    await context.close();
  });

  it('shows "No such label" for a retired, an unknown and a malformed code', async () => {
    const valve = (await api<{ items: Asset[] }>(baseUrl, token, '/assets?type=valve&pageSize=1')).items[0];
    // A supervisor replaces the label (engineers may replace labels only on items they may edit).
    const supervisor = await apiToken(baseUrl, 'supervisor@example.test');
    const { retiredCode } = await api<{ retiredCode: string }>(baseUrl, supervisor, `/assets/${valve.id}/label/replace`, { method: 'POST' });
    const { page, context } = await openPage(session.browser, PHONE);
    await page.goto(`${baseUrl}/sign-in`);
    await signInHere(page, 'engineer@example.test');
    await page.getByTestId('home-engineer').waitFor();
    for (const code of [retiredCode, 'AAAAAAAAAAAA', 'not-a-label']) {
      await page.goto(`${baseUrl}/l/${code}`);
      await page.getByText('No such label', { exact: true }).waitFor();
    }
    await screenshot(page, 'labels-no-such-label-phone');
    await context.close();
  });
});

describe('Scan tab with a camera', () => {
  it('reads a printed label from the camera and opens the item, loading the reader only from our own server', async () => {
    // A fake camera showing the item's label: a Y4M video made from the QR image.
    const png = await QRCode.toBuffer(labelUrl(baseUrl, pump.labelCode), { errorCorrectionLevel: 'M', margin: 4, width: 320 });
    const video = path.join(tmp, 'label.y4m');
    writeY4mFromPng(png, video, { width: 640, height: 480, frames: 10, fps: 10 });
    const session = await launch(['--use-fake-ui-for-media-stream', '--use-fake-device-for-media-stream', `--use-file-for-fake-video-capture=${video}`]);
    try {
      const { page, errors, offsite, context } = await openPage(session.browser, PHONE);
      const wasm: { status: number; type: string | undefined }[] = [];
      page.on('response', (r) => { if (r.url().endsWith('.wasm')) wasm.push({ status: r.status(), type: r.headers()['content-type'] }); });
      await page.goto(`${baseUrl}/sign-in?next=%2Fscan`);
      await signInHere(page, 'engineer@example.test');
      await page.getByTestId('scan-camera').or(page.getByTestId('scan-allow-camera')).first().waitFor();
      if (await page.getByTestId('scan-allow-camera').isVisible()) await page.getByTestId('scan-allow-camera').click();
      await page.getByTestId('scan-camera').waitFor();
      const started = Date.now();
      await screenshot(page, 'labels-scan-camera-phone');
      await page.waitForURL(`${baseUrl}/assets/${pump.id}`, { timeout: 30_000 });
      await page.getByText(pump.name).first().waitFor();
      console.log(`scan: camera shown → item record in ${Date.now() - started} ms`);
      await screenshot(page, 'labels-scanned-item-phone');
      expect(wasm).toEqual([{ status: 200, type: 'application/wasm' }]);
      expect(offsite).toEqual([]);
      expect(errors).toEqual([]);
      await context.close();
    } finally {
      await session.close();
    }
  });

  it('opens an item from a typed label code', async () => {
    const session = await launch();
    try {
      const { page, context } = await openPage(session.browser, PHONE);
      await page.goto(`${baseUrl}/sign-in?next=%2Fscan`);
      await signInHere(page, 'engineer@example.test');
      await page.getByTestId('scan-code-input').fill(pump.labelCode.toLowerCase());
      await page.getByTestId('scan-code-submit').click();
      await page.waitForURL(`${baseUrl}/assets/${pump.id}`);
      await context.close();
    } finally {
      await session.close();
    }
  });
});
