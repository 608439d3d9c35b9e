import { screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { renderWithApp } from '@/test/render';
import { setWindowWidth } from '@/test/viewport';
import type { Part, PartPage } from '../../api/get-parts';
import { PartsTable } from '../parts-table';

const place = (id: string, location: string, bin: string) => ({ id, location, bin, onHand: 1, reserved: 0, available: 1 });

const PAN: Part = {
  id: 'part-1',
  sku: 'TR-4410',
  description: 'Rear-sump swap pan, invented rail',
  category: 'oil-pan',
  priceCents: 28995,
  costCents: 19000,
  ...{ supplierId: null, supplierName: null, supplierSku: null, laborHours: 1.3, torqueSpecs: [], instructions: null, attributes: {} },
  ...{ requiresSkus: [], excludesSkus: [], replacesSkus: [], fitKind: null, fitSpecId: null },
  stock: [place('s1', 'Main store', 'C-02-1'), place('s2', 'Yard', '')],
  onHand: 2,
  available: 2,
  updatedAt: '2026-12-01T10:00:00.000Z',
};

describe('PartsTable bins', () => {
  afterEach(() => vi.restoreAllMocks());

  it('lists each place, and a bin code never breaks at its hyphens', async () => {
    setWindowWidth(1440);
    const page: PartPage = { items: [PAN], total: 1, page: 1, pageSize: 20 };
    vi.spyOn(apiClient, 'get').mockImplementation(async (url: string) => ({ data: url === '/parts' ? page : { items: [], total: 0, page: 1, pageSize: 100 } }));
    renderWithApp(<PartsTable currency="USD" />);
    const row = await screen.findByRole('row', { name: /TR-4410/ });
    expect(row).toHaveTextContent('Main store C-02-1, Yard');
    expect(within(row).getByText('C-02-1')).toHaveStyle({ whiteSpace: 'nowrap' });
  });
});
