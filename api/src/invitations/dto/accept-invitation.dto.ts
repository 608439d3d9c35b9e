import { ApiProperty } from '@nestjs/swagger';
import { IsNotEmpty, IsString, MaxLength, MinLength } from 'class-validator';
import { PASSWORD_MAX, PASSWORD_MIN } from '../../auth/dto/sign-up.dto';

export class AcceptInvitationDto {
  @ApiProperty({ description: 'The token from the e-mailed link' })
  @IsString()
  @IsNotEmpty()
  @MaxLength(200)
  token: string;

  @ApiProperty({ maxLength: 120 })
  @IsString()
  @IsNotEmpty({ message: 'name must not be empty' })
  @MaxLength(120)
  name: string;

  @ApiProperty({ minLength: PASSWORD_MIN, maxLength: PASSWORD_MAX })
  @IsString()
  @MinLength(PASSWORD_MIN, { message: `password must be at least ${PASSWORD_MIN} characters long` })
  @MaxLength(PASSWORD_MAX)
  password: string;
}
