import { DEMO_CATALOG_IDS, DEMO_CUSTOMER_IDS, DEMO_PROJECT_IDS } from '@swapwright/seed-data';
import exifr from 'exifr';
import { readdir, readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { OTHER_SHOP } from './fixtures/other-shop.fixture';
import { bearer, countRows, Session, signIn, startSignedInApp, TestApp } from './helpers/test-app';
import { heicHeader, jpegWithGps, makeJpeg, makePng, makeWebp, pngTextChunk } from './helpers/test-images';
import { seedCatalog } from '../src/database/seed/seed-catalog';
import { MAX_PHOTO_BYTES } from '../src/measurements/photo-limits';

const PROJECT = DEMO_PROJECT_IDS.ridgeback;
const OTHER_CUSTOMERS_PROJECT = DEMO_PROJECT_IDS.stag;
const SHEET = `/api/projects/${PROJECT}/measurement-sheet`;

describe('measurement sheets and photos', () => {
  let t: TestApp;
  let s: Record<'owner' | 'estimator' | 'fabricator' | 'counter' | 'customer', Session>;
  const uploadDir = () => join(process.env.UPLOAD_DIR!, 'measurement-photos');
  const storedFiles = async (): Promise<string[]> => readdir(uploadDir()).catch(() => []);

  beforeAll(async () => {
    ({ t, s } = await startSignedInApp());
    await seedCatalog(t.dataSource);
  });
  afterAll(async () => {
    await t.close();
  });

  const setValue = (who: Session, pointId: string, body: object) => t.http.put(`${SHEET}/values/${pointId}`).set(...bearer(who)).send(body);
  const upload = (who: Session, files: Array<{ data: Buffer; name: string }>, projectId: string = PROJECT) => {
    const req = t.http.post(`/api/projects/${projectId}/measurement-sheet/photos`).set(...bearer(who));
    // form-data cuts `filename` to its last part; its `filepath` option (not in superagent's types) sends the name as
    // given, folders and all
    for (const file of files) req.attach('photos', file.data, { filepath: file.name } as { filename?: string });
    return req;
  };

  it('the demo chassis comes with its template; the demo sheet is started and lists what is missing', async () => {
    const res = await t.http.get(SHEET).set(...bearer(s.fabricator)).expect(200);
    const measured = res.body.values.map((v: { pointId: string }) => v.pointId);
    expect(measured).toEqual(expect.arrayContaining(['ride-height.front-left', 'front-crossmember.bottom', 'mount-pad.spacing']));
    expect(res.body.values.every((v: { flagged: boolean }) => !v.flagged)).toBe(true);
    expect(res.body.history).toHaveLength(measured.length);
    expect(res.body.missing).toEqual(['front-crossmember.top', 'pinion.height', 'pinion.angle']);
    expect(res.body.points.map((p: { id: string }) => p.id)).toContain('front-crossmember.top');
    expect(res.body.missing).toContain('front-crossmember.top');
    expect(res.body.signedOffAt).toBeNull();
  });

  it('12 1/2", 12.5 in and 317.5 mm store the same value; history keeps who, old and new', async () => {
    // Source: NIST SP 811 (2008) B.8: 1 in = 25.4 mm exactly.
    for (const value of ['12 1/2"', '12.5 in', '317.5 mm']) {
      const res = await setValue(s.fabricator, 'pinion.height', { value }).expect(200);
      expect(res.body.values.find((v: { pointId: string }) => v.pointId === 'pinion.height').value).toBe(317.5);
    }
    const res = await setValue(s.fabricator, 'pinion.height', { value: '370', unit: 'mm', tolerance: '1/8"', note: 'yoke centre' }).expect(200);
    const value = res.body.values.find((v: { pointId: string }) => v.pointId === 'pinion.height');
    expect(value).toMatchObject({ value: 370, tolerance: 3.18, note: 'yoke centre', measuredBy: s.fabricator.user.name });
    const history = res.body.history.filter((e: { pointId: string }) => e.pointId === 'pinion.height');
    expect(history).toHaveLength(4);
    expect(history[0]).toMatchObject({ oldValue: 317.5, newValue: 370, by: s.fabricator.user.name });
    expect(history[3]).toMatchObject({ oldValue: null, newValue: 317.5 });
  });

  it('refuses what it cannot read, an unknown point, and roles that may not write', async () => {
    expect((await setValue(s.fabricator, 'pinion.height', { value: 'abc' }).expect(400)).body.message).toMatch(/not a length/);
    await setValue(s.fabricator, 'pinion.angle', { value: '3 in' }).expect(400);
    await setValue(s.fabricator, 'no-such-point', { value: '3' }).expect(404);
    await setValue(s.estimator, 'pinion.height', { value: '370' }).expect(403);
    await setValue(s.customer, 'pinion.height', { value: '370' }).expect(403);
    await t.http.get(SHEET).set(...bearer(s.estimator)).expect(200);
  });

  it('two saves typed over the same reading: the second is refused (409) with who saved what, nothing lost; saving over it is explicit', async () => {
    const pinion = async () => {
      const body = (await t.http.get(SHEET).set(...bearer(s.fabricator)).expect(200)).body;
      return {
        value: body.values.find((v: { pointId: string }) => v.pointId === 'pinion.height'),
        history: body.history.filter((e: { pointId: string }) => e.pointId === 'pinion.height'),
      };
    };
    const before = await pinion();
    // four readings so far (first one, then three changes): version 4
    expect(before.value).toMatchObject({ value: 370, version: 4 });

    // Tab A and tab B both show version 4. A saves 17 1/2 in; B then saves 445 mm over what it saw.
    // Source: NIST SP 811 (2008) B.8: 1 in = 25.4 mm exactly, so 17 1/2 in = 444.5 mm.
    const a = await setValue(s.fabricator, 'pinion.height', { value: '17 1/2"', seenVersion: 4 }).expect(200);
    expect(a.body.values.find((v: { pointId: string }) => v.pointId === 'pinion.height')).toMatchObject({ value: 444.5, version: 5 });
    const b = await setValue(s.owner, 'pinion.height', { value: '445 mm', seenVersion: 4 }).expect(409);
    expect(b.body.code).toBe('measurement_reading_changed');
    expect(b.body.message).toMatch(
      new RegExp(`^${s.fabricator.user.name} recorded 17 1/2 in \\(444\\.5 mm\\) here at \\d\\d:\\d\\d UTC; yours \\(17 1/2 in \\(445\\.0 mm\\)\\) was not saved\\. Keep theirs, or save yours over it\\.$`),
    );
    const kept = await pinion();
    expect(kept.value).toMatchObject({ value: 444.5, version: 5, measuredBy: s.fabricator.user.name });
    expect(kept.history).toHaveLength(before.history.length + 1);

    // Saving over it names the reading it replaces.
    const over = await setValue(s.owner, 'pinion.height', { value: '445 mm', seenVersion: 5 }).expect(200);
    expect(over.body.values.find((v: { pointId: string }) => v.pointId === 'pinion.height')).toMatchObject({ value: 445, version: 6 });
    expect(over.body.history[0]).toMatchObject({ pointId: 'pinion.height', oldValue: 444.5, newValue: 445 });

    // Two saves at the same moment from the same seen version: one is stored, the other refused.
    const both = await Promise.all([
      setValue(s.fabricator, 'pinion.height', { value: '371 mm', seenVersion: 6 }),
      setValue(s.owner, 'pinion.height', { value: '372 mm', seenVersion: 6 }),
    ]);
    expect(both.map((r) => r.status).sort()).toEqual([200, 409]);
    const after = await pinion();
    expect(after.value.version).toBe(7);
    expect(after.history).toHaveLength(before.history.length + 3);

    // A version 0 says "there was no reading": refused where one exists; a point without a reading takes only 0.
    expect((await setValue(s.fabricator, 'pinion.height', { value: '370', seenVersion: 0 }).expect(409)).body.code).toBe('measurement_reading_changed');
    expect((await setValue(s.fabricator, 'front-crossmember.top', { value: '355', seenVersion: 2 }).expect(400)).body.message).toMatch(/has no reading yet; send 0/);
    await setValue(s.fabricator, 'pinion.height', { value: '370', seenVersion: -1 }).expect(400);
    await setValue(s.fabricator, 'pinion.height', { value: '370', seenVersion: 1.5 }).expect(400);
    // back to 370 mm for the sign-off below
    await setValue(s.fabricator, 'pinion.height', { value: '370', seenVersion: 7 }).expect(200);
  });

  it('sign-off needs every required point; afterwards a change needs a reason, and both are logged', async () => {
    const incomplete = await t.http.post(`${SHEET}/sign-off`).set(...bearer(s.fabricator)).expect(409);
    expect(incomplete.body.code).toBe('measurement_sheet_incomplete');
    const sheet = await t.http.get(SHEET).set(...bearer(s.fabricator)).expect(200);
    for (const id of sheet.body.missing as string[]) {
      const point = sheet.body.points.find((p: { id: string }) => p.id === id);
      await setValue(s.fabricator, id, { value: String(point.catalogValue) }).expect(200);
    }
    const signed = await t.http.post(`${SHEET}/sign-off`).set(...bearer(s.fabricator)).expect(200);
    expect(signed.body.signedOffAt).not.toBeNull();
    expect(signed.body.missing).toEqual([]);
    const refused = await setValue(s.fabricator, 'pinion.height', { value: '372' }).expect(409);
    expect(refused.body.code).toBe('measurement_reason_required');
    const changed = await setValue(s.fabricator, 'pinion.height', { value: '372', reason: 'Re-measured with the truck on the lift pads removed' }).expect(200);
    expect(changed.body.history[0]).toMatchObject({ kind: 'value', oldValue: 370, newValue: 372, reason: 'Re-measured with the truck on the lift pads removed' });
    expect(changed.body.history.some((e: { kind: string }) => e.kind === 'sign-off')).toBe(true);
    // Both go to the shop's audit log: the sign-off and the change after it, with its reason.
    const audit = (await t.http.get('/api/audit-events?kind=sign-off').set(...bearer(s.owner)).expect(200)).body.items as Array<{ action: string; summary: string; after: Record<string, unknown> }>;
    expect(audit.map((e) => e.action)).toEqual(expect.arrayContaining(['sheet.signed-off', 'sheet.changed-after-sign-off']));
    expect(audit.find((e) => e.action === 'sheet.changed-after-sign-off')).toMatchObject({
      summary: expect.stringMatching(/changed after sign-off: Re-measured with the truck on the lift pads removed/),
      after: { pointId: 'pinion.height', value: 372, reason: 'Re-measured with the truck on the lift pads removed' },
    });
  });

  it('fit link: the crossmember measured 20 mm lower moves the sump-to-crossmember result by 20 mm, named as from the sheet', async () => {
    const run = async () => (await t.http.post(`/api/projects/${PROJECT}/fit-reports`).set(...bearer(s.estimator)).expect(201)).body;
    await setValue(s.fabricator, 'front-crossmember.top', { value: '355 mm', reason: 'catalog figure confirmed' }).expect(200);
    const before = await run();
    // Derived: the catalog top is 355 mm; read 335 mm (ride height as catalog): the outline moves down 20 mm and the
    // pan-to-crossmember gap (vertical where the pan's flat floor sits over the flat top) grows by 20 mm.
    await setValue(s.fabricator, 'front-crossmember.top', { value: '335 mm', reason: 'crossmember sits lower than the book' }).expect(200);
    const after = await run();
    const gap = (report: { report: { findings: Array<{ checkId: string; measured: number | null }> } }) =>
      report.report.findings.find((f) => f.checkId === 'envelope.sump-crossmember')!.measured!;
    // Each reported figure is rounded to 0.1 mm, so the difference is 20 within 0.1.
    expect(Math.abs(gap(after) - gap(before) - 20)).toBeLessThanOrEqual(0.1 + 1e-9);
    const input = after.inputs.chassisInputs.find((i: { pointId: string }) => i.pointId === 'front-crossmember.top');
    expect(input).toMatchObject({ source: { kind: 'sheet', measuredBy: s.fabricator.user.name }, measuredValue: 335, deviation: -20, flagged: true });
    expect(input.checks).toContain('envelope.sump-crossmember');
    expect(after.inputs.notes.join(' ')).toMatch(/from the measurement sheet/);
  });

  it('accepts JPEG, PNG and WebP by content and serves them with the right type and nosniff', async () => {
    // Source: ITU-T T.81 / ISO/IEC 10918-1 (JPEG: SOI FFD8 … EOI FFD9), the PNG Specification (W3C, ISO/IEC 15948: the
    // 8-byte signature, IHDR width and height, IEND last) and RFC 9649 (WebP: RIFF size, WEBP, VP8/VP8L/VP8X chunks):
    // the generated files follow these layouts and their pixel sizes are read back from the headers.
    const res = await upload(s.fabricator, [
      { data: makeJpeg(64, 48), name: 'crossmember.jpg' },
      { data: makePng(40, 30), name: 'rails.png' },
      { data: makeWebp(20, 10), name: 'pinion.webp' },
    ]).expect(201);
    expect(res.body.map((p: { contentType: string; widthPx: number; heightPx: number }) => [p.contentType, p.widthPx, p.heightPx])).toEqual([
      ['image/jpeg', 64, 48],
      ['image/png', 40, 30],
      ['image/webp', 20, 10],
    ]);
    const file = await t.http.get(res.body[1].url).set(...bearer(s.customer)).expect(200);
    expect(file.headers['content-type']).toBe('image/png');
    expect(file.headers['x-content-type-options']).toBe('nosniff');
    // Generated names only.
    expect((await storedFiles()).every((name) => /^[0-9a-f-]{36}\.(jpg|png|webp)$/.test(name))).toBe(true);
  });

  it('refuses a renamed non-image, truncated, empty, over-size, too many and absurd pixel counts; nothing stored', async () => {
    const filesBefore = (await storedFiles()).length;
    const rowsBefore = await countRows(t.dataSource, 'measurement_photos');
    // Source: ISO 32000-1 (PDF) 7.5.2: a PDF starts with %PDF-; named photo.jpg it is still no image.
    const pdf = Buffer.from('%PDF-1.4\n1 0 obj<<>>endobj\ntrailer<<>>\n%%EOF\n');
    const jpeg = makeJpeg(64, 48);
    expect((await upload(s.fabricator, [{ data: pdf, name: 'photo.jpg' }]).expect(415)).body.code).toBe('photo_not_image');
    expect((await upload(s.fabricator, [{ data: jpeg.subarray(0, jpeg.length - 40), name: 'cut.jpg' }]).expect(400)).body.code).toBe('photo_truncated');
    const png = makePng(40, 30);
    expect((await upload(s.fabricator, [{ data: png.subarray(0, png.length - 20), name: 'cut.png' }]).expect(400)).body.code).toBe('photo_truncated');
    expect((await upload(s.fabricator, [{ data: Buffer.alloc(0), name: 'empty.jpg' }]).expect(400)).body.code).toBe('photo_empty');
    expect((await upload(s.fabricator, [{ data: Buffer.concat([jpeg, Buffer.alloc(MAX_PHOTO_BYTES)]), name: 'huge.jpg' }]).expect(413)).body.message).toMatch(/15 MB/);
    expect((await upload(s.fabricator, Array.from({ length: 6 }, (_, i) => ({ data: makePng(4, 4), name: `p${i}.png` }))).expect(400)).body.message).toMatch(/Up to 5 photos/);
    // A header claiming 30000 × 30000 pixels (900 megapixels): a decompression trap.
    expect((await upload(s.fabricator, [{ data: makeWebp(16000, 16000), name: 'trap.webp' }]).expect(400)).body.code).toBe('photo_too_many_pixels');
    // A name with a folder path is refused, with or without a good image.
    // Source: W3C File API, the File interface: `name` is the file's name without path information, so a browser never
    // sends one; a name with folders was made by hand.
    for (const name of ['../../../etc/passwd.png', '..\\..\\boot.png', 'sub/dir.png']) {
      expect((await upload(s.fabricator, [{ data: makePng(8, 8), name }]).expect(400)).body.code).toBe('photo_bad_name');
    }
    // One good and one bad file in the same request: neither is kept.
    await upload(s.fabricator, [{ data: makePng(8, 8), name: 'ok.png' }, { data: pdf, name: 'bad.png' }]).expect(415);
    await upload(s.fabricator, [{ data: makePng(8, 8), name: 'ok.png' }, { data: makePng(8, 8), name: '../up.png' }]).expect(400);
    expect(await countRows(t.dataSource, 'measurement_photos')).toBe(rowsBefore);
    expect(await storedFiles()).toHaveLength(filesBefore);
  });

  it('a JPEG with its GPS position is stored without it; PNG text and WebP EXIF/XMP are removed too', async () => {
    // Source: CIPA DC-008 (Exif): the position sits in the GPS IFD of the APP1 "Exif" segment; RFC 9649 (WebP): the
    // EXIF and "XMP " chunks; the PNG Specification: tEXt chunks carry free text such as a position.
    const tagged = jpegWithGps();
    // The fixture really carries a position (read back with exifr).
    expect((await exifr.gps(tagged))?.latitude).toBeCloseTo(51.5, 6);
    const res = await upload(s.fabricator, [
      { data: tagged, name: 'gps.jpg' },
      { data: makePng(10, 10, [pngTextChunk('GPSLatitude', '51.5')]), name: 'gps.png' },
      { data: makeWebp(10, 10, { exif: Buffer.from('Exif\0\0GPSLatitude 51.5'), xmp: Buffer.from('<x:xmpmeta>GPS 51.5</x:xmpmeta>') }), name: 'gps.webp' },
    ]).expect(201);
    const [jpg, png, webp] = await Promise.all(
      res.body.map(async (photo: { url: string }) => (await t.http.get(photo.url).set(...bearer(s.fabricator)).buffer(true).expect(200)).body as Buffer),
    );
    expect(await exifr.gps(jpg).catch(() => undefined)).toBeUndefined();
    expect(jpg.includes(Buffer.from('Exif\0'))).toBe(false);
    expect(png.includes(Buffer.from('GPSLatitude'))).toBe(false);
    expect(webp.includes(Buffer.from('EXIF'))).toBe(false);
    expect(webp.includes(Buffer.from('GPS'))).toBe(false);
    // The stored files on disk are the stripped ones.
    for (const name of await storedFiles()) expect((await readFile(join(uploadDir(), name))).includes(Buffer.from('GPS'))).toBe(false);
  });

  it('customers add photos to their own project (pending until a fabricator accepts or replaces them), not to others', async () => {
    const added = await upload(s.customer, [{ data: makePng(12, 12), name: 'before-arrival.png' }]).expect(201);
    expect(added.body[0].status).toBe('pending');
    await upload(s.customer, [{ data: makePng(12, 12), name: 'x.png' }], OTHER_CUSTOMERS_PROJECT).expect(404);
    await t.http.post(`/api/measurement-photos/${added.body[0].id}/accept`).set(...bearer(s.fabricator)).expect(200);
    const second = await upload(s.customer, [{ data: makePng(12, 12), name: 'again.png' }]).expect(201);
    // A customer cannot replace a photo, not even their own; a fabricator accepts or replaces it.
    const byCustomer = await t.http.post(`${SHEET}/photos`).set(...bearer(s.customer)).field('replacesPhotoId', second.body[0].id).attach('photos', makePng(8, 8), 'mine.png');
    expect(byCustomer.status).toBe(403);
    expect(byCustomer.body.message).toMatch(/fabricator or owner may replace/);
    const replaced = await t.http
      .post(`${SHEET}/photos`)
      .set(...bearer(s.fabricator))
      .field('replacesPhotoId', second.body[0].id)
      .attach('photos', makeJpeg(32, 32), 'better.jpg')
      .expect(201);
    expect(replaced.body[0].status).toBe('accepted');
    await t.http.get(`/api/measurement-photos/${second.body[0].id}/file`).set(...bearer(s.fabricator)).expect(404);
  });

  it('another shop and an unrelated customer cannot read or delete a photo (404); only uploader or owner delete', async () => {
    const res = await upload(s.fabricator, [{ data: makePng(8, 8), name: 'a.png' }], OTHER_CUSTOMERS_PROJECT).expect(201);
    const url = res.body[0].url as string;
    const other = await signIn(t.http, OTHER_SHOP.owner.email, OTHER_SHOP.owner.password);
    await t.http.get(url).set(...bearer(other)).expect(404);
    await t.http.delete(`/api/measurement-photos/${res.body[0].id}`).set(...bearer(other)).expect(404);
    // The demo customer is not this project's customer.
    await t.http.get(url).set(...bearer(s.customer)).expect(404);
    await t.http.delete(`/api/measurement-photos/${res.body[0].id}`).set(...bearer(s.customer)).expect(404);
    await t.http.get(url).set(...bearer(s.counter)).expect(200);
    await t.http.delete(`/api/measurement-photos/${res.body[0].id}`).set(...bearer(s.counter)).expect(403);
    await t.http.delete(`/api/measurement-photos/${res.body[0].id}`).set(...bearer(s.owner)).expect(204);
    await t.http.get(url).set(...bearer(s.fabricator)).expect(404);
  });

  it('a wrong photo on an open sheet is removed with its file; a signed-off sheet keeps its photos (409)', async () => {
    // The stag project's sheet is open.
    const [wrong] = (await upload(s.fabricator, [{ data: makeJpeg(24, 24), name: 'wrong-truck.jpg' }], OTHER_CUSTOMERS_PROJECT).expect(201)).body;
    const rows = await countRows(t.dataSource, 'measurement_photos');
    const [{ storageKey }] = await t.dataSource.query('SELECT storageKey FROM measurement_photos WHERE id = ?', [wrong.id]);
    expect(await storedFiles()).toContain(storageKey);
    await t.http.delete(`/api/measurement-photos/${wrong.id}`).set(...bearer(s.fabricator)).expect(204);
    expect(await countRows(t.dataSource, 'measurement_photos')).toBe(rows - 1);
    expect(await storedFiles()).not.toContain(storageKey);
    await t.http.delete(`/api/measurement-photos/${wrong.id}`).set(...bearer(s.fabricator)).expect(404);

    // The demo project's sheet was signed off above: its photos are the record of what was measured.
    const [kept] = (await upload(s.fabricator, [{ data: makeJpeg(24, 24), name: 'rails.jpg' }]).expect(201)).body;
    const [{ storageKey: keptKey }] = await t.dataSource.query('SELECT storageKey FROM measurement_photos WHERE id = ?', [kept.id]);
    const before = await countRows(t.dataSource, 'measurement_photos');
    const refused = await t.http.delete(`/api/measurement-photos/${kept.id}`).set(...bearer(s.owner)).expect(409);
    expect(refused.body).toMatchObject({ code: 'measurement_sheet_signed_off', message: expect.stringMatching(/signed off: its photos stay with it/) });
    expect(await countRows(t.dataSource, 'measurement_photos')).toBe(before);
    expect(await storedFiles()).toContain(keptKey);
    await t.http.get(kept.url).set(...bearer(s.fabricator)).expect(200);
  });

  it('a HEIC/HEIF photo is refused by its signature with how to send a JPEG instead; nothing stored', async () => {
    // Source: ISO/IEC 23008-12 (HEIF) Annex B: a file whose FileTypeBox names the brands `heic`/`mif1` is a HEIC image.
    const filesBefore = (await storedFiles()).length;
    const rowsBefore = await countRows(t.dataSource, 'measurement_photos');
    for (const name of ['IMG_0412.HEIC', 'crossmember.jpg']) {
      const refused = await upload(s.fabricator, [{ data: heicHeader(), name }]).expect(415);
      expect(refused.body.code).toBe('photo_heif_not_accepted');
      expect(refused.body.message).toMatch(/is a HEIC\/HEIF photo, which is not accepted yet\. Send it as a JPEG: set the camera to save photos as JPEG, or share or export the photo as JPEG/);
    }
    expect(await countRows(t.dataSource, 'measurement_photos')).toBe(rowsBefore);
    expect(await storedFiles()).toHaveLength(filesBefore);
  });
});

describe('measurement templates, settings and a project without a catalog chassis', () => {
  let t: TestApp;
  let s: Record<'owner' | 'estimator' | 'fabricator' | 'counter' | 'customer', Session>;
  const STAG = DEMO_PROJECT_IDS.stag;
  const STAG_TEMPLATE = `/api/chassis/${DEMO_CATALOG_IDS.chassis.stag84}/measurement-template`;
  const stagValue = (pointId: string, value: string) =>
    t.http.put(`/api/projects/${STAG}/measurement-sheet/values/${pointId}`).set(...bearer(s.fabricator)).send({ value });
  /** A template point as the PUT takes it (the response adds the view, unit and reference). */
  const editable = ({ view: _v, unit: _u, reference: _r, ...point }: Record<string, unknown>) => point;

  beforeAll(async () => {
    ({ t, s } = await startSignedInApp());
    await seedCatalog(t.dataSource);
  });
  afterAll(async () => {
    await t.close();
  });

  it('the fabricator edits a template; a crossmember the catalog lacks is described by the sheet alone', async () => {
    const template = (await t.http.get(STAG_TEMPLATE).set(...bearer(s.estimator)).expect(200)).body;
    const aux = (kind: string, suffix: string, label: string, atX?: number) => ({
      id: `aux-crossmember.${suffix}`,
      kind,
      target: 'aux-crossmember',
      label: `Added crossmember: ${label}`,
      howTo: 'The crossmember a previous owner welded in under the sump.',
      catalogValue: null,
      required: true,
      ...(atX !== undefined && { atX }),
    });
    const extra = [
      aux('obstacle-top', 'top', 'top', 1200),
      aux('obstacle-bottom', 'bottom', 'bottom', 1200),
      aux('obstacle-front-face', 'front-face', 'front face'),
      aux('obstacle-rear-face', 'rear-face', 'rear face'),
    ];
    const points = [...template.points.map(editable), ...extra];
    points[0] = { ...points[0], label: 'Ride height, front left (at the spring hanger)' };

    await t.http.put(STAG_TEMPLATE).set(...bearer(s.estimator)).send({ points }).expect(403);
    const twice = await t.http.put(STAG_TEMPLATE).set(...bearer(s.fabricator)).send({ points: [...points, extra[0]] }).expect(400);
    expect(twice.body.message).toMatch(/appears twice/);
    await t.http.put(STAG_TEMPLATE).set(...bearer(s.fabricator)).send({ points: [{ ...extra[0], kind: 'tape-guess' }] }).expect(400);
    const unknown = `/api/chassis/${'0'.repeat(8)}-0000-4000-8000-${'0'.repeat(12)}/measurement-template`;
    expect((await t.http.get(unknown).set(...bearer(s.fabricator)).expect(404)).body.code).toBe('measurement_chassis_not_found');
    await t.http.put(unknown).set(...bearer(s.fabricator)).send({ points }).expect(404);

    const saved = await t.http.put(STAG_TEMPLATE).set(...bearer(s.fabricator)).send({ points }).expect(200);
    expect(saved.body.points).toHaveLength(template.points.length + 4);
    const sheet = (await t.http.get(`/api/projects/${STAG}/measurement-sheet`).set(...bearer(s.fabricator)).expect(200)).body;
    expect(sheet.points[0].label).toBe('Ride height, front left (at the spring hanger)');
    expect(sheet.missing).toEqual(expect.arrayContaining(extra.map((p) => p.id)));

    for (const [id, value] of [
      ['aux-crossmember.top', '380 mm'],
      ['aux-crossmember.bottom', '300 mm'],
      ['aux-crossmember.front-face', '1150 mm'],
      ['aux-crossmember.rear-face', '1250 mm'],
    ]) await stagValue(id, value).expect(200);
    const report = (await t.http.post(`/api/projects/${STAG}/fit-reports`).set(...bearer(s.estimator)).expect(201)).body;
    // Derived by hand: no ride height is measured on this sheet, so the floor is the catalog ground (z 0) and each
    // floor reading is the frame z; the faces are x behind the front axle line. The box is the four faces' rectangle.
    const box = report.inputs.spec.chassis.obstacles.find((o: { id: string }) => o.id === 'aux-crossmember');
    expect(box).toMatchObject({ kind: 'crossmember', outline: [{ x: 1150, z: 300 }, { x: 1250, z: 300 }, { x: 1250, z: 380 }, { x: 1150, z: 380 }] });
    const top = report.inputs.chassisInputs.find((i: { pointId: string }) => i.pointId === 'aux-crossmember.top');
    expect(top).toMatchObject({ source: { kind: 'sheet', measuredBy: s.fabricator.user.name }, catalogValue: null, measuredValue: 380, deviation: null, flagged: false });
  });

  it('the shop sets how far from the catalog a reading is flagged (owner only, within sane bounds)', async () => {
    const SETTINGS = '/api/measurement-settings';
    // Common practice (no published source): 15 mm and 1° by default.
    expect((await t.http.get(SETTINGS).set(...bearer(s.counter)).expect(200)).body).toEqual({ deviationLimitMm: 15, deviationLimitDeg: 1 });
    await t.http.get(SETTINGS).set(...bearer(s.customer)).expect(403);
    await t.http.put(SETTINGS).set(...bearer(s.fabricator)).send({ deviationLimitMm: 5, deviationLimitDeg: 0.5 }).expect(403);
    expect((await t.http.put(SETTINGS).set(...bearer(s.owner)).send({ deviationLimitMm: 0, deviationLimitDeg: 0.5 }).expect(400)).body.message).toMatch(
      /deviationLimitMm must be at least 0.5 mm/,
    );
    expect((await t.http.put(SETTINGS).set(...bearer(s.owner)).send({ deviationLimitMm: 5, deviationLimitDeg: 45 }).expect(400)).body.message).toMatch(
      /deviationLimitDeg must be at most 20°/,
    );
    await t.http.put(SETTINGS).set(...bearer(s.owner)).send({ deviationLimitMm: '5 mm', deviationLimitDeg: 0.5 }).expect(400);
    await t.http.put(SETTINGS).set(...bearer(s.owner)).send({ deviationLimitMm: 5 }).expect(400);
    await t.http.put(SETTINGS).set(...bearer(s.owner)).send({ deviationLimitMm: 5, deviationLimitDeg: 0.5, extra: 1 }).expect(400);

    const angle = (await t.http.get(`/api/projects/${STAG}/measurement-sheet`).set(...bearer(s.fabricator)).expect(200)).body.points.find(
      (p: { id: string }) => p.id === 'pinion.angle',
    );
    const flaggedNow = async () =>
      (await t.http.get(`/api/projects/${STAG}/measurement-sheet`).set(...bearer(s.fabricator)).expect(200)).body.values.find(
        (v: { pointId: string }) => v.pointId === 'pinion.angle',
      ).flagged;
    // 0.8° off the catalog: within the default 1°, beyond a limit of 0.5°.
    await stagValue('pinion.angle', String(angle.catalogValue + 0.8)).expect(200);
    expect(await flaggedNow()).toBe(false);
    expect((await t.http.put(SETTINGS).set(...bearer(s.owner)).send({ deviationLimitMm: 5, deviationLimitDeg: 0.5 }).expect(200)).body).toEqual({
      deviationLimitMm: 5,
      deviationLimitDeg: 0.5,
    });
    expect(await flaggedNow()).toBe(true);
    expect((await t.http.get(SETTINGS).set(...bearer(s.estimator)).expect(200)).body).toEqual({ deviationLimitMm: 5, deviationLimitDeg: 0.5 });
  });

  it('first readings on several new projects at once all land: no deadlock, one sheet each', async () => {
    const projects = await Promise.all(
      [1, 2, 3, 4, 5, 6].map(async (n) =>
        (
          await t.http
            .post('/api/projects')
            .set(...bearer(s.estimator))
            .send({ customerId: DEMO_CUSTOMER_IDS.juno, title: `Same-morning intake ${n}`, chassisModelId: DEMO_CATALOG_IDS.chassis.ridgeback78 })
            .expect(201)
        ).body.id as string,
      ),
    );
    const sheetsBefore = await countRows(t.dataSource, 'measurement_sheets');
    // Two readings per project, all at once, as a crew entering several trucks would.
    const answers = await Promise.all(
      projects.flatMap((id) =>
        ['pinion.height', 'pinion.angle'].map((pointId) =>
          t.http.put(`/api/projects/${id}/measurement-sheet/values/${pointId}`).set(...bearer(s.fabricator)).send({ value: pointId === 'pinion.angle' ? '3' : '370 mm' }),
        ),
      ),
    );
    expect(answers.map((answer) => answer.status)).toEqual(answers.map(() => 200));
    expect(await countRows(t.dataSource, 'measurement_sheets')).toBe(sheetsBefore + projects.length);
    for (const id of projects) {
      const sheet = (await t.http.get(`/api/projects/${id}/measurement-sheet`).set(...bearer(s.fabricator)).expect(200)).body;
      expect(sheet.values.map((v: { pointId: string }) => v.pointId).sort()).toEqual(['pinion.angle', 'pinion.height']);
    }
  });

  it('more saves at once than the pool has connections all land: no save waits on a second connection', async () => {
    const project = (
      await t.http
        .post('/api/projects')
        .set(...bearer(s.estimator))
        .send({ customerId: DEMO_CUSTOMER_IDS.juno, title: 'Busy-bay sheet', chassisModelId: DEMO_CATALOG_IDS.chassis.ridgeback78 })
        .expect(201)
    ).body.id as string;
    // Three times the driver's default pool of 10: a save that held one pooled connection while it waited for
    // another hung here once every connection was held.
    const values = Array.from({ length: 30 }, (_, n) => 360 + n);
    const answers = await Promise.all(
      values.map((mm) => t.http.put(`/api/projects/${project}/measurement-sheet/values/pinion.height`).set(...bearer(s.fabricator)).send({ value: `${mm} mm` })),
    );
    expect(answers.map((answer) => answer.status)).toEqual(answers.map(() => 200));
    const sheet = (await t.http.get(`/api/projects/${project}/measurement-sheet`).set(...bearer(s.fabricator)).expect(200)).body;
    const reading = sheet.values.find((v: { pointId: string }) => v.pointId === 'pinion.height');
    // one version per save, each save after the one before it
    expect(reading.version).toBe(values.length);
    expect(values).toContain(reading.value);
  }, 60_000);

  it('a project whose chassis is not chosen from the catalog: the sheet is empty and a reading is refused with what to do', async () => {
    const created = await t.http
      .post('/api/projects')
      .set(...bearer(s.estimator))
      .send({ customerId: DEMO_CUSTOMER_IDS.juno, title: 'Bare frame build, chassis not in the catalog' })
      .expect(201);
    const sheetPath = `/api/projects/${created.body.id}/measurement-sheet`;
    const sheet = (await t.http.get(sheetPath).set(...bearer(s.fabricator)).expect(200)).body;
    expect(sheet).toMatchObject({ chassisId: null, points: [], values: [], missing: [], signedOffAt: null, ground: null });
    const refused = await t.http.put(`${sheetPath}/values/pinion.height`).set(...bearer(s.fabricator)).send({ value: '370 mm' }).expect(409);
    expect(refused.body).toMatchObject({ code: 'measurement_no_chassis', message: expect.stringMatching(/Choose the chassis model/) });
    expect((await t.http.post(`${sheetPath}/sign-off`).set(...bearer(s.fabricator)).expect(409)).body.code).toBe('measurement_no_chassis');
    // Photos can come before the chassis is chosen (a customer's pictures before the truck arrives).
    await t.http.post(`${sheetPath}/photos`).set(...bearer(s.customer)).attach('photos', makePng(8, 8), 'frame.png').expect(201);
  });
});
