import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { createTestQueryClient, renderWithApp } from '@/test/render';
import { setWindowWidth } from '@/test/viewport';
import { counterKeys } from '../../api/counter-keys';
import type { CounterLine } from '../../api/get-counter-lines';
import type { PlanSummary } from '../../api/get-recent-parts-plans';
import { pickListFileName } from '../../api/download-pick-list';
import { CounterBoard } from '../counter-board';

const PLAN: PlanSummary = {
  id: 'plan-1',
  projectId: 'project-1',
  projectTitle: 'Invented pickup swap',
  projectStatus: 'approved',
  customerName: 'Juno Example',
  version: 2,
  status: 'locked',
  objective: 'cost',
  totalCents: 259300,
  createdAt: '2026-12-01T10:00:00.000Z',
};

const stock = (id: string, onHand: number, reserved: number) => ({ id, location: 'Main store', bin: 'A-01-2', onHand, reserved, available: onHand - reserved });

const LINES: CounterLine[] = [
  { id: 'line-1', planId: 'plan-1', partId: 'p1', sku: 'TR-4410', description: 'Rear-sump swap pan, invented rail', quantity: 1, status: 'open', stockId: null, issuedAt: null, stock: [stock('s1', 2, 0)], onHand: 2, available: 2 },
  { id: 'line-2', planId: 'plan-1', partId: 'p2', sku: 'FP-190', description: 'In-tank injection pump, 190 L/h', quantity: 1, status: 'reserved', stockId: 's2', issuedAt: null, stock: [stock('s2', 1, 1)], onHand: 1, available: 0 },
];

function renderBoard() {
  const queryClient = createTestQueryClient();
  queryClient.setQueryData(counterKeys.plans(), [PLAN]);
  queryClient.setQueryData(counterKeys.lines('plan-1'), LINES);
  return renderWithApp(<CounterBoard currency="USD" />, { queryClient });
}

describe('CounterBoard', () => {
  it('on a phone stacks each line with its figures, bin, state and commands instead of a sideways-scrolling table', async () => {
    setWindowWidth(390);
    const reserve = vi.spyOn(apiClient, 'post').mockResolvedValue({ data: { ...LINES[0], status: 'reserved' } });
    // the refetch after the reservation
    vi.spyOn(apiClient, 'get').mockImplementation(async (url: string) => ({ data: url === '/parts-plans' ? [PLAN] : LINES }));
    renderBoard();
    expect(screen.queryByRole('table')).not.toBeInTheDocument();
    const items = within(screen.getByRole('list', { name: 'Parts list' })).getAllByRole('listitem');
    expect(items).toHaveLength(2);
    const pan = screen.getByTestId('counter-line-TR-4410');
    expect(pan).toHaveTextContent('Rear-sump swap pan, invented rail');
    expect(pan).toHaveTextContent('TR-4410 · Main store · A-01-2');
    // A bin code is one piece: the line may wrap before it, never at its hyphens.
    expect(within(pan).getByText('A-01-2')).toHaveStyle({ whiteSpace: 'nowrap' });
    expect(within(pan).getByLabelText('Quantities')).toHaveTextContent('Need 1 · 2 on hand · 2 free');
    expect(within(pan).getByTestId('line-status')).toHaveTextContent('Not set aside');
    expect(within(screen.getByTestId('counter-line-FP-190')).getByRole('button', { name: 'Release' })).toBeInTheDocument();

    await userEvent.click(within(pan).getByRole('button', { name: 'Reserve' }));
    await waitFor(() => expect(reserve).toHaveBeenCalledWith('/counter-lines/line-1/reserve', {}));
  });

  it('on a wide screen keeps the table, and the plan total is money in the one style', () => {
    setWindowWidth(1440);
    renderBoard();
    const row = within(screen.getByRole('table')).getByRole('row', { name: /TR-4410/ });
    expect(row).toHaveTextContent('Main store · A-01-2');
    // At 1440 px the narrow "Location and bin" column wraps between the store and the bin, never inside the bin code
    // (the printed pick list is this same table).
    expect(within(row).getByText('A-01-2')).toHaveStyle({ whiteSpace: 'nowrap' });
    // Source: Unicode CLDR "en" currency pattern ¤#,##0.00 (Intl.NumberFormat, style currency): 259300 cents.
    expect(screen.getByText(/Plan total/)).toHaveTextContent('Plan total $2,593.00 (parts and labor)');
  });

  it('a line the shelf cannot cover reads short, and its Reserve says why it is off', () => {
    setWindowWidth(390);
    const queryClient = createTestQueryClient();
    queryClient.setQueryData(counterKeys.plans(), [PLAN]);
    queryClient.setQueryData(counterKeys.lines('plan-1'), [
      { ...LINES[0], id: 'line-3', sku: 'FP-120', description: 'In-tank pump, 120 L/h', quantity: 2, stock: [stock('s3', 1, 0)], onHand: 1, available: 1 },
      { ...LINES[0], id: 'line-4', sku: 'REG-58', description: 'Return-style regulator', status: 'to-order', stock: [], onHand: 0, available: 0 },
    ]);
    renderWithApp(<CounterBoard currency="USD" />, { queryClient });
    const pump = screen.getByTestId('counter-line-FP-120');
    expect(within(pump).getByTestId('line-status')).toHaveTextContent('Short by 1');
    expect(within(pump).getByRole('button', { name: 'Reserve' })).toBeDisabled();
    expect(within(pump).getByTestId('reserve-reason')).toHaveTextContent('Only 1 free of 2: mark it To order.');
    const regulator = screen.getByTestId('counter-line-REG-58');
    expect(within(regulator).getByTestId('line-status')).toHaveTextContent('To order');
    expect(within(regulator).getByTestId('reserve-reason')).toHaveTextContent('None free to set aside.');
  });

  // Common practice (no published source): parts set aside for a job are issued to it when the bay takes them; once
  // issued they are off the shelf, so the line offers a return to the shelf instead of a release.
  it('a set-aside line can be issued to the job, all at once or line by line; an issued line reads so and offers Return to shelf, never Release', async () => {
    setWindowWidth(1440);
    const lines: CounterLine[] = [
      ...LINES,
      { ...LINES[1], id: 'line-5', sku: 'REG-58', description: 'Return-style regulator', status: 'issued', issuedAt: '2026-12-02T09:00:00.000Z', stock: [stock('s5', 2, 0)], onHand: 2, available: 2 },
    ];
    const post = vi.spyOn(apiClient, 'post').mockResolvedValue({ data: [] });
    // the refetches after each command answer the same list
    vi.spyOn(apiClient, 'get').mockImplementation(async (url: string) => ({ data: url === '/parts-plans' ? [PLAN] : lines }));
    const queryClient = createTestQueryClient();
    queryClient.setQueryData(counterKeys.plans(), [PLAN]);
    queryClient.setQueryData(counterKeys.lines('plan-1'), lines);
    renderWithApp(<CounterBoard currency="USD" />, { queryClient });
    const pump = within(screen.getByRole('table')).getByRole('row', { name: /FP-190/ });
    expect(within(pump).getByTestId('line-status')).toHaveTextContent('Set aside');
    expect(within(pump).getByRole('button', { name: 'Release' })).toBeInTheDocument();
    const regulator = within(screen.getByRole('table')).getByRole('row', { name: /REG-58/ });
    expect(within(regulator).getByTestId('line-status')).toHaveTextContent('Issued to the job');
    expect(within(regulator).queryByRole('button', { name: 'Release' })).not.toBeInTheDocument();
    expect(within(regulator).queryByRole('button', { name: 'Issue to job' })).not.toBeInTheDocument();
    expect(within(regulator).getByTestId('issued-note')).toHaveTextContent(/^Off the shelf since .+\. Came back unused\? Return it to the shelf\.$/);

    await userEvent.click(within(pump).getByRole('button', { name: 'Issue to job' }));
    await waitFor(() => expect(post).toHaveBeenCalledWith('/counter-lines/line-2/issue', {}));
    await userEvent.click(within(within(screen.getByRole('table')).getByRole('row', { name: /REG-58/ })).getByRole('button', { name: 'Return to shelf' }));
    await waitFor(() => expect(post).toHaveBeenCalledWith('/counter-lines/line-5/return', {}));
    // One line is set aside (the regulator is already issued, the pan not set aside): the header issues it with the rest.
    await userEvent.click(screen.getByRole('button', { name: 'Issue all set aside (1)' }));
    await waitFor(() => expect(post).toHaveBeenCalledWith('/parts-plans/plan-1/issue', {}));
  });

  it('opens on a job in progress, lists built jobs under their own heading, and opens the job the address names', async () => {
    setWindowWidth(1440);
    const built: PlanSummary = { ...PLAN, id: 'plan-0', projectId: 'project-0', projectTitle: 'Invented wagon swap', projectStatus: 'done', customerName: 'Odile Example' };
    const queryClient = createTestQueryClient();
    // the built job's list is the newest: still the job in progress opens first
    queryClient.setQueryData(counterKeys.plans(), [built, PLAN]);
    queryClient.setQueryData(counterKeys.lines('plan-1'), LINES);
    queryClient.setQueryData(counterKeys.lines('plan-0'), []);
    vi.spyOn(apiClient, 'get').mockImplementation(async (url: string) => ({ data: url === '/parts-plans' ? [built, PLAN] : [] }));
    const { unmount } = renderWithApp(<CounterBoard currency="USD" />, { queryClient });
    expect(screen.getByRole('combobox', { name: 'Job' }).closest('.ant-select')).toHaveTextContent('Invented pickup swap · Juno Example · plan v2');
    await userEvent.click(screen.getByRole('combobox', { name: 'Job' }));
    expect(await screen.findByText('Jobs in progress')).toBeInTheDocument();
    expect(screen.getByText('Built (done)')).toBeInTheDocument();
    unmount();

    renderWithApp(<CounterBoard currency="USD" />, { queryClient, route: '/parts-counter?plan=plan-0' });
    expect(screen.getByRole('combobox', { name: 'Job' }).closest('.ant-select')).toHaveTextContent('Invented wagon swap · Odile Example · plan v2');
  });

  it('names the exported pick list after the job', () => {
    expect(pickListFileName('Harlan Ridgeback 1978: Kestrel 5.3 V8 swap plan v2')).toBe('pick-list-harlan-ridgeback-1978-kestrel-5-3-v8-swap-plan-v2.csv');
    expect(pickListFileName(undefined)).toBe('pick-list.csv');
    expect(pickListFileName('***')).toBe('pick-list.csv');
  });
});
