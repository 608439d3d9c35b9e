import type { QuoteTotals } from './quote-money';

/** One line of a quote's totals block: what it is and its amount in cents (discounts negative). */
export interface QuoteTotalRow {
  label: string;
  cents: number;
}

/** The subtotals every view of a quote lists above its total (screen and PDF alike); a discount row only when there is one. */
export function quoteTotalRows(totals: QuoteTotals): QuoteTotalRow[] {
  return [
    { label: 'Parts', cents: totals.partsSubtotalCents },
    ...(totals.partsDiscountCents ? [{ label: 'Parts discount', cents: -totals.partsDiscountCents }] : []),
    { label: 'Labor', cents: totals.laborSubtotalCents },
    ...(totals.laborDiscountCents ? [{ label: 'Labor discount', cents: -totals.laborDiscountCents }] : []),
    { label: 'Shop supplies', cents: totals.suppliesCents },
    { label: 'Tax', cents: totals.taxCents },
  ];
}
