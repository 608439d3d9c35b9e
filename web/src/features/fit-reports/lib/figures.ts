import { formatFindingFigure, type Finding, type FigureFormatOptions, type FigureUnit } from '@swapwright/shared';
import type { UnitsApi } from '@/hooks/use-units';

type Units = Pick<UnitsApi, 'system'>;

/**
 * A finding's figure in the person's unit system (shared's one formatting path: lengths, psi/kPa, lb/h/kg/h, hp/kW;
 * angles in degrees in both). `{ signed: true }` for a difference: "+4.53 in", "−4.50°".
 */
export function formatFigure(value: number | null | undefined, unit: FigureUnit, units: Units, options: Pick<FigureFormatOptions, 'signed'> = {}): string {
  if (value === null || value === undefined || Number.isNaN(value)) return '—';
  return formatFindingFigure(value, unit, units.system, options);
}

/** "at least 0.50 in", "at most 3.00°", "must match": the threshold at the same precision as the found figure and the margin. */
export function formatRequirement(finding: Pick<Finding, 'required' | 'limit' | 'unit'>, units: Units): string {
  if (finding.limit === 'match') return 'must match';
  if (finding.required === null) return '—';
  return `${finding.limit === 'max' ? 'at most' : 'at least'} ${formatFindingFigure(finding.required, finding.unit, units.system)}`;
}

/** The margin with a sign: "+0.25 in" or "−0.50 in" (one minus sign, U+2212, as every figure). */
export function formatMargin(finding: Pick<Finding, 'margin' | 'unit' | 'limit'>, units: Units): string {
  if (finding.margin === null || finding.limit === 'match') return '—';
  return formatFindingFigure(finding.margin, finding.unit, units.system, { signed: true });
}
