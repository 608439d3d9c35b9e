import { RATE_FIGURE_WORDS } from '@swapwright/shared';

/** The figures a change moves: each named field whose new value differs from the current one (null means none). */
export interface ChangedFigures {
  before: Record<string, number | null>;
  after: Record<string, number | null>;
  /** "labor rate $135.00 per hour → $142.50 per hour, …" for the audit entry's summary. */
  description: string;
}

const asFigure = (value: unknown): number | null => (value === null || value === undefined ? null : Number(value));

/** Compares `changes` with `current` on `fields`; null when nothing moves, so no audit entry is written. */
export function changedFigures<F extends string>(
  current: Partial<Record<F, unknown>>,
  changes: Partial<Record<F, unknown>>,
  fields: readonly F[],
  currency = 'USD',
): ChangedFigures | null {
  const before: Record<string, number | null> = {};
  const after: Record<string, number | null> = {};
  for (const field of fields) {
    if (changes[field] === undefined) continue;
    const previous = asFigure(current[field]);
    const next = asFigure(changes[field]);
    if (next !== previous) {
      before[field] = previous;
      after[field] = next;
    }
  }
  const moved = Object.keys(after);
  if (moved.length === 0) return null;
  const words = (field: string, value: number | null) =>
    value === null ? 'none' : RATE_FIGURE_WORDS[field] ? RATE_FIGURE_WORDS[field].format(value, currency) : String(value);
  return {
    before,
    after,
    description: moved.map((field) => `${RATE_FIGURE_WORDS[field]?.name ?? field} ${words(field, before[field])} → ${words(field, after[field])}`).join(', '),
  };
}
