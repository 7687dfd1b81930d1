/**
 * On the web, expo-camera reads QR codes with the `barcode-detector` package when the browser has no built-in
 * BarcodeDetector. Its reader loads a .wasm file, by default from a public CDN; Isoledger never loads code from a
 * third party, so point it at the copy the build puts in dist/wasm/ (scripts/lib/web-build.ts). Same module
 * specifier as expo-camera's own import, so both share one instance; imported the same way (`import()`) so the
 * reader stays in a script of its own instead of the one every page loads. Must finish before the camera view mounts.
 */
let prepared: Promise<void> | null = null;

export function prepareScannerWasm(): Promise<void> {
  prepared ??= import('barcode-detector').then(({ prepareZXingModule, ZXING_WASM_VERSION }) => {
    prepareZXingModule({
      overrides: {
        locateFile: (path: string, prefix: string) =>
          path === 'zxing_reader.wasm' ? new URL(`/wasm/zxing_reader-${ZXING_WASM_VERSION}.wasm`, document.baseURI).href : prefix + path,
      },
    });
  });
  return prepared;
}
