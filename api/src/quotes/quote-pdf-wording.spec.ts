import type { Shop } from '../shops/shop.entity';
import { pdfText } from '../../test/helpers/pdf-text';
import { QuotePdfService, resolvedByLine } from './quote-pdf.service';
import type { QuoteView } from './quotes.service';

describe('the quote PDF: remedies under a shortfall', () => {
  it('reads as one sentence, each remedy without its own full stop before the separator', () => {
    // Common practice (no published source): a run-in list of clauses is separated by semicolons and ends with one full stop.
    expect(resolvedByLine(['A rear-sump pan that bolts to this engine clears the crossmember.', 'Notch the crossmember (3.5 h)'])).toBe(
      'Resolved by: A rear-sump pan that bolts to this engine clears the crossmember; Notch the crossmember (3.5 h).',
    );
    expect(resolvedByLine(['Raise the engine 12 mm. '])).toBe('Resolved by: Raise the engine 12 mm.');
  });
});

describe('the quote PDF: days', () => {
  const totals = { partsSubtotalCents: 0, laborSubtotalCents: 13500, suppliesCents: 0, partsDiscountCents: 0, laborDiscountCents: 0, partsTaxCents: 0, laborTaxCents: 0, taxCents: 0, totalCents: 13500, depositCents: 4050 };
  const view = (sentAt: Date | null) =>
    ({
      quote: { number: 3 },
      project: { title: 'Invented flatbed: diesel swap', vehicleDescription: '', customer: { name: 'Test Customer', email: 'customer@example.test', phone: null } },
      revision: {
        number: 2,
        sentAt,
        createdAt: new Date('2026-12-01T10:00:00Z'),
        validUntil: '2027-01-15',
        currency: 'USD',
        laborRateCents: 13500,
        lines: [{ kind: 'labor', source: 'manual', description: 'Remove and install engine', quantity: 1, hours: 1, unitPriceCents: 13500, lineTotalCents: 13500 }],
        totals,
        depositKind: 'percent',
        depositPercent: 30,
        terms: 'Deposit due on approval.',
        partsPlanVersion: null,
      },
    }) as unknown as QuoteView;
  const render = (sentAt: Date | null, timeZone = 'UTC') =>
    new QuotePdfService().render({ view: view(sentAt), shop: { name: 'Test Garage', timeZone } as Shop, report: null });

  it('prints the last valid day and the issue day as days a customer reads, never as ISO dates', async () => {
    // Source: Unicode CLDR, locale "en", medium date pattern "MMM d, y" (ECMA-402 Intl.DateTimeFormat, month short).
    // A calendar day is that day in every zone; the day of sending is its day in the shop's time zone.
    const text = await pdfText(await render(new Date('2026-12-03T23:30:00-08:00')));
    expect(text).toContain('Valid until Jan 15, 2027');
    expect(text).toContain('Issued Dec 4, 2026');
    expect(text).not.toMatch(/\d{4}-\d{2}-\d{2}/);
  });

  it("dates the sending by the shop's own day, not the UTC day", async () => {
    // Source: IANA tz database: America/Denver is UTC−7 in winter (MST); 2026-12-04T03:30Z is 20:30 on Dec 3 there.
    expect(await pdfText(await render(new Date('2026-12-04T03:30:00Z'), 'America/Denver'))).toContain('Issued Dec 3, 2026');
    expect(await pdfText(await render(new Date('2026-12-04T03:30:00Z'), 'UTC'))).toContain('Issued Dec 4, 2026');
  });

  it('dates a revision not sent yet by the day it was written', async () => {
    expect(await pdfText(await render(null))).toContain('Issued Dec 1, 2026');
  });

  it("prints a builder's own budget without a deposit, approval terms or a last valid day", async () => {
    const quote = (await pdfText(await render(null))).replace(/\s+/g, ' ');
    expect(quote).toContain('Deposit due on approval');
    const budget = (
      await pdfText(await new QuotePdfService().render({ view: view(null), shop: { name: 'Test Garage', timeZone: 'UTC' } as Shop, report: null, forMyself: true }))
    ).replace(/\s+/g, ' ');
    expect(budget).toContain('Budget Q-0003');
    expect(budget).toContain('Written Dec 1, 2026');
    expect(budget).not.toMatch(/Deposit due|The deposit is|Valid until|\b[Qq]uote\b/);
    expect(budget).toContain('Builder Test Customer');
    expect(budget).toContain('the lines are your own estimate');
    expect(budget).toContain('Total $135.00');
  });
});

describe('the quote PDF: figures in the shop\'s units', () => {
  const line = 'Rework the transmission crossmember: relocate it 72.3 mm (2.85 in) rearward and drop it 8.7 mm (0.34 in), or fit a drop crossmember';
  const view = {
    quote: { number: 4 },
    project: { title: 'Invented flatbed: diesel swap', vehicleDescription: '', customer: { name: 'Test Customer', email: null, phone: null } },
    revision: {
      number: 1,
      sentAt: null,
      createdAt: new Date('2026-12-01T10:00:00Z'),
      validUntil: '2027-01-15',
      currency: 'USD',
      laborRateCents: 10000,
      lines: [
        { kind: 'part', source: 'parts-plan', description: 'Heavy mount kit, 90 mm', quantity: 1, hours: null, unitPriceCents: 0, lineTotalCents: 0 },
        { kind: 'labor', source: 'parts-plan', description: line, quantity: 1, hours: 4, unitPriceCents: 10000, lineTotalCents: 40000 },
      ],
      totals: { partsSubtotalCents: 0, laborSubtotalCents: 40000, suppliesCents: 0, partsDiscountCents: 0, laborDiscountCents: 0, partsTaxCents: 0, laborTaxCents: 0, taxCents: 0, totalCents: 40000, depositCents: 12000 },
      depositKind: 'percent',
      depositPercent: 30,
      terms: 'Deposit due on approval.',
      partsPlanVersion: 2,
    },
  } as unknown as QuoteView;
  const text = async (unitSystem: Shop['unitSystem']) =>
    (await pdfText(await new QuotePdfService().render({ view, shop: { name: 'Test Garage', unitSystem, timeZone: 'UTC' } as Shop, report: null }))).replace(/\s+/g, ' ');

  it('an inch shop\'s quote reads every length in inches only', async () => {
    // Source: NIST SP 811 (2008), Appendix B.8: 1 in = 25.4 mm exactly; 72.3 mm = 2.85 in and 8.7 mm = 0.34 in to two places.
    const pdf = await text('in');
    expect(pdf).toContain('relocate it 2.85 in rearward and drop it 0.34 in');
    // A lone figure in a part's name is the maker's and stays as printed.
    expect(pdf).toContain('Heavy mount kit, 90 mm');
    expect(pdf.replace('Heavy mount kit, 90 mm', '')).not.toMatch(/\d mm/);
  });

  it('a millimetre shop\'s quote reads them in millimetres only', async () => {
    const pdf = await text('mm');
    expect(pdf).toContain('relocate it 72.3 mm rearward and drop it 8.7 mm');
    expect(pdf).not.toMatch(/\d(\.\d+)? in\b/);
  });
});
