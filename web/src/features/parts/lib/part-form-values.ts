import type { CatalogPartCategory } from '@swapwright/shared';
import type { Part } from '../api/get-parts';
import type { NewPart } from '../api/save-part';

/** Fitment attribute names the planner's rules and the fit remedies read (any other name may be added). */
export const KNOWN_ATTRIBUTES = [
  'sumpPosition',
  'pickupMount',
  'pumpInlet',
  'railPattern',
  'dipstickProvision',
  'location',
  'crankSignals',
  'camSignals',
  'throttles',
  'maxCylinders',
  'enginePattern',
  'transmissionPattern',
  'maxDxMm',
  'maxDzMm',
  'maxDyMm',
  'flowLph',
  'pressurePsi',
  'ratedKw',
  'inletSide',
  'outletSide',
  'type',
  'ribs',
  'effectiveLengthMm',
  'fabricationHours',
] as const;

type AttributeValue = NewPart['attributes'] extends Record<string, infer V> | undefined ? V : never;

export type PartFormValues = {
  sku: string;
  description: string;
  category?: CatalogPartCategory;
  /** Money as people type it (dollars and cents); sent as integer cents. */
  price?: number | null;
  cost?: number | null;
  supplierId?: string | null;
  supplierSku?: string;
  laborHours?: number | null;
  torqueSpecs: Array<{ fastener?: string; newtonMetres?: number | null; sequence?: string }>;
  instructions?: string;
  attributes: Array<{ name?: string; value?: string }>;
  requiresSkus: string[];
  excludesSkus: string[];
  replacesSkus: string[];
};

/** An attribute typed in a box: true/false, a number, a comma-separated list, or text. */
export function readAttributeValue(text: string): AttributeValue {
  const value = text.trim();
  if (value === 'true' || value === 'false') return value === 'true';
  if (/^-?\d+(\.\d+)?$/.test(value)) return Number(value);
  if (value.includes(',')) return value.split(',').map((item) => item.trim()).filter(Boolean);
  return value;
}

export function showAttributeValue(value: unknown): string {
  return Array.isArray(value) ? value.join(', ') : String(value);
}

const toCents = (amount: number | null | undefined) => Math.round((amount ?? 0) * 100);

export function partToFormValues(part: Part | null | undefined): PartFormValues {
  if (!part) return { sku: '', description: '', torqueSpecs: [], attributes: [], requiresSkus: [], excludesSkus: [], replacesSkus: [] };
  return {
    sku: part.sku,
    description: part.description,
    category: part.category,
    price: part.priceCents / 100,
    cost: part.costCents / 100,
    supplierId: part.supplierId,
    supplierSku: part.supplierSku ?? '',
    laborHours: part.laborHours,
    torqueSpecs: part.torqueSpecs.map((t) => ({ fastener: t.fastener, newtonMetres: t.newtonMetres, sequence: t.sequence ?? '' })),
    instructions: part.instructions ?? '',
    attributes: Object.entries(part.attributes).map(([name, value]) => ({ name, value: showAttributeValue(value) })),
    requiresSkus: part.requiresSkus,
    excludesSkus: part.excludesSkus,
    replacesSkus: part.replacesSkus,
  };
}

/** The form's values as the API's create/update body (money in cents, attributes typed, empty text as null). */
export function formValuesToBody(values: PartFormValues): NewPart {
  const attributes: Record<string, AttributeValue> = {};
  for (const row of values.attributes ?? []) {
    if (row.name?.trim() && row.value?.trim()) attributes[row.name.trim()] = readAttributeValue(row.value);
  }
  return {
    sku: values.sku.trim(),
    description: values.description.trim(),
    category: values.category!,
    priceCents: toCents(values.price),
    costCents: toCents(values.cost),
    supplierId: values.supplierId ?? null,
    supplierSku: values.supplierSku?.trim() || null,
    laborHours: Math.round((values.laborHours ?? 0) * 10) / 10,
    torqueSpecs: (values.torqueSpecs ?? [])
      .filter((t) => t.fastener?.trim())
      .map((t) => ({ fastener: t.fastener!.trim(), newtonMetres: t.newtonMetres ?? 0, ...(t.sequence?.trim() ? { sequence: t.sequence.trim() } : {}) })),
    instructions: values.instructions?.trim() || null,
    attributes,
    requiresSkus: values.requiresSkus ?? [],
    excludesSkus: values.excludesSkus ?? [],
    replacesSkus: values.replacesSkus ?? [],
  };
}
