import { ApiProperty, ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  IsArray,
  IsIn,
  IsInt,
  IsNotEmpty,
  IsNumber,
  IsOptional,
  IsString,
  Matches,
  Max,
  MaxLength,
  Min,
  ValidateNested,
} from 'class-validator';
import { TORQUE_JOINT_PATTERN } from '@swapwright/shared';
import { IsOptionalDefined } from '../../common/decorators/optional-defined.decorator';
import { Trim } from '../../common/decorators/trim.decorator';
import { WORK_HAZARDS, WorkHazard } from '../labor-operation.entity';

export class TorqueSpecDto {
  @ApiPropertyOptional({ type: String, nullable: true, maxLength: 60, example: 'oil-pump-to-main-cap', description: "The stable name of the joint it tightens (lower-case words joined by hyphens, e.g. oil-pan-to-block): a work order gives each joint one figure, a part's own before an operation's." })
  @IsOptional()
  @IsString()
  @MaxLength(60)
  @Matches(TORQUE_JOINT_PATTERN, { message: 'joint must be lower-case words joined by hyphens, e.g. oil-pan-to-block' })
  joint?: string | null;

  @ApiProperty({ example: 'Oil pump to main cap' })
  @Trim()
  @IsString()
  @IsNotEmpty()
  @MaxLength(120)
  fastener: string;

  @ApiProperty({ example: 18, description: 'lbf·ft' })
  @IsNumber({ maxDecimalPlaces: 1 })
  @Min(0.1)
  @Max(2000)
  lbfFt: number;

  @ApiPropertyOptional({ type: String, nullable: true })
  @IsOptional()
  @IsString()
  @MaxLength(300)
  sequence: string | null;
}

export class CheckTemplateDto {
  @ApiProperty({ example: 'cam-turns' })
  @IsString()
  @Matches(/^[a-z0-9-]{1,40}$/, { message: 'key must be 1 to 40 lower-case letters, digits or dashes' })
  key: string;

  @ApiProperty({ example: 'Camshaft turns by hand after the bearings go in' })
  @Trim()
  @IsString()
  @IsNotEmpty()
  @MaxLength(200)
  label: string;

  @ApiPropertyOptional({ type: String, nullable: true, example: 'mm' })
  @IsOptional()
  @IsString()
  @MaxLength(16)
  unit: string | null;

  @ApiPropertyOptional({ type: Number, nullable: true })
  @IsOptional()
  @IsNumber()
  min: number | null;

  @ApiPropertyOptional({ type: Number, nullable: true })
  @IsOptional()
  @IsNumber()
  max: number | null;
}

export class CreateLaborOperationDto {
  @ApiProperty({ example: 'crossmember-notch' })
  @IsString()
  @Matches(/^[a-z0-9-]{2,60}$/, { message: 'code must be 2 to 60 lower-case letters, digits or dashes' })
  code: string;

  @ApiProperty({ example: 'Modify front crossmember for pan clearance' })
  @Trim()
  @IsString()
  @IsNotEmpty({ message: 'name must not be empty' })
  @MaxLength(160)
  name: string;

  @ApiProperty({ example: 3.5, description: 'Book hours, to a tenth' })
  @IsNumber({ maxDecimalPlaces: 1 }, { message: 'bookHours must be a number with at most one decimal (a tenth of an hour)' })
  @Min(0)
  @Max(999)
  bookHours: number;

  @ApiPropertyOptional({ example: 100 })
  @IsOptionalDefined()
  @IsInt()
  @Min(0)
  @Max(10000)
  buildOrder?: number;

  @ApiPropertyOptional({ type: [String] })
  @IsOptionalDefined()
  @IsArray()
  @ArrayMaxSize(20)
  @IsString({ each: true })
  @MaxLength(80, { each: true })
  matches?: string[];

  @ApiPropertyOptional({ enum: WORK_HAZARDS, isArray: true })
  @IsOptionalDefined()
  @IsArray()
  @IsIn(WORK_HAZARDS, { each: true })
  hazards?: WorkHazard[];

  @ApiPropertyOptional({ type: [TorqueSpecDto] })
  @IsOptionalDefined()
  @IsArray()
  @ArrayMaxSize(40)
  @ValidateNested({ each: true })
  @Type(() => TorqueSpecDto)
  torqueSpecs?: TorqueSpecDto[];

  @ApiPropertyOptional({ type: [CheckTemplateDto] })
  @IsOptionalDefined()
  @IsArray()
  @ArrayMaxSize(40)
  @ValidateNested({ each: true })
  @Type(() => CheckTemplateDto)
  checks?: CheckTemplateDto[];
}

export class UpdateLaborOperationDto extends PartialType(CreateLaborOperationDto) {}

export class TorqueSpecResponseDto {
  @ApiProperty({ type: String, nullable: true, description: "The stable name of the joint it tightens (lower-case words joined by hyphens, e.g. oil-pan-to-block): a work order gives each joint one figure, a part's own before an operation's." }) joint: string | null;
  @ApiProperty() fastener: string;
  @ApiProperty() lbfFt: number;
  @ApiProperty({ description: 'N·m, from lbf·ft by the exact factor 1.3558179483314004 (NIST SP 811)' }) newtonMetres: number;
  @ApiProperty({ type: String, nullable: true }) sequence: string | null;
}

export class CheckTemplateResponseDto {
  @ApiProperty() key: string;
  @ApiProperty() label: string;
  @ApiProperty({ type: String, nullable: true }) unit: string | null;
  @ApiProperty({ type: Number, nullable: true }) min: number | null;
  @ApiProperty({ type: Number, nullable: true }) max: number | null;
}

export class LaborOperationResponseDto {
  @ApiProperty() id: string;
  @ApiProperty() code: string;
  @ApiProperty() name: string;
  @ApiProperty() bookHours: number;
  @ApiProperty() buildOrder: number;
  @ApiProperty({ type: [String] }) matches: string[];
  @ApiProperty({ enum: WORK_HAZARDS, isArray: true }) hazards: WorkHazard[];
  @ApiProperty({ type: [TorqueSpecResponseDto] }) torqueSpecs: TorqueSpecResponseDto[];
  @ApiProperty({ type: [CheckTemplateResponseDto] }) checks: CheckTemplateResponseDto[];
  @ApiProperty() updatedAt: string;
}
