import zlib from 'node:zlib';
import sharp from 'sharp';

/** A small JPEG carrying EXIF: a maker tag, a GPS position and, if asked, an orientation. */
export function jpegWithGps(opts: { width?: number; height?: number; orientation?: number } = {}) {
  let img = sharp({ create: { width: opts.width ?? 64, height: opts.height ?? 48, channels: 3, background: '#6080a0' } }).jpeg();
  if (opts.orientation) img = img.withMetadata({ orientation: opts.orientation });
  return img
    .withExifMerge({
      IFD0: { Make: 'Test camera' },
      IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '51/1 30/1 0/1', GPSLongitudeRef: 'W', GPSLongitude: '0/1 7/1 0/1' },
    })
    .toBuffer();
}

/**
 * The GPS latitude in an EXIF block (as sharp's metadata().exif returns it: "Exif\0\0" + TIFF), or null.
 * Walks IFD0 to the GPS IFD pointer (tag 0x8825) and reads GPSLatitude (tag 0x0002), per the TIFF 6.0 /
 * EXIF 2.32 layout: 12-byte entries of tag, type, count and value-or-offset.
 */
export function exifGpsLatitude(exif: Buffer | undefined): number[] | null {
  if (!exif || exif.toString('latin1', 0, 4) !== 'Exif') return null;
  const tiff = exif.subarray(6);
  const le = tiff.toString('latin1', 0, 2) === 'II';
  const u16 = (o: number) => (le ? tiff.readUInt16LE(o) : tiff.readUInt16BE(o));
  const u32 = (o: number) => (le ? tiff.readUInt32LE(o) : tiff.readUInt32BE(o));
  const entries = (ifd: number) => Array.from({ length: u16(ifd) }, (_, i) => ifd + 2 + i * 12);
  const gpsEntry = entries(u32(4)).find((e) => u16(e) === 0x8825);
  if (gpsEntry === undefined) return null;
  const lat = entries(u32(gpsEntry + 8)).find((e) => u16(e) === 0x0002);
  if (lat === undefined) return null;
  const offset = u32(lat + 8);
  return [0, 1, 2].map((i) => u32(offset + i * 8) / u32(offset + i * 8 + 4));
}

function chunk(type: string, data: Buffer): Buffer {
  const body = Buffer.concat([Buffer.from(type, 'latin1'), data]);
  const len = Buffer.alloc(4);
  len.writeUInt32BE(data.length);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(zlib.crc32(body) >>> 0);
  return Buffer.concat([len, body, crc]);
}

/**
 * A PNG of a few hundred bytes whose header claims width × height (PNG spec, ISO/IEC 15948: signature,
 * IHDR, IDAT, IEND). The pixel data is cut short, so only something that decodes it would notice.
 */
export function pngClaiming(width: number, height: number): Buffer {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr[8] = 8; // bit depth
  ihdr[9] = 2; // truecolour
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', ihdr),
    chunk('IDAT', zlib.deflateSync(Buffer.alloc(1 + width * 3))),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}
