import type { UnitSystem } from '@/types/api';

/**
 * 1 in = 25.4 mm exactly (NIST SP 811). Same figures as `inchesToMm` / `mmToInches` in
 * @swapwright/shared (a test keeps them equal); defined here because importing the shared
 * package's single entry point from the first chunk would bundle the whole fit engine into it.
 */
export const MM_PER_INCH = 25.4;
export const inchesToMm = (inches: number): number => inches * MM_PER_INCH;
export const mmToInches = (mm: number): number => mm / MM_PER_INCH;

/** Display precision: 0.01 in (finer than a 1/64 in rule) and 0.1 mm. */
export const lengthDecimals: Record<UnitSystem, number> = { in: 2, mm: 1 };

export const unitLabels: Record<UnitSystem, string> = { in: 'in', mm: 'mm' };

function round(value: number, decimals: number): number {
  const f = 10 ** decimals;
  return Math.round((value + Number.EPSILON) * f) / f;
}

/** mm (stored) → a number in the display unit, rounded to display precision. */
export function mmToDisplay(mm: number, system: UnitSystem): number {
  return round(system === 'in' ? mmToInches(mm) : mm, lengthDecimals[system]);
}

/** A number in the given unit → mm (stored), without rounding. */
export function displayToMm(value: number, system: UnitSystem): number {
  return system === 'in' ? inchesToMm(value) : value;
}

export function formatLength(mm: number | null | undefined, system: UnitSystem): string {
  if (mm === null || mm === undefined || Number.isNaN(mm)) return '—';
  const value = mmToDisplay(mm, system);
  const text = new Intl.NumberFormat('en-US', { maximumFractionDigits: lengthDecimals[system] }).format(value);
  return `${text} ${unitLabels[system]}`;
}

const LENGTH_PATTERN = /^\s*(-?\d+(?:[.,]\d+)?|-?[.,]\d+)\s*(in|inch|inches|"|″|mm|millimet(?:er|re)s?)?\s*$/i;

/**
 * Reads what a person typed: "12.5", "12.5 in", '12.5"', "317.5 mm". A bare number is taken
 * in the current unit. Returns mm, or null when the text is not a length.
 */
export function parseLength(input: string | number | null | undefined, system: UnitSystem): number | null {
  if (input === null || input === undefined || input === '') return null;
  if (typeof input === 'number') return Number.isFinite(input) ? displayToMm(input, system) : null;
  const match = LENGTH_PATTERN.exec(input);
  if (!match) return null;
  const value = Number(match[1].replace(',', '.'));
  const unit = match[2]?.toLowerCase();
  const given: UnitSystem = !unit ? system : unit.startsWith('m') ? 'mm' : 'in';
  return displayToMm(value, given);
}

/** Mechanical horsepower: 1 hp = 745.699 872 W (NIST SP 811). */
export const KW_PER_HP = 0.745699872;

export const kwToHp = (kw: number): number => kw / KW_PER_HP;
export const hpToKw = (hp: number): number => hp * KW_PER_HP;

/** Power in the unit people in that system usually quote: hp with inches, kW with millimetres. */
export function formatPower(kw: number | null | undefined, system: UnitSystem): string {
  if (kw === null || kw === undefined) return '—';
  return system === 'in' ? `${Math.round(kwToHp(kw))} hp (${Math.round(kw)} kW)` : `${Math.round(kw)} kW`;
}

export function formatMoneyCents(cents: number | null | undefined, currency = 'USD'): string {
  if (cents === null || cents === undefined) return '—';
  return new Intl.NumberFormat('en-US', { style: 'currency', currency }).format(cents / 100);
}
