import { formatQuantity, type UnitSystem } from '@swapwright/shared';
import { readLength } from '@/lib/units';
import type { WorkCheck } from '../types';

/** A measured check whose figures are lengths: stored in mm, shown and typed in the person's units. */
export function isLengthCheck(check: Pick<WorkCheck, 'unit'>): boolean {
  return check.unit === 'mm';
}

/** The decimals a stored millimetre figure was set with (13 → 0, 12.7 → 1, 6.35 → 2), so none is rounded away. */
function ownDecimals(mm: number): number {
  for (let decimals = 0; decimals < 2; decimals += 1) if (Math.abs(Number(mm.toFixed(decimals)) - mm) < 1e-9) return decimals;
  return 2;
}

/**
 * A check's length in the person's units at its own precision: 12.7 mm reads "12.7 mm" or "0.50 in" (never "13 mm"),
 * 14 mm reads "14 mm" or "0.55 in". Inches go through shared's one path (0.01 in, or 0.001 in for a figure set to
 * 0.01 mm).
 */
export function formatCheckLength(mm: number, system: UnitSystem): string {
  return formatQuantity(mm, 'length', system, { decimals: ownDecimals(mm) });
}

/** The allowed range in the person's units: "at least 0.50 in", "0.24–0.39 in", "6–10 mm"; other units as the API words them. */
export function allowedRange(check: Pick<WorkCheck, 'unit' | 'min' | 'max' | 'range'>, system: UnitSystem): string {
  if (!isLengthCheck(check)) return check.range ?? 'no range';
  const unit = system === 'in' ? ' in' : ' mm';
  const figure = (mm: number) => formatCheckLength(mm, system);
  if (check.min !== null && check.max !== null) return `${figure(check.min).slice(0, -unit.length)}–${figure(check.max)}`;
  if (check.min !== null) return `at least ${figure(check.min)}`;
  if (check.max !== null) return `at most ${figure(check.max)}`;
  return check.range ?? 'no range';
}

export type CheckReading = { ok: true; mm: number } | { ok: false; message: string } | { ok: null };

/**
 * Reads what the bay typed for a length check with the same parser as the measurement sheet: `1/2"`, `12 1/2 in`,
 * `13 mm`, or a bare number in the person's units. Kept to 0.01 mm, as the sheet keeps its readings.
 */
export function readCheckLength(text: string, system: UnitSystem): CheckReading {
  if (text.trim() === '') return { ok: null };
  const result = readLength(text, system);
  if (!result.ok) return result;
  return { ok: true, mm: Math.round(result.value * 100) / 100 };
}
