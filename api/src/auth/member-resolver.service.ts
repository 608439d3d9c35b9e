import { Injectable } from '@nestjs/common';
import { EntityManager } from 'typeorm';
import { AuthUser } from '../common/tenant/auth-user';
import { CustomersService } from '../customers/customers.service';
import { MembershipsService } from '../memberships/memberships.service';

/** Turns a membership id into the AuthUser every guard, decorator and service works with. */
@Injectable()
export class MemberResolverService {
  constructor(
    private readonly memberships: MembershipsService,
    private readonly customers: CustomersService,
  ) {}

  /** Pass the manager of an open transaction when the membership was created in it. */
  async resolve(membershipId: string, manager?: EntityManager): Promise<AuthUser | null> {
    const membership = await this.memberships.findWithUser(membershipId, manager);
    if (!membership?.user) return null;
    let customerId: string | null = null;
    if (membership.role === 'customer') {
      const customer = await this.customers.linkedTo(membership.shopId, membership.userId, manager);
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
