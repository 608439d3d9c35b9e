import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { Schemas } from '@/lib/api-types';
import { createTestQueryClient, renderWithApp } from '@/test/render';
import { setWindowWidth } from '@/test/viewport';
import { partsPlanKeys } from '../../api/parts-plan-keys';
import { PartsPlanCard } from '../parts-plan-card';

const PROJECT = '5a0b1c2d-0000-4000-8000-000000000401';
const ref = (checkId: string, title: string) => ({ checkId, title });

const plan: Schemas['PartsPlanResponseDto'] = {
  id: 'plan-1',
  projectId: PROJECT,
  version: 2,
  objective: 'lowest-cost',
  status: 'draft',
  fitReportId: 'report-1',
  totalCents: 47_400,
  solveMs: 40,
  lockedAt: null,
  createdAt: '2026-12-02T20:00:00.000Z',
  result: {
    objective: 'lowest-cost',
    status: 'optimal',
    picks: [
      {
        partId: 'p1', sku: 'TR-4410', description: 'Rear-sump swap pan', category: 'oil-pan', quantity: 1, priceCents: 32_900, laborHours: 3,
        laborCents: 40_500, totalCents: 73_400, fabricationHours: 0, available: 1, fitSpecId: 'pan-tr-4410-rear',
        resolves: [ref('envelope.sump-crossmember', 'Oil pan to front crossmember')], broughtInBy: [],
        rejected: [{ partId: 'p2', sku: 'TR-4480', description: 'Deep pan', totalCents: 69_400, reason: 'does not resolve oil pan to front crossmember' }],
        explanation: '',
      },
    ],
    operations: [{ operation: 'Fit a bigger pump by hand', laborHours: 1, laborCents: 13_500, resolves: [ref('fuel.pump-flow', 'Fuel pump flow')], explanation: '' }],
    kept: [{ slot: 'oil-pump', name: 'Stock oil pump', note: 'kept' }],
    unresolved: [],
    totals: { partsCents: 32_900, laborHours: 3, laborCents: 40_500, fabricationHours: 0, totalCents: 73_400 },
    notes: [],
    model: { columns: 10, rows: 5, solves: 1 },
  },
  recheck: {
    summary: { ok: 30, tight: 1, fails: 1, unknown: 0 },
    resolved: ['envelope.sump-crossmember'],
    remaining: [
      { checkId: 'cooling.hose-sides', title: 'Coolant hose sides', status: 'fails', message: 'Hoses cross the belt.' },
      { checkId: 'fuel.pump-flow', title: 'Fuel pump flow', status: 'fails', message: 'The pump is short.' },
    ],
  },
};

describe('PartsPlanCard', () => {
  it('explains each pick and names what the plan leaves short once the fit check runs again', async () => {
    const queryClient = createTestQueryClient();
    queryClient.setQueryData(partsPlanKeys.project(PROJECT), [plan]);
    renderWithApp(<PartsPlanCard projectId={PROJECT} canBuild />, { queryClient });
    const pick = await screen.findByTestId('pick-TR-4410');
    expect(pick).toHaveTextContent('Resolves: Oil pan to front crossmember');
    expect(pick).toHaveTextContent(/TR-4480 \(\$694\.00\) does not resolve oil pan to front crossmember/);
    // The pump flow is answered by an operation the fit check cannot model; the hoses by nothing.
    expect(screen.getByText(/1 shortfall cleared\. Still short with the chosen parts:/)).toBeInTheDocument();
    const stillShort = screen.getByRole('list', { name: 'Still short with the chosen parts' });
    expect(within(stillShort).getAllByRole('listitem').map((item) => item.textContent)).toEqual(['✕Blocked Coolant hose sides']);
    // our own status words and colours, as the fit report shows them, never the raw status
    expect(within(stillShort).getByText('Blocked').closest('[data-status]')).toHaveAttribute('data-status', 'fails');
    expect(stillShort).not.toHaveTextContent('(fails)');
    expect(screen.getByRole('button', { name: 'Lock version 2 for a quote' })).toBeInTheDocument();
    // the caution is a paragraph of its own, never run on from the sentence before it
    expect(screen.getByText(/^Fuel system, welding and lifting work carry risks/).tagName).toBe('DIV');
  });

  it('gives each pick its total with labor, the figure the cheaper parts not chosen are compared on', async () => {
    // $329.00 part + 3 h at the shop rate ($405.00) = $734.00
    setWindowWidth(390);
    const queryClient = createTestQueryClient();
    queryClient.setQueryData(partsPlanKeys.project(PROJECT), [plan]);
    const phone = renderWithApp(<PartsPlanCard projectId={PROJECT} canBuild />, { queryClient });
    // the breakpoint lands after the first render; the phone's list then replaces the table
    expect(await screen.findByText('$329.00 · 3 h labor · $734.00 with labor')).toBeInTheDocument();
    phone.unmount();

    setWindowWidth(1440);
    renderWithApp(<PartsPlanCard projectId={PROJECT} canBuild />, { queryClient });
    expect(await screen.findByRole('columnheader', { name: 'With labor' })).toBeInTheDocument();
    const row = screen.getByTestId('pick-TR-4410').closest('tr') as HTMLElement;
    expect(within(row).getByText('$734.00')).toBeInTheDocument();
  });

  it("shows the planner's figures in the person's units: inches, gal/h and psi in inch mode; mm, L/h and kPa in metric", async () => {
    const withFigures: Schemas['PartsPlanResponseDto'] = structuredClone(plan);
    withFigures.result.picks[0].rejected.push({ partId: 'p9', sku: 'FP-120', description: 'Inline pump', totalCents: 1_000, reason: 'delivers 120 L/h, the target power needs 138 L/h' });
    withFigures.result.operations = [
      { operation: 'Drop the crossmember 25.4 mm (1.00 in)', laborHours: 4, laborCents: 54_000, resolves: [], explanation: 'Drop the crossmember 25.4 mm (1.00 in): resolves nothing on its own, 4 h at the shop rate.' },
    ];
    withFigures.result.unresolved = [
      { checkId: 'fuel.pressure', title: 'Fuel pressure', message: '', reason: 'no catalog part meets it', catalogNeeds: ['Fuel pressure regulator: rated for at least 58 psi, flow at least 140 L/h'] },
    ];
    const show = async () => {
      const queryClient = createTestQueryClient();
      queryClient.setQueryData(partsPlanKeys.project(PROJECT), [withFigures]);
      const view = renderWithApp(<PartsPlanCard projectId={PROJECT} canBuild />, { queryClient });
      await screen.findByTestId('pick-TR-4410');
      const text = screen.getByTestId('parts-plan-card').textContent ?? '';
      view.unmount();
      return text;
    };

    // Source: NIST Handbook 44 Appendix C: 1 in = 25.4 mm, 1 US gal = 3.785411784 L, 1 psi = 6.894757 kPa
    window.localStorage.setItem('swapwright.unitSystem', 'in');
    const inches = await show();
    expect(inches).toContain('Drop the crossmember 1.00 in: resolves nothing on its own');
    expect(inches).toContain('FP-120 ($10.00) delivers 32 gal/h, the target power needs 36 gal/h');
    expect(inches).toContain('Fuel pressure regulator: rated for at least 58 psi, flow at least 37 gal/h');
    expect(inches).not.toMatch(/\bmm\b|L\/h|kPa/);

    window.localStorage.setItem('swapwright.unitSystem', 'mm');
    const metric = await show();
    expect(metric).toContain('Drop the crossmember 25.4 mm: resolves nothing on its own');
    expect(metric).toContain('FP-120 ($10.00) delivers 120 L/h, the target power needs 138 L/h');
    expect(metric).toContain('Fuel pressure regulator: rated for at least 400 kPa, flow at least 140 L/h');
    expect(metric).not.toMatch(/\bin\)|gal\/h|psi/);
  });
});
