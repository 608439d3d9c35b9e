/**
 * The one way Swapwright writes an amount of money for people, on screen, in the quote PDF and in e-mail: the
 * currency's own sign and grouping (`$5,131.91`, `CA$5,131.91`, `€5,131.91`), always with cents. Money is kept in
 * integer cents; the division by 100 happens here only, for display.
 */
const formatters = new Map<string, Intl.NumberFormat>();

function formatterOf(currency: string): Intl.NumberFormat {
  let formatter = formatters.get(currency);
  if (!formatter) {
    formatter = new Intl.NumberFormat('en-US', { style: 'currency', currency, minimumFractionDigits: 2, maximumFractionDigits: 2 });
    formatters.set(currency, formatter);
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
  return formatterOf(currency).formatToParts(0).find((part) => part.type === 'currency')?.value ?? currency;
}
