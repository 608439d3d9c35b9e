import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useState } from 'react';
import { describe, expect, it } from 'vitest';
import { renderWithApp } from '@/test/render';
import { parseJsonField } from '../catalog-item-drawer';
import { OutlineEditor, type OutlinePoint } from '../outline-editor';
import type { CatalogItemOf } from '../../types';

let latest: OutlinePoint[] = [];

function Harness({ initial }: { initial: OutlinePoint[] }) {
  const [points, setPoints] = useState(initial);
  latest = points;
  return <OutlineEditor axes={['u', 'w']} label="Bottom profile" closed value={points} onChange={setPoints} />;
}

const pan: Array<{ u: number; w: number }> = [
  { u: 600, w: -75 },
  { u: 330, w: -254 },
];

describe('OutlineEditor', () => {
  it('shows stored millimetres in inches and keeps what is typed in millimetres', async () => {
    renderWithApp(<Harness initial={pan} />);
    expect(screen.getByRole('columnheader', { name: 'Forward (in)' })).toBeInTheDocument();
    const w2 = screen.getByRole('textbox', { name: 'Bottom profile: point 2 height' }) as HTMLInputElement;
    expect(w2.value).toBe('-10.00');
    await userEvent.clear(w2);
    await userEvent.type(w2, '-5.5');
    expect(latest[1].w).toBeCloseTo(-139.7, 6);
    expect(latest[1].u).toBe(330);
  });

  it('shows and takes millimetres when the person works in mm', async () => {
    window.localStorage.setItem('swapwright.unitSystem', 'mm');
    renderWithApp(<Harness initial={pan} />);
    expect(screen.getByRole('columnheader', { name: 'Forward (mm)' })).toBeInTheDocument();
    const u1 = screen.getByRole('textbox', { name: 'Bottom profile: point 1 forward' }) as HTMLInputElement;
    expect(u1.value).toBe('600');
    await userEvent.clear(u1);
    await userEvent.type(u1, '590');
    expect(latest[0].u).toBe(590);
  });

  it('adds and removes rows', async () => {
    renderWithApp(<Harness initial={pan} />);
    expect(screen.getAllByRole('textbox')).toHaveLength(4);
    await userEvent.click(screen.getByRole('button', { name: 'Add a point to Bottom profile' }));
    expect(screen.getAllByRole('textbox')).toHaveLength(6);
    expect(latest).toHaveLength(3);
    expect(latest[2]).toEqual({ u: 330, w: -254 });
    await userEvent.click(screen.getByRole('button', { name: 'Remove point 1 of Bottom profile' }));
    expect(latest).toEqual([
      { u: 330, w: -254 },
      { u: 330, w: -254 },
    ]);
    expect(screen.getByText('2 points, closed outline')).toBeInTheDocument();
  });
});

describe('parseJsonField', () => {
  it('explains what is wrong with the text', () => {
    expect(parseJsonField('{"x": 1}', { label: 'Pinion', shape: 'object' })).toEqual({ ok: true, value: { x: 1 } });
    const bad = parseJsonField('{x: 1}', { label: 'Pinion', shape: 'object' });
    expect(bad.ok).toBe(false);
    expect(!bad.ok && bad.message).toMatch(/^Pinion is not valid JSON/);
    expect(parseJsonField('{}', { label: 'Rail stations', shape: 'array' })).toEqual({ ok: false, message: 'Rail stations must be a list in square brackets [ … ].' });
    expect(parseJsonField('', { label: 'Pinion', shape: 'object', required: true })).toEqual({ ok: false, message: 'Pinion is required.' });
  });
});

describe('CatalogItemDrawer', () => {
  it('fills the form from the stored spec, lengths in the person’s unit', async () => {
    const { CatalogItemDrawer } = await import('../catalog-item-drawer');
    const item: CatalogItemOf<'oil-pans'> = {
      id: 'pan-1',
      name: 'Rear-sump pan R1',
      createdAt: '2026-11-02T09:00:00.000Z',
      updatedAt: '2026-11-02T09:00:00.000Z',
      spec: { id: 'pan-1', name: 'Rear-sump pan R1', railPattern: 'R-V8', sumpPosition: 'rear', pickupMount: 'pump-bolted', sumpCenterU: 254, sumpFloorW: -254, capacityL: 5.7, dipstickProvision: [], bottomProfile: pan },
    };
    renderWithApp(<CatalogItemDrawer kind="oil-pans" open item={item} onClose={() => undefined} />);
    expect(((await screen.findByRole('textbox', { name: 'Rail pattern' })) as HTMLInputElement).value).toBe('R-V8');
    expect((screen.getByRole('textbox', { name: 'Sump floor height' }) as HTMLInputElement).value).toBe('-10.00');
    expect((screen.getByRole('spinbutton', { name: 'Capacity' }) as HTMLInputElement).value).toBe('5.7');
  });
});
