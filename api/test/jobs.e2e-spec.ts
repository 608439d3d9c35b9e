import './helpers/jobs-driven-env';
import { ConfigService } from '@nestjs/config';
import { DEMO_PROJECT_IDS, DEMO_SHOP_ID, DemoRole } from '@swapwright/seed-data';
import { DataSource } from 'typeorm';
import { JobHandlers } from '../src/jobs/job-handlers';
import type { JobKind } from '../src/jobs/job-kinds';
import { JobsService } from '../src/jobs/jobs.service';
import { JobsWorker } from '../src/jobs/jobs.worker';
import { capturedMail, lastMailId } from './helpers/mail-fake';
import { OTHER_SHOP } from './fixtures/other-shop.fixture';
import { bearer, countRows, createTestApp, resetData, Session, signIn, signInAllRoles, TestApp } from './helpers/test-app';

const LINES = [
  { kind: 'part', description: 'Rear-sump oil pan', quantity: 1, pricing: 'list', unitPriceCents: 28995 },
  { kind: 'labor', description: 'Install pan and pickup', hours: 2.5 },
];
/** A kind only this suite registers (the column takes any name; the app's own kinds are in job-kinds.ts). */
const TEST_KIND = 'test.count' as JobKind;
const FAILING_KIND = 'test.fail' as JobKind;

interface JobRow {
  id: string;
  kind: string;
  idempotencyKey: string;
  state: string;
  attempts: number;
  lockedBy: string | null;
  lastError: string | null;
  result: string | null;
  payload: unknown;
  runAt: Date;
  doneAt: Date | null;
}

const jobsOf = (dataSource: DataSource, kind: string): Promise<JobRow[]> =>
  dataSource.query('SELECT * FROM `jobs` WHERE `kind` = ? ORDER BY `createdAt`, `idempotencyKey`', [kind]);

/**
 * The durable queue in MariaDB, with the worker switched off (JOBS_WORKER_ENABLED=false) so each step is driven
 * here with `runOnce()`: enqueued with the change that causes it, claimed with FOR UPDATE SKIP LOCKED, done in the
 * transaction of its effect, retried with a doubling wait, dead with its last error, taken over after a lost worker.
 */
describe('background jobs in MariaDB', () => {
  let t: TestApp;
  let demo: Record<DemoRole, Session>;
  let jobs: JobsService;
  let worker: JobsWorker;
  let handlers: JobHandlers;
  const handled: Array<{ key: string }> = [];

  beforeAll(async () => {
    t = await createTestApp();
    await resetData(t.dataSource);
    demo = await signInAllRoles(t.http);
    jobs = t.app.get(JobsService);
    worker = t.app.get(JobsWorker);
    handlers = t.app.get(JobHandlers);
    handlers.register(TEST_KIND, async (payload) => {
      // Slow enough that two workers overlap.
      await new Promise((resolve) => setTimeout(resolve, 5));
      handled.push({ key: String(payload.key) });
    });
    handlers.register(FAILING_KIND, async () => {
      throw new Error('the relay refused the message (test)');
    });
  });

  afterAll(() => t?.close());

  it('a sent quote and its mail job commit together; the worker renders and sends it once, with a stable Message-ID', async () => {
    const created = await t.http.post(`/api/projects/${DEMO_PROJECT_IDS.ridgeback}/quotes`).set(...bearer(demo.estimator)).send({ lines: LINES }).expect(201);
    const before = await lastMailId();
    const sent = await t.http.post(`/api/quotes/${created.body.id}/send`).set(...bearer(demo.estimator)).expect(200);
    expect(sent.body).toMatchObject({ status: 'awaiting-answer', sentRevision: 1 });
    const [queued] = await jobsOf(t.dataSource, 'quote.mail');
    expect(queued).toMatchObject({ state: 'queued', attempts: 0, idempotencyKey: `${created.body.id}:r1` });
    // Nothing goes out inside the request.
    expect((await capturedMail()).filter((mail) => mail.id > before)).toEqual([]);

    expect(await worker.runOnce()).toBe(true);
    const [done] = await jobsOf(t.dataSource, 'quote.mail');
    expect(done).toMatchObject({ state: 'done', attempts: 1, payload: null, lastError: null });
    const mails = (await capturedMail()).filter((mail) => mail.id > before);
    expect(mails).toHaveLength(1);
    expect(mails[0].to).toEqual(['customer@ironbark.test']);
    expect(mails[0].attachments.map((attachment) => attachment.contentType)).toEqual(['application/pdf']);
    expect(mails[0].messageId).toBe(done.result);
    expect(done.result).toBe(`<${done.id}@swapwright.test>`);
    expect(await worker.runOnce()).toBe(false);
  });

  it('sending the same revision again queues a second mail; the customer’s answer queues the estimator’s notice with it', async () => {
    const [quote] = await t.dataSource.query("SELECT id FROM quotes WHERE status = 'awaiting-answer' LIMIT 1");
    await t.http.post(`/api/quotes/${quote.id}/send`).set(...bearer(demo.estimator)).expect(200);
    expect((await jobsOf(t.dataSource, 'quote.mail')).map((job) => job.state)).toEqual(['done', 'queued']);
    await t.http.post(`/api/quotes/${quote.id}/answer`).set(...bearer(demo.customer)).send({ answer: 'accept' }).expect(200);
    const notices = await jobsOf(t.dataSource, 'mail');
    expect(notices.map((job) => job.idempotencyKey)).toContain(`quote-answer:${quote.id}:r1`);
    while (await worker.runOnce());
    expect((await jobsOf(t.dataSource, 'quote.mail')).map((job) => job.state)).toEqual(['done', 'done']);
    expect((await jobsOf(t.dataSource, 'mail')).every((job) => job.state === 'done')).toBe(true);
  });

  it('work enqueued in a transaction that rolls back is not queued; the same key twice is stored once', async () => {
    const before = await countRows(t.dataSource, 'jobs');
    await expect(
      t.dataSource.transaction(async (manager) => {
        expect(await jobs.enqueue(manager, { kind: TEST_KIND, idempotencyKey: 'rolled-back', shopId: null, payload: { key: 'rolled-back' } })).toBe(true);
        throw new Error('the change failed');
      }),
    ).rejects.toThrow('the change failed');
    expect(await countRows(t.dataSource, 'jobs')).toBe(before);

    expect(await jobs.enqueue(t.dataSource.manager, { kind: TEST_KIND, idempotencyKey: 'once', shopId: null, payload: { key: 'once' } })).toBe(true);
    expect(await jobs.enqueue(t.dataSource.manager, { kind: TEST_KIND, idempotencyKey: 'once', shopId: null, payload: { key: 'once, again' } })).toBe(false);
    expect(await jobsOf(t.dataSource, TEST_KIND)).toHaveLength(1);
    while (await worker.runOnce());
    expect(handled.map((entry) => entry.key)).toEqual(['once']);
  });

  it('two workers claiming at the same time never take the same job (FOR UPDATE SKIP LOCKED)', async () => {
    handled.length = 0;
    const keys = Array.from({ length: 40 }, (_, index) => `parallel-${String(index).padStart(2, '0')}`);
    await t.dataSource.transaction(async (manager) => {
      for (const key of keys) await jobs.enqueue(manager, { kind: TEST_KIND, idempotencyKey: key, shopId: null, payload: { key } });
    });
    // The first jobs wait until both workers hold one, so the two really claim side by side.
    let inFlight = 0;
    let mostInFlight = 0;
    handlers.register(TEST_KIND, async (payload) => {
      inFlight++;
      mostInFlight = Math.max(mostInFlight, inFlight);
      for (let waited = 0; mostInFlight < 2 && waited < 5000; waited += 10) await new Promise((resolve) => setTimeout(resolve, 10));
      handled.push({ key: String(payload.key) });
      inFlight--;
    });
    const second = new JobsWorker(t.dataSource, jobs, handlers, t.app.get(ConfigService));
    const drain = async (w: JobsWorker) => {
      let ran = 0;
      while (await w.runOnce()) ran++;
      return ran;
    };
    const counts = await Promise.all([drain(worker), drain(second)]);
    expect(mostInFlight).toBe(2);
    expect(counts.reduce((sum, n) => sum + n, 0)).toBe(keys.length);
    expect(handled.map((entry) => entry.key).sort()).toEqual(keys);
    const rows = (await jobsOf(t.dataSource, TEST_KIND)).filter((job) => job.idempotencyKey.startsWith('parallel-'));
    expect(rows.every((job) => job.state === 'done' && job.attempts === 1)).toBe(true);
    expect(new Set(rows.map((job) => job.lockedBy))).toEqual(new Set([worker.workerId, second.workerId]));
  });

  it('a failing job is retried after a doubling wait, then marked dead with its last error', async () => {
    await jobs.enqueue(t.dataSource.manager, { kind: FAILING_KIND, idempotencyKey: 'always-fails', shopId: null, payload: {} });
    const waits: number[] = [];
    for (let attempt = 1; attempt <= 3; attempt++) {
      const startedAt = Date.now();
      expect(await worker.runOnce()).toBe(true);
      const [job] = await jobsOf(t.dataSource, FAILING_KIND);
      expect(job.attempts).toBe(attempt);
      expect(job.lastError).toBe('the relay refused the message (test)');
      if (attempt < 3) {
        expect(job.state).toBe('queued');
        waits.push(new Date(job.runAt).getTime() - startedAt);
        // Not due yet: the worker leaves it.
        expect(await worker.runOnce()).toBe(false);
        await t.dataSource.query('UPDATE `jobs` SET `runAt` = UTC_TIMESTAMP(3) WHERE `kind` = ?', [FAILING_KIND]);
      } else {
        expect(job.state).toBe('dead');
      }
    }
    // JOBS_RETRY_BASE_MS=1000: about 1 s, then about 2 s (plus up to 10 % jitter).
    expect(waits[0]).toBeGreaterThan(800);
    expect(waits[0]).toBeLessThan(1400);
    expect(waits[1]).toBeGreaterThan(1800);
    expect(waits[1]).toBeLessThan(2500);
    expect(await worker.runOnce()).toBe(false);
  });

  it('a job left running by a worker that died is taken over once its lease ends; at its last attempt it is marked dead', async () => {
    handled.length = 0;
    await jobs.enqueue(t.dataSource.manager, { kind: TEST_KIND, idempotencyKey: 'orphaned', shopId: null, payload: { key: 'orphaned' } });
    await jobs.enqueue(t.dataSource.manager, { kind: TEST_KIND, idempotencyKey: 'poison', shopId: null, payload: { key: 'poison' } });
    const orphan = "`idempotencyKey` = 'orphaned'";
    await t.dataSource.query(`UPDATE \`jobs\` SET \`state\` = 'running', \`attempts\` = 1, \`lockedBy\` = 'gone:1', \`leaseUntil\` = UTC_TIMESTAMP(3) + INTERVAL 1 HOUR WHERE ${orphan}`);
    await t.dataSource.query("UPDATE `jobs` SET `state` = 'running', `attempts` = 3, `lockedBy` = 'gone:2', `leaseUntil` = UTC_TIMESTAMP(3) - INTERVAL 1 SECOND WHERE `idempotencyKey` = 'poison'");
    // Within its lease the job stays with its worker.
    expect(await worker.runOnce()).toBe(true); // the poison job, whose lease ended at its last attempt
    expect(await worker.runOnce()).toBe(false);
    await t.dataSource.query(`UPDATE \`jobs\` SET \`leaseUntil\` = UTC_TIMESTAMP(3) - INTERVAL 1 SECOND WHERE ${orphan}`);
    expect(await worker.runOnce()).toBe(true);
    const rows = await jobsOf(t.dataSource, TEST_KIND);
    expect(rows.find((job) => job.idempotencyKey === 'orphaned')).toMatchObject({ state: 'done', attempts: 2, lockedBy: worker.workerId });
    expect(rows.find((job) => job.idempotencyKey === 'poison')).toMatchObject({ state: 'dead', attempts: 3 });
    expect(rows.find((job) => job.idempotencyKey === 'poison')!.lastError).toMatch(/process ended/);
    expect(handled.map((entry) => entry.key)).toEqual(['orphaned']);
  });

  it('done jobs are deleted once they are older than JOBS_KEEP_DONE_DAYS (14); recent and unfinished ones stay', async () => {
    await jobs.enqueue(t.dataSource.manager, { kind: TEST_KIND, idempotencyKey: 'old-done', shopId: null, payload: { key: 'old-done' } });
    await jobs.enqueue(t.dataSource.manager, { kind: TEST_KIND, idempotencyKey: 'old-queued', shopId: null, payload: { key: 'old-queued' } });
    await t.dataSource.query("UPDATE `jobs` SET `state` = 'done', `doneAt` = UTC_TIMESTAMP(3) - INTERVAL 15 DAY WHERE `idempotencyKey` = 'old-done'");
    await t.dataSource.query("UPDATE `jobs` SET `createdAt` = UTC_TIMESTAMP(3) - INTERVAL 15 DAY, `runAt` = UTC_TIMESTAMP(3) + INTERVAL 1 DAY WHERE `idempotencyKey` = 'old-queued'");
    const before = await countRows(t.dataSource, 'jobs');
    expect(await worker.purgeDone()).toBe(1);
    expect(await countRows(t.dataSource, 'jobs')).toBe(before - 1);
    expect((await jobsOf(t.dataSource, TEST_KIND)).map((job) => job.idempotencyKey)).not.toContain('old-done');
    expect((await jobsOf(t.dataSource, TEST_KIND)).map((job) => job.idempotencyKey)).toContain('old-queued');
    await t.dataSource.query("DELETE FROM `jobs` WHERE `idempotencyKey` = 'old-queued'");
  });

  it("the owner reads the shop's jobs and their counts by state, without their payloads; other shops' jobs stay out", async () => {
    const response = await t.http.get('/api/jobs').set(...bearer(demo.owner)).expect(200);
    expect(response.body.counts).toMatchObject({ queued: 0, running: 0, dead: 0 });
    expect(response.body.counts.done).toBeGreaterThanOrEqual(3);
    expect(response.body.items.length).toBe(response.body.counts.done);
    for (const item of response.body.items) {
      expect(Object.keys(item).sort()).toEqual([
        'attempts',
        'createdAt',
        'doneAt',
        'id',
        'kind',
        'lastError',
        'lastErrorDetail',
        'maxAttempts',
        'runAt',
        'state',
        'subject',
        'updatedAt',
      ]);
      expect(['mail', 'quote.mail']).toContain(item.kind);
    }
    const dead = await t.http.get('/api/jobs?state=dead').set(...bearer(demo.owner)).expect(200);
    expect(dead.body.items).toEqual([]);
    const bad = await t.http.get('/api/jobs?state=stuck').set(...bearer(demo.owner)).expect(400);
    expect(bad.body.message).toMatch(/state must be one of: queued, running, done, dead/);
    await t.http.get('/api/jobs').set(...bearer(demo.estimator)).expect(403);
    const other = await signIn(t.http, OTHER_SHOP.owner.email, OTHER_SHOP.owner.password);
    const theirs = await t.http.get('/api/jobs').set(...bearer(other)).expect(200);
    expect(theirs.body).toMatchObject({ total: 0, items: [], counts: { queued: 0, running: 0, done: 0, dead: 0 } });
  });

  describe('a job that stopped after its last attempt, tried again by the owner', () => {
    /** Runs the due job, then makes its next attempt due at once, until it has no attempts left. */
    const runUntilStopped = async (kind: string) => {
      for (let attempt = 0; attempt < 3; attempt++) {
        expect(await worker.runOnce()).toBe(true);
        await t.dataSource.query("UPDATE `jobs` SET `runAt` = UTC_TIMESTAMP(3) WHERE `kind` = ? AND `state` = 'queued'", [kind]);
      }
    };

    it('a quote mail that failed for want of an address: the list says what to do, the retry sends it once and it ends done', async () => {
      const [{ customerId, email }] = await t.dataSource.query('SELECT p.customerId, c.email FROM projects p JOIN customers c ON c.id = p.customerId WHERE p.id = ?', [
        DEMO_PROJECT_IDS.ridgeback,
      ]);
      const created = await t.http.post(`/api/projects/${DEMO_PROJECT_IDS.ridgeback}/quotes`).set(...bearer(demo.estimator)).send({ lines: LINES }).expect(201);
      await t.http.post(`/api/quotes/${created.body.id}/send`).set(...bearer(demo.estimator)).expect(200);
      // The address is removed after the quote was sent, before the worker builds its mail.
      await t.dataSource.query('UPDATE `customers` SET `email` = NULL WHERE `id` = ?', [customerId]);
      await runUntilStopped('quote.mail');

      const dead = await t.http.get('/api/jobs?state=dead&page=1&pageSize=5').set(...bearer(demo.owner)).expect(200);
      expect(dead.body).toMatchObject({ total: 1, page: 1, pageSize: 5, counts: { dead: 1 } });
      const [job] = dead.body.items;
      expect(job).toMatchObject({
        kind: 'quote.mail',
        state: 'dead',
        attempts: 3,
        maxAttempts: 3,
        subject: `Quote ${created.body.label} (revision 1) e-mail to ${email}`,
        lastError: "The customer has no e-mail address. Add one on the customer's page, then try again.",
        lastErrorDetail: 'the customer of this quote has no e-mail address any more',
        doneAt: null,
      });
      expect(Date.parse(job.updatedAt)).toBeGreaterThanOrEqual(Date.parse(job.createdAt));

      await t.dataSource.query('UPDATE `customers` SET `email` = ? WHERE `id` = ?', [email, customerId]);
      const before = await lastMailId();
      const retried = await t.http.post(`/api/jobs/${job.id}/retry`).set(...bearer(demo.owner)).expect(200);
      expect(retried.body).toMatchObject({ id: job.id, state: 'queued', attempts: 0 });
      expect(Date.parse(retried.body.runAt)).toBeLessThanOrEqual(Date.now() + 1000);
      const [row] = await t.dataSource.query('SELECT `idempotencyKey` FROM `jobs` WHERE `id` = ?', [job.id]);
      expect(row.idempotencyKey).toBe(`${created.body.id}:r1`);

      // The audit entry committed with the retry: who, what, before and after.
      const [audit] = await t.dataSource.query("SELECT * FROM `audit_events` WHERE `subjectId` = ? AND `action` = 'job.retried'", [job.id]);
      expect(audit).toMatchObject({ shopId: DEMO_SHOP_ID, kind: 'background-work', actorName: expect.any(String) });
      expect(audit.summary).toContain(`Quote ${created.body.label} (revision 1) e-mail to ${email}`);
      expect(JSON.parse(JSON.stringify(audit.before))).toMatchObject({ state: 'dead', attempts: 3 });
      const log = await t.http.get('/api/audit-events?kind=background-work').set(...bearer(demo.owner)).expect(200);
      expect(log.body.items.map((event: { subjectId: string }) => event.subjectId)).toContain(job.id);

      expect(await worker.runOnce()).toBe(true);
      const [doneJob] = await t.dataSource.query('SELECT * FROM `jobs` WHERE `id` = ?', [job.id]);
      expect(doneJob).toMatchObject({ state: 'done', attempts: 1, lastError: null, result: `<${job.id}@swapwright.test>` });
      const mails = (await capturedMail()).filter((mail) => mail.id > before);
      expect(mails).toHaveLength(1);
      expect(mails[0].to).toEqual([email]);
      expect(mails[0].messageId).toBe(`<${job.id}@swapwright.test>`);
      expect(await worker.runOnce()).toBe(false);

      // Done is done: a second retry is refused and sends nothing.
      const again = await t.http.post(`/api/jobs/${job.id}/retry`).set(...bearer(demo.owner)).expect(409);
      expect(again.body).toMatchObject({ code: 'job_not_stopped' });
      expect(again.body.message).toMatch(/already done.*only a job that stopped after its last attempt can be tried again/);
    });

    it('a stopped payment event applies once when tried again, keeping its event id; its redelivery adds nothing', async () => {
      const event = { id: 'evt_retry_1', object: 'event', type: 'payment_intent.succeeded', created: 1_796_000_000, data: { object: { id: 'pi_retry_unknown', metadata: { shopId: DEMO_SHOP_ID } } } };
      expect(await jobs.enqueue(t.dataSource.manager, { kind: 'payment.event', idempotencyKey: event.id, shopId: DEMO_SHOP_ID, subject: 'Payment provider event', payload: event })).toBe(true);
      await t.dataSource.query(
        "UPDATE `jobs` SET `state` = 'dead', `attempts` = 3, `lastError` = 'connect ECONNREFUSED 127.0.0.1:3317' WHERE `kind` = 'payment.event' AND `idempotencyKey` = ?",
        [event.id],
      );
      const listed = await t.http.get('/api/jobs?state=dead').set(...bearer(demo.owner)).expect(200);
      const job = listed.body.items.find((item: { kind: string }) => item.kind === 'payment.event');
      expect(job.lastError).toMatch(/could not be reached/);
      expect(job.lastError).not.toMatch(/ECONNREFUSED/);

      await t.http.post(`/api/jobs/${job.id}/retry`).set(...bearer(demo.owner)).expect(200);
      while (await worker.runOnce());
      const rows = await t.dataSource.query('SELECT * FROM `jobs` WHERE `kind` = ? AND `idempotencyKey` = ?', ['payment.event', event.id]);
      expect(rows).toHaveLength(1);
      expect(rows[0]).toMatchObject({ id: job.id, state: 'done', result: 'applied payment_intent.succeeded' });
      expect(await t.dataSource.query('SELECT `eventId` FROM `payment_events` WHERE `eventId` = ?', [event.id])).toHaveLength(1);
      // The provider sending the same event again: the key is taken, nothing is queued.
      expect(await jobs.enqueue(t.dataSource.manager, { kind: 'payment.event', idempotencyKey: event.id, shopId: DEMO_SHOP_ID, payload: event })).toBe(false);
    });

    it('is refused with 409 while queued, 404 from another shop (nothing changes), 403 for staff who are not the owner', async () => {
      await t.http.post('/api/invitations').set(...bearer(demo.owner)).send({ email: 'new.hand@ironbark.test', role: 'counter' }).expect(201);
      const [invite] = await t.dataSource.query("SELECT `id`, `subject` FROM `jobs` WHERE `kind` = 'mail' AND `state` = 'queued' AND `shopId` = ?", [DEMO_SHOP_ID]);
      expect(invite.subject).toMatch(/^E-mail to new\.hand@ironbark\.test: “.+”$/);
      const queued = await t.http.post(`/api/jobs/${invite.id}/retry`).set(...bearer(demo.owner)).expect(409);
      expect(queued.body.message).toMatch(/waiting to run.*The worker takes it by itself/);

      await t.dataSource.query("UPDATE `jobs` SET `state` = 'dead', `attempts` = 3 WHERE `id` = ?", [invite.id]);
      const auditBefore = await countRows(t.dataSource, 'audit_events');
      const other = await signIn(t.http, OTHER_SHOP.owner.email, OTHER_SHOP.owner.password);
      const theirs = await t.http.post(`/api/jobs/${invite.id}/retry`).set(...bearer(other)).expect(404);
      expect(theirs.body).toMatchObject({ code: 'job_not_found' });
      for (const role of ['estimator', 'fabricator', 'counter', 'customer'] as const) {
        await t.http.post(`/api/jobs/${invite.id}/retry`).set(...bearer(demo[role])).expect(403);
      }
      await t.http.post(`/api/jobs/${invite.id}/retry`).expect(401);
      expect(await countRows(t.dataSource, 'audit_events')).toBe(auditBefore);
      const [row] = await t.dataSource.query('SELECT `state`, `attempts` FROM `jobs` WHERE `id` = ?', [invite.id]);
      expect(row).toMatchObject({ state: 'dead', attempts: 3 });
      await t.http.post('/api/jobs/not-a-uuid/retry').set(...bearer(demo.owner)).expect(400);
      await t.http.post(`/api/jobs/${'0'.repeat(8)}-0000-4000-8000-000000000000/retry`).set(...bearer(demo.owner)).expect(404);
    });
  });
});
