import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsEmail, IsNotEmpty, IsOptional, IsString, Matches, MaxLength } from 'class-validator';
import { Trim } from '../../common/decorators/trim.decorator';
import { IsPhoneText } from '../../common/validation/form-values';

export class CreateCustomerDto {
  @ApiProperty({ maxLength: 120, example: 'Odile Straker' })
  @Trim()
  @IsString()
  @IsNotEmpty({ message: 'name must not be empty' })
  @MaxLength(120)
  name: string;

  @ApiPropertyOptional({ type: String, maxLength: 254, nullable: true })
  @IsOptional()
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(254)
  email?: string | null;

  @ApiPropertyOptional({ type: String, maxLength: 40, nullable: true, example: '+1 555 0142' })
  @IsOptional()
  @IsString()
  @MaxLength(40)
  @Matches(/^[0-9+()\-.\s/x]*$/i, { message: 'phone may contain only digits, spaces and + ( ) - . / x' })
  @IsPhoneText()
  phone?: string | null;

  @ApiPropertyOptional({ type: String, maxLength: 4000, nullable: true })
  @IsOptional()
  @IsString()
  @MaxLength(4000)
  notes?: string | null;
}
