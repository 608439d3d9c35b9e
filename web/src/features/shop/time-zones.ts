/** The IANA time zones this browser knows, with UTC (which the list leaves out) first. */
let known: string[] | undefined;

function knownTimeZones(): string[] {
  known ??= ['UTC', ...Intl.supportedValuesOf('timeZone').filter((zone) => zone !== 'UTC')];
  return known;
}

/** The time zone select's options; a stored zone the browser does not list is kept as an option, so it is not blanked. */
export function timeZoneOptions(current?: string): { value: string; label: string }[] {
  const zones = knownTimeZones();
  const all = current && !zones.includes(current) ? [current, ...zones] : zones;
  return all.map((zone) => ({ value: zone, label: zone }));
}

const searchable = (text: string) => text.toLowerCase().replace(/_/g, ' ');

/** Typing "new york" or "denver" finds America/New_York or America/Denver. */
export function timeZoneMatches(input: string, option?: { value?: unknown }): boolean {
  return typeof option?.value === 'string' && searchable(option.value).includes(searchable(input.trim()));
}
