import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { parse } from 'csv-parse/sync';
import { stringify } from 'csv-stringify/sync';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { DESKTOP, PHONE, launch, openPage, screenshot, signIn, type Session } from '@/test/e2e/support/browser';

let session: Session;
let tmp: string;
let photoPath: string;
const baseUrl = inject('baseUrl');
// Unique per run so a search finds exactly this item.
const plantId = `P-WR-${Date.now().toString(36).toUpperCase().slice(-5)}`;

beforeAll(async () => {
  session = await launch();
  tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'isoledger-register-e2e-'));
  photoPath = path.join(tmp, 'pump.png');
  // A stand-in photo: a grey "pump body" on a pale background.
  const body = Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" width="640" height="480"><rect width="640" height="480" fill="#dfe7ea"/><circle cx="320" cy="240" r="150" fill="#5c6b73"/><rect x="60" y="215" width="520" height="50" fill="#1f6f78"/></svg>');
  await sharp(body).png().toFile(photoPath);
});
afterAll(async () => {
  await session.close();
  fs.rmSync(tmp, { recursive: true, force: true });
});

describe('plant register', () => {
  it('the demo engineer adds a plant room and a pump with a photo on a phone, then finds it by search', async () => {
    const { page, errors, offsite, context } = await openPage(session.browser, PHONE);
    await signIn(page, baseUrl, 'engineer@example.test');
    await page.getByTestId('home-engineer').waitFor();
    await page.getByRole('navigation').getByRole('link', { name: 'Register' }).click();
    const firstSite = page.locator('[data-testid^="site-"]').first();
    await firstSite.waitFor();
    await screenshot(page, 'register-home-phone');
    // Engineers add items and rooms but do not create sites or import.
    await expect(page.getByTestId('register-new-site').count()).resolves.toBe(0);
    await expect(page.getByTestId('register-import').count()).resolves.toBe(0);

    await firstSite.click();
    await page.locator('[data-testid^="plant-room-"]').first().waitFor();
    await screenshot(page, 'register-site-phone');
    await page.getByTestId('site-add-plant-room').click();
    await page.getByTestId('field-name').fill('Roof plant room, walk-round check');
    await page.getByTestId('field-floorArea').fill('Roof, north end');
    await page.getByTestId('field-accessNotes').fill('Key in the security office; sign in at reception.');
    await page.getByTestId('field-safety.emergencyStop').fill('Red mushroom button inside the door, left side');
    await page.getByTestId('field-safety.gasIsolation').fill('Yellow lever valve where the gas main enters, by the east wall');
    await page.getByTestId('field-safety.electricalIsolator').fill('Panel MCP-R, beside the door');
    await page.getByTestId('plant-room-submit').click();
    const safety = page.getByTestId('safety-locations');
    await safety.waitFor();
    await expect(safety.getByText('Red mushroom button inside the door, left side').isVisible()).resolves.toBe(true);
    // Locations left blank say so in words, and the caution to verify on site is shown.
    await expect(safety.getByText('Not recorded — find it before you start work').count()).resolves.toBe(2);
    await expect(safety.getByText(/Locations recorded by engineers; verify on site/).isVisible()).resolves.toBe(true);
    await screenshot(page, 'register-plant-room-phone');

    await page.getByTestId('room-add-item').click();
    await page.getByTestId('field-type').click();
    await page.getByRole('radio', { name: 'Pump', exact: true }).click();
    await page.getByTestId('field-plantId').fill(plantId);
    await page.getByTestId('field-name').fill('Roof heating pump');
    await screenshot(page, 'register-item-form-top-phone');
    await page.getByTestId('field-system').fill('LTHW heating');
    await page.getByTestId('energy-electrical').click();
    await page.getByTestId('energy-mechanical').click();
    await page.getByTestId('field-attributes.duty').click();
    await page.getByRole('radio', { name: 'Duty', exact: true }).click();
    await page.getByTestId('field-attributes.circuit').fill('Roof AHU coil');
    await page.getByTestId('field-serviceIntervalMonths').fill('12');
    await page.getByTestId('field-lastServiceDate').fill('2024-02-30');
    await page.getByTestId('asset-submit').click();
    // The shared schema refuses a day that does not exist, before anything is sent.
    await page.getByText('That date does not exist.').waitFor();
    await page.getByTestId('field-lastServiceDate').fill('2025-01-15');
    await screenshot(page, 'register-item-form-phone');
    await page.getByTestId('asset-submit').click();
    await page.getByText(`${plantId} · Roof heating pump is in the register.`).waitFor();

    const chooser = page.waitForEvent('filechooser');
    await page.getByTestId('saved-add-photo').click();
    await (await chooser).setFiles(photoPath);
    const savedThumb = page.getByTestId('saved-photos').locator('img');
    await savedThumb.waitFor();
    await expect(savedThumb.getAttribute('src')).resolves.toMatch(/^blob:/);
    await screenshot(page, 'register-item-saved-phone');

    // "Add another item in this room" keeps the site and room and clears the rest.
    await page.getByTestId('saved-add-another').click();
    await expect(page.getByTestId('field-plantRoomId').textContent()).resolves.toContain('Roof plant room, walk-round check');
    await expect(page.getByTestId('field-plantId').inputValue()).resolves.toBe('');

    await page.getByRole('navigation').getByRole('link', { name: 'Register' }).click();
    await page.getByTestId('register-search').fill(plantId.toLowerCase());
    const card = page.locator('[data-testid^="asset-card-"]').filter({ hasText: plantId });
    await card.waitFor();
    await expect(page.locator('[data-testid^="asset-card-"]').count()).resolves.toBe(1);
    await expect(card.locator('img').getAttribute('src')).resolves.toMatch(/^blob:/);
    await screenshot(page, 'register-search-phone');

    await card.click();
    await page.getByText('Roof AHU coil').waitFor();
    await expect(page.getByText('Duty', { exact: true }).isVisible()).resolves.toBe(true);
    await expect(page.getByText('Mechanical / rotating').isVisible()).resolves.toBe(true);
    await expect(page.getByText('Every 12 months').isVisible()).resolves.toBe(true);
    await screenshot(page, 'register-item-phone');
    await page.locator('[data-testid^="photo-"]').first().click();
    await page.getByTestId('photo-full').waitFor();
    await screenshot(page, 'register-item-photo-phone');

    expect(errors).toEqual([]);
    expect(offsite).toEqual([]);
    await context.close();
  });

  it('the demo supervisor edits an item in the table on a desktop and the change persists after a reload', async () => {
    const { page, errors, offsite, context } = await openPage(session.browser, DESKTOP);
    await signIn(page, baseUrl, 'supervisor@example.test');
    await page.getByTestId('home-supervisor').waitFor();
    await page.getByRole('link', { name: 'Register' }).first().click();
    const table = page.getByTestId('asset-table');
    await table.getByRole('row').nth(1).waitFor();
    await screenshot(page, 'register-table-desktop');

    await page.getByTestId('sort-name').click();
    await expect(table.getByRole('columnheader', { name: /Name/ }).getAttribute('aria-sort')).resolves.toBe('ascending');
    await page.getByTestId('sort-name').click();
    await expect(table.getByRole('columnheader', { name: /Name/ }).getAttribute('aria-sort')).resolves.toBe('descending');
    await page.getByTestId('sort-plantId').click();

    await page.getByTestId('table-edit-toggle').click();
    const firstName = table.locator('[data-testid^="inline-name-"]').first();
    await firstName.waitFor();
    const id = (await firstName.getAttribute('data-testid'))!.replace('inline-name-', '');
    const newName = `${await firstName.inputValue()} (checked)`.slice(0, 160);
    await firstName.fill(newName);
    await page.getByTestId(`inline-system-${id}`).fill('LTHW heating, north');
    await page.getByTestId(`inline-lastServiceDate-${id}`).fill('2025-13-01');
    await page.getByTestId(`inline-save-${id}`).click();
    await table.getByText('That date does not exist.').waitFor();
    await page.getByTestId(`inline-lastServiceDate-${id}`).fill('2025-03-14');
    await page.getByTestId(`inline-save-${id}`).click();
    await page.getByTestId(`inline-saved-${id}`).waitFor();
    await screenshot(page, 'register-table-edit-desktop');

    await page.reload();
    await page.getByTestId('asset-table').getByRole('row').nth(1).waitFor();
    await page.goto(`${baseUrl}/assets/${id}`);
    await page.getByText(newName, { exact: false }).first().waitFor();
    await expect(page.getByText('LTHW heating, north').first().isVisible()).resolves.toBe(true);
    await expect(page.getByText('14 Mar 2025').first().isVisible()).resolves.toBe(true);
    await screenshot(page, 'register-item-desktop');
    await page.getByTestId('breadcrumbs').getByRole('link').last().click();
    await page.getByTestId('safety-locations').waitFor();
    await screenshot(page, 'register-plant-room-desktop');

    // Archive the item the engineer added in the first test (supervisors archive, with a confirmation).
    await page.getByRole('link', { name: 'Register' }).first().click();
    await page.getByTestId('register-search').fill(plantId);
    await page.getByTestId('asset-table').getByRole('row').filter({ hasText: plantId }).click();
    await page.getByTestId('asset-archive').click();
    await page.getByTestId('confirm-dialog').waitFor();
    await screenshot(page, 'register-archive-confirm-desktop');
    await page.getByTestId('confirm-dialog-confirm').click();
    await page.getByText('This item is no longer in service. Its record is kept for history.').waitFor();
    await expect(page.getByTestId('asset-edit').count()).resolves.toBe(0);

    expect(errors).toEqual([]);
    expect(offsite).toEqual([]);
    await context.close();
  });

  it('the demo supervisor exports the register, sees every bad row of a CSV before importing, and imports a clean file', async () => {
    const { page, errors, offsite, context } = await openPage(session.browser, DESKTOP);
    await signIn(page, baseUrl, 'supervisor@example.test');
    await page.getByTestId('home-supervisor').waitFor();
    await page.getByRole('link', { name: 'Register' }).first().click();
    await page.getByTestId('register-import').click();

    const download = page.waitForEvent('download');
    await page.getByTestId('export-csv').click();
    const file = await download;
    expect(file.suggestedFilename()).toMatch(/^isoledger-register-\d{4}-\d{2}-\d{2}\.csv$/);
    const exported = fs.readFileSync((await file.path())!, 'utf8');
    const records = parse(exported, { columns: true, bom: true }) as Record<string, string>[];
    expect(records.length).toBeGreaterThanOrEqual(40);
    expect(Object.keys(records[0])).toEqual(expect.arrayContaining(['site', 'plantRoom', 'plantId', 'name', 'type']));

    const bad = [records[0], { ...records[1], type: 'teapot', lastServiceDate: '2025-02-30' }];
    const badPath = path.join(tmp, 'bad.csv');
    fs.writeFileSync(badPath, stringify(bad, { header: true }));
    let chooser = page.waitForEvent('filechooser');
    await page.getByTestId('import-choose').click();
    await (await chooser).setFiles(badPath);
    const problems = page.getByTestId('import-error-table');
    await problems.waitFor();
    // Row numbers count the header as row 1, so the second data row is row 3.
    await expect(problems.getByRole('row').filter({ hasText: 'type' }).first().textContent()).resolves.toMatch(/^3/);
    await expect(page.getByTestId('import-run').count()).resolves.toBe(0);
    await screenshot(page, 'register-import-errors-desktop');

    const goodPath = path.join(tmp, 'good.csv');
    fs.writeFileSync(goodPath, stringify(records.slice(0, 2), { header: true }));
    chooser = page.waitForEvent('filechooser');
    await page.getByTestId('import-choose').click();
    await (await chooser).setFiles(goodPath);
    await page.getByTestId('import-run').waitFor();
    await expect(page.getByTestId('import-rows').textContent()).resolves.toMatch(/^2/);
    await page.getByTestId('import-run').click();
    await page.getByText(/^Imported/).waitFor();
    // The rows are existing items, so nothing new is added.
    await expect(page.getByTestId('import-created').textContent()).resolves.toMatch(/^0/);
    await screenshot(page, 'register-import-done-desktop');

    expect(errors).toEqual([]);
    expect(offsite).toEqual([]);
    await context.close();
  });
});
