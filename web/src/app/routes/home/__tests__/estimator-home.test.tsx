import { screen, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { authKeys } from '@/features/auth/api/auth-keys';
import { apiClient } from '@/lib/api-client';
import { pageOf, userStub } from '@/test/fixtures';
import { createTestQueryClient, renderWithApp } from '@/test/render';
import { EstimatorHome } from '../estimator-home';

const project = (id: string, title: string, status: string) => ({
  id,
  title,
  status,
  vehicleDescription: 'Long-bed pickup',
  customer: { id: 'cust-1', name: 'Marlo Penhallow' },
  createdAt: '2026-10-02T09:00:00.000Z',
  updatedAt: '2026-11-20T15:30:00.000Z',
});

describe('EstimatorHome', () => {
  it('lists new and measured projects with a link straight to their fit check, so a fresh day is not all empty cards', async () => {
    vi.spyOn(apiClient, 'get').mockImplementation(async (url, config) => {
      const status = (config?.params as { status?: string } | undefined)?.status;
      if (url === '/projects' && status === 'intake') return { data: pageOf([project('p-new', 'Longbed V8 swap', 'intake')]) };
      if (url === '/projects' && status === 'measured') return { data: pageOf([project('p-meas', 'Flatbed diesel swap', 'measured')]) };
      return { data: pageOf([]) };
    });
    const queryClient = createTestQueryClient();
    queryClient.setQueryData(authKeys.me(), userStub('estimator'));
    renderWithApp(<EstimatorHome />, { queryClient });

    const ready = await screen.findByRole('list', { name: 'Projects ready for a fit check' });
    expect(within(ready).getByRole('link', { name: 'Flatbed diesel swap' })).toBeInTheDocument();
    expect(within(ready).getByRole('link', { name: 'Fit check: Flatbed diesel swap' }).getAttribute('href')).toBe('/projects/p-meas/fit');

    const waiting = await screen.findByRole('list', { name: 'New projects waiting to be measured' });
    expect(within(waiting).getByRole('link', { name: 'Longbed V8 swap' }).getAttribute('href')).toBe('/projects/p-new');
  });
});
