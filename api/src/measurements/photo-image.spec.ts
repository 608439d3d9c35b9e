import { AppError } from '../common/errors/app-error';
import { checkImage, isHeif } from './photo-image';

/**
 * An ISO base media file's first box, `ftyp`: size (32-bit big-endian), "ftyp", major brand, minor version (32-bit),
 * compatible brands. Source: ISO/IEC 14496-12 (ISO base media file format) 4.2 and 4.3 (box header, FileTypeBox).
 */
function ftyp(major: string, compatible: string[], after: Buffer = Buffer.alloc(0)): Buffer {
  const box = Buffer.alloc(16 + compatible.length * 4);
  box.writeUInt32BE(box.length, 0);
  box.write('ftyp', 4, 'latin1');
  box.write(major, 8, 'latin1');
  compatible.forEach((brand, i) => box.write(brand, 16 + i * 4, 'latin1'));
  return Buffer.concat([box, after]);
}

/** The start of a `meta` box, as it follows `ftyp` in a still image; enough for a header fixture. */
const META = Buffer.from([0, 0, 0, 12, 0x6d, 0x65, 0x74, 0x61, 0, 0, 0, 0]);

describe('HEIC/HEIF photos are recognised by their signature, not their name', () => {
  // Source: ISO/IEC 23008-12 (HEIF), Annex B: `mif1` (image), `msf1` (image sequence), `heic`/`heix` (HEVC images),
  // `hevc`/`hevx` (HEVC image sequences) are the brands a HEIF file carries in its FileTypeBox.
  it.each([
    ['a phone camera\'s still (major heic)', ftyp('heic', ['mif1', 'heic'], META)],
    ['a 10-bit still (major heix)', ftyp('heix', ['mif1', 'heix'], META)],
    ['a plain HEIF image (major mif1)', ftyp('mif1', ['heic'], META)],
    ['a burst or live sequence (major msf1)', ftyp('msf1', ['msf1', 'hevc'], META)],
    ['HEIF named only among the compatible brands', ftyp('abcd', ['isom', 'mif1'], META)],
  ])('%s', (_, data) => {
    expect(isHeif(data)).toBe(true);
  });

  it('a video file of the same family (isom, mp41) and other images are not HEIF', () => {
    // Source: ISO/IEC 14496-14 (MP4): `isom` and `mp41` brands.
    expect(isHeif(ftyp('isom', ['isom', 'mp41']))).toBe(false);
    expect(isHeif(Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0, 16, 0x4a, 0x46, 0x49, 0x46, 0, 1, 1, 0, 0, 1, 0, 1]))).toBe(false);
    expect(isHeif(Buffer.from('ftypheic'))).toBe(false);
  });

  it('refuses a HEIC upload with what to do instead, whatever its name', () => {
    for (const name of ['IMG_0412.HEIC', 'crossmember.jpg']) {
      let refusal: unknown;
      try {
        checkImage(ftyp('heic', ['mif1', 'heic'], META), name);
      } catch (error) {
        refusal = error;
      }
      expect(refusal).toBeInstanceOf(AppError);
      const { code, message } = refusal as AppError;
      expect([(refusal as AppError).getStatus(), code]).toEqual([415, 'photo_heif_not_accepted']);
      expect(message).toMatch(/HEIC\/HEIF photo, which is not accepted yet/);
      expect(message).toMatch(/set the camera to save photos as JPEG, or share or export the photo as JPEG/);
    }
  });
});
