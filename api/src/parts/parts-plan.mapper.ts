import { mapStock } from './part.mapper';
import { CounterLineResponseDto, CustomerPartsPlanResponseDto, PartsPlanResponseDto } from './dto/plan.dto';
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

/**
 * The customer's view of a plan: built field by field (never a copy of the record with fields removed), so nothing the
 * shop keeps to itself (stock, candidates passed over, solver figures) reaches the customer when the plan grows.
 */
export function mapPlanForCustomer(plan: PartsPlanRecord): CustomerPartsPlanResponseDto {
  const { picks, operations, totals, unresolved, notes } = plan.result;
  return {
    id: plan.id,
    projectId: plan.projectId,
    version: plan.version,
    status: plan.status,
    lockedAt: plan.lockedAt ? plan.lockedAt.toISOString() : null,
    createdAt: plan.createdAt.toISOString(),
    parts: picks.map((pick) => ({
      sku: pick.sku,
      description: pick.description,
      category: pick.category,
      quantity: pick.quantity,
      priceCents: pick.priceCents,
      laborHours: pick.laborHours,
      totalCents: pick.totalCents,
      resolves: pick.resolves.map((r) => r.title),
    })),
    operations: operations.map((op) => ({ operation: op.operation, laborHours: op.laborHours, laborCents: op.laborCents, resolves: op.resolves.map((r) => r.title) })),
    totals: { partsCents: totals.partsCents, laborHours: totals.laborHours, laborCents: totals.laborCents, fabricationHours: totals.fabricationHours, totalCents: totals.totalCents },
    unresolved: unresolved.map((u) => ({ checkId: u.checkId, title: u.title, message: u.message })),
    notes: [...notes],
  };
}

/** The plan for whoever reads it: the whole plan for the shop's members, the customer's view for a customer. */
export function mapPlanFor(user: { role: string }, plan: PartsPlanRecord): PartsPlanResponseDto | CustomerPartsPlanResponseDto {
  return user.role === 'customer' ? mapPlanForCustomer(plan) : mapPlan(plan);
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
