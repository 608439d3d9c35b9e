import { Injectable } from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import { randomUUID } from 'node:crypto';
import { DataSource, EntityManager, Repository } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import { Role } from '../common/roles/role';
import { AuthUser } from '../common/tenant/auth-user';
import { TenantRepository } from '../common/tenant/tenant-repository';
import { CustomersService } from '../customers/customers.service';
import { Membership } from './membership.entity';
import { MembershipErrors } from './memberships.errors';

@Injectable()
export class MembershipsService {
  private readonly scoped: TenantRepository<Membership>;

  constructor(
    @InjectRepository(Membership) private readonly memberships: Repository<Membership>,
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly customers: CustomersService,
    private readonly audit: AuditService,
  ) {
    this.scoped = new TenantRepository(memberships);
  }

  list(user: AuthUser): Promise<Membership[]> {
    return this.scoped.query(user, 'membership').leftJoinAndSelect('membership.user', 'user').orderBy('membership.createdAt', 'ASC').getMany();
  }

  async updateRole(user: AuthUser, id: string, role: Role): Promise<Membership> {
    return this.dataSource.transaction(async (manager) => {
      const membership = await this.lockInShop(manager, user, id);
      if (membership.role === 'owner' && role !== 'owner') await this.assertAnotherOwner(manager, user, id);
      if (membership.role !== role) {
        await this.audit.record(manager, {
          shopId: user.shopId,
          actor: user,
          kind: 'membership',
          action: 'membership.role-changed',
          subjectId: membership.id,
          summary: `Role of ${membership.user?.email ?? 'a member'} changed from ${membership.role} to ${role}.`,
          before: { role: membership.role, userId: membership.userId },
          after: { role, userId: membership.userId },
        });
      }
      membership.role = role;
      await manager.save(membership);
      return membership;
    });
  }

  async remove(user: AuthUser, id: string): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      const membership = await this.lockInShop(manager, user, id);
      if (membership.role === 'owner') await this.assertAnotherOwner(manager, user, id);
      await this.audit.record(manager, {
        shopId: user.shopId,
        actor: user,
        kind: 'membership',
        action: 'membership.removed',
        subjectId: membership.id,
        summary: `${membership.user?.email ?? 'A member'} (${membership.role}) was removed from the shop.`,
        before: { role: membership.role, userId: membership.userId },
        after: null,
      });
      await this.customers.unlinkLogin(manager, user.shopId, membership.userId);
      // Refresh tokens of this membership go with it (ON DELETE CASCADE); access tokens stop at the next request.
      await manager.delete(Membership, { id: membership.id, shopId: user.shopId });
    });
  }

  /** Inside the sign-up or invitation transaction. */
  create(manager: EntityManager, input: { shopId: string; userId: string; role: Role }): Promise<Membership> {
    return manager.save(manager.create(Membership, { id: randomUUID(), ...input }));
  }

  /** A membership with its user (for turning a token into the caller); pass the manager of an open transaction. */
  findWithUser(id: string, manager: EntityManager = this.memberships.manager): Promise<Membership | null> {
    return manager.findOne(Membership, { where: { id }, relations: { user: true } });
  }

  /** The membership a sign-in lands in: the oldest one of the user. */
  firstForUser(userId: string): Promise<Membership | null> {
    return this.memberships.findOne({ where: { userId }, order: { createdAt: 'ASC' } });
  }

  isMember(shopId: string, email: string): Promise<boolean> {
    return this.memberships
      .createQueryBuilder('membership')
      .innerJoin('membership.user', 'user')
      .where('membership.shopId = :shopId AND user.email = :email', { shopId, email })
      .getExists();
  }

  private async lockInShop(manager: EntityManager, user: AuthUser, id: string): Promise<Membership> {
    const membership = await manager
      .createQueryBuilder(Membership, 'membership')
      .setLock('pessimistic_write')
      .leftJoinAndSelect('membership.user', 'user')
      .where('membership.id = :id AND membership.shopId = :shopId', { id, shopId: user.shopId })
      .getOne();
    if (!membership) throw MembershipErrors.notFound();
    return membership;
  }

  private async assertAnotherOwner(manager: EntityManager, user: AuthUser, exceptId: string): Promise<void> {
    const others = await manager
      .createQueryBuilder(Membership, 'membership')
      .setLock('pessimistic_write')
      .where('membership.shopId = :shopId AND membership.role = :role AND membership.id <> :exceptId', {
        shopId: user.shopId,
        role: 'owner',
        exceptId,
      })
      .getCount();
    if (others === 0) throw MembershipErrors.lastOwner();
  }
}
