import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { PLAN_OBJECTIVES, type PlanObjective } from '@swapwright/shared';
import { ArrayMaxSize, IsArray, IsIn, IsNotEmpty, IsOptional, IsString, MaxLength } from 'class-validator';
import { Trim } from '../../common/decorators/trim.decorator';
import { COUNTER_STATUSES } from '../part.entity';
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
}

export class PartsPlanResponseDto {
  @ApiProperty() id: string;
  @ApiProperty() projectId: string;
  @ApiProperty() version: number;
  @ApiProperty({ enum: PLAN_OBJECTIVES }) objective: string;
  @ApiProperty({ enum: ['draft', 'locked'] }) status: string;
  @ApiProperty() totalCents: number;
  @ApiProperty({ description: 'Model build and solve time, ms.' }) solveMs: number;
  @ApiProperty({ nullable: true, type: String }) lockedAt: string | null;
  @ApiProperty() createdAt: string;
  @ApiProperty({ type: 'object', additionalProperties: true, description: 'Picks (each explained), operations, kept parts, unresolved shortfalls, totals.' })
  result: Record<string, unknown>;
  @ApiProperty({ type: 'object', additionalProperties: true, description: 'The fit check run again with the chosen parts.' })
  recheck: Record<string, unknown>;
}

export class PlanSummaryResponseDto {
  @ApiProperty() id: string;
  @ApiProperty() projectId: string;
  @ApiProperty() projectTitle: string;
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
  @ApiProperty({ nullable: true, type: String }) stockId: string | null;
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
