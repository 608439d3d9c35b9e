import type { UnitSystem } from '@swapwright/shared';
import { Column, CreateDateColumn, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import { decimalTransformer } from '../database/column-transformers';

export { UNIT_SYSTEMS, type UnitSystem } from '@swapwright/shared';

@Entity('shops')
export class Shop {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'varchar', length: 2, default: 'in' })
  unitSystem: UnitSystem;

  @Column({ type: 'decimal', precision: 10, scale: 2, default: 0, transformer: decimalTransformer })
  laborRatePerHour: number;

  @Column({ type: 'decimal', precision: 5, scale: 2, default: 0, transformer: decimalTransformer })
  taxRatePercent: number;

  @Column({ type: 'decimal', precision: 5, scale: 2, default: 0, transformer: decimalTransformer })
  shopSuppliesPercent: number;

  @Column({ type: 'char', length: 3, default: 'USD' })
  currency: string;

  /** IANA time zone name ("America/Denver"): the shop's calendar day, by which quotes are dated and lapse. */
  @Column({ type: 'varchar', length: 64, default: 'UTC' })
  timeZone: string;

  @CreateDateColumn({ type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime', precision: 3 })
  updatedAt: Date;
}
