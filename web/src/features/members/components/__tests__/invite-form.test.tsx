import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { renderWithApp } from '@/test/render';
import { InviteForm } from '../invite-form';

async function openCustomerPicker(): Promise<void> {
  await userEvent.click(screen.getByRole('combobox', { name: 'Role' }));
  await userEvent.click(await screen.findByTitle('Customer'));
  await userEvent.click(await screen.findByRole('combobox', { name: 'Customer record' }));
}

describe('InviteForm', () => {
  it('says it is looking while the customer records load, not that there are none', async () => {
    renderWithApp(<InviteForm customerOptions={[]} customersLoading />);
    await openCustomerPicker();
    expect(await screen.findByText('Looking…')).toBeInTheDocument();
    expect(screen.queryByText('No customer found')).toBeNull();
  });

  it('says no customer was found once the search answered with none', async () => {
    renderWithApp(<InviteForm customerOptions={[]} customersLoading={false} />);
    await openCustomerPicker();
    expect(await screen.findByText('No customer found')).toBeInTheDocument();
  });

  it('asks for the role instead of picking one for the owner', async () => {
    renderWithApp(<InviteForm customerOptions={[]} customersLoading={false} />);
    await userEvent.type(screen.getByLabelText('Email'), 'wren@example.test');
    await userEvent.click(screen.getByRole('button', { name: 'Send invitation' }));
    expect(await screen.findByText('Choose what this person does in the shop')).toBeInTheDocument();
  });
});
