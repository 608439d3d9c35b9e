import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { pageOf } from '@/test/fixtures';
import { renderWithApp } from '@/test/render';
import { setWindowWidth } from '@/test/viewport';
import type { Project } from '../../types';
import { ProjectsTable } from '../projects-table';

const project = {
  id: 'p1',
  title: 'Longbed V8 swap',
  vehicleDescription: 'Long-bed pickup, original six removed, frame straight, light surface rust on the rails',
  status: 'intake',
  customer: { id: 'cust-1', name: 'Marlo Penhallow' },
  goals: { use: 'street' },
  createdAt: '2026-10-02T09:00:00.000Z',
  updatedAt: '2026-11-20T15:30:00.000Z',
} as unknown as Project;

function mockProjectsApi() {
  return vi.spyOn(apiClient, 'get').mockImplementation(async () => ({ data: pageOf([project]) }));
}

describe('ProjectsTable', () => {
  it('on a phone shows the customer under the title and offers a stage picker beside the search', async () => {
    setWindowWidth(390);
    const get = mockProjectsApi();
    const onQueryChange = vi.fn();
    renderWithApp(<ProjectsTable query={{ page: 1, pageSize: 20 }} onQueryChange={onQueryChange} />);
    const table = await screen.findByRole('table', { name: 'Projects' });
    const titleCell = (await within(table).findByRole('link', { name: 'Longbed V8 swap' })).closest('td') as HTMLElement;
    expect(within(titleCell).getByText('Marlo Penhallow')).toBeInTheDocument();
    expect(within(table).queryByRole('columnheader', { name: /Customer/ })).toBeNull();

    await userEvent.click(screen.getByRole('combobox', { name: 'Stage' }));
    await userEvent.click(await screen.findByTitle('Intake'));
    await waitFor(() => expect(onQueryChange).toHaveBeenCalledWith({ status: 'intake', page: 1 }));
    expect(get).toHaveBeenCalledWith('/projects', expect.anything());
  });

  it('on a wide screen keeps the customer in its own column', async () => {
    setWindowWidth(1440);
    mockProjectsApi();
    renderWithApp(<ProjectsTable query={{ page: 1, pageSize: 20 }} onQueryChange={vi.fn()} />);
    const table = await screen.findByRole('table', { name: 'Projects' });
    const titleCell = (await within(table).findByRole('link', { name: 'Longbed V8 swap' })).closest('td') as HTMLElement;
    expect(within(titleCell).queryByText('Marlo Penhallow')).toBeNull();
    expect(within(table).getByRole('columnheader', { name: /Customer/ })).toBeInTheDocument();
    expect(within(table).getByText('Marlo Penhallow')).toBeInTheDocument();
    expect(screen.queryByRole('combobox', { name: 'Stage' })).toBeNull();
    // The search button and the stage filter's funnel say what they do.
    expect(screen.getByRole('button', { name: 'Search projects by title or vehicle' })).toBeInTheDocument();
    expect(within(table).getByRole('button', { name: 'Filter by stage' })).toBeInTheDocument();
  });
});
