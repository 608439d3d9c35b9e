import { screen, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { renderWithApp } from '@/test/render';
import { setWindowWidth } from '@/test/viewport';
import type { Membership } from '../../types';
import { MembersTable } from '../members-table';

const members = [
  { id: 'm1', userId: 'u-owner', name: 'Merrin Tolland', email: 'merrin@example.com', role: 'owner', createdAt: '2026-10-02T09:00:00.000Z' },
  { id: 'm2', userId: 'u-est', name: 'Tobin Arkwright', email: 'tobin@example.com', role: 'estimator', createdAt: '2026-10-03T09:00:00.000Z' },
] as unknown as Membership[];

describe('MembersTable', () => {
  it('on a phone puts each member’s email and role under the name, the role still changeable', async () => {
    setWindowWidth(390);
    vi.spyOn(apiClient, 'get').mockResolvedValue({ data: members });
    renderWithApp(<MembersTable currentUserId="u-owner" />);
    const table = await screen.findByRole('table', { name: 'Members' });
    const cell = (await within(table).findByText('Tobin Arkwright')).closest('td') as HTMLElement;
    expect(within(cell).getByText('tobin@example.com')).toBeInTheDocument();
    expect(within(cell).getByRole('combobox', { name: 'Role of Tobin Arkwright' })).toBeInTheDocument();
    expect(within(table).queryByRole('columnheader', { name: 'Role' })).toBeNull();
  });

  it('on a wide screen keeps email and role in their own columns', async () => {
    setWindowWidth(1440);
    vi.spyOn(apiClient, 'get').mockResolvedValue({ data: members });
    renderWithApp(<MembersTable currentUserId="u-owner" />);
    const table = await screen.findByRole('table', { name: 'Members' });
    expect(await within(table).findByRole('columnheader', { name: 'Role' })).toBeInTheDocument();
    const cell = within(table).getByText('Tobin Arkwright').closest('td') as HTMLElement;
    expect(within(cell).queryByText('tobin@example.com')).toBeNull();
    expect(within(table).getAllByRole('combobox', { name: 'Role of Tobin Arkwright' })).toHaveLength(1);
  });
});
