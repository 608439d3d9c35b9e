import './helpers/jobs-driven-env';
import { DEMO_PASSWORD, DEMO_PROJECT_IDS } from '@swapwright/seed-data';
import Stripe from 'stripe';
import { ApiProcess, assertApiBuilt, callApi, startApiProcess, stopApiProcess } from './helpers/api-process';
import { capturedMail, lastMailId } from './helpers/mail-fake';
import { freePort, RunningPaymentFake, startPaymentFakeProcess } from './helpers/payment-fake-process';
import { startTestApp, TestApp } from './helpers/test-app';

const LINES = [
  { kind: 'part', description: 'Rear-sump oil pan', quantity: 1, pricing: 'list', unitPriceCents: 28995 },
  { kind: 'labor', description: 'Install pan and pickup', hours: 2.5 },
];
const CUSTOMER = 'customer@ironbark.test';
/** Short, so a job left by a killed process is taken over quickly. */
const LEASE_MS = '1500';

async function until<T>(read: () => Promise<T>, done: (value: T) => boolean, what: string, timeoutMs = 20_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await read();
    if (done(value)) return value;
    if (Date.now() > deadline) throw new Error(`timed out waiting for ${what}`);
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}

/**
 * Exactly once across a process restart: the built API runs as a child process on one port against the test database;
 * it is killed (SIGKILL, no chance to tidy up) before its worker sends, or inside a job between the work and its
 * commit, and started again on the same port. The in-process app here only loads the data (its own worker is off).
 */
describe('background work survives a killed API process', () => {
  let t: TestApp;
  let fake: RunningPaymentFake;
  let port: number;
  let api: ApiProcess | undefined;
  let estimator: string;
  let customer: string;
  let mailBaseline = 0;

  const start = async (env: Record<string, string> = {}) => {
    api = await startApiProcess(
      {
        JOBS_WORKER_ENABLED: 'true',
        JOBS_LEASE_MS: LEASE_MS,
        JOBS_MAX_ATTEMPTS: '5',
        PAYMENT_API_URL: fake.url,
        PAYMENT_SECRET_KEY: fake.secretKey,
        PAYMENT_WEBHOOK_SECRET: fake.webhookSecret,
        ...env,
      },
      port,
    );
    return api;
  };
  /** The quote's mails received since the test began (quote numbers repeat across runs; the fake keeps older mail). */
  const mailsFor = async (label: string) =>
    (await capturedMail()).filter((mail) => mail.id > mailBaseline && mail.to.includes(CUSTOMER) && mail.subject.includes(`quote ${label}`));
  const jobOf = async (kind: string, key: string) =>
    (await t.dataSource.query('SELECT `state`, `attempts`, `result` FROM `jobs` WHERE `kind` = ? AND `idempotencyKey` = ?', [kind, key]))[0];
  const count = async (sql: string, parameters: unknown[]) => Number((await t.dataSource.query(sql, parameters))[0].n);

  beforeAll(async () => {
    assertApiBuilt();
    t = await startTestApp();
    port = await freePort();
    fake = await startPaymentFakeProcess(`http://127.0.0.1:${port}/api/payments/webhook`);
  }, 60_000);

  afterAll(async () => {
    await stopApiProcess(api, 'SIGKILL');
    await fake?.stop();
    await t?.close();
  });

  beforeEach(async () => {
    mailBaseline = await lastMailId();
  });

  const createQuote = async (instance: ApiProcess) => {
    const created = await callApi(instance, 'POST', `/projects/${DEMO_PROJECT_IDS.ridgeback}/quotes`, { token: estimator, body: { lines: LINES } });
    expect(created.status).toBe(201);
    return created.body as { id: string; label: string };
  };

  it('a quote sent, then the process killed before its worker ran: after the restart the e-mail goes out once', async () => {
    const first = await start({ JOBS_WORKER_ENABLED: 'false' });
    estimator = (await callApi(first, 'POST', '/auth/sign-in', { body: { email: 'estimator@ironbark.test', password: DEMO_PASSWORD } })).body.accessToken;
    customer = (await callApi(first, 'POST', '/auth/sign-in', { body: { email: CUSTOMER, password: DEMO_PASSWORD } })).body.accessToken;
    const quote = await createQuote(first);
    expect((await callApi(first, 'POST', `/quotes/${quote.id}/send`, { token: estimator })).status).toBe(200);
    expect(await jobOf('quote.mail', `${quote.id}:r1`)).toMatchObject({ state: 'queued', attempts: 0 });
    await stopApiProcess(first, 'SIGKILL');
    expect(await mailsFor(quote.label)).toHaveLength(0);

    await start();
    await until(() => jobOf('quote.mail', `${quote.id}:r1`), (job) => job.state === 'done', 'the quote mail job');
    // Give a second delivery every chance to show up before counting.
    await new Promise((resolve) => setTimeout(resolve, 1000));
    const mails = await mailsFor(quote.label);
    expect(mails).toHaveLength(1);
    expect(mails[0].attachments.map((attachment) => attachment.contentType)).toEqual(['application/pdf']);
    expect(await jobOf('quote.mail', `${quote.id}:r1`)).toMatchObject({ state: 'done', attempts: 1, result: mails[0].messageId });
    await stopApiProcess(api, 'SIGKILL');
  }, 120_000);

  it('killed after the relay accepted the quote e-mail but before the job committed: sent again with the same Message-ID, never lost', async () => {
    const crashing = await start({ JOBS_CRASH_BEFORE_COMMIT: 'quote.mail' });
    const quote = await createQuote(crashing);
    expect((await callApi(crashing, 'POST', `/quotes/${quote.id}/send`, { token: estimator })).status).toBe(200);
    await crashing.exited; // the worker sent the mail, then the process killed itself before the commit
    expect(crashing.process.signalCode).toBe('SIGKILL');
    expect(await mailsFor(quote.label)).toHaveLength(1);
    expect(await jobOf('quote.mail', `${quote.id}:r1`)).toMatchObject({ state: 'running', attempts: 1 });

    await start();
    // Taken over once the lease of the killed worker ends.
    await until(() => jobOf('quote.mail', `${quote.id}:r1`), (job) => job.state === 'done', 'the quote mail job after the lease');
    await new Promise((resolve) => setTimeout(resolve, 1000));
    const mails = await mailsFor(quote.label);
    // At least once: the relay got it twice, as one message (one Message-ID) that mail systems show once.
    expect(mails).toHaveLength(2);
    expect(new Set(mails.map((mail) => mail.messageId)).size).toBe(1);
    expect(await jobOf('quote.mail', `${quote.id}:r1`)).toMatchObject({ state: 'done', attempts: 2, result: mails[0].messageId });
    await stopApiProcess(api, 'SIGKILL');
  }, 120_000);

  it('a payment event whose application was cut off by a kill is applied exactly once after the restart and the redelivery', async () => {
    const normal = await start();
    const quote = await createQuote(normal);
    expect((await callApi(normal, 'POST', `/quotes/${quote.id}/send`, { token: estimator })).status).toBe(200);
    expect((await callApi(normal, 'POST', `/quotes/${quote.id}/answer`, { token: customer, body: { answer: 'accept' } })).status).toBe(200);
    await stopApiProcess(normal, 'SIGKILL');

    const crashing = await start({ JOBS_CRASH_BEFORE_COMMIT: 'payment.event' });
    // The provider's event arrives 50 ms after the payment answers; the process may die before or after answering.
    await callApi(crashing, 'POST', `/quotes/${quote.id}/deposit`, { token: customer, body: { paymentMethod: 'pm_card_visa' } }).catch(() => undefined);
    await crashing.exited;
    const events = (await (await fetch(`${fake.url}/_fake/events`)).json()) as Stripe.Event[];
    const succeeded = events.filter((event) => event.type === 'payment_intent.succeeded').at(-1)!;
    expect((succeeded.data.object as Stripe.PaymentIntent).metadata.quoteId).toBe(quote.id);
    // Everything the application wrote was rolled back with the killed transaction.
    const settled = () => count("SELECT COUNT(*) AS n FROM audit_events WHERE action = 'payment.settled' AND subjectId = ?", [quote.id]);
    const workOrders = () => count('SELECT COUNT(*) AS n FROM work_orders WHERE quoteId = ?', [quote.id]);
    const applied = () => count('SELECT COUNT(*) AS n FROM payment_events WHERE eventId = ?', [succeeded.id]);
    expect(await jobOf('payment.event', succeeded.id)).toMatchObject({ state: 'running', attempts: 1 });
    expect([await settled(), await workOrders(), await applied()]).toEqual([0, 0, 0]);
    expect((await t.dataSource.query('SELECT depositState FROM quotes WHERE id = ?', [quote.id]))[0].depositState).toBe('due');

    const restarted = await start();
    // The provider redelivers (it got no answer, or retries anyway): the event is already queued, nothing is added.
    const redelivered = await (await fetch(`${fake.url}/_fake/events/${succeeded.id}/deliver`, { method: 'POST' })).json();
    expect(redelivered).toEqual({ delivered: 200 });
    await until(() => jobOf('payment.event', succeeded.id), (job) => job.state === 'done', 'the payment event job after the lease');
    expect(await jobOf('payment.event', succeeded.id)).toMatchObject({ state: 'done', attempts: 2 });
    expect([await settled(), await workOrders(), await applied()]).toEqual([1, 1, 1]);
    const quoteNow = await callApi(restarted, 'GET', `/quotes/${quote.id}`, { token: customer });
    expect(quoteNow.body).toMatchObject({ status: 'approved', depositState: 'paid' });

    // A later redelivery changes nothing either.
    const payload = JSON.stringify(succeeded);
    const replay = await fetch(`${restarted.base}/payments/webhook`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', 'stripe-signature': Stripe.webhooks.generateTestHeaderString({ payload, secret: fake.webhookSecret }) },
      body: payload,
    });
    expect(await replay.json()).toEqual({ received: true, applied: false });
    await new Promise((resolve) => setTimeout(resolve, 500));
    expect([await settled(), await workOrders(), await applied()]).toEqual([1, 1, 1]);
    await stopApiProcess(api, 'SIGKILL');
  }, 120_000);
});
