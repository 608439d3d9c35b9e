import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { PlacementDto } from '../../catalog/dto/part-spec.dto';
import { PLACEMENT_SOURCES, PlacementSource } from '../fit-report-record.entity';
import { FitSpecDto } from './fit-spec.dto';

const STATUSES = ['ok', 'tight', 'fails', 'unknown'];

export class FindingResponseDto {
  @ApiProperty({ example: 'envelope.sump-crossmember' }) checkId: string;
  @ApiProperty({ example: 'envelope' }) group: string;
  @ApiProperty() title: string;
  @ApiProperty({ enum: STATUSES }) status: string;
  @ApiProperty({ type: Number, nullable: true }) measured: number | null;
  @ApiProperty({ type: Number, nullable: true }) required: number | null;
  @ApiProperty({ type: Number, nullable: true, description: 'Positive is inside the limit; negative fails' }) margin: number | null;
  @ApiProperty({ enum: ['min', 'max', 'match'] }) limit: string;
  @ApiProperty({ example: 'mm' }) unit: string;
  @ApiProperty() message: string;
  @ApiProperty({ type: [String] }) missing: string[];
  @ApiProperty({ type: 'array', items: { type: 'object' }, description: 'Part, placement or fabrication remedies' }) remedies: object[];
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
  @ApiProperty({ type: 'object', additionalProperties: true, description: 'The thresholds used (defaults plus overrides)' })
  settings: object;
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
  @ApiProperty({ enum: STATUSES }) worstStatus: string;
  @ApiProperty() caution: string;
  @ApiProperty() createdAt: string;
}

export class FitReportInputsResponseDto {
  @ApiProperty({ type: FitSpecDto }) spec: FitSpecDto;
  @ApiProperty({ type: 'object', additionalProperties: true }) settingsOverrides: object;
  @ApiProperty({ enum: PLACEMENT_SOURCES }) placementSource: PlacementSource;
  @ApiProperty({ type: [String], description: 'What the API filled in or left out when building the spec' }) notes: string[];
}

export class FitReportResponseDto extends FitReportSummaryResponseDto {
  @ApiProperty({ type: FitReportResultDto }) report: FitReportResultDto;
  @ApiProperty({ type: FitReportInputsResponseDto }) inputs: FitReportInputsResponseDto;
}

export class FitReportPageResponseDto {
  @ApiProperty({ type: [FitReportSummaryResponseDto] }) items: FitReportSummaryResponseDto[];
  @ApiProperty() total: number;
  @ApiProperty() page: number;
  @ApiProperty() pageSize: number;
}

export class FindingDeltaSideDto {
  @ApiProperty({ enum: STATUSES }) status: string;
  @ApiProperty({ type: Number, nullable: true }) measured: number | null;
  @ApiProperty({ type: Number, nullable: true }) margin: number | null;
}

export class FindingDeltaDto {
  @ApiProperty() checkId: string;
  @ApiProperty() title: string;
  @ApiProperty({ type: FindingDeltaSideDto, nullable: true }) before: FindingDeltaSideDto | null;
  @ApiProperty({ type: FindingDeltaSideDto, nullable: true }) after: FindingDeltaSideDto | null;
  @ApiProperty({ enum: ['improved', 'worse', 'same', 'added', 'removed'] }) change: string;
  @ApiProperty() statusChanged: boolean;
  @ApiProperty({ type: Number, nullable: true, description: 'b.margin − a.margin' }) marginDelta: number | null;
}

export class FitReportComparisonResponseDto {
  @ApiProperty({ type: FitReportSummaryResponseDto }) a: FitReportSummaryResponseDto;
  @ApiProperty({ type: FitReportSummaryResponseDto }) b: FitReportSummaryResponseDto;
  @ApiProperty({ type: [FindingDeltaDto], description: 'Per check, b relative to a' }) changes: FindingDeltaDto[];
}

export class FitSettingsResponseDto {
  @ApiProperty({ type: 'object', additionalProperties: true, description: "The shop's own thresholds" }) overrides: object;
  @ApiProperty({ type: 'object', additionalProperties: true, description: 'Defaults plus the overrides: what a run uses' }) effective: object;
  @ApiProperty({ type: String, nullable: true }) updatedAt: string | null;
}
