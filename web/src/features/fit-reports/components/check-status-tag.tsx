import type { CheckStatus } from '@swapwright/shared';
import { statusColors, statusLabels } from '../lib/status';

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
