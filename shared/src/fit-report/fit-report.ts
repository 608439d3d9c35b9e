import { ENVELOPE_CHECKS } from '../checks/envelope';
import { MOUNT_CHECKS } from '../checks/mounts/engine-mounts';
import { SYSTEM_CHECKS } from '../checks/system-checks';
import { TRANSMISSION_MOUNT_CHECKS } from '../checks/transmission-mount';
import { sharedCheckContext, type CheckContext, type CheckDefinition } from '../checks/check-definition';
import { resolveFitSettings, type FitSettings } from '../settings/fit-settings';
import { STATUS_SEVERITY, type CheckStatus, type FigureUnit, type Finding } from '../types/finding';
import type { FitSpec, Placement } from '../types/fit-spec';

/** Bumped whenever a rule or its arithmetic changes, so a stored report says which engine made it. */
export const FIT_ENGINE_VERSION = '1.0.0';

/** The geometric checks owned by the fit engine: clearances, mounts and the transmission mount. */
export const GEOMETRIC_CHECKS: CheckDefinition[] = [...ENVELOPE_CHECKS, ...MOUNT_CHECKS, ...TRANSMISSION_MOUNT_CHECKS];

/** Every check of one fit run, geometric first. */
export function allChecks(): CheckDefinition[] {
  return [...GEOMETRIC_CHECKS, ...SYSTEM_CHECKS];
}

export interface FitReportSummary {
  total: number;
  ok: number;
  tight: number;
  fails: number;
  unknown: number;
}

export interface FitReport {
  engineVersion: string;
  placement: Placement;
  /** The thresholds the report was computed with (defaults plus the shop's overrides). */
  settings: FitSettings;
  findings: Finding[];
  /** Every `tight` or `fails` finding, worst first. */
  shortfalls: Finding[];
  summary: FitReportSummary;
  /** The planning-aid sentence every report carries. */
  caution: string;
  /** Safety cautions for the work the shortfalls lead to. */
  safety: string[];
}

export const FIT_REPORT_CAUTION =
  'This report is a planning aid worked out from the figures entered: measure the vehicle yourself before cutting, welding or ordering parts, ' +
  'and follow local codes, emissions and registration rules and licensed practice. Never work under a vehicle held only by a jack: ' +
  'support it on rated stands on firm ground, and keep clear of an engine hanging from a hoist.';

export const FIT_REPORT_SAFETY: string[] = [
  'Lifting an engine: use a rated hoist and load leveller, chain to the engine\'s lifting points, and never put hands or body under a suspended engine.',
  'Supporting a vehicle: chock the wheels and use rated axle stands on firm, level ground; a jack is only for lifting.',
  'Fuel system work: relieve fuel pressure first, work outdoors or with ventilation, no sparks or flames, and keep an extinguisher at hand.',
  'Welding or cutting on a frame: structural work for a qualified welder; disconnect the battery and shield fuel and brake lines.',
  'Steering and brake changes: use parts made for the purpose and have them inspected before the vehicle is driven.',
];

/** Margin relative to its limit, for ordering shortfalls of different units. */
export function relativeMargin(f: Finding): number {
  if (f.margin === null) return 0;
  const scale = Math.max(Math.abs(f.required ?? 0), 1);
  return f.margin / scale;
}

/** Fails before tight, then the smallest relative margin first; ties by check id for a stable order. */
export function compareShortfalls(a: Finding, b: Finding): number {
  return STATUS_SEVERITY[b.status] - STATUS_SEVERITY[a.status] || relativeMargin(a) - relativeMargin(b) || a.checkId.localeCompare(b.checkId);
}

export function summarize(findings: readonly Finding[]): FitReportSummary {
  const summary: FitReportSummary = { total: findings.length, ok: 0, tight: 0, fails: 0, unknown: 0 };
  for (const f of findings) summary[f.status] += 1;
  return summary;
}

/** The most severe status present in a summary (`ok` for an empty report). */
export function worstStatus(summary: FitReportSummary): CheckStatus {
  const present = (Object.keys(STATUS_SEVERITY) as CheckStatus[]).filter((status) => summary[status] > 0);
  return present.reduce<CheckStatus>((worst, status) => (STATUS_SEVERITY[status] > STATUS_SEVERITY[worst] ? status : worst), 'ok');
}

function runOne(check: CheckDefinition, context: CheckContext): Finding {
  try {
    return check.run(context);
  } catch (error) {
    // One broken rule must not hide the others: report it as unknown with the reason.
    return {
      checkId: check.id,
      group: check.group,
      title: check.title,
      status: 'unknown',
      measured: null,
      required: null,
      margin: null,
      limit: 'min',
      unit: 'none',
      message: `This check could not be computed from the figures given (${error instanceof Error ? error.message : String(error)}).`,
      missing: [],
      remedies: [],
      thresholdSource: '',
    };
  }
}

/** Runs every envelope, mount and transmission-mount check and the system checks on one placement. */
export function runFitCheck(spec: FitSpec, settings?: Partial<FitSettings>): FitReport {
  const resolved = resolveFitSettings(settings);
  // One context for every check: the candidate pans several checks offer are judged once per run.
  const context = sharedCheckContext(spec, resolved);
  const findings = allChecks().map((check) => runOne(check, context));
  const shortfalls = findings.filter((f) => f.status === 'tight' || f.status === 'fails').sort(compareShortfalls);
  return {
    engineVersion: FIT_ENGINE_VERSION,
    placement: { ...spec.placement },
    settings: resolved,
    findings,
    shortfalls,
    summary: summarize(findings),
    caution: FIT_REPORT_CAUTION,
    safety: FIT_REPORT_SAFETY,
  };
}

export type CheckChange = 'improved' | 'worse' | 'same' | 'added' | 'removed';

export interface FindingDelta {
  checkId: string;
  title: string;
  /**
   * The unit of this check's figures (measured, margin and `marginDelta`), as its findings carry it: `deg` for a
   * U-joint angle, `psi` for a fuel pressure, `mm` for a clearance. The newer report's when both have the check.
   */
  unit: FigureUnit;
  before: { status: CheckStatus; measured: number | null; margin: number | null } | null;
  after: { status: CheckStatus; measured: number | null; margin: number | null } | null;
  change: CheckChange;
  statusChanged: boolean;
  /**
   * after.margin − before.margin, in `unit`, when both are known and are figures against a limit in the same unit;
   * null otherwise (the margin of a must-match rule is a flag, not a figure, and the report shows none for it).
   */
  marginDelta: number | null;
}

/** A margin difference worth stating: both margins known, both against a min/max limit, in the same unit. */
function figureMarginDelta(fa: Finding, fb: Finding): number | null {
  if (fa.margin === null || fb.margin === null) return null;
  if (fa.unit !== fb.unit || fa.limit === 'match' || fb.limit === 'match') return null;
  return fb.margin - fa.margin;
}

/** Per-check differences between two reports (b relative to a), in a's order then checks only b has. */
export function compareFitReports(a: FitReport, b: FitReport): FindingDelta[] {
  const byId = new Map(b.findings.map((f) => [f.checkId, f]));
  const seen = new Set<string>();
  const pick = (f: Finding) => ({ status: f.status, measured: f.measured, margin: f.margin });
  const out: FindingDelta[] = [];
  for (const fa of a.findings) {
    seen.add(fa.checkId);
    const fb = byId.get(fa.checkId);
    if (!fb) {
      out.push({ checkId: fa.checkId, title: fa.title, unit: fa.unit, before: pick(fa), after: null, change: 'removed', statusChanged: true, marginDelta: null });
      continue;
    }
    // The change is judged on the raw margins (a must-match rule's margin still orders its outcomes).
    const rawDelta = fa.margin !== null && fb.margin !== null ? fb.margin - fa.margin : null;
    const sevA = STATUS_SEVERITY[fa.status];
    const sevB = STATUS_SEVERITY[fb.status];
    let change: CheckChange = 'same';
    if (sevB < sevA) change = 'improved';
    else if (sevB > sevA) change = 'worse';
    else if (rawDelta !== null && Math.abs(rawDelta) > 1e-9) change = rawDelta > 0 ? 'improved' : 'worse';
    out.push({
      checkId: fa.checkId,
      title: fa.title,
      unit: fb.unit,
      before: pick(fa),
      after: pick(fb),
      change,
      statusChanged: fa.status !== fb.status,
      marginDelta: figureMarginDelta(fa, fb),
    });
  }
  for (const fb of b.findings) {
    if (!seen.has(fb.checkId)) out.push({ checkId: fb.checkId, title: fb.title, unit: fb.unit, before: null, after: pick(fb), change: 'added', statusChanged: true, marginDelta: null });
  }
  return out;
}
