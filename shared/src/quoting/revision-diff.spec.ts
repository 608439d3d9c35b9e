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
        { key: 'a', kind: 'part', description: 'Rear-sump pan', quantity: 1, lineTotalCents: 28995 },
        { key: 'b', kind: 'labor', description: 'Modify crossmember', quantity: 1, lineTotalCents: 38000 },
      ],
      totals: totals(66995),
    };
    const to: ComparableRevision = {
      number: 2,
      lines: [
        { key: 'a', kind: 'part', description: 'Rear-sump pan', quantity: 2, lineTotalCents: 57990 },
        { key: 'c', kind: 'part', description: 'Pickup tube', quantity: 1, lineTotalCents: 5585 },
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

  it('finds nothing between a revision and its copy', () => {
    const revision: ComparableRevision = { number: 1, lines: [{ key: 'a', kind: 'part', description: 'x', quantity: 1, lineTotalCents: 1 }], totals: totals(1) };
    expect(diffRevisions(revision, { ...revision, number: 2 })).toEqual({ fromNumber: 1, toNumber: 2, lines: [], totals: [] });
  });
});
