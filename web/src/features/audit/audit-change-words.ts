import { COUNTER_STATUS_LABELS, formatMoney, JOB_STATE_LABELS, QUOTE_STATUS_LABELS, RATE_FIGURE_WORDS } from '@swapwright/shared';
import { formatDateTime } from '@/lib/dates';

/** The recorded fields in words, as the owner reads them in the audit log. */
const FIELD_WORDS: Record<string, string> = {
  status: 'Status',
  state: 'State',
  sentRevision: 'Revision sent',
  revision: 'Revision',
  totalCents: 'Total',
  depositCents: 'Deposit',
  amountCents: 'Amount',
  currency: 'Currency',
  location: 'Location',
  onHand: 'On hand',
  reserved: 'Set aside',
  role: 'Role',
  attempts: 'Attempts',
  lastError: 'Last error',
  parts: 'Parts',
  rows: 'Rows',
  added: 'Added',
  updated: 'Updated',
  value: 'Reading',
  reason: 'Reason',
  readings: 'Readings',
  signedOffAt: 'Signed off',
  lines: 'Lines',
  changes: 'Changes',
};

/** Record ids and the provider's references: kept in the entry, not spelled out in the change. */
const HIDDEN_FIELDS = new Set(['eventId', 'userId', 'signedOffById', 'pointId']);

/** A deposit payment's own states. */
const PAYMENT_STATE_WORDS: Record<string, string> = { pending: 'Waiting for payment', paid: 'Paid', failed: 'Failed' };

/** A code without words of its own, readable: "laborRatePerHour" → "Labor rate per hour", "turned-down" → "Turned down". */
const humanise = (code: string) => {
  const words = code.replace(/([a-z0-9])([A-Z])/g, '$1 $2').replace(/[-_.]/g, ' ').toLowerCase();
  return words.charAt(0).toUpperCase() + words.slice(1);
};

/** A recorded field's name as the owner reads it: the app's own words, else the code made readable. */
function fieldWords(field: string): string {
  const rate = RATE_FIGURE_WORDS[field]?.name;
  return FIELD_WORDS[field] ?? (rate ? rate.charAt(0).toUpperCase() + rate.slice(1) : humanise(field));
}

/** A state code in the app's own words for the kind of record the action changed. */
function stateWords(action: string, code: string): string {
  if (action.startsWith('quote.')) return QUOTE_STATUS_LABELS[code as keyof typeof QUOTE_STATUS_LABELS] ?? humanise(code);
  if (action.startsWith('stock.') || action.startsWith('counter.')) return COUNTER_STATUS_LABELS[code as keyof typeof COUNTER_STATUS_LABELS] ?? humanise(code);
  if (action.startsWith('deposit.') || action.startsWith('payment.')) return PAYMENT_STATE_WORDS[code] ?? humanise(code);
  if (action.startsWith('job.')) return JOB_STATE_LABELS[code as keyof typeof JOB_STATE_LABELS] ?? humanise(code);
  return humanise(code);
}

function valueWords(action: string, field: string, value: unknown, currency: string): string {
  if (value === null || value === undefined) return '—';
  if (RATE_FIGURE_WORDS[field] && typeof value === 'number') return RATE_FIGURE_WORDS[field].format(value, currency);
  if (field.endsWith('Cents') && typeof value === 'number') return formatMoney(value, currency);
  if ((field === 'status' || field === 'state') && typeof value === 'string') return stateWords(action, value);
  if (field.endsWith('At') && typeof value === 'string') return formatDateTime(value);
  if (typeof value === 'number') return value.toLocaleString('en-US');
  if (Array.isArray(value)) return value.length === 0 ? 'none' : value.map((item) => valueWords(action, field, item, currency)).join('; ');
  if (typeof value === 'object') return `(${changeWords(action, value as Record<string, unknown>, currency)})`;
  return String(value);
}

/** "Status: Awaiting the customer, Total: $4,996.16": the recorded fields of one side of a change, in words. */
export function changeWords(action: string, values: Record<string, unknown> | null, shopCurrency = 'USD'): string {
  if (!values) return '—';
  const currency = typeof values.currency === 'string' ? values.currency : shopCurrency;
  const parts = Object.entries(values)
    .filter(([field]) => !HIDDEN_FIELDS.has(field) && field !== 'currency')
    .map(([field, value]) => `${fieldWords(field)}: ${valueWords(action, field, value, currency)}`);
  return parts.length > 0 ? parts.join(', ') : '—';
}
