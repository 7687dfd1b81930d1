import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { parse } from 'csv-parse/sync';
import { stringify } from 'csv-stringify/sync';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { api, apiToken } from '@/test/e2e/support/api';
import { DESKTOP, expectClean, launch, openSignedIn, screenshot, type Session } from '@/test/e2e/support/browser';
import type { ListResponse } from '@/shared/types/api';
import type { AssetConnections } from '@/shared/types/connections';
import type { Asset } from '@/shared/types/register';

let session: Session;
const baseUrl = inject('baseUrl');
const tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'isoledger-connections-csv-'));

beforeAll(async () => { session = await launch(); });
afterAll(async () => {
  await session.close();
  fs.rmSync(tmp, { recursive: true, force: true });
});

describe('plant connections as CSV', () => {
  it('exports the links, refuses a file with a bad row, and adds only the new link from a good one', async () => {
    const sup = await openSignedIn(session.browser, baseUrl, DESKTOP, 'supervisor@example.test', 'supervisor');
    const { page } = sup;
    await page.goto(`${baseUrl}/assets/import`);

    const download = page.waitForEvent('download');
    await page.getByTestId('connections-export-csv').click();
    const file = await download;
    expect(file.suggestedFilename()).toMatch(/^isoledger-connections-\d{4}-\d{2}-\d{2}\.csv$/);
    const rows = parse(fs.readFileSync((await file.path())!, 'utf8'), { columns: true, bom: true }) as Record<string, string>[];
    // The demo's boiler house: the gas main through the emergency control valve to the boiler house valve, among others.
    expect(rows).toEqual(expect.arrayContaining([expect.objectContaining({ from: 'GS-01', to: 'ECV-01', medium: 'gas' })]));
    const site = rows[0].site;

    const write = (name: string, table: Record<string, string>[]) => {
      const p = path.join(tmp, name);
      fs.writeFileSync(p, stringify(table, { header: true, columns: ['site', 'from', 'to', 'medium'] }));
      return p;
    };
    const choose = async (file: string) => {
      const chooser = page.waitForEvent('filechooser');
      await page.getByTestId('connections-import-choose').click();
      await (await chooser).setFiles(file);
    };
    // The primary pump into the flow header: both carry heating water, and the demo has not drawn it.
    const newLink = { site, from: 'P-01A', to: 'FH-01', medium: 'Heating flow' };

    await choose(write('bad.csv', [rows[0], newLink, { site, from: 'XX-99', to: 'FH-01', medium: 'heating-flow' }]));
    const problems = page.getByTestId('connections-import-error-table');
    await problems.waitFor();
    // Row numbers count the header as row 1, so the third data row is row 4.
    await expect(problems.getByRole('row').filter({ hasText: 'XX-99' }).first().textContent()).resolves.toMatch(/^4/);
    await expect(page.getByTestId('connections-import-run').count()).resolves.toBe(0);
    await screenshot(page, 'connections-import-errors-1440');

    await choose(write('good.csv', [rows[0], rows[1], newLink]));
    await page.getByTestId('connections-import-run').waitFor();
    await expect(page.getByTestId('connections-import-created').textContent()).resolves.toMatch(/^1/);
    await expect(page.getByTestId('connections-import-unchanged').textContent()).resolves.toMatch(/^2/);
    await page.getByTestId('connections-import-run').click();
    await page.getByText('1 added; 2 already recorded.').waitFor();
    await screenshot(page, 'connections-import-done-1440');

    const token = await apiToken(baseUrl, 'supervisor@example.test');
    const pump = (await api<ListResponse<Asset>>(baseUrl, token, `/assets?q=P-01A&pageSize=50`)).items.find((a) => a.plantId === 'P-01A')!;
    const links = await api<AssetConnections>(baseUrl, token, `/assets/${pump.id}/connections`);
    expect(JSON.stringify(links)).toContain('FH-01');
    expectClean(sup);
  });
});
