import { createHash } from 'node:crypto';
import { mkdtempSync, readFileSync, readdirSync, rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { copyZxingWasm, locateZxingWasm, zxingWasmFileName } from '@/scripts/lib/zxing-wasm';

const req = createRequire(import.meta.url);
// What the browser-side loader inside barcode-detector was built against.
const detector = req('barcode-detector/ponyfill') as { ZXING_WASM_VERSION: string; ZXING_WASM_SHA256: string };

let dir: string;
beforeAll(() => {
  dir = mkdtempSync(path.join(os.tmpdir(), 'zxing-'));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('copyZxingWasm', () => {
  it('copies the reader binary barcode-detector was built for, named with its version', async () => {
    const out = path.join(dir, 'web', 'static');
    const { fileName, version } = copyZxingWasm(out);
    expect(version).toBe(detector.ZXING_WASM_VERSION);
    expect(fileName).toBe(zxingWasmFileName(version));
    expect(fileName).toContain(version);
    expect(readdirSync(out)).toEqual([fileName]);

    const bytes = readFileSync(path.join(out, fileName));
    expect(createHash('sha256').update(bytes).digest('hex')).toBe(detector.ZXING_WASM_SHA256);
    // WebAssembly Core Specification 5.5.16: a module starts with the magic "\0asm".
    expect(bytes.subarray(0, 4)).toEqual(Buffer.from([0x00, 0x61, 0x73, 0x6d]));
    expect(WebAssembly.validate(bytes)).toBe(true);
  });

  it('locates the binary inside the zxing-wasm package', () => {
    const { wasmPath } = locateZxingWasm();
    expect(wasmPath.split(path.sep)).toContain('zxing-wasm');
    expect(path.basename(wasmPath)).toBe('zxing_reader.wasm');
  });
});
