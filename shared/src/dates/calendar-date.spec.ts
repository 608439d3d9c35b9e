import { canonicalTimeZone, endOfDayIn, formatCalendarDate, formatDayIn, formatUtcDay, isTimeZone, todayIn, utcToday } from './calendar-date';

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

  describe("a shop's own day, by its IANA time zone", () => {
    it('dates a winter evening in a zone behind UTC on that evening, not on the next UTC day', () => {
      // Source: IANA tz database: America/Denver is UTC−7 in winter (MST); 2026-12-04T03:30Z is 20:30 on Dec 3 there.
      expect(todayIn('America/Denver', new Date('2026-12-04T03:30:00Z'))).toBe('2026-12-03');
      expect(todayIn('UTC', new Date('2026-12-04T03:30:00Z'))).toBe('2026-12-04');
      expect(formatDayIn(new Date('2026-12-04T03:30:00Z'), 'America/Denver')).toBe('Dec 3, 2026');
      // Source: IANA tz database: America/Denver is UTC−7 in winter (MST); 06:59Z is 23:59, 07:00Z is the next midnight.
      expect(todayIn('America/Denver', new Date('2026-12-04T06:59:59Z'))).toBe('2026-12-03');
      expect(todayIn('America/Denver', new Date('2026-12-04T07:00:00Z'))).toBe('2026-12-04');
    });

    it('dates a morning in a zone far ahead of UTC on the next day already', () => {
      // Source: IANA tz database: Pacific/Kiritimati is UTC+14 all year; 2026-12-03T10:30Z is 00:30 on Dec 4 there.
      expect(todayIn('Pacific/Kiritimati', new Date('2026-12-03T10:30:00Z'))).toBe('2026-12-04');
      expect(formatDayIn(new Date('2026-12-03T10:30:00Z'), 'Pacific/Kiritimati')).toBe('Dec 4, 2026');
      // Source: IANA tz database: Pacific/Pago_Pago is UTC−11 all year; the same moment is 23:30 on Dec 2 there.
      expect(todayIn('Pacific/Pago_Pago', new Date('2026-12-03T10:30:00Z'))).toBe('2026-12-02');
    });

    it('turns the year with the zone', () => {
      // Source: IANA tz database: America/Denver is UTC−7 in winter (MST); 2027-01-01T05:00Z is 22:00 on Dec 31, 2026.
      expect(todayIn('America/Denver', new Date('2027-01-01T05:00:00Z'))).toBe('2026-12-31');
    });

    it("ends a day at the zone's midnight, summer time included", () => {
      // Source: IANA tz database: America/Denver is UTC−7 in winter (MST), so Dec 3 ends at 2026-12-04T07:00Z.
      expect(endOfDayIn('2026-12-03', 'America/Denver').toISOString()).toBe('2026-12-04T06:59:59.999Z');
      // Source: IANA tz database (US rules since 2007): summer time starts 2027-03-14 at 02:00 local, UTC−6 (MDT) from then.
      expect(endOfDayIn('2027-03-13', 'America/Denver').toISOString()).toBe('2027-03-14T06:59:59.999Z');
      expect(endOfDayIn('2027-03-14', 'America/Denver').toISOString()).toBe('2027-03-15T05:59:59.999Z');
      // Source: IANA tz database: Pacific/Kiritimati is UTC+14 all year, so Dec 4 there ends at 10:00Z that day.
      expect(endOfDayIn('2026-12-04', 'Pacific/Kiritimati').toISOString()).toBe('2026-12-04T09:59:59.999Z');
      expect(endOfDayIn('2026-12-04', 'UTC').toISOString()).toBe('2026-12-04T23:59:59.999Z');
    });

    it('knows a time zone name from an invented one', () => {
      // Source: IANA tz database zone names (ECMA-402 accepts them and "UTC"); "Mars/Olympus" is not one.
      expect(isTimeZone('America/Denver')).toBe(true);
      expect(isTimeZone('UTC')).toBe(true);
      expect(isTimeZone('Mars/Olympus')).toBe(false);
      expect(() => todayIn('Mars/Olympus')).toThrow(RangeError);
      // Source: ECMA-402 (IsValidTimeZoneName, CanonicalizeTimeZoneName): names match case-insensitively; Etc/UTC is UTC.
      expect(canonicalTimeZone('america/denver')).toBe('America/Denver');
      expect(canonicalTimeZone('Etc/UTC')).toBe('UTC');
    });
  });
});
