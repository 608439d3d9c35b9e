import { boxFitSpec } from '../../fixtures/box-fit-spec';
import { runCheck } from '../../fixtures/check-test-helpers';
import { TRANSMISSION_TUNNEL_CHECK } from './transmission-tunnel';

// Box fixture: transmission top at z_e + 200 over x 1000–1600; tunnel from z 740 over x 1100–1700.
describe('envelope.transmission-tunnel', () => {
  it('ok: 40 mm', () => {
    const f = runCheck(TRANSMISSION_TUNNEL_CHECK, boxFitSpec());
    expect(f.measured).toBeCloseTo(40, 9);
    expect(f.status).toBe('ok');
  });
  it('tight (z_e 525 → 15) and fails (z_e 535 → 5, lower 7.7 mm)', () => {
    expect(runCheck(TRANSMISSION_TUNNEL_CHECK, boxFitSpec({ heightMm: 525 })).status).toBe('tight');
    const f = runCheck(TRANSMISSION_TUNNEL_CHECK, boxFitSpec({ heightMm: 535 }));
    expect(f.status).toBe('fails');
    expect(f.remedies).toContainEqual(expect.objectContaining({ kind: 'placement', axis: 'height', changeBy: -7.7 }));
  });
  it('overlap: z_e 560 is 20 mm into the tunnel (the drop that clears it)', () => {
    expect(runCheck(TRANSMISSION_TUNNEL_CHECK, boxFitSpec({ heightMm: 560 })).measured).toBeCloseTo(-20, 9);
  });
  it('unknown without a transmission', () => {
    expect(runCheck(TRANSMISSION_TUNNEL_CHECK, { ...boxFitSpec(), transmission: undefined }).missing).toEqual(['transmission.sideProfile']);
  });
});
