import { screen, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { renderWithApp } from '@/test/render';
import { setWindowWidth } from '@/test/viewport';
import type { WorkOrderSummary } from '../../types';
import { WorkOrdersTable } from '../work-orders-table';

describe('WorkOrdersTable', () => {
  it('says when a work order opens instead of showing an empty table a phone would cut off', async () => {
    vi.spyOn(apiClient, 'get').mockResolvedValue({ data: [] });
    renderWithApp(<WorkOrdersTable toWorkOrder={(id) => `/work-orders/${id}`} />, { route: '/work-orders' });

    expect(await screen.findByText(/one opens when a customer has approved a quote and paid the deposit/)).toBeInTheDocument();
    expect(screen.queryByRole('table', { name: 'Work orders' })).not.toBeInTheDocument();
  });

  const ORDERS: WorkOrderSummary[] = [
    {
      id: 'wo-1',
      label: 'W-0001',
      state: 'in-the-bay',
      projectId: 'project-1',
      projectTitle: 'Invented pickup 1978: V8 swap',
      customerName: 'Juno Example',
      createdAt: '2026-12-01T10:00:00.000Z',
      progress: { passed: 3, failed: 1, total: 8, open: 4 },
    },
  ];

  it('on a phone shows each order as one stacked cell (label, state, project, checks, opened), no column to scroll to', async () => {
    setWindowWidth(390);
    vi.spyOn(apiClient, 'get').mockResolvedValue({ data: ORDERS });
    renderWithApp(<WorkOrdersTable toWorkOrder={(id) => `/work-orders/${id}`} />, { route: '/work-orders' });

    const cell = await screen.findByTestId('work-order-W-0001');
    expect(within(cell).getByRole('link', { name: 'W-0001' })).toHaveAttribute('href', '/work-orders/wo-1');
    expect(cell).toHaveTextContent('In the bay');
    expect(cell).toHaveTextContent('Invented pickup 1978: V8 swap · Juno Example');
    expect(cell).toHaveTextContent('Checks passed 3 of 8 (1 failed) · opened');
    expect(screen.getAllByRole('columnheader').map((header) => header.textContent)).toEqual(['Work order']);
  });

  it('on a wide screen keeps a column for each figure', async () => {
    setWindowWidth(1440);
    vi.spyOn(apiClient, 'get').mockResolvedValue({ data: ORDERS });
    renderWithApp(<WorkOrdersTable toWorkOrder={(id) => `/work-orders/${id}`} />, { route: '/work-orders' });

    await screen.findByRole('link', { name: 'W-0001' });
    expect(screen.getAllByRole('columnheader').map((header) => header.textContent)).toEqual(['Work order', 'Project', 'State', 'Checks passed', 'Opened']);
    expect(screen.queryByTestId('work-order-W-0001')).not.toBeInTheDocument();
  });
});
