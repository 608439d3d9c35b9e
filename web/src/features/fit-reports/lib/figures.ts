import type { Finding, FigureUnit } from '@swapwright/shared';
import type { UnitsApi } from '@/hooks/use-units';

const plainUnits: Partial<Record<FigureUnit, string>> = {
  deg: '°',
  rpm: ' rpm',
  'lb/h': ' lb/h',
  'cc/min': ' cc/min',
  'L/h': ' L/h',
  psi: ' psi',
  kW: ' kW',
  count: '',
  none: '',
};

const decimalsFor: Partial<Record<FigureUnit, number>> = { deg: 2, rpm: 0, count: 0, psi: 1, kW: 0 };

/** A finding's figure in the person's units: lengths in inches or mm, the rest as the engine gives them. */
export function formatFigure(value: number | null | undefined, unit: FigureUnit, units: Pick<UnitsApi, 'formatLength'>): string {
  if (value === null || value === undefined || Number.isNaN(value)) return '—';
  if (unit === 'mm') return units.formatLength(value);
  const decimals = decimalsFor[unit] ?? 1;
  const text = new Intl.NumberFormat('en-US', { maximumFractionDigits: decimals }).format(value);
  return `${text}${plainUnits[unit] ?? ''}`;
}

/** "at least 0.5 in", "at most 3°", "must match". */
export function formatRequirement(finding: Pick<Finding, 'required' | 'limit' | 'unit'>, units: Pick<UnitsApi, 'formatLength'>): string {
  if (finding.limit === 'match') return 'must match';
  if (finding.required === null) return '—';
  return `${finding.limit === 'max' ? 'at most' : 'at least'} ${formatFigure(finding.required, finding.unit, units)}`;
}

/** The margin with a sign: "+0.25 in" or "−0.5 in". */
export function formatMargin(finding: Pick<Finding, 'margin' | 'unit' | 'limit'>, units: Pick<UnitsApi, 'formatLength'>): string {
  if (finding.margin === null || finding.limit === 'match') return '—';
  const text = formatFigure(Math.abs(finding.margin), finding.unit, units);
  if (Math.abs(finding.margin) < 1e-9) return text;
  return finding.margin < 0 ? `−${text}` : `+${text}`;
}
