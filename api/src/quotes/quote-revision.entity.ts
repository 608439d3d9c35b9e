import type { DepositKind, DiscountKind, PartPricing, QuoteTotals } from '@swapwright/shared';
import { Column, CreateDateColumn, Entity, Index, PrimaryColumn } from 'typeorm';
import { decimalTransformer } from '../database/column-transformers';

export const LINE_SOURCES = ['plan', 'fit-remedy', 'manual'] as const;
export type LineSource = (typeof LINE_SOURCES)[number];

/** One line of a revision, stored with the figures the quote rule gave it. `key` follows a line across revisions. */
export interface QuoteLine {
  key: string;
  kind: 'part' | 'labor';
  source: LineSource;
  description: string;
  /** Part lines: the part number the shop orders by (absent on lines stored before it was kept). */
  sku?: string | null;
  /** Part lines: the catalog row it prices (kind and id), when it came from one. */
  catalogKind: string | null;
  catalogItemId: string | null;
  /** Labor lines: the shop's labor operation. */
  laborOperationId: string | null;
  quantity: number;
  pricing: PartPricing;
  unitCostCents: number | null;
  markupPercent: number | null;
  hours: number | null;
  unitPriceCents: number;
  lineTotalCents: number;
}

/** A revision of a quote. Once sent (`sentAt` set) it never changes; a change makes the next revision. */
@Entity('quote_revisions')
@Index('ux_quote_revisions_quote_number', ['quoteId', 'number'], { unique: true })
export class QuoteRevision {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ type: 'char', length: 36 })
  shopId: string;

  @Column({ type: 'char', length: 36 })
  quoteId: string;

  @Column({ type: 'int' })
  number: number;

  /** The stored fit report and parts plan version the quote was built on. */
  @Column({ type: 'char', length: 36, nullable: true })
  fitReportId: string | null;

  @Column({ type: 'char', length: 36, nullable: true })
  partsPlanId: string | null;

  @Column({ type: 'int', nullable: true })
  partsPlanVersion: number | null;

  @Column({ type: 'date' })
  validUntil: string;

  @Column({ type: 'char', length: 3 })
  currency: string;

  @Column({ type: 'int' })
  laborRateCents: number;

  @Column({ type: 'decimal', precision: 8, scale: 4, transformer: decimalTransformer })
  suppliesPercent: number;

  @Column({ type: 'int', nullable: true })
  suppliesCapCents: number | null;

  @Column({ type: 'decimal', precision: 8, scale: 4, transformer: decimalTransformer })
  partsTaxPercent: number;

  @Column({ type: 'decimal', precision: 8, scale: 4, transformer: decimalTransformer })
  laborTaxPercent: number;

  @Column({ type: 'varchar', length: 8 })
  discountKind: DiscountKind;

  @Column({ type: 'decimal', precision: 8, scale: 4, nullable: true, transformer: decimalTransformer })
  discountPercent: number | null;

  @Column({ type: 'int', nullable: true })
  discountAmountCents: number | null;

  @Column({ type: 'varchar', length: 8 })
  depositKind: DepositKind;

  @Column({ type: 'decimal', precision: 8, scale: 4, nullable: true, transformer: decimalTransformer })
  depositPercent: number | null;

  @Column({ type: 'int', nullable: true })
  depositAmountCents: number | null;

  @Column({ type: 'text' })
  terms: string;

  @Column({ type: 'varchar', length: 2000, default: '' })
  notes: string;

  @Column({ type: 'json' })
  lines: QuoteLine[];

  @Column({ type: 'json' })
  totals: QuoteTotals;

  @Column({ type: 'char', length: 36, nullable: true })
  createdById: string | null;

  @Column({ type: 'datetime', precision: 3, nullable: true })
  sentAt: Date | null;

  @CreateDateColumn({ type: 'datetime', precision: 3 })
  createdAt: Date;
}
