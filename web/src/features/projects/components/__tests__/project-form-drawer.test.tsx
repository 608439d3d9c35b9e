import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useState } from 'react';
import { describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { doubleClick, expectSentOnce, heldAnswer } from '@/test/double-click';
import { renderWithApp } from '@/test/render';
import { setWindowWidth } from '@/test/viewport';
import type { Project } from '../../types';
import { ProjectFormDrawer } from '../project-form-drawer';

const saved = {
  id: 'p9',
  title: 'Own flatbed swap',
  vehicleDescription: 'Invented 1979 flatbed',
  status: 'intake',
  customerId: 'own-1',
  customer: { id: 'own-1', name: 'Wren Halloway' },
  goals: { use: 'street', targetPowerKw: null, revLimitRpm: null, budgetCents: null },
  placement: null,
} as unknown as Project;

const customerOptions = [{ value: 'cust-1', label: 'Marlo Penhallow' }];

function mockCreate() {
  return vi.spyOn(apiClient, 'post').mockImplementation(async () => ({ data: saved }));
}

async function fillTitleAndVehicle() {
  await userEvent.type(screen.getByLabelText('Project title'), 'Own flatbed swap');
  await userEvent.type(screen.getByLabelText('Vehicle'), 'Invented 1979 flatbed');
}

describe('ProjectFormDrawer: whose vehicle', () => {
  it('starts as "My own truck" in a shop with no customers yet, hides the customer picker and sends forMyself', async () => {
    setWindowWidth(1440);
    const post = mockCreate();
    renderWithApp(<ProjectFormDrawer open onClose={vi.fn()} customerOptions={[]} noOtherCustomers />);
    expect(await screen.findByRole('radio', { name: 'My own truck' })).toBeChecked();
    // The picker follows the watched choice one render after the radio is set.
    await waitFor(() => expect(screen.queryByRole('combobox', { name: 'Customer' })).toBeNull());
    expect(screen.getByTestId('own-truck-note')).toBeInTheDocument();
    await fillTitleAndVehicle();
    await userEvent.click(screen.getByRole('button', { name: 'Open project' }));
    await waitFor(() => expect(post).toHaveBeenCalled());
    const body = post.mock.calls[0][1] as Record<string, unknown>;
    expect(post.mock.calls[0][0]).toBe('/projects');
    expect(body).toMatchObject({ forMyself: true, title: 'Own flatbed swap', vehicleDescription: 'Invented 1979 flatbed' });
    expect(body).not.toHaveProperty('customerId');
  });

  it('starts as "For a customer" when the shop has customers and asks for one before sending', async () => {
    setWindowWidth(390);
    const post = mockCreate();
    renderWithApp(<ProjectFormDrawer open onClose={vi.fn()} customerOptions={customerOptions} noOtherCustomers={false} />);
    expect(await screen.findByRole('radio', { name: 'For a customer' })).toBeChecked();
    expect(screen.getByRole('combobox', { name: 'Customer' })).toBeInTheDocument();
    await fillTitleAndVehicle();
    await userEvent.click(screen.getByRole('button', { name: 'Open project' }));
    expect(await screen.findByText('Choose the customer this swap is for')).toBeInTheDocument();
    expect(post).not.toHaveBeenCalled();

    await userEvent.click(screen.getByText('My own truck'));
    expect(screen.queryByRole('combobox', { name: 'Customer' })).toBeNull();
    await userEvent.click(screen.getByRole('button', { name: 'Open project' }));
    await waitFor(() => expect(post).toHaveBeenCalledTimes(1));
    expect(post.mock.calls[0][1]).toMatchObject({ forMyself: true });
  });

  it('sends the chosen customer and no forMyself for a customer project', async () => {
    setWindowWidth(1440);
    const post = mockCreate();
    renderWithApp(<ProjectFormDrawer open onClose={vi.fn()} customerOptions={customerOptions} defaultCustomerId="cust-1" noOtherCustomers />);
    expect(await screen.findByRole('radio', { name: 'For a customer' })).toBeChecked();
    await fillTitleAndVehicle();
    await userEvent.click(screen.getByRole('button', { name: 'Open project' }));
    await waitFor(() => expect(post).toHaveBeenCalled());
    const body = post.mock.calls[0][1] as Record<string, unknown>;
    expect(body).toMatchObject({ customerId: 'cust-1' });
    expect(body).not.toHaveProperty('forMyself');
  });

  it('offers no choice when editing a project', async () => {
    setWindowWidth(1440);
    renderWithApp(<ProjectFormDrawer open project={saved} onClose={vi.fn()} customerOptions={customerOptions} />);
    expect(await screen.findByRole('combobox', { name: 'Customer' })).toBeInTheDocument();
    expect(screen.queryByRole('radio', { name: 'My own truck' })).toBeNull();
  });
});

describe('ProjectFormDrawer: one project per submit', () => {
  it('opens one project when "Open project" is double-clicked', async () => {
    setWindowWidth(1440);
    const answer = heldAnswer<{ data: Project }>();
    const post = vi.spyOn(apiClient, 'post').mockImplementation(() => answer.promise);
    const onSaved = vi.fn();
    renderWithApp(<ProjectFormDrawer open onClose={vi.fn()} onSaved={onSaved} customerOptions={customerOptions} defaultCustomerId="cust-1" />);
    await fillTitleAndVehicle();
    doubleClick(screen.getByRole('button', { name: 'Open project' }));
    await expectSentOnce(post, '/projects');
    answer.resolve({ data: saved });
    await waitFor(() => expect(onSaved).toHaveBeenCalledTimes(1));
    expect(post).toHaveBeenCalledTimes(1);
  });
});

describe('ProjectFormDrawer: a customer just added', () => {
  it('picks the added customer, shows their name before the list has them, and sends their id', async () => {
    setWindowWidth(1440);
    const post = mockCreate();
    function WithAddedCustomer() {
      const [added, setAdded] = useState<{ value: string; label: string } | null>(null);
      return (
        <>
          <button type="button" onClick={() => setAdded({ value: 'cust-new', label: 'Odile Brackenridge' })}>
            Customer saved
          </button>
          <ProjectFormDrawer open onClose={vi.fn()} customerOptions={customerOptions} noOtherCustomers={false} addedCustomer={added} />
        </>
      );
    }
    renderWithApp(<WithAddedCustomer />);
    await fillTitleAndVehicle();
    fireEvent.click(screen.getByRole('button', { name: 'Customer saved' }));
    const field = screen.getByRole('combobox', { name: 'Customer' }).closest('.ant-select') as HTMLElement;
    expect(await within(field).findByText('Odile Brackenridge')).toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Open project' }));
    await waitFor(() => expect(post).toHaveBeenCalled());
    expect(post.mock.calls[0][1]).toMatchObject({ customerId: 'cust-new' });
  });
});

describe('ProjectFormDrawer: closing', () => {
  it('closes at once when nothing was typed, and asks before discarding what was', async () => {
    setWindowWidth(1440);
    const onClose = vi.fn();
    renderWithApp(<ProjectFormDrawer open onClose={onClose} customerOptions={[]} noOtherCustomers />);
    await userEvent.click(await screen.findByRole('button', { name: 'Cancel' }));
    expect(onClose).toHaveBeenCalledTimes(1);

    await fillTitleAndVehicle();
    await userEvent.click(screen.getByRole('button', { name: 'Cancel' }));
    expect((await screen.findAllByText('Discard what you typed?')).length).toBeGreaterThan(0);
    await userEvent.click(screen.getByRole('button', { name: 'Keep editing' }));
    expect(onClose).toHaveBeenCalledTimes(1);
    expect(screen.getByLabelText('Project title')).toHaveValue('Own flatbed swap');

    await userEvent.click(screen.getByRole('button', { name: 'Cancel' }));
    await userEvent.click(await screen.findByRole('button', { name: 'Discard' }));
    await waitFor(() => expect(onClose).toHaveBeenCalledTimes(2));
  });
});
