import type { QuoteTotals } from './quote-money';
import { quoteTotalRows } from './total-rows';

// Common practice (no published source): a quote lists parts, labor, supplies and tax above its total, discounts as negative lines.
const totals: QuoteTotals = {
  partsSubtotalCents: 40165,
  laborSubtotalCents: 132300,
  suppliesCents: 5292,
  partsDiscountCents: 2008,
  laborDiscountCents: 0,
  partsTaxCents: 3148,
  laborTaxCents: 0,
  taxCents: 3148,
  totalCents: 178897,
  depositCents: 53669,
};

describe('quoteTotalRows', () => {
  it('lists a discount only where there is one, as a negative amount', () => {
    expect(quoteTotalRows(totals)).toEqual([
      { label: 'Parts', cents: 40165 },
      { label: 'Parts discount', cents: -2008 },
      { label: 'Labor', cents: 132300 },
      { label: 'Shop supplies', cents: 5292 },
      { label: 'Tax', cents: 3148 },
    ]);
  });
});
