import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource } from '@nestjs/typeorm';
import { randomUUID } from 'node:crypto';
import { DataSource, EntityManager } from 'typeorm';
import { Page, skipOf } from '../common/pagination/page-query.dto';
import { EnvironmentVariables } from '../config/env.validation';
import { AuditService } from '../audit/audit.service';
import { AuthUser } from '../common/tenant/auth-user';
import { describeJobKind, type JobKind, type JobState } from './job-kinds';
import { JobErrors } from './jobs.errors';
import { Job } from './job.entity';

export interface NewJob {
  kind: JobKind;
  /** Unique per kind: the same work enqueued twice (a retried request, a redelivered event) is stored once. */
  idempotencyKey: string;
  shopId: string | null;
  /** What the work is about, in words for the shop's list of background work (e.g. "Quote Q-0003 e-mail to …"). */
  subject?: string;
  payload: Record<string, unknown>;
}

/** Set on a transaction's query runner when it enqueued work, so the commit wakes this process's worker. */
export const JOBS_ENQUEUED = 'swapwrightJobsEnqueued';

type Waker = () => void;

/**
 * Runs `INSERT IGNORE …` of one row and answers false when a unique key already holds it (nothing is written, and no
 * error is raised or logged). Callers bound every value to its column, so IGNORE has nothing else to hide.
 * (Not ON DUPLICATE KEY UPDATE: mysql2 counts found rows, so its affected rows cannot tell an insert from a duplicate.)
 */
export async function insertOnce(manager: EntityManager, sql: string, parameters: unknown[]): Promise<boolean> {
  if (!/^INSERT IGNORE INTO /.test(sql)) throw new Error('insertOnce takes an INSERT IGNORE statement');
  const result = (await manager.query(sql, parameters)) as { affectedRows?: number };
  return Number(result.affectedRows ?? 0) === 1;
}

@Injectable()
export class JobsService {
  private readonly maxAttempts: number;
  private waker: Waker = () => undefined;

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly audit: AuditService,
    config: ConfigService<EnvironmentVariables, true>,
  ) {
    this.maxAttempts = config.get('JOBS_MAX_ATTEMPTS', { infer: true });
  }

  /**
   * Adds a job with the manager of the change that causes it, so both commit or neither does. Returns false when
   * the same (kind, idempotencyKey) is already queued or done: nothing is added.
   */
  async enqueue(manager: EntityManager, job: NewJob): Promise<boolean> {
    const added = await insertOnce(
      manager,
      'INSERT IGNORE INTO `jobs` (`id`, `kind`, `idempotencyKey`, `shopId`, `subject`, `state`, `payload`, `attempts`, `maxAttempts`, `runAt`) ' +
        "VALUES (?, ?, ?, ?, ?, 'queued', ?, 0, ?, UTC_TIMESTAMP(3))",
      [
        randomUUID(),
        job.kind,
        job.idempotencyKey.slice(0, 160),
        job.shopId,
        job.subject ? job.subject.slice(0, 300) : null,
        JSON.stringify(job.payload),
        this.maxAttempts,
      ],
    );
    if (added) this.wakeAfterCommit(manager);
    return added;
  }

  /** Wakes this process's worker once the manager's transaction commits (at once without a transaction). */
  private wakeAfterCommit(manager: EntityManager): void {
    const runner = manager.queryRunner;
    if (runner?.isTransactionActive) runner.data = { ...(runner.data ?? {}), [JOBS_ENQUEUED]: true };
    else this.waker();
  }

  /**
   * Puts a job that stopped after its last attempt (`dead`) back in the queue, due now, with its attempts counted
   * from zero, in one transaction with its audit entry. Its idempotency key, payload and id stay, so the work is
   * still applied at most once (a payment event already applied is skipped; a mail goes with the same Message-ID).
   */
  async retry(user: AuthUser, id: string): Promise<Job> {
    return this.dataSource.transaction(async (manager) => {
      const job = await manager
        .getRepository(Job)
        .createQueryBuilder('j')
        .setLock('pessimistic_write')
        .where('j.id = :id AND j.shopId = :shopId', { id, shopId: user.shopId })
        .getOne();
      if (!job) throw JobErrors.notFound();
      if (job.state !== 'dead') throw JobErrors.notDead(job.state);
      await this.audit.record(manager, {
        shopId: user.shopId,
        actor: user,
        kind: 'background-work',
        action: 'job.retried',
        subjectId: job.id,
        summary: `Tried again: ${job.subject ?? describeJobKind(job.kind)} (stopped after ${job.attempts} attempts).`,
        before: { state: job.state, attempts: job.attempts, lastError: job.lastError },
        after: { state: 'queued', attempts: 0 },
      });
      await manager.query(
        "UPDATE `jobs` SET `state` = 'queued', `attempts` = 0, `runAt` = UTC_TIMESTAMP(3), `leaseUntil` = NULL, `lockedBy` = NULL " +
          "WHERE `id` = ? AND `shopId` = ? AND `state` = 'dead'",
        [job.id, user.shopId],
      );
      this.wakeAfterCommit(manager);
      return manager.getRepository(Job).findOneByOrFail({ id: job.id, shopId: user.shopId });
    });
  }

  /** Called by the worker: run `wake` when work was enqueued (after its transaction commits). */
  onEnqueued(wake: Waker): void {
    this.waker = wake;
  }

  wake(): void {
    this.waker();
  }

  async list(user: { shopId: string }, query: { state?: JobState; page: number; pageSize: number }): Promise<Page<Job> & { counts: Record<JobState, number> }> {
    const builder = this.dataSource.getRepository(Job).createQueryBuilder('j').where('j.shopId = :shopId', { shopId: user.shopId });
    if (query.state) builder.andWhere('j.state = :state', { state: query.state });
    const [items, rows] = await Promise.all([
      builder.orderBy('j.createdAt', 'DESC').addOrderBy('j.id', 'ASC').skip(skipOf(query)).take(query.pageSize).getMany(),
      this.dataSource.query('SELECT `state`, COUNT(*) AS n FROM `jobs` WHERE `shopId` = ? GROUP BY `state`', [user.shopId]) as Promise<
        Array<{ state: JobState; n: string | number }>
      >,
    ]);
    const counts: Record<JobState, number> = { queued: 0, running: 0, done: 0, dead: 0 };
    for (const row of rows) counts[row.state] = Number(row.n);
    // The page's total is one of the counts (or their sum), so no second COUNT over the same rows.
    const total = query.state ? counts[query.state] : Object.values(counts).reduce((sum, n) => sum + n, 0);
    return { items, total, page: query.page, pageSize: query.pageSize, counts };
  }
}
