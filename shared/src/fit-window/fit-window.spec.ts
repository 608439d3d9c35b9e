import { ENVELOPE_CHECKS } from '../checks/envelope';
import { boxFitSpec } from '../fixtures/box-fit-spec';
import { DEMO_FIT_SPEC, DEMO_REAR_SUMP_PAN } from '../fixtures/demo-fit-spec';
import { resolveFitSettings } from '../settings/fit-settings';
import type { FitSpec } from '../types/fit-spec';
import { computeFitWindow } from './fit-window';

const settings = resolveFitSettings();
const runAt = (spec: FitSpec, setbackMm: number, heightMm: number, tiltDeg: number) =>
  ENVELOPE_CHECKS.map((c) => c.run({ spec: { ...spec, placement: { setbackMm, heightMm, tiltDeg } }, settings }));

describe('computeFitWindow', () => {
  it('box fixture, tilt 0: lower bound from the crossmember, upper from the tunnel, computed by hand', () => {
    // Derived (setback 1000): pan floor z_e − 200 must clear the crossmember top 280 by 12.7 → z_e ≥ 492.7;
    // the transmission top z_e + 200 must stay 12.7 under the tunnel at 740 → z_e ≤ 527.3 (the hood allows 537.3).
    const w = computeFitWindow(boxFitSpec(), { setbackFromMm: 1000, setbackToMm: 1000, stepMm: 1, tiltDeg: 0 });
    const c = w.columns[0];
    expect(c.feasible).toBe(true);
    expect(c.lowMm).toBeCloseTo(492.7, 3);
    expect(c.highMm).toBeCloseTo(527.3, 3);
    expect(c.lowBoundBy).toEqual({ checkId: 'envelope.sump-crossmember', against: 'xm' });
    expect(c.highBoundBy).toEqual({ checkId: 'envelope.transmission-tunnel', against: 'tun' });
    // best: the middle, 20 − 12.7 + 17.3 … both margins equal at 510: 17.3 each.
    expect(w.best?.placement.heightMm).toBeCloseTo(510, 1);
    expect(w.best?.smallestMarginMm).toBeCloseTo(17.3, 1);
  });

  const rear = { ...DEMO_FIT_SPEC, oilPan: DEMO_REAR_SUMP_PAN };
  const window = computeFitWindow(rear, { stepMm: 5 });

  it('demo with the rear-sump pan: feasible columns, each bound named, infeasible setbacks marked', () => {
    expect(window.tiltDeg).toBe(3);
    const feasible = window.columns.filter((c) => c.feasible);
    expect(feasible.length).toBeGreaterThan(5);
    expect(window.columns.some((c) => !c.feasible && c.blockedBy !== null)).toBe(true);
    const at660 = window.columns.find((c) => c.setbackMm === 660)!;
    expect(at660.lowBoundBy?.checkId).toBe('envelope.sump-crossmember');
    expect(at660.highBoundBy?.checkId).toBe('envelope.hood');
    expect(at660.lowMm!).toBeLessThan(500);
    expect(at660.highMm!).toBeGreaterThan(500);
  });

  it('the proposed best placement passes every geometric check and reports their margins', () => {
    const best = window.best!;
    expect(best).not.toBeNull();
    const findings = runAt(rear, best.placement.setbackMm, best.placement.heightMm, best.placement.tiltDeg);
    for (const f of findings) expect(['ok', 'tight']).toContain(f.status);
    const smallest = Math.min(...findings.filter((f) => f.margin !== null).map((f) => f.margin as number));
    expect(best.smallestMarginMm).toBeCloseTo(smallest, 9);
    expect(best.margins.length).toBe(findings.filter((f) => f.margin !== null).length);
    // It is at least as good as the current placement.
    const current = Math.min(...runAt(rear, 660, 500, 3).filter((f) => f.margin !== null).map((f) => f.margin as number));
    expect(best.smallestMarginMm).toBeGreaterThanOrEqual(current - 1e-9);
  });

  it('heights just outside the window fail the check that bounds it; the bounds themselves pass', () => {
    for (const c of window.columns.filter((x) => x.feasible)) {
      for (const iv of c.intervals) {
        const atLow = runAt(rear, c.setbackMm, iv.lowMm, 3);
        const atHigh = runAt(rear, c.setbackMm, iv.highMm, 3);
        for (const f of [...atLow, ...atHigh]) expect(['ok', 'tight']).toContain(f.status);
        if (iv.lowBoundBy.checkId !== 'window.range') {
          const below = runAt(rear, c.setbackMm, iv.lowMm - 0.01, 3).find((f) => f.checkId === iv.lowBoundBy.checkId)!;
          expect(below.status).toBe('fails');
        }
        if (iv.highBoundBy.checkId !== 'window.range') {
          const above = runAt(rear, c.setbackMm, iv.highMm + 0.01, 3).find((f) => f.checkId === iv.highBoundBy.checkId)!;
          expect(above.status).toBe('fails');
        }
      }
    }
  });

  it('infeasible columns really fail somewhere: a height in the middle of the searched range fails', () => {
    for (const c of window.columns.filter((x) => !x.feasible)) {
      for (const z of [450, 500, 550]) {
        const failing = runAt(rear, c.setbackMm, z, 3).filter((f) => f.status === 'fails');
        expect(failing.length).toBeGreaterThan(0);
      }
    }
  });

  it('proposes no best placement where nothing bounds the engine from below (no oil pan chosen)', () => {
    // Derived: without a pan outline no check limits how low the crank may sit, so each column runs down to the
    // searched range's floor (0 mm) and the hood gap only grows as the engine drops: the "largest margin" would be
    // an engine on the ground. The window is still drawn; no placement is proposed from it.
    const noPan: FitSpec = { ...DEMO_FIT_SPEC };
    delete noPan.oilPan;
    const open = computeFitWindow(noPan, { stepMm: 10 });
    const feasible = open.columns.filter((c) => c.feasible);
    expect(feasible.length).toBeGreaterThan(0);
    expect(feasible.every((c) => c.lowMm === 0 && c.lowBoundBy?.checkId === 'window.range')).toBe(true);
    expect(open.best).toBeNull();
    // with the pan chosen the window is closed at both ends and the best placement sits well off the floor
    expect(window.best).not.toBeNull();
    expect(window.best!.placement.heightMm).toBeGreaterThan(300);
  });

  it('the stock pan has no window at the stock setback: the crossmember closes it', () => {
    const w = computeFitWindow(DEMO_FIT_SPEC, { setbackFromMm: 660, setbackToMm: 660 });
    expect(w.columns[0].feasible).toBe(false);
    expect(w.columns[0].blockedBy?.checkId).toBe('envelope.sump-crossmember');
    expect(w.best).toBeNull();
  });

  it('output is ready to draw: arrays of {setbackMm, lowMm, highMm, lowBoundBy, highBoundBy}', () => {
    for (const c of window.columns) {
      expect(Object.keys(c)).toEqual(expect.arrayContaining(['setbackMm', 'lowMm', 'highMm', 'lowBoundBy', 'highBoundBy']));
    }
  });
});
