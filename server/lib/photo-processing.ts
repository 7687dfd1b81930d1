import sharp, { type Metadata } from 'sharp';
import { HttpError } from '@/server/lib/http-error';
import { WorkLimit } from '@/server/lib/work-limit';

export const MAX_PHOTO_BYTES = 10 * 1024 * 1024;
/** 40 megapixels: above any phone camera in use, far below what would exhaust memory when decoded. */
export const MAX_PHOTO_PIXELS = 40_000_000;
/** Longest edge kept; plenty to read a rating plate, a fraction of a full-size phone photo's bytes. */
export const STORED_MAX_EDGE = 2560;
export const THUMBNAIL_EDGE = 320;

export interface ProcessedPhoto {
  image: Buffer;
  width: number;
  height: number;
  thumbnail: Buffer;
}

const unsupported = (message: string) => new HttpError(415, 'unsupported-image', message);
const ACCEPTED_TEXT = 'JPEG, PNG, WebP or AVIF';

/**
 * Checks what the bytes are (never the file name or the declared type), refuses anything too large to
 * decode safely, then re-encodes to JPEG: upright by its EXIF orientation, every metadata block
 * (EXIF with GPS position, XMP, IPTC, comments) left behind, plus a thumbnail.
 */
export function processPhoto(input: Buffer): Promise<ProcessedPhoto> {
  return imageWork.run(() => decodeAndEncode(input));
}

/**
 * Decoding a 40-megapixel image takes about 160 MB and a core: two run at once, four wait (each holding its upload of
 * up to 10 MB), and anything more is told to come back (503 with Retry-After).
 */
export const imageWork = new WorkLimit({
  concurrency: 2,
  queue: 4,
  retryAfterSeconds: 10,
  busyMessage: 'The server is busy processing other photos. Try again in a few seconds.',
});

async function decodeAndEncode(input: Buffer): Promise<ProcessedPhoto> {
  let meta: Metadata;
  try {
    // Reads the header only, so no pixel limit is needed yet; the dimensions are checked just below.
    meta = await sharp(input, { limitInputPixels: false }).metadata();
  } catch {
    throw unsupported(`This file is not an image we can read. Photos must be ${ACCEPTED_TEXT}.`);
  }
  if (meta.format === 'heif' && meta.compression !== 'av1') {
    throw unsupported(`HEIC photos cannot be read here. Set the camera to save JPEG ("most compatible") or export the photo as JPEG, then upload it again.`);
  }
  if (!['jpeg', 'png', 'webp', 'heif'].includes(meta.format ?? '')) {
    throw unsupported(`This is a ${String(meta.format ?? 'unknown').toUpperCase()} file. Photos must be ${ACCEPTED_TEXT}.`);
  }
  const width = meta.width ?? 0;
  const height = meta.height ?? 0;
  if (!width || !height || width * height > MAX_PHOTO_PIXELS) {
    throw new HttpError(422, 'image-too-large', `The image is ${width} × ${height} pixels; the most accepted is ${MAX_PHOTO_PIXELS / 1e6} megapixels. Resize it and upload it again.`);
  }
  try {
    const { data: image, info } = await sharp(input, { limitInputPixels: MAX_PHOTO_PIXELS, failOn: 'error', autoOrient: true })
      .resize({ width: STORED_MAX_EDGE, height: STORED_MAX_EDGE, fit: 'inside', withoutEnlargement: true })
      .flatten({ background: '#ffffff' })
      .jpeg({ quality: 82, mozjpeg: true })
      .toBuffer({ resolveWithObject: true });
    const thumbnail = await sharp(image)
      .resize({ width: THUMBNAIL_EDGE, height: THUMBNAIL_EDGE, fit: 'inside', withoutEnlargement: true })
      .jpeg({ quality: 75, mozjpeg: true })
      .toBuffer();
    return { image, width: info.width, height: info.height, thumbnail };
  } catch (err) {
    if (/pixel limit/i.test(String((err as Error).message))) {
      throw new HttpError(422, 'image-too-large', `The image is larger than ${MAX_PHOTO_PIXELS / 1e6} megapixels.`);
    }
    throw new HttpError(422, 'unreadable-image', 'The image could not be read; it may be damaged. Take or export the photo again.');
  }
}
