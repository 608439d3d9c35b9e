import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource, EntityManager } from 'typeorm';
import { AuthUser } from '../common/tenant/auth-user';
import { Customer } from '../customers/customer.entity';
import { Membership } from '../memberships/membership.entity';

/** Turns a membership id into the AuthUser every guard, decorator and service works with. */
@Injectable()
export class MemberResolverService {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  async resolve(membershipId: string, manager: EntityManager = this.dataSource.manager): Promise<AuthUser | null> {
    const membership = await manager.findOne(Membership, { where: { id: membershipId }, relations: { user: true } });
    if (!membership?.user) return null;
    let customerId: string | null = null;
    if (membership.role === 'customer') {
      const customer = await manager.findOne(Customer, {
        where: { shopId: membership.shopId, userId: membership.userId },
        select: { id: true },
      });
      customerId = customer?.id ?? null;
    }
    return {
      userId: membership.userId,
      email: membership.user.email,
      name: membership.user.name,
      membershipId: membership.id,
      shopId: membership.shopId,
      role: membership.role,
      customerId,
    };
  }
}
