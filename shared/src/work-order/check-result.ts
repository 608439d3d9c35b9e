import type { CheckResult } from '../types/value-lists';

/** The allowed range of a measured check; either end may be open. */
export interface CheckRange {
  min: number | null;
  max: number | null;
}

/** A measured value passes when it lies within its range, both ends included; outside either end it fails. */
export function measuredCheckResult(value: number, range: CheckRange): CheckResult {
  if (!Number.isFinite(value)) return 'fail';
  if (range.min !== null && value < range.min) return 'fail';
  if (range.max !== null && value > range.max) return 'fail';
  return 'pass';
}

/** The range in words, e.g. "6–10 mm", "at least 13 mm", "at most 62 psi". */
export function describeRange(range: CheckRange, unit: string | null): string {
  const u = unit ? ` ${unit}` : '';
  if (range.min !== null && range.max !== null) return `${range.min}–${range.max}${u}`;
  if (range.min !== null) return `at least ${range.min}${u}`;
  if (range.max !== null) return `at most ${range.max}${u}`;
  return 'no range';
}
