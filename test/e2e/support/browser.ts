import fs from 'node:fs';
import path from 'node:path';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { expect } from 'vitest';
import { CHROMIUM, CHROMIUM_ARGS } from '@/test/e2e/support/chromium';

export { CHROMIUM, CHROMIUM_ARGS };

export const PHONE = { width: 390, height: 844 };
export const DESKTOP = { width: 1440, height: 900 };
export const SCREENSHOTS = path.resolve('test-results/screenshots');

export interface Session {
  browser: Browser;
  close: () => Promise<void>;
}

/**
 * Launches Debian's Chromium; extra flags e.g. for a fake camera. Playwright gives every launch a fresh,
 * empty profile folder of its own (it refuses an explicit --user-data-dir) and passes --headless itself.
 */
export async function launch(extraArgs: string[] = []): Promise<Session> {
  const args = CHROMIUM_ARGS.filter((a) => a !== '--headless');
  const browser = await chromium.launch({ executablePath: CHROMIUM, headless: true, args: [...args, ...extraArgs] });
  return { browser, close: () => browser.close() };
}

export interface WatchedPage {
  page: Page;
  context: BrowserContext;
  /** Console errors and page errors seen so far. */
  errors: string[];
  /** Requests to anywhere but 127.0.0.1. */
  offsite: string[];
}

export async function openPage(browser: Browser, viewport: { width: number; height: number }): Promise<WatchedPage> {
  const context = await browser.newContext({ viewport, deviceScaleFactor: 1 });
  const page = await context.newPage();
  const errors: string[] = [];
  const offsite: string[] = [];
  page.on('console', (msg) => { if (msg.type() === 'error') errors.push(msg.text()); });
  page.on('pageerror', (err) => errors.push(err.message));
  page.on('request', (req) => {
    const url = new URL(req.url());
    if (!['data:', 'blob:'].includes(url.protocol) && url.hostname !== '127.0.0.1') offsite.push(req.url());
  });
  return { page, context, errors, offsite };
}

export async function screenshot(page: Page, name: string) {
  fs.mkdirSync(SCREENSHOTS, { recursive: true });
  const file = path.join(SCREENSHOTS, `${name}.png`);
  await page.screenshot({ path: file, fullPage: false });
  return file;
}

export async function signIn(page: Page, baseUrl: string, email: string, password = 'isoledger-demo') {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByTestId('sign-in-email').fill(email);
  await page.getByTestId('sign-in-password').fill(password);
  await page.getByTestId('sign-in-submit').click();
}

/** A fresh page signed in as `email`, waiting until the home screen for `role` shows. */
export async function openSignedIn(browser: Browser, baseUrl: string, viewport: { width: number; height: number }, email: string, role: string): Promise<WatchedPage> {
  const watched = await openPage(browser, viewport);
  await signIn(watched.page, baseUrl, email);
  await watched.page.getByTestId(`home-${role}`).waitFor();
  return watched;
}

/** The visible text of the element with this test id. */
export const testIdText = (page: Page, testId: string) => page.getByTestId(testId).innerText();

/** No console errors but the expected ones (the browser logs a refused request as an error), and nothing fetched off site. */
export function expectClean(w: WatchedPage, expected: RegExp[] = []) {
  expect(w.errors.filter((e) => !expected.some((re) => re.test(e)))).toEqual([]);
  expect(w.offsite).toEqual([]);
}
