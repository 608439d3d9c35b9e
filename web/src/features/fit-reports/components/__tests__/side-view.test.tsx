import { computeFitWindow, runFitCheck } from '@swapwright/shared';
import { DEMO_FIT_SPEC, DEMO_REAR_SUMP_PAN } from '@swapwright/shared/fixtures';
import { screen, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
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

describe('SideView on a phone', () => {
  it('keeps the drawing at a readable width inside a frame that scrolls sideways, and says so', () => {
    renderWithApp(<SideView spec={DEMO_FIT_SPEC} findings={runFitCheck(DEMO_FIT_SPEC).findings} />);
    const frame = screen.getByTestId('side-view-scroll');
    expect(frame.className).toContain('drawing-scroll');
    const drawing = frame.firstElementChild as HTMLElement;
    expect(drawing.style.minWidth).toBe('640px');
    expect(within(drawing).getByRole('img', { name: /Side view of the engine in the chassis/ })).toBeInTheDocument();
    const hint = screen.getByText('Swipe the drawing sideways to see all of it.');
    expect(hint.className).toContain('drawing-scroll-hint');
    // the hint comes before the frame, so it is read before the drawing's cut-off right edge
    expect(hint.compareDocumentPosition(frame) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();
  });
});

describe('FrontView', () => {
  it('shows the rails’ inside width and the gaps to them', () => {
    window.localStorage.setItem('swapwright.unitSystem', 'mm');
    renderWithApp(<FrontView spec={DEMO_FIT_SPEC} />);
    const view = screen.getByTestId('front-view');
    expect(within(view).getByTestId('front-rails')).toBeInTheDocument();
    expect(within(view).getByText('rails 740.0 mm inside')).toBeInTheDocument();
    expect(within(view).getByTestId('front-steering-box')).toBeInTheDocument();
    expect(within(view).getByTestId('front-box-drive-cv60-truck')).toBeInTheDocument();
  });
});

describe('drawing labels', () => {
  const report = runFitCheck(DEMO_FIT_SPEC);
  const boxOf = (el: Element) => {
    const [x, y, w, h] = (el.getAttribute('data-box') ?? '').split(' ').map(Number);
    return { x, y, w, h };
  };
  const overlap = (a: ReturnType<typeof boxOf>, b: ReturnType<typeof boxOf>) =>
    Math.max(0, Math.min(a.x + a.w, b.x + b.w) - Math.max(a.x, b.x)) * Math.max(0, Math.min(a.y + a.h, b.y + b.h) - Math.max(a.y, b.y));

  // a phone (the card inside a 390 px screen) and a desktop card
  it.each([330, 700])('stay at least 11 px on screen and off each other in a %i px wide drawing', (widthPx) => {
    vi.spyOn(HTMLElement.prototype, 'getBoundingClientRect').mockReturnValue({ width: widthPx, height: 300, x: 0, y: 0, top: 0, left: 0, right: widthPx, bottom: 300, toJSON: () => ({}) } as DOMRect);
    renderWithApp(
      <>
        <SideView spec={DEMO_FIT_SPEC} findings={report.findings} />
        <FrontView spec={DEMO_FIT_SPEC} />
      </>,
    );
    for (const [testId, maxHeight] of [['side-view', 560], ['front-view', 420]] as const) {
      const svg = screen.getByTestId(testId).querySelector('svg')!;
      const [, , vbW, vbH] = svg.getAttribute('viewBox')!.split(' ').map(Number);
      const scale = Math.min(widthPx / vbW, maxHeight / vbH);
      const texts = [...svg.querySelectorAll('text')];
      expect(texts.length).toBeGreaterThan(3);
      for (const t of texts) expect(Number(t.getAttribute('font-size')) * scale).toBeGreaterThanOrEqual(11);
      const boxes = [...svg.querySelectorAll('[data-box]')].map(boxOf);
      for (let i = 0; i < boxes.length; i++) for (let j = i + 1; j < boxes.length; j++) expect(overlap(boxes[i], boxes[j])).toBe(0);
    }
  });
});
