import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  IsArray,
  IsBoolean,
  IsIn,
  IsInt,
  IsNumber,
  IsOptional,
  IsString,
  Matches,
  Max,
  MaxLength,
  Min,
  MinLength,
  ValidateNested,
} from 'class-validator';
import { DEVIATION_LIMIT_BOUNDS, MEASUREMENT_POINT_KINDS, type MeasurementPointKind } from '@swapwright/shared';

export const ENTRY_UNITS = ['mm', 'in'] as const;

export class SetMeasurementValueDto {
  @ApiProperty({ description: 'What the tape says: `12 1/2"`, `12.5 in`, `317.5 mm`, or a bare number in `unit`; degrees for an angle.', example: '12 1/2"' })
  @IsString()
  @MinLength(1)
  @MaxLength(40)
  value: string;

  @ApiPropertyOptional({ enum: ENTRY_UNITS, description: 'Unit of a bare number (default mm).' })
  @IsOptional()
  @IsIn(ENTRY_UNITS)
  unit?: (typeof ENTRY_UNITS)[number];

  @ApiPropertyOptional({ description: 'Plus or minus, same units as the value (e.g. `1/8"`).' })
  @IsOptional()
  @IsString()
  @MaxLength(40)
  tolerance?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString()
  @MaxLength(500)
  note?: string;

  @ApiPropertyOptional({ description: 'Required once the sheet is signed off.' })
  @IsOptional()
  @IsString()
  @MinLength(3)
  @MaxLength(500)
  reason?: string;

  @ApiPropertyOptional({
    description:
      "The `version` of the point's reading the person typed over (0 when the point showed no reading). When someone saved " +
      'another reading since, the save is refused with 409 `measurement_reading_changed` and nothing changes; to save over ' +
      "theirs, send again with their reading's version. Leave it out only to replace whatever reading is there.",
    minimum: 0,
    example: 0,
  })
  @IsOptional()
  @IsInt({ message: 'seenVersion must be a whole number (the version of the reading you saw, 0 for none)' })
  @Min(0, { message: 'seenVersion must be 0 or more' })
  @Max(2_000_000_000, { message: 'seenVersion must be at most 2000000000' })
  seenVersion?: number;
}

export class MeasurementPointDto {
  @ApiProperty() @IsString() @Matches(/^[\w.@-]{1,80}$/) id: string;
  @ApiProperty({ enum: MEASUREMENT_POINT_KINDS }) @IsIn(MEASUREMENT_POINT_KINDS) kind: MeasurementPointKind;
  @ApiProperty() @IsString() @MinLength(1) @MaxLength(160) label: string;
  @ApiProperty() @IsString() @MaxLength(1000) howTo: string;
  @ApiPropertyOptional() @IsOptional() @IsString() @MaxLength(80) target?: string;
  @ApiPropertyOptional() @IsOptional() @IsNumber() @Min(-10000) @Max(10000) atX?: number;
  @ApiProperty({ type: Number, nullable: true }) @IsOptional() @IsNumber() @Min(-10000) @Max(10000) catalogValue: number | null;
  @ApiProperty() @IsBoolean() required: boolean;
}

export class PutMeasurementTemplateDto {
  @ApiProperty({ type: [MeasurementPointDto] })
  @IsArray()
  @ArrayMaxSize(200)
  @ValidateNested({ each: true })
  @Type(() => MeasurementPointDto)
  points: MeasurementPointDto[];
}

export class UploadPhotosDto {
  @ApiPropertyOptional({ description: 'The point the photos show.' })
  @IsOptional()
  @IsString()
  @Matches(/^[\w.@-]{1,80}$/)
  pointId?: string;

  @ApiPropertyOptional({ description: "A customer's photo this one replaces (fabricator or owner)." })
  @IsOptional()
  @IsString()
  @Matches(/^[0-9a-fA-F-]{36}$/)
  replacesPhotoId?: string;
}

export class MeasurementSettingsDto {
  @ApiProperty({
    description: 'Flag a measured length further than this from the catalog (mm).',
    minimum: DEVIATION_LIMIT_BOUNDS.lengthMm.min,
    maximum: DEVIATION_LIMIT_BOUNDS.lengthMm.max,
  })
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'deviationLimitMm must be a number of millimetres' })
  @Min(DEVIATION_LIMIT_BOUNDS.lengthMm.min, { message: `deviationLimitMm must be at least ${DEVIATION_LIMIT_BOUNDS.lengthMm.min} mm` })
  @Max(DEVIATION_LIMIT_BOUNDS.lengthMm.max, { message: `deviationLimitMm must be at most ${DEVIATION_LIMIT_BOUNDS.lengthMm.max} mm` })
  deviationLimitMm: number;

  @ApiProperty({
    description: 'Flag a measured angle further than this from the catalog (degrees).',
    minimum: DEVIATION_LIMIT_BOUNDS.angleDeg.min,
    maximum: DEVIATION_LIMIT_BOUNDS.angleDeg.max,
  })
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'deviationLimitDeg must be a number of degrees' })
  @Min(DEVIATION_LIMIT_BOUNDS.angleDeg.min, { message: `deviationLimitDeg must be at least ${DEVIATION_LIMIT_BOUNDS.angleDeg.min}°` })
  @Max(DEVIATION_LIMIT_BOUNDS.angleDeg.max, { message: `deviationLimitDeg must be at most ${DEVIATION_LIMIT_BOUNDS.angleDeg.max}°` })
  deviationLimitDeg: number;
}
