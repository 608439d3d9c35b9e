const dateFormat = new Intl.DateTimeFormat('en-US', { year: 'numeric', month: 'short', day: 'numeric' });
const timeFormat = new Intl.DateTimeFormat('en-US', { hour: 'numeric', minute: '2-digit' });

const parse = (iso: string | null | undefined): Date | null => {
  if (!iso) return null;
  // A calendar date alone ("2027-01-02", a quote's last valid day) is that day where the reader is; `new Date` would
  // read it as midnight UTC, the day before anywhere west of Greenwich.
  const day = /^(\d{4})-(\d{2})-(\d{2})$/.exec(iso);
  const d = day ? new Date(Number(day[1]), Number(day[2]) - 1, Number(day[3])) : new Date(iso);
  return Number.isNaN(d.getTime()) ? null : d;
};

/** The one date format of the app: "Nov 2, 2026". */
export function formatDate(iso: string | null | undefined): string {
  const d = parse(iso);
  return d ? dateFormat.format(d) : '—';
}

/** Date and time in the same format: "Nov 2, 2026 10:05 AM". */
export function formatDateTime(iso: string | null | undefined): string {
  const d = parse(iso);
  return d ? `${dateFormat.format(d)} ${timeFormat.format(d)}` : '—';
}
