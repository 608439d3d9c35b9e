import { ApiProperty, ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
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
  ValidateNested,
} from 'class-validator';
import { PROJECT_STATUSES, PROJECT_USES, ProjectStatus, ProjectUse } from '../project.entity';
import { Trim } from '../../common/decorators/trim.decorator';

export class ProjectGoalsDto {
  @ApiProperty({ enum: PROJECT_USES })
  @IsIn(PROJECT_USES, { message: `goals.use must be one of: ${PROJECT_USES.join(', ')}` })
  use: ProjectUse;

  @ApiPropertyOptional({ type: Number, nullable: true, minimum: 1, maximum: 2000, description: 'kW, one decimal' })
  @IsOptional()
  @IsNumber({ maxDecimalPlaces: 1 }, { message: 'goals.targetPowerKw must be a number with at most one decimal' })
  @Min(1)
  @Max(2000)
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
  @Max(100_000_000_00)
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

export class CreateProjectDto extends CatalogRefs {
  @ApiProperty({ format: 'uuid' })
  @IsUUID('all', { message: 'customerId must be a UUID' })
  customerId: string;

  @ApiProperty({ maxLength: 160 })
  @Trim()
  @IsString()
  @IsNotEmpty({ message: 'title must not be empty' })
  @MaxLength(160)
  title: string;

  @ApiPropertyOptional({ enum: PROJECT_STATUSES, default: 'intake' })
  @IsOptional()
  @IsIn(PROJECT_STATUSES, { message: `status must be one of: ${PROJECT_STATUSES.join(', ')}` })
  status?: ProjectStatus;

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
