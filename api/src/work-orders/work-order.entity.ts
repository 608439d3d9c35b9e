import type { CheckResult, WorkOrderState, WorkStep } from '@swapwright/shared';
import { Column, CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';
import { decimalTransformer } from '../database/column-transformers';

/**
 * The bay's work order for an approved quote, opened once when its deposit settles. The steps are a snapshot taken
 * then (operations in build order, torques, checks with their ranges), so later catalog edits do not change a job in the bay.
 */
@Entity('work_orders')
export class WorkOrder {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ type: 'char', length: 36 })
  shopId: string;

  @Column({ type: 'char', length: 36 })
  projectId: string;

  @Column({ type: 'char', length: 36 })
  quoteId: string;

  @Column({ type: 'int' })
  quoteRevision: number;

  /** The quote's number, so W-0007 belongs with Q-0007. */
  @Column({ type: 'int' })
  number: number;

  @Column({ type: 'varchar', length: 12, default: 'ready' })
  state: WorkOrderState;

  @Column({ type: 'json' })
  steps: WorkStep[];

  @Column({ type: 'char', length: 36, nullable: true })
  fitReportId: string | null;

  @Column({ type: 'int', nullable: true })
  partsPlanVersion: number | null;

  @Column({ type: 'datetime', precision: 3, nullable: true })
  startedAt: Date | null;

  @Column({ type: 'char', length: 36, nullable: true })
  startedById: string | null;

  @Column({ type: 'datetime', precision: 3, nullable: true })
  finishedAt: Date | null;

  @Column({ type: 'char', length: 36, nullable: true })
  finishedById: string | null;

  @CreateDateColumn({ type: 'datetime', precision: 3 })
  createdAt: Date;
}

/** One recording of a check (recording again adds a row; the newest counts), with who and when. */
@Entity('work_order_checks')
export class WorkOrderCheck {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ type: 'char', length: 36 })
  shopId: string;

  @Column({ type: 'char', length: 36 })
  workOrderId: string;

  @Column({ type: 'varchar', length: 130 })
  checkKey: string;

  @Column({ type: 'varchar', length: 4 })
  result: CheckResult;

  @Column({ type: 'decimal', precision: 10, scale: 2, nullable: true, transformer: decimalTransformer })
  value: number | null;

  @Column({ type: 'varchar', length: 500, default: '' })
  note: string;

  @Column({ type: 'char', length: 36 })
  recordedById: string;

  @Column({ type: 'varchar', length: 120 })
  recordedByName: string;

  @CreateDateColumn({ type: 'datetime', precision: 3 })
  recordedAt: Date;
}

/** A photo of a check (optional, any number): kept by the shared photo storage under a generated key. */
@Entity('work_order_check_photos')
export class WorkOrderCheckPhoto {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ type: 'char', length: 36 })
  shopId: string;

  @Column({ type: 'char', length: 36 })
  workOrderId: string;

  @Column({ type: 'char', length: 36 })
  projectId: string;

  @Column({ type: 'varchar', length: 130 })
  checkKey: string;

  @Column({ type: 'varchar', length: 64 })
  storageKey: string;

  @Column({ type: 'varchar', length: 20 })
  contentType: string;

  @Column({ type: 'int' })
  bytes: number;

  @Column({ type: 'int' })
  widthPx: number;

  @Column({ type: 'int' })
  heightPx: number;

  @Column({ type: 'char', length: 36 })
  uploadedById: string;

  @Column({ type: 'varchar', length: 120 })
  uploadedByName: string;

  @CreateDateColumn({ type: 'datetime', precision: 3 })
  createdAt: Date;
}
