import { computeFitWindow, runFitCheck } from '@swapwright/shared';
import { DEMO_FIT_SPEC, DEMO_REAR_SUMP_PAN } from '@swapwright/shared/fixtures';
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderWithApp } from '@/test/render';
import { FrontView } from '../front-view';
import { SideView } from '../side-view';

describe('SideView', () => {
  const report = runFitCheck(DEMO_FIT_SPEC);

  it('draws every chassis obstacle, the hood, radiator, pan and transmission', () => {
    renderWithApp(<SideView spec={DEMO_FIT_SPEC} findings={report.findings} />);
    const view = screen.getByTestId('side-view');
    for (const o of DEMO_FIT_SPEC.chassis.obstacles) expect(within(view).getByTestId(`side-obstacle-${o.id}`)).toBeInTheDocument();
    for (const id of ['side-hood', 'side-radiator', 'side-pan', 'side-transmission', 'side-engine', 'side-origin', 'side-ground'])
      expect(within(view).getByTestId(id)).toBeInTheDocument();
    expect(within(view).getAllByText('Front crossmember').length).toBeGreaterThan(0);
  });

  it('dimensions the tightest gap with its figure in the person’s unit', () => {
    const sump = report.findings.find((f) => f.checkId === 'envelope.sump-crossmember');
    expect(sump?.status).toBe('fails');
    renderWithApp(<SideView spec={DEMO_FIT_SPEC} findings={report.findings} />);
    const dim = screen.getByTestId('side-dim-envelope.sump-crossmember');
    const inches = Math.round((-(sump?.measured ?? 0) / 25.4) * 100) / 100;
    expect(within(dim).getByText(`overlap ${inches} in`)).toBeInTheDocument();
    expect(dim.getAttribute('data-status')).toBe('fails');
  });

  it('draws the fit window band when the placement has one', () => {
    const spec = { ...DEMO_FIT_SPEC, oilPan: DEMO_REAR_SUMP_PAN };
    const window = computeFitWindow(spec, { setbackFromMm: 560, setbackToMm: 760, stepMm: 20, tiltDeg: 3 });
    renderWithApp(<SideView spec={spec} findings={runFitCheck(spec).findings} window={window} proposed={window.best?.placement} />);
    expect(screen.getAllByTestId('side-fit-window').length).toBeGreaterThan(0);
    expect(screen.getByText('Fit window: crank heights that clear')).toBeInTheDocument();
  });
});

describe('FrontView', () => {
  it('shows the rails’ inside width and the gaps to them', () => {
    window.localStorage.setItem('swapwright.unitSystem', 'mm');
    renderWithApp(<FrontView spec={DEMO_FIT_SPEC} />);
    const view = screen.getByTestId('front-view');
    expect(within(view).getByTestId('front-rails')).toBeInTheDocument();
    expect(within(view).getByText('rails 740 mm inside')).toBeInTheDocument();
    expect(within(view).getByTestId('front-steering-box')).toBeInTheDocument();
    expect(within(view).getByTestId('front-box-drive-cv60-truck')).toBeInTheDocument();
  });
});
