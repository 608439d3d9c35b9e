import { deflateSync } from 'node:zlib';
import { pngChunk } from '../../src/database/seed/demo-story/story-photos';
// eslint-disable-next-line @typescript-eslint/no-require-imports
const piexif = require('piexifjs');

/** Test images built byte by byte (no encoder needed): each is a complete file of its format. */


/** An RGB PNG of one colour (PNG spec, ISO/IEC 15948: signature, IHDR, IDAT, IEND). */
export function makePng(width: number, height: number, extraChunks: Buffer[] = []): Buffer {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr[8] = 8; // bit depth
  ihdr[9] = 2; // truecolour
  const row = Buffer.concat([Buffer.from([0]), Buffer.alloc(width * 3, 0x80)]);
  const raw = Buffer.concat(Array.from({ length: height }, () => row));
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    pngChunk('IHDR', ihdr),
    ...extraChunks,
    pngChunk('IDAT', deflateSync(raw)),
    pngChunk('IEND', Buffer.alloc(0)),
  ]);
}

export function pngTextChunk(keyword: string, text: string): Buffer {
  return pngChunk('tEXt', Buffer.from(`${keyword}\0${text}`, 'latin1'));
}

function segment(marker: number, data: Buffer): Buffer {
  const head = Buffer.from([0xff, marker, 0, 0]);
  head.writeUInt16BE(data.length + 2, 2);
  return Buffer.concat([head, data]);
}

/**
 * A flat grey baseline JPEG (ITU-T T.81): one component, Huffman tables with a single code each, so every 8×8
 * block is "DC difference 0, end of block" = two bits.
 */
export function makeJpeg(width: number, height: number): Buffer {
  const app0 = segment(0xe0, Buffer.from([0x4a, 0x46, 0x49, 0x46, 0x00, 1, 1, 0, 0, 1, 0, 1, 0, 0]));
  const dqt = segment(0xdb, Buffer.concat([Buffer.from([0x00]), Buffer.alloc(64, 1)]));
  const sof = Buffer.alloc(9);
  sof[0] = 8;
  sof.writeUInt16BE(height, 1);
  sof.writeUInt16BE(width, 3);
  sof[5] = 1;
  sof[6] = 1;
  sof[7] = 0x11;
  sof[8] = 0;
  const bits = Buffer.alloc(16);
  bits[0] = 1;
  const dhtDc = segment(0xc4, Buffer.concat([Buffer.from([0x00]), bits, Buffer.from([0x00])]));
  const dhtAc = segment(0xc4, Buffer.concat([Buffer.from([0x10]), bits, Buffer.from([0x00])]));
  const sos = segment(0xda, Buffer.from([1, 1, 0x00, 0, 63, 0]));
  const blocks = Math.ceil(width / 8) * Math.ceil(height / 8);
  const bitCount = blocks * 2;
  const data = Buffer.alloc(Math.ceil(bitCount / 8), 0);
  // Pad the last byte with 1 bits (T.81 F.1.2.3).
  const rest = bitCount % 8;
  if (rest) data[data.length - 1] = (1 << (8 - rest)) - 1;
  return Buffer.concat([Buffer.from([0xff, 0xd8]), app0, dqt, segment(0xc0, sof), dhtDc, dhtAc, sos, data, Buffer.from([0xff, 0xd9])]);
}

function riffChunk(fourcc: string, data: Buffer): Buffer {
  const head = Buffer.alloc(8);
  head.write(fourcc, 0, 'latin1');
  head.writeUInt32LE(data.length, 4);
  return Buffer.concat([head, data, data.length % 2 ? Buffer.alloc(1) : Buffer.alloc(0)]);
}

/**
 * A WebP container (RIFF, per the WebP container specification): VP8X with the EXIF/XMP flags, a VP8L header
 * giving the size, and optional EXIF and XMP chunks.
 */
export function makeWebp(width: number, height: number, metadata: { exif?: Buffer; xmp?: Buffer } = {}): Buffer {
  const vp8x = Buffer.alloc(10);
  vp8x[0] = (metadata.exif ? 0x08 : 0) | (metadata.xmp ? 0x04 : 0);
  vp8x.writeUIntLE(width - 1, 4, 3);
  vp8x.writeUIntLE(height - 1, 7, 3);
  const vp8l = Buffer.alloc(10);
  vp8l[0] = 0x2f;
  const packed = ((width - 1) & 0x3fff) | (((height - 1) & 0x3fff) << 14);
  vp8l.writeUInt32LE(packed >>> 0, 1);
  const chunks = [riffChunk('VP8X', vp8x), riffChunk('VP8L', vp8l)];
  if (metadata.exif) chunks.push(riffChunk('EXIF', metadata.exif));
  if (metadata.xmp) chunks.push(riffChunk('XMP ', metadata.xmp));
  const body = Buffer.concat([Buffer.from('WEBP', 'latin1'), ...chunks]);
  const head = Buffer.alloc(8);
  head.write('RIFF', 0, 'latin1');
  head.writeUInt32LE(body.length, 4);
  return Buffer.concat([head, body]);
}

/** A JPEG carrying a GPS position, written with piexifjs (binary strings, JPEG only). */
export function jpegWithGps(): Buffer {
  const gps = {
    [piexif.GPSIFD.GPSLatitudeRef]: 'N',
    [piexif.GPSIFD.GPSLatitude]: [[51, 1], [30, 1], [0, 1]],
    [piexif.GPSIFD.GPSLongitudeRef]: 'W',
    [piexif.GPSIFD.GPSLongitude]: [[0, 1], [7, 1], [0, 1]],
  };
  const exif = piexif.dump({ '0th': {}, Exif: {}, GPS: gps });
  return Buffer.from(piexif.insert(exif, makeJpeg(64, 48).toString('binary')), 'binary');
}

/**
 * The first bytes of a HEIC photo as phone cameras save it: the `ftyp` box (size, "ftyp", major brand `heic`, minor
 * version 0, compatible brands `mif1` and `heic`) and the start of its `meta` box. Not a whole picture: the refusal reads
 * only the signature.
 * Source: ISO/IEC 14496-12 4.3 (FileTypeBox layout); ISO/IEC 23008-12 (HEIF) Annex B (brands `mif1`, `heic`).
 */
export function heicHeader(): Buffer {
  const ftyp = Buffer.alloc(24);
  ftyp.writeUInt32BE(24, 0);
  ftyp.write('ftypheic', 4, 'latin1');
  ftyp.write('mif1heic', 16, 'latin1');
  const meta = Buffer.from([0, 0, 0, 12, 0x6d, 0x65, 0x74, 0x61, 0, 0, 0, 0]);
  return Buffer.concat([ftyp, meta]);
}
