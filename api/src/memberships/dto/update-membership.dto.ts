import { ApiProperty } from '@nestjs/swagger';
import { IsIn } from 'class-validator';
import { Role, ROLES } from '../../common/roles/role';

export class UpdateMembershipDto {
  @ApiProperty({ enum: ROLES })
  @IsIn(ROLES, { message: `role must be one of: ${ROLES.join(', ')}` })
  role: Role;
}
