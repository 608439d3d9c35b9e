import Decimal from 'decimal.js';
import fc from 'fast-check';
import { MoneyInputError, formatCents, scaledRate } from './exact-money';
import { computeQuoteMoney, laborLineMoney, partLineMoney, QuoteMoneyInput } from './quote-money';

// Source: the quote rule is our published rule (DESIGN.md "Money", printed on every quote);
// every expected figure below was worked by hand on paper, the steps shown beside it.

const LINES: Pick<QuoteMoneyInput, 'parts' | 'labor' | 'laborRateCents'> = {
  parts: [
    { quantity: 1, pricing: 'list', unitPriceCents: 28995 }, // rear-sump pan 289.95
    { quantity: 2, pricing: 'cost-plus', unitCostCents: 4137, markupPercent: 35 }, // 41.37 x 1.35 = 55.8495 -> 55.85; x2 = 111.70
    { quantity: 2, pricing: 'cost-plus', unitCostCents: 6250, markupPercent: 22.5 }, // 62.50 x 1.225 = 76.5625 -> 76.56; x2 = 153.12
  ],
  labor: [
    { hours: 8.5 }, // 8.5 x 118.75 = 1009.375 -> 1009.38
    { hours: 3.2 }, // 3.2 x 118.75 = 380.00
    { hours: 1.3 }, // 1.3 x 118.75 = 154.375 -> 154.38
  ],
  laborRateCents: 11875,
};

describe('computeQuoteMoney, hand-computed to the cent', () => {
  it('percent discount, supplies under the cap, parts taxed only, percent deposit', () => {
    const money = computeQuoteMoney({
      ...LINES,
      suppliesPercent: 6,
      suppliesCapCents: 25000,
      discount: { kind: 'percent', percent: 5 },
      partsTaxPercent: 8.25,
      laborTaxPercent: 0,
      deposit: { kind: 'percent', percent: 30 },
    });
    expect(money.parts.map((line) => [line.unitPriceCents, line.lineTotalCents])).toEqual([
      [28995, 28995],
      [5585, 11170],
      [7656, 15312],
    ]);
    expect(money.labor.map((line) => line.lineTotalCents)).toEqual([100938, 38000, 15438]);
    expect(money.totals).toEqual({
      partsSubtotalCents: 55477, // 289.95 + 111.70 + 153.12
      laborSubtotalCents: 154376, // 1009.38 + 380.00 + 154.38
      suppliesCents: 9263, // 1543.76 x 6 % = 92.6256 -> 92.63, under the 250.00 cap
      partsDiscountCents: 2774, // 554.77 x 5 % = 27.7385 -> 27.74
      laborDiscountCents: 7719, // 1543.76 x 5 % = 77.188 -> 77.19
      partsTaxCents: 4348, // (554.77 - 27.74) = 527.03 x 8.25 % = 43.479975 -> 43.48
      laborTaxCents: 0,
      taxCents: 4348,
      totalCents: 212971, // 527.03 + 1466.57 + 92.63 + 43.48 = 2129.71
      depositCents: 63891, // 2129.71 x 30 % = 638.913 -> 638.91
    });
  });

  it('fixed discount split by subtotals, supplies capped, labor taxed with supplies, fixed deposit', () => {
    const money = computeQuoteMoney({
      ...LINES,
      suppliesPercent: 6,
      suppliesCapCents: 5000,
      discount: { kind: 'fixed', amountCents: 15000 },
      partsTaxPercent: 8.25,
      laborTaxPercent: 6.5,
      deposit: { kind: 'fixed', amountCents: 50000 },
    });
    expect(money.totals).toEqual({
      partsSubtotalCents: 55477,
      laborSubtotalCents: 154376,
      suppliesCents: 5000, // 92.63 is over the 50.00 cap
      partsDiscountCents: 3965, // 150.00 x 554.77 / 2098.53 = 39.654187... -> 39.65
      laborDiscountCents: 11035, // labor takes the rest: 150.00 - 39.65
      partsTaxCents: 4250, // (554.77 - 39.65) = 515.12 x 8.25 % = 42.4974 -> 42.50
      laborTaxCents: 9642, // (1543.76 - 110.35 + 50.00) = 1483.41 x 6.5 % = 96.42165 -> 96.42
      taxCents: 13892,
      totalCents: 213745, // 515.12 + 1433.41 + 50.00 + 138.92 = 2137.45
      depositCents: 50000,
    });
  });

  it('a deposit is never more than the total', () => {
    const money = computeQuoteMoney({
      parts: [{ quantity: 1, pricing: 'list', unitPriceCents: 1000 }],
      labor: [],
      laborRateCents: 11875,
      suppliesPercent: 6,
      suppliesCapCents: null,
      discount: { kind: 'none' },
      partsTaxPercent: 0,
      laborTaxPercent: 0,
      deposit: { kind: 'fixed', amountCents: 2000 },
    });
    expect(money.totals.totalCents).toBe(1000);
    expect(money.totals.depositCents).toBe(1000);
  });

  it('halves round away from zero, not to even', () => {
    // 1.3 h x 118.65 = 154.245 -> 154.25 (a round-half-even rule would give 154.24)
    expect(laborLineMoney({ hours: 1.3 }, 11865).lineTotalCents).toBe(15425);
    // 0.10 cost x (1 + 5 %) = 0.105 -> 0.11
    expect(partLineMoney({ quantity: 1, pricing: 'cost-plus', unitCostCents: 10, markupPercent: 5 }).unitPriceCents).toBe(11);
  });

  it('refuses inputs the rule cannot price, with a sentence a person can act on', () => {
    expect(() => laborLineMoney({ hours: 1.25 }, 11875)).toThrow(/tenth of an hour/);
    expect(() => partLineMoney({ quantity: 1.5, pricing: 'list', unitPriceCents: 100 })).toThrow(/whole number/);
    expect(() => partLineMoney({ quantity: 1, pricing: 'list', unitPriceCents: 10.5 })).toThrow(MoneyInputError);
    expect(() => partLineMoney({ quantity: 1, pricing: 'cost-plus', unitCostCents: 100 })).toThrow(/markup is required/);
    expect(() => scaledRate(8.123456, 'rate')).toThrow(/decimal places/);
    expect(() =>
      computeQuoteMoney({
        ...LINES,
        suppliesPercent: 0,
        suppliesCapCents: null,
        discount: { kind: 'fixed', amountCents: 10_000_000 },
        partsTaxPercent: 0,
        laborTaxPercent: 0,
        deposit: { kind: 'percent', percent: 0 },
      }),
    ).toThrow(/more than the parts and labor/);
  });

  it('formats cents for people', () => {
    expect(formatCents(212971)).toBe('2,129.71');
    expect(formatCents(5)).toBe('0.05');
    expect(formatCents(-1050)).toBe('-10.50');
  });
});

describe('computeQuoteMoney against decimal.js as an independent reference', () => {
  // Source: decimal.js ROUND_HALF_UP rounds halves away from zero (its documented rounding modes),
  // so the rule re-stated in decimal arithmetic must agree with the BigInt implementation on any input.
  const D = Decimal.clone({ precision: 60, rounding: Decimal.ROUND_HALF_UP });
  const round = (value: Decimal) => value.toDecimalPlaces(0, Decimal.ROUND_HALF_UP).toNumber();
  const rate = fc.integer({ min: 0, max: 2_000_000 }).map((n) => n / 10_000); // 0..200 with four places
  const pct = fc.integer({ min: 0, max: 1_000_000 }).map((n) => n / 10_000); // 0..100

  it('agrees on random quotes', () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.record({
            quantity: fc.integer({ min: 1, max: 20 }),
            costPlus: fc.boolean(),
            cents: fc.integer({ min: 0, max: 500_000 }),
            markup: rate,
          }),
          { maxLength: 6 },
        ),
        fc.array(fc.integer({ min: 0, max: 400 }), { maxLength: 6 }),
        fc.integer({ min: 0, max: 30_000 }),
        pct,
        fc.option(fc.integer({ min: 0, max: 20_000 }), { nil: null }),
        fc.oneof(fc.constant({ kind: 'none' as const }), pct.map((percent) => ({ kind: 'percent' as const, percent })), fc.double({ min: 0, max: 1, noNaN: true }).map((share) => ({ kind: 'fixed' as const, share }))),
        pct,
        pct,
        fc.oneof(pct.map((percent) => ({ kind: 'percent' as const, percent })), fc.integer({ min: 0, max: 5_000_000 }).map((amountCents) => ({ kind: 'fixed' as const, amountCents }))),
        (partLines, laborTenths, laborRateCents, suppliesPercent, suppliesCapCents, discountChoice, partsTaxPercent, laborTaxPercent, deposit) => {
          const parts = partLines.map((line) =>
            line.costPlus
              ? { quantity: line.quantity, pricing: 'cost-plus' as const, unitCostCents: line.cents, markupPercent: line.markup }
              : { quantity: line.quantity, pricing: 'list' as const, unitPriceCents: line.cents },
          );
          const labor = laborTenths.map((tenths) => ({ hours: tenths / 10 }));
          // Reference, in decimal arithmetic.
          const units = partLines.map((line) => (line.costPlus ? round(new D(line.cents).mul(new D(line.markup).div(100).plus(1))) : line.cents));
          const partsSum = units.reduce((sum, unit, i) => sum + unit * partLines[i].quantity, 0);
          const laborSum = laborTenths.reduce((sum, tenths) => sum + round(new D(tenths).div(10).mul(laborRateCents)), 0);
          let supplies = round(new D(laborSum).mul(suppliesPercent).div(100));
          if (suppliesCapCents !== null) supplies = Math.min(supplies, suppliesCapCents);
          let discount: QuoteMoneyInput['discount'] = { kind: 'none' };
          let pd = 0;
          let ld = 0;
          if (discountChoice.kind === 'percent') {
            discount = discountChoice;
            pd = round(new D(partsSum).mul(discountChoice.percent).div(100));
            ld = round(new D(laborSum).mul(discountChoice.percent).div(100));
          } else if (discountChoice.kind === 'fixed') {
            const amountCents = Math.floor((partsSum + laborSum) * discountChoice.share);
            discount = { kind: 'fixed', amountCents };
            pd = partsSum + laborSum === 0 ? 0 : round(new D(amountCents).mul(partsSum).div(partsSum + laborSum));
            ld = amountCents - pd;
          }
          const tax = round(new D(partsSum - pd).mul(partsTaxPercent).div(100)) + round(new D(laborSum - ld + supplies).mul(laborTaxPercent).div(100));
          const total = partsSum - pd + laborSum - ld + supplies + tax;
          const depositCents = Math.min(deposit.kind === 'fixed' ? deposit.amountCents : round(new D(total).mul(deposit.percent).div(100)), total);

          const money = computeQuoteMoney({ parts, labor, laborRateCents, suppliesPercent, suppliesCapCents, discount, partsTaxPercent, laborTaxPercent, deposit });
          expect(money.totals).toMatchObject({
            partsSubtotalCents: partsSum,
            laborSubtotalCents: laborSum,
            suppliesCents: supplies,
            partsDiscountCents: pd,
            laborDiscountCents: ld,
            taxCents: tax,
            totalCents: total,
            depositCents,
          });
        },
      ),
      { numRuns: 300 },
    );
  });
});
