import { computeQuoteMoney, MoneyInputError, type QuoteMoney, type QuoteTotals } from '@swapwright/shared';
import type { QuoteLine, QuoteRevision } from './quote-revision.entity';
import { QuoteErrors } from './quotes.errors';

type Priced = Pick<
  QuoteRevision,
  | 'laborRateCents'
  | 'suppliesPercent'
  | 'suppliesCapCents'
  | 'partsTaxPercent'
  | 'laborTaxPercent'
  | 'discountKind'
  | 'discountPercent'
  | 'discountAmountCents'
  | 'depositKind'
  | 'depositPercent'
  | 'depositAmountCents'
> & { lines: UnpricedLine[] };

/** A line before pricing: list-priced parts carry their unit price, the rest have it worked out. */
export type UnpricedLine = Omit<QuoteLine, 'unitPriceCents' | 'lineTotalCents'> & { unitPriceCents: number | null };

/** Prices a revision by the shared quote rule; a figure the rule cannot take becomes a 400 with its sentence. */
export function priceRevision(revision: Priced): { lines: QuoteLine[]; totals: QuoteTotals } {
  const parts = revision.lines.filter((line) => line.kind === 'part');
  const labor = revision.lines.filter((line) => line.kind === 'labor');
  let money: QuoteMoney;
  try {
    money = computeQuoteMoney({
      parts: parts.map((line) => ({
        quantity: line.quantity,
        pricing: line.pricing,
        unitPriceCents: line.pricing === 'list' ? line.unitPriceCents : null,
        unitCostCents: line.unitCostCents,
        markupPercent: line.markupPercent,
      })),
      labor: labor.map((line) => ({ hours: line.hours ?? 0 })),
      laborRateCents: revision.laborRateCents,
      suppliesPercent: revision.suppliesPercent,
      suppliesCapCents: revision.suppliesCapCents,
      discount: { kind: revision.discountKind, percent: revision.discountPercent, amountCents: revision.discountAmountCents },
      partsTaxPercent: revision.partsTaxPercent,
      laborTaxPercent: revision.laborTaxPercent,
      deposit: { kind: revision.depositKind, percent: revision.depositPercent, amountCents: revision.depositAmountCents },
    });
  } catch (error) {
    if (error instanceof MoneyInputError) throw QuoteErrors.invalidMoney(error.message);
    throw error;
  }
  let partIndex = 0;
  let laborIndex = 0;
  const lines = revision.lines.map((line): QuoteLine => {
    if (line.kind === 'part') {
      const priced = money.parts[partIndex++];
      return { ...line, hours: null, unitPriceCents: priced.unitPriceCents, lineTotalCents: priced.lineTotalCents };
    }
    const priced = money.labor[laborIndex++];
    return { ...line, quantity: 1, pricing: 'list', unitCostCents: null, markupPercent: null, unitPriceCents: revision.laborRateCents, lineTotalCents: priced.lineTotalCents };
  });
  return { lines, totals: money.totals };
}
