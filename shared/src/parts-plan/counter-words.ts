import type { CounterStatus } from '../types/value-lists';

/** The words the parts counter uses for each line state, on its screen and in the exported pick list. */
export const COUNTER_STATUS_LABELS: Record<CounterStatus, string> = {
  open: 'Not set aside',
  reserved: 'Set aside',
  'to-order': 'To order',
  ordered: 'Ordered',
  received: 'Arrived, set aside',
  issued: 'Issued to the job',
};

/** Lines whose units sit on the shelf for their job: the counter can issue them to the job or release them. */
export const SET_ASIDE_STATUSES: readonly CounterStatus[] = ['reserved', 'received'];

/** Whether the line's units are set aside on the shelf (not yet issued to the job). */
export function counterLineSetAside(line: Pick<CounterLineState, 'status'>): boolean {
  return (SET_ASIDE_STATUSES as readonly string[]).includes(line.status);
}

export interface CounterLineState {
  status: string;
  quantity: number;
  /** Units free on the shelf (on hand less what other lines hold). */
  available: number;
}

/** A line not yet set aside whose shelf cannot cover it is short by the units missing (0 otherwise): the counter orders it rather than reserves it. */
export function counterLineShortBy(line: CounterLineState): number {
  return line.status === 'open' ? Math.max(0, line.quantity - Math.max(0, line.available)) : 0;
}

/** What the counter calls a line's state: "Short by N" for a short open line, otherwise its state's words (an unknown code as it is). */
export function counterLineStateWords(line: CounterLineState): string {
  const short = counterLineShortBy(line);
  if (short > 0) return `Short by ${short}`;
  return COUNTER_STATUS_LABELS[line.status as CounterStatus] ?? line.status;
}

/** Lines whose units are with the job: on its shelf or already issued to it. */
export const WITH_THE_JOB_STATUSES: readonly CounterStatus[] = ['reserved', 'received', 'issued'];

export interface CounterReadiness<T> {
  /** The counter's lines of the job's plan. */
  total: number;
  /** Those on the job's shelf or issued to it. */
  withTheJob: number;
  /** The others (not set aside, to order, ordered), in the order given. */
  waiting: T[];
}

/** How far the counter has the job's parts ready: what the bay checks before it takes the job. */
export function counterReadiness<T extends { status: string }>(lines: readonly T[]): CounterReadiness<T> {
  const waiting = lines.filter((line) => !(WITH_THE_JOB_STATUSES as readonly string[]).includes(line.status));
  return { total: lines.length, withTheJob: lines.length - waiting.length, waiting };
}
