import type { QuoteTotals } from './quote-money';

/** A quote line as two revisions are compared: `key` follows the line from one revision to the next. */
export interface ComparableLine {
  key: string;
  kind: 'part' | 'labor';
  description: string;
  /** Part lines: whole units (labor lines: 1). */
  quantity: number;
  /** Labor lines: hours to a tenth (part lines: null). */
  hours: number | null;
  unitPriceCents: number;
  lineTotalCents: number;
}

export interface ComparableRevision {
  number: number;
  lines: ComparableLine[];
  totals: QuoteTotals;
}

export type LineChange =
  | { change: 'added'; key: string; kind: ComparableLine['kind']; description: string; after: ComparableLine }
  | { change: 'removed'; key: string; kind: ComparableLine['kind']; description: string; before: ComparableLine }
  | { change: 'changed'; key: string; kind: ComparableLine['kind']; description: string; before: ComparableLine; after: ComparableLine; fields: string[] };

export interface TotalChange {
  field: keyof QuoteTotals;
  beforeCents: number;
  afterCents: number;
  deltaCents: number;
}

export interface RevisionDiff {
  fromNumber: number;
  toNumber: number;
  lines: LineChange[];
  totals: TotalChange[];
}

const COMPARED_FIELDS = ['description', 'quantity', 'hours', 'unitPriceCents', 'lineTotalCents'] as const;

/** What changed from one revision to another: lines added, removed or changed (by key), and every total that moved. */
export function diffRevisions(from: ComparableRevision, to: ComparableRevision): RevisionDiff {
  const before = new Map(from.lines.map((line) => [line.key, line]));
  const after = new Map(to.lines.map((line) => [line.key, line]));
  const lines: LineChange[] = [];
  for (const line of from.lines) {
    const next = after.get(line.key);
    if (!next) {
      lines.push({ change: 'removed', key: line.key, kind: line.kind, description: line.description, before: line });
      continue;
    }
    const fields = COMPARED_FIELDS.filter((field) => line[field] !== next[field]);
    if (fields.length > 0) lines.push({ change: 'changed', key: line.key, kind: next.kind, description: next.description, before: line, after: next, fields });
  }
  for (const line of to.lines) {
    if (!before.has(line.key)) lines.push({ change: 'added', key: line.key, kind: line.kind, description: line.description, after: line });
  }
  const totals = (Object.keys(to.totals) as (keyof QuoteTotals)[])
    .map((field) => ({ field, beforeCents: from.totals[field], afterCents: to.totals[field], deltaCents: to.totals[field] - from.totals[field] }))
    .filter((change) => change.deltaCents !== 0);
  return { fromNumber: from.number, toNumber: to.number, lines, totals };
}
