import { type Placement } from '@swapwright/shared';
import { DEMO_FIT_SPEC } from '@swapwright/shared/fixtures';
import { fireEvent, screen } from '@testing-library/react';
import { useState } from 'react';
import { describe, expect, it, vi } from 'vitest';
import { renderWithApp } from '@/test/render';
import { PlacementControls, placementOutOfRange } from '../placement-controls';

const saved = DEMO_FIT_SPEC.placement;

function Harness({ initial, onSave, onChange }: { initial: Placement; onSave: () => void; onChange?: (p: Placement) => void }) {
  const [placement, setPlacement] = useState<Placement>(initial);
  return (
    <PlacementControls
      value={placement}
      onChange={(p) => {
        onChange?.(p);
        setPlacement(p);
      }}
      saved={saved}
      isPreview
      onSave={onSave}
    />
  );
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

describe('typed placement figures', () => {
  const height = () => screen.getByRole('spinbutton', { name: 'Crank height' }) as HTMLInputElement;

  it('reads a fraction of an inch: 21 1/2 is 546.1 mm, not the upper limit', { timeout: 40_000 }, () => {
    window.localStorage.setItem('swapwright.unitSystem', 'in');
    const onChange = vi.fn();
    renderWithApp(<Harness initial={saved} onSave={vi.fn()} onChange={onChange} />);
    fireEvent.change(height(), { target: { value: '21 1/2' } });
    fireEvent.blur(height());
    // Source: NIST SP 811 (2008), Appendix B.8: 1 in = 25.4 mm exactly, so 21.5 in = 546.1 mm.
    expect(onChange).toHaveBeenLastCalledWith(expect.objectContaining({ heightMm: expect.closeTo(546.1, 6) }));
    expect(height().value).toBe('21.5');
    expect(screen.queryByTestId('placement-out-of-range')).toBeNull();
    expect(saveButton().disabled).toBe(false);
  });

  it('reads decimals and millimetres alike whatever the display unit', { timeout: 40_000 }, () => {
    window.localStorage.setItem('swapwright.unitSystem', 'in');
    const onChange = vi.fn();
    renderWithApp(<Harness initial={saved} onSave={vi.fn()} onChange={onChange} />);
    fireEvent.change(height(), { target: { value: '546.1 mm' } });
    fireEvent.blur(height());
    expect(onChange).toHaveBeenLastCalledWith(expect.objectContaining({ heightMm: 546.1 }));
    expect(height().value).toBe('21.5');

    fireEvent.change(height(), { target: { value: '22-1/4"' } });
    // Source: NIST SP 811 (2008), Appendix B.8: 22.25 in x 25.4 = 565.15 mm.
    expect(onChange).toHaveBeenLastCalledWith(expect.objectContaining({ heightMm: expect.closeTo(565.15, 6) }));

    fireEvent.change(height(), { target: { value: '21.75' } });
    // Derived: 21.75 in x 25.4 = 552.45 mm.
    expect(onChange).toHaveBeenLastCalledWith(expect.objectContaining({ heightMm: expect.closeTo(552.45, 6) }));
  });

  it('says what it cannot read and keeps the placement it had', { timeout: 40_000 }, () => {
    window.localStorage.setItem('swapwright.unitSystem', 'in');
    const onChange = vi.fn();
    renderWithApp(<Harness initial={saved} onSave={vi.fn()} onChange={onChange} />);
    fireEvent.change(height(), { target: { value: '21 furlongs' } });
    // nothing said mid-typing, but nothing applied either
    expect(screen.queryByTestId('placement-out-of-range')).toBeNull();
    fireEvent.blur(height());
    expect(screen.getByTestId('placement-out-of-range').textContent).toContain('Crank height: "furlongs" is not a length unit');
    expect(height().value).toBe('21 furlongs');
    expect(height().getAttribute('aria-invalid')).toBe('true');
    expect(onChange).not.toHaveBeenCalled();
    expect(saveButton().disabled).toBe(true);

    fireEvent.change(height(), { target: { value: 'abc' } });
    fireEvent.keyDown(height(), { key: 'Enter' });
    expect(screen.getByTestId('placement-out-of-range').textContent).toContain('"abc" is not a length');
    expect(onChange).not.toHaveBeenCalled();
  });

  it('refuses a figure past a limit instead of pulling it to the limit', { timeout: 40_000 }, () => {
    window.localStorage.setItem('swapwright.unitSystem', 'in');
    const onChange = vi.fn();
    renderWithApp(<Harness initial={saved} onSave={vi.fn()} onChange={onChange} />);
    fireEvent.change(height(), { target: { value: '215' } });
    fireEvent.blur(height());
    // 2,500 mm / 25.4 = 98.425 in, shown rounded inwards to 98.42 in
    expect(screen.getByTestId('placement-out-of-range').textContent).toContain('Crank height must be between 0 in and 98.42 in.');
    expect(height().value).toBe('215');
    expect(onChange).not.toHaveBeenCalled();
    expect(saveButton().disabled).toBe(true);
  });

  it('reads the tilt in degrees and refuses what is past the limits', { timeout: 40_000 }, () => {
    window.localStorage.setItem('swapwright.unitSystem', 'mm');
    const onChange = vi.fn();
    renderWithApp(<Harness initial={saved} onSave={vi.fn()} onChange={onChange} />);
    const tilt = screen.getByRole('spinbutton', { name: 'Tilt' }) as HTMLInputElement;
    fireEvent.change(tilt, { target: { value: '2.5°' } });
    expect(onChange).toHaveBeenLastCalledWith(expect.objectContaining({ tiltDeg: 2.5 }));
    fireEvent.change(tilt, { target: { value: '25' } });
    expect(screen.getByTestId('placement-out-of-range').textContent).toContain('Tilt must be between -20° and +20°');
    expect(onChange).toHaveBeenCalledTimes(1);
  });

  it('steps with the arrow keys', { timeout: 40_000 }, () => {
    window.localStorage.setItem('swapwright.unitSystem', 'mm');
    const onChange = vi.fn();
    renderWithApp(<Harness initial={saved} onSave={vi.fn()} onChange={onChange} />);
    fireEvent.keyDown(height(), { key: 'ArrowUp' });
    expect(onChange).toHaveBeenLastCalledWith(expect.objectContaining({ heightMm: saved.heightMm + 1 }));
  });
});
