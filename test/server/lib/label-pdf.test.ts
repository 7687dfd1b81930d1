import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { PNG } from 'pngjs';
import {
  LABEL_PURPOSE,
  LAYOUTS,
  MIN_MODULE_MM,
  PT_PER_MM,
  QUIET_ZONE_MODULES,
  ROLL_GEOMETRY,
  SHEET_GEOMETRY,
  labelRects,
  planQr,
  renderLabelsPdf,
  toPrintable,
  type LabelRect,
  type PlantLabel,
} from '@/server/lib/label-pdf';
import type { LabelLayout } from '@/shared/schemas/queries';
import { formatLabelCode, generateLabelCode, labelUrl } from '@/shared/rules/label-code';
import { PX_PER_MM, crop, darkBox, decodeQr, isDark, mmBox, rasterisePdf, toGray } from '@/test/support/raster-helpers';

const PUBLIC_URL = 'https://plant.example.org';
const LONG_NAME =
  'Supply and extract air handling unit with thermal wheel heat recovery, steam humidifier and plug fan array TAILWORD';

function makeLabels(count: number): PlantLabel[] {
  return Array.from({ length: count }, (_, i) => {
    const code = generateLabelCode();
    return {
      code,
      url: labelUrl(PUBLIC_URL, code),
      plantId: `PMP-${String(i + 1).padStart(3, '0')}`,
      name: i === 4 ? LONG_NAME : `Heating pump ${i + 1}`,
      site: i === 4 ? 'Northgate Works, East Wing basement plant room behind the loading bay' : 'Northgate Works, Plant Room 2',
    };
  });
}

let dir: string;
beforeAll(() => {
  dir = mkdtempSync(path.join(os.tmpdir(), 'label-pdf-'));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function pdfText(pdfPath: string, rect: LabelRect): string {
  // -r 72 makes pdftotext's pixel crop box come out in PDF points.
  const [x, y, w, h] = [rect.xMm, rect.yMm, rect.widthMm, rect.heightMm].map((v) => String(Math.round(v * PT_PER_MM)));
  const page = String(rect.page + 1);
  return execFileSync('/usr/bin/pdftotext', ['-f', page, '-l', page, '-r', '72', '-x', x, '-y', y, '-W', w, '-H', h, pdfPath, '-'], {
    encoding: 'utf8',
  });
}

/** Decodes every label from the rendered pages and measures its symbol, module size and quiet zone. */
function checkLabels(pages: PNG[], labels: PlantLabel[], layout: LabelLayout) {
  const g = LAYOUTS[layout];
  const rects = labelRects(labels.length, layout);
  expect(pages).toHaveLength(rects[rects.length - 1].page + 1);
  const grays = pages.map(toGray);
  for (const rect of rects) {
    const img = crop(grays[rect.page], mmBox(rect.xMm, rect.yMm, rect.widthMm, rect.heightMm));
    const qr = decodeQr(img);
    expect(qr?.data, `label ${rect.index} (page ${rect.page}, row ${rect.row}, column ${rect.column})`).toBe(labels[rect.index].url);

    const modules = 17 + 4 * qr!.version;
    const corners = Object.values(qr!.location);
    const approxModule = Math.hypot(qr!.location.topRightCorner.x - qr!.location.topLeftCorner.x, qr!.location.topRightCorner.y - qr!.location.topLeftCorner.y) / modules;
    const xs = corners.map((p) => p.x);
    const ys = corners.map((p) => p.y);
    const symbol = darkBox(img, {
      x0: Math.floor(Math.min(...xs) - approxModule),
      y0: Math.floor(Math.min(...ys) - approxModule),
      x1: Math.ceil(Math.max(...xs) + approxModule),
      y1: Math.ceil(Math.max(...ys) + approxModule),
    })!;
    const modulePx = (symbol.x1 - symbol.x0 + 1) / modules;
    expect((symbol.y1 - symbol.y0 + 1) / modules).toBeCloseTo(modulePx, 0);
    expect(modulePx / PX_PER_MM).toBeGreaterThanOrEqual(MIN_MODULE_MM);

    // ISO/IEC 18004: quiet zone of 4 modules, free of any mark, on all four sides (1 px allowed for anti-aliasing).
    const q = Math.floor(QUIET_ZONE_MODULES * modulePx) - 1;
    const band = { x0: symbol.x0 - q, y0: symbol.y0 - q, x1: symbol.x1 + q, y1: symbol.y1 + q };
    expect(band.x0).toBeGreaterThanOrEqual(0);
    expect(band.y0).toBeGreaterThanOrEqual(0);
    expect(band.x1).toBeLessThan(img.width);
    expect(band.y1).toBeLessThan(img.height);
    expect(darkBox(img, band)).toEqual(symbol);
  }

  // Nothing is printed outside the labels' padded inner area: no text overflow, nothing on the gaps.
  const tolerancePx = 2;
  for (const [pageIndex, page] of grays.entries()) {
    const allowed = new Uint8Array(page.width * page.height);
    for (const r of rects.filter((rect) => rect.page === pageIndex)) {
      const b = mmBox(r.xMm + g.paddingMm, r.yMm + g.paddingMm, r.widthMm - 2 * g.paddingMm, r.heightMm - 2 * g.paddingMm);
      for (let y = b.y - tolerancePx; y < b.y + b.height + tolerancePx; y++) {
        allowed.fill(1, y * page.width + b.x - tolerancePx, y * page.width + b.x + b.width + tolerancePx);
      }
    }
    let stray = 0;
    for (let i = 0; i < page.luma.length; i++) if (isDark(page.luma[i]) && !allowed[i]) stray++;
    expect(stray, `dark pixels outside labels on page ${pageIndex + 1}`).toBe(0);
  }
}

describe('label geometry', () => {
  it('lays out A4 with 3 × 7 labels of 63.5 × 38.1 mm that add up to the page', () => {
    const g = SHEET_GEOMETRY;
    // ISO 216: A4 is 210 × 297 mm
    expect([g.pageWidthMm, g.pageHeightMm]).toEqual([210, 297]);
    // common practice, no published source: 21-up A4 label sheet, 63.5 × 38.1 mm, 3 columns × 7 rows,
    // top margin 15.15 mm, horizontal pitch 66.0 mm (2.5 mm gap), vertical pitch 38.1 mm
    expect([g.labelWidthMm, g.labelHeightMm, g.columns, g.rows]).toEqual([63.5, 38.1, 3, 7]);
    expect([g.topMarginMm, g.horizontalPitchMm, g.verticalPitchMm]).toEqual([15.15, 66.0, 38.1]);
    expect(g.horizontalPitchMm - g.labelWidthMm).toBeCloseTo(2.5, 9);
    // Equal margins left/right and top/bottom account for the whole page.
    expect(2 * g.leftMarginMm + (g.columns - 1) * g.horizontalPitchMm + g.labelWidthMm).toBeCloseTo(210, 9);
    expect(2 * g.topMarginMm + (g.rows - 1) * g.verticalPitchMm + g.labelHeightMm).toBeCloseTo(297, 9);
  });

  it('orders labels row by row and starts a new page after 21', () => {
    const rects = labelRects(23, 'sheet');
    expect(rects.slice(0, 4).map((r) => [r.page, r.row, r.column])).toEqual([[0, 0, 0], [0, 0, 1], [0, 0, 2], [0, 1, 0]]);
    expect(rects[20]).toMatchObject({ page: 0, row: 6, column: 2, xMm: 7.25 + 2 * 66, yMm: 15.15 + 6 * 38.1 });
    expect(rects[21]).toMatchObject({ page: 1, row: 0, column: 0, xMm: 7.25, yMm: 15.15 });
  });

  it('puts one 62 mm wide label on each roll page', () => {
    // common practice, no published source: 62 mm continuous label roll
    expect(ROLL_GEOMETRY.pageWidthMm).toBe(62);
    expect(labelRects(3, 'roll').map((r) => [r.page, r.xMm, r.yMm, r.widthMm, r.heightMm])).toEqual([
      [0, 0, 0, 62, ROLL_GEOMETRY.pageHeightMm],
      [1, 0, 0, 62, ROLL_GEOMETRY.pageHeightMm],
      [2, 0, 0, 62, ROLL_GEOMETRY.pageHeightMm],
    ]);
  });
});

describe('planQr', () => {
  it('uses level Q for a typical label URL and keeps modules at 0.5 mm or more', () => {
    const plan = planQr(labelUrl(PUBLIC_URL, generateLabelCode()), 25);
    expect(plan.level).toBe('Q');
    expect(plan.moduleMm).toBeGreaterThanOrEqual(MIN_MODULE_MM);
  });

  it('refuses a URL so long its modules would print under 0.5 mm', () => {
    const url = `https://plant.example.org/${'x'.repeat(300)}/l/${generateLabelCode()}`;
    expect(() => planQr(url, 25)).toThrow(/under 0.5 mm/);
  });
});

describe('toPrintable', () => {
  it('keeps Latin-1 and typographic characters, collapses whitespace, and marks the rest with ?', () => {
    expect(toPrintable('  Kältemaschine \n – Ø 50 €  ')).toBe('Kältemaschine – Ø 50 €');
    expect(toPrintable('Pump ✓ 泵')).toBe('Pump ? ?');
  });
});

describe('renderLabelsPdf', () => {
  // Rasterising two A4 pages at 300 dpi takes a few seconds on a busy machine.
  it('prints 23 labels on two A4 pages, each QR decoding to its own URL in its own cell', { timeout: 90_000 }, async () => {
    const labels = makeLabels(23);
    const pdf = await renderLabelsPdf(labels, 'sheet');
    const pdfPath = path.join(dir, 'sheet-info.pdf');
    writeFileSync(pdfPath, pdf);
    const info = execFileSync('/usr/bin/pdfinfo', [pdfPath], { encoding: 'utf8' });
    // ISO 216: A4 = 210 × 297 mm = 595.276 × 841.890 pt
    expect(info).toMatch(/Page size:\s+595\.27\d x 841\.8\d pts/);
    expect(info).toMatch(/Pages:\s+2\n/);
    checkLabels(rasterisePdf(pdf, dir, 'sheet'), labels, 'sheet');

    for (const rect of labelRects(labels.length, 'sheet')) {
      const text = pdfText(pdfPath, rect);
      expect(text).toContain(labels[rect.index].plantId);
      expect(text).toContain(formatLabelCode(labels[rect.index].code));
    }
  });

  it('cuts a very long item name with an ellipsis instead of running off the label', async () => {
    const labels = makeLabels(6);
    const pdfPath = path.join(dir, 'long-name.pdf');
    writeFileSync(pdfPath, await renderLabelsPdf(labels, 'sheet'));
    const text = pdfText(pdfPath, labelRects(6, 'sheet')[4]);
    expect(text).toContain('Supply and extract');
    expect(text).toContain('\u2026');
    expect(text).not.toContain('TAILWORD');
    expect(pdfText(pdfPath, labelRects(6, 'sheet')[3])).not.toContain('\u2026');
  });

  it('prints accented and typographic characters the built-in fonts carry', async () => {
    const [label] = makeLabels(1);
    const pdfPath = path.join(dir, 'accents.pdf');
    writeFileSync(pdfPath, await renderLabelsPdf([{ ...label, name: 'Kältemaschine – Ø 50' }], 'roll'));
    expect(pdfText(pdfPath, labelRects(1, 'roll')[0])).toContain('Kältemaschine – Ø 50');
  });

  it('says on every label, sheet and roll, what the code is for', async () => {
    const [label] = makeLabels(1);
    for (const layout of ['sheet', 'roll'] as const) {
      const pdfPath = path.join(dir, `purpose-${layout}.pdf`);
      writeFileSync(pdfPath, await renderLabelsPdf([label], layout));
      // common practice, no published source: a code nobody knows the purpose of is not scanned.
      expect(pdfText(pdfPath, labelRects(1, layout)[0]).replace(/\s+/g, ' ')).toContain(LABEL_PURPOSE);
    }
  });

  it('prints a roll with one 62 mm label per page', async () => {
    const labels = makeLabels(5);
    const pages = rasterisePdf(await renderLabelsPdf(labels, 'roll'), dir, 'roll');
    for (const page of pages) {
      expect(page.width).toBeCloseTo(62 * PX_PER_MM, -1);
      expect(page.height).toBeCloseTo(ROLL_GEOMETRY.pageHeightMm * PX_PER_MM, -1);
    }
    checkLabels(pages, labels, 'roll');
  });

  it('refuses a label whose URL does not carry its code, and an empty batch', async () => {
    const [a, b] = makeLabels(2);
    await expect(renderLabelsPdf([{ ...a, url: b.url }], 'roll')).rejects.toThrow(/does not carry code/);
    await expect(renderLabelsPdf([], 'sheet')).rejects.toThrow();
  });
});
