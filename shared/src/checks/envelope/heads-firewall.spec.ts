import { boxFitSpec } from '../../fixtures/box-fit-spec';
import { COS3, runCheck, SIN3 } from '../../fixtures/check-test-helpers';
import { HEADS_FIREWALL_CHECK } from './heads-firewall';

// Box fixture: rear profile (0, 300) → (1000, 800), (−20, 400) → (1020, 900); firewall face x 1050, z 700–1200.
describe('envelope.heads-firewall', () => {
  it('ok: 30 mm', () => {
    const f = runCheck(HEADS_FIREWALL_CHECK, boxFitSpec());
    expect(f.measured).toBeCloseTo(30, 9);
    expect(f.against).toBe('fw');
    expect(f.status).toBe('ok');
  });
  it('tight (setback 1015 → 15 mm) and fails (setback 1025 → 5 mm, move forward 7.7 mm)', () => {
    expect(runCheck(HEADS_FIREWALL_CHECK, boxFitSpec({ setbackMm: 1015 })).status).toBe('tight');
    const f = runCheck(HEADS_FIREWALL_CHECK, boxFitSpec({ setbackMm: 1025 }));
    expect(f.status).toBe('fails');
    expect(f.remedies).toContainEqual(expect.objectContaining({ kind: 'placement', axis: 'setback', changeBy: -7.7 }));
  });
  it('overlap: setback 1040 puts the rear corner 10 mm into the firewall (measured as the forward move that clears it)', () => {
    expect(runCheck(HEADS_FIREWALL_CHECK, boxFitSpec({ setbackMm: 1040 })).measured).toBeCloseTo(-10, 9);
  });
  it('tilt 3°', () => {
    // Derived: (−20, 400): x = 1000 + 20·cos 3° + 400·sin 3° = 1000 + 19.973 + 20.934 = 1040.907 → 9.093 mm.
    expect(runCheck(HEADS_FIREWALL_CHECK, boxFitSpec({ tiltDeg: 3 })).measured).toBeCloseTo(1050 - (1000 + 20 * COS3 + 400 * SIN3), 9);
  });
  it('unknown without a rear profile', () => {
    const spec = boxFitSpec();
    expect(runCheck(HEADS_FIREWALL_CHECK, { ...spec, engine: { ...spec.engine, rearProfile: [] } }).missing).toEqual(['engine.rearProfile']);
  });
});
