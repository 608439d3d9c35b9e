import { ApiProperty } from '@nestjs/swagger';
import { UNIT_SYSTEMS, UnitSystem } from '../shop.entity';

/** Which view of the shop an answer is: `full` with the rates (staff), `summary` without them (customers). */
export const SHOP_VIEWS = ['full', 'summary'] as const;
export type ShopView = (typeof SHOP_VIEWS)[number];

/** The fields every view has. */
abstract class ShopBasicsDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: UNIT_SYSTEMS }) unitSystem: UnitSystem;
  @ApiProperty({ example: 'USD', description: 'ISO 4217 code' }) currency: string;
  @ApiProperty({ example: 'America/Denver', description: "IANA time zone name: the shop's calendar day, by which its quotes are dated and lapse" })
  timeZone: string;
}

/** What every member of the shop, customers included, may see. */
export class ShopSummaryResponseDto extends ShopBasicsDto {
  @ApiProperty({ enum: ['summary'], description: 'Tells this view apart from the full one' }) view: 'summary';
}

/** The shop with its rates, for staff. */
export class ShopResponseDto extends ShopBasicsDto {
  @ApiProperty({ enum: ['full'], description: 'Tells this view apart from the summary' }) view: 'full';
  @ApiProperty({ description: 'Shop labor rate in the shop currency per hour' }) laborRatePerHour: number;
  @ApiProperty() taxRatePercent: number;
  @ApiProperty() shopSuppliesPercent: number;
}

/** `GET /api/shops/current`: the full view for staff who may read rates, the summary for everyone else. */
export type CurrentShopResponseDto = ShopResponseDto | ShopSummaryResponseDto;
