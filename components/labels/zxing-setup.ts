/** Native builds scan with the platform's own barcode reader: nothing to prepare. */
export function prepareScannerWasm(): Promise<void> {
  return Promise.resolve();
}
