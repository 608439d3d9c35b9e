import { DEMO_PROJECT_IDS, DEMO_SHOP, DemoRole } from '@swapwright/seed-data';
import { endOfDayIn, formatCalendarDate, formatDayIn, todayIn } from '@swapwright/shared';
import { lastMailId, waitForMail } from './helpers/mail-fake';
import { pdfText } from './helpers/pdf-text';
import { bearer, Session, signUpThroughMail, startSignedInApp, TestApp } from './helpers/test-app';

const RIDGEBACK = DEMO_PROJECT_IDS.ridgeback;
const CUSTOMER_EMAIL = 'customer@ironbark.test';
const LINES = [{ kind: 'labor', description: 'Remove and install engine', hours: 8.5 }];

// Source: IANA tz database: Pacific/Pago_Pago is UTC−11 all year (no summer time). From 11:00 UTC to midnight UTC its
// day is the one before the UTC day.
const BEHIND = 'Pacific/Pago_Pago';
// Source: IANA tz database: Pacific/Kiritimati is UTC+14 all year. Its day is always after Pago Pago's (25 hours apart),
// so what one shop calls today has passed in the other at any real time.
const AHEAD = 'Pacific/Kiritimati';

const TIME_ZONE_MESSAGE = 'timeZone must be an IANA time zone name such as America/Denver, Europe/Berlin or UTC (Region/City, as your computer lists it)';

function addDays(day: string, days: number): string {
  const date = new Date(`${day}T00:00:00Z`);
  date.setUTCDate(date.getUTCDate() + days);
  return date.toISOString().slice(0, 10);
}

describe("the shop's time zone dates its quotes", () => {
  let t: TestApp;
  let demo: Record<DemoRole, Session>;

  beforeAll(async () => {
    ({ t, s: demo } = await startSignedInApp());
  });

  afterAll(() => t.close());

  const setZone = (timeZone: unknown) => t.http.patch('/api/shops/current').set(...bearer(demo.owner)).send({ timeZone });
  const readQuote = (id: string) => t.http.get(`/api/quotes/${id}`).set(...bearer(demo.estimator));
  const pdfOf = async (id: string) => {
    const response = await t.http
      .get(`/api/quotes/${id}/pdf`)
      .set(...bearer(demo.estimator))
      .buffer(true)
      .parse((res, done) => {
        const chunks: Buffer[] = [];
        res.on('data', (chunk: Buffer) => chunks.push(chunk));
        res.on('end', () => done(null, Buffer.concat(chunks)));
      });
    expect(response.status).toBe(200);
    return pdfText(response.body as Buffer);
  };

  it('shows the zone to everyone in the shop, and refuses a name that is not a time zone with what to send instead', async () => {
    const staff = await t.http.get('/api/shops/current').set(...bearer(demo.owner));
    expect(staff.body).toMatchObject({ view: 'full', timeZone: DEMO_SHOP.timeZone });
    const customer = await t.http.get('/api/shops/current').set(...bearer(demo.customer));
    expect(customer.body).toMatchObject({ view: 'summary', timeZone: DEMO_SHOP.timeZone });

    const refused = await setZone('Mars/Olympus');
    expect(refused.status).toBe(400);
    expect(refused.body.code).toBe('validation_failed');
    expect(refused.body.message).toContain(TIME_ZONE_MESSAGE);
    expect((await setZone('')).status).toBe(400);
    expect((await setZone(null)).status).toBe(400);
    expect((await t.http.get('/api/shops/current').set(...bearer(demo.owner))).body.timeZone).toBe(DEMO_SHOP.timeZone);

    // Source: ECMA-402 CanonicalizeTimeZoneName: a zone name matches in any case and is kept as the database spells it.
    const saved = await setZone('pacific/pago_pago');
    expect(saved.status).toBe(200);
    expect(saved.body.timeZone).toBe(BEHIND);
    expect((await t.http.patch('/api/shops/current').set(...bearer(demo.estimator)).send({ timeZone: AHEAD })).status).toBe(403);
  });

  it("a shop behind UTC quotes by its own today: default, earliest and last valid day, link, PDF and lapsing", async () => {
    expect((await setZone(BEHIND)).status).toBe(200);
    const today = todayIn(BEHIND);
    const settings = await t.http.get('/api/quote-settings').set(...bearer(demo.owner));
    expect(settings.status).toBe(200);

    const created = await t.http.post(`/api/projects/${RIDGEBACK}/quotes`).set(...bearer(demo.estimator)).send({ lines: LINES });
    expect(created.status).toBe(201);
    expect(created.body.revision.validUntil).toBe(addDays(today, settings.body.validityDays));
    const quoteId = created.body.id as string;

    // The shop's today is accepted as the last valid day, also in its evening, when UTC is already on the next day.
    const todayKept = await t.http.patch(`/api/quotes/${quoteId}`).set(...bearer(demo.estimator)).send({ validUntil: today });
    expect(todayKept.status).toBe(200);
    expect(todayKept.body.revision.validUntil).toBe(today);
    const yesterday = addDays(today, -1);
    const past = await t.http.patch(`/api/quotes/${quoteId}`).set(...bearer(demo.estimator)).send({ validUntil: yesterday });
    expect(past.status).toBe(400);
    expect(past.body.message).toBe(`The last day to accept, ${formatCalendarDate(yesterday)}, has already passed; choose today or a later day.`);

    const before = await lastMailId();
    const sent = await t.http.post(`/api/quotes/${quoteId}/send`).set(...bearer(demo.estimator));
    expect(sent.status).toBe(200);
    expect(sent.body.status).toBe('awaiting-answer');
    const sentAt = new Date(sent.body.revision.sentAt);

    // The e-mailed link works to the end of the last valid day in the shop's zone.
    const mail = await waitForMail(CUSTOMER_EMAIL, /quote Q-\d{4}/, before);
    const token = /\/quote-answer\/([A-Za-z0-9_\-.]+)/.exec(mail.text)?.[1] ?? '';
    const claims = JSON.parse(Buffer.from(token.split('.')[1], 'base64url').toString('utf8')) as { exp: number };
    expect(Math.abs(claims.exp - Math.floor(endOfDayIn(today, BEHIND).getTime() / 1000))).toBeLessThanOrEqual(5);
    expect(mail.text).toContain(`(the link works until ${formatCalendarDate(today)})`);

    expect(await pdfOf(quoteId)).toContain(`Issued ${formatDayIn(sentAt, BEHIND)}`);
    expect((await readQuote(quoteId)).body.status).toBe('awaiting-answer');
    expect((await t.http.get(`/api/quote-links/${token}`)).body.status).toBe('awaiting-answer');

    // The same quote in a shop whose today is later: its last valid day has passed there, and it was issued on that zone's day.
    expect((await setZone(AHEAD)).status).toBe(200);
    expect((await readQuote(quoteId)).body.status).toBe('lapsed');
    expect(await pdfOf(quoteId)).toContain(`Issued ${formatDayIn(sentAt, AHEAD)}`);
    const answered = await t.http.post(`/api/quote-links/${token}/answer`).send({ answer: 'accept' });
    expect(answered.status).toBe(409);
    expect(answered.body.code).toBe('quote_lapsed');
    const refusedThere = await t.http.patch(`/api/quotes/${quoteId}`).set(...bearer(demo.estimator)).send({ validUntil: today });
    expect(refusedThere.status).toBe(400);

    expect((await setZone(BEHIND)).status).toBe(200);
    expect((await readQuote(quoteId)).body.status).toBe('awaiting-answer');
  });

  it("a new shop takes the zone the owner's browser sent at sign-up, else UTC; a made-up zone is refused", async () => {
    const refused = await t.http
      .post('/api/auth/sign-up')
      .send({ email: 'tz-refused@example.test', password: 'zone-password-1', name: 'Ovena Strand', shopName: 'Strand Garage', timeZone: 'Mars/Olympus' });
    expect(refused.status).toBe(400);
    expect(refused.body.message).toContain(TIME_ZONE_MESSAGE);

    const zoned = await signUpThroughMail(t.http, { email: 'tz-zoned@example.test', password: 'zone-password-1', name: 'Pell Varga', shopName: 'Varga Barn', timeZone: 'America/Denver' });
    expect((await t.http.get('/api/shops/current').set(...bearer(zoned))).body.timeZone).toBe('America/Denver');
    const plain = await signUpThroughMail(t.http, { email: 'tz-plain@example.test', password: 'zone-password-1', name: 'Ivo Lantry', shopName: 'Lantry Shed' });
    expect((await t.http.get('/api/shops/current').set(...bearer(plain))).body.timeZone).toBe('UTC');
  });
});
