import type { FitSettings } from '@swapwright/shared';
import { Column, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';

/** A shop's own thresholds for the fit engine; everything not listed keeps the engine's default. */
@Entity('shop_fit_settings')
export class ShopFitSettings {
  @PrimaryColumn({ type: 'char', length: 36 })
  shopId: string;

  @Column({ type: 'json' })
  overrides: Partial<FitSettings>;

  @Column({ type: 'char', length: 36, nullable: true })
  updatedById: string | null;

  @UpdateDateColumn({ type: 'datetime', precision: 3 })
  updatedAt: Date;
}
