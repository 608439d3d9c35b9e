import { fireEvent, screen, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { renderWithApp } from '@/test/render';
import type { Part } from '../../api/get-parts';
import { PartFormDrawer } from '../part-form-drawer';

afterEach(() => {
  vi.restoreAllMocks();
  window.localStorage.removeItem('swapwright.unitSystem');
});

// An invented mount adapter: bridges 25.4 mm fore and aft and 60 mm up or down; its bolt pattern is text.
const ADAPTER = {
  id: 'p1',
  sku: 'MA-7',
  description: 'Mount adapter plates',
  category: 'mount-adapter',
  priceCents: 18_900,
  costCents: 12_000,
  supplierId: null,
  supplierName: null,
  supplierSku: null,
  laborHours: 2,
  torqueSpecs: [],
  instructions: null,
  attributes: { maxDxMm: 25.4, maxDzMm: 60, enginePattern: 'KS-V8' },
  requiresSkus: [],
  excludesSkus: [],
  replacesSkus: [],
  fitKind: null,
  fitSpecId: null,
  stock: [],
  onHand: 0,
  available: 0,
  updatedAt: '2026-11-02T10:00:00.000Z',
} satisfies Part;

/** Opens the drawer on the adapter in `system`; the attribute value boxes in row order. */
async function openAdapter(system: 'in' | 'mm') {
  window.localStorage.setItem('swapwright.unitSystem', system);
  vi.spyOn(apiClient, 'get').mockResolvedValue({ data: { items: [], total: 0, page: 1, pageSize: 20 } });
  const patch = vi.spyOn(apiClient, 'patch').mockImplementation(async (_url: string, body: unknown) => ({ data: { ...ADAPTER, ...(body as object) } }));
  renderWithApp(<PartFormDrawer open part={ADAPTER} onClose={vi.fn()} />);
  await waitFor(() => expect(screen.getAllByLabelText('Attribute value')).toHaveLength(3));
  return { boxes: screen.getAllByLabelText('Attribute value') as HTMLInputElement[], patch };
}

async function save(patch: ReturnType<typeof vi.spyOn>) {
  fireEvent.click(screen.getByRole('button', { name: 'Save part' }));
  await waitFor(() => expect(patch).toHaveBeenCalled());
  return (patch.mock.calls[0][1] as { attributes: Record<string, unknown> }).attributes;
}

describe('PartFormDrawer: length attributes in the person\'s units', () => {
  it('inch mode: the boxes show and take inches, and the part saves in mm', { timeout: 60_000 }, async () => {
    const { boxes, patch } = await openAdapter('in');
    // Source: NIST SP 811, 1 in = 25.4 mm exactly: 25.4 mm = 1.000 in, 60 mm = 2.362 in.
    expect(boxes.map((box) => box.value)).toEqual(['1.000', '2.362', 'KS-V8']);
    expect(boxes[0].closest('.ant-input-affix-wrapper')?.textContent).toContain('in');
    expect(boxes[2].closest('.ant-input-affix-wrapper')).toBeNull();
    fireEvent.change(boxes[0], { target: { value: '2 1/2' } });
    expect(await screen.findByText('Reads: bridges up to 2.50 in fore and aft')).toBeInTheDocument();
    // 2 1/2 in = 63.5 mm; the untouched 2.362 in keeps its stored 60 mm (no drift from the shown rounding).
    expect(await save(patch)).toEqual({ maxDxMm: 63.5, maxDzMm: 60, enginePattern: 'KS-V8' });
  });

  it('mm mode: the boxes show and take millimetres; opening and saving sends the same figures', { timeout: 60_000 }, async () => {
    const { boxes, patch } = await openAdapter('mm');
    expect(boxes.map((box) => box.value)).toEqual(['25.4', '60', 'KS-V8']);
    expect(boxes[0].closest('.ant-input-affix-wrapper')?.textContent).toContain('mm');
    expect(await save(patch)).toEqual(ADAPTER.attributes);
  });

  it('says what it cannot read as a length, and does not save', { timeout: 60_000 }, async () => {
    const { boxes, patch } = await openAdapter('in');
    fireEvent.change(boxes[1], { target: { value: 'two inches' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save part' }));
    expect(await screen.findByText(/is not a length/)).toBeInTheDocument();
    expect(patch).not.toHaveBeenCalled();
  });
});
