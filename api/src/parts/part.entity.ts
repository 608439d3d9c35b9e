import type { CatalogPartCategory, CheckStatus, CounterStatus, FitSpecKind, PartAttributes, PartsPlanResult } from '@swapwright/shared';
import { Column, CreateDateColumn, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import { decimalTransformer } from '../database/column-transformers';

export interface TorqueSpec {
  /** The stable name of the joint it tightens (`oil-pan-to-block`): the work order gives it this figure, not an operation's. */
  joint?: string;
  fastener: string;
  newtonMetres: number;
  sequence?: string;
}

@Entity('suppliers')
export class Supplier {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ type: 'char', length: 36 })
  shopId: string;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'varchar', length: 120, nullable: true })
  contact: string | null;

  @Column({ type: 'varchar', length: 254, nullable: true })
  email: string | null;

  @Column({ type: 'varchar', length: 40, nullable: true })
  phone: string | null;

  @CreateDateColumn({ type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime', precision: 3 })
  updatedAt: Date;
}

/** One part of the shop's catalog; a part may carry a fit spec (fitKind + fitSpecId) so the fit check and the plan see the same item. */
@Entity('parts')
export class Part {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ type: 'char', length: 36 })
  shopId: string;

  @Column({ type: 'varchar', length: 64 })
  sku: string;

  @Column({ type: 'varchar', length: 240 })
  description: string;

  @Column({ type: 'varchar', length: 40 })
  category: CatalogPartCategory;

  @Column({ type: 'int', unsigned: true })
  priceCents: number;

  @Column({ type: 'int', unsigned: true, default: 0 })
  costCents: number;

  @Column({ type: 'char', length: 36, nullable: true })
  supplierId: string | null;

  @Column({ type: 'varchar', length: 64, nullable: true })
  supplierSku: string | null;

  @Column({ type: 'decimal', precision: 6, scale: 1, default: 0, transformer: decimalTransformer })
  laborHours: number;

  @Column({ type: 'json' })
  torqueSpecs: TorqueSpec[];

  @Column({ type: 'text', nullable: true })
  instructions: string | null;

  @Column({ type: 'json' })
  attributes: PartAttributes;

  @Column({ type: 'json' })
  requiresSkus: string[];

  @Column({ type: 'json' })
  excludesSkus: string[];

  @Column({ type: 'json' })
  replacesSkus: string[];

  @Column({ type: 'varchar', length: 40, nullable: true })
  fitKind: FitSpecKind | null;

  @Column({ type: 'char', length: 36, nullable: true })
  fitSpecId: string | null;

  @CreateDateColumn({ type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime', precision: 3 })
  updatedAt: Date;
}

@Entity('part_stock')
export class PartStock {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ type: 'char', length: 36 })
  shopId: string;

  @Column({ type: 'char', length: 36 })
  partId: string;

  @Column({ type: 'varchar', length: 60 })
  location: string;

  @Column({ type: 'varchar', length: 40, default: '' })
  bin: string;

  @Column({ type: 'int', unsigned: true, default: 0 })
  onHand: number;

  @Column({ type: 'int', unsigned: true, default: 0 })
  reserved: number;

  @UpdateDateColumn({ type: 'datetime', precision: 3 })
  updatedAt: Date;
}

export type PlanStatus = 'draft' | 'locked';

/** What the fit check says once the plan's parts are fitted. */
export interface PlanRecheck {
  summary: { ok: number; tight: number; fails: number; unknown: number };
  resolved: string[];
  remaining: Array<{ checkId: string; title: string; status: CheckStatus; message: string }>;
}

@Entity('parts_plans')
export class PartsPlanRecord {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ type: 'char', length: 36 })
  shopId: string;

  @Column({ type: 'char', length: 36 })
  projectId: string;

  @Column({ type: 'int', unsigned: true })
  version: number;

  @Column({ type: 'varchar', length: 24 })
  objective: string;

  @Column({ type: 'varchar', length: 12 })
  status: PlanStatus;

  @Column({ type: 'char', length: 36, nullable: true })
  fitReportId: string | null;

  @Column({ type: 'json' })
  result: PartsPlanResult;

  @Column({ type: 'json' })
  recheck: PlanRecheck;

  @Column({ type: 'int', unsigned: true })
  totalCents: number;

  @Column({ type: 'int', unsigned: true })
  solveMs: number;

  @Column({ type: 'datetime', precision: 3, nullable: true })
  lockedAt: Date | null;

  @Column({ type: 'char', length: 36, nullable: true })
  createdById: string | null;

  @CreateDateColumn({ type: 'datetime', precision: 3 })
  createdAt: Date;
}

@Entity('counter_lines')
export class CounterLine {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ type: 'char', length: 36 })
  shopId: string;

  @Column({ type: 'char', length: 36 })
  planId: string;

  @Column({ type: 'char', length: 36 })
  projectId: string;

  @Column({ type: 'char', length: 36, nullable: true })
  partId: string | null;

  @Column({ type: 'varchar', length: 64 })
  sku: string;

  @Column({ type: 'varchar', length: 240 })
  description: string;

  @Column({ type: 'int', unsigned: true })
  quantity: number;

  @Column({ type: 'varchar', length: 16 })
  status: CounterStatus;

  @Column({ type: 'char', length: 36, nullable: true })
  stockId: string | null;

  /** When the units were issued to the job (taken off the shelf); null while they are not. */
  @Column({ type: 'datetime', precision: 3, nullable: true })
  issuedAt: Date | null;

  @Column({ type: 'char', length: 36, nullable: true })
  updatedById: string | null;

  @UpdateDateColumn({ type: 'datetime', precision: 3 })
  updatedAt: Date;
}

export const PARTS_ENTITIES = [Supplier, Part, PartStock, PartsPlanRecord, CounterLine];
