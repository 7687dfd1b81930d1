/** Native builds would hand the file to the share sheet; the web app is the supported way to print labels. */
export async function saveBlob(_blob: Blob, _fileName: string) {
  throw new Error('Printing labels is available in the web app.');
}
