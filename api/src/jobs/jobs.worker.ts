import { Injectable, Logger, OnApplicationBootstrap, OnModuleDestroy } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource } from '@nestjs/typeorm';
import { hostname } from 'node:os';
import { randomUUID } from 'node:crypto';
import { DataSource, EntitySubscriberInterface, TransactionCommitEvent } from 'typeorm';
import { EnvironmentVariables } from '../config/env.validation';
import { JobHandlers } from './job-handlers';
import { JOBS_ENQUEUED, JobsService } from './jobs.service';

interface ClaimedJob {
  id: string;
  kind: string;
  shopId: string | null;
  attempts: number;
  maxAttempts: number;
}

function message(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}

/**
 * The background-work loop of one API process. Every instance runs one (JOBS_WORKER_ENABLED):
 *
 * 1. claim: in a short transaction, the oldest due job (`FOR UPDATE SKIP LOCKED`, so two instances never take the
 *    same row) becomes `running` with a lease, its attempt counted;
 * 2. work: a second transaction locks the job row again (fenced by worker and attempt), runs the kind's handler with
 *    that transaction's manager and marks the job done in it, so the handler's writes and `done` commit together.
 *    A live worker keeps the row locked while it works, so nobody takes it over even past the lease;
 * 3. a failure rolls the work back and puts the job back with a doubling wait, or marks it dead with the last error;
 *    a worker that died leaves its job `running` and unlocked, and any instance takes it again once the lease ends.
 */
@Injectable()
export class JobsWorker implements OnApplicationBootstrap, OnModuleDestroy, EntitySubscriberInterface {
  private readonly logger = new Logger(JobsWorker.name);
  readonly workerId = `${hostname()}:${process.pid}:${randomUUID().slice(0, 8)}`;
  private readonly enabled: boolean;
  private readonly pollMs: number;
  private readonly leaseMs: number;
  private readonly concurrency: number;
  private readonly retryBaseMs: number;
  private readonly crashBeforeCommit: string | undefined;
  private readonly keepDoneDays: number;
  private lastPurge = 0;
  private stopped = true;
  private loops: Promise<void>[] = [];
  private sleepers = new Set<() => void>();
  private lastErrorLog = 0;

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly jobs: JobsService,
    private readonly handlers: JobHandlers,
    config: ConfigService<EnvironmentVariables, true>,
  ) {
    this.enabled = config.get('JOBS_WORKER_ENABLED', { infer: true });
    this.pollMs = config.get('JOBS_POLL_MS', { infer: true });
    this.leaseMs = config.get('JOBS_LEASE_MS', { infer: true });
    this.concurrency = config.get('JOBS_CONCURRENCY', { infer: true });
    this.retryBaseMs = config.get('JOBS_RETRY_BASE_MS', { infer: true });
    this.crashBeforeCommit = config.get('JOBS_CRASH_BEFORE_COMMIT', { infer: true });
    this.keepDoneDays = config.get('JOBS_KEEP_DONE_DAYS', { infer: true });
  }

  onApplicationBootstrap(): void {
    this.dataSource.subscribers.push(this);
    this.jobs.onEnqueued(() => this.wake());
    if (this.enabled) this.start();
  }

  async onModuleDestroy(): Promise<void> {
    await this.stop();
    const index = this.dataSource.subscribers.indexOf(this);
    if (index >= 0) this.dataSource.subscribers.splice(index, 1);
  }

  /** A transaction that enqueued work committed: look now instead of at the next poll. */
  afterTransactionCommit(event: TransactionCommitEvent): void {
    const data = event.queryRunner.data as Record<string, unknown> | undefined;
    if (data?.[JOBS_ENQUEUED]) {
      delete data[JOBS_ENQUEUED];
      this.wake();
    }
  }

  afterTransactionRollback(event: TransactionCommitEvent): void {
    const data = event.queryRunner.data as Record<string, unknown> | undefined;
    if (data) delete data[JOBS_ENQUEUED];
  }

  start(): void {
    if (!this.stopped) return;
    this.stopped = false;
    this.loops = Array.from({ length: this.concurrency }, () => this.loop());
  }

  /** Stops claiming and waits for the jobs in hand to finish. */
  async stop(): Promise<void> {
    this.stopped = true;
    this.wake();
    await Promise.all(this.loops);
    this.loops = [];
  }

  wake(): void {
    for (const resolve of this.sleepers) resolve();
    this.sleepers.clear();
  }

  private sleep(ms: number): Promise<void> {
    return new Promise((resolve) => {
      const done = () => {
        clearTimeout(timer);
        this.sleepers.delete(done);
        resolve();
      };
      const timer = setTimeout(done, ms);
      this.sleepers.add(done);
    });
  }

  private async loop(): Promise<void> {
    let failures = 0;
    while (!this.stopped) {
      try {
        if (Date.now() - this.lastPurge > 3_600_000) {
          this.lastPurge = Date.now();
          await this.purgeDone();
        }
        const worked = await this.runOnce();
        failures = 0;
        if (!worked && !this.stopped) await this.sleep(this.pollMs);
      } catch (error) {
        // The database is away (or similar): wait longer each time, and say so once a minute at most.
        failures++;
        if (Date.now() - this.lastErrorLog > 60_000) {
          this.lastErrorLog = Date.now();
          this.logger.warn(`Background work paused: ${message(error)}`);
        }
        if (!this.stopped) await this.sleep(Math.min(10_000, this.pollMs * 2 ** Math.min(failures, 6)));
      }
    }
  }

  /** Claims and runs one due job; false when none is due. Tests call it to drive the queue step by step. */
  async runOnce(): Promise<boolean> {
    const job = await this.claim();
    if (!job) return false;
    if (job !== 'gave-up') await this.run(job);
    return true;
  }

  /** Deletes done jobs older than JOBS_KEEP_DONE_DAYS, a batch at a time (each instance does it about once an hour). */
  async purgeDone(): Promise<number> {
    let deleted = 0;
    for (;;) {
      const result = (await this.dataSource.query(
        "DELETE FROM `jobs` WHERE `state` = 'done' AND `doneAt` < UTC_TIMESTAMP(3) - INTERVAL ? DAY LIMIT 1000",
        [this.keepDoneDays],
      )) as { affectedRows?: number };
      const batch = Number(result.affectedRows ?? 0);
      deleted += batch;
      if (batch < 1000) return deleted;
    }
  }

  private async claim(): Promise<ClaimedJob | 'gave-up' | null> {
    // READ COMMITTED: the rows the claim scans but does not take are not kept locked, so they stay free for others.
    return this.dataSource.transaction('READ COMMITTED', async (manager) => {
      // Two single-condition reads that walk the (state, runAt) index in order, so each locks only the row it returns
      // (an OR with a sort would lock every due row until the sort, and a second instance would skip them all).
      const columns = 'SELECT `id`, `kind`, `shopId`, `state`, `attempts`, `maxAttempts` FROM `jobs` ';
      let rows: Array<ClaimedJob & { state: string }> = await manager.query(
        `${columns}WHERE \`state\` = 'queued' AND \`runAt\` <= UTC_TIMESTAMP(3) ORDER BY \`runAt\` LIMIT 1 FOR UPDATE SKIP LOCKED`,
      );
      if (rows.length === 0) {
        rows = await manager.query(
          `${columns}WHERE \`state\` = 'running' AND \`leaseUntil\` < UTC_TIMESTAMP(3) ORDER BY \`runAt\` LIMIT 1 FOR UPDATE SKIP LOCKED`,
        );
      }
      const row = rows[0];
      if (!row) return null;
      if (row.state === 'running' && Number(row.attempts) >= Number(row.maxAttempts)) {
        // Its last attempt ended with the worker's process (a job that takes its process down is not run for ever).
        await manager.query(
          "UPDATE `jobs` SET `state` = 'dead', `leaseUntil` = NULL, `lockedBy` = NULL, `lastError` = ? WHERE `id` = ?",
          [`the worker stopped during attempt ${row.attempts} of ${row.maxAttempts} (its process ended)`, row.id],
        );
        return 'gave-up';
      }
      await manager.query(
        "UPDATE `jobs` SET `state` = 'running', `attempts` = `attempts` + 1, `leaseUntil` = UTC_TIMESTAMP(3) + INTERVAL ? MICROSECOND, " +
          '`lockedBy` = ? WHERE `id` = ?',
        [this.leaseMs * 1000, this.workerId, row.id],
      );
      return { id: row.id, kind: row.kind, shopId: row.shopId, attempts: Number(row.attempts) + 1, maxAttempts: Number(row.maxAttempts) };
    });
  }

  private async run(job: ClaimedJob): Promise<void> {
    const runner = this.dataSource.createQueryRunner('master');
    await runner.connect();
    try {
      await runner.startTransaction();
      try {
        const [row] = (await runner.query(
          "SELECT `payload` FROM `jobs` WHERE `id` = ? AND `state` = 'running' AND `lockedBy` = ? AND `attempts` = ? FOR UPDATE",
          [job.id, this.workerId, job.attempts],
        )) as Array<{ payload: unknown }>;
        if (!row) {
          // Another instance took it over (our lease ran out) and finished or holds it: ours does nothing.
          await runner.rollbackTransaction();
          return;
        }
        const handler = this.handlers.get(job.kind);
        if (!handler) throw new Error(`no handler for jobs of kind ${job.kind} in this version`);
        const payload = (typeof row.payload === 'string' ? JSON.parse(row.payload) : row.payload) as Record<string, unknown>;
        const result = await handler(payload ?? {}, { manager: runner.manager, job });
        if (this.crashBeforeCommit === job.kind) {
          this.logger.warn(`JOBS_CRASH_BEFORE_COMMIT: killing this process before job ${job.id} commits`);
          process.kill(process.pid, 'SIGKILL');
          await new Promise(() => undefined);
        }
        await runner.query(
          "UPDATE `jobs` SET `state` = 'done', `doneAt` = UTC_TIMESTAMP(3), `payload` = NULL, `lastError` = NULL, `leaseUntil` = NULL, `result` = ? WHERE `id` = ?",
          [typeof result === 'string' ? result.slice(0, 300) : null, job.id],
        );
        await runner.commitTransaction();
      } catch (error) {
        if (runner.isTransactionActive) await runner.rollbackTransaction();
        await this.fail(job, error);
      }
    } finally {
      await runner.release();
    }
  }

  private async fail(job: ClaimedJob, error: unknown): Promise<void> {
    const dead = job.attempts >= job.maxAttempts;
    // 1×, 2×, 4× … the base, at most an hour, with a little jitter so instances do not retry in step.
    const delayMs = Math.min(3_600_000, this.retryBaseMs * 2 ** (job.attempts - 1)) * (1 + Math.random() * 0.1);
    const text = message(error).slice(0, 1000);
    await this.dataSource.query(
      'UPDATE `jobs` SET `state` = ?, `lastError` = ?, `leaseUntil` = NULL, `lockedBy` = NULL, `runAt` = UTC_TIMESTAMP(3) + INTERVAL ? MICROSECOND ' +
        "WHERE `id` = ? AND `state` = 'running' AND `lockedBy` = ? AND `attempts` = ?",
      [dead ? 'dead' : 'queued', text, Math.round(delayMs * 1000), job.id, this.workerId, job.attempts],
    );
    if (dead) this.logger.error(`Job ${job.id} (${job.kind}) gave up after ${job.attempts} attempts: ${text}`);
    else this.logger.warn(`Job ${job.id} (${job.kind}) attempt ${job.attempts} failed, retrying in ${Math.round(delayMs / 1000)} s: ${text}`);
  }
}
