import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { renderWithApp } from '@/test/render';
import { setWindowWidth } from '@/test/viewport';
import type { QuoteRevisionDiff } from '../../types';
import { RevisionCompare } from '../revision-compare';
import { quoteStub } from './quote-stub';

// What the API answers for revision 1 -> 2 of the hand-worked quote (api/test/quotes.e2e-spec.ts): the pickup from 2 to 3,
// the engine from 8.5 h to 9.0 h, the 1.3 h line removed, a gasket set added. The web shows it; it does not diff revisions.
const DIFF: QuoteRevisionDiff = {
  fromNumber: 1,
  toNumber: 2,
  lines: [
    { change: 'changed', key: 'line-pickup', kind: 'part', description: 'Pickup tube and screen', fields: ['quantity', 'lineTotalCents'], beforeCents: 11170, afterCents: 16755, before: { quantity: 2, hours: null, unitPriceCents: 5585, lineTotalCents: 11170 }, after: { quantity: 3, hours: null, unitPriceCents: 5585, lineTotalCents: 16755 } },
    { change: 'changed', key: 'line-engine', kind: 'labor', description: 'Remove and install engine', fields: ['hours', 'lineTotalCents'], beforeCents: 114750, afterCents: 121500, before: { quantity: 1, hours: 8.5, unitPriceCents: 13500, lineTotalCents: 114750 }, after: { quantity: 1, hours: 9, unitPriceCents: 13500, lineTotalCents: 121500 } },
    { change: 'removed', key: 'line-install', kind: 'labor', description: 'Install pan and pickup', beforeCents: 17550, afterCents: null, before: { quantity: 1, hours: 1.3, unitPriceCents: 13500, lineTotalCents: 17550 }, after: null },
    { change: 'added', key: 'line-gasket', kind: 'part', description: 'Pan gasket set', beforeCents: null, afterCents: 2450, before: null, after: { quantity: 1, hours: null, unitPriceCents: 2450, lineTotalCents: 2450 } },
  ],
  totals: [
    { field: 'partsSubtotalCents', beforeCents: 40165, afterCents: 48200, deltaCents: 8035 },
    { field: 'laborSubtotalCents', beforeCents: 132300, afterCents: 121500, deltaCents: -10800 },
  ],
};

describe('RevisionCompare', () => {
  it("asks the API for the two newest revisions and shows each line's before and after and the totals that moved", async () => {
    const get = vi.spyOn(apiClient, 'get').mockResolvedValue({ data: DIFF });
    const quote = quoteStub({ number: 2 }, {
      latestRevision: 2,
      sentRevision: 1,
      revisions: [
        { number: 1, sentAt: '2026-12-03T03:10:00.000Z', totalCents: 181071 },
        { number: 2, sentAt: null, totalCents: 176742 },
      ],
    });
    renderWithApp(<RevisionCompare quote={quote} />);
    await waitFor(() => expect(get).toHaveBeenCalledWith('/quotes/quote-7/compare', expect.objectContaining({ params: { from: 1, to: 2 } })));

    const lines = await screen.findByRole('table', { name: 'Lines changed' });
    const row = (text: string) => within(lines).getByText(text).closest('tr')!;
    expect(row('Pickup tube and screen')).toHaveTextContent(/Changed.*2 → 3.*\$55\.85.*\$111\.70 → \$167\.55/);
    expect(row('Remove and install engine')).toHaveTextContent(/8\.5 h → 9\.0 h.*\$1,147\.50 → \$1,215\.00/);
    expect(row('Install pan and pickup')).toHaveTextContent(/Removed.*1\.3 h/);
    expect(row('Pan gasket set')).toHaveTextContent(/Added.*\$24\.50/);

    const totals = screen.getByRole('table', { name: 'Totals changed' });
    // Hand-checked deltas: 482.00 - 401.65 = +80.35; 1,215.00 - 1,323.00 = -108.00.
    expect(within(totals).getByText('Parts').closest('tr')).toHaveTextContent(/\$401\.65.*\$482\.00.*\+\$80\.35/);
    expect(within(totals).getByText('Labor').closest('tr')).toHaveTextContent(/\$1,323\.00.*\$1,215\.00.*−\$108\.00/);
  });

  it('on a phone shows each changed line as one stacked cell, no column past the edge', async () => {
    setWindowWidth(390);
    vi.spyOn(apiClient, 'get').mockResolvedValue({ data: DIFF });
    const quote = quoteStub({ number: 2 }, {
      latestRevision: 2,
      sentRevision: 1,
      revisions: [
        { number: 1, sentAt: '2026-12-03T03:10:00.000Z', totalCents: 181071 },
        { number: 2, sentAt: null, totalCents: 176742 },
      ],
    });
    renderWithApp(<RevisionCompare quote={quote} />);
    const lines = await screen.findByRole('table', { name: 'Lines changed' });
    expect(within(lines).getAllByRole('columnheader').map((header) => header.textContent)).toEqual(['Line']);
    const row = within(lines).getByText('Pickup tube and screen').closest('tr')!;
    expect(row).toHaveTextContent(/Changed.*Pickup tube and screen.*2 → 3 × \$55\.85.*Amount \$111\.70 → \$167\.55/);
  });
});
