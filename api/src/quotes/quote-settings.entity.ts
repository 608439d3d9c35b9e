import { Column, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import { decimalTransformer } from '../database/column-transformers';

/** The shop's quoting terms beyond the rates on the shop itself (labor rate, parts tax, supplies %). */
@Entity('quote_settings')
export class QuoteSettings {
  @PrimaryColumn({ type: 'char', length: 36 })
  shopId: string;

  @Column({ type: 'decimal', precision: 8, scale: 4, default: 0, transformer: decimalTransformer })
  laborTaxPercent: number;

  @Column({ type: 'int', nullable: true })
  suppliesCapCents: number | null;

  @Column({ type: 'decimal', precision: 8, scale: 4, default: 30, transformer: decimalTransformer })
  depositPercent: number;

  @Column({ type: 'int', default: 30 })
  validityDays: number;

  @Column({ type: 'decimal', precision: 8, scale: 4, default: 30, transformer: decimalTransformer })
  defaultMarkupPercent: number;

  @Column({ type: 'text' })
  terms: string;

  @UpdateDateColumn({ type: 'datetime', precision: 3 })
  updatedAt: Date;
}
