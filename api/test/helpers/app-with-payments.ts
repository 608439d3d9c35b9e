import { createTestApp, TestApp } from './test-app';
import { freePort, RunningPaymentFake, startPaymentFakeProcess } from './payment-fake-process';

/** Polls `read` until `done` says so (webhooks arrive on their own time), or fails naming `what`. */
export async function until<T>(read: () => Promise<T>, done: (value: T) => boolean, what: string): Promise<T> {
  for (let attempt = 0; attempt < 80; attempt++) {
    const value = await read();
    if (done(value)) return value;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error(`timed out waiting for ${what}`);
}

/**
 * The app listening where the payment fake sends its signed events: the fake the test services run
 * (scripts/stack.sh, which sends to PORT), or without it one started here. `stop` closes both and puts the environment back.
 */
export async function startAppWithPayments(): Promise<{ t: TestApp; fake: RunningPaymentFake; stop: () => Promise<void> }> {
  const saved = { ...process.env };
  const { PAYMENT_API_URL, PAYMENT_SECRET_KEY, PAYMENT_WEBHOOK_SECRET, PORT } = process.env;
  let appPort: number;
  let fake: RunningPaymentFake;
  if (PAYMENT_API_URL && PAYMENT_SECRET_KEY && PAYMENT_WEBHOOK_SECRET && PORT) {
    appPort = Number(PORT);
    fake = { url: PAYMENT_API_URL, secretKey: PAYMENT_SECRET_KEY, webhookSecret: PAYMENT_WEBHOOK_SECRET, stop: async () => undefined };
  } else {
    appPort = await freePort();
    fake = await startPaymentFakeProcess(`http://127.0.0.1:${appPort}/api/payments/webhook`);
    process.env.PAYMENT_API_URL = fake.url;
    process.env.PAYMENT_SECRET_KEY = fake.secretKey;
    process.env.PAYMENT_WEBHOOK_SECRET = fake.webhookSecret;
  }
  const t = await createTestApp();
  await t.app.listen(appPort, '127.0.0.1');
  return {
    t,
    fake,
    stop: async () => {
      await t.close();
      await fake.stop();
      process.env = saved;
    },
  };
}
