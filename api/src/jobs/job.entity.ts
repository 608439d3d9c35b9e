import { Column, CreateDateColumn, Entity, Index, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import type { JobState } from './job-kinds';

/**
 * One piece of background work, written in the same transaction as the change that causes it and applied by the
 * worker of any API instance. (kind, idempotencyKey) is unique: enqueuing the same work again adds nothing.
 */
@Entity('jobs')
@Index('ux_jobs_kind_key', ['kind', 'idempotencyKey'], { unique: true })
@Index('idx_jobs_state_run_at', ['state', 'runAt'])
@Index('idx_jobs_shop_created', ['shopId', 'createdAt'])
export class Job {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ type: 'varchar', length: 40 })
  kind: string;

  @Column({ type: 'varchar', length: 160 })
  idempotencyKey: string;

  /** The shop the work belongs to; null for work of a person without a shop yet (a sign-up link). */
  @Column({ type: 'char', length: 36, nullable: true })
  shopId: string | null;

  /** What the work is about, in words for the shop (e.g. "Quote Q-0003 (revision 1) e-mail to …"); kept when the payload is cleared. */
  @Column({ type: 'varchar', length: 300, nullable: true })
  subject: string | null;

  @Column({ type: 'varchar', length: 10 })
  state: JobState;

  /** What the handler needs; cleared once done (a mail's payload holds its one-time links). */
  @Column({ type: 'json', nullable: true })
  payload: Record<string, unknown> | null;

  @Column({ type: 'int', unsigned: true, default: 0 })
  attempts: number;

  @Column({ type: 'int', unsigned: true })
  maxAttempts: number;

  @Column({ type: 'datetime', precision: 3 })
  runAt: Date;

  @Column({ type: 'datetime', precision: 3, nullable: true })
  leaseUntil: Date | null;

  /** The worker (instance) that holds the current attempt; with `attempts` it fences a late worker out. */
  @Column({ type: 'varchar', length: 80, nullable: true })
  lockedBy: string | null;

  @Column({ type: 'varchar', length: 1000, nullable: true })
  lastError: string | null;

  /** What the work left behind, e.g. the Message-ID of the e-mail sent. */
  @Column({ type: 'varchar', length: 300, nullable: true })
  result: string | null;

  @CreateDateColumn({ type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime', precision: 3 })
  updatedAt: Date;

  @Column({ type: 'datetime', precision: 3, nullable: true })
  doneAt: Date | null;
}
