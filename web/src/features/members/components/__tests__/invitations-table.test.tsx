import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { renderWithApp } from '@/test/render';
import type { Invitation } from '../../types';
import { InvitationsTable } from '../invitations-table';

const waiting: Invitation = { id: 'inv-1', email: 'wren@example.test', role: 'fabricator', customerId: null, expiresAt: '2099-01-08T10:00:00.000Z', acceptedAt: null };
const joined: Invitation = { id: 'inv-2', email: 'ash@example.test', role: 'counter', customerId: null, expiresAt: '2099-01-01T10:00:00.000Z', acceptedAt: '2026-12-01T10:00:00.000Z' };

describe('InvitationsTable', () => {
  afterEach(() => vi.restoreAllMocks());

  it('sends a waiting invitation again, withdraws one after asking, and offers neither for one already accepted', async () => {
    vi.spyOn(apiClient, 'get').mockResolvedValue({ data: [waiting, joined] });
    const post = vi.spyOn(apiClient, 'post').mockResolvedValue({ data: { ...waiting, expiresAt: '2099-01-15T10:00:00.000Z' } });
    const remove = vi.spyOn(apiClient, 'delete').mockResolvedValue({ data: undefined });
    renderWithApp(<InvitationsTable />);

    const table = await screen.findByRole('table', { name: 'Invitations' });
    const joinedRow = within(table).getByText('ash@example.test').closest('tr')!;
    expect(within(joinedRow).queryByRole('button', { name: /Send again|Withdraw/ })).toBeNull();

    await userEvent.click(within(table).getByRole('button', { name: 'Send again to wren@example.test' }));
    await waitFor(() => expect(post).toHaveBeenCalledWith('/invitations/inv-1/resend'));

    await userEvent.click(within(table).getByRole('button', { name: 'Withdraw the invitation of wren@example.test' }));
    const confirm = await screen.findByRole('tooltip');
    expect(confirm).toHaveTextContent('Its link stops working.');
    expect(remove).not.toHaveBeenCalled();
    await userEvent.click(within(confirm).getByRole('button', { name: 'Withdraw' }));
    await waitFor(() => expect(remove).toHaveBeenCalledWith('/invitations/inv-1'));
  });
});
