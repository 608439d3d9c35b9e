import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsISO4217CurrencyCode, IsNotEmpty, IsNumber, IsOptional, IsString, Max, MaxLength, Min } from 'class-validator';
import { UNIT_SYSTEMS, UnitSystem } from '../shop.entity';
import { Trim } from '../../common/decorators/trim.decorator';
import { TimeZoneField } from './time-zone.field';

export class UpdateShopDto {
  @ApiPropertyOptional({ maxLength: 120 })
  @IsOptional()
  @Trim()
  @IsString()
  @IsNotEmpty({ message: 'name must not be empty' })
  @MaxLength(120)
  name?: string;

  @ApiPropertyOptional({ enum: UNIT_SYSTEMS })
  @IsOptional()
  @IsIn(UNIT_SYSTEMS, { message: 'unitSystem must be in or mm' })
  unitSystem?: UnitSystem;

  @ApiPropertyOptional({ minimum: 0, maximum: 10000 })
  @IsOptional()
  @IsNumber({ maxDecimalPlaces: 2 })
  @Min(0)
  @Max(10000)
  laborRatePerHour?: number;

  @ApiPropertyOptional({ minimum: 0, maximum: 100 })
  @IsOptional()
  @IsNumber({ maxDecimalPlaces: 2 })
  @Min(0)
  @Max(100)
  taxRatePercent?: number;

  @ApiPropertyOptional({ minimum: 0, maximum: 100 })
  @IsOptional()
  @IsNumber({ maxDecimalPlaces: 2 })
  @Min(0)
  @Max(100)
  shopSuppliesPercent?: number;

  @ApiPropertyOptional({ example: 'USD' })
  @IsOptional()
  @IsISO4217CurrencyCode({ message: 'currency must be a three-letter ISO 4217 code such as USD or EUR' })
  currency?: string;

  @TimeZoneField("The shop's time zone: quotes are dated, and lapse, by its calendar day")
  timeZone?: string;
}
