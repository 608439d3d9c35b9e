import { ApiProperty } from '@nestjs/swagger';
import { UNIT_SYSTEMS, UnitSystem } from '../shop.entity';

export class ShopResponseDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: UNIT_SYSTEMS }) unitSystem: UnitSystem;
  @ApiProperty({ description: 'Shop labor rate in the shop currency per hour' }) laborRatePerHour: number;
  @ApiProperty() taxRatePercent: number;
  @ApiProperty() shopSuppliesPercent: number;
  @ApiProperty({ example: 'USD', description: 'ISO 4217 code' }) currency: string;
}
