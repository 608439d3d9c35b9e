import { formatLength as formatLengthAs, formatQuantity, MM_PER_INCH, parseMeasurementEntry } from '@swapwright/shared';
import { displayToMm, mmToDisplay } from '@/lib/units';
import type { MeasurementEvent, MeasurementPhoto, MeasurementPoint, MeasurementSheet, MeasurementValue, SetMeasurementValueBody } from '../types';

export type UnitSystem = 'in' | 'mm';

/** Which points the sheet lists. */
export const SHEET_FILTERS = ['missing', 'flagged', 'measured', 'all'] as const;
export type SheetFilter = (typeof SHEET_FILTERS)[number];

/** One point of the sheet with everything recorded against it. */
export interface SheetRow {
  point: MeasurementPoint;
  value: MeasurementValue | null;
  /** Required and not yet measured. */
  missing: boolean;
  /** Measured further from the catalog than the shop's limit. */
  flagged: boolean;
  photos: MeasurementPhoto[];
  /** Newest first. */
  history: MeasurementEvent[];
}

export function sheetRows(sheet: MeasurementSheet): SheetRow[] {
  const values = new Map(sheet.values.map((v) => [v.pointId, v]));
  const missing = new Set(sheet.missing);
  return sheet.points.map((point) => {
    const value = values.get(point.id) ?? null;
    return {
      point,
      value,
      missing: missing.has(point.id),
      flagged: value?.flagged ?? false,
      photos: sheet.photos.filter((p) => p.pointId === point.id),
      history: sheet.history.filter((e) => e.kind === 'value' && e.pointId === point.id),
    };
  });
}

export interface SheetCounts {
  total: number;
  required: number;
  /** Required points with a reading. */
  requiredMeasured: number;
  missing: number;
  measured: number;
  flagged: number;
}

export function sheetCounts(rows: readonly SheetRow[]): SheetCounts {
  const required = rows.filter((r) => r.point.required);
  return {
    total: rows.length,
    required: required.length,
    requiredMeasured: required.filter((r) => r.value !== null).length,
    missing: rows.filter((r) => r.missing).length,
    measured: rows.filter((r) => r.value !== null).length,
    flagged: rows.filter((r) => r.flagged).length,
  };
}

/**
 * The rows a list shows, in sheet order. `keep` holds points saved since the list was chosen: they stay where they
 * were (a reading just saved leaves the Missing list only when the list is changed), so their photo can follow.
 */
export function filterRows(rows: readonly SheetRow[], filter: SheetFilter, keep: ReadonlySet<string> = new Set()): SheetRow[] {
  const inList = (r: SheetRow): boolean => {
    switch (filter) {
      case 'missing':
        return r.missing;
      case 'flagged':
        return r.flagged;
      case 'measured':
        return r.value !== null;
      default:
        return true;
    }
  };
  return rows.filter((r) => inList(r) || keep.has(r.point.id));
}

/** The list to open on: what is still missing while anything is, else everything. */
export function initialFilter(counts: SheetCounts): SheetFilter {
  return counts.missing > 0 ? 'missing' : 'all';
}

export type EntryReading = { ok: true; value: number; unit: 'mm' | 'deg' } | { ok: false; message: string } | { ok: null };

/**
 * Reads what was typed for a point with the same parser the API uses: `12 1/2"`, `12.5 in`, `318 mm`, or a bare
 * number in the person's unit; degrees for an angle. `{ ok: null }` while the box is empty.
 */
export function readEntry(text: string, point: Pick<MeasurementPoint, 'kind'>, system: UnitSystem): EntryReading {
  if (text.trim() === '') return { ok: null };
  // a lone comma with no point is a decimal comma ("317,5")
  const normalised = !text.includes('.') && text.split(',').length === 2 ? text.replace(',', '.') : text;
  return parseMeasurementEntry(normalised, point.kind, system);
}

/**
 * A length reading more than five times or less than a fifth of what the catalog gives is a slip of the unit rather
 * than a tired or modified truck: millimetres read as inches are 25.4 times too large, inches as millimetres 25.4
 * times too small, feet for inches 12 times (NIST SP 811 (2008) B.8). The sheet says so before it is saved. The factor
 * of five is common practice (no published source): no sag, lift or bent rail moves a point that far. Angles are left
 * alone (a few degrees either way is normal).
 */
export function unitSlip(reading: EntryReading, point: Pick<MeasurementPoint, 'catalogValue'>): boolean {
  if (reading.ok !== true || reading.unit !== 'mm') return false;
  const catalog = point.catalogValue;
  if (catalog === null || catalog <= 0 || reading.value <= 0) return false;
  const ratio = reading.value / catalog;
  return ratio > 5 || ratio < 0.2;
}

/** A change to a signed-off sheet needs a reason (the API refuses it without one). */
export function needsReason(sheet: Pick<MeasurementSheet, 'signedOffAt'>): boolean {
  return sheet.signedOffAt !== null;
}

/** The shortest reason the API takes. */
export const MIN_REASON_LENGTH = 3;

export function reasonProblem(reason: string): string | null {
  return reason.trim().length >= MIN_REASON_LENGTH ? null : `Say in a few words why the reading changes (at least ${MIN_REASON_LENGTH} characters).`;
}

/**
 * What the value route takes for a reading that `readEntry` accepted: the figure in mm (or degrees) as read, and the
 * version of the reading it was typed over (`seenVersion`, 0 for none), so it never replaces one the person did not see.
 */
export function valueBody(
  reading: { value: number },
  extras: { toleranceMm?: number | null; note?: string; reason?: string; seenVersion?: number } = {},
): SetMeasurementValueBody {
  return {
    value: String(reading.value),
    unit: 'mm',
    ...(extras.seenVersion !== undefined && { seenVersion: extras.seenVersion }),
    ...(extras.toleranceMm !== undefined && extras.toleranceMm !== null && { tolerance: String(extras.toleranceMm) }),
    ...(extras.note?.trim() && { note: extras.note.trim() }),
    ...(extras.reason?.trim() && { reason: extras.reason.trim() }),
  };
}

/** Who signed the sheet off and when (the newest sign-off in the history). */
export function signOffEvent(sheet: Pick<MeasurementSheet, 'history'>): MeasurementEvent | null {
  return sheet.history.find((e) => e.kind === 'sign-off') ?? null;
}

/** Photos not tied to a point (a general view, or a customer's before the truck arrived). */
export function generalPhotos(sheet: Pick<MeasurementSheet, 'photos' | 'points'>): MeasurementPhoto[] {
  const ids = new Set(sheet.points.map((p) => p.id));
  return sheet.photos.filter((p) => p.pointId === null || !ids.has(p.pointId));
}

/** A stored reading for people: a length in their unit, an angle in degrees. */
export function formatReading(value: number | null | undefined, unit: 'mm' | 'deg', formatLength: (mm: number) => string): string {
  if (value === null || value === undefined) return '—';
  if (unit === 'deg') return `${Math.round(value * 100) / 100}°`;
  return formatLength(value);
}

/** Half the 0.01 mm a reading is kept to: a tolerance this close to a whole 1/64 in was typed as that fraction. */
const KEPT_TO_HALF_MM = 0.0051;

/**
 * A reading's ± tolerance for people. In inches a tolerance typed as a tape fraction reads as that fraction (1/8 in,
 * kept as 3.18 mm, reads "1/8 in", never "0.13 in"); any other reads to 0.001 in, fine enough for a feeler gauge
 * (3 mm reads "0.118 in"). In millimetres and degrees as the reading itself.
 * Source: NIST SP 811 (2008), Appendix B: 1 in = 25.4 mm exactly; 1/64 in = 0.396875 mm.
 */
export function formatTolerance(value: number, unit: 'mm' | 'deg', system: UnitSystem, formatLength: (mm: number) => string): string {
  if (unit === 'deg' || system !== 'in') return formatReading(value, unit, formatLength);
  const sixtyFourths = Math.round((Math.abs(value) / MM_PER_INCH) * 64);
  if (sixtyFourths > 0 && Math.abs((sixtyFourths * MM_PER_INCH) / 64 - Math.abs(value)) <= KEPT_TO_HALF_MM) {
    return formatLengthAs(Math.abs(value), { unit: 'in', denominator: 64 });
  }
  return formatQuantity(Math.abs(value), 'length', 'in', { decimals: 2 });
}

/** A signed difference for people: "+3 mm", "−1.2°" (in their unit for lengths). */
export function formatDeviation(value: number, unit: 'mm' | 'deg', formatLength: (mm: number) => string): string {
  const sign = value > 0 ? '+' : value < 0 ? '−' : '±';
  return `${sign}${formatReading(Math.abs(value), unit, formatLength)}`;
}

/** A reading beside the figure it is compared with, each as the sheet shows it. */
export interface ReadingComparison {
  /**
   * What the tape should show on this truck: the catalog's figure, moved by the measured ride height for a height
   * read from the floor (a truck sitting lower reads every floor height lower without anything being bent).
   */
  expected: number;
  /** The expected figure shows differently from the catalog's (the ride height moved it by a shown step or more). */
  movedByRideHeight: boolean;
  /** Reading minus expected as shown ("−0.05 in"): the two shown figures subtracted, so a reader's check agrees. */
  difference: string;
}

/**
 * Compares a stored reading with what the catalog predicts for this truck. The API keeps readings to 0.01 mm and
 * measures the difference in mm; the sheet shows 0.01 in (or 0.1 mm, 0.01°). Subtracting the rounded figures rather
 * than rounding the difference keeps "reading − expected = difference" true to the last digit shown.
 */
export function compareReading(
  value: Pick<MeasurementValue, 'value' | 'deviation'>,
  point: Pick<MeasurementPoint, 'unit' | 'catalogValue'>,
  system: UnitSystem,
  formatLength: (mm: number) => string,
): ReadingComparison | null {
  if (value.deviation === null) return null;
  const expected = value.value - value.deviation;
  const decimals = point.unit === 'deg' ? 2 : system === 'in' ? 2 : 1;
  const f = 10 ** decimals;
  const shown = (v: number): number => (point.unit === 'deg' ? Math.round(v * f) / f : mmToDisplay(v, system));
  const diff = Math.round((shown(value.value) - shown(expected)) * f) / f;
  const sign = diff > 0 ? '+' : diff < 0 ? '−' : '±';
  const size = point.unit === 'deg' ? `${Math.abs(diff)}°` : formatLength(displayToMm(Math.abs(diff), system));
  return {
    expected,
    movedByRideHeight: point.catalogValue !== null && shown(expected) !== shown(point.catalogValue),
    difference: `${sign}${size}`,
  };
}
