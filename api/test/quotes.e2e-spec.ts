import { JwtService } from '@nestjs/jwt';
import { formatDayIn } from '@swapwright/shared';
import { DEMO_CUSTOMER_IDS, DEMO_PROJECT_IDS, DEMO_SHOP, DemoRole } from '@swapwright/seed-data';
import { seedCatalog } from '../src/database/seed/seed-catalog';
import { bearer, countRows, createTestApp, resetData, Session, signInAllRoles, TestApp } from './helpers/test-app';
import { lastMailId, waitForMail } from './helpers/mail-fake';
import { pdfText } from './helpers/pdf-text';

const RIDGEBACK = DEMO_PROJECT_IDS.ridgeback;
const CUSTOMER_EMAIL = 'customer@ironbark.test';
const ESTIMATOR_EMAIL = 'estimator@ironbark.test';

// Demo shop rates: labor 135.00 per hour, parts tax 8.25 %, supplies 4 %, no cap; deposit 30 %.
const HAND_LINES = [
  { kind: 'part', description: 'Rear-sump oil pan', quantity: 1, pricing: 'list', unitPriceCents: 28995 },
  { kind: 'part', description: 'Pickup tube and screen', quantity: 2, pricing: 'cost-plus', unitCostCents: 4137, markupPercent: 35 },
  { kind: 'labor', description: 'Remove and install engine', hours: 8.5 },
  { kind: 'labor', description: 'Install pan and pickup', hours: 1.3 },
];

function tokenOf(text: string): string {
  const match = /\/quote-answer\/([A-Za-z0-9_\-.]+)/.exec(text);
  if (!match) throw new Error('no approval link in the mail');
  return match[1];
}

describe('labor operations and quotes', () => {
  let t: TestApp;
  let demo: Record<DemoRole, Session>;

  beforeAll(async () => {
    t = await createTestApp();
    await resetData(t.dataSource);
    await seedCatalog(t.dataSource);
    demo = await signInAllRoles(t.http);
  });

  afterAll(() => t.close());

  it('lists the seeded labor operations with torque in lbf·ft and N·m; the estimator edits them, the customer may not read them', async () => {
    const list = await t.http.get('/api/labor-operations').set(...bearer(demo.estimator));
    expect(list.status).toBe(200);
    expect(list.body.length).toBeGreaterThanOrEqual(8);
    const pan = list.body.find((operation: { code: string }) => operation.code === 'oil-pan-pickup');
    // Source: NIST SP 811 (2008), appendix B.9: 1 lbf·ft = 1.355 818 N·m; 18 lbf·ft = 24.40 N·m, shown to a tenth.
    expect(pan.torqueSpecs[0]).toEqual({ joint: 'oil-pump-to-main-cap', fastener: 'Oil pump to rear main cap', lbfFt: 18, newtonMetres: 24.4, sequence: null });
    expect((await t.http.get('/api/labor-operations').set(...bearer(demo.customer))).status).toBe(403);

    const created = await t.http
      .post('/api/labor-operations')
      .set(...bearer(demo.estimator))
      .send({ code: 'exhaust-fab', name: 'Fabricate exhaust down-pipes', bookHours: 4.5, matches: ['exhaust'], hazards: ['welding'] });
    expect(created.status).toBe(201);
    expect((await t.http.post('/api/labor-operations').set(...bearer(demo.estimator)).send({ code: 'exhaust-fab', name: 'again', bookHours: 1 })).status).toBe(409);
    const badHours = await t.http.post('/api/labor-operations').set(...bearer(demo.estimator)).send({ code: 'x-op', name: 'x', bookHours: 1.25 });
    expect(badHours.status).toBe(400);
    expect(badHours.body.message).toMatch(/tenth of an hour/);
    const patched = await t.http.patch(`/api/labor-operations/${created.body.id}`).set(...bearer(demo.owner)).send({ bookHours: 5 });
    expect(patched.body.bookHours).toBe(5);
    expect((await t.http.patch(`/api/labor-operations/${created.body.id}`).set(...bearer(demo.owner)).send({ name: null })).status).toBe(400);
    expect((await t.http.delete(`/api/labor-operations/${created.body.id}`).set(...bearer(demo.fabricator))).status).toBe(403);
    expect((await t.http.delete(`/api/labor-operations/${created.body.id}`).set(...bearer(demo.estimator))).status).toBe(204);
  });

  it('prices hand-entered lines by the quote rule, to the cent', async () => {
    const response = await t.http.post(`/api/projects/${RIDGEBACK}/quotes`).set(...bearer(demo.estimator)).send({ lines: HAND_LINES });
    expect(response.status).toBe(201);
    // Source: our published quote rule; worked by hand:
    // pickup 41.37 x 1.35 = 55.8495 -> 55.85, x 2 = 111.70; parts 289.95 + 111.70 = 401.65
    // labor 8.5 x 135 = 1147.50; 1.3 x 135 = 175.50; labor 1323.00; supplies 1323.00 x 4 % = 52.92
    // tax 401.65 x 8.25 % = 33.136125 -> 33.14; total 401.65 + 1323.00 + 52.92 + 33.14 = 1810.71; deposit x 30 % = 543.213 -> 543.21
    expect(response.body.revision.totals).toEqual({
      partsSubtotalCents: 40165,
      laborSubtotalCents: 132300,
      suppliesCents: 5292,
      partsDiscountCents: 0,
      laborDiscountCents: 0,
      partsTaxCents: 3314,
      laborTaxCents: 0,
      taxCents: 3314,
      totalCents: 181071,
      depositCents: 54321,
    });
    expect(response.body).toMatchObject({ status: 'drafting', label: expect.stringMatching(/^Q-\d{4}$/), latestRevision: 1, sentRevision: null });
    expect(response.body.roundingRule).toMatch(/halves away from zero/);
    expect(response.body.roundingRule).toMatch(/cost x \(1 \+ markup\)/);
    const bad = await t.http
      .post(`/api/projects/${RIDGEBACK}/quotes`)
      .set(...bearer(demo.estimator))
      .send({ lines: [{ kind: 'labor', description: 'x', hours: 1.25 }] });
    expect(bad.status).toBe(400);
    expect((await t.http.post(`/api/projects/${RIDGEBACK}/quotes`).set(...bearer(demo.fabricator)).send({ lines: HAND_LINES })).status).toBe(403);
  });

  it('drafts from the stored fit report: names the report, quotes the base operation and the remedies', async () => {
    const report = await t.http.post(`/api/projects/${RIDGEBACK}/fit-reports`).set(...bearer(demo.estimator));
    expect(report.status).toBe(201);
    const response = await t.http.post(`/api/projects/${RIDGEBACK}/quotes`).set(...bearer(demo.estimator)).send({});
    expect(response.status).toBe(201);
    expect(response.body.revision.fitReportId).toBe(report.body.id);
    const descriptions = response.body.revision.lines.map((line: { description: string }) => line.description);
    expect(descriptions).toContain('Remove the old engine and install the swap engine and transmission');
    expect(response.body.revision.lines.some((line: { source: string }) => line.source === 'fit-remedy')).toBe(true);
  });

  describe('sending, freezing, answering', () => {
    let quoteId: string;
    let token: string;

    it('sends: the customer gets the PDF (totals, rounding rule, cautions) and a signed link', async () => {
      const created = await t.http.post(`/api/projects/${RIDGEBACK}/quotes`).set(...bearer(demo.estimator)).send({ lines: HAND_LINES, validUntil: '2099-01-15' });
      quoteId = created.body.id;
      // The send confirmation names where the e-mail goes before anything is sent.
      expect(created.body).toMatchObject({ customerEmail: CUSTOMER_EMAIL, sentRevision: null });
      expect((await t.http.get(`/api/quotes/${quoteId}`).set(...bearer(demo.customer))).status).toBe(404);
      const before = await lastMailId();
      const sent = await t.http.post(`/api/quotes/${quoteId}/send`).set(...bearer(demo.estimator));
      expect(sent.status).toBe(200);
      expect(sent.body).toMatchObject({ status: 'awaiting-answer', sentRevision: 1 });
      const mail = await waitForMail(CUSTOMER_EMAIL, /quote Q-\d{4}/, before);
      expect(mail.attachments).toHaveLength(1);
      expect(mail.attachments[0]).toMatchObject({ contentType: 'application/pdf', filename: expect.stringMatching(/rev1\.pdf$/) });
      const text = await pdfText(Buffer.from(mail.attachments[0].contentBase64, 'base64'));
      expect(text).toContain('1,810.71');
      expect(text).toContain('543.21');
      // One money style in the PDF, the e-mail and on screen: the currency's sign, grouping and cents.
      // Source: Unicode CLDR "en" currency pattern ¤#,##0.00 (ECMA-402 Intl.NumberFormat, style currency).
      expect(text).toContain('$1,810.71');
      expect(text).toContain('$543.21');
      expect(text).not.toMatch(/USD \d/);
      expect(mail.text).toContain('Total $1,810.71, deposit on approval $543.21.');
      expect(text).toMatch(/planning aid/i);
      expect(text).toMatch(/Lifting an engine/);
      expect(text).toMatch(/halves away from zero/);
      expect(text).toContain('Ironbark Swap Works');
      // The customer reads days as days, in the app's one date style, never as ISO dates; a calendar day stays that day.
      // Source: Unicode CLDR, locale "en", medium date pattern "MMM d, y" (ECMA-402 Intl.DateTimeFormat, month short).
      expect(text).toContain('Valid until Jan 15, 2099');
      // The day it was sent in the shop's own time zone.
      expect(text).toContain(`Issued ${formatDayIn(new Date(sent.body.revision.sentAt), DEMO_SHOP.timeZone)}`);
      expect(text).toMatch(/Fit report [0-9a-f]{8} of [A-Z][a-z]{2} \d{1,2}, \d{4}:/);
      expect(text).not.toMatch(/\d{4}-\d{2}-\d{2}/);
      expect(text).not.toMatch(/markup/);
      expect(mail.text).toContain('(the link works until Jan 15, 2099)');
      expect(mail.text.replace(/\/quote-answer\/\S+/, '')).not.toMatch(/\d{4}-\d{2}-\d{2}/);
      token = tokenOf(mail.text);
      const project = await t.http.get(`/api/projects/${RIDGEBACK}`).set(...bearer(demo.estimator));
      expect(project.body.status).toBe('quote-sent');
    });

    it('opens the quote through the link; a tampered or expired link is refused', async () => {
      const opened = await t.http.get(`/api/quote-links/${token}`);
      expect(opened.status).toBe(200);
      expect(opened.body.revision.totals.totalCents).toBe(181071);
      expect(opened.body.shopName).toBe('Ironbark Swap Works');
      // The customer reads how the figures are rounded, not how the shop marks its cost up.
      expect(opened.body.roundingRule).toMatch(/halves away from zero/);
      expect(opened.body.roundingRule).not.toMatch(/markup|cost/);
      const pdf = await t.http.get(`/api/quote-links/${token}/pdf`).buffer(true).parse((res, done) => {
        const chunks: Buffer[] = [];
        res.on('data', (chunk: Buffer) => chunks.push(chunk));
        res.on('end', () => done(null, Buffer.concat(chunks)));
      });
      expect(pdf.status).toBe(200);
      expect(pdf.headers['content-type']).toBe('application/pdf');

      const [head, payload, signature] = token.split('.');
      const flipped = signature.slice(0, -2) + (signature.at(-2) === 'A' ? 'B' : 'A') + signature.at(-1);
      const tampered = await t.http.get(`/api/quote-links/${head}.${payload}.${flipped}`);
      expect(tampered.status).toBe(401);
      expect(tampered.body.code).toBe('quote_link_invalid');
      const forgedPayload = Buffer.from(JSON.stringify({ ...JSON.parse(Buffer.from(payload, 'base64url').toString()), r: 2 })).toString('base64url');
      expect((await t.http.get(`/api/quote-links/${head}.${forgedPayload}.${signature}`)).status).toBe(401);

      const claims = JSON.parse(Buffer.from(payload, 'base64url').toString());
      const expired = new JwtService({ secret: `${process.env.JWT_SECRET}:quote-links` }).sign(
        { q: claims.q, s: claims.s, r: claims.r, exp: Math.floor(Date.now() / 1000) - 60 },
        { audience: 'quote-approval' },
      );
      const refused = await t.http.get(`/api/quote-links/${expired}`);
      expect(refused.status).toBe(410);
      expect(refused.body.message).toMatch(/expired/);
      // A sign-in token is not a quote link.
      expect((await t.http.get(`/api/quote-links/${demo.customer.accessToken}`)).status).toBe(401);
    });

    it('a sent revision is frozen: a change makes revision 2, the customer still sees 1, and the two compare', async () => {
      const changed = await t.http
        .patch(`/api/quotes/${quoteId}`)
        .set(...bearer(demo.estimator))
        .send({ discount: { kind: 'percent', percent: 5 } });
      expect(changed.status).toBe(200);
      expect(changed.body.latestRevision).toBe(2);
      expect(changed.body.revision.number).toBe(2);
      // 5 % off parts 401.65 = 20.0825 -> 20.08; off labor 1323.00 = 66.15
      expect(changed.body.revision.totals).toMatchObject({ partsDiscountCents: 2008, laborDiscountCents: 6615 });
      const first = await t.http.get(`/api/quotes/${quoteId}?revision=1`).set(...bearer(demo.estimator));
      expect(first.body.revision.totals.totalCents).toBe(181071);
      expect(first.body.revision.sent).toBe(true);
      const asCustomer = await t.http.get(`/api/quotes/${quoteId}`).set(...bearer(demo.customer));
      expect(asCustomer.body.revision.number).toBe(1);
      expect(asCustomer.body.revisions).toHaveLength(1);
      const compared = await t.http.get(`/api/quotes/${quoteId}/compare?from=1&to=2`).set(...bearer(demo.estimator));
      expect(compared.status).toBe(200);
      expect(compared.body.lines).toEqual([]);
      expect(compared.body.totals).toContainEqual(expect.objectContaining({ field: 'partsDiscountCents', beforeCents: 0, afterCents: 2008 }));
    });

    it("another customer of the shop signed in gets not found for this sent quote: no lines, no answer, no deposit", async () => {
      const email = 'odile.quotes@example.test';
      const before = await lastMailId();
      await t.http.post('/api/invitations').set(...bearer(demo.owner)).send({ email, role: 'customer', customerId: DEMO_CUSTOMER_IDS.odile }).expect(201);
      const invitation = await waitForMail(email, /./, before);
      const token = decodeURIComponent(/accept-invite\?token=([A-Za-z0-9_%-]+)/.exec(invitation.text)?.[1] ?? '');
      const accepted = await t.http.post('/api/invitations/accept').send({ token, name: 'Odile Straker', password: 'odile-pass-1' }).expect(200);
      const other = accepted.body as Session;
      const read = await t.http.get(`/api/quotes/${quoteId}`).set(...bearer(other));
      expect(read.status).toBe(404);
      expect(JSON.stringify(read.body)).not.toContain('Rear-sump oil pan');
      expect((await t.http.post(`/api/quotes/${quoteId}/answer`).set(...bearer(other)).send({ answer: 'accept' })).status).toBe(404);
      expect((await t.http.post(`/api/quotes/${quoteId}/deposit`).set(...bearer(other)).send({ paymentMethod: 'pm_card_visa' })).status).toBe(404);
      expect((await t.http.get(`/api/quotes/${quoteId}/pdf`).set(...bearer(other))).status).toBe(404);
      // the quote's own customer still reads it
      expect((await t.http.get(`/api/quotes/${quoteId}`).set(...bearer(demo.customer))).status).toBe(200);
    });

    it("the customer, signed in or by the link, sees each line's price but never the shop's cost or markup", async () => {
      type Line = { description: string; pricing: string; unitPriceCents: number; unitCostCents: number | null; markupPercent: number | null };
      const pickupOf = (body: { revision: { lines: Line[] } }) => body.revision.lines.find((line) => line.description === 'Pickup tube and screen')!;
      const shop = pickupOf((await t.http.get(`/api/quotes/${quoteId}`).set(...bearer(demo.estimator)).expect(200)).body);
      expect(shop).toMatchObject({ pricing: 'cost-plus', unitCostCents: 4137, markupPercent: 35 });
      const readers = [
        (await t.http.get(`/api/quotes/${quoteId}`).set(...bearer(demo.customer)).expect(200)).body,
        (await t.http.get(`/api/projects/${RIDGEBACK}/quotes`).set(...bearer(demo.customer)).expect(200)).body[0],
        (await t.http.get(`/api/quote-links/${token}`).expect(200)).body,
      ];
      for (const body of readers) {
        const line = pickupOf(body);
        expect(line).toMatchObject({ unitCostCents: null, markupPercent: null, unitPriceCents: shop.unitPriceCents });
        expect(body.revision.lines.every((l: Line) => l.unitCostCents === null && l.markupPercent === null)).toBe(true);
      }
    });

    it('edits lines of the working revision by key: quantity, hours, part number, a line removed and one added; compare names before and after', async () => {
      type Line = { key: string; kind: 'part' | 'labor'; description: string; sku: string | null; quantity: number; pricing: string; unitPriceCents: number; unitCostCents: number | null; markupPercent: number | null; hours: number | null; lineTotalCents: number };
      const asInput = (line: Line) =>
        line.kind === 'labor'
          ? { key: line.key, kind: line.kind, description: line.description, hours: line.hours }
          : line.pricing === 'cost-plus'
            ? { key: line.key, kind: line.kind, description: line.description, sku: line.sku, quantity: line.quantity, pricing: line.pricing, unitCostCents: line.unitCostCents, markupPercent: line.markupPercent }
            : { key: line.key, kind: line.kind, description: line.description, sku: line.sku, quantity: line.quantity, pricing: line.pricing, unitPriceCents: line.unitPriceCents };
      const working = await t.http.get(`/api/quotes/${quoteId}`).set(...bearer(demo.estimator));
      const [pan, pickup, engine, install] = working.body.revision.lines as Line[];
      expect(pan.sku).toBeNull();
      const edited = await t.http
        .patch(`/api/quotes/${quoteId}`)
        .set(...bearer(demo.estimator))
        .send({
          lines: [
            { ...asInput(pan), sku: 'TR-4410' },
            { ...asInput(pickup), quantity: 3 },
            { ...asInput(engine), hours: 9 },
            { kind: 'part', description: 'Pan gasket set', sku: 'GS-100', quantity: 1, pricing: 'list', unitPriceCents: 2450 },
          ],
        });
      expect(edited.status).toBe(200);
      // Still the working revision 2 (it was never sent): edits change it in place.
      expect(edited.body.latestRevision).toBe(2);
      const lines = edited.body.revision.lines as Line[];
      expect(lines.map((line) => line.key).slice(0, 3)).toEqual([pan.key, pickup.key, engine.key]);
      expect(lines[0].sku).toBe('TR-4410');
      // Worked by hand: pickup 41.37 x 1.35 = 55.8495 -> 55.85, x 3 = 167.55; engine 9.0 h x 135.00 = 1215.00.
      expect(lines[1].lineTotalCents).toBe(16755);
      expect(lines[2].lineTotalCents).toBe(121500);
      expect(lines[3]).toMatchObject({ sku: 'GS-100', source: 'manual', lineTotalCents: 2450 });
      // parts 289.95 + 167.55 + 24.50 = 482.00; labor 1215.00 (the 1.3 h line removed)
      expect(edited.body.revision.totals).toMatchObject({ partsSubtotalCents: 48200, laborSubtotalCents: 121500 });

      const compared = await t.http.get(`/api/quotes/${quoteId}/compare?from=1&to=2`).set(...bearer(demo.estimator));
      expect(compared.status).toBe(200);
      const byKey = new Map(compared.body.lines.map((line: { key: string }) => [line.key, line]));
      expect(byKey.get(pickup.key)).toMatchObject({
        change: 'changed',
        fields: ['quantity', 'lineTotalCents'],
        before: { quantity: 2, hours: null, unitPriceCents: 5585, lineTotalCents: 11170 },
        after: { quantity: 3, hours: null, unitPriceCents: 5585, lineTotalCents: 16755 },
      });
      expect(byKey.get(engine.key)).toMatchObject({ change: 'changed', fields: ['hours', 'lineTotalCents'], before: { hours: 8.5, lineTotalCents: 114750 }, after: { hours: 9, lineTotalCents: 121500 } });
      expect(byKey.get(install.key)).toMatchObject({ change: 'removed', before: { hours: 1.3, lineTotalCents: 17550 }, after: null });
      expect(compared.body.lines).toContainEqual(expect.objectContaining({ change: 'added', description: 'Pan gasket set', before: null, after: expect.objectContaining({ lineTotalCents: 2450 }) }));
      // The part number alone is not a priced change.
      expect(byKey.has(pan.key)).toBe(false);
      expect(compared.body.totals).toContainEqual(expect.objectContaining({ field: 'partsSubtotalCents', beforeCents: 40165, afterCents: 48200 }));

      const unpriced = await t.http
        .patch(`/api/quotes/${quoteId}`)
        .set(...bearer(demo.estimator))
        .send({ lines: [{ kind: 'part', description: 'Mystery part', quantity: 1 }] });
      expect(unpriced.status).toBe(400);
      expect(unpriced.body.message).toMatch(/line 1 \(part\) needs unitPriceCents/);
      const tooLongSku = await t.http
        .patch(`/api/quotes/${quoteId}`)
        .set(...bearer(demo.estimator))
        .send({ lines: [{ kind: 'part', description: 'x', sku: 'S'.repeat(61), unitPriceCents: 100 }] });
      expect(tooLongSku.status).toBe(400);
      expect((await t.http.get(`/api/quotes/${quoteId}`).set(...bearer(demo.estimator))).body.revision.totals.partsSubtotalCents).toBe(48200);
    });

    it('declining needs a reason; accepting through the link approves it and tells the estimator by mail and in the app', async () => {
      const noReason = await t.http.post(`/api/quote-links/${token}/answer`).send({ answer: 'decline' });
      expect(noReason.status).toBe(400);
      expect(noReason.body.message).toMatch(/why/i);
      const before = await lastMailId();
      const accepted = await t.http.post(`/api/quote-links/${token}/answer`).send({ answer: 'accept' });
      expect(accepted.status).toBe(200);
      expect(accepted.body).toMatchObject({ status: 'approved', depositState: 'due' });
      expect((await t.http.post(`/api/quote-links/${token}/answer`).send({ answer: 'accept' })).status).toBe(409);
      await waitForMail(ESTIMATOR_EMAIL, /approved/, before);
      const notes = await t.http.get('/api/quotes/notifications').set(...bearer(demo.estimator));
      expect(notes.body[0].message).toMatch(/approved quote Q-\d{4}/);
      const project = await t.http.get(`/api/projects/${RIDGEBACK}`).set(...bearer(demo.estimator));
      expect(project.body.status).toBe('approved');
      expect((await t.http.patch(`/api/quotes/${quoteId}`).set(...bearer(demo.estimator)).send({ notes: 'x' })).status).toBe(409);
    });

    it('a signed-in customer declines with a reason', async () => {
      const created = await t.http.post(`/api/projects/${RIDGEBACK}/quotes`).set(...bearer(demo.estimator)).send({ lines: HAND_LINES });
      await t.http.post(`/api/quotes/${created.body.id}/send`).set(...bearer(demo.estimator));
      const declined = await t.http
        .post(`/api/quotes/${created.body.id}/answer`)
        .set(...bearer(demo.customer))
        .send({ answer: 'decline', reason: 'Going with the smaller engine' });
      expect(declined.status).toBe(200);
      expect(declined.body).toMatchObject({ status: 'turned-down', declineReason: 'Going with the smaller engine' });
      expect((await t.http.post(`/api/quotes/${created.body.id}/answer`).set(...bearer(demo.estimator)).send({ answer: 'accept' })).status).toBe(403);
    });
  });

  describe('a quote of a member\'s own truck', () => {
    it('is not sent: 422 saying there is no customer, nothing frozen, no e-mail queued; the author reads it as their own', async () => {
      const project = await t.http.post('/api/projects').set(...bearer(demo.estimator)).send({ forMyself: true, title: 'Estimator own truck: budget' }).expect(201);
      const created = await t.http.post(`/api/projects/${project.body.id}/quotes`).set(...bearer(demo.estimator)).send({ lines: HAND_LINES }).expect(201);
      expect(created.body.forMyself).toBe(true);
      const jobsBefore = await countRows(t.dataSource, 'jobs');
      const refused = await t.http.post(`/api/quotes/${created.body.id}/send`).set(...bearer(demo.estimator));
      expect(refused.status).toBe(422);
      expect(refused.body.code).toBe('quote_own_project');
      expect(refused.body.message).toBe('This project is your own truck, so there is no customer to send the quote to. Keep the quote as the budget of your build.');
      expect(await countRows(t.dataSource, 'jobs')).toBe(jobsBefore);
      const after = await t.http.get(`/api/quotes/${created.body.id}`).set(...bearer(demo.estimator)).expect(200);
      expect(after.body).toMatchObject({ status: 'drafting', sentRevision: null, forMyself: true });
      expect(after.body.revision.sent).toBe(false);
      const listed = await t.http.get(`/api/projects/${project.body.id}/quotes`).set(...bearer(demo.estimator)).expect(200);
      expect(listed.body.map((quote: { forMyself: boolean }) => quote.forMyself)).toEqual([true]);

      // To the shop's owner it is a colleague's truck, one more customer record: theirs to send, like any other.
      const asOwner = await t.http.get(`/api/quotes/${created.body.id}`).set(...bearer(demo.owner)).expect(200);
      expect(asOwner.body.forMyself).toBe(false);
      const customers = await t.http.get(`/api/projects/${RIDGEBACK}/quotes`).set(...bearer(demo.estimator)).expect(200);
      expect(customers.body.every((quote: { forMyself: boolean }) => quote.forMyself === false)).toBe(true);
    });
  });
});
