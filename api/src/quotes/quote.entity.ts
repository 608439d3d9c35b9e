import { Column, CreateDateColumn, Entity, Index, PrimaryColumn, UpdateDateColumn } from 'typeorm';

/**
 * Where a quote stands, in our words: being written, with the customer for an answer, approved, turned down,
 * or lapsed (its validity date passed without an answer; worked out when read, see `effectiveQuoteStatus`).
 */
export const QUOTE_STATUSES = ['drafting', 'awaiting-answer', 'approved', 'turned-down', 'lapsed'] as const;
export type QuoteStatus = (typeof QUOTE_STATUSES)[number];

export const DEPOSIT_STATES = ['not-due', 'due', 'paid'] as const;
export type DepositState = (typeof DEPOSIT_STATES)[number];

@Entity('quotes')
@Index('ix_quotes_shop_project', ['shopId', 'projectId', 'createdAt'])
export class Quote {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ type: 'char', length: 36 })
  shopId: string;

  @Column({ type: 'char', length: 36 })
  projectId: string;

  /** Shown as Q-<number>, counted per shop. */
  @Column({ type: 'int' })
  number: number;

  @Column({ type: 'varchar', length: 20, default: 'drafting' })
  status: QuoteStatus;

  /** The newest revision (a draft, or the last one sent). */
  @Column({ type: 'int', default: 1 })
  latestRevision: number;

  /** The revision the customer has in hand (null until one is sent). */
  @Column({ type: 'int', nullable: true })
  sentRevision: number | null;

  @Column({ type: 'char', length: 36, nullable: true })
  sentById: string | null;

  @Column({ type: 'datetime', precision: 3, nullable: true })
  answeredAt: Date | null;

  @Column({ type: 'varchar', length: 1000, nullable: true })
  declineReason: string | null;

  @Column({ type: 'varchar', length: 12, default: 'not-due' })
  depositState: DepositState;

  @Column({ type: 'datetime', precision: 3, nullable: true })
  depositPaidAt: Date | null;

  @CreateDateColumn({ type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime', precision: 3 })
  updatedAt: Date;
}
