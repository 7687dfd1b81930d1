/** Native builds do not save exports to the device; the export is a web-app task. Returns false so the screen can say so. */
export function saveFile(_blob: Blob, _fileName: string): boolean {
  return false;
}
