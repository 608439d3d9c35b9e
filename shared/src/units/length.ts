export const MM_PER_INCH = 25.4;
export const MM_PER_FOOT = 304.8;

export function inchesToMm(inches: number): number {
  return inches * MM_PER_INCH;
}

export function mmToInches(mm: number): number {
  return mm / MM_PER_INCH;
}

/** Rounds to `decimals` places, half away from zero, so a negative figure rounds to the same size as its absolute value. */
export function roundHalfAway(value: number, decimals: number): number {
  const size = Number(Math.abs(value).toFixed(decimals));
  return value < 0 ? -size : size;
}

/**
 * The inches a length is shown as, the one rule for every inch figure a person reads: the millimetres are first
 * rounded to the precision they are shown with in millimetres (`mmDecimals`, 0.1 mm by default), then converted
 * (1 in = 25.4 mm exactly). A figure, the limit it is held against and their margin are all rounded to the same
 * 0.1 mm before conversion, so the same stored length always reads the same in a table, a sentence, a drawing or a
 * remedy (97.43 mm and the 97.4 mm written in a sentence both read 3.83 in), and found − needed = margin holds in
 * inches within the last digit. The caller rounds the result to its inch decimals.
 */
export function mmToShownInches(mm: number, mmDecimals = 1): number {
  return mmToInches(roundHalfAway(mm, mmDecimals));
}

export type LengthUnit = 'mm' | 'cm' | 'in' | 'ft';

const MM_PER_UNIT: Record<LengthUnit, number> = { mm: 1, cm: 10, in: MM_PER_INCH, ft: MM_PER_FOOT };

export function lengthToMm(value: number, unit: LengthUnit): number {
  return value * MM_PER_UNIT[unit];
}

export function mmToLength(mm: number, unit: LengthUnit): number {
  return mm / MM_PER_UNIT[unit];
}

export type LengthParseErrorCode = 'empty' | 'not-a-number' | 'unknown-unit' | 'zero-denominator' | 'not-finite';

export class LengthParseError extends Error {
  constructor(
    readonly code: LengthParseErrorCode,
    readonly input: string,
    message: string,
  ) {
    super(message);
    this.name = 'LengthParseError';
  }
}

const UNIT_WORDS: Record<string, LengthUnit> = {
  mm: 'mm',
  millimeter: 'mm',
  millimeters: 'mm',
  millimetre: 'mm',
  millimetres: 'mm',
  cm: 'cm',
  centimeter: 'cm',
  centimeters: 'cm',
  centimetre: 'cm',
  centimetres: 'cm',
  in: 'in',
  'in.': 'in',
  inch: 'in',
  inches: 'in',
  '"': 'in',
  '″': 'in',
  "''": 'in',
  ft: 'ft',
  'ft.': 'ft',
  foot: 'ft',
  feet: 'ft',
  "'": 'ft',
  '′': 'ft',
};

// Optional sign, then a whole number with an optional fraction ("12 1/2", "12-1/2"), a bare fraction ("1/2"),
// or a decimal ("12.5", ".5"); then an optional unit.
const LENGTH_PATTERN =
  /^([+-]?)\s*(?:(\d+)(?:\s+|-)(\d+)\s*\/\s*(\d+)|(\d+)\s*\/\s*(\d+)|(\d+(?:\.\d*)?|\.\d+))\s*(.*)$/;

export type LengthParseResult = { ok: true; mm: number } | { ok: false; error: LengthParseError };

/**
 * Reads a length typed by a person: `12.5 in`, `12 1/2"`, `12-1/2 in`, `318 mm`, `31.8 cm`, `2 ft`,
 * or a bare number in `defaultUnit`. Returns millimetres; throws {@link LengthParseError} on nonsense.
 */
export function parseLength(text: string, defaultUnit: LengthUnit = 'mm'): number {
  const result = parseLengthResult(text, defaultUnit);
  if (!result.ok) throw result.error;
  return result.mm;
}

export function parseLengthResult(text: string, defaultUnit: LengthUnit = 'mm'): LengthParseResult {
  const input = String(text ?? '');
  const trimmed = input.trim().replace(/,/g, '');
  const fail = (code: LengthParseErrorCode, message: string): LengthParseResult => ({
    ok: false,
    error: new LengthParseError(code, input, message),
  });
  if (trimmed === '') return fail('empty', 'Enter a length, for example 12 1/2 in or 318 mm.');
  const match = LENGTH_PATTERN.exec(trimmed);
  if (!match) return fail('not-a-number', `"${input}" is not a length: use a number with a unit, for example 12 1/2 in or 318 mm.`);
  const [, sign, whole, num, den, bareNum, bareDen, decimal, unitText] = match;
  let value: number;
  if (whole !== undefined) {
    if (Number(den) === 0) return fail('zero-denominator', `"${input}" has a fraction with a zero denominator.`);
    value = Number(whole) + Number(num) / Number(den);
  } else if (bareNum !== undefined) {
    if (Number(bareDen) === 0) return fail('zero-denominator', `"${input}" has a fraction with a zero denominator.`);
    value = Number(bareNum) / Number(bareDen);
  } else {
    value = Number(decimal);
  }
  const unitKey = unitText.trim().toLowerCase();
  const unit = unitKey === '' ? defaultUnit : UNIT_WORDS[unitKey];
  if (unit === undefined) return fail('unknown-unit', `"${unitText.trim()}" is not a length unit: use in, ", mm, cm or ft.`);
  const mm = (sign === '-' ? -value : value) * MM_PER_UNIT[unit];
  if (!Number.isFinite(mm)) return fail('not-finite', `"${input}" is too large.`);
  return { ok: true, mm };
}

export interface FormatLengthOptions {
  unit: 'in' | 'mm';
  /** Inches only: `fraction` rounds to 1/`denominator` (default 16), `decimal` to `decimals` places. */
  style?: 'fraction' | 'decimal';
  denominator?: number;
  /** Decimal places (default: 2 for inches, 1 for millimetres). */
  decimals?: number;
}

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

/** `317.5` → `12 1/2 in` (fraction), `12.50 in` (decimal) or `317.5 mm`. */
export function formatLength(mm: number, options: FormatLengthOptions): string {
  if (!Number.isFinite(mm)) throw new RangeError(`Cannot format a length of ${mm}.`);
  if (options.unit === 'mm') return `${trimNegativeZero(mm.toFixed(options.decimals ?? 1))} mm`;
  const inches = mmToInches(mm);
  if (options.style === 'decimal') return `${trimNegativeZero(inches.toFixed(options.decimals ?? 2))} in`;
  const denominator = options.denominator ?? 16;
  if (!Number.isInteger(denominator) || denominator < 1) throw new RangeError('The denominator must be a positive whole number.');
  const steps = Math.round(Math.abs(inches) * denominator);
  const sign = inches < 0 && steps > 0 ? '-' : '';
  const whole = Math.floor(steps / denominator);
  const rest = steps % denominator;
  if (rest === 0) return `${sign}${whole} in`;
  const divisor = gcd(rest, denominator);
  const fraction = `${rest / divisor}/${denominator / divisor}`;
  return whole === 0 ? `${sign}${fraction} in` : `${sign}${whole} ${fraction} in`;
}

function trimNegativeZero(text: string): string {
  return /^-0(\.0*)?$/.test(text) ? text.slice(1) : text;
}
