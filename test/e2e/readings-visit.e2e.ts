import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Asset } from '@/shared/types/register';
import { api, apiToken } from '@/test/e2e/support/api';
import { DESKTOP, PHONE, launch, openPage, screenshot, signIn, type Session } from '@/test/e2e/support/browser';

const baseUrl = inject('baseUrl');
let session: Session;
const demo: Record<string, Asset> = {};

beforeAll(async () => {
  session = await launch();
  const token = await apiToken(baseUrl, 'engineer@example.test');
  // The demo school's main boiler house: a gas boiler, a calorifier and a pressurisation unit.
  for (const plantId of ['B-01', 'CAL-01', 'PU-01']) {
    const found = await api<{ items: Asset[] }>(baseUrl, token, `/assets?q=${plantId}&pageSize=20`);
    demo[plantId] = found.items.find((a) => a.plantId === plantId && a.siteName.startsWith('Quillmere'))!;
  }
});
afterAll(() => session.close());

describe('a whole visit’s readings', () => {
  it('an engineer logs a calorifier at 30 °C on a phone and sees the Legionella flag with its advice', async () => {
    const { page, errors, offsite, context } = await openPage(session.browser, PHONE);
    await signIn(page, baseUrl, 'engineer@example.test');
    await page.getByTestId('home-engineer').waitFor();
    await page.goto(`${baseUrl}/assets/${demo['CAL-01'].id}`);
    await page.getByTestId('readings-log').click();
    // A calorifier offers its hot-water readings, not a boiler's gas pressures.
    await page.getByTestId('reading-section-hot-water').waitFor();
    expect(await page.getByTestId('reading-section-gas').count()).toBe(0);
    await page.getByTestId('reading-storeTemperatureC').fill('30');
    const live = page.getByTestId('live-checks');
    await live.getByTestId('check-store-temperature-flag').waitFor();
    // HSE ACOP L8 / HSG274 Part 2: store at 60 °C or more; 30 °C is in the 20–45 °C growth range
    const flag = await live.getByTestId('check-store-temperature-flag').innerText();
    expect(flag).toMatch(/Danger: Legionella risk: the stored hot water is at 30 °C/);
    expect(flag).toMatch(/Raise the temperature/);
    expect(flag).toMatch(/tell the duty holder/);
    expect(flag).toMatch(/water-safety plan/);
    await expect(live.getByTestId('check-store-temperature-limit').innerText()).resolves.toMatch(/60 °C or more/);
    await expect(live.getByTestId('check-store-temperature-source').innerText()).resolves.toMatch(/HSE ACOP L8/);
    await live.getByTestId('check-store-temperature').scrollIntoViewIfNeeded();
    await screenshot(page, 'readings-calorifier-live-phone');
    await page.getByTestId('readings-save').click();
    await page.getByTestId('readings-form').waitFor({ state: 'detached' });
    // The stored set carries the server's own flag, worded the same.
    const saved = page.locator('[data-testid^="reading-set-"]').first();
    await expect(saved.innerText()).resolves.toMatch(/Legionella risk: the stored hot water is at 30 °C/);
    await saved.scrollIntoViewIfNeeded();
    await screenshot(page, 'readings-calorifier-saved-phone');
    expect(errors).toEqual([]);
    expect(offsite).toEqual([]);
    await context.close();
  });

  it('a boiler’s gas and flue-gas readings show each check with its formula, limit and source on a desktop', async () => {
    const { page, errors, offsite, context } = await openPage(session.browser, DESKTOP);
    await signIn(page, baseUrl, 'engineer@example.test');
    await page.getByTestId('home-engineer').waitFor();
    await page.goto(`${baseUrl}/assets/${demo['B-01'].id}`);
    await page.getByTestId('readings-log').click();
    await page.getByTestId('reading-gasWorkingPressurePa').fill('19.5');
    await page.getByTestId('reading-flueO2Percent').fill('4');
    await page.getByTestId('reading-flueCoPpm').fill('900');
    const live = page.getByTestId('live-checks');
    // from memory: BS 7967 action level, CO/CO₂ ratio above 0.008 on a boiler
    await expect(live.getByTestId('check-flue-co-co2-ratio-flag').innerText()).resolves.toMatch(/Danger: .*not to be left in use/);
    await expect(live.getByTestId('check-flue-co-co2-ratio').innerText()).resolves.toMatch(/ratio = \(CO ppm \/ 10 000\) \/ CO₂ %/);
    await expect(live.getByTestId('check-gas-working-pressure-source').innerText()).resolves.toMatch(/EN 437/);
    await live.getByTestId('check-flue-co-co2-ratio').scrollIntoViewIfNeeded();
    await screenshot(page, 'readings-boiler-flue-desktop');
    await page.getByTestId('readings-cancel').click();
    await page.getByTestId('trend-group-gas-pressure').click();
    await page.getByTestId('trend-chart').scrollIntoViewIfNeeded();
    await screenshot(page, 'readings-boiler-trend-desktop');
    expect(errors).toEqual([]);
    expect(offsite).toEqual([]);
    await context.close();
  });

  it('the site lists each item’s latest flags, and the pressurisation unit shows its checks', async () => {
    const { page, errors, context } = await openPage(session.browser, PHONE);
    await signIn(page, baseUrl, 'supervisor@example.test');
    await page.getByTestId('home-supervisor').waitFor();
    await page.goto(`${baseUrl}/sites/${demo['CAL-01'].siteId}`);
    const list = page.getByTestId('site-reading-flags');
    await list.getByTestId('site-flag-CAL-01').waitFor();
    await expect(list.getByTestId('site-flag-PU-01').innerText()).resolves.toMatch(/Inhibitor below the kit’s range/);
    await list.scrollIntoViewIfNeeded();
    await screenshot(page, 'readings-site-flags-phone');
    await page.goto(`${baseUrl}/assets/${demo['PU-01'].id}`);
    await page.locator('[data-testid^="reading-working-"]').first().click();
    await page.getByTestId('check-unit-cut-out').first().scrollIntoViewIfNeeded();
    await screenshot(page, 'readings-unit-checks-phone');
    expect(errors).toEqual([]);
    await context.close();
  });
});
