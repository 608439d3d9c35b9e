import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { authKeys } from '@/features/auth/api/auth-keys';
import { apiClient } from '@/lib/api-client';
import { doubleClick, expectSentOnce, heldAnswer } from '@/test/double-click';
import { customerStubs, pageOf, userStub } from '@/test/fixtures';
import { createTestQueryClient, renderWithApp } from '@/test/render';
import { setWindowWidth } from '@/test/viewport';
import { ProjectsPage } from '../projects-page';

const added = { ...customerStubs[0], id: 'cust-new', name: 'Odile Brackenridge', email: null, phone: null };

describe('ProjectsPage: a customer added from the New project form', () => {
  it('is added once on a double-click and picked in the Customer field by name, so the project opens for them', async () => {
    setWindowWidth(1440);
    // The customer list never includes the new customer here: the field must show the name without a refetch.
    vi.spyOn(apiClient, 'get').mockImplementation(async (url) => {
      if (url === '/customers') return { data: pageOf([customerStubs[0]]) };
      if (url === '/projects') return { data: pageOf([]) };
      return { data: {} };
    });
    const customerAnswer = heldAnswer<{ data: typeof added }>();
    const post = vi.spyOn(apiClient, 'post').mockImplementation(async (url, body) => {
      if (url === '/customers') return customerAnswer.promise;
      return { data: { id: 'p-new', title: 'Tow rig swap', customerId: 'cust-new', customer: { id: 'cust-new', name: added.name }, ...(body as object) } };
    });
    const queryClient = createTestQueryClient();
    queryClient.setQueryData(authKeys.me(), userStub('estimator'));
    renderWithApp(<ProjectsPage />, { route: '/projects?new=1', queryClient });

    const projectForm = await screen.findByRole('form', { name: 'Project' });
    await userEvent.click(within(projectForm).getByRole('button', { name: 'Customer not listed? Add one' }));
    const customerForm = await screen.findByRole('form', { name: 'Customer' });
    await userEvent.type(within(customerForm).getByLabelText('Name'), added.name);

    // A double-click: both clicks land before React re-renders the button as loading.
    doubleClick(screen.getByRole('button', { name: 'Add customer' }));
    await expectSentOnce(post, '/customers');
    customerAnswer.resolve({ data: added });

    await waitFor(() => expect(screen.queryByRole('form', { name: 'Customer' })).toBeNull());
    expect(await screen.findAllByText('Customer added')).toHaveLength(1);
    const customerField = within(projectForm).getByRole('combobox', { name: 'Customer' }).closest('.ant-select') as HTMLElement;
    expect(within(customerField).getByText(added.name)).toBeInTheDocument();
    expect(within(customerField).queryByText('cust-new')).toBeNull();

    await userEvent.type(within(projectForm).getByLabelText('Project title'), 'Tow rig swap');
    await userEvent.type(within(projectForm).getByLabelText('Vehicle'), 'Invented long-bed pickup');
    await userEvent.click(screen.getByRole('button', { name: 'Open project' }));
    await waitFor(() => expect(post).toHaveBeenCalledWith('/projects', expect.objectContaining({ customerId: 'cust-new' }), expect.anything()));
    expect(screen.queryByText('Choose the customer this swap is for')).toBeNull();
  }, 120_000);
});
