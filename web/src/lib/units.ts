import { formatLength as formatLengthAs, formatMoney, formatQuantity, inchesToMm, MINUS, mmToShownInches, parseLengthResult, textParts } from '@swapwright/shared';
import type { UnitSystem } from '@swapwright/shared';

export { MM_PER_INCH, hpToKw, inchesToMm, kwToHp, mmToInches } from '@swapwright/shared';

/** Display precision: 0.01 in (finer than a 1/64 in rule) and 0.1 mm. */
export const lengthDecimals: Record<UnitSystem, number> = { in: 2, mm: 1 };

export const unitLabels: Record<UnitSystem, string> = { in: 'in', mm: 'mm' };

function round(value: number, decimals: number): number {
  const f = 10 ** decimals;
  return Math.round((value + Number.EPSILON) * f) / f;
}

/** mm (stored) → a number in the display unit, rounded to display precision (inches as {@link formatLength} shows them). */
export function mmToDisplay(mm: number, system: UnitSystem): number {
  return round(system === 'in' ? mmToShownInches(mm) : mm, lengthDecimals[system]);
}

/** A number in the given unit → mm (stored), without rounding. */
export function displayToMm(value: number, system: UnitSystem): number {
  return system === 'in' ? inchesToMm(value) : value;
}

/** A stored length in the person's system, through shared's one formatting path (0.01 in or 0.1 mm, one minus sign). */
export function formatLength(mm: number | null | undefined, system: UnitSystem): string {
  if (mm === null || mm === undefined || Number.isNaN(mm)) return '—';
  return formatQuantity(mm, 'length', system);
}

/**
 * Words written with figures in them (a measurement point's name, how to measure it): every length, pressure and
 * flow in the person's system. These lengths say where to hold a tape, so in inch mode they read as a tape does, to
 * the nearest 1/16 in ("300 mm behind the axle" reads "11 13/16 in behind the axle"; 600 mm "23 5/8 in"), never as
 * decimals no tape shows. Source: NIST SP 811 (2008), Appendix B: 1 in = 25.4 mm exactly.
 */
export function renderFigures(text: string, system: UnitSystem): string {
  return textParts(text)
    .map((part) => {
      if (typeof part === 'string') return part;
      if (part.quantity === 'length' && system === 'in') return formatLengthAs(part.value, { unit: 'in', denominator: 16 }).replace('-', MINUS);
      return formatQuantity(part.value, part.quantity, system, { decimals: part.decimals, signed: part.signed });
    })
    .join('');
}

export type ReadResult = { ok: true; value: number } | { ok: false; message: string };

/**
 * Reads what a person typed ("12.5", "12 1/2 in", '12.5"', "317.5 mm", "317,5 mm") with the shared
 * parser. A bare number is taken in the current unit. Gives mm, or the parser's message saying what it could not read.
 */
export function readLength(input: string, system: UnitSystem): ReadResult {
  // A lone comma with no point is a decimal comma here ("317,5"), not a thousands separator.
  const text = !input.includes('.') && input.split(',').length === 2 ? input.replace(',', '.') : input;
  const result = parseLengthResult(text, system);
  return result.ok ? { ok: true, value: result.mm } : { ok: false, message: result.error.message };
}

/** Like {@link readLength}, for callers that only need the value: mm, or null when the text is not a length. */
export function parseLength(input: string | number | null | undefined, system: UnitSystem): number | null {
  if (input === null || input === undefined || input === '') return null;
  if (typeof input === 'number') return Number.isFinite(input) ? displayToMm(input, system) : null;
  const result = readLength(input, system);
  return result.ok ? result.value : null;
}

const ANGLE_PATTERN = /^([+-]?(?:\d+(?:[.,]\d*)?|[.,]\d+))\s*(?:°|deg|degrees?)?$/i;

/** Reads an angle in degrees: "2.5", "-1", "3°", "1.5 deg". */
export function readAngle(input: string): ReadResult {
  const trimmed = input.trim().replace('−', '-');
  if (trimmed === '') return { ok: false, message: 'Enter an angle in degrees, for example 2.5.' };
  const match = ANGLE_PATTERN.exec(trimmed);
  if (!match) return { ok: false, message: `"${input.trim()}" is not an angle: type degrees, for example 2.5 or -1.` };
  return { ok: true, value: Number(match[1].replace(',', '.')) };
}

/** Power in the unit people in that system quote: hp with inches, kW with millimetres (never both in one figure). */
export function formatPower(kw: number | null | undefined, system: UnitSystem): string {
  if (kw === null || kw === undefined) return '—';
  return formatQuantity(kw, 'power', system, { decimals: 0 });
}

/** Integer cents in the shop's currency, written as everywhere else (`formatMoney`: $5,131.91); a dash when there is none. */
export function formatMoneyCents(cents: number | null | undefined, currency = 'USD'): string {
  if (cents === null || cents === undefined) return '—';
  return formatMoney(cents, currency);
}
