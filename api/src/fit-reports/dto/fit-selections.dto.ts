import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsNotEmpty, IsNumber, IsOptional, IsString, IsUUID, Max, MaxLength, Min, ValidateNested } from 'class-validator';
import { withArticle } from '../../common/text/article';
import { DRIVESHAFT_MATERIALS } from '@swapwright/shared';
import { DriveshaftSpecDto } from './fit-spec.dto';

function OptionalCatalogId(kind: string) {
  return (target: object, key: string) => {
    ApiPropertyOptional({ type: String, format: 'uuid', nullable: true, description: `${withArticle(kind, true)} of the shop's catalog` })(target, key);
    IsOptional()(target, key);
    IsUUID('all', { message: `${key} must be a UUID` })(target, key);
  };
}

function OptionalFigure(min: number, max: number, description?: string) {
  return (target: object, key: string) => {
    ApiPropertyOptional({ type: Number, nullable: true, minimum: min, maximum: max, description })(target, key);
    IsOptional()(target, key);
    IsNumber({ allowNaN: false, allowInfinity: false })(target, key);
    Min(min)(target, key);
    Max(max)(target, key);
  };
}

/** PUT replaces the whole selection: a field left out is cleared. */
export class UpdateFitSelectionsDto {
  @OptionalCatalogId('oil pan') oilPanId?: string | null;
  @OptionalCatalogId('oil pickup') oilPickupId?: string | null;
  @OptionalCatalogId('oil pump') oilPumpId?: string | null;
  @OptionalCatalogId('engine controller') controllerId?: string | null;
  @OptionalCatalogId('mount adapter') mountAdapterId?: string | null;

  @ApiPropertyOptional({ type: String, nullable: true, maxLength: 40, description: "One of the engine's accessory drives (spec.accessoryDrives[].id)" })
  @IsOptional()
  @IsString()
  @IsNotEmpty()
  @MaxLength(40)
  accessoryDriveId?: string | null;

  @ApiPropertyOptional({ type: DriveshaftSpecDto, nullable: true })
  @IsOptional()
  @ValidateNested()
  @Type(() => DriveshaftSpecDto)
  driveshaft?: DriveshaftSpecDto | null;

  @OptionalFigure(-20, 20, 'Degrees the cam is set advanced at the timing set (0 = marks aligned)') timingSetAdvanceDeg?: number | null;
  @OptionalFigure(10, 400, 'Planned top speed, for the driveshaft critical-speed check') topSpeedKph?: number | null;
  @OptionalFigure(300, 1600) tireDiameterMm?: number | null;
  @OptionalFigure(1, 8) axleRatio?: number | null;
  @OptionalFigure(1, 2000, 'Power held for long periods (towing); sizes the radiator') continuousPowerKw?: number | null;
}

/**
 * PATCH changes only the fields given: a field left out keeps its stored value, `null` clears it. `driveshaft`
 * is one field: given, it replaces the whole shaft.
 */
export class PatchFitSelectionsDto extends UpdateFitSelectionsDto {}

export class DriveshaftResponseDto {
  @ApiProperty() outerDiameterMm: number;
  @ApiProperty() wallMm: number;
  @ApiProperty({ enum: DRIVESHAFT_MATERIALS }) material: (typeof DRIVESHAFT_MATERIALS)[number];
  @ApiPropertyOptional() lengthMm?: number;
  @ApiPropertyOptional() suspensionGrowthMm?: number;
}

export class FitSelectionsResponseDto {
  @ApiProperty({ format: 'uuid' }) projectId: string;
  @ApiProperty({ type: String, nullable: true }) oilPanId: string | null;
  @ApiProperty({ type: String, nullable: true }) oilPickupId: string | null;
  @ApiProperty({ type: String, nullable: true }) oilPumpId: string | null;
  @ApiProperty({ type: String, nullable: true }) controllerId: string | null;
  @ApiProperty({ type: String, nullable: true }) accessoryDriveId: string | null;
  @ApiProperty({ type: String, nullable: true, description: 'The mount adapter used on both engine mounts' }) mountAdapterId: string | null;
  @ApiProperty({ type: DriveshaftResponseDto, nullable: true }) driveshaft: DriveshaftResponseDto | null;
  @ApiProperty({ type: Number, nullable: true }) timingSetAdvanceDeg: number | null;
  @ApiProperty({ type: Number, nullable: true }) topSpeedKph: number | null;
  @ApiProperty({ type: Number, nullable: true }) tireDiameterMm: number | null;
  @ApiProperty({ type: Number, nullable: true }) axleRatio: number | null;
  @ApiProperty({ type: Number, nullable: true }) continuousPowerKw: number | null;
  @ApiProperty({ type: String, nullable: true, description: 'Null until the selections are first saved' }) updatedAt: string | null;
}
