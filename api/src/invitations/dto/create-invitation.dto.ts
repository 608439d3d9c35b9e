import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsEmail, IsIn, IsOptional, IsUUID, MaxLength } from 'class-validator';
import { Role, ROLES } from '../../common/roles/role';

export class CreateInvitationDto {
  @ApiProperty()
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(254)
  email: string;

  @ApiProperty({ enum: ROLES })
  @IsIn(ROLES, { message: `role must be one of: ${ROLES.join(', ')}` })
  role: Role;

  @ApiPropertyOptional({ format: 'uuid', description: 'Only for role customer: the customer record this login sees' })
  @IsOptional()
  @IsUUID('all', { message: 'customerId must be a UUID' })
  customerId?: string;
}
