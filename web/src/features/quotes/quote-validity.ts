import { formatCalendarDate, utcToday } from '@swapwright/shared';

/** "2027-01-15" for the reader's own day. */
const localDay = (now: Date) =>
  `${now.getFullYear()}-${String(now.getMonth() + 1).padStart(2, '0')}-${String(now.getDate()).padStart(2, '0')}`;

/**
 * The first day a quote may be valid until: today, and never before today in UTC, the day the API judges sending
 * by (a reader west of Greenwich in the evening is already on the next UTC day).
 */
export function firstValidDay(now: Date = new Date()): string {
  const local = localDay(now);
  const utc = utcToday(now);
  return local > utc ? local : utc;
}

/** Form rule: the last valid day is today or later. */
export const validUntilRule = (now: () => Date = () => new Date()) => ({
  validator: async (_: unknown, value: unknown) => {
    if (typeof value !== 'string' || value === '') return;
    const first = firstValidDay(now());
    if (value < first) throw new Error(`${formatCalendarDate(value)} has already passed; choose ${formatCalendarDate(first)} or a later day.`);
  },
});
