import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { api, apiToken } from '@/test/e2e/support/api';
import { DESKTOP, PHONE, expectClean, launch, openSignedIn, screenshot, testIdText, type Session } from '@/test/e2e/support/browser';
import type { ListResponse } from '@/shared/types/api';
import type { ProcedureReviewList } from '@/shared/types/procedure-reviews';
import type { Site } from '@/shared/types/register';

let session: Session;
const baseUrl = inject('baseUrl');

beforeAll(async () => { session = await launch(); });
afterAll(() => session.close());

describe('recording a site’s procedure review', () => {
  it('shows the overdue review on the site, refuses an incomplete one beside its fields, and records a signed-off review', async () => {
    const token = await apiToken(baseUrl, 'supervisor@example.test');
    const sites = await api<ListResponse<Site>>(baseUrl, token, '/sites?pageSize=50');
    // The demo's Castellan site was last reviewed 14 months ago.
    const site = sites.items.find((s) => s.name.startsWith('Castellan'))!;
    expect(site).toBeDefined();

    const sup = await openSignedIn(session.browser, baseUrl, DESKTOP, 'supervisor@example.test', 'supervisor');
    await sup.page.goto(`${baseUrl}/sites/${site.id}`);
    const card = sup.page.getByTestId('procedure-reviews');
    // OSHA 29 CFR 1910.147(c)(6)(i): the procedure is reviewed at least annually; 14 months is past due.
    await card.getByText('Review overdue').first().waitFor();
    await expect(card.innerText()).resolves.toMatch(/Last reviewed \d{1,2} \w{3} \d{4}; it was due by/);
    await expect(card.innerText()).resolves.toContain('Try-start not done after locking off pump P-02A');

    await sup.page.getByTestId('review-start').click();
    await sup.page.getByTestId('review-submit').click();
    await sup.page.getByTestId('review-observed-error').waitFor();
    await expect(testIdText(sup.page, 'review-observed-error')).resolves.toContain('Name at least one engineer');
    await expect(card.innerText()).resolves.toContain('Sign off the review.');

    // The reviewer is not among the people offered for observation (1910.147(c)(6)(i)(A)).
    const me = await api<{ id: number }>(baseUrl, token, '/me');
    await expect(sup.page.getByTestId(`review-observed-${me.id}`).count()).resolves.toBe(0);
    const colleagues = await api<{ id: number; name: string }[]>(baseUrl, token, '/tag-colleagues');
    const engineer = colleagues.find((c) => c.id !== me.id && /Kofi/.test(c.name))!;
    await sup.page.getByTestId(`review-observed-${engineer.id}`).click();
    await sup.page.getByTestId('review-deviations').fill('Prove-dead test skipped on the first of two panels');
    await sup.page.getByTestId('review-corrections').fill('Re-briefed on site; test added to the panel isolation card');
    await sup.page.getByTestId('review-signed-off').click();
    await screenshot(sup.page, 'procedure-review-form-1440');
    await sup.page.getByTestId('review-submit').click();
    await sup.page.getByTestId('review-status').waitFor();
    await expect(testIdText(sup.page, 'review-status')).resolves.toMatch(/^Last reviewed \d{1,2} \w{3} \d{4}\. Next due by \d{1,2} \w{3} \d{4}\.$/);
    await expect(card.innerText()).resolves.toContain('Prove-dead test skipped on the first of two panels');
    await screenshot(sup.page, 'procedure-review-recorded-1440');

    const list = await api<ProcedureReviewList>(baseUrl, token, `/sites/${site.id}/procedure-reviews`);
    expect(list.overdue).toBe(false);
    expect(list.items[0]).toMatchObject({ reviewer: { id: me.id }, observed: [{ id: engineer.id }], deviations: 'Prove-dead test skipped on the first of two panels' });
    expectClean(sup);

    // An engineer reads the reviews but cannot record one.
    const eng = await openSignedIn(session.browser, baseUrl, PHONE, 'engineer@example.test', 'engineer');
    await eng.page.goto(`${baseUrl}/sites/${site.id}`);
    await eng.page.getByTestId('review-status').waitFor();
    await expect(eng.page.getByTestId('review-start').count()).resolves.toBe(0);
    await eng.page.getByTestId('procedure-reviews').scrollIntoViewIfNeeded();
    await screenshot(eng.page, 'procedure-review-engineer-phone');
    expectClean(eng);
  });
});
