import type { CheckGroup, CheckStatus, Finding } from '@swapwright/shared';
import { palette } from '@/config/theme';

/** Our words for a check's status. */
export const statusLabels: Record<CheckStatus, string> = {
  ok: 'Clears',
  tight: 'Close call',
  fails: 'Blocked',
  unknown: 'Needs input',
};

export const statusColors: Record<CheckStatus, { fg: string; bg: string; border: string }> = {
  ok: { fg: '#1f5e3a', bg: '#e3f1e8', border: '#a9d3b8' },
  tight: { fg: '#7a4e0e', bg: '#fbf0d9', border: '#e8c987' },
  fails: { fg: '#8e2a21', bg: '#f8e1de', border: '#e4a59d' },
  unknown: { fg: palette.inkMuted, bg: '#eceeea', border: palette.line },
};

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
