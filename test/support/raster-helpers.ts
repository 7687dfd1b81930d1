// Helpers for tests that check printed output the way a reader would: rasterise with poppler's
// pdftoppm, then look at pixels and decode QR symbols with jsQR.
import { execFileSync } from 'node:child_process';
import { readFileSync, readdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import jsQR, { type QRCode } from 'jsqr';
import { PNG } from 'pngjs';

export const RENDER_DPI = 300;
export const PX_PER_MM = RENDER_DPI / 25.4;

export interface Gray {
  width: number;
  height: number;
  /** Luma, 0 = black, 255 = white. */
  luma: Uint8Array;
}

/** Writes the PDF into `dir` and returns its pages as PNGs, in page order. */
export function rasterisePdf(pdf: Buffer, dir: string, name: string): PNG[] {
  const pdfPath = path.join(dir, `${name}.pdf`);
  writeFileSync(pdfPath, pdf);
  execFileSync('/usr/bin/pdftoppm', ['-r', String(RENDER_DPI), '-png', pdfPath, path.join(dir, name)]);
  // pdftoppm names pages name-1.png or name-01.png depending on the page count.
  const pageOf = (f: string) => Number(/-(\d+)\.png$/.exec(f)![1]);
  return readdirSync(dir)
    .filter((f) => f.startsWith(`${name}-`) && f.endsWith('.png'))
    .sort((a, b) => pageOf(a) - pageOf(b))
    .map((f) => PNG.sync.read(readFileSync(path.join(dir, f))));
}

export function toGray(png: { width: number; height: number; data: Uint8Array | Buffer }): Gray {
  const luma = new Uint8Array(png.width * png.height);
  for (let i = 0; i < luma.length; i++) {
    const r = png.data[i * 4];
    const g = png.data[i * 4 + 1];
    const b = png.data[i * 4 + 2];
    luma[i] = Math.round(0.299 * r + 0.587 * g + 0.114 * b);
  }
  return { width: png.width, height: png.height, luma };
}

/** Pixel box of a rectangle given in mm from the page's top-left corner. */
export function mmBox(xMm: number, yMm: number, wMm: number, hMm: number) {
  const x = Math.round(xMm * PX_PER_MM);
  const y = Math.round(yMm * PX_PER_MM);
  return { x, y, width: Math.round((xMm + wMm) * PX_PER_MM) - x, height: Math.round((yMm + hMm) * PX_PER_MM) - y };
}

export function crop(img: Gray, box: { x: number; y: number; width: number; height: number }): Gray {
  const luma = new Uint8Array(box.width * box.height);
  for (let row = 0; row < box.height; row++) {
    const start = (box.y + row) * img.width + box.x;
    luma.set(img.luma.subarray(start, start + box.width), row * box.width);
  }
  return { width: box.width, height: box.height, luma };
}

export function decodeQr(img: Gray): QRCode | null {
  const rgba = new Uint8ClampedArray(img.width * img.height * 4);
  for (let i = 0; i < img.luma.length; i++) {
    rgba.fill(img.luma[i], i * 4, i * 4 + 3);
    rgba[i * 4 + 3] = 255;
  }
  return jsQR(rgba, img.width, img.height, { inversionAttempts: 'dontInvert' });
}

export const isDark = (v: number) => v < 128;

/** Bounding box of dark pixels inside `box` (clipped to the image), or null when there are none. */
export function darkBox(img: Gray, box: { x0: number; y0: number; x1: number; y1: number }) {
  let found: { x0: number; y0: number; x1: number; y1: number } | null = null;
  for (let y = Math.max(0, box.y0); y <= Math.min(img.height - 1, box.y1); y++) {
    for (let x = Math.max(0, box.x0); x <= Math.min(img.width - 1, box.x1); x++) {
      if (!isDark(img.luma[y * img.width + x])) continue;
      if (!found) found = { x0: x, y0: y, x1: x, y1: y };
      else {
        found.x0 = Math.min(found.x0, x);
        found.y0 = Math.min(found.y0, y);
        found.x1 = Math.max(found.x1, x);
        found.y1 = Math.max(found.y1, y);
      }
    }
  }
  return found;
}
