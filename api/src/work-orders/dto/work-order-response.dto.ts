import { ApiProperty } from '@nestjs/swagger';
import { CHECK_RESULTS, CHECK_STATUSES, COUNTER_STATUSES, WORK_HAZARDS, WORK_ORDER_STATES, type CheckResult, type CheckStatus, type CounterStatus, type WorkHazard, type WorkOrderState } from '@swapwright/shared';

export class WorkPartResponseDto {
  @ApiProperty() sku: string;
  @ApiProperty() description: string;
  @ApiProperty() quantity: number;
}

export class WorkTorqueResponseDto {
  @ApiProperty({ type: String, nullable: true, description: "The stable name of the joint it tightens (lower-case words joined by hyphens, e.g. oil-pan-to-block): a work order gives each joint one figure, a part's own before an operation's." }) joint: string | null;
  @ApiProperty() fastener: string;
  @ApiProperty({ description: 'lbf·ft, to a tenth' }) lbfFt: number;
  @ApiProperty({ description: 'N·m, to a tenth (exact factor 1.3558179483314004, NIST SP 811)' }) newtonMetres: number;
  @ApiProperty({ type: String, nullable: true, description: 'Tightening sequence in words' }) sequence: string | null;
  @ApiProperty({ type: String, nullable: true, description: 'The part whose data gives it; null for the operation\'s own figure' }) partSku: string | null;
}

export class FitFindingRefResponseDto {
  @ApiProperty() checkId: string;
  @ApiProperty() title: string;
  @ApiProperty({ enum: CHECK_STATUSES }) status: CheckStatus;
  @ApiProperty() message: string;
  @ApiProperty({
    type: String,
    nullable: true,
    description: 'For a shortfall the locked parts plan resolves: the part or operation that resolves it (measure after fitting); null otherwise',
  })
  resolvedBy: string | null;
}

export class RecordedCheckResponseDto {
  @ApiProperty() id: string;
  @ApiProperty({ enum: CHECK_RESULTS }) result: CheckResult;
  @ApiProperty({ type: Number, nullable: true }) value: number | null;
  @ApiProperty() note: string;
  @ApiProperty() recordedByName: string;
  @ApiProperty() recordedAt: string;
}

export class WorkCheckPhotoResponseDto {
  @ApiProperty() id: string;
  @ApiProperty({ enum: ['image/jpeg', 'image/png', 'image/webp'] }) contentType: string;
  @ApiProperty() widthPx: number;
  @ApiProperty() heightPx: number;
  @ApiProperty() bytes: number;
  @ApiProperty() uploadedByName: string;
  @ApiProperty() createdAt: string;
}

export class WorkCheckResponseDto {
  @ApiProperty() key: string;
  @ApiProperty() label: string;
  @ApiProperty({ description: 'Measured (a value against a range) or confirmed (done or not)' }) measured: boolean;
  @ApiProperty({ type: String, nullable: true }) unit: string | null;
  @ApiProperty({ type: Number, nullable: true }) min: number | null;
  @ApiProperty({ type: Number, nullable: true }) max: number | null;
  @ApiProperty({ type: String, nullable: true, description: 'The allowed range in words' }) range: string | null;
  @ApiProperty({ type: String, nullable: true, description: 'The SKU whose data gives the range; null for the operation\'s default' }) rangeFrom: string | null;
  @ApiProperty({ type: FitFindingRefResponseDto, nullable: true, description: 'The fit check\'s result this check confirms' }) fitFinding: FitFindingRefResponseDto | null;
  @ApiProperty({ type: RecordedCheckResponseDto, nullable: true, description: 'The newest recording; null while open' }) latest: RecordedCheckResponseDto | null;
  @ApiProperty({ description: 'How many times it was recorded' }) recordings: number;
  @ApiProperty({ type: [WorkCheckPhotoResponseDto], description: 'Photos of the check, oldest first (file: GET /api/work-order-photos/{id}/file)' })
  photos: WorkCheckPhotoResponseDto[];
}

export class WorkStepResponseDto {
  @ApiProperty() key: string;
  @ApiProperty({ type: String, nullable: true }) operationId: string | null;
  @ApiProperty() name: string;
  @ApiProperty() buildOrder: number;
  @ApiProperty() hours: number;
  @ApiProperty({ enum: WORK_HAZARDS, isArray: true }) hazards: WorkHazard[];
  @ApiProperty({ type: [WorkPartResponseDto] }) parts: WorkPartResponseDto[];
  @ApiProperty({ type: [WorkTorqueResponseDto] }) torque: WorkTorqueResponseDto[];
  @ApiProperty({ type: [String] }) instructions: string[];
  @ApiProperty({ type: [WorkCheckResponseDto] }) checks: WorkCheckResponseDto[];
}

export class WorkCautionResponseDto {
  @ApiProperty({ enum: WORK_HAZARDS }) hazard: WorkHazard;
  @ApiProperty() caution: string;
}

export class WorkProgressResponseDto {
  @ApiProperty() total: number;
  @ApiProperty() passed: number;
  @ApiProperty() failed: number;
  @ApiProperty() open: number;
}

export class WorkOrderSummaryResponseDto {
  @ApiProperty() id: string;
  @ApiProperty({ example: 'W-0007' }) label: string;
  @ApiProperty({ enum: WORK_ORDER_STATES }) state: WorkOrderState;
  @ApiProperty() projectId: string;
  @ApiProperty() projectTitle: string;
  @ApiProperty({ type: String, nullable: true }) customerName: string | null;
  @ApiProperty() createdAt: string;
  @ApiProperty({ type: WorkProgressResponseDto }) progress: WorkProgressResponseDto;
}

export class WaitingCounterLineResponseDto {
  @ApiProperty() sku: string;
  @ApiProperty() description: string;
  @ApiProperty() quantity: number;
  @ApiProperty({ enum: COUNTER_STATUSES }) status: CounterStatus;
}

export class WorkPartsAtCounterResponseDto {
  @ApiProperty({ description: 'The parts plan whose counter lines these are' }) planId: string;
  @ApiProperty({ description: "The counter's lines of the parts plan the approved quote was drawn from" }) total: number;
  @ApiProperty({ description: 'Lines on the job’s shelf or issued to it' }) withTheJob: number;
  @ApiProperty({ type: [WaitingCounterLineResponseDto], description: 'Lines not yet set aside, to order or ordered' }) waiting: WaitingCounterLineResponseDto[];
}

export class WorkOrderResponseDto extends WorkOrderSummaryResponseDto {
  @ApiProperty() vehicleDescription: string;
  @ApiProperty() quoteId: string;
  @ApiProperty({ example: 'Q-0007' }) quoteLabel: string;
  @ApiProperty() quoteRevision: number;
  @ApiProperty({ type: String, nullable: true }) fitReportId: string | null;
  @ApiProperty({ type: Number, nullable: true }) partsPlanVersion: number | null;
  @ApiProperty({ type: String, nullable: true }) startedAt: string | null;
  @ApiProperty({ type: String, nullable: true }) finishedAt: string | null;
  @ApiProperty({ type: [WorkStepResponseDto] }) steps: WorkStepResponseDto[];
  @ApiProperty({ type: [WorkCautionResponseDto] }) cautions: WorkCautionResponseDto[];
  @ApiProperty() deference: string;
  @ApiProperty({ type: WorkPartsAtCounterResponseDto, nullable: true, description: 'Null when the quote was not drawn from a parts plan' })
  partsAtCounter: WorkPartsAtCounterResponseDto | null;
}
