// Turns a still PNG into a YUV4MPEG2 (.y4m) clip that Chromium can play as a fake camera
// (--use-file-for-fake-video-capture), so end-to-end tests can hold a label up to the scanner.
import { closeSync, openSync, writeSync } from 'node:fs';
import { PNG } from 'pngjs';

export interface Y4mOptions {
  /** Frame size in pixels; both must be even for 4:2:0 chroma. */
  width: number;
  height: number;
  frames: number;
  /** Whole frames per second. */
  fps: number;
}

const clamp = (v: number) => (v < 0 ? 0 : v > 255 ? 255 : Math.round(v));

// ITU-T T.871 (JFIF) clause 7: full-range Y'CbCr from 8-bit R'G'B' with the ITU-R BT.601 luma weights.
export function rgbToYcbcr(r: number, g: number, b: number): [number, number, number] {
  return [
    0.299 * r + 0.587 * g + 0.114 * b,
    128 - 0.168736 * r - 0.331264 * g + 0.5 * b,
    128 + 0.5 * r - 0.418688 * g - 0.081312 * b,
  ];
}

export function y4mHeader({ width, height, fps }: Y4mOptions): string {
  // C420jpeg: 4:2:0 with chroma sited between the four luma samples it covers (JPEG/MPEG-1 siting),
  // which is what averaging each 2 × 2 block gives.
  return `YUV4MPEG2 W${width} H${height} F${fps}:1 Ip A1:1 C420jpeg\n`;
}

/** One frame's Y, Cb and Cr planes: the PNG centred on a white canvas, transparency blended onto white. */
export function framePlanes(pngBuffer: Buffer, width: number, height: number): Buffer {
  const png = PNG.sync.read(pngBuffer);
  if (png.width > width || png.height > height) {
    throw new Error(`Image ${png.width}×${png.height} does not fit a ${width}×${height} frame`);
  }
  const ox = Math.floor((width - png.width) / 2);
  const oy = Math.floor((height - png.height) / 2);
  const rgb = new Uint8Array(width * height * 3).fill(255);
  for (let y = 0; y < png.height; y++) {
    for (let x = 0; x < png.width; x++) {
      const src = (y * png.width + x) * 4;
      const dst = ((oy + y) * width + ox + x) * 3;
      const a = png.data[src + 3] / 255;
      for (let c = 0; c < 3; c++) rgb[dst + c] = Math.round(png.data[src + c] * a + 255 * (1 - a));
    }
  }

  const lumaSize = width * height;
  const chromaW = width / 2;
  const chromaSize = chromaW * (height / 2);
  const planes = Buffer.alloc(lumaSize + 2 * chromaSize);
  for (let i = 0; i < lumaSize; i++) planes[i] = clamp(rgbToYcbcr(rgb[i * 3], rgb[i * 3 + 1], rgb[i * 3 + 2])[0]);
  for (let cy = 0; cy < height / 2; cy++) {
    for (let cx = 0; cx < chromaW; cx++) {
      let r = 0;
      let g = 0;
      let b = 0;
      for (const [dx, dy] of [[0, 0], [1, 0], [0, 1], [1, 1]]) {
        const p = ((2 * cy + dy) * width + 2 * cx + dx) * 3;
        r += rgb[p];
        g += rgb[p + 1];
        b += rgb[p + 2];
      }
      const [, cb, cr] = rgbToYcbcr(r / 4, g / 4, b / 4);
      planes[lumaSize + cy * chromaW + cx] = clamp(cb);
      planes[lumaSize + chromaSize + cy * chromaW + cx] = clamp(cr);
    }
  }
  return planes;
}

function writeAll(fd: number, buf: Buffer): void {
  for (let off = 0; off < buf.length; ) off += writeSync(fd, buf, off);
}

export function writeY4mFromPng(pngBuffer: Buffer, outPath: string, options: Y4mOptions): void {
  const { width, height, frames, fps } = options;
  for (const [name, v] of Object.entries({ width, height, frames, fps })) {
    if (!Number.isInteger(v) || v <= 0) throw new Error(`${name} must be a positive whole number, got ${v}`);
  }
  if (width % 2 || height % 2) throw new Error(`4:2:0 needs an even frame size, got ${width}×${height}`);
  const frame = Buffer.concat([Buffer.from('FRAME\n', 'ascii'), framePlanes(pngBuffer, width, height)]);
  const fd = openSync(outPath, 'w');
  try {
    writeAll(fd, Buffer.from(y4mHeader(options), 'ascii'));
    for (let i = 0; i < frames; i++) writeAll(fd, frame);
  } finally {
    closeSync(fd);
  }
}
