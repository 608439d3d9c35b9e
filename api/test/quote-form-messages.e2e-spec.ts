import { JwtService } from '@nestjs/jwt';
import { DEMO_PROJECT_IDS, DEMO_SHOP, DemoRole } from '@swapwright/seed-data';
import { formatCalendarDate, todayIn } from '@swapwright/shared';
import { bearer, createTestApp, resetData, Session, signInAllRoles, TestApp } from './helpers/test-app';

const RIDGEBACK = DEMO_PROJECT_IDS.ridgeback;

const LINES = [
  { kind: 'part', description: 'Rear-sump oil pan', quantity: 1, pricing: 'list', unitPriceCents: 28995 },
  { kind: 'labor', description: 'Notch crossmember', hours: 3.5 },
];

describe('quote forms: refusals a person can act on', () => {
  let t: TestApp;
  let demo: Record<DemoRole, Session>;
  let quoteId: string;

  beforeAll(async () => {
    t = await createTestApp();
    await resetData(t.dataSource);
    demo = await signInAllRoles(t.http);
    const created = await t.http.post(`/api/projects/${RIDGEBACK}/quotes`).set(...bearer(demo.estimator)).send({ lines: LINES });
    expect(created.status).toBe(201);
    quoteId = created.body.id;
  });

  afterAll(() => t.close());

  const patch = (body: object) => t.http.patch(`/api/quotes/${quoteId}`).set(...bearer(demo.estimator)).send(body);

  it('names the line in words when its hours are refused, not by its place in the body', async () => {
    const negative = await patch({ lines: [LINES[0], { ...LINES[1], hours: -3 }] });
    expect(negative.status).toBe(400);
    expect(negative.body.message).toBe('Line 2 (Notch crossmember): Hours must be 0 or more');
    expect(negative.body.details).toEqual(['Line 2 (Notch crossmember): Hours must be 0 or more']);

    // Common practice (no published source): labor is quoted to a tenth of an hour.
    const quarter = await patch({ lines: [{ ...LINES[1], hours: 2.25 }] });
    expect(quarter.status).toBe(400);
    expect(quarter.body.message).toBe('Line 1 (Notch crossmember): Hours are quoted to a tenth of an hour, for example 2.5');
    expect(JSON.stringify(quarter.body)).not.toMatch(/lines\.\d/);

    // A long description is shortened in the name; a line without one is named by its place.
    const long = 'Fabricate and weld transmission crossmember brackets to the frame rails';
    const unnamed = await patch({ lines: [{ kind: 'labor', description: long, hours: 1000 }, { kind: 'labor', description: '', hours: 1 }] });
    expect(unnamed.status).toBe(400);
    expect(unnamed.body.details).toContain('Line 1 (Fabricate and weld transmission crossmember…): Hours must be at most 999');
    expect(unnamed.body.details).toContain('Line 2: each line needs a description');
    // nothing was written
    const read = await t.http.get(`/api/quotes/${quoteId}`).set(...bearer(demo.estimator));
    expect(read.body.revision.lines.map((line: { hours: number | null }) => line.hours)).toEqual([null, 3.5]);
  });

  it("words a line's price, cost, markup and quantity limits as the shop reads them, with the line's name in front", async () => {
    const lines = [
      { kind: 'part', description: 'Rear-sump oil pan', quantity: 1, pricing: 'list', unitPriceCents: 99_999_999_999 },
      { kind: 'part', description: 'Motor mount kit', quantity: 20_000, pricing: 'cost-plus', unitCostCents: -5, markupPercent: 1500 },
      { kind: 'part', description: 'Header gasket', quantity: 0.5, pricing: 'list', unitPriceCents: 12.5 },
    ];
    const refused = await patch({ lines });
    expect(refused.status).toBe(400);
    expect(refused.body.code).toBe('validation_failed');
    // Common practice (no published source): a person reads an amount in money and a count in whole units, never as field names.
    expect(refused.body.details).toEqual(
      expect.arrayContaining([
        'Line 1 (Rear-sump oil pan): Unit price must be at most 100,000,000.00',
        'Line 2 (Motor mount kit): Quantity must be at most 10,000',
        'Line 2 (Motor mount kit): Unit cost must be 0.00 or more',
        'Line 2 (Motor mount kit): Markup must be at most 1,000%',
        'Line 3 (Header gasket): Quantity must be a whole number, for example 2',
        'Line 3 (Header gasket): Unit price must be a whole number of cents',
      ]),
    );
    expect(JSON.stringify(refused.body)).not.toMatch(/unitPriceCents|unitCostCents|markupPercent|greater than|less than|10000000000/);
  });

  it('refuses a past last valid day on save with the date written as on screen, and accepts today', async () => {
    const past = await patch({ validUntil: '2020-01-01' });
    expect(past.status).toBe(400);
    expect(past.body.code).toBe('validation_failed');
    // Source: Unicode CLDR "en" medium date pattern "MMM d, y".
    expect(past.body.message).toBe('The last day to accept, Jan 1, 2020, has already passed; choose today or a later day.');
    const created = await t.http.post(`/api/projects/${RIDGEBACK}/quotes`).set(...bearer(demo.estimator)).send({ lines: LINES, validUntil: '2020-01-01' });
    expect(created.status).toBe(400);
    expect(created.body.message).toMatch(/Jan 1, 2020, has already passed/);

    // today in the shop's own time zone
    const today = todayIn(DEMO_SHOP.timeZone);
    const saved = await patch({ validUntil: today });
    expect(saved.status).toBe(200);
    expect(saved.body.revision.validUntil).toBe(today);
  });

  it('refuses to send a quote whose last valid day passed, in a plain sentence with the date as on screen', async () => {
    // A revision stored before the save check (or left to age) still has a past date.
    await t.dataSource.query('UPDATE quote_revisions SET validUntil = ? WHERE quoteId = ?', ['2020-01-01', quoteId]);
    const sent = await t.http.post(`/api/quotes/${quoteId}/send`).set(...bearer(demo.estimator));
    expect(sent.status).toBe(422);
    expect(sent.body.code).toBe('quote_validity_past');
    expect(sent.body.message).toBe(
      `This quote was valid until ${formatCalendarDate('2020-01-01')}, which has passed. Set a later day under "Discount, deposit and validity", then send it.`,
    );
    expect(sent.body.message).not.toMatch(/2020-01-01|ref /);
  });

  it("an older revision's link, once a later revision was accepted and paid, says so with the dates", async () => {
    const [{ shopId }] = await t.dataSource.query('SELECT shopId FROM quotes WHERE id = ?', [quoteId]);
    await t.dataSource.query("UPDATE quotes SET status = 'approved', sentRevision = 2, latestRevision = 2, answeredAt = ?, depositState = 'paid', depositPaidAt = ? WHERE id = ?", [
      new Date('2026-11-30T15:00:00Z'),
      new Date('2026-12-01T09:30:00Z'),
      quoteId,
    ]);
    const revisionOne = new JwtService({ secret: `${process.env.JWT_SECRET}:quote-links` }).sign(
      { q: quoteId, s: shopId, r: 1, exp: Math.floor(Date.now() / 1000) + 3600 },
      { audience: 'quote-approval' },
    );
    const opened = await t.http.get(`/api/quote-links/${revisionOne}`);
    expect(opened.status).toBe(409);
    expect(opened.body.code).toBe('quote_link_already_accepted');
    expect(opened.body.message).toBe(
      'This quote was already accepted on Nov 30, 2026 (revision 2), and the deposit was paid on Dec 1, 2026. There is nothing more to do with this link; the shop will be in touch about the work.',
    );
    expect(opened.body.message).not.toMatch(/newest e-mail/);
  });
});
