import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { renderWithApp } from '@/test/render';
import type { WorkOrder } from '../../types';
import { WorkOrderSheet } from '../work-order-sheet';

// Source: NIST SP 811 (2008), Appendix B: 1 in = 25.4 mm exactly.
// 8.7 mm ÷ 25.4 = 0.3425 in → 0.34 in; 72.3 mm ÷ 25.4 = 2.8465 in → 2.85 in; 6.0 mm ÷ 25.4 = 0.236 in → 0.24 in.

const order: WorkOrder = {
  id: 'wo-1',
  label: 'W-0001',
  state: 'ready',
  projectId: 'p-1',
  projectTitle: 'Brindle Hauler V8 swap',
  customerName: 'Wren Calloway',
  createdAt: '2026-12-01T08:00:00.000Z',
  progress: { total: 0, passed: 0, failed: 0, open: 0 },
  vehicleDescription: '1972 Brindle Hauler 1/2 ton',
  quoteId: 'q-1',
  quoteLabel: 'Q-0001',
  quoteRevision: 1,
  fitReportId: null,
  partsPlanVersion: 2,
  startedAt: null,
  finishedAt: null,
  steps: [
    {
      key: 'transmission-crossmember',
      operationId: null,
      name: 'Rework the transmission crossmember: relocate it 72.3 mm (2.85 in) rearward and drop it 8.7 mm (0.34 in), or fit a drop crossmember',
      buildOrder: 10,
      hours: 4,
      hazards: ['lifting', 'welding'],
      parts: [
        { sku: '', description: 'Drop crossmember, 72.3 mm (2.85 in) setback', quantity: 1 },
        { sku: 'MK-90', description: 'Heavy mount kit, 90 mm', quantity: 1 },
      ],
      torque: [],
      instructions: ['XM-100: shim the mount by 6.0 mm (0.24 in) at most'],
      checks: [],
    },
  ],
  cautions: [{ hazard: 'lifting', caution: 'Support the vehicle on rated stands before working under it.' }],
  deference: 'Follow local codes and licensed practice.',
  partsAtCounter: null,
};

// Each system writes each figure once, in its own unit; the other unit never shows.
const READS = [
  { system: 'in', figures: ['0.34 in', '2.85 in', '0.24 in'], never: /\d mm\b/ },
  { system: 'mm', figures: ['8.7 mm', '72.3 mm', '6.0 mm'], never: /\d in\b/ },
] as const;

describe('the work order reads the plan’s words in the person’s units', () => {
  afterEach(() => window.localStorage.removeItem('swapwright.unitSystem'));

  it.each(READS)('in $system writes each figure once, in that system, and keeps the stored text as it is', ({ system, figures, never }) => {
    window.localStorage.setItem('swapwright.unitSystem', system);
    const stored = structuredClone(order);
    renderWithApp(<WorkOrderSheet order={order} canWork={false} projectPath="/projects/p-1" />);
    const step = screen.getByTestId('step-transmission-crossmember');
    expect(step).toHaveTextContent(`1. Rework the transmission crossmember: relocate it ${figures[1]} rearward and drop it ${figures[0]}, or fit a drop crossmember`);
    expect(step).toHaveTextContent(`Drop crossmember, ${figures[1]} setback`);
    // A lone figure in a part's name is the maker's, in both systems.
    expect(step).toHaveTextContent('1 × MK-90 Heavy mount kit, 90 mm');
    expect(step).toHaveTextContent(`XM-100: shim the mount by ${figures[2]} at most`);
    expect(step.textContent?.replace('Heavy mount kit, 90 mm', '')).not.toMatch(never);
    expect(order).toEqual(stored);
  });
});

describe('starting in the bay with the counter’s parts in view', () => {
  const waiting: WorkOrder['partsAtCounter'] = {
    planId: 'plan-1',
    total: 3,
    withTheJob: 1,
    waiting: [
      { sku: 'PN-220', description: 'Rear-sump pan', quantity: 1, status: 'ordered' },
      { sku: 'PU-31', description: 'Pickup', quantity: 2, status: 'open' },
    ],
  };

  it('says how many counter lines are with the job, and asks before starting with the rest waiting', async () => {
    const post = vi.spyOn(apiClient, 'post').mockResolvedValue({ data: { ...order, state: 'in-the-bay' } });
    renderWithApp(<WorkOrderSheet order={{ ...order, partsAtCounter: waiting }} canWork projectPath="/projects/p-1" />);
    const parts = screen.getByTestId('parts-at-counter');
    expect(parts).toHaveTextContent('Parts: 1 of 3 counter lines with the job');
    expect(parts).toHaveTextContent('waiting: 1 × PN-220 (Ordered), 2 × PU-31 (Not set aside)');
    expect(within(parts).getByRole('link', { name: 'Parts counter' })).toHaveAttribute('href', '/parts-counter?plan=plan-1');

    await userEvent.click(screen.getByRole('button', { name: 'Start in the bay' }));
    const confirm = await screen.findByRole('tooltip');
    expect(confirm).toHaveTextContent('Not with the job yet: 1 × PN-220 (Ordered), 2 × PU-31 (Not set aside)');
    expect(post).not.toHaveBeenCalled();
    await userEvent.click(within(confirm).getByRole('button', { name: 'Start in the bay' }));
    await waitFor(() => expect(post).toHaveBeenCalledWith('/work-orders/wo-1/start'));
  });

  it('starts at once when every part is with the job', async () => {
    const post = vi.spyOn(apiClient, 'post').mockResolvedValue({ data: { ...order, state: 'in-the-bay' } });
    renderWithApp(<WorkOrderSheet order={{ ...order, partsAtCounter: { planId: 'plan-1', total: 2, withTheJob: 2, waiting: [] } }} canWork projectPath="/projects/p-1" />);
    expect(screen.getByTestId('parts-at-counter')).toHaveTextContent('Parts: 2 of 2 counter lines with the job');
    await userEvent.click(screen.getByRole('button', { name: 'Start in the bay' }));
    await waitFor(() => expect(post).toHaveBeenCalledWith('/work-orders/wo-1/start'));
  });
});
