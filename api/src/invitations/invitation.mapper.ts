import { InvitationResponseDto } from './dto/invitation-response.dto';
import { Invitation } from './invitation.entity';

export function mapInvitation(invitation: Invitation): InvitationResponseDto {
  return {
    id: invitation.id,
    email: invitation.email,
    role: invitation.role,
    customerId: invitation.customerId,
    expiresAt: invitation.expiresAt.toISOString(),
    acceptedAt: invitation.acceptedAt ? invitation.acceptedAt.toISOString() : null,
  };
}
