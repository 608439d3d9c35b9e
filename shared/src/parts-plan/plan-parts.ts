import { attributeNoun } from './attribute-words';
import { PART_CATEGORY_LABELS } from './part-categories';
import {
  AGREEMENT_RULES,
  buildPlanModel,
  describeAttributes,
  describeRemedyNeed,
  toLpText,
  type PlanColumn,
  type PlanModel,
  type PlanRow,
} from './plan-model';
import type {
  PartsPlanResult,
  PlanCandidateRejection,
  PlanInput,
  PlanKeptPart,
  PlanOperationPick,
  PlanPart,
  PlanPartPick,
  PlanShortfallRef,
  PlanSlot,
  PlanUnresolved,
} from './plan-types';

/** What the planner needs of a MIP solver's answer (the shape `highs` returns). */
export interface MipSolution {
  Status: string;
  ObjectiveValue: number;
  Columns: Record<string, { Primal: number }>;
}

export type MipSolverOptions = Record<string, string | number | boolean>;

/** Solves CPLEX LP text; may run elsewhere (a worker thread), hence the promise. */
export type MipSolve = (lp: string, options: MipSolverOptions) => MipSolution | Promise<MipSolution>;

/** Solver options: a proven optimum (gap 0) within a time limit; a limit hit keeps the best plan found. */
export const PLAN_SOLVER_OPTIONS: MipSolverOptions = { mip_rel_gap: 0, time_limit: 10, output_flag: false };

function solved(solution: MipSolution): 'optimal' | 'feasible' | 'infeasible' {
  if (solution.Status === 'Optimal') return 'optimal';
  const anyValue = Object.values(solution.Columns ?? {}).some((c) => typeof c?.Primal === 'number');
  if (/infeasible/i.test(solution.Status) || !anyValue) return 'infeasible';
  return 'feasible';
}

function chosenSet(model: PlanModel, solution: MipSolution): Set<number> {
  const chosen = new Set<number>();
  model.columns.forEach((column, index) => {
    if ((solution.Columns[column.name]?.Primal ?? 0) > 0.5) chosen.add(index);
  });
  return chosen;
}

function costObjective(model: PlanModel): number[] {
  const slackWeight = model.penalty * (model.shortfalls.length + 1);
  return model.columns.map((c) => (c.kind === 'unresolved' ? model.penalty : c.kind === 'rule-slack' ? slackWeight : c.costCents));
}

async function solveModel(model: PlanModel, input: PlanInput, solve: MipSolve): Promise<{ solution: MipSolution; solves: number }> {
  if (input.objective !== 'least-fabrication') {
    return { solution: await solve(toLpText(model, costObjective(model)), PLAN_SOLVER_OPTIONS), solves: 1 };
  }
  // Fewest fabrication hours first (in tenths), then the lowest cost among those plans.
  const tenths = model.columns.map((c) => (c.kind === 'part' || c.kind === 'fabrication' ? Math.round(c.fabricationHours * 10) : 0));
  const fabBound = tenths.reduce((sum, t) => sum + t, 0) + 1;
  const first = model.columns.map((c, i) =>
    c.kind === 'unresolved' ? fabBound : c.kind === 'rule-slack' ? fabBound * (model.shortfalls.length + 1) : tenths[i],
  );
  const firstSolution = await solve(toLpText(model, first), PLAN_SOLVER_OPTIONS);
  if (solved(firstSolution) === 'infeasible') return { solution: firstSolution, solves: 1 };
  const chosen = chosenSet(model, firstSolution);
  const unresolvedCols = model.columns.flatMap((c, i) => (c.kind === 'unresolved' || c.kind === 'rule-slack' ? [i] : []));
  const fabCols = model.columns.flatMap((c, i) => (tenths[i] > 0 ? [i] : []));
  const extra: PlanRow[] = [];
  if (unresolvedCols.length > 0) {
    extra.push({ name: 'keep_resolved', terms: unresolvedCols.map((i): [number, number] => [1, i]), sense: '<=', rhs: unresolvedCols.filter((i) => chosen.has(i)).length });
  }
  if (fabCols.length > 0) {
    extra.push({ name: 'keep_fabrication', terms: fabCols.map((i): [number, number] => [tenths[i], i]), sense: '<=', rhs: fabCols.filter((i) => chosen.has(i)).reduce((sum, i) => sum + tenths[i], 0) });
  }
  return { solution: await solve(toLpText(model, costObjective(model), extra), PLAN_SOLVER_OPTIONS), solves: 2 };
}

const SLOT_WORD = (slot: PlanSlot | null, category: string): string => PART_CATEGORY_LABELS[(slot ?? category) as keyof typeof PART_CATEGORY_LABELS].toLowerCase();

/** What an agreement compares, in words: "the sump position and the pickup mounting". */
function agreementNouns(rule: (typeof AGREEMENT_RULES)[number]): string {
  return [...new Set(rule.attributes.map(attributeNoun))].map((noun) => `the ${noun}`).join(' and ');
}

function columnLabel(column: PlanColumn): string {
  if (column.part) return `${column.part.description} (${column.part.sku})`;
  if (column.fitted) return `the fitted ${column.fitted.name}`;
  return column.operation?.operation ?? '';
}

/** The attributes where two parts differ, this one's against the other's: "pickup bolted to the block against pickup bolted to the pump". */
function contrast(mine: PlanPart['attributes'], theirs: PlanPart['attributes'], names: string[]): string {
  const differing = names.filter((name) => JSON.stringify(mine[name]) !== JSON.stringify(theirs[name]));
  const shown = differing.length > 0 ? differing : names;
  return `${describeAttributes(mine, shown)} against ${describeAttributes(theirs, shown)}`;
}

/** How a part disagrees with a chosen part of a slot it must agree with, or null when it agrees. */
function agreementReason(model: PlanModel, chosen: Set<number>, part: PlanPart, slot: PlanSlot | null): string | null {
  const chosenColumns = [...chosen].map((i) => model.columns[i]);
  for (const rule of AGREEMENT_RULES) {
    if (rule.b === slot) {
      const partner = chosenColumns.find((c) => c.slot === rule.a);
      const key = rule.keyB(part.attributes);
      if (partner && key !== null && !(rule.keysA(partner.attributes) ?? []).includes(key)) {
        return `does not agree with ${columnLabel(partner)}: ${contrast(part.attributes, partner.attributes, rule.attributes)}`;
      }
    }
    if (rule.a === slot) {
      const partner = chosenColumns.find((c) => c.slot === rule.b);
      const key = partner ? rule.keyB(partner.attributes) : null;
      if (partner && key !== null && !(rule.keysA(part.attributes) ?? []).includes(key)) {
        return `does not agree with ${columnLabel(partner)} (${contrast(part.attributes, partner.attributes, rule.attributes)}), and changing that as well costs more`;
      }
    }
  }
  return null;
}

/** Why a cheaper part was not chosen, judged against the plan that was. */
function rejectionReason(model: PlanModel, chosen: Set<number>, part: PlanPart, pick: PlanColumn, pickResolves: number[]): string {
  const filtered = model.filtered.get(part.id) ?? model.dominated.get(part.id);
  if (filtered) return filtered;
  const disagreeing = model.disagreeing.get(part.id);
  if (disagreeing) return agreementReason(model, chosen, part, pick.slot) ?? disagreeing;
  const missed = pickResolves.filter((s) => !model.shortfalls[s].resolvers.some((i) => model.columns[i].part?.id === part.id));
  if (missed.length > 0) return `does not resolve ${model.shortfalls[missed[0]].shortfall.title.toLowerCase()}`;
  const disagreement = agreementReason(model, chosen, part, pick.slot);
  if (disagreement) return disagreement;
  const chosenSkus = new Set([...chosen].map((i) => model.columns[i].part?.sku ?? model.columns[i].fitted?.sku).filter((s): s is string => !!s));
  const clash = part.excludes.find((sku) => chosenSkus.has(sku));
  if (clash) return `cannot be used with ${clash}`;
  const excluder = [...chosen].map((i) => model.columns[i].part).find((p) => p?.excludes.includes(part.sku));
  if (excluder) return `${excluder.sku} excludes it`;
  if (part.requires.length > 0) return `needs ${part.requires.join(' or ')} as well, a higher total`;
  return 'a higher total once every rule holds';
}

function explainPlan(model: PlanModel, input: PlanInput, chosen: Set<number>): Omit<PartsPlanResult, 'objective' | 'status' | 'model' | 'notes'> {
  const unresolvedIdx = new Set(
    [...chosen].map((i) => model.columns[i]).filter((c) => c.kind === 'unresolved').map((c) => c.shortfallIndex!),
  );
  const refOf = (s: number): PlanShortfallRef => ({ checkId: model.shortfalls[s].shortfall.checkId, title: model.shortfalls[s].shortfall.title });
  const resolvedBy = (index: number) =>
    model.shortfalls.flatMap((s, si) => (!unresolvedIdx.has(si) && s.resolvers.includes(index) ? [si] : []));
  const picks: PlanPartPick[] = [];
  const operations: PlanOperationPick[] = [];
  const kept: PlanKeptPart[] = [];
  const chosenParts = [...chosen].map((i) => model.columns[i]).filter((c) => c.kind === 'part');
  for (const index of [...chosen].sort((a, b) => a - b)) {
    const column = model.columns[index];
    if (column.kind === 'keep' && column.slot && column.fitted) {
      kept.push({ slot: column.slot, name: column.fitted.name, note: 'kept: already fitted, costs nothing, and agrees with the rest of the plan' });
    }
    if (column.kind === 'fabrication' && column.operation) {
      const resolves = resolvedBy(index).map(refOf);
      operations.push({
        operation: column.operation.operation,
        laborHours: column.operation.laborHours,
        laborCents: column.laborCents,
        operationCode: column.operation.operationCode ?? null,
        resolves,
        explanation: `${column.operation.operation}: resolves ${resolves.map((r) => r.title.toLowerCase()).join(' and ') || 'nothing on its own'}, ${column.operation.laborHours} h at the shop rate.`,
      });
    }
    if (column.kind !== 'part' || !column.part) continue;
    const part = column.part;
    const resolvesIdx = resolvedBy(index);
    const resolves = resolvesIdx.map(refOf);
    const broughtInBy: string[] = [];
    for (const rule of AGREEMENT_RULES) {
      if (rule.b !== column.slot) continue;
      const partner = [...chosen].map((i) => model.columns[i]).find((c) => c.slot === rule.a);
      if (partner?.kind === 'part') {
        broughtInBy.push(`agrees with the chosen ${SLOT_WORD(rule.a, rule.a)} ${partner.part!.sku} (${describeAttributes(partner.attributes, rule.attributes)})`);
      } else if (partner?.kind === 'keep' && resolvesIdx.length === 0) {
        broughtInBy.push(`agrees with ${columnLabel(partner)} (${describeAttributes(partner.attributes, rule.attributes)})`);
      }
    }
    for (const other of chosenParts) {
      if (other.part && other.part.requires.includes(part.sku)) broughtInBy.push(`${other.part.sku} requires it`);
    }
    const candidates = (model.byCategory.get(part.category) ?? []).filter(
      (p) => p.id !== part.id && p.priceCents + Math.round(p.laborHours * input.laborRateCents) < column.costCents,
    );
    candidates.sort((a, b) => b.priceCents - a.priceCents);
    const rejected: PlanCandidateRejection[] = candidates
      .filter((p) => model.filtered.get(p.id) !== 'already fitted: kept at no cost')
      .slice(0, 5)
      .map((p) => ({
        partId: p.id,
        sku: p.sku,
        description: p.description,
        totalCents: p.priceCents + Math.round(p.laborHours * input.laborRateCents),
        reason: rejectionReason(model, chosen, p, column, resolvesIdx),
      }));
    const why = [
      resolves.length > 0 ? `resolves ${resolves.map((r) => r.title.toLowerCase()).join(' and ')}` : null,
      ...broughtInBy,
    ].filter((s): s is string => !!s);
    const cheaper = rejected.length > 0 ? ` Cheaper ones not chosen: ${rejected.map((r) => `${r.sku} ${r.reason}`).join('; ')}.` : ' No cheaper part of this kind fits.';
    picks.push({
      partId: part.id,
      sku: part.sku,
      description: part.description,
      category: part.category,
      quantity: 1,
      priceCents: part.priceCents,
      laborHours: part.laborHours,
      laborCents: column.laborCents,
      totalCents: column.costCents,
      fabricationHours: column.fabricationHours,
      available: part.available,
      fitSpecId: part.fitSpecId ?? null,
      resolves,
      broughtInBy,
      rejected,
      explanation: `${part.description} (${part.sku}): ${why.join('; ') || 'chosen to keep the plan consistent'}.${cheaper}`,
    });
  }

  const unresolved: PlanUnresolved[] = [];
  for (const s of unresolvedIdx) {
    const { shortfall, partRemedies } = model.shortfalls[s];
    unresolved.push({
      checkId: shortfall.checkId,
      title: shortfall.title,
      message: shortfall.message,
      catalogNeeds: partRemedies.map(describeRemedyNeed),
      reason: 'the candidates cannot all be used together with the rules (pan, pickup and pump agreement, requires, excludes)',
    });
  }
  for (const { shortfall, partRemedies, reason } of model.hopeless) {
    unresolved.push({ checkId: shortfall.checkId, title: shortfall.title, message: shortfall.message, catalogNeeds: partRemedies.map(describeRemedyNeed), reason });
  }
  const slacks = [...chosen].map((i) => model.columns[i]).filter((c) => c.kind === 'rule-slack');
  for (const ruleId of new Set(slacks.map((c) => c.ruleId!))) {
    const rule = AGREEMENT_RULES.find((r) => r.id === ruleId)!;
    unresolved.push({
      checkId: `plan.${ruleId}`,
      title: `${PART_CATEGORY_LABELS[rule.a]} and ${PART_CATEGORY_LABELS[rule.b].toLowerCase()} agreement`,
      message: `No ${SLOT_WORD(rule.b, rule.b)} in the catalog agrees with the ${SLOT_WORD(rule.a, rule.a)} on ${agreementNouns(rule)}.`,
      catalogNeeds: [`${PART_CATEGORY_LABELS[rule.b]} matching the ${SLOT_WORD(rule.a, rule.a)} on ${agreementNouns(rule)}`],
      reason: 'a rule between the fitted parts cannot be met from the catalog',
    });
  }
  for (const refused of model.refusedFitted) {
    if ((model.slotColumns.get(refused.slot) ?? []).length > 0) continue;
    unresolved.push({
      checkId: `plan.${refused.slot}`,
      title: PART_CATEGORY_LABELS[refused.slot],
      message: `The fitted ${refused.name} ${refused.reason}.`,
      catalogNeeds: [`${PART_CATEGORY_LABELS[refused.slot]} that meets the engine`],
      reason: 'the catalog holds no replacement',
    });
  }

  const partsCents = picks.reduce((sum, p) => sum + p.priceCents, 0);
  const laborCents = picks.reduce((sum, p) => sum + p.laborCents, 0) + operations.reduce((sum, o) => sum + o.laborCents, 0);
  const laborHours = picks.reduce((sum, p) => sum + p.laborHours, 0) + operations.reduce((sum, o) => sum + o.laborHours, 0);
  const fabricationHours = picks.reduce((sum, p) => sum + p.fabricationHours, 0) + operations.reduce((sum, o) => sum + o.laborHours, 0);
  return {
    picks,
    operations,
    kept,
    unresolved,
    totals: {
      partsCents,
      laborHours: Math.round(laborHours * 10) / 10,
      laborCents,
      fabricationHours: Math.round(fabricationHours * 10) / 10,
      totalCents: partsCents + laborCents,
    },
  };
}

/**
 * Chooses the parts and operations that resolve the wanted shortfalls with every rule holding, at the lowest
 * total (parts price plus labor at the shop rate), by solving the binary model with the given MIP solver.
 */
export async function planParts(input: PlanInput, solve: MipSolve): Promise<PartsPlanResult> {
  let model = buildPlanModel(input);
  let { solution, solves } = await solveModel(model, input, solve);
  const notes: string[] = [];
  if (solved(solution) === 'infeasible') {
    // The fitted parts break a rule that nothing in the catalog repairs: solve again with the rules allowed to
    // break, at a weight above any number of unresolved shortfalls, to name what cannot be met.
    model = buildPlanModel(input, { ruleSlack: true });
    const again = await solveModel(model, input, solve);
    solution = again.solution;
    solves += again.solves;
  }
  const status = solved(solution);
  const base = { objective: input.objective, model: { columns: model.columns.length, rows: model.rows.length, solves } };
  if (status === 'infeasible') {
    return {
      ...base,
      status,
      picks: [],
      operations: [],
      kept: [],
      unresolved: input.shortfalls.map((s) => ({ checkId: s.checkId, title: s.title, message: s.message, catalogNeeds: [], reason: 'no consistent set of parts exists' })),
      totals: { partsCents: 0, laborHours: 0, laborCents: 0, fabricationHours: 0, totalCents: 0 },
      notes: ['No consistent set of parts exists for this project and catalog.'],
    };
  }
  if (status === 'feasible') notes.push('The solver stopped at its time limit: the plan is consistent, but a cheaper one may exist.');
  if (model.skipped.length > 0) notes.push(`Left as they are, by choice: ${model.skipped.map((s) => s.title).join(', ')}.`);
  if (input.objective === 'in-stock') notes.push('Only parts in stock now were considered.');
  if (input.objective === 'least-fabrication') notes.push('Fewest fabrication hours first, then the lowest total.');
  const explained = explainPlan(model, input, chosenSet(model, solution));
  const broken = explained.unresolved.some((u) => u.checkId.startsWith('plan.'));
  return { ...base, status: broken ? 'infeasible' : status, ...explained, notes };
}
