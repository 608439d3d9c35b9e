import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { createTestQueryClient, renderWithApp } from '@/test/render';
import { setWindowWidth } from '@/test/viewport';
import type { CustomerPartsPlan } from '../../api/get-customer-parts-plans';
import { partsPlanKeys } from '../../api/parts-plan-keys';
import { CustomerPartsPlanCard, planToShow } from '../customer-parts-plan-card';

const PROJECT = '5a0b1c2d-0000-4000-8000-000000000402';

const locked: CustomerPartsPlan = {
  id: 'plan-1',
  projectId: PROJECT,
  version: 1,
  status: 'locked',
  lockedAt: '2026-12-02T21:00:00.000Z',
  createdAt: '2026-12-02T20:00:00.000Z',
  parts: [
    { sku: 'TR-4410', description: 'Rear-sump swap pan', category: 'oil-pan', quantity: 1, priceCents: 123_456, laborHours: 3, totalCents: 163_956, resolves: ['Oil pan to front crossmember'] },
    { sku: 'TR-4411', description: 'Rear-sump pickup', category: 'oil-pickup', quantity: 1, priceCents: 4_900, laborHours: 0.5, totalCents: 11_650, resolves: [] },
  ],
  operations: [{ operation: 'Notch the crossmember 25.4 mm (1.00 in)', laborHours: 4, laborCents: 54_000, resolves: ['Oil pan to front crossmember'] }],
  totals: { partsCents: 128_356, laborHours: 7.5, laborCents: 101_250, fabricationHours: 4, totalCents: 229_606 },
  unresolved: [{ checkId: 'fuel.pressure', title: 'Fuel pressure', message: 'The stock pump is short of the pressure needed.' }],
  notes: ['Left as they are, by choice: Hood to air cleaner.'],
};
const newerDraft: CustomerPartsPlan = { ...locked, id: 'plan-2', version: 2, status: 'draft', lockedAt: null, parts: [], operations: [], unresolved: [], notes: [] };

function show(plans: CustomerPartsPlan[], currency = 'EUR') {
  const queryClient = createTestQueryClient();
  queryClient.setQueryData(partsPlanKeys.customerView(PROJECT), plans);
  return renderWithApp(<CustomerPartsPlanCard projectId={PROJECT} currency={currency} />, { queryClient });
}

describe('CustomerPartsPlanCard', () => {
  it('shows the locked version (the one a quote is drawn from) over a newer draft, else the newest', () => {
    expect(planToShow([newerDraft, locked])?.id).toBe('plan-1');
    expect(planToShow([newerDraft])?.id).toBe('plan-2');
    expect(planToShow([])).toBeUndefined();
    expect(planToShow(undefined)).toBeUndefined();
  });

  it("lists the parts at the plan's prices in the shop's currency, the labor hours, what stays open and the plan's notes", async () => {
    setWindowWidth(1440);
    show([newerDraft, locked]);
    const card = await screen.findByTestId('customer-parts-plan');
    expect(within(card).getByText('Version 1')).toBeInTheDocument();
    expect(within(card).getByText('Settled for your quote')).toBeInTheDocument();
    // Source: Unicode CLDR en-US currency pattern (Intl.NumberFormat): EUR amounts as "€1,234.56"
    const money = new Intl.NumberFormat('en-US', { style: 'currency', currency: 'EUR' });
    const row = within(card).getByText('Rear-sump swap pan').closest('tr') as HTMLElement;
    expect(within(row).getByText('TR-4410')).toBeInTheDocument();
    expect(within(row).getByText(money.format(1234.56))).toBeInTheDocument();
    expect(within(row).getByText('€1,234.56')).toBeInTheDocument();
    expect(within(row).getByText('3 h')).toBeInTheDocument();
    expect(within(card).getByTestId('customer-plan-total')).toHaveTextContent('€2,296.06');
    expect(card).toHaveTextContent('€1,012.50 (7.5 h)');
    const operation = within(card).getByTestId('plan-operation');
    expect(operation).toHaveTextContent(/Notch the crossmember .* · 4 h/);
    expect(operation).toHaveTextContent('For: Oil pan to front crossmember');
    expect(card).toHaveTextContent('Fuel pressure: The stock pump is short of the pressure needed.');
    expect(card).toHaveTextContent('Left as they are, by choice: Hood to air cleaner.');
    expect(within(card).getByTestId('plan-caution')).toHaveTextContent(/welding and lifting work carry risks/);
    // read-only: nothing to build, lock or reserve
    expect(within(card).queryByRole('button')).toBeNull();
  });

  it('stacks the parts on a phone, each with its price and hours', async () => {
    setWindowWidth(390);
    show([locked], 'USD');
    // the breakpoint lands after the first render; the phone's list then replaces the table
    const part = await screen.findByTestId('plan-part-TR-4410');
    expect(part).toHaveTextContent('TR-4410 · qty 1');
    expect(part).toHaveTextContent('$1,234.56 · 3 h to fit');
    expect(screen.queryByRole('columnheader', { name: 'Price' })).toBeNull();
  });

  it('shows nothing for a project without a plan', async () => {
    const view = show([]);
    await waitFor(() => expect(view.container.querySelector('[data-testid="customer-parts-plan"]')).toBeNull());
    expect(screen.queryByText('Parts plan')).toBeNull();
  });
});
