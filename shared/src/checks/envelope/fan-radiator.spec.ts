import { boxFitSpec } from '../../fixtures/box-fit-spec';
import { COS3, runCheck, SIN3 } from '../../fixtures/check-test-helpers';
import { FAN_RADIATOR_CHECK } from './fan-radiator';

// Box fixture: fan face u 700 → x 300; core rear face x 250; drive face u 680 → x 320.
describe('envelope.fan-radiator', () => {
  it('ok: 50 mm, set by the fan', () => {
    const f = runCheck(FAN_RADIATOR_CHECK, boxFitSpec());
    expect(f.measured).toBeCloseTo(50, 9);
    expect(f.required).toBe(25.4);
    expect(f.status).toBe('ok');
    expect(f.message).toContain('fan');
  });
  it('tight (setback 980 → 30 mm) and fails (setback 960 → 10 mm, set back 15.4 mm)', () => {
    expect(runCheck(FAN_RADIATOR_CHECK, boxFitSpec({ setbackMm: 980 })).status).toBe('tight');
    const f = runCheck(FAN_RADIATOR_CHECK, boxFitSpec({ setbackMm: 960 }));
    expect(f.status).toBe('fails');
    expect(f.margin).toBeCloseTo(-15.4, 9);
    expect(f.remedies).toContainEqual(expect.objectContaining({ kind: 'placement', axis: 'setback', changeBy: 15.4 }));
  });
  it('overlap: setback 900 puts the fan 50 mm past the core face', () => {
    expect(runCheck(FAN_RADIATOR_CHECK, boxFitSpec({ setbackMm: 900 })).measured).toBeCloseTo(-50, 9);
  });
  it('tilt 3°: the low end of the fan leans forward', () => {
    // Derived: (700, −100): x = 1000 − 700·cos 3° − 100·sin 3° = 1000 − 699.041 − 5.234 = 295.726 → 45.726.
    const f = runCheck(FAN_RADIATOR_CHECK, boxFitSpec({ tiltDeg: 3 }));
    expect(f.measured).toBeCloseTo(1000 - 700 * COS3 - 100 * SIN3 - 250, 9);
    expect(f.measured).toBeCloseTo(45.726, 3);
  });
  it('unknown without a radiator core', () => {
    const spec = boxFitSpec();
    const f = runCheck(FAN_RADIATOR_CHECK, { ...spec, chassis: { ...spec.chassis, radiatorCore: undefined as never } });
    expect(f.status).toBe('unknown');
    expect(f.missing).toEqual(['chassis.radiatorCore']);
  });
});
