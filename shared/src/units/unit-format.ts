import type { FigureUnit, Finding, Remedy } from '../types/finding';
import type { UnitSystem } from '../types/value-lists';
import { MM_PER_INCH, mmToShownInches } from './length';
import { KG_PER_LB, KPA_PER_PSI, KW_PER_HP, L_PER_US_GAL } from './quantities';

/**
 * One formatting path for every figure a person reads, in the unit system they chose: lengths, pressures,
 * fuel flows, power and angles. Inside the engine figures stay in their stored unit (mm, psi, lb/h, L/h, kW,
 * degrees); this module turns them into the reader's system with one minus sign (U+2212) throughout.
 *
 * A finding's stored message is unit-neutral in the sense that every figure in it is written by the engine's
 * own formatters (`mmWithInches`, `formatFigure`, `formatDegrees`); {@link findingTextParts} reads those
 * figures back as structured values, and {@link renderFindingText} writes the sentence in either system.
 */

export type Quantity = 'length' | 'pressure' | 'mass-flow' | 'volume-flow' | 'power' | 'angle';

/** The unit each quantity is stored in, inside the engine and in saved reports. */
export const STORED_UNIT: Record<Quantity, string> = {
  length: 'mm',
  pressure: 'psi',
  'mass-flow': 'lb/h',
  'volume-flow': 'L/h',
  power: 'kW',
  angle: '°',
};

/** The unit shown for each quantity in each system, and the factor from the stored unit to it. */
const SHOWN: Record<Quantity, Record<UnitSystem, { unit: string; perStored: number; space: boolean }>> = {
  length: { in: { unit: 'in', perStored: 1 / MM_PER_INCH, space: true }, mm: { unit: 'mm', perStored: 1, space: true } },
  pressure: { in: { unit: 'psi', perStored: 1, space: true }, mm: { unit: 'kPa', perStored: KPA_PER_PSI, space: true } },
  'mass-flow': { in: { unit: 'lb/h', perStored: 1, space: true }, mm: { unit: 'kg/h', perStored: KG_PER_LB, space: true } },
  'volume-flow': { in: { unit: 'gal/h', perStored: 1 / L_PER_US_GAL, space: true }, mm: { unit: 'L/h', perStored: 1, space: true } },
  power: { in: { unit: 'hp', perStored: 1 / KW_PER_HP, space: true }, mm: { unit: 'kW', perStored: 1, space: true } },
  angle: { in: { unit: '°', perStored: 1, space: false }, mm: { unit: '°', perStored: 1, space: false } },
};

/** The one minus sign of figures shown to people. */
export const MINUS = '\u2212';

export interface QuantityFormatOptions {
  /**
   * Decimals in the stored unit (default 1). Inches get one more (at least 2) so a tenth of a millimetre still
   * shows; the other conversions keep the same count.
   */
  decimals?: number;
  /** Prefix positive figures with `+` (for differences). */
  signed?: boolean;
}

function shownDecimals(quantity: Quantity, system: UnitSystem, decimals: number): number {
  return quantity === 'length' && system === 'in' ? Math.max(2, decimals + 1) : decimals;
}

/** A number with fixed decimals, one minus sign (U+2212) and never `−0.0`. */
export function formatNumber(value: number, decimals: number, signed = false): string {
  if (!Number.isFinite(value)) throw new RangeError(`Cannot format ${value}.`);
  let text = value.toFixed(decimals);
  if (/^-0(\.0*)?$/.test(text)) text = text.slice(1);
  if (text.startsWith('-')) return `${MINUS}${text.slice(1)}`;
  return signed && Number(text) !== 0 ? `+${text}` : text;
}

/**
 * A stored figure in the reader's system: `formatQuantity(11.6, 'length', 'in')` → `0.46 in`,
 * `formatQuantity(58, 'pressure', 'mm')` → `399.9 kPa`, `formatQuantity(-2.5, 'angle', 'in')` → `−2.5°`.
 */
export function formatQuantity(value: number, quantity: Quantity, system: UnitSystem, options: QuantityFormatOptions = {}): string {
  const shown = SHOWN[quantity][system];
  const storedDecimals = options.decimals ?? 1;
  const decimals = shownDecimals(quantity, system, storedDecimals);
  // A length in inches is converted from the millimetres as they would be written (mmToShownInches), so the
  // same stored length reads the same wherever it appears and a figure, its limit and its margin agree.
  const converted = quantity === 'length' && system === 'in' ? mmToShownInches(value, storedDecimals) : value * shown.perStored;
  const number = formatNumber(converted, decimals, options.signed ?? false);
  return shown.space ? `${number} ${shown.unit}` : `${number}${shown.unit}`;
}

/** The quantity of each finding unit that converts between systems (the rest read alike in both). */
const FIGURE_QUANTITY: Partial<Record<FigureUnit, Quantity>> = {
  mm: 'length',
  deg: 'angle',
  psi: 'pressure',
  'lb/h': 'mass-flow',
  'L/h': 'volume-flow',
  kW: 'power',
};

/** Decimals of each finding unit, in its stored unit. */
const FIGURE_DECIMALS: Record<FigureUnit, number> = { mm: 1, deg: 2, rpm: 0, 'lb/h': 1, 'cc/min': 0, 'L/h': 1, psi: 1, kW: 0, count: 0, none: 1 };
const PLAIN_SUFFIX: Partial<Record<FigureUnit, string>> = { rpm: ' rpm', 'cc/min': ' cc/min' };

export interface FigureFormatOptions {
  signed?: boolean;
}

/**
 * A finding's figure (measured, required, margin) in the reader's system: `formatFindingFigure(11.6, 'mm', 'in')`
 * → `0.46 in`, `(58, 'psi', 'mm')` → `399.9 kPa`, `(298.3, 'kW', 'in')` → `400 hp`, `(3200, 'rpm', …)` → `3200 rpm`.
 * A rule's threshold is written like any other figure, at the same precision as the figure held against it, so
 * 3.0 mm reads 0.12 in, 50.0 mm 1.97 in and 100 mm 3.94 in, and found − needed = margin holds as shown.
 */
export function formatFindingFigure(value: number, unit: FigureUnit, system: UnitSystem, options: FigureFormatOptions = {}): string {
  const quantity = FIGURE_QUANTITY[unit];
  const format = { decimals: FIGURE_DECIMALS[unit], signed: options.signed };
  if (quantity) return formatQuantity(value, quantity, system, format);
  return `${formatNumber(value, format.decimals, options.signed)}${PLAIN_SUFFIX[unit] ?? ''}`;
}

/** A figure read back from an engine sentence: its stored value and how it was written. */
export interface TextFigure {
  quantity: Quantity;
  /** In the stored unit ({@link STORED_UNIT}). */
  value: number;
  /** Decimals it was written with, in the stored unit. */
  decimals: number;
  signed: boolean;
}

/** A sentence as plain text and figures. */
export type TextPart = string | TextFigure;

const NUMBER = String.raw`([+\-−]?\d+(?:\.\d+)?)`;
// The engine's formats, most specific first: `11.6 mm (0.46 in)`, `11.6 mm`, `58.0 psi`, `31.3 lb/h`, `126.2 L/h`,
// `300.0 kW`, `2.50°`. A figure must not run on from a word or a designation (e.g. `6PK1225`).
const FIGURE_PATTERN = new RegExp(
  String.raw`(?<![\w.])${NUMBER} (?:mm(?: \(${NUMBER} in\))?|(psi|lb/h|L/h|kW))(?![\w/])|(?<![\w.])${NUMBER}°`,
  'gu',
);
const UNIT_QUANTITY: Record<string, Quantity> = { psi: 'pressure', 'lb/h': 'mass-flow', 'L/h': 'volume-flow', kW: 'power' };

function readNumber(text: string): { value: number; decimals: number; signed: boolean } {
  const signed = text.startsWith('+');
  const normal = text.replace('−', '-').replace('+', '');
  const dot = normal.indexOf('.');
  return { value: Number(normal), decimals: dot < 0 ? 0 : normal.length - dot - 1, signed };
}

export interface TextPartsOptions {
  /**
   * Read only the engine's paired lengths (`72.3 mm (2.85 in)`) as figures and leave every other figure as written:
   * for words that hold a part's name as its maker prints it ("Heavy mount kit, 90 mm", "190 L/h lift pump"), where
   * a lone figure is part of the name, not a measurement to convert.
   */
  pairedLengthsOnly?: boolean;
}

/** Splits a sentence written by the engine into plain text and structured figures. */
export function textParts(text: string, options: TextPartsOptions = {}): TextPart[] {
  const parts: TextPart[] = [];
  let last = 0;
  for (const match of text.matchAll(FIGURE_PATTERN)) {
    const [whole, lengthOrOther, inches, otherUnit, degrees] = match;
    if (options.pairedLengthsOnly && inches === undefined) continue;
    const index = match.index ?? 0;
    if (index > last) parts.push(text.slice(last, index));
    if (degrees !== undefined) parts.push({ quantity: 'angle', ...readNumber(degrees) });
    else parts.push({ quantity: otherUnit ? UNIT_QUANTITY[otherUnit] : 'length', ...readNumber(lengthOrOther) });
    last = index + whole.length;
  }
  if (last < text.length) parts.push(text.slice(last));
  return parts;
}

/** Writes parts in the reader's system, each figure to the precision it was written with. */
export function renderText(parts: readonly TextPart[], system: UnitSystem): string {
  return parts.map((part) => (typeof part === 'string' ? part : formatQuantity(part.value, part.quantity, system, { decimals: part.decimals, signed: part.signed }))).join('');
}

/** The part of a finding its sentence is rendered from. */
export type FindingText = Pick<Finding, 'message'>;

/** The finding's sentence as structured parts (figures in their stored units). */
export function findingTextParts(finding: FindingText): TextPart[] {
  return textParts(finding.message);
}

/**
 * The finding's sentence in the reader's unit system: every figure in that system's units (a threshold it quotes
 * as the table shows it), inches first in inch mode, one minus sign. The stored report keeps the engine's own message.
 */
export function renderFindingText(finding: FindingText, system: UnitSystem): string {
  return renderText(findingTextParts(finding), system);
}

/** A remedy's note (or a fabrication's operation) in the reader's unit system. */
export function renderRemedyText(remedy: Remedy, system: UnitSystem): string {
  return renderText(textParts(remedy.note), system);
}
