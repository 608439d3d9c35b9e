import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsNotEmpty, IsString, MaxLength, MinLength } from 'class-validator';
import { Trim } from '../../common/decorators/trim.decorator';
import { TimeZoneField } from '../../shops/dto/time-zone.field';

export const PASSWORD_MIN = 8;
// bcrypt reads at most 72 bytes.
export const PASSWORD_MAX = 72;

export class SignUpDto {
  @ApiProperty({ example: 'builder@example.test', maxLength: 254 })
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(254)
  email: string;

  @ApiProperty({ minLength: PASSWORD_MIN, maxLength: PASSWORD_MAX })
  @IsString()
  @MinLength(PASSWORD_MIN, { message: `password must be at least ${PASSWORD_MIN} characters long` })
  @MaxLength(PASSWORD_MAX)
  password: string;

  @ApiProperty({ maxLength: 120 })
  @Trim()
  @IsString()
  @IsNotEmpty({ message: 'name must not be empty' })
  @MaxLength(120)
  name: string;

  @ApiProperty({ maxLength: 120, example: 'Back Forty Garage' })
  @Trim()
  @IsString()
  @IsNotEmpty({ message: 'shopName must not be empty' })
  @MaxLength(120)
  shopName: string;

  @TimeZoneField("The new shop's time zone (the web sends the browser's); UTC when not given")
  timeZone?: string;
}

export class SignUpConfirmDto {
  @ApiProperty({ description: 'The token from the e-mailed sign-up link' })
  @IsString()
  @IsNotEmpty({ message: 'token must not be empty' })
  @MaxLength(200)
  token: string;
}

export class SignUpAcceptedResponseDto {
  @ApiProperty({ example: 'Check your e-mail: we sent builder@example.test a link to finish creating your shop.' })
  message: string;
}
