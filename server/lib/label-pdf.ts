// Printable QR labels for plant items, as a PDF: A4 sheets of 21 die-cut labels, or one label per
// page for a 62 mm roll printer. The QR symbol is drawn as filled vector rectangles so it stays
// sharp at any printer resolution.
import PDFDocument from 'pdfkit';
import QRCode from 'qrcode';
import { formatLabelCode } from '@/shared/rules/label-code';
import type { LabelLayout } from '@/shared/schemas/queries';

/** Printed on every label above its code. */
export const LABEL_PURPOSE = 'Scan before work: live tags';

export interface PlantLabel {
  code: string;
  url: string;
  plantId: string;
  name: string;
  site: string;
}

export const PT_PER_MM = 72 / 25.4;

// ISO/IEC 18004 (QR Code symbology): a quiet zone 4 modules wide on every side of the symbol.
export const QUIET_ZONE_MODULES = 4;
// Smallest module we print: at 0.5 mm a 300 dpi printer still spends about 6 dots on each module,
// so print gain and worn heads do not merge neighbouring modules.
export const MIN_MODULE_MM = 0.5;

export interface LayoutGeometry {
  pageWidthMm: number; pageHeightMm: number; columns: number; rows: number;
  labelWidthMm: number; labelHeightMm: number; leftMarginMm: number; topMarginMm: number;
  horizontalPitchMm: number; verticalPitchMm: number;
  /** Clear band kept inside each label's die-cut edge, for printer registration and cutting tolerance. */
  paddingMm: number;
  /** Largest side of the QR square (symbol plus quiet zone); the rest of the width is for text. */
  qrMaxMm: number;
}

// A4 (ISO 216: 210 × 297 mm) sheet of 3 × 7 labels of 63.5 × 38.1 mm, the common 21-up layout
// (common practice, no published source): top margin 15.15 mm, horizontal pitch 66.0 mm (2.5 mm gap),
// vertical pitch 38.1 mm (no gap). Down: 15.15 + 7 × 38.1 + 15.15 = 297. Across, the side margin follows:
// (210 − 2 × 66.0 − 63.5) / 2 = 7.25 mm; a quoted 7.2 mm would leave 0.1 mm unaccounted for.
export const SHEET_GEOMETRY: LayoutGeometry = {
  pageWidthMm: 210, pageHeightMm: 297, columns: 3, rows: 7,
  labelWidthMm: 63.5, labelHeightMm: 38.1, leftMarginMm: 7.25, topMarginMm: 15.15,
  horizontalPitchMm: 66.0, verticalPitchMm: 38.1, paddingMm: 2, qrMaxMm: 28,
};

// Continuous 62 mm roll, cut after each label; 29 mm is enough height for a QR symbol plus six text lines.
export const ROLL_GEOMETRY: LayoutGeometry = {
  pageWidthMm: 62, pageHeightMm: 29, columns: 1, rows: 1,
  labelWidthMm: 62, labelHeightMm: 29, leftMarginMm: 0, topMarginMm: 0,
  horizontalPitchMm: 62, verticalPitchMm: 29, paddingMm: 2, qrMaxMm: 25,
};

export const LAYOUTS: Record<LabelLayout, LayoutGeometry> = { sheet: SHEET_GEOMETRY, roll: ROLL_GEOMETRY };

/** Position of one label, in mm from the top-left corner of its page. */
export interface LabelRect {
  index: number; page: number; row: number; column: number;
  xMm: number; yMm: number; widthMm: number; heightMm: number;
}

export function labelRects(count: number, layout: LabelLayout): LabelRect[] {
  const g = LAYOUTS[layout];
  const perPage = g.columns * g.rows;
  return Array.from({ length: count }, (_, index) => {
    const slot = index % perPage;
    const row = Math.floor(slot / g.columns);
    const column = slot % g.columns;
    return {
      index,
      page: Math.floor(index / perPage),
      row,
      column,
      xMm: g.leftMarginMm + column * g.horizontalPitchMm,
      yMm: g.topMarginMm + row * g.verticalPitchMm,
      widthMm: g.labelWidthMm,
      heightMm: g.labelHeightMm,
    };
  });
}

/** The QR square (symbol plus quiet zone) inside a label: left-aligned, vertically centred. */
export function qrSquare(rect: LabelRect, layout: LabelLayout): { xMm: number; yMm: number; sizeMm: number } {
  const g = LAYOUTS[layout];
  const sizeMm = Math.min(g.qrMaxMm, rect.heightMm - 2 * g.paddingMm);
  return { xMm: rect.xMm + g.paddingMm, yMm: rect.yMm + (rect.heightMm - sizeMm) / 2, sizeMm };
}

export interface QrPlan {
  symbol: QRCode.QRCode;
  level: 'Q' | 'M';
  moduleMm: number;
}

/**
 * Level Q (about 25 % recovery) suits labels that get dirty or scuffed in plant rooms; a URL too long
 * for Q at the minimum module size falls back to M (about 15 %). Below M, or below 0.5 mm, we refuse.
 */
export function planQr(url: string, squareMm: number): QrPlan {
  for (const level of ['Q', 'M'] as const) {
    const symbol = QRCode.create(url, { errorCorrectionLevel: level });
    const moduleMm = squareMm / (symbol.modules.size + 2 * QUIET_ZONE_MODULES);
    if (moduleMm >= MIN_MODULE_MM) return { symbol, level, moduleMm };
  }
  throw new Error(`QR code for ${url} would print modules under ${MIN_MODULE_MM} mm; shorten PUBLIC_URL`);
}

// Code points the PDF standard fonts can show (WinAnsiEncoding, PDF 32000-1:2008 Annex D.2).
const WIN_ANSI_EXTRA = new Set([
  0x152, 0x153, 0x160, 0x161, 0x178, 0x17d, 0x17e, 0x192, 0x2c6, 0x2dc, 0x2013, 0x2014, 0x2018, 0x2019,
  0x201a, 0x201c, 0x201d, 0x201e, 0x2020, 0x2021, 0x2022, 0x2026, 0x2030, 0x2039, 0x203a, 0x20ac, 0x2122,
]);

/** Collapses whitespace and swaps characters the built-in fonts cannot draw for '?'. */
export function toPrintable(text: string): string {
  const collapsed = text.normalize('NFC').replace(/\s+/gu, ' ').trim();
  return Array.from(collapsed, (ch) => {
    const cp = ch.codePointAt(0)!;
    return (cp >= 0x20 && cp <= 0x7e) || (cp >= 0xa0 && cp <= 0xff) || WIN_ANSI_EXTRA.has(cp) ? ch : '?';
  }).join('');
}

const ELLIPSIS = '\u2026';

/** Longest prefix of `text` that fits `maxPt` with the current font, ending in an ellipsis when cut. */
function fitWidth(doc: PDFKit.PDFDocument, text: string, maxPt: number): string {
  if (doc.widthOfString(text) <= maxPt) return text;
  let lo = 0;
  let hi = text.length;
  while (lo < hi) {
    const mid = Math.ceil((lo + hi) / 2);
    if (doc.widthOfString(text.slice(0, mid).trimEnd() + ELLIPSIS) <= maxPt) lo = mid;
    else hi = mid - 1;
  }
  return text.slice(0, lo).trimEnd() + ELLIPSIS;
}

/** Greedy word wrap into at most `maxLines` lines; whatever does not fit ends in an ellipsis. */
function fitLines(doc: PDFKit.PDFDocument, text: string, maxPt: number, maxLines: number): string[] {
  const words = text.split(' ').filter(Boolean);
  const lines: string[] = [];
  let i = 0;
  while (i < words.length && lines.length < maxLines) {
    let line = words[i++];
    while (i < words.length && doc.widthOfString(`${line} ${words[i]}`) <= maxPt) line += ` ${words[i++]}`;
    lines.push(line);
  }
  if (i < words.length) lines[lines.length - 1] += ` ${words.slice(i).join(' ')}`;
  return lines.map((line) => fitWidth(doc, line, maxPt));
}

interface TextBlock {
  font: string;
  size: number;
  text: string;
  maxLines: number;
}

function drawQr(doc: PDFKit.PDFDocument, plan: QrPlan, xMm: number, yMm: number): void {
  const m = plan.moduleMm * PT_PER_MM;
  const { size } = plan.symbol.modules;
  const x0 = xMm * PT_PER_MM + QUIET_ZONE_MODULES * m;
  const y0 = yMm * PT_PER_MM + QUIET_ZONE_MODULES * m;
  // Runs of dark modules in a row become one rectangle; all go into one path filled once, so no
  // hairline seams appear between neighbouring modules when rasterised.
  for (let row = 0; row < size; row++) {
    let col = 0;
    while (col < size) {
      if (!plan.symbol.modules.get(row, col)) {
        col++;
        continue;
      }
      const start = col;
      while (col < size && plan.symbol.modules.get(row, col)) col++;
      doc.rect(x0 + start * m, y0 + row * m, (col - start) * m, m);
    }
  }
  doc.fillColor('#000000').fill();
}

function drawLabel(doc: PDFKit.PDFDocument, label: PlantLabel, rect: LabelRect, layout: LabelLayout): void {
  if (!label.url.endsWith(`/l/${label.code}`)) throw new Error(`Label URL ${label.url} does not carry code ${label.code}`);
  const g = LAYOUTS[layout];
  const square = qrSquare(rect, layout);
  drawQr(doc, planQr(label.url, square.sizeMm), square.xMm, square.yMm);

  const textX = (square.xMm + square.sizeMm) * PT_PER_MM;
  const textW = (rect.xMm + rect.widthMm - g.paddingMm) * PT_PER_MM - textX;
  const code = formatLabelCode(label.code);
  // The code is the fallback when the QR cannot be read, so it gets the largest size that fits the column.
  doc.font('Courier-Bold').fontSize(1);
  // 0.98 keeps rounding in the width measurement from ever triggering the ellipsis on the code.
  const codeSize = Math.min(13, (0.98 * textW) / doc.widthOfString(code));
  const blocks: TextBlock[] = [
    { font: 'Helvetica-Bold', size: 11, text: toPrintable(label.plantId), maxLines: 1 },
    { font: 'Helvetica', size: 8.5, text: toPrintable(label.name), maxLines: 2 },
    // The 29 mm roll has room for the purpose line only with the site on one line.
    { font: 'Helvetica', size: 8.5, text: toPrintable(label.site), maxLines: layout === 'roll' ? 1 : 2 },
    // What the code is for, so someone who has never heard of the product knows why to scan it.
    { font: 'Helvetica-Oblique', size: 6.5, text: LABEL_PURPOSE, maxLines: 1 },
    { font: 'Courier-Bold', size: codeSize, text: code, maxLines: 1 },
  ];
  const lead = 1.25;
  const lines = blocks.flatMap((b) => {
    doc.font(b.font).fontSize(b.size);
    return fitLines(doc, b.text, textW, b.maxLines).map((text) => ({ ...b, text }));
  });
  const blockH = lines.reduce((sum, l) => sum + l.size * lead, 0);
  let y = (rect.yMm + rect.heightMm / 2) * PT_PER_MM - blockH / 2;
  for (const line of lines) {
    doc.font(line.font).fontSize(line.size).fillColor('#000000');
    doc.text(line.text, textX, y, { lineBreak: false });
    y += line.size * lead;
  }
}

export function renderLabelsPdf(labels: PlantLabel[], layout: LabelLayout): Promise<Buffer> {
  if (labels.length === 0) return Promise.reject(new Error('No labels to print'));
  const g = LAYOUTS[layout];
  const pageSize: [number, number] = [g.pageWidthMm * PT_PER_MM, g.pageHeightMm * PT_PER_MM];
  const doc = new PDFDocument({
    autoFirstPage: false,
    size: pageSize,
    margin: 0,
    info: { Title: 'Isoledger plant labels', Creator: 'Isoledger' },
  });
  const chunks: Buffer[] = [];
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('data', (chunk: Buffer) => chunks.push(chunk));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  try {
    let page = -1;
    for (const rect of labelRects(labels.length, layout)) {
      if (rect.page !== page) {
        doc.addPage({ size: pageSize, margin: 0 });
        page = rect.page;
      }
      drawLabel(doc, labels[rect.index], rect, layout);
    }
  } catch (err) {
    doc.end();
    return Promise.reject(err);
  }
  doc.end();
  return done;
}
