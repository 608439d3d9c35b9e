import { ApiPropertyOptional } from '@nestjs/swagger';
import { DEFAULT_FIT_SETTINGS, type FitSettings } from '@swapwright/shared';
import { Type } from 'class-transformer';
import { ArrayMaxSize, ArrayMinSize, IsArray, IsNumber, IsOptional, Max, Min, ValidateNested } from 'class-validator';
import { NumberIn } from '../../catalog/dto/spec-validators';

export class UJointAngleRowDto {
  @NumberIn(100, 10000) rpm: number;
  @NumberIn(0.1, 30) maxDeg: number;
}

/** Bounds that differ from the general "0 to 1,000" of a numeric threshold. */
const RANGES: Partial<Record<keyof FitSettings, [number, number]>> = {
  defaultTiltDeg: [-20, 20],
  criticalSpeedFraction: [0.1, 1],
  injectorMaxDuty: [0.1, 1],
  fuelPumpMargin: [0, 2],
  heatToCoolantFraction: [0.1, 3],
  coolingMargin: [0, 2],
  fuelTightBandFraction: [0, 1],
  coolingTightBandFraction: [0, 1],
  fuelSpecificGravity: [0.5, 1.2],
  stockOilPumpLimitRpm: [1000, 15000],
  oilPumpTightBandRpm: [0, 5000],
  shaftSpeedTightBandRpm: [0, 5000],
};
const DEFAULT_RANGE: [number, number] = [0, 1000];

/**
 * Any subset of the fit engine's thresholds (shared FitSettings); the rest keep their defaults.
 * The numeric fields are declared from DEFAULT_FIT_SETTINGS, so a threshold the engine adds is accepted
 * here without a change.
 */
export class FitSettingsOverridesDto implements Partial<FitSettings> {
  @ApiPropertyOptional({ type: [UJointAngleRowDto], description: 'Maximum U-joint angle by driveshaft speed' })
  @IsOptional()
  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(40)
  @ValidateNested({ each: true })
  @Type(() => UJointAngleRowDto)
  uJointMaxAngleBySpeed?: UJointAngleRowDto[];
}

for (const [key, fallback] of Object.entries(DEFAULT_FIT_SETTINGS)) {
  if (typeof fallback !== 'number') continue;
  const [min, max] = RANGES[key as keyof FitSettings] ?? DEFAULT_RANGE;
  const target = FitSettingsOverridesDto.prototype;
  ApiPropertyOptional({ type: Number, minimum: min, maximum: max, default: fallback })(target, key);
  IsOptional()(target, key);
  IsNumber({ allowNaN: false, allowInfinity: false })(target, key);
  Min(min)(target, key);
  Max(max)(target, key);
}
