import { Column, CreateDateColumn, Entity, Index, PrimaryColumn, UpdateDateColumn } from 'typeorm';

export const DEPOSIT_PAYMENT_STATES = ['pending', 'failed', 'paid'] as const;
export type DepositPaymentState = (typeof DEPOSIT_PAYMENT_STATES)[number];

/** One attempt to pay a quote's deposit through the provider (one PaymentIntent). */
@Entity('deposit_payments')
@Index('ux_deposit_payments_intent', ['intentId'], { unique: true })
export class DepositPayment {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ type: 'char', length: 36 })
  shopId: string;

  @Column({ type: 'char', length: 36 })
  quoteId: string;

  @Column({ type: 'varchar', length: 80 })
  intentId: string;

  @Column({ type: 'int' })
  amountCents: number;

  @Column({ type: 'char', length: 3 })
  currency: string;

  @Column({ type: 'varchar', length: 10 })
  state: DepositPaymentState;

  @Column({ type: 'varchar', length: 300, nullable: true })
  lastError: string | null;

  @CreateDateColumn({ type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime', precision: 3 })
  updatedAt: Date;
}

/** Every provider event applied, by its id: a second delivery of the same event finds it here and changes nothing. */
@Entity('payment_events')
export class PaymentEvent {
  @PrimaryColumn({ type: 'varchar', length: 80 })
  eventId: string;

  @Column({ type: 'varchar', length: 60 })
  type: string;

  @Column({ type: 'varchar', length: 80, nullable: true })
  intentId: string | null;

  @CreateDateColumn({ type: 'datetime', precision: 3 })
  receivedAt: Date;
}
