import type { FitReport, PartCategory, PartsPlanResult } from '@swapwright/shared';
import { randomUUID } from 'node:crypto';
import type { LaborOperation } from '../labor-operations/labor-operation.entity';
import type { QuoteLineInputDto } from './dto/quote-input.dto';
import { firstSentence } from './first-sentence';
import type { LineSource } from './quote-revision.entity';

/** The catalog kind a part remedy's category is stocked under (categories without a catalog kind stay as text). */
export const CATALOG_KIND_OF_CATEGORY: Partial<Record<PartCategory, string>> = {
  'oil-pan': 'oil-pans',
  'oil-pickup': 'oil-pickups',
  'oil-pump': 'oil-pumps',
  'mount-adapter': 'mount-adapters',
  'bellhousing-adapter': 'bellhousing-adapters',
  'engine-controller': 'controllers',
  belt: 'belts',
};

export interface CatalogRowForQuote {
  id: string;
  name: string;
  /** Unit price in cents, when the catalog row carries one. */
  priceCents: number | null;
}

export type DraftLine = QuoteLineInputDto & { key: string; source: LineSource };

export interface DraftInputs {
  report: FitReport | null;
  operations: LaborOperation[];
  /** Looks a catalog row up by kind and id (null when it is gone). */
  catalogRow: (kind: string, id: string) => CatalogRowForQuote | null;
  /** Operations every swap needs (by code), quoted even when no shortfall asks for them. */
  baseOperationCodes: readonly string[];
  defaultMarkupPercent: number;
}

/** A price as the catalog may hold it: integer cents (`priceCents`) or a decimal amount (`price`). */
export function catalogPriceCents(spec: Record<string, unknown>): number | null {
  if (typeof spec.priceCents === 'number' && Number.isSafeInteger(spec.priceCents)) return spec.priceCents;
  if (typeof spec.price === 'number' && Number.isFinite(spec.price)) return Math.round(spec.price * 100);
  return null;
}

/** Adds a labor line for a shop operation at its book hours, once per operation. */
function operationAdder(lines: DraftLine[]): (operation: LaborOperation, source: LineSource) => void {
  const used = new Set<string>();
  return (operation, source) => {
    if (used.has(operation.id)) return;
    used.add(operation.id);
    lines.push({ key: randomUUID(), kind: 'labor', source, description: operation.name, laborOperationId: operation.id, hours: operation.bookHours });
  };
}

/**
 * The first draft of a quote, drawn from the fit report: the base operations, a parts line for the first
 * catalog part of each part remedy (with the shop operation that installs it), and a labor line for each
 * fabrication remedy (the shop's own operation when one matches, else the remedy's hours). The estimator edits from there.
 */
export function draftLinesFromReport(inputs: DraftInputs): DraftLine[] {
  const lines: DraftLine[] = [];
  const match = (text: string) =>
    inputs.operations.find((operation) => operation.matches.some((word) => word && text.toLowerCase().includes(word.toLowerCase()))) ?? null;
  const addOperation = operationAdder(lines);
  for (const code of inputs.baseOperationCodes) {
    const operation = inputs.operations.find((candidate) => candidate.code === code);
    if (operation) addOperation(operation, 'manual');
  }
  const usedParts = new Set<string>();
  for (const finding of inputs.report?.shortfalls ?? []) {
    for (const remedy of finding.remedies) {
      if (remedy.kind === 'part') {
        const kind = CATALOG_KIND_OF_CATEGORY[remedy.category] ?? null;
        const row = kind && remedy.partIds[0] ? inputs.catalogRow(kind, remedy.partIds[0]) : null;
        const key = row ? `${kind}:${row.id}` : `${remedy.category}:${remedy.note}`;
        if (usedParts.has(key)) continue;
        usedParts.add(key);
        lines.push({
          key: randomUUID(),
          kind: 'part',
          source: 'fit-remedy',
          // Without a catalog part, the remedy's first sentence says what to look for (the pans left out and why stay in the report).
          description: row ? row.name : firstSentence(remedy.note).slice(0, 200),
          catalogKind: row ? kind : null,
          catalogItemId: row ? row.id : null,
          quantity: 1,
          pricing: 'list',
          unitPriceCents: row?.priceCents ?? 0,
        });
        const installs = match(remedy.category);
        if (installs) addOperation(installs, 'fit-remedy');
      } else if (remedy.kind === 'fabrication') {
        const operation = match(remedy.operation);
        if (operation) addOperation(operation, 'fit-remedy');
        else lines.push({ key: randomUUID(), kind: 'labor', source: 'fit-remedy', description: remedy.operation.slice(0, 200), hours: Math.round(remedy.laborHours * 10) / 10 });
      }
    }
  }
  return lines;
}

/** A part the plan picked, with the catalog's figures the quote prices it from. */
export interface PlanPartForQuote {
  partId: string;
  sku?: string | null;
  description: string;
  category: string;
  quantity: number;
  priceCents: number;
  /** 0 when the shop has not entered a cost: the line is then priced from the list. */
  costCents: number;
}

export interface PlanDraftInputs {
  plan: Pick<PartsPlanResult, 'operations' | 'picks'>;
  parts: PlanPartForQuote[];
  report: FitReport | null;
  operations: LaborOperation[];
  baseOperationCodes: readonly string[];
  defaultMarkupPercent: number;
}

/**
 * The first draft of a quote drawn from the parts plan: a parts line per pick (priced from its cost with the shop's
 * markup when a cost is known, else at its list price), the shop operation that installs each pick's category, the
 * plan's own operations, and the fabrication remedies of the fit report's shortfalls the plan leaves unresolved (the
 * shop's operation when one matches, else the remedy's own hours): a shortfall a picked part or planned operation
 * resolves is not quoted twice. Every line keeps where it came from.
 */
export function draftLinesFromPlan(inputs: PlanDraftInputs): DraftLine[] {
  const lines: DraftLine[] = [];
  const words = (operation: LaborOperation) => operation.matches.filter(Boolean).map((word) => word.toLowerCase());
  const ordered = [...inputs.operations].sort((a, b) => a.buildOrder - b.buildOrder);
  const installerOf = (category: string) =>
    ordered.find((operation) => words(operation).includes(category)) ?? ordered.find((operation) => words(operation).some((word) => category.includes(word))) ?? null;
  const matchText = (text: string) => ordered.find((operation) => words(operation).some((word) => text.toLowerCase().includes(word))) ?? null;
  const addOperation = operationAdder(lines);
  for (const code of inputs.baseOperationCodes) {
    const operation = inputs.operations.find((candidate) => candidate.code === code);
    if (operation) addOperation(operation, 'plan');
  }
  for (const part of inputs.parts) {
    const fromCost = part.costCents > 0;
    lines.push({
      key: randomUUID(),
      kind: 'part',
      source: 'plan',
      description: part.description.slice(0, 200),
      sku: part.sku ?? null,
      catalogKind: 'parts',
      catalogItemId: part.partId,
      quantity: part.quantity,
      ...(fromCost
        ? { pricing: 'cost-plus' as const, unitCostCents: part.costCents, markupPercent: inputs.defaultMarkupPercent }
        : { pricing: 'list' as const, unitPriceCents: part.priceCents }),
    });
    const installer = installerOf(part.category);
    if (installer) addOperation(installer, 'plan');
  }
  for (const planned of inputs.plan.operations) {
    const operation = matchText(planned.operation);
    if (operation) addOperation(operation, 'plan');
    else lines.push({ key: randomUUID(), kind: 'labor', source: 'plan', description: planned.operation.slice(0, 200), hours: Math.round(planned.laborHours * 10) / 10 });
  }
  const described = new Set(lines.map((line) => line.description.toLowerCase()));
  const resolvedByPlan = new Set([...inputs.plan.picks, ...inputs.plan.operations].flatMap((pick) => (pick.resolves ?? []).map((shortfall) => shortfall.checkId)));
  for (const finding of inputs.report?.shortfalls ?? []) {
    if (resolvedByPlan.has(finding.checkId)) continue;
    for (const remedy of finding.remedies) {
      if (remedy.kind !== 'fabrication') continue;
      const operation = matchText(remedy.operation);
      if (operation) addOperation(operation, 'fit-remedy');
      else if (!described.has(remedy.operation.toLowerCase())) {
        described.add(remedy.operation.toLowerCase());
        lines.push({ key: randomUUID(), kind: 'labor', source: 'fit-remedy', description: remedy.operation.slice(0, 200), hours: Math.round(remedy.laborHours * 10) / 10 });
      }
    }
  }
  return lines;
}
