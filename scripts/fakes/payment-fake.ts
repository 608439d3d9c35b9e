/**
 * A local stand-in for the payment provider's API, for `npm start` and the tests: the endpoints the app's SDK
 * calls (create, retrieve and confirm a PaymentIntent, form-encoded, bearer secret key, Idempotency-Key honoured),
 * test payment methods (`pm_card_visa` pays, `pm_card_chargeDeclined` is declined), and signed webhooks sent back
 * to the app with the SDK's own signature header. Control routes under /_fake let a test replay an event.
 */
import { createServer, IncomingMessage, Server, ServerResponse } from 'node:http';
import { randomBytes } from 'node:crypto';
import Stripe from 'stripe';

export interface PaymentFakeOptions {
  port: number;
  secretKey: string;
  webhookSecret: string;
  /** Where events go, e.g. http://127.0.0.1:3000/api/payments/webhook */
  webhookUrl: string;
}

interface Intent {
  id: string;
  object: 'payment_intent';
  amount: number;
  currency: string;
  status: 'requires_payment_method' | 'succeeded';
  client_secret: string;
  metadata: Record<string, string>;
  payment_method: string | null;
  last_payment_error: { code: string; message: string; type: string } | null;
  created: number;
  livemode: false;
}

interface FakeEvent {
  id: string;
  object: 'event';
  type: string;
  api_version: string;
  created: number;
  livemode: false;
  data: { object: Intent };
}

const DECLINING = new Set(['pm_card_chargeDeclined', 'pm_card_visa_chargeDeclined']);
const PAYING = new Set(['pm_card_visa', 'pm_card_mastercard']);

const id = (prefix: string) => `${prefix}_${randomBytes(12).toString('hex')}`;

/** Form fields as the SDK sends them (`metadata[quoteId]=…`) into a nested object. */
function parseForm(body: string): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [key, value] of new URLSearchParams(body)) {
    const match = /^([^[]+)\[([^\]]+)\]$/.exec(key);
    if (match) out[match[1]] = { ...((out[match[1]] as Record<string, string>) ?? {}), [match[2]]: value };
    else out[key] = value;
  }
  return out;
}

function readBody(request: IncomingMessage): Promise<string> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    request.on('data', (chunk: Buffer) => chunks.push(chunk));
    request.on('end', () => resolve(Buffer.concat(chunks).toString('utf8')));
    request.on('error', reject);
  });
}

export function startPaymentFake(options: PaymentFakeOptions): Promise<{ server: Server; events: FakeEvent[]; close: () => Promise<void> }> {
  const intents = new Map<string, Intent>();
  const events: FakeEvent[] = [];
  const idempotent = new Map<string, { status: number; body: unknown }>();
  const signer = new Stripe(options.secretKey);

  async function deliver(event: FakeEvent): Promise<number> {
    const payload = JSON.stringify(event);
    const header = signer.webhooks.generateTestHeaderString({ payload, secret: options.webhookSecret });
    try {
      const response = await fetch(options.webhookUrl, { method: 'POST', headers: { 'content-type': 'application/json', 'stripe-signature': header }, body: payload });
      return response.status;
    } catch {
      return 0;
    }
  }

  function emit(type: string, intent: Intent): void {
    const event: FakeEvent = { id: id('evt'), object: 'event', type, api_version: '2025-01-27', created: Math.floor(Date.now() / 1000), livemode: false, data: { object: { ...intent } } };
    events.push(event);
    // Delivered after the API call answers, as the real service does.
    setTimeout(() => void deliver(event), 50);
  }

  function send(response: ServerResponse, status: number, body: unknown): void {
    response.writeHead(status, { 'content-type': 'application/json', 'request-id': id('req') });
    response.end(JSON.stringify(body));
  }

  const error = (type: string, message: string, extra: Record<string, unknown> = {}) => ({ error: { type, message, ...extra } });

  async function handle(request: IncomingMessage, response: ServerResponse): Promise<void> {
    const url = new URL(request.url ?? '/', 'http://127.0.0.1');
    const body = await readBody(request);
    if (url.pathname === '/_fake/events' && request.method === 'GET') return send(response, 200, events);
    const replay = /^\/_fake\/events\/([^/]+)\/deliver$/.exec(url.pathname);
    if (replay && request.method === 'POST') {
      const event = events.find((candidate) => candidate.id === replay[1]);
      if (!event) return send(response, 404, error('invalid_request_error', 'No such event'));
      return send(response, 200, { delivered: await deliver(event) });
    }
    if (request.headers.authorization !== `Bearer ${options.secretKey}`) {
      return send(response, 401, error('invalid_request_error', 'Invalid API Key provided.'));
    }
    const key = request.headers['idempotency-key'];
    const cacheKey = typeof key === 'string' && request.method === 'POST' ? `${url.pathname}:${key}` : null;
    if (cacheKey && idempotent.has(cacheKey)) {
      const cached = idempotent.get(cacheKey)!;
      return send(response, cached.status, cached.body);
    }
    const answer = (status: number, payload: unknown) => {
      if (cacheKey) idempotent.set(cacheKey, { status, body: payload });
      send(response, status, payload);
    };
    const form = parseForm(body);
    if (url.pathname === '/v1/payment_intents' && request.method === 'POST') {
      const amount = Number(form.amount);
      if (!Number.isSafeInteger(amount) || amount < 50) return answer(400, error('invalid_request_error', 'Amount must be at least 50 cents.', { param: 'amount' }));
      const intent: Intent = {
        id: id('pi'),
        object: 'payment_intent',
        amount,
        currency: String(form.currency ?? 'usd'),
        status: 'requires_payment_method',
        client_secret: `${id('pi')}_secret_${randomBytes(8).toString('hex')}`,
        metadata: (form.metadata as Record<string, string>) ?? {},
        payment_method: null,
        last_payment_error: null,
        created: Math.floor(Date.now() / 1000),
        livemode: false,
      };
      intents.set(intent.id, intent);
      return answer(200, intent);
    }
    const one = /^\/v1\/payment_intents\/([^/]+)(\/confirm)?$/.exec(url.pathname);
    const intent = one ? intents.get(one[1]) : undefined;
    if (one && !intent) return answer(404, error('invalid_request_error', `No such payment_intent: '${one[1]}'`, { code: 'resource_missing' }));
    if (one && intent && !one[2] && request.method === 'GET') return answer(200, intent);
    if (one && intent && one[2] && request.method === 'POST') {
      if (intent.status === 'succeeded') return answer(400, error('invalid_request_error', 'This PaymentIntent has already succeeded.', { code: 'payment_intent_unexpected_state' }));
      const method = String(form.payment_method ?? '');
      if (DECLINING.has(method)) {
        intent.last_payment_error = { type: 'card_error', code: 'card_declined', message: 'Your card was declined.' };
        intent.payment_method = method;
        emit('payment_intent.payment_failed', intent);
        return answer(402, error('card_error', 'Your card was declined.', { code: 'card_declined', decline_code: 'generic_decline', payment_intent: intent }));
      }
      if (!PAYING.has(method)) return answer(400, error('invalid_request_error', `No such PaymentMethod: '${method}'`, { code: 'resource_missing', param: 'payment_method' }));
      intent.status = 'succeeded';
      intent.payment_method = method;
      intent.last_payment_error = null;
      emit('payment_intent.succeeded', intent);
      return answer(200, intent);
    }
    send(response, 404, error('invalid_request_error', `Unrecognized request URL (${request.method}: ${url.pathname}).`));
  }

  const server = createServer((request, response) => {
    handle(request, response).catch((failure: Error) => send(response, 500, error('api_error', failure.message)));
  });
  return new Promise((resolve) => {
    server.listen(options.port, '127.0.0.1', () => {
      resolve({ server, events, close: () => new Promise((done) => server.close(() => done())) });
    });
  });
}

if (require.main === module) {
  const options: PaymentFakeOptions = {
    port: Number(process.env.PAYMENT_FAKE_PORT ?? 12111),
    secretKey: process.env.PAYMENT_SECRET_KEY ?? 'sk_test_local',
    webhookSecret: process.env.PAYMENT_WEBHOOK_SECRET ?? 'whsec_local',
    webhookUrl: process.env.PAYMENT_WEBHOOK_URL ?? 'http://127.0.0.1:3000/api/payments/webhook',
  };
  void startPaymentFake(options).then(({ close }) => {
    console.log(`payment fake: http://127.0.0.1:${options.port}, webhooks to ${options.webhookUrl}`);
    const stop = () => void close().then(() => process.exit(0));
    process.on('SIGTERM', stop);
    process.on('SIGINT', stop);
  });
}
