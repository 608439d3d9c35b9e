import { type Placement } from '@swapwright/shared';
import { DEMO_FIT_SPEC } from '@swapwright/shared/fixtures';
import { fireEvent, screen } from '@testing-library/react';
import { useState } from 'react';
import { describe, expect, it, vi } from 'vitest';
import { renderWithApp } from '@/test/render';
import { PlacementControls, placementOutOfRange } from '../placement-controls';

const saved = DEMO_FIT_SPEC.placement;

function Harness({ initial, onSave }: { initial: Placement; onSave: () => void }) {
  const [placement, setPlacement] = useState<Placement>(initial);
  return <PlacementControls value={placement} onChange={setPlacement} saved={saved} isPreview onSave={onSave} />;
}

const saveButton = () => screen.getByRole('button', { name: 'Save placement' }) as HTMLButtonElement;

describe('placement limits', () => {
  it('knows the bounds the API accepts', () => {
    expect(placementOutOfRange({ setbackMm: 1000, heightMm: 500, tiltDeg: 0 })).toEqual([]);
    expect(placementOutOfRange({ setbackMm: 99999, heightMm: -50, tiltDeg: 25 })).toEqual(['setbackMm', 'heightMm', 'tiltDeg']);
  });

  it('gives the number boxes the limits and disables saving while a typed value is out of range', { timeout: 40_000 }, () => {
    window.localStorage.setItem('swapwright.unitSystem', 'mm');
    renderWithApp(<Harness initial={saved} onSave={vi.fn()} />);
    const height = screen.getByRole('spinbutton', { name: 'Crank height' });
    expect(height.getAttribute('aria-valuemin')).toBe('0');
    expect(height.getAttribute('aria-valuemax')).toBe('2500');
    expect(saveButton().disabled).toBe(false);

    fireEvent.change(height, { target: { value: '99999' } });
    expect(saveButton().disabled).toBe(true);
    expect(screen.getByTestId('placement-out-of-range').textContent).toContain('Crank height must be between 0 mm and 2,500 mm');

    fireEvent.change(height, { target: { value: '560' } });
    expect(saveButton().disabled).toBe(false);
    expect(screen.queryByTestId('placement-out-of-range')).toBeNull();
  });

  it('disables saving when the placement it is given is out of range', { timeout: 40_000 }, () => {
    window.localStorage.setItem('swapwright.unitSystem', 'mm');
    renderWithApp(<Harness initial={{ ...saved, tiltDeg: -50 }} onSave={vi.fn()} />);
    expect(saveButton().disabled).toBe(true);
    expect(screen.getByTestId('placement-out-of-range').textContent).toContain('Tilt must be between -20° and +20°');
  });
});
