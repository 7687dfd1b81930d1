import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { DESKTOP, PHONE, SCREENSHOTS, launch, expectClean, openSignedIn, screenshot, testIdText, type Session } from '@/test/e2e/support/browser';
import { api, apiToken } from '@/test/e2e/support/api';
import type { Asset, PlantRoom, Site } from '@/shared/types/register';
import type { Tag } from '@/shared/types/tags';
import type { ListResponse } from '@/shared/types/user';

let session: Session;
const baseUrl = inject('baseUrl');
const mailWebPort = inject('mailWebPort');
const OVERRIDE_REASON = 'Circuit 2 pump held in hand for a flow test on the new branch';
const LEAVE_NOTE = 'Still in hand: the flow test carries on tomorrow morning. Return it to auto when the test is signed off.';

let castellanRoom: PlantRoom;
let quillmere: Site;
let pump: Asset;

const signedIn = (viewport: { width: number; height: number }, email: string, role: string) => openSignedIn(session.browser, baseUrl, viewport, email, role);
const text = testIdText;
const clean = expectClean;

async function mailTo(address: string, subject: RegExp) {
  for (let i = 0; i < 40; i++) {
    const all = (await (await fetch(`http://127.0.0.1:${mailWebPort}/api/email`)).json()) as { subject: string; text: string; to: { address: string }[] }[];
    const found = all.find((m) => subject.test(m.subject) && m.to.some((t) => t.address === address));
    if (found) return found;
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`no mail to ${address} matching ${subject}`);
}

beforeAll(async () => {
  session = await launch();
  const token = await apiToken(baseUrl, 'engineer@example.test');
  const sites = await api<ListResponse<Site>>(baseUrl, token, '/sites?pageSize=50');
  const castellan = sites.items.find((s) => s.name.startsWith('Castellan'))!;
  quillmere = sites.items.find((s) => s.name.startsWith('Quillmere'))!;
  const rooms = await api<ListResponse<PlantRoom>>(baseUrl, token, `/sites/${castellan.id}/plant-rooms`);
  castellanRoom = rooms.items.find((r) => r.name === 'Basement plant room')!;
  const pumps = await api<ListResponse<Asset>>(baseUrl, token, `/assets?siteId=${quillmere.id}&q=P-&pageSize=50`);
  for (const a of pumps.items.filter((x) => x.type === 'pump')) {
    const live = await api<ListResponse<Tag>>(baseUrl, token, `/tags?assetId=${a.id}&status=live`);
    if (live.total === 0) { pump = a; break; }
  }
  expect(pump).toBeDefined();
});
afterAll(() => session.close());

describe('an engineer’s visit', () => {
  it('an engineer opens a plant room on a phone and sees its live tags with holder and reason', async () => {
    const w = await signedIn(PHONE, 'engineer@example.test', 'engineer');
    const { page } = w;
    await page.goto(`${baseUrl}/plant-rooms/${castellanRoom.id}`);
    await page.getByTestId('live-tags').waitFor();
    const panel = await text(page, 'live-tags');
    expect(panel).toContain('Rhian Castellane');
    expect(panel).toContain('Burner fault: flame failure probe replacement, waiting for the part');
    expect(panel).toContain('+44 7700 900104');
    await expect(text(page, 'live-tags-title')).resolves.toMatch(/Live tags in Basement plant room \(\d+\)/);
    await screenshot(page, 'visits-plant-room-live-tags-phone');
    clean(w);
    await w.context.close();
  });

  it('starts a visit, raises an override, is told what is left, leaves it with a note and ends the visit', async () => {
    const w = await signedIn(PHONE, 'engineer@example.test', 'engineer');
    const { page } = w;
    await page.goto(`${baseUrl}/sites/${quillmere.id}`);
    await page.getByTestId('visit-start').click();
    await page.getByTestId('start-visit-form').waitFor();
    await page.getByTestId('visit-purpose').fill('Flow test on the new heating branch');
    await page.getByTestId('visit-job-reference').fill('JOB-5120');
    await screenshot(page, 'visits-start-phone');
    await page.getByTestId('start-visit-submit').click();
    await page.getByTestId('visit-in-progress').waitFor();
    await screenshot(page, 'visits-site-in-progress-phone');

    await page.goto(`${baseUrl}/assets/${pump.id}`);
    await page.getByTestId('visit-in-progress').waitFor();
    await page.getByTestId('raise-override').click();
    await page.getByTestId('raise-reason').fill(OVERRIDE_REASON);
    await page.getByTestId('raise-next').click();
    await page.getByTestId('raise-normal-state').fill('Auto, enabled by the controls panel');
    await page.getByTestId('raise-left-state').fill('Hand, running at full speed');
    await page.getByTestId('raise-next').click();
    await page.getByTestId('raise-contact-phone').fill('+44 7700 900103');
    await page.getByTestId('raise-next').click();
    await page.getByTestId('raise-submit').click();
    await page.getByTestId('tag-header').waitFor();

    await page.goto(`${baseUrl}/`);
    await page.getByTestId('home-visit').click();
    await page.getByTestId('visit-end').click();
    await page.getByTestId('end-visit-form').waitFor();
    await page.getByTestId('end-visit-submit').click();
    await page.getByTestId('end-visit-status').waitFor();
    // The refusal names the tag still held, in words.
    const refusal = await text(page, 'end-visit-status');
    expect(refusal).toContain('Tags left undecided');
    expect(refusal).toContain(pump.plantId);
    await page.getByTestId('end-visit-status').scrollIntoViewIfNeeded();
    await screenshot(page, 'visits-end-refused-phone');

    const card = page.locator('[data-testid^="decision-"][data-testid$="-leave"]').first();
    await card.click();
    await page.locator('[data-testid$="-note"][data-testid^="decision-"]').first().fill(LEAVE_NOTE);
    await screenshot(page, 'visits-end-decided-phone');
    await page.getByTestId('end-visit-submit').click();
    await page.getByTestId('end-visit-form').waitFor({ state: 'detached' });
    await expect(page.locator('[data-testid^="visit-decision-"]').first().innerText()).resolves.toContain('Leave in place');
    await screenshot(page, 'visits-ended-phone');
    // The end-of-visit refusal above is a 422 on purpose.
    clean(w, [/status of 422/]);
    await w.context.close();
  });

  it('shows the engineer their own live tags and recent places on the home screen, phone and desk', async () => {
    for (const [viewport, name] of [[PHONE, 'phone'], [DESKTOP, 'desktop']] as const) {
      const w = await signedIn(viewport, 'engineer@example.test', 'engineer');
      await w.page.getByTestId('live-tags').waitFor();
      const mine = await text(w.page, 'live-tags');
      // The override left in place is still held; the one past its expiry comes first.
      expect(mine).toContain(OVERRIDE_REASON);
      expect(mine.indexOf('past expiry by')).toBeLessThan(mine.indexOf(OVERRIDE_REASON));
      await expect(text(w.page, 'home-recent')).resolves.toContain('Quillmere Academy (demo)');
      await screenshot(w.page, `visits-home-${name}`);
      clean(w);
      await w.context.close();
    }
  });

  it('sends the summary to the supervisor’s inbox with the override in it', async () => {
    const mail = await mailTo('supervisor@example.test', /^Visit ended: Quillmere/);
    expect(mail.text).toContain(OVERRIDE_REASON);
    expect(mail.text).toContain(LEAVE_NOTE);
    expect(mail.text).toContain('Leave in place');
  });

  it('a supervisor at a desk sees the visit and downloads its report, which renders with the override’s reason', async () => {
    const w = await signedIn(DESKTOP, 'supervisor@example.test', 'supervisor');
    const { page } = w;
    await page.goto(`${baseUrl}/sites/${quillmere.id}`);
    await page.getByTestId('site-visits').waitFor();
    await page.getByTestId('visits-filter-ended').click();
    const row = page.locator('[data-testid^="visit-row-"]').first();
    await expect(row.innerText()).resolves.toContain('Kofi Marchetti');
    await page.getByTestId('site-visits').scrollIntoViewIfNeeded();
    await screenshot(page, 'visits-site-list-desktop');
    await row.click();
    await page.getByTestId('visit-report').waitFor();
    await screenshot(page, 'visits-detail-desktop');
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('visit-report').click()]);
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'visit-report-'));
    const file = path.join(dir, 'visit.pdf');
    await download.saveAs(file);
    execFileSync('/usr/bin/pdftoppm', ['-r', '80', '-png', '-f', '1', '-l', '1', file, path.join(SCREENSHOTS, 'visits-report-page')]);
    const rendered = fs.readdirSync(SCREENSHOTS).filter((f) => f.startsWith('visits-report-page'));
    expect(rendered.length).toBe(1);
    expect(fs.statSync(path.join(SCREENSHOTS, rendered[0])).size).toBeGreaterThan(10_000);
    const pageText = execFileSync('/usr/bin/pdftotext', ['-layout', file, '-']).toString().replace(/\s+/g, ' ');
    expect(pageText).toContain(OVERRIDE_REASON);
    clean(w);
    await w.context.close();
  });
});
