import type { Quote, QuoteLine } from '../../types';

// The figures the API priced for the hand-worked quote of api/test/quotes.e2e-spec.ts (labor 135.00 per hour,
// parts tax 8.25 %, supplies 4 %, deposit 30 %). The web only shows them; it never prices.
export const LINES: QuoteLine[] = [
  { key: 'line-pan', kind: 'part', source: 'plan', description: 'Rear-sump oil pan', sku: 'TR-4410', catalogKind: 'parts', catalogItemId: 'part-1', laborOperationId: null, quantity: 1, pricing: 'list', unitCostCents: null, markupPercent: null, hours: null, unitPriceCents: 28995, lineTotalCents: 28995 },
  { key: 'line-pickup', kind: 'part', source: 'manual', description: 'Pickup tube and screen', sku: null, catalogKind: null, catalogItemId: null, laborOperationId: null, quantity: 2, pricing: 'cost-plus', unitCostCents: 4137, markupPercent: 35, hours: null, unitPriceCents: 5585, lineTotalCents: 11170 },
  { key: 'line-engine', kind: 'labor', source: 'plan', description: 'Remove and install engine', sku: null, catalogKind: null, catalogItemId: null, laborOperationId: 'op-engine', quantity: 1, pricing: 'list', unitCostCents: null, markupPercent: null, hours: 8.5, unitPriceCents: 13500, lineTotalCents: 114750 },
  { key: 'line-install', kind: 'labor', source: 'manual', description: 'Install pan and pickup', sku: null, catalogKind: null, catalogItemId: null, laborOperationId: null, quantity: 1, pricing: 'list', unitCostCents: null, markupPercent: null, hours: 1.3, unitPriceCents: 13500, lineTotalCents: 17550 },
];

export const TOTALS: Quote['revision']['totals'] = {
  partsSubtotalCents: 40165,
  laborSubtotalCents: 132300,
  suppliesCents: 5292,
  partsDiscountCents: 0,
  laborDiscountCents: 0,
  partsTaxCents: 3314,
  laborTaxCents: 0,
  taxCents: 3314,
  totalCents: 181071,
  depositCents: 54321,
};

export function quoteStub(overrides: Partial<Quote['revision']> = {}, quote: Partial<Quote> = {}): Quote {
  return {
    id: 'quote-7',
    projectId: 'project-1',
    projectTitle: 'Harlan Ridgeback 1978: Kestrel 5.3 V8 swap',
    shopName: 'Test Garage',
    customerName: 'Marlo Penhallow',
    customerEmail: 'marlo@penhallow.test',
    forMyself: false,
    label: 'Q-0007',
    status: 'drafting',
    latestRevision: 1,
    sentRevision: null,
    answeredAt: null,
    declineReason: null,
    depositState: 'not-due',
    depositPaidAt: null,
    roundingRule: 'Each line and each total is rounded to the cent, halves away from zero.',
    revisions: [{ number: 1, sentAt: null, totalCents: 181071 }],
    ...quote,
    revision: {
      number: 1,
      sent: false,
      sentAt: null,
      fitReportId: 'report-1',
      partsPlanId: 'plan-1',
      partsPlanVersion: 2,
      validUntil: '2027-01-15',
      currency: 'USD',
      laborRateCents: 13500,
      suppliesPercent: 4,
      suppliesCapCents: null,
      partsTaxPercent: 8.25,
      laborTaxPercent: 0,
      discountKind: 'none',
      discountPercent: null,
      discountAmountCents: null,
      depositKind: 'percent',
      depositPercent: 30,
      depositAmountCents: null,
      terms: 'Deposit due on approval.',
      notes: '',
      lines: LINES,
      totals: TOTALS,
      createdAt: '2026-12-03T03:00:00.000Z',
      ...overrides,
    },
  };
}
