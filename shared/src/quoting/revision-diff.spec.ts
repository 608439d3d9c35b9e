import { diffRevisions, ComparableRevision } from './revision-diff';
import { QuoteTotals } from './quote-money';

// Common practice (no published source): a revision comparison lists lines added, removed and changed, and totals that moved.
const totals = (total: number): QuoteTotals => ({
  partsSubtotalCents: total,
  laborSubtotalCents: 0,
  suppliesCents: 0,
  partsDiscountCents: 0,
  laborDiscountCents: 0,
  partsTaxCents: 0,
  laborTaxCents: 0,
  taxCents: 0,
  totalCents: total,
  depositCents: 0,
});

describe('diffRevisions', () => {
  it('lists added, removed and changed lines and the totals that moved', () => {
    const from: ComparableRevision = {
      number: 1,
      lines: [
        { key: 'a', kind: 'part', description: 'Rear-sump pan', quantity: 1, hours: null, unitPriceCents: 28995, lineTotalCents: 28995 },
        { key: 'b', kind: 'labor', description: 'Modify crossmember', quantity: 1, hours: 4, unitPriceCents: 9500, lineTotalCents: 38000 },
      ],
      totals: totals(66995),
    };
    const to: ComparableRevision = {
      number: 2,
      lines: [
        { key: 'a', kind: 'part', description: 'Rear-sump pan', quantity: 2, hours: null, unitPriceCents: 28995, lineTotalCents: 57990 },
        { key: 'c', kind: 'part', description: 'Pickup tube', quantity: 1, hours: null, unitPriceCents: 5585, lineTotalCents: 5585 },
      ],
      totals: totals(63575),
    };
    const diff = diffRevisions(from, to);
    expect(diff.lines.map((line) => [line.change, line.key])).toEqual([
      ['changed', 'a'],
      ['removed', 'b'],
      ['added', 'c'],
    ]);
    expect(diff.lines[0]).toMatchObject({ fields: ['quantity', 'lineTotalCents'] });
    expect(diff.totals).toEqual([
      { field: 'partsSubtotalCents', beforeCents: 66995, afterCents: 63575, deltaCents: -3420 },
      { field: 'totalCents', beforeCents: 66995, afterCents: 63575, deltaCents: -3420 },
    ]);
  });

  it('names the hours of a labor line and the unit price of a part line that changed', () => {
    // Hand-computed: 4.0 h at 95.00 = 380.00; 5.5 h at 95.00 = 522.50. 289.95 raised to 310.00 on one unit.
    const revision = (number: number, hours: number, unitPriceCents: number, totalCents: number): ComparableRevision => ({
      number,
      lines: [
        { key: 'b', kind: 'labor', description: 'Modify crossmember', quantity: 1, hours, unitPriceCents: 9500, lineTotalCents: hours * 9500 },
        { key: 'a', kind: 'part', description: 'Rear-sump pan', quantity: 1, hours: null, unitPriceCents, lineTotalCents: unitPriceCents },
      ],
      totals: totals(totalCents),
    });
    const from = revision(1, 4, 28995, 66995);
    const to = revision(2, 5.5, 31000, 83250);
    const diff = diffRevisions(from, to);
    expect(diff.lines).toMatchObject([
      { change: 'changed', key: 'b', fields: ['hours', 'lineTotalCents'], before: { hours: 4 }, after: { hours: 5.5, lineTotalCents: 52250 } },
      { change: 'changed', key: 'a', fields: ['unitPriceCents', 'lineTotalCents'], before: { unitPriceCents: 28995 }, after: { unitPriceCents: 31000 } },
    ]);
    expect(diff.totals).toContainEqual({ field: 'totalCents', beforeCents: 66995, afterCents: 83250, deltaCents: 16255 });
  });

  it('finds nothing between a revision and its copy', () => {
    const revision: ComparableRevision = { number: 1, lines: [{ key: 'a', kind: 'part', description: 'x', quantity: 1, hours: null, unitPriceCents: 1, lineTotalCents: 1 }], totals: totals(1) };
    expect(diffRevisions(revision, { ...revision, number: 2 })).toEqual({ fromNumber: 1, toNumber: 2, lines: [], totals: [] });
  });
});
