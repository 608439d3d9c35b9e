import type { CheckStatus } from '@swapwright/shared';
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

const marks: Record<CheckStatus, string> = { ok: '✓', tight: '!', fails: '✕', unknown: '?' };

export type CheckStatusTagProps = { status: CheckStatus };

/** Status in our own words and colours, with a mark so colour is never the only cue. */
export function CheckStatusTag({ status }: CheckStatusTagProps) {
  const c = statusColors[status];
  return (
    <span
      className="fit-status-tag"
      data-status={status}
      style={{
        display: 'inline-flex',
        alignItems: 'center',
        gap: 6,
        padding: '1px 8px',
        borderRadius: 999,
        border: `1px solid ${c.border}`,
        background: c.bg,
        color: c.fg,
        fontWeight: 600,
        fontSize: 13,
        whiteSpace: 'nowrap',
      }}
    >
      <span aria-hidden="true">{marks[status]}</span>
      {statusLabels[status]}
    </span>
  );
}
