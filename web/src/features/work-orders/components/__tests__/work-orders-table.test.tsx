import { screen } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { renderWithApp } from '@/test/render';
import { WorkOrdersTable } from '../work-orders-table';

describe('WorkOrdersTable', () => {
  it('says when a work order opens instead of showing an empty table a phone would cut off', async () => {
    vi.spyOn(apiClient, 'get').mockResolvedValue({ data: [] });
    renderWithApp(<WorkOrdersTable toWorkOrder={(id) => `/work-orders/${id}`} />, { route: '/work-orders' });

    expect(await screen.findByText(/one opens when a customer has approved a quote and paid the deposit/)).toBeInTheDocument();
    expect(screen.queryByRole('table', { name: 'Work orders' })).not.toBeInTheDocument();
  });
});
