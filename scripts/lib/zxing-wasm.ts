// The web app's QR scanner (expo-camera on web → barcode-detector → ZXing compiled to WebAssembly)
// fetches its .wasm at run time, from a public CDN unless told otherwise. We serve it from our own
// origin instead: the build copies the binary next to the web bundle, named with its version so a
// new release never meets a stale cached copy.
import { createHash } from 'node:crypto';
import { copyFileSync, existsSync, mkdirSync, readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';

/** Name the ZXing loader asks for; the app's locateFile override maps it to `zxingWasmFileName(version)`. */
export const ZXING_READER_WASM = 'zxing_reader.wasm';

export function zxingWasmFileName(version: string): string {
  return `zxing_reader-${version}.wasm`;
}

export interface ZxingWasmSource {
  wasmPath: string;
  version: string;
  sha256: string;
}

function packageRoot(file: string, name: string): string {
  for (let dir = path.dirname(file); dir !== path.dirname(dir); dir = path.dirname(dir)) {
    const manifest = path.join(dir, 'package.json');
    if (existsSync(manifest) && JSON.parse(readFileSync(manifest, 'utf8')).name === name) return dir;
  }
  throw new Error(`No ${name} package.json above ${file}`);
}

/**
 * Finds the reader binary of the zxing-wasm that barcode-detector itself depends on, and checks it
 * against the version and SHA-256 that barcode-detector's bundled loader was built for: the loader
 * and the binary must match exactly or instantiation fails in the browser.
 */
export function locateZxingWasm(): ZxingWasmSource {
  const req = createRequire(import.meta.url);
  const detectorEntry = req.resolve('barcode-detector');
  const wasmPath = req.resolve(`zxing-wasm/reader/${ZXING_READER_WASM}`, { paths: [path.dirname(detectorEntry)] });
  const version: string = JSON.parse(readFileSync(path.join(packageRoot(wasmPath, 'zxing-wasm'), 'package.json'), 'utf8')).version;
  const sha256 = createHash('sha256').update(readFileSync(wasmPath)).digest('hex');

  const expected = req(req.resolve('barcode-detector/ponyfill', { paths: [path.dirname(detectorEntry)] })) as {
    ZXING_WASM_VERSION: string;
    ZXING_WASM_SHA256: string;
  };
  if (expected.ZXING_WASM_VERSION !== version || expected.ZXING_WASM_SHA256 !== sha256) {
    throw new Error(
      `barcode-detector expects zxing-wasm ${expected.ZXING_WASM_VERSION} (sha256 ${expected.ZXING_WASM_SHA256}), ` +
        `found ${version} (sha256 ${sha256}) at ${wasmPath}`,
    );
  }
  return { wasmPath, version, sha256 };
}

/** Copies the reader binary into `destDir` as `zxing_reader-<version>.wasm`. */
export function copyZxingWasm(destDir: string): { fileName: string; version: string } {
  const { wasmPath, version } = locateZxingWasm();
  const fileName = zxingWasmFileName(version);
  mkdirSync(destDir, { recursive: true });
  copyFileSync(wasmPath, path.join(destDir, fileName));
  return { fileName, version };
}
