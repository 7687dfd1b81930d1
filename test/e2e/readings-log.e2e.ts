import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Asset } from '@/shared/types/register';
import { api, apiToken } from '@/test/e2e/support/api';
import { DESKTOP, PHONE, launch, openPage, screenshot, signIn, type Session } from '@/test/e2e/support/browser';

const baseUrl = inject('baseUrl');
let session: Session;
let pump: Asset;

beforeAll(async () => {
  session = await launch();
  const token = await apiToken(baseUrl, 'engineer@example.test');
  // The demo's duty pump on the school's primary circuit carries a history of weekly readings.
  const found = await api<{ items: Asset[] }>(baseUrl, token, '/assets?q=P-01A&pageSize=10');
  pump = found.items.find((a) => a.plantId === 'P-01A' && a.siteName.startsWith('Quillmere'))!;
});
afterAll(() => session.close());

describe('logging readings on an item', () => {
  it('an engineer logs a set on a phone, sees the checks while typing and after saving, and the trend', async () => {
    const { page, errors, offsite, context } = await openPage(session.browser, PHONE);
    await signIn(page, baseUrl, 'engineer@example.test');
    await page.getByTestId('home-engineer').waitFor();
    await page.goto(`${baseUrl}/assets/${pump.id}`);
    await page.getByTestId('trend-chart').waitFor();
    await page.getByTestId('readings-log').click();
    await page.getByTestId('reading-flowTemperatureC').fill('81');
    await page.getByTestId('reading-returnTemperatureC').fill('67');
    await page.getByTestId('reading-flowSetpointC').fill('85');
    await page.getByTestId('reading-pumpInletPressureGaugePa').fill('1');
    await page.getByTestId('reading-pumpOutletPressureGaugePa').fill('2');
    // Checks appear while typing, computed on the phone with the shared arithmetic.
    await page.getByTestId('live-checks').waitFor();
    // common practice, no published source: about 1 bar in and 2 bar out of a pump is roughly 10 m of head.
    await page.getByTestId('live-checks').getByText('Pump differential head').waitFor();
    const checks = await page.getByTestId('live-checks').innerText();
    expect(checks).toMatch(/Pump differential head\s+10\.\d m/);
    // common practice, no published source: a boiler with an 85 °C setpoint reading 81 °C is still climbing, not faulty.
    expect(checks).toMatch(/Note: Flow is a little below setpoint/);
    expect(checks).not.toMatch(/Danger|Caution/);
    await screenshot(page, 'readings-log-form-phone');
    await page.getByTestId('readings-save').click();
    await page.getByTestId('readings-form').waitFor({ state: 'detached' });
    await screenshot(page, 'readings-log-saved-phone');
    expect(errors).toEqual([]);
    expect(offsite).toEqual([]);
    await context.close();
  });

  it('shows the trend wide on a desktop', async () => {
    const { page, context } = await openPage(session.browser, DESKTOP);
    await signIn(page, baseUrl, 'supervisor@example.test');
    await page.getByTestId('home-supervisor').waitFor();
    await page.goto(`${baseUrl}/assets/${pump.id}`);
    await page.getByTestId('trend-chart').scrollIntoViewIfNeeded();
    await screenshot(page, 'readings-trend-desktop');
    await context.close();
  });
});
