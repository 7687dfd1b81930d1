import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { DESKTOP, PHONE, launch, expectClean, openSignedIn, screenshot, testIdText, type Session } from '@/test/e2e/support/browser';
import type { Asset } from '@/shared/types/register';
import type { Tag } from '@/shared/types/tags';
import type { ListResponse } from '@/shared/types/user';

let session: Session;
const baseUrl = inject('baseUrl');

async function api<T>(path: string, token: string | null, body?: object): Promise<T> {
  const res = await fetch(`${baseUrl}/api${path}`, {
    method: body ? 'POST' : 'GET',
    headers: { 'Content-Type': 'application/json', ...(token ? { Authorization: `Bearer ${token}` } : {}) },
    body: body ? JSON.stringify(body) : undefined,
  });
  if (!res.ok) throw new Error(`${path} answered ${res.status}: ${await res.text()}`);
  return (await res.json()) as T;
}
const login = async (email: string) => (await api<{ token: string }>('/auth/login', null, { email, password: 'isoledger-demo' })).token;

const signedIn = (viewport: { width: number; height: number }, email: string, role: string) => openSignedIn(session.browser, baseUrl, viewport, email, role);
const text = testIdText;
const clean = expectClean;

let pump: Asset;
let isolator: Asset;
let tagId = 0;

beforeAll(async () => {
  session = await launch();
  const token = await login('engineer@example.test');
  const pumps = await api<ListResponse<Asset>>('/assets?q=P-&pageSize=50', token);
  const candidates = pumps.items.filter((a) => a.type === 'pump' && a.energySources.includes('electrical') && a.energySources.includes('mechanical'));
  for (const a of candidates) {
    const live = await api<ListResponse<Tag>>(`/tags?assetId=${a.id}&status=live`, token);
    if (live.total === 0) { pump = a; break; }
  }
  expect(pump).toBeDefined();
  const panels = await api<ListResponse<Asset>>(`/assets?q=CP-&siteId=${pump.siteId}`, token);
  isolator = panels.items.find((a) => a.type === 'control-panel')!;
  expect(isolator).toBeDefined();
});
afterAll(() => session.close());

describe('isolation tags on a plant item', () => {
  it('an engineer raises an isolation on a phone, step by step, and the item shows as isolated', async () => {
    const w = await signedIn(PHONE, 'engineer@example.test', 'engineer');
    const { page } = w;
    // The item's record as its QR label opens it.
    await page.goto(`${baseUrl}/l/${pump.labelCode}`);
    await page.getByTestId('asset-state-banner').waitFor();
    expect(new URL(page.url()).pathname).toBe(`/assets/${pump.id}`);
    expect(await text(page, 'asset-state-word')).toBe('Normal');
    await screenshot(page, 'tags-item-normal-phone');

    await page.getByTestId('raise-isolation').click();
    await page.getByTestId('raise-tag-form').waitFor();
    expect(await page.getByRole('radio', { name: 'Isolation' }).getAttribute('aria-checked')).toBe('true');
    await page.getByTestId('raise-reason').fill('Replace');
    await expect(text(page, 'raise-reason-progress')).resolves.toMatch(/enough detail/);
    await page.getByTestId('raise-reason').fill('Replace the mechanical seal on this pump');
    await screenshot(page, 'tags-raise-1-kind-phone');
    await page.getByTestId('raise-next').click();

    // Only the item's own energy sources are offered.
    for (const s of ['electrical', 'mechanical', 'stored-pressure', 'gas']) {
      await expect(page.getByTestId(`source-${s}`).count()).resolves.toBe(pump.energySources.includes(s as never) ? 1 : 0);
    }
    await page.getByTestId('raise-next').click();
    await page.getByText('Choose at least one energy source that is isolated.').waitFor();
    await page.getByTestId('source-electrical').click();
    await page.getByTestId('source-mechanical').click();
    // OSHA 29 CFR 1910.147(d)(3)–(d)(4): every source of the item is isolated or left out with a reason.
    for (const s of pump.energySources.filter((x) => x !== 'electrical' && x !== 'mechanical')) {
      await page.getByTestId(`omit-${s}`).fill('Valved off either side and drained down to zero');
    }
    await screenshot(page, 'tags-raise-2-sources-phone');
    await page.getByTestId('point-0-search').fill(isolator.plantId);
    await page.getByTestId(`point-0-result-${isolator.id}`).click();
    await page.getByTestId('point-0-chosen').waitFor();
    await page.getByTestId('point-0-method').click();
    await page.getByRole('radio', { name: 'Isolator locked off' }).click();
    // The choice closes its dialog before the next point's is opened.
    await page.getByRole('radio', { name: 'Isolator locked off' }).waitFor({ state: 'detached', timeout: 5000 });
    await page.getByTestId('add-point').click();
    await page.getByTestId('point-1-mode-text').click();
    await page.getByTestId('point-1-description').fill('Isolation valves either side of the pump');
    await page.getByTestId('point-1-method').click();
    await page.getByRole('radio', { name: 'Valve locked shut' }).click();
    await page.getByTestId('raise-lock-number').fill('PL-117');
    // OSHA 29 CFR 1910.147(d)(6): the isolation is proved before work; HSE HSG253.
    await page.getByTestId('proof-absence-of-voltage').click();
    await page.getByTestId('proof-instrument').fill('Two-pole tester TV-11, proved before and after');
    await page.getByTestId('proof-reading').fill('0 V L–N, L–E, N–E');
    await screenshot(page, 'tags-raise-2-details-phone');
    await page.getByTestId('raise-next').click();

    // The default expiry is the end of today at the site, named with the site's zone.
    await expect(text(page, 'raise-expiry-summary')).resolves.toMatch(/Expires .*23:59 \(Europe\/London\)/);
    await page.getByTestId('raise-contact-phone').fill('+44 7700 900103');
    await screenshot(page, 'tags-raise-3-expiry-phone');
    await page.getByTestId('raise-next').click();

    await page.getByTestId('isolation-cautions').waitFor();
    await expect(text(page, 'isolation-cautions')).resolves.toMatch(/does not isolate anything/);
    await screenshot(page, 'tags-raise-4-review-phone');
    await page.getByTestId('raise-submit').click();

    await page.getByTestId('tag-header').waitFor();
    tagId = Number(new URL(page.url()).pathname.split('/').pop());
    expect(tagId).toBeGreaterThan(0);
    expect(await text(page, 'tag-status-word')).toBe('Live');
    await expect(text(page, 'tag-holder')).resolves.toBe('Kofi Marchetti');
    await expect(text(page, 'tag-expiry-relative')).resolves.toMatch(/^expires in /);
    await expect(text(page, 'tag-points')).resolves.toContain(isolator.plantId);
    await expect(text(page, 'tag-proofs')).resolves.toMatch(/Proved · Absence of voltage tested[\s\S]*TV-11/);
    await expect(page.getByTestId('tag-not-proved').count()).resolves.toBe(0);
    await screenshot(page, 'tags-detail-live-phone');

    await page.getByTestId('tag-item-link').click();
    await page.getByTestId('asset-live-tags').waitFor();
    await expect.poll(() => text(page, 'asset-state-word')).toBe('Isolated');
    await expect(text(page, 'asset-state-banner')).resolves.toMatch(/1 live isolation tag/);
    await screenshot(page, 'tags-item-isolated-phone');
    clean(w);
    await w.context.close();
  });

  it('another engineer cannot clear it and is told why; the tag stays live', async () => {
    const w = await signedIn(PHONE, 'engineer2@example.test', 'engineer');
    const { page } = w;
    await page.goto(`${baseUrl}/tags/${tagId}`);
    await page.getByTestId('tag-header').waitFor();
    await page.getByTestId('tag-action-refused').click();
    await expect(text(page, 'clear-refused')).resolves.toMatch(/Only the person who holds this tag can clear it\. Kofi Marchetti holds it/);
    await screenshot(page, 'tags-clear-refused-phone');
    // OSHA 29 CFR 1910.147(e)(3): each device is removed by the employee who applied it — the server refuses too.
    const res = await fetch(`${baseUrl}/api/tags/${tagId}/clear`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', Authorization: `Bearer ${await login('engineer2@example.test')}` },
      body: JSON.stringify({ reason: 'Looks finished to me', checks: { workComplete: true, guardsRefitted: true, personnelClear: true, testedSafe: true } }),
    });
    expect(res.status).toBe(403);
    await page.reload();
    await page.getByTestId('tag-header').waitFor();
    expect(await text(page, 'tag-status-word')).toBe('Live');
    clean(w);
    await w.context.close();
  });

  it('the holder clears it with a reason and the release checks; the history shows raised and cleared', async () => {
    const w = await signedIn(PHONE, 'engineer@example.test', 'engineer');
    const { page } = w;
    await page.goto(`${baseUrl}/tags/${tagId}`);
    await page.getByTestId('tag-action-clear').click();
    await page.getByTestId('clear-reason').fill('Seal done');
    await expect(text(page, 'clear-reason-progress')).resolves.toMatch(/9 of at least 10 characters: 1 more/);
    await page.getByTestId('clear-submit').click();
    await page.getByText('Confirm this before clearing.').first().waitFor();
    await page.getByTestId('clear-reason').fill('Seal replaced, pump run and tested for 20 minutes');
    for (const k of ['workComplete', 'guardsRefitted', 'personnelClear', 'testedSafe']) await page.getByTestId(`check-${k}`).click();
    await screenshot(page, 'tags-clear-form-phone');
    await page.getByTestId('clear-submit').click();
    await page.getByText('Tag cleared. The item’s state is updated.').waitFor();
    expect(await text(page, 'tag-status-word')).toBe('Cleared');
    await page.getByTestId('timeline-cleared').scrollIntoViewIfNeeded();
    await expect(page.getByTestId('timeline-raised').count()).resolves.toBe(1);
    await expect(text(page, 'timeline-cleared')).resolves.toMatch(/Seal replaced, pump run and tested[\s\S]*All release checks confirmed/);
    await screenshot(page, 'tags-detail-cleared-phone');
    await page.getByTestId('tag-item-link').click();
    await page.getByTestId('asset-tag-history').waitFor();
    await expect.poll(() => text(page, 'asset-state-word')).toBe('Normal');
    clean(w);
    await w.context.close();
  });

  it('on a wide screen a supervisor raises an override on one page and clears another engineer’s isolation in their absence', async () => {
    const holder = await api<Tag>(`/assets/${pump.id}/tags`, await login('engineer2@example.test'), {
      kind: 'isolation',
      reason: 'Investigate noisy bearing',
      expiresAt: new Date(Date.now() + 3 * 3600_000).toISOString(),
      energySources: ['electrical'],
      omittedSources: pump.energySources.filter((x) => x !== 'electrical').map((source) => ({ source, reason: 'Pump valved off and stopped for the bearing check' })),
      points: [{ description: 'Starter isolator on the pump set', method: 'isolator-locked' }],
      lockNumber: 'PL-204',
      contactPhone: '+44 7700 900104',
    });
    const w = await signedIn(DESKTOP, 'supervisor@example.test', 'supervisor');
    const { page } = w;
    await page.goto(`${baseUrl}/assets/${pump.id}`);
    await page.getByTestId('asset-live-tags').waitFor();
    await expect.poll(() => text(page, 'asset-state-word')).toBe('Isolated');
    await screenshot(page, 'tags-item-isolated-desktop');

    await page.getByTestId('raise-override').click();
    await page.getByTestId('raise-tag-form').waitFor();
    // One page: every section at once, no steps.
    await expect(page.getByTestId('raise-next').count()).resolves.toBe(0);
    await page.getByTestId('raise-submit').click();
    await expect(page.getByText('Some answers need attention: reason, normal state, state it was left in.').isVisible()).resolves.toBe(true);
    await screenshot(page, 'tags-raise-errors-desktop');
    await page.getByTestId('raise-reason').fill('Pump forced on for a flow test');
    await page.getByTestId('raise-normal-state').fill('Pump on auto from the BMS');
    await page.getByTestId('raise-left-state').fill('Pump in hand, running');
    await page.getByTestId('raise-reason').scrollIntoViewIfNeeded();
    await screenshot(page, 'tags-raise-desktop');
    await page.getByTestId('raise-submit').click();
    await page.getByTestId('tag-override-states').waitFor();
    expect(await text(page, 'tag-status-word')).toBe('Live');
    await screenshot(page, 'tags-detail-override-desktop');

    await page.goto(`${baseUrl}/tags/${holder.id}`);
    await page.getByTestId('tag-action-absence').click();
    await page.getByTestId('absence-not-on-site').click();
    await page.getByTestId('absence-attempts').fill('Phoned Rhian at 09:10 and 09:40, texted, asked the site office');
    await page.getByTestId('absence-reason').fill('Bearing checked, pump needed back for the heating');
    for (const k of ['workComplete', 'guardsRefitted', 'personnelClear', 'testedSafe']) await page.getByTestId(`check-${k}`).click();
    await screenshot(page, 'tags-clear-in-absence-desktop');
    await page.getByTestId('absence-submit').click();
    await page.getByText('Tag cleared in the holder’s absence. The holder is told and must acknowledge.').waitFor();
    await expect(text(page, 'timeline-cleared-in-absence')).resolves.toMatch(/Phoned Rhian at 09:10[\s\S]*to be told before they resume work/);
    await screenshot(page, 'tags-detail-cleared-desktop');

    // The isolation is off but the override is still on: the item shows as overridden.
    await page.getByTestId('tag-item-link').click();
    await page.getByTestId('asset-tag-history').waitFor();
    // The record may first show what this phone kept from before; it settles on the server's answer.
    await expect.poll(() => text(page, 'asset-state-word')).toBe('Overridden');
    clean(w);
    await w.context.close();
  });
  it('hands a tag over between two engineers on two phones: the offer and the acceptance each seen from the other side', async () => {
    const tag = await api<Tag>(`/assets/${isolator.id}/tags`, await login('engineer@example.test'), {
      kind: 'isolation',
      reason: 'Rewire the boiler house panel',
      expiresAt: new Date(Date.now() + 2 * 3600_000).toISOString(),
      energySources: ['electrical'],
      points: [{ description: 'Incoming supply, DB-1 way 4', method: 'fuse-withdrawn' }],
      lockNumber: 'PL-117',
    });
    const off = await signedIn(PHONE, 'engineer@example.test', 'engineer');
    const on = await signedIn(PHONE, 'engineer2@example.test', 'engineer');
    // The off-going engineer's phone: the tag is not proved yet, and they offer it to their colleague.
    await off.page.goto(`${baseUrl}/tags/${tag.id}`);
    await off.page.getByTestId('tag-not-proved').waitFor();
    await off.page.getByTestId('tag-action-offer').click();
    await off.page.getByTestId('handover-to').click();
    await off.page.getByRole('radio', { name: 'Rhian Castellane' }).click();
    await off.page.getByTestId('handover-note').fill('Panel half rewired; terminals 3–6 still loose. My lock PL-117 comes off after yours is on.');
    await screenshot(off.page, 'tags-handover-offer-phone');
    await off.page.getByTestId('handover-offer-submit').click();
    await off.page.getByTestId('handover-offered-by-me').waitFor();
    await expect(text(off.page, 'handover-offered-by-me')).resolves.toMatch(/You offered this tag to Rhian Castellane\. You hold it until they accept/);
    await expect(text(off.page, 'tag-holder')).resolves.toBe('Kofi Marchetti');
    await screenshot(off.page, 'tags-handover-offered-holder-phone');

    // The on-coming engineer's home lists the offer waiting for them, and any acknowledgement they owe.
    await on.page.goto(`${baseUrl}/`);
    await on.page.getByTestId('home-handover-offers').waitFor();
    await expect(text(on.page, 'home-handover-offers')).resolves.toMatch(/Offered to you in hand-over[\s\S]*Rewire the boiler house panel/);
    await screenshot(on.page, 'home-handover-offer-phone');

    // The on-coming engineer's phone. Their own tag was cleared in their absence earlier: they acknowledge that first.
    await on.page.goto(`${baseUrl}/tags/${tag.id}`);
    await on.page.getByTestId('tag-header').waitFor();
    const notices = on.page.getByTestId('tag-notices');
    if (await notices.count()) {
      await screenshot(on.page, 'tags-notice-to-acknowledge-phone');
      await on.page.locator('[data-testid^="tag-notice-ack-"]').first().click();
      await notices.waitFor({ state: 'detached' });
    }
    await on.page.getByTestId('handover-offered-to-me').waitFor();
    await expect(text(on.page, 'handover-offered-to-me')).resolves.toMatch(/Kofi Marchetti offers you this tag[\s\S]*terminals 3–6/);
    await screenshot(on.page, 'tags-handover-offered-colleague-phone');
    // OSHA 29 CFR 1910.147(f)(4): orderly transfer; the on-coming lock goes on before the off-going one comes off.
    await on.page.getByTestId('tag-action-accept').click();
    await on.page.getByTestId('handover-accept-submit').click();
    await on.page.getByText('Put your own lock on first, then give its number.').waitFor();
    await on.page.getByTestId('handover-lock').fill('PL-204');
    await on.page.getByTestId('handover-phone').fill('+44 7700 900104');
    await screenshot(on.page, 'tags-handover-accept-phone');
    await on.page.getByTestId('handover-accept-submit').click();
    await on.page.getByText('You now hold this tag. Your colleague may take their lock off.').waitFor();
    await expect(text(on.page, 'tag-holder')).resolves.toBe('Rhian Castellane');
    await expect(text(on.page, 'timeline-handed-over')).resolves.toMatch(/Kofi Marchetti handed over to Rhian Castellane, who accepted[\s\S]*PL-204 on; PL-117 to come off/);

    // Back on the off-going phone: the acceptance is seen there, and they may no longer clear it.
    await off.page.reload();
    await off.page.getByTestId('tag-header').waitFor();
    await expect.poll(() => text(off.page, 'tag-holder')).toBe('Rhian Castellane');
    await expect(off.page.getByTestId('handover-offered-by-me').count()).resolves.toBe(0);
    await expect(text(off.page, 'timeline-handed-over')).resolves.toMatch(/who accepted/);
    await off.page.getByTestId('tag-timeline').scrollIntoViewIfNeeded();
    await screenshot(off.page, 'tags-handover-accepted-seen-by-holder-phone');
    await off.page.getByTestId('tag-action-refused').click();
    await expect(text(off.page, 'clear-refused')).resolves.toMatch(/Rhian Castellane holds it/);

    // The new holder extends it and adds a note; each joins the history.
    await on.page.getByTestId('tag-action-extend').click();
    await on.page.getByTestId('extend-expiry-end-tomorrow').click();
    await on.page.getByTestId('extend-reason').fill('Parts delayed until tomorrow');
    await on.page.getByTestId('extend-submit').click();
    await on.page.getByText('Expiry extended.').waitFor();
    await on.page.getByTestId('tag-action-note').click();
    await on.page.getByTestId('note-text').fill('Spare fuses are in the store');
    await on.page.getByTestId('note-submit').click();
    await on.page.getByText('Note added to the history.').waitFor();
    await expect(text(on.page, 'timeline-extended')).resolves.toMatch(/Expiry moved from .* to .*23:59 \(Europe\/London\)[\s\S]*Parts delayed/);
    await expect(text(on.page, 'timeline-note-added')).resolves.toContain('Spare fuses are in the store');
    await on.page.getByTestId('tag-timeline').scrollIntoViewIfNeeded();
    await screenshot(on.page, 'tags-timeline-phone');
    for (const w of [off, on]) {
      clean(w);
      await w.context.close();
    }
  });
});
