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
 * The calendar day of a moment (a quote's sending, a report's making) in UTC, the day the API dates quotes by, written as
 * "Jan 15, 2027": the same day whatever the zone of the server that writes it.
 */
export function formatUtcDay(at: Date): string {
  return formatCalendarDate(utcToday(at));
}

/** Today's calendar day in UTC ("2027-01-15"), the day the API dates quotes by. */
export function utcToday(now: Date = new Date()): string {
  return now.toISOString().slice(0, 10);
}
