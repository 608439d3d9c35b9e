import { ApiProperty } from '@nestjs/swagger';
import { UNIT_SYSTEMS, UnitSystem } from '../shop.entity';

/** What every member of the shop, customers included, may see. */
export class ShopSummaryResponseDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: UNIT_SYSTEMS }) unitSystem: UnitSystem;
  @ApiProperty({ example: 'USD', description: 'ISO 4217 code' }) currency: string;
}

/** The shop with its rates, for staff. */
export class ShopResponseDto extends ShopSummaryResponseDto {
  @ApiProperty({ description: 'Shop labor rate in the shop currency per hour' }) laborRatePerHour: number;
  @ApiProperty() taxRatePercent: number;
  @ApiProperty() shopSuppliesPercent: number;
}
