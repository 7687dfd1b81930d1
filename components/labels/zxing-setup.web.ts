import { prepareZXingModule, ZXING_WASM_VERSION } from 'barcode-detector';

/**
 * On the web, expo-camera reads QR codes with the `barcode-detector` package when the browser has no built-in
 * BarcodeDetector. Its reader loads a .wasm file, by default from a public CDN; Isoledger never loads code from a
 * third party, so point it at the copy the build puts in dist/wasm/ (scripts/lib/web-build.ts). Same module
 * specifier as expo-camera's own import, so both share one instance. Must run before the camera view mounts.
 */
let prepared = false;

export function prepareScannerWasm() {
  if (prepared) return;
  prepared = true;
  prepareZXingModule({
    overrides: {
      locateFile: (path: string, prefix: string) =>
        path === 'zxing_reader.wasm' ? new URL(`/wasm/zxing_reader-${ZXING_WASM_VERSION}.wasm`, document.baseURI).href : prefix + path,
    },
  });
}
