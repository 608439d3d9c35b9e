import { MembershipResponseDto } from './dto/membership-response.dto';
import { Membership } from './membership.entity';

export function mapMembership(membership: Membership): MembershipResponseDto {
  return {
    id: membership.id,
    userId: membership.userId,
    email: membership.user?.email ?? '',
    name: membership.user?.name ?? '',
    role: membership.role,
    createdAt: membership.createdAt.toISOString(),
  };
}
