import { attributeNoun, describeAttribute, mmToInches, renderText, textParts, type CatalogPartCategory, type UnitSystem } from '@swapwright/shared';
import { readLength, unitLabels, type ReadResult } from '@/lib/units';
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

/** The unit an attribute is stored in, read from the key's ending (`maxDxMm` → mm, `flowLph` → L/h). */
const KEY_UNITS: Array<[RegExp, string]> = [
  [/Mm$/, 'mm'],
  // Screen positions are lengths along the block without the ending.
  [/^(screenU|maxFrontFaceU)$/, 'mm'],
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

/** A length attribute (stored in mm): its box takes and shows the person's units. */
export function isLengthAttribute(key: string): boolean {
  return attributeUnit(key) === 'mm';
}

/** The unit an attribute's value box takes: a length in the person's units (in or mm), anything else as stored. */
export function attributeBoxUnit(key: string, system: UnitSystem): string | undefined {
  return isLengthAttribute(key) ? unitLabels[system] : attributeUnit(key);
}

/**
 * Decimals of a length attribute's box: 0.001 in (0.0254 mm, finer than the 0.1 mm lengths are given to, so a stored
 * figure shows distinctly) and 0.01 mm (so a figure typed in inches shows to its thousandth in mm: 2.362 in = 59.99 mm).
 */
const LENGTH_BOX_DECIMALS: Record<UnitSystem, number> = { in: 3, mm: 2 };

/** A stored length (mm) as its box shows it: `25.4` → "1.000" in inches, "25.4" in millimetres. */
export function showLengthAttribute(mm: number, system: UnitSystem): string {
  if (system === 'in') return mmToInches(mm).toFixed(LENGTH_BOX_DECIMALS.in);
  return String(Number(mm.toFixed(LENGTH_BOX_DECIMALS.mm)));
}

/**
 * A length attribute's box as stored millimetres: a bare number in the person's units, or with its unit ("2 3/8 in",
 * "60 mm"), read by the shared length parser. Rounded to 0.0001 mm, which only drops floating-point noise
 * (0.1 in = 2.54 mm, not 2.5400000000000005): an inch figure with up to three decimals is kept exactly.
 */
export function readLengthAttribute(text: string, system: UnitSystem): ReadResult {
  const result = readLength(text, system);
  return result.ok ? { ok: true, value: Math.round(result.value * 10_000) / 10_000 } : result;
}

/** A row's value as stored: a length read in the person's units (mm), anything else as {@link readAttributeValue}. */
function storedAttributeValue(key: string, text: string, system: UnitSystem): AttributeValue {
  if (!isLengthAttribute(key)) return readAttributeValue(text);
  const length = readLengthAttribute(text, system);
  return length.ok ? length.value : readAttributeValue(text);
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
  if (isLengthAttribute(key) && !readLengthAttribute(typedValue, system).ok) return null;
  return renderText(textParts(describeAttribute(key, storedAttributeValue(key, typedValue, system))), system);
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

/** A stored attribute as its box shows it: a length in the person's units, anything else as typed. */
function shownAttributeValue(key: string, value: unknown, system: UnitSystem): string {
  return isLengthAttribute(key) && typeof value === 'number' ? showLengthAttribute(value, system) : showAttributeValue(value);
}

/** The part as the form shows it, lengths in the person's units (`system`). */
export function partToFormValues(part: Part | null | undefined, system: UnitSystem): PartFormValues {
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
    attributes: Object.entries(part.attributes).map(([name, value]) => ({ name: attributeWords(name), value: shownAttributeValue(name, value, system) })),
    requiresSkus: part.requiresSkus,
    excludesSkus: part.excludesSkus,
    replacesSkus: part.replacesSkus,
  };
}

/**
 * The form's values as the API's create/update body (money in cents, attributes typed, lengths read in the person's
 * units `system` and sent in mm, empty text as null). A length whose box still shows the stored figure (`stored`, the
 * part's attributes when editing) is sent as stored, so opening and saving a part never moves a figure by rounding.
 */
export function formValuesToBody(values: PartFormValues, system: UnitSystem, stored: Part['attributes'] = {}): NewPart {
  const attributes: Record<string, AttributeValue> = {};
  for (const row of values.attributes ?? []) {
    if (!row.name?.trim() || !row.value?.trim()) continue;
    const key = attributeKeyOf(row.name);
    const before = stored[key];
    const unchangedLength = isLengthAttribute(key) && typeof before === 'number' && showLengthAttribute(before, system) === row.value.trim();
    attributes[key] = unchangedLength ? before : storedAttributeValue(key, row.value, system);
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
