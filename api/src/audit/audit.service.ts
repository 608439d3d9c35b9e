import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { AuditKind } from '@swapwright/shared';
import { randomUUID } from 'node:crypto';
import { DataSource, EntityManager } from 'typeorm';
import { Page, skipOf } from '../common/pagination/page-query.dto';
import { AuthUser } from '../common/tenant/auth-user';
import { AuditEvent, AuditValues } from './audit-event.entity';

/** Who made a change: a signed-in member, or a named outside party (the payment provider, a customer's link). */
export type AuditActor = Pick<AuthUser, 'userId' | 'name'> | { userId: null; name: string };

export interface AuditEntry {
  shopId: string;
  actor: AuditActor;
  kind: AuditKind;
  action: string;
  subjectId?: string | null;
  summary: string;
  before?: AuditValues | null;
  after?: AuditValues | null;
}

@Injectable()
export class AuditService {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  /**
   * Writes the entry with the manager of the change's own transaction, so the entry and the change commit or
   * roll back together. Call it before the change's writes.
   */
  async record(manager: EntityManager, entry: AuditEntry): Promise<void> {
    if (!manager.queryRunner?.isTransactionActive) throw new Error('An audit entry must be written inside the transaction of its change.');
    const event: AuditEvent = manager.create(AuditEvent, {
      id: randomUUID(),
      shopId: entry.shopId,
      actorUserId: entry.actor.userId,
      actorName: entry.actor.name.slice(0, 160),
      kind: entry.kind,
      action: entry.action,
      subjectId: entry.subjectId ?? null,
      summary: entry.summary.slice(0, 300),
      before: entry.before ?? null,
      after: entry.after ?? null,
    });
    await manager.save(event);
  }

  async list(user: Pick<AuthUser, 'shopId'>, query: { kind?: AuditKind; page: number; pageSize: number }): Promise<Page<AuditEvent>> {
    const builder = this.dataSource.getRepository(AuditEvent).createQueryBuilder('e').where('e.shopId = :shopId', { shopId: user.shopId });
    if (query.kind) builder.andWhere('e.kind = :kind', { kind: query.kind });
    const [items, total] = await builder
      .orderBy('e.createdAt', 'DESC')
      .addOrderBy('e.id', 'ASC')
      .skip(skipOf(query))
      .take(query.pageSize)
      .getManyAndCount();
    return { items, total, page: query.page, pageSize: query.pageSize };
  }
}
