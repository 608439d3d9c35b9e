import { mmToShownInches } from './length';

export interface MmWithInchesOptions {
  /** Decimals for the millimetres (default 1); the inches get one more, at least 2. */
  decimals?: number;
  /** Prefix positive figures with `+` (for differences). */
  signed?: boolean;
}

/** Fixed decimals with a plain ASCII minus, never `-0.0`. */
function fixed(value: number, decimals: number, signed: boolean): string {
  const text = value.toFixed(decimals);
  if (/^-0(\.0*)?$/.test(text)) return text.slice(1);
  return signed && !text.startsWith('-') && Number(text) !== 0 ? `+${text}` : text;
}

/**
 * The one way a length is written in a finding's message or remedy note: `11.6 mm (0.46 in)`,
 * millimetres to 0.1 and decimal inches to 0.01 (from the millimetres as written: {@link mmToShownInches}), so a shop
 * working in either reads it directly and both halves name the same length.
 * Negative figures use a plain ASCII minus in both units.
 */
export function mmWithInches(mm: number, options: MmWithInchesOptions = {}): string {
  if (!Number.isFinite(mm)) throw new RangeError(`Cannot format a length of ${mm}.`);
  const decimals = options.decimals ?? 1;
  const signed = options.signed ?? false;
  return `${fixed(mm, decimals, signed)} mm (${fixed(mmToShownInches(mm, decimals), Math.max(2, decimals + 1), signed)} in)`;
}

/** A range of lengths: `6.0 mm (0.24 in) to 10.0 mm (0.39 in)`. */
export function mmRangeWithInches(minMm: number, maxMm: number, options: MmWithInchesOptions = {}): string {
  return `${mmWithInches(minMm, options)} to ${mmWithInches(maxMm, options)}`;
}

export interface FigureOptions {
  /** Decimals shown (default 1). */
  decimals?: number;
  /** Prefix positive figures with `+` (for differences). */
  signed?: boolean;
  /** Round up instead of to nearest: for "at least" figures, so the text never asks for less than the rule. */
  roundUp?: boolean;
}

/**
 * A non-length figure in a message or remedy note, e.g. `137.5 L/h`, `31.3 lb/h`, `58.0 psi`: one decimal
 * unless told otherwise, a plain ASCII minus, and the same rounding wherever the quantity appears.
 */
export function formatFigure(value: number, unit: string, options: FigureOptions = {}): string {
  if (!Number.isFinite(value)) throw new RangeError(`Cannot format a figure of ${value}.`);
  const decimals = options.decimals ?? 1;
  const rounded = options.roundUp ? roundUpTo(value, decimals) : value;
  return `${fixed(rounded, decimals, options.signed ?? false)} ${unit}`;
}

/** Rounds up to `decimals` places, ignoring floating-point dust (31.25000001 → 31.3, not 31.4). */
export function roundUpTo(value: number, decimals: number): number {
  const scale = 10 ** decimals;
  return Math.ceil(Number((value * scale).toFixed(6))) / scale;
}

export function formatDegrees(value: number, decimals = 2): string {
  return `${value.toFixed(decimals)}°`;
}
