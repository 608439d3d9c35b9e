import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsNotEmpty, IsString, MaxLength, MinLength } from 'class-validator';
import { PASSWORD_MAX, PASSWORD_MIN } from './sign-up.dto';

export class PasswordResetRequestDto {
  @ApiProperty()
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(254)
  email: string;
}

export class PasswordResetConfirmDto {
  @ApiProperty({ description: 'The token from the e-mailed link' })
  @IsString()
  @IsNotEmpty()
  @MaxLength(200)
  token: string;

  @ApiProperty({ minLength: PASSWORD_MIN, maxLength: PASSWORD_MAX })
  @IsString()
  @MinLength(PASSWORD_MIN, { message: `password must be at least ${PASSWORD_MIN} characters long` })
  @MaxLength(PASSWORD_MAX)
  password: string;
}
