/**
 * Background-queue latency through the running API and its fakes: how long a job waits and runs, from the moment its
 * cause committed it (`createdAt`) to the moment the worker marked it done (`doneAt`), both read from the job's own row
 * through GET /api/jobs, so the figure is the database's clock and not the bench's polling.
 *
 * - a plain e-mail: an invitation (POST /api/invitations), sent through the mail fake's SMTP;
 * - a quote's e-mail: the quote rendered to PDF and sent, queued by POST /api/quotes/:id/send;
 * - a payment event: the customer pays the deposit (POST /api/quotes/:id/deposit), the payment fake sends its signed
 *   event to the webhook, and the job settles the deposit and opens the work order.
 *
 * One cause at a time, each waited for, so each figure is the queue's own latency on an otherwise idle API.
 */
import { DEMO_PROJECT_IDS } from '@swapwright/seed-data';

interface JobRow {
  kind: string;
  subject: string;
  state: string;
  createdAt: string;
  doneAt: string | null;
  lastError: string | null;
}

export interface QueueLatency {
  what: string;
  samples: number[];
}

type Call = (method: string, path: string, token: string, body?: unknown) => Promise<unknown>;

function caller(base: string): Call {
  return async (method, path, token, body) => {
    const response = await fetch(base + path, {
      method,
      headers: { 'content-type': 'application/json', authorization: `Bearer ${token}` },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    const text = await response.text();
    if (!response.ok) throw new Error(`${method} ${path} answered ${response.status}: ${text}`);
    return text ? JSON.parse(text) : undefined;
  };
}

/** Waits (up to 20 s) for the newest job of `kind` whose subject matches to be done, and returns its enqueue-to-done time. */
async function doneLatency(call: Call, owner: string, kind: string, subject: (s: string) => boolean): Promise<number> {
  const deadline = Date.now() + 20_000;
  while (Date.now() < deadline) {
    const page = (await call('GET', '/api/jobs?page=1&pageSize=20', owner)) as { items: JobRow[] };
    const job = page.items.find((item) => item.kind === kind && subject(item.subject));
    if (job?.state === 'dead') throw new Error(`${kind} job stopped: ${job.lastError}`);
    if (job?.state === 'done' && job.doneAt) return Date.parse(job.doneAt) - Date.parse(job.createdAt);
    await new Promise((resolve) => setTimeout(resolve, 25));
  }
  throw new Error(`no ${kind} job finished within 20 s`);
}

export async function measureQueueLatency(base: string, tokens: { owner: string; estimator: string; customer: string }, count: number): Promise<QueueLatency[]> {
  const call = caller(base);
  const mail: number[] = [];
  const quoteMail: number[] = [];
  const payment: number[] = [];
  const stamp = Date.now();

  for (let i = 0; i < count; i++) {
    const email = `bench.invite.${stamp}.${i}@ironbark.test`;
    await call('POST', '/api/invitations', tokens.owner, { email, role: 'counter' });
    mail.push(await doneLatency(call, tokens.owner, 'mail', (s) => s.includes(email)));
  }

  const lines = [
    { kind: 'part', description: 'Rear-sump oil pan', quantity: 1, pricing: 'list', unitPriceCents: 28995 },
    { kind: 'labor', description: 'Install pan and pickup', hours: 2.5 },
  ];
  for (let i = 0; i < count; i++) {
    const quote = (await call('POST', `/api/projects/${DEMO_PROJECT_IDS.ridgeback}/quotes`, tokens.estimator, { lines })) as { id: string; label: string };
    await call('POST', `/api/quotes/${quote.id}/send`, tokens.estimator);
    quoteMail.push(await doneLatency(call, tokens.owner, 'quote.mail', (s) => s.startsWith(`Quote ${quote.label} `)));
    await call('POST', `/api/quotes/${quote.id}/answer`, tokens.customer, { answer: 'accept' });
    await call('POST', `/api/quotes/${quote.id}/deposit`, tokens.customer, { paymentMethod: 'pm_card_visa' });
    payment.push(await doneLatency(call, tokens.owner, 'payment.event', (s) => s.includes(`quote ${quote.label}:`) && s.includes('succeeded')));
  }

  return [
    { what: 'plain e-mail (an invitation), enqueue to done', samples: mail },
    { what: "quote e-mail with its PDF, enqueue to done", samples: quoteMail },
    { what: 'payment event (deposit settled, work order opened), enqueue to done', samples: payment },
  ];
}
