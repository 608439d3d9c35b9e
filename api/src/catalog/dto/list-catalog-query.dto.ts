import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsIn, IsInt, IsOptional, IsString, Max, MaxLength, Min } from 'class-validator';
import { PageQueryDto } from '../../common/pagination/page-query.dto';
import { PICKUP_MOUNTS, SUMP_POSITIONS } from '@swapwright/shared';
import { BELT_RIBS } from './part-spec.dto';

export const CATALOG_SORT_FIELDS = ['name', 'createdAt', 'updatedAt'] as const;
export type CatalogSortField = (typeof CATALOG_SORT_FIELDS)[number];

/** Every filter of every kind; the service refuses a filter the kind does not have. */
export const CATALOG_FILTERS = [
  'railPattern',
  'sumpPosition',
  'pickupMount',
  'pumpInlet',
  'bellPattern',
  'enginePattern',
  'transmissionPattern',
  'ribs',
] as const;
export type CatalogFilter = (typeof CATALOG_FILTERS)[number];

export class ListCatalogQueryDto extends PageQueryDto {
  @ApiPropertyOptional({ enum: CATALOG_SORT_FIELDS, default: 'name' })
  @IsOptional()
  @IsIn(CATALOG_SORT_FIELDS, { message: `sort must be one of: ${CATALOG_SORT_FIELDS.join(', ')}` })
  sort?: CatalogSortField;

  @ApiPropertyOptional({ description: 'engines, oil pans' })
  @IsOptional()
  @IsString()
  @MaxLength(40)
  railPattern?: string;

  @ApiPropertyOptional({ enum: SUMP_POSITIONS, description: 'oil pans, oil pickups' })
  @IsOptional()
  @IsIn(SUMP_POSITIONS, { message: `sumpPosition must be one of: ${SUMP_POSITIONS.join(', ')}` })
  sumpPosition?: (typeof SUMP_POSITIONS)[number];

  @ApiPropertyOptional({ enum: PICKUP_MOUNTS, description: 'oil pans, oil pickups' })
  @IsOptional()
  @IsIn(PICKUP_MOUNTS, { message: `pickupMount must be one of: ${PICKUP_MOUNTS.join(', ')}` })
  pickupMount?: (typeof PICKUP_MOUNTS)[number];

  @ApiPropertyOptional({ description: 'oil pickups, oil pumps' })
  @IsOptional()
  @IsString()
  @MaxLength(40)
  pumpInlet?: string;

  @ApiPropertyOptional({ description: 'engines, transmissions' })
  @IsOptional()
  @IsString()
  @MaxLength(40)
  bellPattern?: string;

  @ApiPropertyOptional({ description: 'bellhousing adapters' })
  @IsOptional()
  @IsString()
  @MaxLength(40)
  enginePattern?: string;

  @ApiPropertyOptional({ description: 'bellhousing adapters' })
  @IsOptional()
  @IsString()
  @MaxLength(40)
  transmissionPattern?: string;

  @ApiPropertyOptional({ type: 'integer', minimum: BELT_RIBS.min, maximum: BELT_RIBS.max, description: 'belts' })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(BELT_RIBS.min)
  @Max(BELT_RIBS.max)
  ribs?: number;
}
