import { crc32, deflateSync } from 'node:zlib';

/**
 * Small stand-in photos for the demo story, drawn in code: a shop floor, a dark frame member across it and a yellow
 * tape with its ticks, in the layout of the PNG specification (ISO/IEC 15948: signature, IHDR, IDAT, IEND). No
 * people, plates or badges: each one only shows where a tape was laid.
 */
/** One PNG chunk: length, type, data and the CRC-32 of type and data (ISO/IEC 15948, 5.3). */
export function pngChunk(type: string, data: Buffer): Buffer {
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, 'latin1'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body) >>> 0);
  return Buffer.concat([length, body, crc]);
}

type Rgb = [number, number, number];

/** A 320×240 RGB PNG; `seed` moves the frame member and the tape so no two photos look the same. */
export function storyPhoto(seed: number, width = 320, height = 240): Buffer {
  const beamTop = 60 + (seed * 37) % 80;
  const beamBottom = beamTop + 46;
  const tapeX = 40 + (seed * 71) % 220;
  const raw = Buffer.alloc((width * 3 + 1) * height);
  for (let y = 0; y < height; y++) {
    const row = y * (width * 3 + 1);
    raw[row] = 0; // filter: none
    for (let x = 0; x < width; x++) {
      // concrete floor: a soft gradient with a little grain
      const grain = ((x * 7 + y * 13 + seed * 17) % 11) - 5;
      let pixel: Rgb = [150 + grain - y / 8, 148 + grain - y / 8, 140 + grain - y / 8];
      if (y >= beamTop && y < beamBottom) {
        // the frame member: dark steel with a lit upper edge
        const shade = y < beamTop + 6 ? 95 : 52 + ((x + seed) % 9);
        pixel = [shade, shade + 2, shade + 6];
      }
      if (x >= tapeX && x < tapeX + 18 && y > 20 && y < height - 20) {
        // the tape blade: yellow, a black tick every 8 px and a longer one every 40 px
        const tick = (y - 20) % 8 === 0 && x < tapeX + ((y - 20) % 40 === 0 ? 14 : 8);
        pixel = tick ? [20, 20, 20] : [236, 196, 38];
      }
      const at = row + 1 + x * 3;
      raw[at] = Math.max(0, Math.min(255, Math.round(pixel[0])));
      raw[at + 1] = Math.max(0, Math.min(255, Math.round(pixel[1])));
      raw[at + 2] = Math.max(0, Math.min(255, Math.round(pixel[2])));
    }
  }
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr[8] = 8; // bit depth
  ihdr[9] = 2; // truecolour
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    pngChunk('IHDR', ihdr),
    pngChunk('IDAT', deflateSync(raw)),
    pngChunk('IEND', Buffer.alloc(0)),
  ]);
}
