import { formatCalendarDate, formatUtcDay, utcToday } from './calendar-date';

describe('calendar days', () => {
  it('writes a calendar day as "Jan 1, 2020"', () => {
    // Source: Unicode CLDR, locale "en", medium date pattern "MMM d, y" (ECMA-402 Intl.DateTimeFormat, month short).
    expect(formatCalendarDate('2020-01-01')).toBe('Jan 1, 2020');
    expect(formatCalendarDate('2027-12-31')).toBe('Dec 31, 2027');
    // Source: ISO 8601 / proleptic Gregorian calendar: 2028 is a leap year (divisible by 4, not a century).
    expect(formatCalendarDate('2028-02-29')).toBe('Feb 29, 2028');
  });

  it('leaves text that is not a calendar day as it is', () => {
    expect(formatCalendarDate('soon')).toBe('soon');
  });

  it("dates today by UTC, whatever the clock's zone", () => {
    expect(utcToday(new Date('2026-12-03T23:30:00-08:00'))).toBe('2026-12-04');
    expect(utcToday(new Date('2026-12-03T00:10:00Z'))).toBe('2026-12-03');
  });

  it('writes the UTC day of a moment in the same style, whatever the zone it was taken in', () => {
    // Source: ISO 8601 (UTC offsets): 2026-12-31T20:30-05:00 is 2027-01-01T01:30Z; medium "en" pattern as above.
    expect(formatUtcDay(new Date('2026-12-31T20:30:00-05:00'))).toBe('Jan 1, 2027');
    expect(formatUtcDay(new Date('2027-01-15T00:00:00Z'))).toBe('Jan 15, 2027');
    expect(formatUtcDay(new Date('2027-01-15T23:59:59.999Z'))).toBe('Jan 15, 2027');
  });
});
