import { DEMO_PROJECT_IDS, DemoRole } from '@swapwright/seed-data';
import Stripe from 'stripe';
import { startAppWithPayments, until } from './helpers/app-with-payments';
import { bearer, countRows, resetData, Session, signInAllRoles, TestApp } from './helpers/test-app';
import { lastMailId, waitForMail } from './helpers/mail-fake';
import { RunningPaymentFake } from './helpers/payment-fake-process';

const LINES = [
  { kind: 'part', description: 'Rear-sump oil pan', quantity: 1, pricing: 'list', unitPriceCents: 28995 },
  { kind: 'labor', description: 'Install pan and pickup', hours: 2.5 },
];

describe('deposit payments through the provider SDK and its local fake', () => {
  let t: TestApp;
  let demo: Record<DemoRole, Session>;
  let fake: RunningPaymentFake;
  let token: string;
  let quoteId: string;
  let stop: () => Promise<void>;

  beforeAll(async () => {
    ({ t, fake, stop } = await startAppWithPayments());
    await resetData(t.dataSource);
    demo = await signInAllRoles(t.http);
    const created = await t.http.post(`/api/projects/${DEMO_PROJECT_IDS.ridgeback}/quotes`).set(...bearer(demo.estimator)).send({ lines: LINES });
    quoteId = created.body.id;
    const before = await lastMailId();
    await t.http.post(`/api/quotes/${quoteId}/send`).set(...bearer(demo.estimator)).expect(200);
    const mail = await waitForMail('customer@ironbark.test', /quote Q-/, before);
    token = /\/quote-answer\/([A-Za-z0-9_\-.]+)/.exec(mail.text)![1];
  });

  afterAll(() => stop());

  const quoteByLink = async () => (await t.http.get(`/api/quote-links/${token}`)).body;
  const webhook = (body: string, signature: string) =>
    t.http.post('/api/payments/webhook').set('content-type', 'application/json').set('stripe-signature', signature).send(body);

  it('refuses a deposit before the quote is approved', async () => {
    const response = await t.http.post(`/api/quote-links/${token}/deposit`).send({ paymentMethod: 'pm_card_visa' });
    expect(response.status).toBe(409);
    expect(response.body.message).toMatch(/Approve the quote/);
  });

  it('a declined card leaves the quote approved and unpaid, with a message and a way to retry', async () => {
    await t.http.post(`/api/quote-links/${token}/answer`).send({ answer: 'accept' }).expect(200);
    const declined = await t.http.post(`/api/quote-links/${token}/deposit`).send({ paymentMethod: 'pm_card_chargeDeclined' });
    expect(declined.status).toBe(402);
    expect(declined.body.code).toBe('card_declined');
    expect(declined.body.message).toMatch(/declined.*Nothing was charged.*Try another card/);
    // The provider's failure event arrives too; it changes nothing about the quote.
    await until(() => t.dataSource.query("SELECT state FROM deposit_payments WHERE quoteId = ?", [quoteId]), (rows) => rows[0]?.state === 'failed', 'the failed payment');
    await until(() => countRows(t.dataSource, 'payment_events'), (n) => n >= 1, 'the failure event');
    const quote = await quoteByLink();
    expect(quote).toMatchObject({ status: 'approved', depositState: 'due', depositPaidAt: null });
  });

  it('a deposit paid through the fake settles when its signed event arrives, exactly once', async () => {
    const paid = await t.http.post(`/api/quote-links/${token}/deposit`).send({ paymentMethod: 'pm_card_visa' });
    expect(paid.status).toBe(200);
    // Demo shop: parts 289.95, labor 2.5 x 135 = 337.50, supplies 4 % = 13.50, tax 8.25 % of parts = 23.920875 -> 23.92;
    // total 664.87; deposit 30 % = 199.461 -> 199.46
    expect(paid.body).toMatchObject({ state: 'pending', amountCents: 19946, currency: 'USD' });
    const settled = await until(quoteByLink, (quote) => quote.depositState === 'paid', 'the deposit to settle');
    expect(settled.status).toBe('approved');
    expect(settled.depositPaidAt).not.toBeNull();
    const notes = await t.http.get('/api/quotes/notifications').set(...bearer(demo.estimator));
    expect(notes.body.map((note: { message: string }) => note.message)).toContainEqual(expect.stringMatching(/paid the deposit/));
    const again = await t.http.post(`/api/quote-links/${token}/deposit`).send({ paymentMethod: 'pm_card_visa' });
    expect(again.status).toBe(409);
  });

  it('a duplicate or replayed event changes nothing', async () => {
    const events = (await (await fetch(`${fake.url}/_fake/events`)).json()) as Stripe.Event[];
    const succeeded = events.filter((event) => event.type === 'payment_intent.succeeded').at(-1)!;
    const eventsBefore = await countRows(t.dataSource, 'payment_events');
    const quoteBefore = await quoteByLink();
    const redelivered = (await (await fetch(`${fake.url}/_fake/events/${succeeded.id}/deliver`, { method: 'POST' })).json()) as { delivered: number };
    expect(redelivered.delivered).toBe(200);
    // The same event, freshly signed (a replay within the tolerance): received, not applied.
    const payload = JSON.stringify(succeeded);
    const replay = await webhook(payload, Stripe.webhooks.generateTestHeaderString({ payload, secret: fake.webhookSecret }));
    expect(replay.status).toBe(200);
    expect(replay.body).toEqual({ received: true, applied: false });
    expect(await countRows(t.dataSource, 'payment_events')).toBe(eventsBefore);
    expect(await quoteByLink()).toEqual(quoteBefore);
  });

  it('refuses a forged, altered or stale signature', async () => {
    const event = { id: 'evt_forged_1', object: 'event', type: 'payment_intent.succeeded', created: Math.floor(Date.now() / 1000), data: { object: { id: 'pi_forged', object: 'payment_intent' } } };
    const payload = JSON.stringify(event);
    const wrongSecret = await webhook(payload, Stripe.webhooks.generateTestHeaderString({ payload, secret: 'whsec_not_the_shops' }));
    expect(wrongSecret.status).toBe(400);
    expect(wrongSecret.body.code).toBe('webhook_signature_invalid');
    const signed = Stripe.webhooks.generateTestHeaderString({ payload, secret: fake.webhookSecret });
    const altered = await webhook(payload.replace('evt_forged_1', 'evt_forged_2'), signed);
    expect(altered.status).toBe(400);
    // Source: the provider's SDK refuses timestamps older than its default tolerance of 300 s.
    const stale = await webhook(payload, Stripe.webhooks.generateTestHeaderString({ payload, secret: fake.webhookSecret, timestamp: Math.floor(Date.now() / 1000) - 600 }));
    expect(stale.status).toBe(400);
    expect((await webhook(payload, '')).status).toBe(400);
    expect(await t.dataSource.query("SELECT * FROM payment_events WHERE eventId LIKE 'evt_forged%'")).toEqual([]);
  });

  it('a signed-in customer pays the deposit of their own quote the same way', async () => {
    const created = await t.http.post(`/api/projects/${DEMO_PROJECT_IDS.ridgeback}/quotes`).set(...bearer(demo.estimator)).send({ lines: LINES });
    await t.http.post(`/api/quotes/${created.body.id}/send`).set(...bearer(demo.estimator)).expect(200);
    await t.http.post(`/api/quotes/${created.body.id}/answer`).set(...bearer(demo.customer)).send({ answer: 'accept' }).expect(200);
    expect((await t.http.post(`/api/quotes/${created.body.id}/deposit`).set(...bearer(demo.estimator)).send({ paymentMethod: 'pm_card_visa' })).status).toBe(403);
    const bad = await t.http.post(`/api/quotes/${created.body.id}/deposit`).set(...bearer(demo.customer)).send({ paymentMethod: '4242424242424242' });
    expect(bad.status).toBe(400);
    const paid = await t.http.post(`/api/quotes/${created.body.id}/deposit`).set(...bearer(demo.customer)).send({ paymentMethod: 'pm_card_visa' });
    expect(paid.status).toBe(200);
    await until(
      async () => (await t.http.get(`/api/quotes/${created.body.id}`).set(...bearer(demo.customer))).body,
      (quote) => quote.depositState === 'paid',
      'the second deposit',
    );
  });
});
