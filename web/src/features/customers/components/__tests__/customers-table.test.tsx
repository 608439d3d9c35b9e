import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { useListSearchParams } from '@/hooks/use-list-search-params';
import { apiClient } from '@/lib/api-client';
import { customerStubs, pageOf } from '@/test/fixtures';
import { renderWithApp } from '@/test/render';
import { setWindowWidth } from '@/test/viewport';
import { customerSortFields } from '../../types';
import { CustomersTable } from '../customers-table';

function CustomersTableInUrl() {
  const [params, setParams] = useListSearchParams({ sortFields: customerSortFields });
  return (
    <CustomersTable
      query={{ page: params.page, pageSize: params.pageSize, sort: params.sort, order: params.order, search: params.search }}
      onQueryChange={setParams}
      canEdit
    />
  );
}

function mockCustomersApi() {
  return vi.spyOn(apiClient, 'get').mockImplementation(async () => ({ data: pageOf(customerStubs, 1, 20, 42) }));
}

describe('CustomersTable', () => {
  it('renders the rows the query returns', async () => {
    const get = mockCustomersApi();
    renderWithApp(<CustomersTableInUrl />, { route: '/customers' });

    const table = await screen.findByRole('table', { name: 'Customers' });
    expect(await within(table).findByText('Marlo Penhallow')).toBeInTheDocument();
    expect(within(table).getByText('Tove Quillfeather')).toBeInTheDocument();
    expect(within(table).getByText('marlo@example.com')).toBeInTheDocument();
    expect(screen.getByText('1–20 of 42')).toBeInTheDocument();
    expect(get).toHaveBeenCalledWith('/customers', expect.objectContaining({ params: { page: 1, pageSize: 20 } }));
  });

  it('a click on a column header sorts on the server and keeps the sort in the URL', async () => {
    const get = mockCustomersApi();
    renderWithApp(<CustomersTableInUrl />, { route: '/customers?page=2' });
    await screen.findByText('Marlo Penhallow');

    await userEvent.click(screen.getByRole('columnheader', { name: /Name/ }));

    await waitFor(() =>
      expect(get).toHaveBeenLastCalledWith(
        '/customers',
        expect.objectContaining({ params: expect.objectContaining({ sort: 'name', order: 'asc', page: 1 }) }),
      ),
    );
    expect(screen.getByTestId('location').textContent).toBe('/customers?sort=name&order=asc');

    await userEvent.click(screen.getByRole('columnheader', { name: /Name/ }));
    await waitFor(() => expect(screen.getByTestId('location').textContent).toBe('/customers?sort=name&order=desc'));
    expect(get).toHaveBeenLastCalledWith('/customers', expect.objectContaining({ params: expect.objectContaining({ sort: 'name', order: 'desc' }) }));
  });

  it('reads sort, page and search from the URL on first load', async () => {
    const get = mockCustomersApi();
    renderWithApp(<CustomersTableInUrl />, { route: '/customers?sort=createdAt&order=desc&page=3&search=marlo' });
    await screen.findByText('Marlo Penhallow');
    expect(get).toHaveBeenCalledWith(
      '/customers',
      expect.objectContaining({ params: { page: 3, pageSize: 20, sort: 'createdAt', order: 'desc', search: 'marlo' } }),
    );
  });

  it('offers to add the first customer when there are none', async () => {
    vi.spyOn(apiClient, 'get').mockResolvedValue({ data: pageOf([], 1, 20, 0) });
    const onCreate = vi.fn();
    renderWithApp(<CustomersTable query={{ page: 1, pageSize: 20 }} onQueryChange={vi.fn()} canEdit onCreate={onCreate} />);
    await userEvent.click(await screen.findByRole('button', { name: 'Add a customer' }, { timeout: 10_000 }));
    expect(onCreate).toHaveBeenCalled();
  });

  it('on a phone puts email and phone under the name instead of squeezing the name into a column', async () => {
    setWindowWidth(390);
    mockCustomersApi();
    renderWithApp(<CustomersTableInUrl />, { route: '/customers' });
    const table = await screen.findByRole('table', { name: 'Customers' });
    const nameCell = (await within(table).findByText('Marlo Penhallow')).closest('td') as HTMLElement;
    expect(within(nameCell).getByRole('link', { name: 'marlo@example.com' }).getAttribute('href')).toBe('mailto:marlo@example.com');
    expect(within(nameCell).getByRole('link', { name: '555-0142' }).getAttribute('href')).toBe('tel:5550142');
    expect(within(table).queryByRole('columnheader', { name: /Email/ })).toBeNull();
  });

  it('on a wide screen keeps email and phone in their own columns', async () => {
    setWindowWidth(1440);
    mockCustomersApi();
    renderWithApp(<CustomersTableInUrl />, { route: '/customers' });
    const table = await screen.findByRole('table', { name: 'Customers' });
    const nameCell = (await within(table).findByText('Marlo Penhallow')).closest('td') as HTMLElement;
    expect(within(nameCell).queryByText('marlo@example.com')).toBeNull();
    expect(within(table).getByRole('columnheader', { name: /Email/ })).toBeInTheDocument();
    expect(within(table).getByText('marlo@example.com')).toBeInTheDocument();
  });

  it("marks the member's own record as themselves, keeps it listed, and offers no removal of it", async () => {
    setWindowWidth(1440);
    const own = { ...customerStubs[0], id: 'cust-own', name: 'Wren Halloway', email: 'wren@example.com', userId: 'user-me', ownRecord: true };
    vi.spyOn(apiClient, 'get').mockResolvedValue({ data: pageOf([own, ...customerStubs]) });
    renderWithApp(<CustomersTableInUrl />, { route: '/customers' });
    const table = await screen.findByRole('table', { name: 'Customers' });
    const mine = await within(table).findByRole('row', { name: /Wren Halloway/ });
    expect(within(mine).getByTestId('own-record-tag')).toHaveTextContent('You');
    expect(mine).toHaveTextContent('Your own record, used for My own truck');
    // no "Signed up" for oneself, and nothing to remove or invite
    expect(mine).toHaveTextContent('Your own sign-in');
    expect(mine).not.toHaveTextContent('Signed up');
    expect(within(mine).getByRole('button', { name: 'Edit Wren Halloway' })).toBeInTheDocument();
    expect(within(mine).queryByRole('button', { name: 'Remove Wren Halloway' })).toBeNull();
    // the other customers read as before
    const other = within(table).getByRole('row', { name: /Tove Quillfeather/ });
    expect(within(other).queryByTestId('own-record-tag')).toBeNull();
    expect(other).toHaveTextContent('Signed up');
    expect(within(other).getByRole('button', { name: 'Remove Tove Quillfeather' })).toBeInTheDocument();
  });
});
