import { mmWithInches } from '@swapwright/shared';
import { screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { renderWithApp } from '@/test/render';
import { setWindowWidth } from '@/test/viewport';
import { ChecksTable } from '../checks-table';
import { ShortfallList } from '../shortfall-list';
import { finding } from './finding-fixture';

// Source: NIST SP 811 (2008), Appendix B: 1 in = 25.4 mm exactly. Every inch figure is converted from the
// millimetres as written to 0.1 mm, then shown to 0.01 in, so a row's table, sentence and remedies agree.

// The engine's unrounded figures, written into the sentence by its own formatter (mmWithInches).
const mount = finding({
  checkId: 'mounts.engine-right',
  group: 'mounts',
  title: 'Engine mount, right side',
  measured: 68.54,
  required: 3,
  margin: -65.54,
  limit: 'max',
  message: `The chassis pad sits ${mmWithInches(68.54)} in all, ${mmWithInches(65.54)} more than the ${mmWithInches(3)} the mounts take up.`,
});
const pan = finding({
  checkId: 'envelope.sump-crossmember',
  title: 'Oil pan to front crossmember',
  measured: -97.43,
  required: 12.7,
  margin: -110.13,
  message: `The oil pan runs ${mmWithInches(97.43)} into the front crossmember: it would have to rise ${mmWithInches(97.43)} just to touch free and ${mmWithInches(110.13)} to leave the required ${mmWithInches(12.7)}.`,
});
const crossmember = finding({
  checkId: 'drivetrain.transmission-mount-position',
  group: 'drivetrain',
  title: 'Transmission mount over the crossmember (fore-aft)',
  status: 'tight',
  measured: 46.74,
  required: 50,
  margin: 3.26,
  limit: 'max',
  message: `The transmission mount lands ${mmWithInches(46.74)} ahead of the crossmember, inside its ±${mmWithInches(50)} adjustment: ${mmWithInches(3.26)} to spare.`,
  remedies: [
    { kind: 'fabrication', operation: `Relocate the transmission crossmember ${mmWithInches(46.74)} forward`, laborHours: 4, note: 'Support the transmission.' },
    { kind: 'part', category: 'transmission-mount', requires: { offsetXMm: -46.7 }, partIds: [], note: 'An offset mount.' },
  ],
});

const number = (text: string | null) => Number((text ?? '').replace('−', '-').replace(/ in$/, ''));

afterEach(() => window.localStorage.removeItem('swapwright.unitSystem'));

describe('a fit-report row in inches', () => {
  it('a limit reads at the found figure’s precision and found − needed = margin as shown', () => {
    // Derived: 68.54 mm → 68.5 mm → 2.70 in; 3.0 mm → 0.12 in; −65.5 mm → −2.58 in; 2.70 − 0.12 = 2.58.
    // 46.74 mm → 46.7 mm → 1.84 in; 50.0 mm → 1.97 in; +3.3 mm → +0.13 in; 1.97 − 1.84 = 0.13.
    window.localStorage.setItem('swapwright.unitSystem', 'in');
    renderWithApp(<ShortfallList shortfalls={[mount, crossmember]} />);
    const row = screen.getByTestId('shortfall-mounts.engine-right');
    expect(within(row).getByTestId('shortfall-measured').textContent).toBe('2.70 in');
    expect(within(row).getByText('at most 0.12 in')).toBeInTheDocument();
    expect(within(row).getByTestId('shortfall-margin').textContent).toBe('−2.58 in');
    expect(within(row).getByText('The chassis pad sits 2.70 in in all, 2.58 in more than the 0.12 in the mounts take up.')).toBeInTheDocument();

    const close = screen.getByTestId('shortfall-drivetrain.transmission-mount-position');
    const found = within(close).getByTestId('shortfall-measured').textContent;
    const margin = within(close).getByTestId('shortfall-margin').textContent;
    expect(found).toBe('1.84 in');
    expect(within(close).getByText('at most 1.97 in')).toBeInTheDocument();
    expect(margin).toBe('+0.13 in');
    expect(Math.abs(1.97 - number(found) - number(margin))).toBeLessThan(0.0101);
    expect(within(close).getByText('The transmission mount lands 1.84 in ahead of the crossmember, inside its ±1.97 in adjustment: 0.13 in to spare.')).toBeInTheDocument();
    expect(close.textContent).toContain('Relocate the transmission crossmember 1.84 in forward');
    expect(close.textContent).toContain('offset −1.84 in');
  });

  it('a negative found figure reads the same size as in its sentence and in the margin arithmetic', () => {
    // Derived: −97.43 mm → −97.4 mm → −3.83 in (3.8346); −110.1 mm → −4.33 in; −3.83 − 0.50 = −4.33.
    window.localStorage.setItem('swapwright.unitSystem', 'in');
    setWindowWidth(1440);
    renderWithApp(<ChecksTable findings={[pan]} />);
    const row = screen.getByTestId('check-envelope.sump-crossmember');
    expect(row.textContent).toContain('The oil pan runs 3.83 in into the front crossmember: it would have to rise 3.83 in just to touch free and 4.33 in to leave the required 0.50 in.');
    const cells = within(row).getAllByRole('cell').map((cell) => cell.textContent);
    expect(cells).toContain('−3.83 in');
    expect(cells).toContain('at least 0.50 in');
    expect(cells).toContain('−4.33 in');
  });

  it('the same row reads the engine’s millimetres in mm mode', () => {
    window.localStorage.setItem('swapwright.unitSystem', 'mm');
    renderWithApp(<ShortfallList shortfalls={[mount]} />);
    const row = screen.getByTestId('shortfall-mounts.engine-right');
    expect(within(row).getByTestId('shortfall-measured').textContent).toBe('68.5 mm');
    expect(within(row).getByText('at most 3.0 mm')).toBeInTheDocument();
    expect(within(row).getByTestId('shortfall-margin').textContent).toBe('−65.5 mm');
  });
});
