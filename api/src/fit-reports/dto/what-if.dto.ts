import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsObject, IsOptional, ValidateNested } from 'class-validator';
import { CompiledValidation } from '../../common/validation/compiled-body-validator';
import { FitSettingsOverridesDto } from './fit-settings-overrides.dto';
import { FitSpecDto } from './fit-spec.dto';

/** Checked by the compiled schema first (a full spec has hundreds of fields): see compiled-body-validator.ts. */
@CompiledValidation()
export class WhatIfDto {
  @ApiProperty({ type: FitSpecDto, description: 'A complete FitSpec (see docs/fit-spec.md for every field and the frames)' })
  @IsObject({ message: 'spec must be an object' })
  @ValidateNested()
  @Type(() => FitSpecDto)
  spec: FitSpecDto;

  @ApiPropertyOptional({ type: FitSettingsOverridesDto, description: "Thresholds for this run; absent ones use the shop's, then the defaults" })
  @IsOptional()
  @IsObject({ message: 'settings must be an object' })
  @ValidateNested()
  @Type(() => FitSettingsOverridesDto)
  settings?: FitSettingsOverridesDto;
}

export class UpdateFitSettingsDto {
  @ApiProperty({ type: FitSettingsOverridesDto, description: 'Replaces the shop’s overrides; an empty object returns to the defaults' })
  @IsObject({ message: 'overrides must be an object' })
  @ValidateNested()
  @Type(() => FitSettingsOverridesDto)
  overrides: FitSettingsOverridesDto;
}

