import { ApiExtraModels, ApiProperty, ApiPropertyOptional, getSchemaPath } from '@nestjs/swagger';
import {
  CHECK_GROUPS,
  CHECK_STATUSES,
  DEFAULT_FIT_SETTINGS,
  FIGURE_UNITS,
  PLACEMENT_AXES,
  type CheckGroup,
  type CheckStatus,
  type FigureUnit,
  type FitSettings,
  type PlacementAxis,
} from '@swapwright/shared';
import { PlacementDto } from '../../catalog/dto/part-spec.dto';
import { PLACEMENT_SOURCES, PlacementSource } from '../fit-report-record.entity';
import { FitSettingsOverridesDto, UJointAngleRowDto } from './fit-settings-overrides.dto';
import { FitSpecDto } from './fit-spec.dto';

export class PartRemedyResponseDto {
  @ApiProperty({ enum: ['part'] }) kind: 'part';
  @ApiProperty({ example: 'oil-pan' }) category: string;
  @ApiProperty({
    type: 'object',
    additionalProperties: { oneOf: [{ type: 'string' }, { type: 'number' }, { type: 'boolean' }] },
    description: 'The attributes the part must have, e.g. { sumpPosition: "rear" }',
  })
  requires: Record<string, string | number | boolean>;
  @ApiProperty({ type: [String], description: 'Catalog ids known to satisfy the requirement, best first' }) partIds: string[];
  @ApiProperty() note: string;
}

export class PlacementRemedyResponseDto {
  @ApiProperty({ enum: ['placement'] }) kind: 'placement';
  @ApiProperty({ enum: PLACEMENT_AXES }) axis: PlacementAxis;
  @ApiProperty({ description: 'setback: rearward (+); height: up (+); tilt: front up (+)' }) changeBy: number;
  @ApiProperty({ enum: ['mm', 'deg'] }) unit: 'mm' | 'deg';
  @ApiProperty() note: string;
}

export class FabricationRemedyResponseDto {
  @ApiProperty({ enum: ['fabrication'] }) kind: 'fabrication';
  @ApiProperty() operation: string;
  @ApiProperty() laborHours: number;
  @ApiProperty() note: string;
}

/** Every threshold of a fit run (shared FitSettings): the defaults with the shop's and the request's overrides. */
// The interface gives the class FitSettings' fields; the loop below documents each of them.
export interface FitSettingsValuesResponseDto extends FitSettings {}
export class FitSettingsValuesResponseDto {}
// Declared from DEFAULT_FIT_SETTINGS, so a threshold the engine adds is documented without a change here.
for (const [key, fallback] of Object.entries(DEFAULT_FIT_SETTINGS)) {
  const target = FitSettingsValuesResponseDto.prototype;
  if (typeof fallback === 'number') ApiProperty({ type: Number, example: fallback })(target, key);
  else if (key === 'uJointMaxAngleBySpeed') {
    ApiProperty({ type: [UJointAngleRowDto], description: 'Maximum U-joint angle by driveshaft speed' })(target, key);
  } else {
    throw new Error(`FitSettingsValuesResponseDto does not document the setting ${key}: add it here`);
  }
}

@ApiExtraModels(PartRemedyResponseDto, PlacementRemedyResponseDto, FabricationRemedyResponseDto)
export class FindingResponseDto {
  @ApiProperty({ example: 'envelope.sump-crossmember' }) checkId: string;
  @ApiProperty({ enum: CHECK_GROUPS }) group: CheckGroup;
  @ApiProperty() title: string;
  @ApiProperty({ enum: CHECK_STATUSES }) status: CheckStatus;
  @ApiProperty({ type: Number, nullable: true }) measured: number | null;
  @ApiProperty({ type: Number, nullable: true }) required: number | null;
  @ApiProperty({ type: Number, nullable: true, description: 'Positive is inside the limit; negative fails' }) margin: number | null;
  @ApiProperty({ enum: ['min', 'max', 'match'] }) limit: string;
  @ApiProperty({ enum: FIGURE_UNITS, description: 'The unit of measured, required and margin' }) unit: FigureUnit;
  @ApiProperty() message: string;
  @ApiProperty({ type: [String] }) missing: string[];
  @ApiProperty({
    type: 'array',
    items: {
      oneOf: [
        { $ref: getSchemaPath(PartRemedyResponseDto) },
        { $ref: getSchemaPath(PlacementRemedyResponseDto) },
        { $ref: getSchemaPath(FabricationRemedyResponseDto) },
      ],
      discriminator: { propertyName: 'kind' },
    },
    description: 'Part, placement or fabrication remedies',
  })
  remedies: Array<PartRemedyResponseDto | PlacementRemedyResponseDto | FabricationRemedyResponseDto>;
  @ApiProperty() thresholdSource: string;
  @ApiPropertyOptional() against?: string;
}

export class FitReportCountsDto {
  @ApiProperty() total: number;
  @ApiProperty() ok: number;
  @ApiProperty() tight: number;
  @ApiProperty() fails: number;
  @ApiProperty() unknown: number;
}

/** The fit engine's report, exactly as it computed it. */
export class FitReportResultDto {
  @ApiProperty() engineVersion: string;
  @ApiProperty({ type: PlacementDto }) placement: PlacementDto;
  @ApiProperty({ type: FitSettingsValuesResponseDto, description: 'The thresholds used (defaults plus overrides)' })
  settings: FitSettingsValuesResponseDto;
  @ApiProperty({ type: [FindingResponseDto] }) findings: FindingResponseDto[];
  @ApiProperty({ type: [FindingResponseDto], description: 'Every tight or failing check, worst first' }) shortfalls: FindingResponseDto[];
  @ApiProperty({ type: FitReportCountsDto }) summary: FitReportCountsDto;
  @ApiProperty({ description: 'Planning-aid caution carried by every report' }) caution: string;
  @ApiProperty({ type: [String] }) safety: string[];
}


export class FitReportSummaryResponseDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ format: 'uuid' }) projectId: string;
  @ApiProperty({ type: String, nullable: true }) createdById: string | null;
  @ApiProperty({ type: String, nullable: true, description: 'Name of the user who ran the check; null once that user is gone' })
  createdByName: string | null;
  @ApiProperty() engineVersion: string;
  @ApiProperty({ type: PlacementDto }) placement: PlacementDto;
  @ApiProperty({ enum: PLACEMENT_SOURCES, description: "project: the project's own; proposed: the fit engine's best; chassis-default: where the stock engine sat" })
  placementSource: PlacementSource;
  @ApiProperty({ type: FitReportCountsDto }) counts: FitReportCountsDto;
  @ApiProperty({ enum: CHECK_STATUSES }) worstStatus: CheckStatus;
  @ApiProperty() caution: string;
  @ApiProperty() createdAt: string;
}

export class ChassisInputSourceDto {
  @ApiProperty({ enum: ['sheet', 'catalog'] }) kind: 'sheet' | 'catalog';
  @ApiPropertyOptional() measuredBy?: string;
  @ApiPropertyOptional() measuredAt?: string;
}

export class ChassisInputDto {
  @ApiProperty() pointId: string;
  @ApiProperty() label: string;
  @ApiProperty() field: string;
  @ApiProperty({ enum: ['mm', 'deg'] }) unit: 'mm' | 'deg';
  @ApiProperty({ type: Number, nullable: true }) catalogValue: number | null;
  @ApiProperty({ type: Number, nullable: true }) measuredValue: number | null;
  @ApiProperty({ type: Number, nullable: true }) deviation: number | null;
  @ApiProperty() flagged: boolean;
  @ApiProperty({ type: ChassisInputSourceDto }) source: ChassisInputSourceDto;
  @ApiProperty({ type: [String], description: 'Fit checks that read this input.' }) checks: string[];
}

export class FitReportInputsResponseDto {
  @ApiPropertyOptional({ type: [ChassisInputDto], description: 'Chassis inputs governed by measurement points and their source.' })
  chassisInputs?: ChassisInputDto[];
  @ApiProperty({ type: FitSpecDto }) spec: FitSpecDto;
  @ApiProperty({ type: FitSettingsOverridesDto }) settingsOverrides: FitSettingsOverridesDto;
  @ApiProperty({ enum: PLACEMENT_SOURCES }) placementSource: PlacementSource;
  @ApiProperty({ type: [String], description: 'What the API filled in or left out when building the spec' }) notes: string[];
}

export class FitReportResponseDto extends FitReportSummaryResponseDto {
  @ApiProperty({ type: FitReportResultDto }) report: FitReportResultDto;
  @ApiProperty({ type: FitReportInputsResponseDto }) inputs: FitReportInputsResponseDto;
}


export class FindingDeltaSideDto {
  @ApiProperty({ enum: CHECK_STATUSES }) status: CheckStatus;
  @ApiProperty({ type: Number, nullable: true }) measured: number | null;
  @ApiProperty({ type: Number, nullable: true }) margin: number | null;
}

export class FindingDeltaDto {
  @ApiProperty() checkId: string;
  @ApiProperty() title: string;
  @ApiProperty({
    enum: FIGURE_UNITS,
    description: "The unit of this check's figures (measured, margin, marginDelta), as its findings carry it: deg for an angle, psi for a pressure, mm for a length",
  })
  unit: FigureUnit;
  @ApiProperty({ type: FindingDeltaSideDto, nullable: true }) before: FindingDeltaSideDto | null;
  @ApiProperty({ type: FindingDeltaSideDto, nullable: true }) after: FindingDeltaSideDto | null;
  @ApiProperty({ enum: ['improved', 'worse', 'same', 'added', 'removed'] }) change: string;
  @ApiProperty() statusChanged: boolean;
  @ApiProperty({ type: Number, nullable: true, description: "b.margin − a.margin in unit; null unless both are known figures against a minimum or maximum in the same unit (a must-match rule's margin is a flag)" }) marginDelta: number | null;
}

export class FitReportComparisonResponseDto {
  @ApiProperty({ type: FitReportSummaryResponseDto }) a: FitReportSummaryResponseDto;
  @ApiProperty({ type: FitReportSummaryResponseDto }) b: FitReportSummaryResponseDto;
  @ApiProperty({ type: [FindingDeltaDto], description: 'Per check, b relative to a' }) changes: FindingDeltaDto[];
}

export class FitSettingsResponseDto {
  @ApiProperty({ type: FitSettingsOverridesDto, description: "The shop's own thresholds" }) overrides: FitSettingsOverridesDto;
  @ApiProperty({ type: FitSettingsValuesResponseDto, description: 'Defaults plus the overrides: what a run uses' })
  effective: FitSettingsValuesResponseDto;
  @ApiProperty({ type: String, nullable: true }) updatedAt: string | null;
}
