import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  CHECK_STATUSES,
  COUNTER_STATUSES,
  PROJECT_STATUSES,
  type ProjectStatus,
  PART_CATEGORIES,
  PLAN_OBJECTIVES,
  PLAN_SLOTS,
  type CatalogPartCategory,
  type CheckStatus,
  type PartsPlanResult,
  type PlanCandidateRejection,
  type PlanKeptPart,
  type PlanObjective,
  type PlanOperationPick,
  type PlanPartPick,
  type PlanShortfallRef,
  type PlanSlot,
  type PlanTotals,
  type PlanUnresolved,
} from '@swapwright/shared';
import { ArrayMaxSize, IsArray, IsIn, IsNotEmpty, IsOptional, IsString, IsUUID, MaxLength } from 'class-validator';
import type { PlanRecheck } from '../part.entity';
import { Trim } from '../../common/decorators/trim.decorator';
import { StockResponseDto } from './part.dto';

export class BuildPlanDto {
  @ApiPropertyOptional({ enum: PLAN_OBJECTIVES, default: 'lowest-cost' })
  @IsOptional()
  @IsIn(PLAN_OBJECTIVES, { message: `objective must be one of: ${PLAN_OBJECTIVES.join(', ')}` })
  objective?: PlanObjective;

  @ApiPropertyOptional({ type: [String], description: 'Check ids of the shortfalls to resolve; every shortfall when absent.' })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(100)
  @IsString({ each: true })
  resolve?: string[];

  @ApiPropertyOptional({ format: 'uuid', description: "A stored fit report of this project to plan from; a new fit check is run and stored when absent." })
  @IsOptional()
  @IsUUID('all', { message: 'fitReportId must be the id of a fit report of this project' })
  fitReportId?: string;
}

export class PlanShortfallRefDto implements PlanShortfallRef {
  @ApiProperty() checkId: string;
  @ApiProperty() title: string;
}

export class PlanCandidateRejectionDto implements PlanCandidateRejection {
  @ApiProperty() partId: string;
  @ApiProperty() sku: string;
  @ApiProperty() description: string;
  @ApiProperty({ description: 'Price plus install labor at the shop rate, cents.' }) totalCents: number;
  @ApiProperty({ description: 'Why it was not chosen.' }) reason: string;
}

export class PlanPartPickDto implements PlanPartPick {
  @ApiProperty() partId: string;
  @ApiProperty() sku: string;
  @ApiProperty() description: string;
  @ApiProperty({ enum: PART_CATEGORIES }) category: CatalogPartCategory;
  @ApiProperty() quantity: number;
  @ApiProperty() priceCents: number;
  @ApiProperty() laborHours: number;
  @ApiProperty() laborCents: number;
  @ApiProperty() totalCents: number;
  @ApiProperty() fabricationHours: number;
  @ApiProperty({ description: 'Units free to reserve when the plan was built.' }) available: number;
  @ApiProperty({ type: String, nullable: true }) fitSpecId: string | null;
  @ApiProperty({ type: [PlanShortfallRefDto], description: 'The shortfalls this part resolves.' }) resolves: PlanShortfallRefDto[];
  @ApiProperty({ type: [String], description: 'The rules that brought it in.' }) broughtInBy: string[];
  @ApiProperty({ type: [PlanCandidateRejectionDto], description: 'Cheaper parts of the same kind and why each was not chosen.' }) rejected: PlanCandidateRejectionDto[];
  @ApiProperty() explanation: string;
}

export class PlanOperationPickDto implements PlanOperationPick {
  @ApiProperty() operation: string;
  @ApiProperty() laborHours: number;
  @ApiProperty() laborCents: number;
  @ApiProperty({ type: [PlanShortfallRefDto] }) resolves: PlanShortfallRefDto[];
  @ApiProperty() explanation: string;
}

export class PlanKeptPartDto implements PlanKeptPart {
  @ApiProperty({ enum: PLAN_SLOTS }) slot: PlanSlot;
  @ApiProperty() name: string;
  @ApiProperty() note: string;
}

export class PlanUnresolvedDto implements PlanUnresolved {
  @ApiProperty() checkId: string;
  @ApiProperty() title: string;
  @ApiProperty() message: string;
  @ApiProperty({ type: [String], description: 'What the catalog would need to hold for the plan to resolve it.' }) catalogNeeds: string[];
  @ApiProperty() reason: string;
}

export class PlanTotalsDto implements PlanTotals {
  @ApiProperty() partsCents: number;
  @ApiProperty() laborHours: number;
  @ApiProperty() laborCents: number;
  @ApiProperty() fabricationHours: number;
  @ApiProperty() totalCents: number;
}

export class PlanModelSizeDto {
  @ApiProperty() columns: number;
  @ApiProperty() rows: number;
  @ApiProperty({ description: 'Solver runs (two for the fewest-fabrication plan).' }) solves: number;
}

export class PartsPlanResultDto implements PartsPlanResult {
  @ApiProperty({ enum: PLAN_OBJECTIVES }) objective: PlanObjective;
  @ApiProperty({ enum: ['optimal', 'feasible', 'infeasible'] }) status: 'optimal' | 'feasible' | 'infeasible';
  @ApiProperty({ type: [PlanPartPickDto] }) picks: PlanPartPickDto[];
  @ApiProperty({ type: [PlanOperationPickDto] }) operations: PlanOperationPickDto[];
  @ApiProperty({ type: [PlanKeptPartDto] }) kept: PlanKeptPartDto[];
  @ApiProperty({ type: [PlanUnresolvedDto] }) unresolved: PlanUnresolvedDto[];
  @ApiProperty({ type: PlanTotalsDto }) totals: PlanTotalsDto;
  @ApiProperty({ type: [String] }) notes: string[];
  @ApiProperty({ type: PlanModelSizeDto }) model: PlanModelSizeDto;
}

export class PlanRecheckSummaryDto {
  @ApiProperty() ok: number;
  @ApiProperty() tight: number;
  @ApiProperty() fails: number;
  @ApiProperty() unknown: number;
}

export class PlanRecheckRemainingDto {
  @ApiProperty() checkId: string;
  @ApiProperty() title: string;
  @ApiProperty({ enum: CHECK_STATUSES }) status: CheckStatus;
  @ApiProperty() message: string;
}

export class PlanRecheckDto implements PlanRecheck {
  @ApiProperty({ type: PlanRecheckSummaryDto }) summary: PlanRecheckSummaryDto;
  @ApiProperty({ type: [String], description: 'Check ids the chosen parts resolve.' }) resolved: string[];
  @ApiProperty({ type: [PlanRecheckRemainingDto], description: 'Shortfalls still there with the chosen parts fitted.' }) remaining: PlanRecheckRemainingDto[];
}

export class PartsPlanResponseDto {
  @ApiProperty() id: string;
  @ApiProperty() projectId: string;
  @ApiProperty() version: number;
  @ApiProperty({ enum: PLAN_OBJECTIVES }) objective: string;
  @ApiProperty({ enum: ['draft', 'locked'] }) status: string;
  @ApiProperty({ type: String, nullable: true, description: 'The stored fit report the plan was built from (null only on plans built before plans named their report).' })
  fitReportId: string | null;
  @ApiProperty() totalCents: number;
  @ApiProperty({ description: 'Model build and solve time, ms.' }) solveMs: number;
  @ApiProperty({ nullable: true, type: String }) lockedAt: string | null;
  @ApiProperty() createdAt: string;
  @ApiProperty({ type: PartsPlanResultDto, description: 'Picks (each explained), operations, kept parts, unresolved shortfalls, totals.' })
  result: PartsPlanResultDto;
  @ApiProperty({ type: PlanRecheckDto, description: 'The fit check run again with the chosen parts.' })
  recheck: PlanRecheckDto;
}

export class CustomerPlanPartDto {
  @ApiProperty() sku: string;
  @ApiProperty() description: string;
  @ApiProperty({ enum: PART_CATEGORIES }) category: CatalogPartCategory;
  @ApiProperty() quantity: number;
  @ApiProperty({ description: "The part's price in the plan (the shop's list price), cents." }) priceCents: number;
  @ApiProperty({ description: 'Hours to fit it.' }) laborHours: number;
  @ApiProperty({ description: 'Price plus fitting labor at the shop rate, cents.' }) totalCents: number;
  @ApiProperty({ type: [String], description: 'What it answers: the titles of the fit shortfalls it resolves.' }) resolves: string[];
}

export class CustomerPlanOperationDto {
  @ApiProperty() operation: string;
  @ApiProperty() laborHours: number;
  @ApiProperty({ description: 'The hours at the shop rate, cents.' }) laborCents: number;
  @ApiProperty({ type: [String], description: 'The titles of the fit shortfalls it resolves.' }) resolves: string[];
}

export class CustomerPlanUnresolvedDto {
  @ApiProperty() checkId: string;
  @ApiProperty() title: string;
  @ApiProperty() message: string;
}

/**
 * A parts plan as the project's customer sees it: the chosen parts at the plan's prices, the operations with their
 * hours, the totals and what the plan leaves unresolved. No stock, bins, suppliers, costs, counter states, passed-over
 * candidates or solver figures.
 */
export class CustomerPartsPlanResponseDto {
  @ApiProperty() id: string;
  @ApiProperty() projectId: string;
  @ApiProperty() version: number;
  @ApiProperty({ enum: ['draft', 'locked'], description: 'locked: the version a quote is drawn from.' }) status: string;
  @ApiProperty({ nullable: true, type: String }) lockedAt: string | null;
  @ApiProperty() createdAt: string;
  @ApiProperty({ type: [CustomerPlanPartDto] }) parts: CustomerPlanPartDto[];
  @ApiProperty({ type: [CustomerPlanOperationDto] }) operations: CustomerPlanOperationDto[];
  @ApiProperty({ type: PlanTotalsDto }) totals: PlanTotalsDto;
  @ApiProperty({ type: [CustomerPlanUnresolvedDto], description: 'Shortfalls the plan does not resolve.' }) unresolved: CustomerPlanUnresolvedDto[];
  @ApiProperty({ type: [String], description: "The plan's own notes and cautions (for example when no consistent set of parts exists)." }) notes: string[];
}

export class PlanSummaryResponseDto {
  @ApiProperty() id: string;
  @ApiProperty() projectId: string;
  @ApiProperty() projectTitle: string;
  @ApiProperty({ enum: PROJECT_STATUSES, description: "The project's stage: a done job's list is kept but no longer worked" }) projectStatus: ProjectStatus;
  @ApiProperty({ type: String, nullable: true }) customerName: string | null;
  @ApiProperty() version: number;
  @ApiProperty() status: string;
  @ApiProperty() objective: string;
  @ApiProperty() totalCents: number;
  @ApiProperty() createdAt: string;
}

export class CounterLineResponseDto {
  @ApiProperty() id: string;
  @ApiProperty() planId: string;
  @ApiProperty({ nullable: true, type: String }) partId: string | null;
  @ApiProperty() sku: string;
  @ApiProperty() description: string;
  @ApiProperty() quantity: number;
  @ApiProperty({ enum: COUNTER_STATUSES }) status: string;
  @ApiProperty({ nullable: true, type: String, description: 'The stock row the units are set aside at, or were issued from.' }) stockId: string | null;
  @ApiProperty({ nullable: true, type: String, format: 'date-time', description: 'When the units were issued to the job (taken off the shelf); null while they are not.' })
  issuedAt: string | null;
  @ApiProperty({ type: [StockResponseDto] }) stock: StockResponseDto[];
  @ApiProperty() onHand: number;
  @ApiProperty() available: number;
}

export class ReserveDto {
  @ApiPropertyOptional({ maxLength: 60, description: 'Reserve from this location; the one with the most free units when absent.' })
  @IsOptional()
  @IsString()
  @MaxLength(60)
  location?: string;
}

export class MarkLineDto {
  @ApiProperty({ enum: ['to-order', 'ordered'] })
  @IsIn(['to-order', 'ordered'], { message: 'status must be to-order or ordered' })
  status: 'to-order' | 'ordered';
}

export class ReceiveDto {
  @ApiProperty({ maxLength: 60 })
  @Trim()
  @IsString()
  @IsNotEmpty()
  @MaxLength(60)
  location: string;

  @ApiPropertyOptional({ maxLength: 40 })
  @IsOptional()
  @IsString()
  @MaxLength(40)
  bin?: string;
}

export class ImportMappingDto {
  @ApiPropertyOptional({ description: 'JSON object: import field → the file header that holds it.' })
  @IsOptional()
  @IsString()
  @MaxLength(4000)
  mapping?: string;
}
