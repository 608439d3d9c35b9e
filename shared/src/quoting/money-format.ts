/**
 * The one way Swapwright writes an amount of money for people, on screen, in the quote PDF and in e-mail: the
 * currency's own sign and grouping (`$5,131.91`, `CA$5,131.91`, `€5,131.91`), always with cents. Money is kept in
 * integer cents; the division by 100 happens here only, for display.
 */
const formatters = new Map<string, Intl.NumberFormat>();

/** ISO 4217 codes are three letters; anything else (missing, cut short) is written as a plain amount. */
const CURRENCY_CODE = /^[A-Za-z]{3}$/;

function formatterOf(currency: string | null | undefined): Intl.NumberFormat {
  const key = typeof currency === 'string' && CURRENCY_CODE.test(currency) ? currency.toUpperCase() : '';
  let formatter = formatters.get(key);
  if (!formatter) {
    // A screen that is briefly without the shop's currency (an answer still loading) shows the amount rather than
    // throwing and blanking the page.
    formatter = key
      ? new Intl.NumberFormat('en-US', { style: 'currency', currency: key, minimumFractionDigits: 2, maximumFractionDigits: 2 })
      : new Intl.NumberFormat('en-US', { minimumFractionDigits: 2, maximumFractionDigits: 2 });
    formatters.set(key, formatter);
  }
  return formatter;
}

/** Integer cents in the shop's currency as people read it: 513191, 'USD' -> "$5,131.91"; -5000 -> "-$50.00". */
export function formatMoney(cents: number, currency: string): string {
  return formatterOf(currency).format(cents / 100);
}

/** A change of an amount with its sign: +$80.35, −$108.00 (a true minus sign), $0.00. */
export function formatMoneyChange(cents: number, currency: string): string {
  const sign = cents > 0 ? '+' : cents < 0 ? '−' : '';
  return `${sign}${formatMoney(Math.abs(cents), currency)}`;
}

/** The currency's sign as `formatMoney` writes it ("$", "CA$", "€"), for the prefix of an amount box. */
export function moneySign(currency: string): string {
  return formatterOf(currency).formatToParts(0).find((part) => part.type === 'currency')?.value ?? '';
}
