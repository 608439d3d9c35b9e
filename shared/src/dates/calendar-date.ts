/**
 * Calendar days ("2027-01-15", a quote's last valid day) in the app's one date style, "Jan 15, 2027", the same on
 * screen, in the API's sentences and in e-mails. A calendar day has no time zone: it is written as that day.
 */
const CALENDAR_DAY = /^(\d{4})-(\d{2})-(\d{2})$/;
const dayFormat = new Intl.DateTimeFormat('en-US', { year: 'numeric', month: 'short', day: 'numeric', timeZone: 'UTC' });

/** "2027-01-15" as "Jan 15, 2027"; anything that is not a calendar day comes back as given. */
export function formatCalendarDate(iso: string): string {
  const match = CALENDAR_DAY.exec(iso);
  if (!match) return iso;
  const date = new Date(Date.UTC(Number(match[1]), Number(match[2]) - 1, Number(match[3])));
  return Number.isNaN(date.getTime()) ? iso : dayFormat.format(date);
}

/**
 * The calendar day of a moment in UTC, written as "Jan 15, 2027": the same day whatever the zone of the server that writes
 * it. A shop's own day (quotes, their validity) is `formatDayIn(at, shop.timeZone)`.
 */
export function formatUtcDay(at: Date): string {
  return formatCalendarDate(utcToday(at));
}

/** Today's calendar day in UTC ("2027-01-15"); a shop's own today is `todayIn(shop.timeZone)`. */
export function utcToday(now: Date = new Date()): string {
  return now.toISOString().slice(0, 10);
}

const dayPartFormats = new Map<string, Intl.DateTimeFormat>();

/** One formatter per zone (building one is slow); throws a RangeError for a name that is not a time zone. */
function dayPartsIn(timeZone: string): Intl.DateTimeFormat {
  let format = dayPartFormats.get(timeZone);
  if (!format) {
    format = new Intl.DateTimeFormat('en-US', {
      timeZone,
      calendar: 'gregory',
      numberingSystem: 'latn',
      year: 'numeric',
      month: '2-digit',
      day: '2-digit',
      hour: '2-digit',
      minute: '2-digit',
      second: '2-digit',
      hourCycle: 'h23',
    });
    dayPartFormats.set(timeZone, format);
  }
  return format;
}

/** The wall clock of a moment in a zone, as the milliseconds of that same wall clock read in UTC. */
function wallClockIn(at: Date, timeZone: string): number {
  const parts = Object.fromEntries(dayPartsIn(timeZone).formatToParts(at).map((part) => [part.type, part.value]));
  return Date.UTC(Number(parts.year), Number(parts.month) - 1, Number(parts.day), Number(parts.hour), Number(parts.minute), Number(parts.second));
}

/** Whether the name is an IANA time zone this runtime knows ("America/Denver", "UTC"). */
export function isTimeZone(timeZone: string): boolean {
  try {
    dayPartsIn(timeZone);
    return true;
  } catch {
    return false;
  }
}

/** A zone name as the time zone database spells it ("america/denver" → "America/Denver"); throws for an unknown name. */
export function canonicalTimeZone(timeZone: string): string {
  return dayPartsIn(timeZone).resolvedOptions().timeZone;
}

/** The calendar day ("2027-01-15") a moment falls on in an IANA time zone (a shop's "today" is `todayIn(shop.timeZone)`). */
export function todayIn(timeZone: string, now: Date = new Date()): string {
  return new Date(wallClockIn(now, timeZone)).toISOString().slice(0, 10);
}

/** The calendar day of a moment (a quote's sending, a report's making) in a zone, written as "Jan 15, 2027". */
export function formatDayIn(at: Date, timeZone: string): string {
  return formatCalendarDate(todayIn(timeZone, at));
}

/** The last moment of a calendar day ("2027-01-15") in a zone: the millisecond before the next day starts there. */
export function endOfDayIn(day: string, timeZone: string): Date {
  const next = new Date(`${day}T00:00:00Z`);
  next.setUTCDate(next.getUTCDate() + 1);
  // The zone's offset at that moment, taken twice so a change of offset (summer time) near midnight lands right.
  let start = next.getTime() - (wallClockIn(next, timeZone) - next.getTime());
  start = next.getTime() - (wallClockIn(new Date(start), timeZone) - start);
  return new Date(start - 1);
}
