import { formatCalendarDate, todayIn } from '@swapwright/shared';

/**
 * The first day a quote may be valid until: the shop's today, in the shop's own time zone (the day the API judges
 * sending and lapsing by), whatever the zone of the reader's computer.
 */
export function firstValidDay(timeZone: string, now: Date = new Date()): string {
  return todayIn(timeZone, now);
}

/** Form rule: the last valid day is the shop's today or later. */
export const validUntilRule = (timeZone: string, now: () => Date = () => new Date()) => ({
  validator: async (_: unknown, value: unknown) => {
    if (typeof value !== 'string' || value === '') return;
    const first = firstValidDay(timeZone, now());
    if (value < first) throw new Error(`${formatCalendarDate(value)} has already passed; choose ${formatCalendarDate(first)} or a later day.`);
  },
});
