import { runFitCheck } from '@swapwright/shared';
import { DEMO_FIT_SPEC } from '@swapwright/shared/fixtures';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { renderWithApp } from '@/test/render';
import { ShortfallList } from '../shortfall-list';
import { finding } from './finding-fixture';

const close = finding({ checkId: 'envelope.hood', title: 'Hood to intake', status: 'tight', measured: 15.875, margin: 3.175 });
const slightlyBlocked = finding({ checkId: 'envelope.heads-firewall', title: 'Heads to firewall', measured: 6.35, margin: -6.35 });
const badlyBlocked = finding({
  checkId: 'envelope.sump-crossmember',
  title: 'Oil pan to front crossmember',
  measured: -25.4,
  margin: -38.1,
  remedies: [
    { kind: 'part', category: 'oil-pan', requires: { sumpPosition: 'rear' }, partIds: ['pan-rear'], note: 'A rear-sump pan clears.' },
    { kind: 'placement', axis: 'height', changeBy: 38.1, unit: 'mm', note: '' },
    { kind: 'fabrication', operation: 'Notch the crossmember', laborHours: 8, note: 'Have a qualified welder do it.' },
  ],
});

function rowOrder(): string[] {
  return screen.getAllByTestId(/^shortfall-(?!measured|margin)/).map((el) => el.getAttribute('data-testid') ?? '');
}

describe('ShortfallList', () => {
  it('puts the worst first: blocked before close, the biggest miss first', () => {
    renderWithApp(<ShortfallList shortfalls={[close, slightlyBlocked, badlyBlocked]} />);
    expect(rowOrder()).toEqual(['shortfall-envelope.sump-crossmember', 'shortfall-envelope.heads-firewall', 'shortfall-envelope.hood']);
    expect(within(screen.getByTestId('shortfall-envelope.sump-crossmember')).getByText('Blocked')).toBeInTheDocument();
    expect(within(screen.getByTestId('shortfall-envelope.hood')).getByText('Close call')).toBeInTheDocument();
  });

  it('shows the figures in inches (1 in = 25.4 mm exactly, NIST SP 811)', () => {
    renderWithApp(<ShortfallList shortfalls={[badlyBlocked, close]} />);
    const row = screen.getByTestId('shortfall-envelope.sump-crossmember');
    expect(within(row).getByTestId('shortfall-measured').textContent).toBe('−1.00 in');
    expect(within(row).getByTestId('shortfall-margin').textContent).toBe('−1.50 in');
    expect(within(row).getByText('at least 0.50 in')).toBeInTheDocument();
    expect(within(screen.getByTestId('shortfall-envelope.hood')).getByTestId('shortfall-measured').textContent).toBe('0.63 in');
    expect(within(row).getByText('Move: Raise the engine 1.50 in')).toBeInTheDocument();
    expect(within(row).getByText('8 h labor')).toBeInTheDocument();
  });

  it('shows the same figures in millimetres when the person works in mm', () => {
    window.localStorage.setItem('swapwright.unitSystem', 'mm');
    renderWithApp(<ShortfallList shortfalls={[badlyBlocked]} />);
    const row = screen.getByTestId('shortfall-envelope.sump-crossmember');
    expect(within(row).getByTestId('shortfall-measured').textContent).toBe('−25.4 mm');
    expect(within(row).getByTestId('shortfall-margin').textContent).toBe('−38.1 mm');
    expect(within(row).getByText('at least 12.7 mm')).toBeInTheDocument();
  });

  it('writes the sentence and remedy notes in the person’s system, inches first, the threshold as precise as the figures', () => {
    // Source: NIST SP 811 (2008), Appendix B: 1 in = 25.4 mm. Derived: 96.0 mm = 3.78 in; a 100 mm rule reads
    // 3.94 in (3.937 in, not rounded to a coarser step); 126.2 L/h = 33.3 US gal/h; 58.0 psi = 399.9 kPa.
    const ground = finding({
      checkId: 'envelope.ground-clearance',
      title: 'Ground clearance under the engine',
      measured: 96,
      required: 100,
      margin: -4,
      message: 'The lowest point sits 96.0 mm (3.78 in) above the ground; at least 100.0 mm (3.94 in) is required.',
      remedies: [{ kind: 'fabrication', operation: 'Raise the crossmember 4.0 mm (0.16 in)', laborHours: 2, note: 'A pump giving 126.2 L/h at 58.0 psi.' }],
    });
    renderWithApp(<ShortfallList shortfalls={[ground]} />);
    const row = screen.getByTestId('shortfall-envelope.ground-clearance');
    expect(within(row).getByText('The lowest point sits 3.78 in above the ground; at least 3.94 in is required.')).toBeInTheDocument();
    expect(within(row).getByText('at least 3.94 in')).toBeInTheDocument();
    expect(within(row).getByText('Fabricate: Raise the crossmember 0.16 in')).toBeInTheDocument();
    expect(within(row).getByText('A pump giving 33.3 gal/h at 58.0 psi.')).toBeInTheDocument();
    expect(row.textContent).not.toMatch(/\d mm\b|L\/h|kPa/);
  });

  it('writes the sentence in millimetres, kPa and L/h for a person who works in mm', () => {
    window.localStorage.setItem('swapwright.unitSystem', 'mm');
    const pump = finding({ checkId: 'fuel.pump-flow', group: 'fuel', unit: 'L/h', measured: 0, required: 126.2, margin: -126.2, message: 'The pump must deliver at least 126.2 L/h at 58.0 psi.' });
    renderWithApp(<ShortfallList shortfalls={[pump]} />);
    const row = screen.getByTestId('shortfall-fuel.pump-flow');
    expect(within(row).getByText('The pump must deliver at least 126.2 L/h at 399.9 kPa.')).toBeInTheDocument();
    expect(row.textContent).not.toMatch(/psi|gal\/h|lb\/h/);
    window.localStorage.removeItem('swapwright.unitSystem');
  });

  it('a check without an honest found figure shows what it needs and no made-up zero', () => {
    // Source: SAE J1832 (port injectors at rated pressure, 400 kPa = 58.0 psi). From memory: a carburetor pump gives
    // about 4–8 psi, so it has no flow at injection pressure; the demo's carburetor chassis reads so.
    window.localStorage.setItem('swapwright.unitSystem', 'in');
    const spec = { ...DEMO_FIT_SPEC, chassis: { ...DEMO_FIT_SPEC.chassis, fuelSystem: { kind: 'carburetor' as const, pumpFlowLph: 150, pumpRatedPsi: 8, regulatorPsi: 0 } } };
    const fuel = runFitCheck(spec).findings.filter((f) => f.group === 'fuel' && f.status === 'fails');
    renderWithApp(<ShortfallList shortfalls={fuel} />);
    const pump = screen.getByTestId('shortfall-fuel.pump-flow');
    expect(within(pump).queryByTestId('shortfall-measured')).toBeNull();
    expect(within(pump).queryByTestId('shortfall-margin')).toBeNull();
    expect(pump.textContent).toMatch(/Needs at least 36\.3 gal\/h/);
    expect(pump.textContent).toContain('low-pressure pump (39.6 gal/h at 8.0 psi) cannot feed injection');
    const pressure = screen.getByTestId('shortfall-fuel.system-pressure');
    expect(pressure.textContent).toContain('no regulator');
    for (const row of [pump, pressure]) expect(row.textContent).not.toMatch(/\b0\.0 (gal\/h|psi|L\/h)|—/);
    window.localStorage.removeItem('swapwright.unitSystem');
  });

  it('offers the matching catalog part with a "Use" button', async () => {
    const onUsePart = vi.fn();
    renderWithApp(
      <ShortfallList shortfalls={[badlyBlocked]} parts={{ 'pan-rear': { id: 'pan-rear', name: 'Rear-sump pan R1' } }} onUsePart={onUsePart} />,
    );
    const button = screen.getByRole('button', { name: /^Use this pan: Rear-sump pan R1/ });
    await userEvent.click(button);
    expect(onUsePart).toHaveBeenCalledWith(badlyBlocked.remedies[0], 'pan-rear');
  });

  it('offers a covering mount adapter with "Use this adapter", and marks the one in use', async () => {
    const mount = finding({
      checkId: 'mounts.engine-mount-left',
      title: 'Engine mount, left side',
      limit: 'max',
      measured: 68.4,
      required: 3,
      margin: -65.4,
      remedies: [{ kind: 'part', category: 'mount-adapter', requires: { maxDxMm: 12, maxDzMm: 39, maxDyMm: 55 }, partIds: ['mnt-60', 'mnt-90'], note: '' }],
    });
    const parts = { 'mnt-60': { id: 'mnt-60', name: 'Drop plates 60' }, 'mnt-90': { id: 'mnt-90', name: 'Heavy kit 90' } };
    const onUsePart = vi.fn();
    renderWithApp(<ShortfallList shortfalls={[mount]} parts={parts} onUsePart={onUsePart} chosenIds={['mnt-90']} />);
    await userEvent.click(screen.getByRole('button', { name: 'Use this adapter: Drop plates 60' }));
    expect(onUsePart).toHaveBeenCalledWith(mount.remedies[0], 'mnt-60');
    expect(screen.queryByRole('button', { name: /Heavy kit 90/ })).toBeNull();
    expect(screen.getByText('In use')).toBeInTheDocument();
  });
});
