import { combineFabricationRemedies, type FabricationRemedy, type FitReport, installerOfCategory, type PartCategory, type PartsPlanResult } from '@swapwright/shared';
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

/** The shop operation a fabrication remedy or planned operation is, by its operation code only (never by its words). */
function operationOfCode(operations: readonly LaborOperation[], code: string | null | undefined): LaborOperation | null {
  return code ? (operations.find((operation) => operation.code === code) ?? null) : null;
}

const tenthOfHour = (hours: number) => Math.round(hours * 10) / 10;

/**
 * The first draft of a quote, drawn from the fit report: the base operations, a parts line for the first
 * catalog part of each part remedy (with the shop operation that installs its category), and a labor line for each
 * fabrication remedy in the remedy's own words and hours (linked to the shop's operation only when the remedy names
 * its operation code); remedies of one operation code for several shortfalls are one line, as in the parts plan
 * (`combineFabricationRemedies`). The estimator edits from there.
 */
export function draftLinesFromReport(inputs: DraftInputs): DraftLine[] {
  const lines: DraftLine[] = [];
  const ordered = [...inputs.operations].sort((a, b) => a.buildOrder - b.buildOrder);
  const addOperation = operationAdder(lines);
  for (const code of inputs.baseOperationCodes) {
    const operation = inputs.operations.find((candidate) => candidate.code === code);
    if (operation) addOperation(operation, 'manual');
  }
  const usedParts = new Set<string>();
  const shortfalls = inputs.report?.shortfalls ?? [];
  // Work on one member asked by several shortfalls is one line (as in the parts plan), placed where it is first asked.
  const fabrication = combineFabricationRemedies(shortfalls.map((finding) => finding.remedies.filter((r): r is FabricationRemedy => r.kind === 'fabrication')));
  const quoted = new Set<number>();
  shortfalls.forEach((finding, findingIndex) => {
    let fabricationIndex = 0;
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
        const installs = installerOfCategory(ordered, remedy.category);
        if (installs) addOperation(installs, 'fit-remedy');
      } else if (remedy.kind === 'fabrication') {
        const index = fabrication.operationOf[findingIndex][fabricationIndex++];
        if (quoted.has(index)) continue;
        quoted.add(index);
        const combined = fabrication.operations[index];
        const operation = operationOfCode(inputs.operations, combined.operationCode);
        lines.push({
          key: randomUUID(),
          kind: 'labor',
          source: 'fit-remedy',
          description: combined.operation.slice(0, 200),
          ...(operation && { laborOperationId: operation.id }),
          hours: tenthOfHour(combined.laborHours),
        });
      }
    }
  });
  return lines;
}

/** A part the plan picked, at the price the plan shows for it. */
export interface PlanPartForQuote {
  partId: string;
  sku?: string | null;
  description: string;
  category: string;
  quantity: number;
  /** The plan's unit price (the part's list price when the plan was built): the quote charges exactly this. */
  priceCents: number;
  /** The plan's install labor for the part, hours. */
  laborHours: number;
}

export interface PlanDraftInputs {
  plan: Pick<PartsPlanResult, 'operations'>;
  parts: PlanPartForQuote[];
  operations: LaborOperation[];
  baseOperationCodes: readonly string[];
}

/**
 * The first draft of a quote drawn from the parts plan, carrying exactly what the plan calls for:
 * - the shop's base operations every swap needs (removing and installing the engine), marked as the shop's own lines;
 * - a parts line per pick at the plan's price (the list price the plan, the catalog and the counter show);
 * - the plan's install labor: the picks' hours summed per shop operation that installs their category (one line per
 *   operation, in its name), or a line of their own for a part no operation installs;
 * - a labor line per planned operation in the plan's own words and hours, linked to the shop's operation only when the
 *   plan names its operation code (its hazards, torques and checks then reach the work order).
 * Nothing else: a shortfall the plan leaves unresolved stays in the plan's list for the estimator to quote by hand.
 */
export function draftLinesFromPlan(inputs: PlanDraftInputs): DraftLine[] {
  const lines: DraftLine[] = [];
  const ordered = [...inputs.operations].sort((a, b) => a.buildOrder - b.buildOrder);
  const addOperation = operationAdder(lines);
  for (const code of inputs.baseOperationCodes) {
    const operation = inputs.operations.find((candidate) => candidate.code === code);
    if (operation) addOperation(operation, 'manual');
  }
  const installs = new Map<LaborOperation | null, PlanPartForQuote[]>();
  for (const part of inputs.parts) {
    lines.push({
      key: randomUUID(),
      kind: 'part',
      source: 'plan',
      description: part.description.slice(0, 200),
      sku: part.sku ?? null,
      catalogKind: 'parts',
      catalogItemId: part.partId,
      quantity: part.quantity,
      pricing: 'list',
      unitPriceCents: part.priceCents,
    });
    const installer = installerOfCategory(ordered, part.category);
    installs.set(installer, [...(installs.get(installer) ?? []), part]);
  }
  const labelled = new Set(lines.map((line) => line.laborOperationId).filter(Boolean));
  for (const [operation, parts] of installs) {
    if (operation === null) continue;
    const hours = tenthOfHour(parts.reduce((sum, part) => sum + part.laborHours, 0));
    if (hours <= 0) continue;
    // A second line of an operation already quoted (a base operation that also installs a part) names the parts it fits.
    const description = labelled.has(operation.id) ? `Fit ${parts.map((part) => part.sku || part.description).join(', ')}` : operation.name;
    labelled.add(operation.id);
    lines.push({ key: randomUUID(), kind: 'labor', source: 'plan', description: description.slice(0, 200), laborOperationId: operation.id, hours });
  }
  for (const part of installs.get(null) ?? []) {
    const hours = tenthOfHour(part.laborHours);
    if (hours <= 0) continue;
    lines.push({ key: randomUUID(), kind: 'labor', source: 'plan', description: `Install ${part.sku ? `${part.sku} ` : ''}${part.description}`.slice(0, 200), hours });
  }
  for (const planned of inputs.plan.operations) {
    const operation = operationOfCode(inputs.operations, planned.operationCode);
    lines.push({
      key: randomUUID(),
      kind: 'labor',
      source: 'plan',
      description: planned.operation.slice(0, 200),
      ...(operation && { laborOperationId: operation.id }),
      hours: tenthOfHour(planned.laborHours),
    });
  }
  return lines;
}
