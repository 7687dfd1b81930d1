import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { PHONE, launch, openSignedIn, screenshot, testIdText, type Session } from '@/test/e2e/support/browser';
import { api, apiToken } from '@/test/e2e/support/api';
import type { Asset } from '@/shared/types/register';
import type { Tag } from '@/shared/types/tags';
import type { TeamMember } from '@/shared/types/team';
import type { ListResponse } from '@/shared/types/user';

let session: Session;
const baseUrl = inject('baseUrl');
let holderToken: string;
let adminToken: string;
let tag: Tag;
let colleague: TeamMember;

beforeAll(async () => {
  session = await launch();
  holderToken = await apiToken(baseUrl, 'engineer2@example.test');
  adminToken = await apiToken(baseUrl, 'admin@example.test');
  const items = await api<ListResponse<Asset>>(baseUrl, holderToken, '/assets?pageSize=100');
  let asset: Asset | undefined;
  for (const a of items.items.filter((x) => !x.archived && x.type !== 'pump')) {
    if ((await api<ListResponse<Tag>>(baseUrl, holderToken, `/tags?assetId=${a.id}&status=live`)).items.length === 0) { asset = a; break; }
  }
  expect(asset).toBeDefined();
  tag = await api<Tag>(baseUrl, holderToken, `/assets/${asset!.id}/tags`, {
    method: 'POST',
    body: {
      kind: 'override', reason: 'Frost thermostat bypassed while the sensor is replaced', expiresAt: new Date(Date.now() + 4 * 3600_000).toISOString(),
      contactPhone: '+44 7700 900104', normalState: 'Frost thermostat in circuit', leftState: 'Frost thermostat bridged at the panel',
    },
  });
  const team = await api<ListResponse<TeamMember>>(baseUrl, adminToken, '/users?pageSize=200');
  colleague = team.items.find((m) => m.email === 'engineer@example.test')!;
  expect(colleague.role).toBe('engineer');
});

afterAll(async () => {
  // Leave the demo as it was: the colleague an engineer again, the tag cleared.
  await api(baseUrl, adminToken, `/users/${colleague.id}`, { method: 'PATCH', body: { role: 'engineer' } });
  const now = await api<Tag>(baseUrl, holderToken, `/tags/${tag.id}`);
  if (now.handoverOffer) await api(baseUrl, holderToken, `/tags/${tag.id}/handover/withdraw`, { method: 'POST', body: {} });
  if (now.status === 'live') await api(baseUrl, holderToken, `/tags/${tag.id}/clear`, { method: 'POST', body: { reason: 'Sensor replaced, thermostat back in circuit', checks: {} } });
  await session.close();
});

/** The holder's phone, on the tag's page. */
async function openTagAsHolder() {
  const watched = await openSignedIn(session.browser, baseUrl, PHONE, 'engineer2@example.test', 'engineer');
  await watched.page.goto(`${baseUrl}/tags/${tag.id}`);
  return watched;
}

describe('tag action forms on the form kit, on a phone', () => {
  it('shows the shared schema’s messages beside the fields before anything is sent', async () => {
    const { page, context } = await openTagAsHolder();
    await page.getByTestId('tag-action-clear').click();
    await page.getByTestId('clear-tag-form').waitFor();
    await page.getByTestId('clear-reason').fill('Done');
    await page.getByTestId('clear-submit').click();
    // The message is the clearance schema's (shared/schemas/tags.ts), the same the server answers with.
    await page.getByText('At least 10 characters: say what and why.').waitFor();
    await expect(testIdText(page, 'clear-reason-progress')).resolves.toMatch(/4 of at least 10 characters: 6 more/);
    await screenshot(page, 'tag-form-clear-field-errors-390');
    expect((await api<Tag>(baseUrl, holderToken, `/tags/${tag.id}`)).status).toBe('live');
    await context.close();
  });

  it('puts a server refusal in the banner and its field message beside the field, then sends once it is put right', async () => {
    const { page, context } = await openTagAsHolder();
    await page.getByTestId('tag-action-offer').click();
    await page.getByTestId('handover-offer-form').waitFor();
    await page.getByTestId('handover-to').click();
    await page.getByRole('radio', { name: colleague.name }).click();
    await page.getByTestId('handover-note').fill('Sensor on order; the bridge is labelled at the panel.');
    // Meanwhile the colleague stops being someone who can hold tags: only the server can know.
    await api(baseUrl, adminToken, `/users/${colleague.id}`, { method: 'PATCH', body: { role: 'viewer' } });
    await page.getByTestId('handover-offer-submit').click();
    await page.getByTestId('action-refusal').waitFor();
    await expect(testIdText(page, 'action-refusal')).resolves.toContain('Choose a colleague who can hold tags.');
    await page.getByText('Choose an engineer, supervisor or admin in your organisation.').waitFor();
    await screenshot(page, 'tag-form-offer-refused-390');
    expect((await api<Tag>(baseUrl, holderToken, `/tags/${tag.id}`)).handoverOffer).toBeFalsy();

    await api(baseUrl, adminToken, `/users/${colleague.id}`, { method: 'PATCH', body: { role: 'engineer' } });
    await page.getByTestId('handover-offer-submit').click();
    await page.getByText('Hand-over offered. You hold the tag until your colleague accepts.').waitFor();
    expect((await api<Tag>(baseUrl, holderToken, `/tags/${tag.id}`)).handoverOffer?.to.id).toBe(colleague.id);
    await context.close();
  });
});
