import { hoursInTenths } from '@swapwright/shared';
import type { QuoteLine, QuoteLineInput } from './types';

/** The most hours one labor line takes (as the API does). */
export const MAX_LINE_HOURS = 999;

/**
 * What is wrong with typed hours, in a sentence for the field, or null when they can be quoted: zero or more, at
 * most 999, to a tenth of an hour (the quote rule's own test of tenths).
 */
export function hoursProblem(hours: number): string | null {
  if (!Number.isFinite(hours)) return null; // the plain-number rule speaks for text that is not a figure
  if (hours < 0) return 'Hours cannot be negative: enter 0 or more.';
  if (hours > MAX_LINE_HOURS) return `Hours must be at most ${MAX_LINE_HOURS} on one line.`;
  try {
    hoursInTenths(hours);
    return null;
  } catch {
    const down = Math.floor(hours * 10) / 10;
    const up = Math.ceil(hours * 10) / 10;
    return `Hours are quoted to a tenth of an hour: enter ${down.toFixed(1)} or ${up.toFixed(1)}.`;
  }
}

/** Form rule for a labor line's hours (see `hoursProblem`). */
export const hoursRule = {
  validator: async (_: unknown, value: unknown) => {
    const problem = typeof value === 'number' ? hoursProblem(value) : null;
    if (problem) throw new Error(problem);
  },
};

/** What the line form holds: money in the shop's currency units as typed (converted to cents once, here). */
export type QuoteLineFormValues = {
  description: string;
  sku?: string | null;
  quantity?: number | null;
  pricing?: 'list' | 'cost-plus';
  unitPrice?: number | null;
  unitCost?: number | null;
  markupPercent?: number | null;
  /** Labor lines: the shop's operation, or '' for free text. */
  laborOperationId?: string;
  hours?: number | null;
};

/** A typed amount such as 289.95 as integer cents (the form keeps two decimals). */
export const toCents = (amount: number): number => Math.round(amount * 100);

const defined = <T>(value: T | null | undefined): T | undefined => (value === null ? undefined : value);

/** A stored line as the API takes it back: the figures the estimator chose, not the ones the API worked out. */
export function lineToInput(line: QuoteLine): QuoteLineInput {
  const base = { key: line.key, kind: line.kind, description: line.description };
  if (line.kind === 'labor') return { ...base, laborOperationId: line.laborOperationId, hours: line.hours ?? 0 };
  const part = { ...base, sku: line.sku, catalogKind: line.catalogKind, catalogItemId: line.catalogItemId, quantity: line.quantity, pricing: line.pricing };
  return line.pricing === 'cost-plus'
    ? { ...part, unitCostCents: defined(line.unitCostCents), markupPercent: defined(line.markupPercent) }
    : { ...part, unitPriceCents: line.unitPriceCents };
}

/** The form's values as a line for the API; an edited line keeps its key and catalog link. */
export function formToInput(kind: QuoteLine['kind'], values: QuoteLineFormValues, editing?: QuoteLine): QuoteLineInput {
  const base = { ...(editing && { key: editing.key }), kind, description: values.description.trim() };
  if (kind === 'labor') {
    return { ...base, laborOperationId: values.laborOperationId || null, hours: defined(values.hours) };
  }
  const pricing = values.pricing ?? 'list';
  const part = {
    ...base,
    sku: values.sku?.trim() || null,
    catalogKind: editing?.catalogKind ?? null,
    catalogItemId: editing?.catalogItemId ?? null,
    quantity: defined(values.quantity),
    pricing,
  };
  return pricing === 'cost-plus'
    ? { ...part, unitCostCents: values.unitCost == null ? undefined : toCents(values.unitCost), markupPercent: defined(values.markupPercent) }
    : { ...part, unitPriceCents: values.unitPrice == null ? undefined : toCents(values.unitPrice) };
}

/** The form's starting values for a line (a new one when none is given). */
export function lineToForm(kind: QuoteLine['kind'], line?: QuoteLine, defaultMarkupPercent?: number): QuoteLineFormValues {
  if (!line) {
    return kind === 'labor'
      ? { description: '', laborOperationId: '', hours: null }
      : { description: '', sku: '', quantity: 1, pricing: 'list', unitPrice: null, unitCost: null, markupPercent: defaultMarkupPercent ?? null };
  }
  if (kind === 'labor') return { description: line.description, laborOperationId: line.laborOperationId ?? '', hours: line.hours };
  return {
    description: line.description,
    sku: line.sku ?? '',
    quantity: line.quantity,
    pricing: line.pricing,
    unitPrice: line.pricing === 'list' ? line.unitPriceCents / 100 : null,
    unitCost: line.unitCostCents === null ? null : line.unitCostCents / 100,
    markupPercent: line.markupPercent,
  };
}
