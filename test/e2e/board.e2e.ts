import fs from 'node:fs';
import { parse } from 'csv-parse/sync';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { api, apiToken } from '@/test/e2e/support/api';
import { DESKTOP, PHONE, launch, openPage, screenshot, signIn, type Session, type WatchedPage } from '@/test/e2e/support/browser';
import { BOARD_REFRESH_SECONDS } from '@/shared/rules/board';
import type { BoardResponse } from '@/shared/types/board';
import type { Asset } from '@/shared/types/register';
import type { Tag } from '@/shared/types/tags';
import type { ListResponse } from '@/shared/types/api';

let session: Session;
const baseUrl = inject('baseUrl');
// Words no demo tag uses, so the row and the search find this tag alone.
const REASON = 'Flow header bypass opened for the flushing crew, zone 7Q';

async function signedIn(viewport: { width: number; height: number }, email: string, role: string): Promise<WatchedPage> {
  const watched = await openPage(session.browser, viewport);
  await signIn(watched.page, baseUrl, email);
  await watched.page.getByTestId(`home-${role}`).waitFor();
  return watched;
}

function clean(w: WatchedPage) {
  expect(w.errors).toEqual([]);
  expect(w.offsite).toEqual([]);
}

const openBoard = async (page: Page) => {
  await page.goto(`${baseUrl}/board`);
  await page.getByTestId('board-counts').waitFor();
};

beforeAll(async () => { session = await launch(); });
afterAll(() => session.close());

describe('supervisor board', () => {
  it('shows a tag an engineer raises while the board is open, without a reload, and exports it', async () => {
    // The refresh the board promises must fit inside the 35 s this test waits.
    expect(BOARD_REFRESH_SECONDS).toBeLessThanOrEqual(30);
    const sup = await signedIn(DESKTOP, 'supervisor@example.test', 'supervisor');
    await openBoard(sup.page);
    await sup.page.getByTestId('board-table').waitFor();
    await expect(sup.page.getByTestId('board-updated').innerText()).resolves.toMatch(/^Updated \d{2}:\d{2}:\d{2}$/);
    const before = Number(await sup.page.getByTestId('count-total-value').innerText());
    // A mark on the window that a reload would wipe.
    await sup.page.evaluate(() => { (window as unknown as { boardMark: number }).boardMark = 1; });
    await screenshot(sup.page, 'board-1440');

    const eng = await signedIn(PHONE, 'engineer@example.test', 'engineer');
    // Engineers have no board in their navigation.
    await expect(eng.page.getByRole('link', { name: 'Board' }).count()).resolves.toBe(0);
    const token = await apiToken(baseUrl, 'engineer@example.test');
    const items = await api<ListResponse<Asset>>(baseUrl, token, '/assets?pageSize=50');
    const asset = items.items.find((a) => !a.archived);
    expect(asset).toBeDefined();
    const tag = await api<Tag>(baseUrl, token, `/assets/${asset!.id}/tags`, {
      method: 'POST',
      body: {
        kind: 'override', reason: REASON, expiresAt: new Date(Date.now() + 3 * 3600_000).toISOString(), contactPhone: '+44 7700 900103',
        normalState: 'Bypass valve shut', leftState: 'Bypass valve open, tagged at the valve',
      },
    });
    await eng.context.close();

    // The board polls: the row appears with no reload.
    const row = sup.page.getByText(REASON);
    await row.waitFor({ timeout: 35_000 });
    expect(await sup.page.evaluate(() => (window as unknown as { boardMark?: number }).boardMark)).toBe(1);
    await expect(sup.page.getByTestId(`board-state-${tag.id}`).innerText()).resolves.toMatch(/Due within 24 h$/);
    await expect(sup.page.getByTestId(`board-call-${tag.id}`).innerText()).resolves.toContain('+44 7700 900103');
    expect(Number(await sup.page.getByTestId('count-total-value').innerText())).toBe(before + 1);

    // The search narrows the table to this tag; the export holds the same view.
    await sup.page.getByTestId('board-search').fill('zone 7Q');
    await sup.page.getByText('1–1 of 1').waitFor();
    await screenshot(sup.page, 'board-search-1440');
    const download = sup.page.waitForEvent('download');
    await sup.page.getByTestId('board-export').click();
    const file = await download;
    expect(file.suggestedFilename()).toMatch(/^isoledger-board-\d{4}-\d{2}-\d{2}\.csv$/);
    const records = parse(fs.readFileSync((await file.path())!, 'utf8'), { columns: true, bom: true }) as Record<string, string>[];
    expect(records).toHaveLength(1);
    // A cell that starts like a formula (here the "+") is guarded with a quote: server/lib/register-csv.ts guardCell.
    expect(records[0]).toMatchObject({ 'Plant ID': asset!.plantId, Reason: REASON, Holder: 'Kofi Marchetti', State: 'Due within 24 h', 'Contact phone': "'+44 7700 900103" });

    // Paper: the side navigation and buttons go, the table stays, on a page the width of A4 landscape at 96 px per inch.
    await sup.page.setViewportSize({ width: 1123, height: 794 });
    await sup.page.emulateMedia({ media: 'print' });
    await expect(sup.page.getByTestId('board-export').isVisible()).resolves.toBe(false);
    await expect(sup.page.getByRole('navigation').isVisible()).resolves.toBe(false);
    await expect(sup.page.getByText(REASON).isVisible()).resolves.toBe(true);
    await screenshot(sup.page, 'board-print-1440');
    const table = (await sup.page.getByRole('table').boundingBox())!;
    expect(table.x + table.width).toBeLessThanOrEqual(1123);
    await sup.page.emulateMedia({ media: 'screen' });
    await sup.page.setViewportSize(DESKTOP);

    // A row opens the tag, where the supervisor's own actions are.
    await sup.page.getByText(REASON).click();
    await sup.page.waitForURL(`${baseUrl}/tags/${tag.id}`);
    clean(sup);
    await sup.context.close();
  });

  it('fits a phone as cards, filters by a tapped site, and marks overdue tags with a word', async () => {
    const w = await signedIn(PHONE, 'supervisor@example.test', 'supervisor');
    await openBoard(w.page);
    await w.page.getByTestId('board-cards').waitFor();
    await screenshot(w.page, 'board-390');
    const token = await apiToken(baseUrl, 'supervisor@example.test');
    const all = await api<BoardResponse>(baseUrl, token, '/board?pageSize=200');
    const site = all.counts.perSite[0];
    await w.page.getByTestId(`count-site-${site.siteId}`).click();
    await w.page.getByText(`${site.total} ${site.total === 1 ? 'tag' : 'tags'}`, { exact: true }).waitFor();
    const overdue = all.items.find((r) => r.state === 'overdue' && r.siteId === site.siteId);
    if (overdue) await w.page.getByTestId(`board-row-${overdue.id}`).getByText('Past expiry', { exact: true }).waitFor();
    await screenshot(w.page, 'board-site-390');
    // Nothing wider than the phone's screen.
    expect(await w.page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(PHONE.width);
    clean(w);
    await w.context.close();
  });

  it('a viewer sees the board read only; an engineer opening it is told it is not for their role', async () => {
    const viewer = await signedIn(DESKTOP, 'viewer@example.test', 'viewer');
    await openBoard(viewer.page);
    await viewer.page.getByText(/read only/).first().waitFor();
    clean(viewer);
    await viewer.context.close();
    const eng = await signedIn(PHONE, 'engineer@example.test', 'engineer');
    await eng.page.goto(`${baseUrl}/board`);
    await eng.page.getByText('The board is for supervisors, admins and viewers.', { exact: false }).waitFor();
    await eng.context.close();
  });
});

describe('password screens', () => {
  it('answers a reset request the same for a known and an unknown address', async () => {
    const answers: string[] = [];
    for (const email of ['engineer@example.test', 'nobody-here@example.test']) {
      const w = await openPage(session.browser, PHONE);
      await w.page.goto(`${baseUrl}/sign-in`);
      await w.page.getByText('Forgot password?').click();
      await w.page.getByTestId('forgot-password-email').fill(email);
      await w.page.getByTestId('forgot-password-submit').click();
      answers.push(await w.page.getByTestId('forgot-password-answer').innerText());
      if (answers.length === 1) await screenshot(w.page, 'settings-forgot-password-390');
      clean(w);
      await w.context.close();
    }
    expect(answers[0]).toMatch(/If that address belongs to an active account/);
    expect(answers[1]).toBe(answers[0]);
  });

  it('says clearly when a set-password link is not valid, and checks the two passwords match first', async () => {
    const w = await openPage(session.browser, PHONE);
    await w.page.goto(`${baseUrl}/set-password?token=not-a-real-link-code-0000`);
    await w.page.getByTestId('set-password-password').fill('a long enough passphrase');
    await w.page.getByTestId('set-password-confirm').fill('a different passphrase');
    await w.page.getByTestId('set-password-submit').click();
    await w.page.getByText('The two passwords are not the same.').waitFor();
    await w.page.getByTestId('set-password-confirm').fill('a long enough passphrase');
    await w.page.getByTestId('set-password-submit').click();
    await expect(w.page.getByTestId('set-password-error').innerText()).resolves.toMatch(/expired or has already been used/);
    await w.page.getByText('Ask for a new link').waitFor();
    await screenshot(w.page, 'settings-set-password-invalid-390');
    // The failed attempt answers 400 in the console; nothing else may go wrong.
    expect(w.errors.filter((e) => !/status of 400/.test(e))).toEqual([]);
    await w.context.close();
  });
});

describe('team administration and settings', () => {
  it('an admin invites a viewer, gives them a site, and sees both in the audit log', async () => {
    const w = await signedIn(DESKTOP, 'admin@example.test', 'admin');
    await w.page.getByRole('link', { name: 'Team' }).first().click();
    await w.page.getByTestId('audit-log').waitFor();
    await w.page.getByTestId('invite-name').fill('Wren Ashdown');
    await w.page.getByTestId('invite-email').fill('wren.ashdown@example.test');
    await w.page.getByTestId('invite-role').click();
    await w.page.getByRole('radio', { name: 'Viewer (read only)' }).click();
    await w.page.getByTestId('invite-submit').click();
    await w.page.getByText('An invitation is on its way to wren.ashdown@example.test.').waitFor();
    const token = await apiToken(baseUrl, 'admin@example.test');
    const people = await api<ListResponse<{ id: number; email: string }>>(baseUrl, token, '/users?pageSize=200');
    const wren = people.items.find((p) => p.email === 'wren.ashdown@example.test')!;
    await expect(w.page.getByTestId(`member-status-${wren.id}`).innerText()).resolves.toMatch(/Invitation pending$/);
    await w.page.getByTestId(`member-sites-edit-${wren.id}`).click();
    const chip = w.page.getByTestId('site-access-dialog').getByRole('checkbox').first();
    const siteName = await chip.getAttribute('aria-label');
    await chip.click();
    await w.page.getByTestId('site-access-save').click();
    await w.page.getByText(`Sites: ${siteName}`, { exact: true }).waitFor();
    await w.page.getByTestId('site-access-dialog').waitFor({ state: 'detached' });
    await w.page.getByText('Site access changed').first().waitFor();
    await w.page.getByText('Wren Ashdown invited as Viewer (read only) by Ada Brennick').waitFor();
    await w.page.getByTestId(`member-${wren.id}`).scrollIntoViewIfNeeded();
    await screenshot(w.page, 'team-1440');
    clean(w);
    await w.context.close();

    const phone = await signedIn(PHONE, 'admin@example.test', 'admin');
    await phone.page.goto(`${baseUrl}/team`);
    await phone.page.getByTestId(`member-${wren.id}`).waitFor();
    await screenshot(phone.page, 'team-390');
    expect(await phone.page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(PHONE.width);
    clean(phone);
    await phone.context.close();
  });

  it('a supervisor saves a contact phone and e-mail choices; an engineer is offered only their own', async () => {
    const w = await signedIn(DESKTOP, 'supervisor@example.test', 'supervisor');
    await w.page.goto(`${baseUrl}/settings`);
    await w.page.getByTestId('settings-mail-digest').waitFor();
    await w.page.getByTestId('settings-phone').fill('+44 7700 900222');
    const digest = w.page.getByTestId('settings-mail-digest');
    const wasOn = (await digest.getAttribute('aria-checked')) === 'true';
    await digest.click();
    await w.page.getByTestId('settings-save').click();
    await w.page.getByText('Your settings are saved.').waitFor();
    await screenshot(w.page, 'settings-1440');
    const saved = await api<{ contactPhone: string; notifications: Record<string, boolean> }>(baseUrl, await apiToken(baseUrl, 'supervisor@example.test'), '/me/settings');
    expect(saved.contactPhone).toBe('+44 7700 900222');
    expect(saved.notifications.digest).toBe(!wasOn);
    clean(w);
    await w.context.close();

    const eng = await signedIn(PHONE, 'engineer@example.test', 'engineer');
    await eng.page.goto(`${baseUrl}/settings`);
    await eng.page.getByTestId('settings-mail-myTags').waitFor();
    await expect(eng.page.getByTestId('settings-mail-digest').count()).resolves.toBe(0);
    await eng.page.getByTestId('sign-out').waitFor();
    await screenshot(eng.page, 'settings-390');
    clean(eng);
    await eng.context.close();
  });
});
