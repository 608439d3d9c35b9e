import { ApiProperty } from '@nestjs/swagger';
import { Role, ROLES } from '../../common/roles/role';

export class InvitationResponseDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() email: string;
  @ApiProperty({ enum: ROLES }) role: Role;
  @ApiProperty({ type: String, nullable: true, format: 'uuid' }) customerId: string | null;
  @ApiProperty() expiresAt: string;
  @ApiProperty({ type: String, nullable: true }) acceptedAt: string | null;
}
