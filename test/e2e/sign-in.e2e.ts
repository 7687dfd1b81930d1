import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { DESKTOP, PHONE, launch, openPage, screenshot, signIn, type Session } from '@/test/e2e/support/browser';

let session: Session;
const baseUrl = inject('baseUrl');

beforeAll(async () => { session = await launch(); });
afterAll(() => session.close());

describe('sign-in, home and sign-out', () => {
  it('the demo engineer signs in on a phone, sees the engineer home and signs out', async () => {
    const { page, errors, offsite, context } = await openPage(session.browser, PHONE);
    await page.goto(baseUrl);
    await page.getByTestId('sign-in-email').waitFor();
    await screenshot(page, 'foundation-sign-in-phone');
    await signIn(page, baseUrl, 'engineer@example.test');
    await page.getByTestId('home-engineer').waitFor();
    await expect(page.getByText('Hello, Kofi').isVisible()).resolves.toBe(true);
    // Phone layout: bottom tabs, no Board tab for an engineer.
    await expect(page.getByRole('navigation').getByRole('link', { name: 'Scan' }).isVisible()).resolves.toBe(true);
    await expect(page.getByRole('navigation').getByRole('link', { name: 'Board' }).count()).resolves.toBe(0);
    await screenshot(page, 'foundation-home-engineer-phone');
    await page.getByRole('navigation').getByRole('link', { name: 'Settings' }).click();
    await page.getByTestId('sign-out').click();
    await page.getByTestId('sign-in-email').waitFor();
    // The old token is gone from the browser and the app shows the sign-in screen again on reload.
    await page.reload();
    await page.getByTestId('sign-in-email').waitFor();
    expect(errors).toEqual([]);
    expect(offsite).toEqual([]);
    await context.close();
  });

  it('the demo supervisor signs in on a desktop, sees side navigation and the supervision home, and signs out', async () => {
    const { page, errors, offsite, context } = await openPage(session.browser, DESKTOP);
    await signIn(page, baseUrl, 'supervisor@example.test');
    await page.getByTestId('home-supervisor').waitFor();
    await expect(page.getByRole('navigation').isVisible()).resolves.toBe(true);
    await expect(page.getByRole('link', { name: 'Board' }).first().isVisible()).resolves.toBe(true);
    await screenshot(page, 'foundation-home-supervisor-desktop');
    await page.getByRole('link', { name: 'Settings' }).click();
    await page.getByTestId('sign-out').click();
    await page.getByTestId('sign-in-email').waitFor();
    expect(errors).toEqual([]);
    expect(offsite).toEqual([]);
    await context.close();
  });

  it('shows a readable error for a wrong password and stays on the sign-in screen', async () => {
    const { page, context } = await openPage(session.browser, PHONE);
    await signIn(page, baseUrl, 'engineer@example.test', 'wrong-password');
    await page.getByText('That e-mail and password do not match an active account.').waitFor();
    await screenshot(page, 'foundation-sign-in-error-phone');
    await context.close();
  });

  it('a client-side route loads on a hard refresh and returns there after sign-in', async () => {
    const { page, context } = await openPage(session.browser, PHONE);
    await page.goto(`${baseUrl}/settings`);
    await page.getByTestId('sign-in-email').waitFor();
    expect(new URL(page.url()).searchParams.get('next')).toBe('/settings');
    await page.getByTestId('sign-in-email').fill('viewer@example.test');
    await page.getByTestId('sign-in-password').fill('isoledger-demo');
    await page.getByTestId('sign-in-submit').click();
    await page.getByTestId('sign-out').waitFor();
    await page.reload();
    await page.getByTestId('sign-out').waitFor();
    await context.close();
  });
});
