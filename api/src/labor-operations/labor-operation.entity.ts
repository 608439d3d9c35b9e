import type { WorkHazard } from '@swapwright/shared';
import { Column, CreateDateColumn, Entity, Index, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import { decimalTransformer } from '../database/column-transformers';

/** Hazards a step carries; each prints its usual caution on the quote and the work order. */
export { WORK_HAZARDS, type WorkHazard } from '@swapwright/shared';

/** A fastener's torque as the part's data gives it (lbf·ft), with its tightening sequence in words. */
export interface TorqueSpec {
  /** The stable name of the joint it tightens (`oil-pan-to-block`); a part's own figure for the joint replaces it on a work order. */
  joint?: string | null;
  fastener: string;
  lbfFt: number;
  /** e.g. "crisscross from the centre out, in two stages (half, then full)" */
  sequence: string | null;
}

/** Something the bay records while doing the operation; a range makes it a measured check with pass/fail. */
export interface CheckTemplate {
  key: string;
  label: string;
  unit: string | null;
  min: number | null;
  max: number | null;
  /** The fit check whose result this check confirms on the vehicle (e.g. `cam.timing-advance`). */
  fitCheckId?: string | null;
}

/** One of the shop's labor operations: book hours, where it sits in the build and what the bay must watch and record. */
@Entity('labor_operations')
@Index('ux_labor_operations_shop_code', ['shopId', 'code'], { unique: true })
export class LaborOperation {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ type: 'char', length: 36 })
  shopId: string;

  /** Short stable code, e.g. `engine-r-and-i`. */
  @Column({ type: 'varchar', length: 60 })
  code: string;

  @Column({ type: 'varchar', length: 160 })
  name: string;

  @Column({ type: 'decimal', precision: 5, scale: 1, transformer: decimalTransformer })
  bookHours: number;

  /** Position in the build (lower first). */
  @Column({ type: 'int', default: 100 })
  buildOrder: number;

  /** Words in a fit remedy or part category this operation answers (lower case), so a quote can draw it. */
  @Column({ type: 'json' })
  matches: string[];

  @Column({ type: 'json' })
  hazards: WorkHazard[];

  @Column({ type: 'json' })
  torqueSpecs: TorqueSpec[];

  @Column({ type: 'json' })
  checks: CheckTemplate[];

  @CreateDateColumn({ type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime', precision: 3 })
  updatedAt: Date;
}
