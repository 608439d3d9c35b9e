import { mapStock } from './part.mapper';
import { CounterLineResponseDto, PartsPlanResponseDto } from './dto/plan.dto';
import { PartsPlanRecord } from './part.entity';
import type { CounterLineView } from './counter.service';

export function mapPlan(plan: PartsPlanRecord): PartsPlanResponseDto {
  return {
    id: plan.id,
    projectId: plan.projectId,
    version: plan.version,
    objective: plan.objective,
    status: plan.status,
    fitReportId: plan.fitReportId,
    totalCents: plan.totalCents,
    solveMs: plan.solveMs,
    lockedAt: plan.lockedAt ? plan.lockedAt.toISOString() : null,
    createdAt: plan.createdAt.toISOString(),
    result: plan.result,
    recheck: plan.recheck,
  };
}

export function mapCounterLine({ line, stock }: CounterLineView): CounterLineResponseDto {
  const mapped = stock.map(mapStock);
  return {
    id: line.id,
    planId: line.planId,
    partId: line.partId,
    sku: line.sku,
    description: line.description,
    quantity: line.quantity,
    status: line.status,
    stockId: line.stockId,
    issuedAt: line.issuedAt ? line.issuedAt.toISOString() : null,
    stock: mapped,
    onHand: mapped.reduce((sum, s) => sum + s.onHand, 0),
    available: mapped.reduce((sum, s) => sum + s.available, 0),
  };
}
