import { screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { authKeys } from '@/features/auth/api/auth-keys';
import { apiClient } from '@/lib/api-client';
import { pageOf, userStub } from '@/test/fixtures';
import { createTestQueryClient, renderWithApp } from '@/test/render';
import { HomePage } from '../home-page';

const owner = userStub('owner');
const ownRecord = { id: 'cust-self', name: owner.name, email: owner.email, phone: null, notes: null, userId: owner.id, ownRecord: true };
const otherCustomer = { ...ownRecord, id: 'cust-2', name: 'Marlo Penhallow', email: 'marlo@example.com', userId: null, ownRecord: false };
const member = { id: 'm-1', userId: owner.id, role: 'owner', user: { id: owner.id, name: owner.name, email: owner.email } };
const ownProject = {
  id: 'p-own',
  title: 'My flatbed with the yard V8',
  status: 'intake',
  vehicleDescription: 'Invented 1978 half-ton',
  customer: { id: 'cust-self', name: owner.name },
  createdAt: '2026-11-02T09:00:00.000Z',
  updatedAt: '2026-11-20T15:30:00.000Z',
};

function renderHome(customers: unknown[]) {
  vi.spyOn(apiClient, 'get').mockImplementation(async (url: string) => {
    if (url === '/memberships') return { data: [member] };
    if (url === '/customers') return { data: pageOf(customers) };
    if (url === '/projects') return { data: pageOf([ownProject]) };
    return { data: pageOf([]) };
  });
  const queryClient = createTestQueryClient();
  queryClient.setQueryData(authKeys.me(), owner);
  return renderWithApp(<HomePage />, { queryClient });
}

afterEach(() => vi.restoreAllMocks());

describe('HomePage for an owner', () => {
  it('leads someone building their own truck with their projects and next steps, not the shop’s quoting tiles', async () => {
    renderHome([ownRecord]);
    const mine = await screen.findByText('My projects', { selector: '.ant-card-head-title' }, { timeout: 20_000 });
    const card = mine.closest('.ant-card') as HTMLElement;
    expect(await within(card).findByRole('link', { name: 'My flatbed with the yard V8' })).toHaveAttribute('href', '/projects/p-own');
    expect(within(card).getByRole('link', { name: 'Fit check: My flatbed with the yard V8' })).toHaveAttribute('href', '/projects/p-own/fit');
    expect(screen.getByText('Next steps')).toBeInTheDocument();
    expect(screen.getByText('Measure the chassis.')).toBeInTheDocument();
    expect(screen.getByText('Run the fit check.')).toBeInTheDocument();
    expect(screen.getByText('Plan the parts.')).toBeInTheDocument();
    // The empty catalog is offered its start right here.
    expect(await screen.findByRole('button', { name: 'Start from the sample catalog' })).toBeInTheDocument();
    expect(screen.queryByText('Needs a quote')).toBeNull();
    expect(screen.queryByText('Deposit paid, ready for the bay')).toBeNull();
    expect(screen.queryByText('New customers')).toBeNull();
    // The shop's pages stay one link away.
    expect(screen.getByRole('link', { name: 'Customers' })).toHaveAttribute('href', '/customers');
    expect(screen.getByRole('link', { name: 'Members' })).toHaveAttribute('href', '/members');
  });

  it('keeps the shop’s home for a shop with customers of its own', async () => {
    renderHome([ownRecord, otherCustomer]);
    expect(await screen.findByText('Needs a quote', undefined, { timeout: 20_000 })).toBeInTheDocument();
    expect(screen.queryByText('Next steps')).toBeNull();
  });
});
