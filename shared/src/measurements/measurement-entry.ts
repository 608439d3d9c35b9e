import { MM_PER_FOOT, MM_PER_INCH, parseLengthResult, type LengthUnit } from '../units/length';
import { MEASUREMENT_KIND_INFO, type MeasurementPointKind } from './measurement-points';

export type MeasurementEntryResult = { ok: true; value: number; unit: 'mm' | 'deg' } | { ok: false; message: string };

/** Upper bound of any reading on a vehicle chassis (10 m), so a slip of the thumb is refused, not stored. */
export const MAX_MEASUREMENT_MM = 10_000;
/** Angles are read against level; anything steeper than this is a misreading. */
export const MAX_MEASUREMENT_DEG = 45;

/** The 10 m bound in the unit the person reads in: `393.70 in` (1 in = 25.4 mm), `32.81 ft`, `10 m`. */
function readingBound(unit: LengthUnit): string {
  if (unit === 'in') return `${(MAX_MEASUREMENT_MM / MM_PER_INCH).toFixed(2)} in`;
  if (unit === 'ft') return `${(MAX_MEASUREMENT_MM / MM_PER_FOOT).toFixed(2)} ft`;
  return `${MAX_MEASUREMENT_MM / 1000} m`;
}

const ANGLE_PATTERN = /^([+-]?(?:\d+(?:\.\d*)?|\.\d+))\s*(°|deg|degs|degree|degrees)?$/i;

/**
 * Reads what a person typed for a point: a length (`12 1/2"`, `12.5 in`, `317.5 mm`, or a bare number in
 * `defaultUnit`) in millimetres, or an angle (`2.5`, `-1.5°`, `3 deg`) in degrees.
 */
export function parseMeasurementEntry(text: string, kind: MeasurementPointKind, defaultUnit: LengthUnit = 'mm'): MeasurementEntryResult {
  const info = MEASUREMENT_KIND_INFO[kind];
  const input = String(text ?? '').trim();
  if (info.quantity === 'angle') {
    const match = ANGLE_PATTERN.exec(input);
    if (!match) return { ok: false, message: `"${input}" is not an angle: enter degrees, for example 2.5 or -1.5°.` };
    const value = Number(match[1]);
    if (Math.abs(value) > MAX_MEASUREMENT_DEG) return { ok: false, message: `${value}° is steeper than any part of a chassis sits; read the angle finder again (at most ±${MAX_MEASUREMENT_DEG}°).` };
    return { ok: true, value, unit: 'deg' };
  }
  const parsed = parseLengthResult(input, defaultUnit);
  if (!parsed.ok) return { ok: false, message: parsed.error.message };
  const min = info.reference === 'floor' || info.reference === 'across' ? 0 : -MAX_MEASUREMENT_MM;
  if (parsed.mm < min || parsed.mm > MAX_MEASUREMENT_MM) {
    return {
      ok: false,
      message:
        min === 0
          ? `A reading here is between 0 and ${readingBound(defaultUnit)}; "${input}" is not.`
          : `A reading here is within ${readingBound(defaultUnit)} of the front axle line; "${input}" is not.`,
    };
  }
  return { ok: true, value: Math.round(parsed.mm * 100) / 100, unit: 'mm' };
}
