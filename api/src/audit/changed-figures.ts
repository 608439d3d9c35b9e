import { formatMoney } from '@swapwright/shared';

/** The figures a change moves: each named field whose new value differs from the current one (null means none). */
export interface ChangedFigures {
  before: Record<string, number | null>;
  after: Record<string, number | null>;
  /** "labor rate $135.00 per hour → $142.50 per hour, …" for the audit entry's summary. */
  description: string;
}

const percent = (value: number) => `${value} %`;

/** How the owner names and reads each rate and term in the audit log. */
const FIGURE_WORDS: Record<string, { name: string; format: (value: number, currency: string) => string }> = {
  laborRatePerHour: { name: 'labor rate', format: (value, currency) => `${formatMoney(Math.round(value * 100), currency)} per hour` },
  taxRatePercent: { name: 'tax on parts', format: percent },
  shopSuppliesPercent: { name: 'shop supplies', format: percent },
  laborTaxPercent: { name: 'tax on labor', format: percent },
  suppliesCapCents: { name: 'shop supplies cap', format: (value, currency) => formatMoney(value, currency) },
  depositPercent: { name: 'deposit', format: percent },
  defaultMarkupPercent: { name: 'default markup', format: percent },
};

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
    value === null ? 'none' : FIGURE_WORDS[field] ? FIGURE_WORDS[field].format(value, currency) : String(value);
  return {
    before,
    after,
    description: moved.map((field) => `${FIGURE_WORDS[field]?.name ?? field} ${words(field, before[field])} → ${words(field, after[field])}`).join(', '),
  };
}
