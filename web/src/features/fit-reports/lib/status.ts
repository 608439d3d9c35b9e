import type { CheckGroup, CheckStatus, Finding } from '@swapwright/shared';

export const statusSeverity: Record<CheckStatus, number> = { fails: 3, tight: 2, unknown: 1, ok: 0 };

export const groupLabels: Record<CheckGroup, string> = {
  envelope: 'Clearances',
  mounts: 'Mounts',
  drivetrain: 'Drivetrain',
  oiling: 'Oiling',
  management: 'Engine management',
  fuel: 'Fuel',
  cooling: 'Cooling',
  belt: 'Belt drive',
  cam: 'Cam timing',
};

export const groupOrder: readonly CheckGroup[] = ['envelope', 'mounts', 'drivetrain', 'oiling', 'management', 'fuel', 'cooling', 'belt', 'cam'];

/** Margin relative to its limit, so figures of different units can be ordered together. */
function relativeMargin(f: Finding): number {
  if (f.margin === null) return 0;
  return f.margin / Math.max(Math.abs(f.required ?? 0), 1);
}

/** Worst first: blocked before close calls, then the smallest margin; stable by check id. */
export function compareWorstFirst(a: Finding, b: Finding): number {
  return (
    statusSeverity[b.status] - statusSeverity[a.status] ||
    relativeMargin(a) - relativeMargin(b) ||
    a.checkId.localeCompare(b.checkId)
  );
}

/** The checks that are close or blocked, worst first. */
export function shortfallsOf(findings: readonly Finding[]): Finding[] {
  return findings.filter((f) => f.status === 'tight' || f.status === 'fails').sort(compareWorstFirst);
}

export function worstStatus(findings: readonly Finding[]): CheckStatus {
  return findings.reduce<CheckStatus>((w, f) => (statusSeverity[f.status] > statusSeverity[w] ? f.status : w), 'ok');
}
