import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useState } from 'react';
import { describe, expect, it } from 'vitest';
import { renderWithApp } from '@/test/render';
import { LengthInput } from '../length-input';

let latest: number | null | undefined;

function Harness({ initial }: { initial: number | null }) {
  const [mm, setMm] = useState<number | null>(initial);
  latest = mm;
  return <LengthInput aria-label="Crank height" value={mm} onChange={setMm} />;
}

const box = () => screen.getByRole('textbox', { name: 'Crank height' }) as HTMLInputElement;

describe('LengthInput', () => {
  it('reads a fraction of an inch, a decimal and millimetres with the shared parser', async () => {
    renderWithApp(<Harness initial={500} />);
    expect(box().value).toBe('19.69');
    // 12 1/2 in × 25.4 = 317.5 mm (1 in = 25.4 mm exactly, NIST SP 811 appendix B)
    await userEvent.clear(box());
    await userEvent.type(box(), '12 1/2');
    expect(latest).toBeCloseTo(317.5, 9);
    await userEvent.clear(box());
    await userEvent.type(box(), '12.5 in');
    expect(latest).toBeCloseTo(317.5, 9);
    await userEvent.clear(box());
    await userEvent.type(box(), '318 mm');
    expect(latest).toBeCloseTo(318, 9);
  });

  it('keeps text that is not a length as typed, says so, and never turns it into 0', async () => {
    renderWithApp(<Harness initial={500} />);
    await userEvent.clear(box());
    await userEvent.type(box(), 'abc');
    await userEvent.tab();
    expect(box().value).toBe('abc');
    expect(Number.isNaN(latest)).toBe(true);
    expect(box()).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByRole('alert')).toHaveTextContent('Cannot read “abc” as a length');
  });

  it('shows millimetres to the person who works in them', () => {
    window.localStorage.setItem('swapwright.unitSystem', 'mm');
    renderWithApp(<Harness initial={317.5} />);
    expect(box().value).toBe('317.5');
  });
});
