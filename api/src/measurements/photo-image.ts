import ExifTransformer from 'exif-be-gone';
import { imageSize } from 'image-size';
import { Readable } from 'node:stream';
import { MeasurementErrors } from './measurements.errors';

export const PHOTO_TYPES = { jpg: 'image/jpeg', png: 'image/png', webp: 'image/webp' } as const;
export type PhotoExtension = keyof typeof PHOTO_TYPES;

/** A phone camera gives 12–50 megapixels; beyond 100 the file is a decompression trap, not a photo. */
export const MAX_PHOTO_PIXELS = 100_000_000;

export interface CheckedImage {
  extension: PhotoExtension;
  contentType: (typeof PHOTO_TYPES)[PhotoExtension];
  width: number;
  height: number;
}

/**
 * A client's file name as sent (multer keeps the path: `preservePath`). A browser sends the bare name of the file; a
 * name with a folder part (`../`, `/`, `\\`), a NUL or another control character was made by hand, and is refused
 * (the stored file gets a generated name either way).
 */
export function checkClientName(name: string): void {
  // eslint-disable-next-line no-control-regex
  if (/[\\/\u0000-\u001f\u007f]/.test(name) || name === '..') throw MeasurementErrors.photoBadName(name);
}

/**
 * The brands of ISO/IEC 23008-12 (HEIF) files: `mif1` still images, `msf1` image sequences, `heic`/`heix` HEVC-coded
 * images and `hevc`/`hevx` HEVC-coded sequences (what phone cameras save by default).
 */
const HEIF_BRANDS = new Set(['heic', 'heix', 'hevc', 'hevx', 'mif1', 'msf1']);

/**
 * Whether the bytes are a HEIF/HEIC file, by its signature: an ISO base media file (ISO/IEC 14496-12) opens with its
 * `ftyp` box — size (32-bit, big-endian), `ftyp`, the major brand, a minor version, then compatible brands to the
 * box's end — and a HEIF file names one of the HEIF brands as its major or a compatible brand.
 */
export function isHeif(data: Buffer): boolean {
  if (data.length < 16 || data.toString('latin1', 4, 8) !== 'ftyp') return false;
  // A size of 0 means the box runs to the end of the file; brands are read from the first 4 KiB at most.
  const size = data.readUInt32BE(0);
  const boxEnd = Math.min(data.length, size === 0 ? data.length : size, 4096);
  if (boxEnd < 16) return false;
  if (HEIF_BRANDS.has(data.toString('latin1', 8, 12))) return true;
  for (let offset = 16; offset + 4 <= boxEnd; offset += 4) {
    if (HEIF_BRANDS.has(data.toString('latin1', offset, offset + 4))) return true;
  }
  return false;
}

/** Reads the header (not the name): JPEG, PNG or WebP with a sane pixel count and a complete file, else a 4xx. */
export function checkImage(data: Buffer, originalName: string): CheckedImage {
  if (data.length === 0) throw MeasurementErrors.photoEmpty(originalName);
  if (isHeif(data)) throw MeasurementErrors.photoHeif(originalName);
  let size: ReturnType<typeof imageSize>;
  try {
    size = imageSize(data);
  } catch {
    throw MeasurementErrors.photoNotImage(originalName);
  }
  const extension = ({ jpg: 'jpg', png: 'png', webp: 'webp' } as Record<string, PhotoExtension | undefined>)[size.type ?? ''];
  if (!extension) throw MeasurementErrors.photoNotImage(originalName);
  const { width, height } = size;
  if (!width || !height) throw MeasurementErrors.photoNotImage(originalName);
  if (width * height > MAX_PHOTO_PIXELS) throw MeasurementErrors.photoTooManyPixels(originalName, width, height);
  if (!isComplete(data, extension)) throw MeasurementErrors.photoTruncated(originalName);
  return { extension, contentType: PHOTO_TYPES[extension], width, height };
}

/** The end marker each format must have: JPEG's EOI, PNG's IEND chunk, WebP's RIFF length. */
function isComplete(data: Buffer, extension: PhotoExtension): boolean {
  if (extension === 'jpg') {
    // Cameras may pad after EOI: look for it in the last bytes.
    return data.subarray(Math.max(0, data.length - 4096)).includes(Buffer.from([0xff, 0xd9]));
  }
  if (extension === 'png') return data.subarray(Math.max(0, data.length - 64)).includes(Buffer.from('IEND', 'latin1'));
  return data.length >= 12 && data.readUInt32LE(4) + 8 <= data.length;
}

/**
 * WebP: drops the `EXIF` and `XMP ` chunks (where a camera writes the place) and clears their flags in `VP8X`.
 * A RIFF file is `RIFF <size> WEBP` then chunks of `<fourcc><size LE><data, padded to even>`.
 */
export function stripWebpMetadata(data: Buffer): Buffer {
  if (data.length < 12 || data.toString('latin1', 0, 4) !== 'RIFF' || data.toString('latin1', 8, 12) !== 'WEBP') return data;
  const kept: Buffer[] = [];
  let offset = 12;
  while (offset + 8 <= data.length) {
    const fourcc = data.toString('latin1', offset, offset + 4);
    const size = data.readUInt32LE(offset + 4);
    const end = Math.min(data.length, offset + 8 + size + (size % 2));
    if (fourcc !== 'EXIF' && fourcc !== 'XMP ') {
      const chunk = Buffer.from(data.subarray(offset, end));
      // VP8X flags: bit 3 EXIF, bit 2 XMP.
      if (fourcc === 'VP8X' && chunk.length > 8) chunk[8] &= ~(0x08 | 0x04);
      kept.push(chunk);
    }
    offset = end;
  }
  const body = Buffer.concat(kept);
  const header = Buffer.alloc(12);
  header.write('RIFF', 0, 'latin1');
  header.writeUInt32LE(body.length + 4, 4);
  header.write('WEBP', 8, 'latin1');
  return Buffer.concat([header, body]);
}

/** JPEG and PNG through exif-be-gone (one whole buffer: a tiny first chunk misdetects PNG); WebP by chunk. */
export async function stripLocationMetadata(data: Buffer, extension: PhotoExtension): Promise<Buffer> {
  if (extension === 'webp') return stripWebpMetadata(data);
  const parts: Buffer[] = [];
  await new Promise<void>((resolve, reject) => {
    Readable.from([data])
      .pipe(new ExifTransformer())
      .on('data', (chunk: Buffer) => parts.push(chunk))
      .on('end', resolve)
      .on('error', reject);
  });
  return Buffer.concat(parts);
}
