import { attributeNoun, describeAttribute, renderText, textParts, type CatalogPartCategory, type UnitSystem } from '@swapwright/shared';
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

/** The unit an attribute's value box takes, read from the key's ending (`maxDxMm` → mm, `flowLph` → L/h). */
const KEY_UNITS: Array<[RegExp, string]> = [
  [/Mm$/, 'mm'],
  [/Lph$/, 'L/h'],
  [/Lbh$/, 'lb/h'],
  [/Psi$/, 'psi'],
  [/Kw$/, 'kW'],
  [/Rpm$/, 'rpm'],
  [/Deg$/, '°'],
  [/Hours$/, 'h'],
];

export function attributeUnit(key: string): string | undefined {
  return KEY_UNITS.find(([pattern]) => pattern.test(key.trim()))?.[1];
}

/**
 * An attribute's name as a person reads it: `sumpPosition` → "sump position" (the shared plan wording). Only the known
 * names turn into words (their words are unique, so the form gives back the same key); another key shows as stored.
 */
export function attributeWords(key: string): string {
  return (KNOWN_ATTRIBUTES as readonly string[]).includes(key) ? attributeNoun(key) : key;
}

/**
 * The stored key of a name as typed in the form: the words of a known attribute ("Sump position", any case) give its
 * key (`sumpPosition`); a key typed as it is stays; anything else is kept as typed, trimmed.
 */
export function attributeKeyOf(typed: string): string {
  const text = typed.trim();
  const words = text.replace(/\s+/g, ' ').toLowerCase();
  return KNOWN_ATTRIBUTES.find((key) => key === text || attributeNoun(key) === words) ?? text;
}

/** What an attribute row says, in plain words and the person's units: "sump at the rear", "bridges up to 2.36 in fore and aft". */
export function attributeHint(typedName: string | undefined, typedValue: string | undefined, system: UnitSystem): string | null {
  if (!typedName?.trim() || !typedValue?.trim()) return null;
  const key = attributeKeyOf(typedName);
  return renderText(textParts(describeAttribute(key, readAttributeValue(typedValue))), system);
}

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
    attributes: Object.entries(part.attributes).map(([name, value]) => ({ name: attributeWords(name), value: showAttributeValue(value) })),
    requiresSkus: part.requiresSkus,
    excludesSkus: part.excludesSkus,
    replacesSkus: part.replacesSkus,
  };
}

/** The form's values as the API's create/update body (money in cents, attributes typed, empty text as null). */
export function formValuesToBody(values: PartFormValues): NewPart {
  const attributes: Record<string, AttributeValue> = {};
  for (const row of values.attributes ?? []) {
    if (row.name?.trim() && row.value?.trim()) attributes[attributeKeyOf(row.name)] = readAttributeValue(row.value);
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
