import { ApiProperty } from '@nestjs/swagger';
import { Role, ROLES } from '../../common/roles/role';

export class MembershipResponseDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ format: 'uuid' }) userId: string;
  @ApiProperty() email: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: ROLES }) role: Role;
  @ApiProperty() createdAt: string;
}
