import { ApiHideProperty, ApiProperty, ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  Equals,
  IsBoolean,
  IsIn,
  IsInt,
  IsNotEmpty,
  IsNumber,
  IsOptional,
  IsString,
  IsUUID,
  Max,
  MaxLength,
  Min,
  ValidateIf,
  ValidateNested,
} from 'class-validator';
import { PROJECT_STATUSES, PROJECT_USES, ProjectUse } from '../project.entity';
import { Trim } from '../../common/decorators/trim.decorator';

/**
 * Targets of an engine swap in kW: 10 kW (about 13 hp) is below any road engine, 2000 kW (about 2,680 hp) above any
 * the shop fits. Source for the hp figures: NIST SP 811 (2008), Appendix B.9, 1 hp (550 ft·lbf/s) = 745.6999 W.
 */
export const STATUS_BY_EVENTS_MESSAGE =
  `status is not set by hand: the job's stage (${PROJECT_STATUSES.join(', ')}) moves by itself when the sheet is signed off, ` +
  'a fit report is run, a parts plan is saved, a quote is sent or answered, the deposit is paid and the work order is started or finished';

const TARGET_POWER_KW = { min: 10, max: 2000 } as const;
const TARGET_POWER_MESSAGE = `goals.targetPowerKw must be between ${TARGET_POWER_KW.min} and ${TARGET_POWER_KW.max} kW (about 13 to 2,680 hp); send power in kW as a number`;
/** 100 million in the shop's currency, in cents: a larger budget is a typing slip. Common practice (no published source). */
const MAX_BUDGET_CENTS = 100_000_000_00;

export class ProjectGoalsDto {
  @ApiProperty({ enum: PROJECT_USES })
  @IsIn(PROJECT_USES, { message: `goals.use must be one of: ${PROJECT_USES.join(', ')}` })
  use: ProjectUse;

  @ApiPropertyOptional({ type: Number, nullable: true, minimum: TARGET_POWER_KW.min, maximum: TARGET_POWER_KW.max, description: 'kW, one decimal' })
  @IsOptional()
  @IsNumber({ maxDecimalPlaces: 1 }, { message: 'goals.targetPowerKw must be a number with at most one decimal' })
  @Min(TARGET_POWER_KW.min, { message: TARGET_POWER_MESSAGE })
  @Max(TARGET_POWER_KW.max, { message: TARGET_POWER_MESSAGE })
  targetPowerKw?: number | null;

  @ApiPropertyOptional({ type: Number, nullable: true, minimum: 500, maximum: 12000 })
  @IsOptional()
  @IsInt()
  @Min(500)
  @Max(12000)
  revLimitRpm?: number | null;

  @ApiPropertyOptional({ type: Number, nullable: true, minimum: 0, description: 'Whole cents of the shop currency' })
  @IsOptional()
  @IsInt()
  @Min(0)
  @Max(MAX_BUDGET_CENTS, {
    message: `goals.budgetCents must be at most ${MAX_BUDGET_CENTS} (100,000,000.00 in the shop's currency, in cents): check the budget for extra digits`,
  })
  budgetCents?: number | null;
}

export class UpdateProjectGoalsDto extends PartialType(ProjectGoalsDto) {}

/** Engine origin in the chassis frame: x rearward of the front axle, z above ground, tilt front-up positive. */
export class ProjectPlacementDto {
  @ApiProperty({ minimum: -1500, maximum: 5000 })
  @IsNumber({ maxDecimalPlaces: 2 })
  @Min(-1500)
  @Max(5000)
  setbackMm: number;

  @ApiProperty({ minimum: 0, maximum: 2500 })
  @IsNumber({ maxDecimalPlaces: 2 })
  @Min(0)
  @Max(2500)
  heightMm: number;

  @ApiProperty({ minimum: -20, maximum: 20 })
  @IsNumber({ maxDecimalPlaces: 2 })
  @Min(-20)
  @Max(20)
  tiltDeg: number;
}

class CatalogRefs {
  @ApiPropertyOptional({ type: String, nullable: true, maxLength: 36 })
  @IsOptional()
  @IsString()
  @MaxLength(36)
  chassisModelId?: string | null;

  @ApiPropertyOptional({ type: String, nullable: true, maxLength: 36 })
  @IsOptional()
  @IsString()
  @MaxLength(36)
  engineProfileId?: string | null;

  @ApiPropertyOptional({ type: String, nullable: true, maxLength: 36 })
  @IsOptional()
  @IsString()
  @MaxLength(36)
  transmissionId?: string | null;
}

export const CUSTOMER_OR_SELF_MESSAGE =
  'send either customerId (a customer of your shop) or forMyself: true (a project for your own vehicle), exactly one of the two';

export class CreateProjectDto extends CatalogRefs {
  @ApiPropertyOptional({ format: 'uuid', description: 'The customer this swap is for; leave out when forMyself is true' })
  @IsOptional()
  @IsUUID('all', { message: 'customerId must be a UUID' })
  customerId?: string;

  @ApiPropertyOptional({
    type: Boolean,
    description:
      "True files the project under the signed-in person's own customer record in the shop (made on first use from their name and e-mail); leave out when customerId is sent",
  })
  @IsOptional()
  @IsBoolean({ message: 'forMyself must be true or false' })
  forMyself?: boolean;

  @ApiProperty({ maxLength: 160 })
  @Trim()
  @IsString()
  @IsNotEmpty({ message: 'title must not be empty' })
  @MaxLength(160)
  title: string;

  /** Not in the contract: the stage moves with the job's events; a status sent by hand is refused with that reason. */
  @ApiHideProperty()
  @ValidateIf(() => true)
  @Equals(undefined, { message: STATUS_BY_EVENTS_MESSAGE })
  status?: never;

  @ApiPropertyOptional({ maxLength: 500 })
  @IsOptional()
  @IsString()
  @MaxLength(500)
  vehicleDescription?: string;

  @ApiPropertyOptional({ type: ProjectGoalsDto, description: 'Defaults to use street with no targets' })
  @IsOptional()
  @ValidateNested()
  @Type(() => ProjectGoalsDto)
  goals?: ProjectGoalsDto;

  @ApiPropertyOptional({ type: ProjectPlacementDto, nullable: true })
  @IsOptional()
  @ValidateNested()
  @Type(() => ProjectPlacementDto)
  placement?: ProjectPlacementDto | null;
}
