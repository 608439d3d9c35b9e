import { screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { renderWithApp } from '@/test/render';
import type { WorkOrder } from '../../types';
import { ProjectWorkOrderCard } from '../project-work-order-card';

const order = {
  id: 'wo-7',
  label: 'W-0007',
  state: 'ready',
  steps: [{ key: 'oil-pan-pickup' }, { key: 'mounts' }],
  progress: { passed: 1, failed: 0, total: 6 },
} as unknown as WorkOrder;

describe('ProjectWorkOrderCard', () => {
  afterEach(() => vi.restoreAllMocks());

  it('asks nothing before the deposit stage: a project without a work order makes no request (no 404 in the console)', async () => {
    const get = vi.spyOn(apiClient, 'get');
    const { container } = renderWithApp(<ProjectWorkOrderCard projectId="p-1" toWorkOrder={(id) => `/work-orders/${id}`} opened={false} />);
    await new Promise((resolve) => setTimeout(resolve, 20));
    expect(get).not.toHaveBeenCalled();
    expect(container.querySelector('[data-testid="project-work-order"]')).toBeNull();
  });

  it('once opened, links the work order with its progress', async () => {
    vi.spyOn(apiClient, 'get').mockResolvedValue({ data: order });
    renderWithApp(<ProjectWorkOrderCard projectId="p-1" toWorkOrder={(id) => `/work-orders/${id}`} opened />);
    expect(await screen.findByRole('link', { name: 'Open work order W-0007' })).toHaveAttribute('href', '/work-orders/wo-7');
    expect(screen.getByText(/2 operations in build order · 1 of 6 checks passed/)).toBeInTheDocument();
  });
});
