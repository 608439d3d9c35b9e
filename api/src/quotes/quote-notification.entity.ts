import { Column, CreateDateColumn, Entity, Index, PrimaryColumn } from 'typeorm';

/** Told in the app: the customer answered a quote, or paid its deposit. */
@Entity('quote_notifications')
@Index('ix_quote_notifications_user', ['shopId', 'userId', 'createdAt'])
export class QuoteNotification {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ type: 'char', length: 36 })
  shopId: string;

  @Column({ type: 'char', length: 36 })
  userId: string;

  @Column({ type: 'char', length: 36 })
  quoteId: string;

  @Column({ type: 'char', length: 36 })
  projectId: string;

  @Column({ type: 'varchar', length: 500 })
  message: string;

  @Column({ type: 'datetime', precision: 3, nullable: true })
  readAt: Date | null;

  @CreateDateColumn({ type: 'datetime', precision: 3 })
  createdAt: Date;
}
