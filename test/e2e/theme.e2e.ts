import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { darkColors, lightColors } from '@/components/theme/palette';
import { DESKTOP, PHONE, launch, openPage, screenshot, signIn, type Session } from '@/test/e2e/support/browser';
import { api, apiToken } from '@/test/e2e/support/api';
import type { Asset } from '@/shared/types/register';
import type { ListResponse } from '@/shared/types/user';

let session: Session;
const baseUrl = inject('baseUrl');
let item: Asset;

const rgb = (hex: string) => `rgb(${[1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16)).join(', ')})`;
const pageBackground = (page: Page) => page.evaluate(() => getComputedStyle(document.body).backgroundColor);

beforeAll(async () => {
  session = await launch();
  const token = await apiToken(baseUrl, 'engineer@example.test');
  item = (await api<ListResponse<Asset>>(baseUrl, token, '/assets?type=pump&pageSize=1')).items[0];
});
afterAll(() => session.close());

describe('light and dark schemes', () => {
  for (const [name, viewport] of [['phone', PHONE], ['desktop', DESKTOP]] as const) {
    it(`follows the device's dark setting on a ${name}, and Settings can switch it by hand`, async () => {
      const { page, context, errors, offsite } = await openPage(session.browser, viewport);
      await page.emulateMedia({ colorScheme: 'dark' });
      await signIn(page, baseUrl, 'engineer@example.test');
      await page.getByTestId('home-engineer').waitFor();
      // The page's colours come from the dark palette because the device asks for it.
      expect(await pageBackground(page)).toBe(rgb(darkColors.paper));
      await screenshot(page, `theme-home-dark-${name}`);
      await page.goto(`${baseUrl}/assets/${item.id}`);
      await page.getByTestId('asset-state-banner').waitFor();
      await screenshot(page, `theme-item-dark-${name}`);

      // Buttons stay at least 48 px high for gloved hands.
      const box = await page.getByTestId('raise-isolation').boundingBox();
      // common practice, no published source: 48 px targets for gloves (WCAG 2.1 SC 2.5.5 asks 44)
      expect(box?.height ?? 0).toBeGreaterThanOrEqual(48);

      // A choice in Settings wins over the device's setting and is kept after a reload.
      await page.goto(`${baseUrl}/settings`);
      await page.getByTestId('scheme-light').click();
      expect(await pageBackground(page)).toBe(rgb(lightColors.paper));
      await page.reload();
      await page.getByTestId('scheme-light').waitFor();
      expect(await pageBackground(page)).toBe(rgb(lightColors.paper));
      await screenshot(page, `theme-settings-light-chosen-${name}`);
      await page.getByTestId('scheme-dark').click();
      await page.emulateMedia({ colorScheme: 'light' });
      expect(await pageBackground(page)).toBe(rgb(darkColors.paper));
      await screenshot(page, `theme-settings-dark-chosen-${name}`);
      await page.getByTestId('scheme-system').click();
      expect(await pageBackground(page)).toBe(rgb(lightColors.paper));
      await page.goto(`${baseUrl}/assets/${item.id}`);
      await page.getByTestId('asset-state-banner').waitFor();
      await screenshot(page, `theme-item-light-${name}`);
      expect(errors).toEqual([]);
      expect(offsite).toEqual([]);
      await context.close();
    });
  }
});
