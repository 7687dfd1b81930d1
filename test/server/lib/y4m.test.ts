import { mkdtempSync, readFileSync, rmSync, statSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PNG } from 'pngjs';
import QRCode from 'qrcode';
import { writeY4mFromPng } from '@/test/e2e/support/y4m';
import { decodeQr } from '@/test/support/raster-helpers';

let dir: string;
beforeAll(() => {
  dir = mkdtempSync(path.join(os.tmpdir(), 'y4m-'));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function solidPng(width: number, height: number, rgba: [number, number, number, number]): Buffer {
  const png = new PNG({ width, height });
  for (let i = 0; i < width * height; i++) png.data.set(rgba, i * 4);
  return PNG.sync.write(png);
}

/** Splits a file into header and frames, checking each frame's marker. */
function readY4m(file: string, width: number, height: number) {
  const buf = readFileSync(file);
  const headerEnd = buf.indexOf(0x0a) + 1;
  const frameSize = 6 + width * height * 1.5;
  const frames: { y: Buffer; u: Buffer; v: Buffer }[] = [];
  for (let off = headerEnd; off < buf.length; off += frameSize) {
    expect(buf.subarray(off, off + 6).toString('ascii')).toBe('FRAME\n');
    const y = buf.subarray(off + 6, off + 6 + width * height);
    const u = buf.subarray(off + 6 + width * height, off + 6 + width * height * 1.25);
    const v = buf.subarray(off + 6 + width * height * 1.25, off + frameSize);
    frames.push({ y, u, v });
  }
  return { header: buf.subarray(0, headerEnd).toString('ascii'), frames };
}

describe('writeY4mFromPng', () => {
  it('writes the stream header and whole 4:2:0 frames', () => {
    const file = path.join(dir, 'white.y4m');
    writeY4mFromPng(solidPng(10, 10, [255, 255, 255, 255]), file, { width: 640, height: 480, frames: 3, fps: 15 });
    const header = 'YUV4MPEG2 W640 H480 F15:1 Ip A1:1 C420jpeg\n';
    // YUV4MPEG2: each frame is "FRAME\n" then Y (w·h), Cb (w·h/4) and Cr (w·h/4) bytes.
    expect(statSync(file).size).toBe(header.length + 3 * (6 + 640 * 480 * 1.5));
    const { header: read, frames } = readY4m(file, 640, 480);
    expect(read).toBe(header);
    expect(frames).toHaveLength(3);
  });

  it('gives white Y = 255, Cb = Cr = 128 and pure red Y = 76, Cb = 85, Cr = 255 where the image sits', () => {
    const file = path.join(dir, 'red.y4m');
    // 4 × 4 red on an 8 × 8 canvas lands at (2, 2)–(5, 5): the middle 2 × 2 chroma blocks.
    writeY4mFromPng(solidPng(4, 4, [255, 0, 0, 255]), file, { width: 8, height: 8, frames: 1, fps: 1 });
    const [{ y, u, v }] = readY4m(file, 8, 8).frames;
    const inImage = (x: number, row: number) => x >= 2 && x <= 5 && row >= 2 && row <= 5;
    for (let row = 0; row < 8; row++) {
      for (let x = 0; x < 8; x++) {
        // ITU-T T.871 clause 7: Y = 0.299 R + 0.587 G + 0.114 B → white 255, red 0.299 × 255 = 76.2
        expect(y[row * 8 + x], `Y at ${x},${row}`).toBe(inImage(x, row) ? 76 : 255);
      }
    }
    for (let row = 0; row < 4; row++) {
      for (let x = 0; x < 4; x++) {
        const red = x >= 1 && x <= 2 && row >= 1 && row <= 2;
        // ITU-T T.871 clause 7: Cb = 128 − 0.168736 R − 0.331264 G + 0.5 B → red 85; Cr = 128 + 0.5 R − … → red 255.5, clipped to 255
        expect([u[row * 4 + x], v[row * 4 + x]], `chroma at ${x},${row}`).toEqual(red ? [85, 255] : [128, 128]);
      }
    }
  });

  it('blends transparency onto white', () => {
    const file = path.join(dir, 'clear.y4m');
    writeY4mFromPng(solidPng(4, 4, [0, 0, 0, 0]), file, { width: 4, height: 4, frames: 1, fps: 1 });
    const [{ y, u, v }] = readY4m(file, 4, 4).frames;
    expect([...y]).toEqual(new Array(16).fill(255));
    expect([...u, ...v]).toEqual(new Array(8).fill(128));
  });

  it('keeps a QR code readable in the luma plane', async () => {
    const url = 'https://plant.example.org/l/7KXM4HAPR2WC';
    const png = await QRCode.toBuffer(url, { type: 'png', errorCorrectionLevel: 'Q', margin: 4, scale: 6 });
    const file = path.join(dir, 'qr.y4m');
    writeY4mFromPng(png, file, { width: 640, height: 480, frames: 2, fps: 10 });
    const { frames } = readY4m(file, 640, 480);
    expect(frames[1].y.equals(frames[0].y)).toBe(true);
    const qr = decodeQr({ width: 640, height: 480, luma: new Uint8Array(frames[0].y) });
    expect(qr?.data).toBe(url);
    // Centred: the symbol's middle sits at the frame's middle.
    const { topLeftCorner: tl, bottomRightCorner: br } = qr!.location;
    expect((tl.x + br.x) / 2).toBeCloseTo(320, -1);
    expect((tl.y + br.y) / 2).toBeCloseTo(240, -1);
  });

  it('refuses odd frame sizes and images larger than the frame', () => {
    const png = solidPng(10, 10, [255, 255, 255, 255]);
    expect(() => writeY4mFromPng(png, path.join(dir, 'odd.y4m'), { width: 641, height: 480, frames: 1, fps: 1 })).toThrow(/even/);
    expect(() => writeY4mFromPng(png, path.join(dir, 'big.y4m'), { width: 8, height: 8, frames: 1, fps: 1 })).toThrow(/does not fit/);
    expect(() => writeY4mFromPng(png, path.join(dir, 'zero.y4m'), { width: 640, height: 480, frames: 0, fps: 1 })).toThrow();
  });
});
