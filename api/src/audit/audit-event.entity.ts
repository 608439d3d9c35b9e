import type { AuditKind } from '@swapwright/shared';
import { Column, CreateDateColumn, Entity, Index, PrimaryColumn } from 'typeorm';

export type AuditValues = Record<string, unknown>;

/** One change to money, stock, a sheet's sign-off or a membership: written in the same transaction as the change. */
@Entity('audit_events')
@Index('ix_audit_events_shop_time', ['shopId', 'createdAt'])
@Index('ix_audit_events_shop_kind_time', ['shopId', 'kind', 'createdAt'])
export class AuditEvent {
  @PrimaryColumn({ type: 'char', length: 36 }) id: string;
  @Column({ type: 'char', length: 36 }) shopId: string;
  /** Null for a change no signed-in person made (the payment provider's event, the customer's e-mailed link). */
  @Column({ type: 'char', length: 36, nullable: true }) actorUserId: string | null;
  @Column({ type: 'varchar', length: 160 }) actorName: string;
  @Column({ type: 'varchar', length: 20 }) kind: AuditKind;
  /** What happened, e.g. `quote.sent`, `stock.reserved`, `membership.role-changed`. */
  @Column({ type: 'varchar', length: 60 }) action: string;
  @Column({ type: 'char', length: 36, nullable: true }) subjectId: string | null;
  @Column({ type: 'varchar', length: 300 }) summary: string;
  @Column({ type: 'json', nullable: true }) before: AuditValues | null;
  @Column({ type: 'json', nullable: true }) after: AuditValues | null;
  @CreateDateColumn({ type: 'datetime', precision: 3 }) createdAt: Date;
}
