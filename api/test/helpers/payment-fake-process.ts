import { ChildProcess, spawn } from 'node:child_process';
import { createServer } from 'node:net';
import { join } from 'node:path';

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as { port: number };
      server.close(() => resolve(port));
    });
    server.on('error', reject);
  });
}

export interface RunningPaymentFake {
  url: string;
  secretKey: string;
  webhookSecret: string;
  stop: () => Promise<void>;
}

/** Starts scripts/fakes/payment-fake.ts as its own process (as scripts/stack.sh does), sending webhooks to `webhookUrl`. */
export async function startPaymentFakeProcess(webhookUrl: string): Promise<RunningPaymentFake> {
  const port = await freePort();
  const secretKey = 'sk_test_swapwright_suite';
  const webhookSecret = 'whsec_swapwright_suite';
  const root = join(__dirname, '..', '..', '..');
  const child: ChildProcess = spawn(process.execPath, ['--import', 'tsx', 'scripts/fakes/payment-fake.ts'], {
    cwd: root,
    env: { ...process.env, PAYMENT_FAKE_PORT: String(port), PAYMENT_SECRET_KEY: secretKey, PAYMENT_WEBHOOK_SECRET: webhookSecret, PAYMENT_WEBHOOK_URL: webhookUrl },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  await new Promise<void>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error('payment fake did not start')), 15_000);
    child.stdout!.on('data', (chunk: Buffer) => {
      if (chunk.toString().includes('payment fake')) {
        clearTimeout(timer);
        resolve();
      }
    });
    child.on('exit', (code) => reject(new Error(`payment fake exited with ${code}`)));
  });
  return {
    url: `http://127.0.0.1:${port}`,
    secretKey,
    webhookSecret,
    stop: () =>
      new Promise((resolve) => {
        child.once('exit', () => resolve());
        child.kill('SIGTERM');
      }),
  };
}
