import { unit } from 'mathjs';
import {
  gallonsToLiters,
  hpToKw,
  kgToLb,
  kpaToPsi,
  kwToHp,
  lbFtToNm,
  lbToKg,
  litersToGallons,
  nmToLbFt,
  N_PER_LBF,
  NM_PER_LBF_FT,
  PA_PER_PSI,
  psiToKpa,
  W_PER_HP,
} from './quantities';

const relative = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

describe('exact NIST factors', () => {
  it('match the published definitions', () => {
    // Source: NIST SP 811 (2008), Appendix B.8/B.9; NIST Handbook 44, Appendix C.
    expect(relative(N_PER_LBF, 4.4482216152605)).toBeLessThan(1e-12);
    expect(relative(NM_PER_LBF_FT, 1.3558179483314)).toBeLessThan(1e-12);
    expect(relative(PA_PER_PSI, 6894.757293168)).toBeLessThan(1e-12);
    expect(relative(W_PER_HP, 745.699871582)).toBeLessThan(1e-12);
    expect(lbToKg(1)).toBe(0.45359237);
    expect(gallonsToLiters(1)).toBe(3.785411784);
  });

  it('give the published test values', () => {
    // Source: NIST SP 811 (2008), Appendix B.9: 100 lbf·ft = 135.5817948 N·m; 20 US gal = 75.70823568 L.
    expect(relative(lbFtToNm(100), 135.5817948331)).toBeLessThan(1e-12);
    expect(relative(gallonsToLiters(20), 75.70823568)).toBeLessThan(1e-12);
  });
});

describe('against mathjs', () => {
  // Source: mathjs 15 unit definitions (independent reference library), composed from exact base units, 1e-12 relative.
  it.each([
    ['torque', lbFtToNm(250), unit(250, 'lbf ft').toNumber('N m')],
    ['volume', gallonsToLiters(17.5), unit(17.5, 'gal').toNumber('L')],
    ['volume from 231 in³', gallonsToLiters(17.5), unit(17.5 * 231, 'inch^3').toNumber('L')],
    ['pressure as lbf/in²', psiToKpa(58), unit(58, 'lbf / inch^2').toNumber('kPa')],
    ['power as 550 ft·lbf/s', hpToKw(400), unit(400 * 550, 'ft lbf / s').toNumber('kW')],
    ['mass', lbToKg(550), unit(550, 'lbm').toNumber('kg')],
  ])('%s', (_name, ours, reference) => {
    expect(relative(ours, reference)).toBeLessThan(1e-12);
  });

  it("agrees with mathjs's named psi and hp units to their stored precision", () => {
    // Source: mathjs 15 stores psi and hp as rounded constants (about 6e-11 relative from the exact definitions).
    expect(relative(psiToKpa(58), unit(58, 'psi').toNumber('kPa'))).toBeLessThan(1e-10);
    expect(relative(hpToKw(400), unit(400, 'hp').toNumber('kW'))).toBeLessThan(1e-10);
  });

  it('inverts exactly', () => {
    expect(nmToLbFt(lbFtToNm(123.4))).toBeCloseTo(123.4, 12);
    expect(litersToGallons(gallonsToLiters(9))).toBeCloseTo(9, 12);
    expect(kpaToPsi(psiToKpa(43.5))).toBeCloseTo(43.5, 12);
    expect(kwToHp(hpToKw(400))).toBeCloseTo(400, 12);
    expect(kgToLb(lbToKg(3))).toBeCloseTo(3, 12);
  });

  it('converts injection pressures', () => {
    // Source: SAE J1832 port-injector pressures: 300 kPa = 43.511 psi, 400 kPa = 58.015 psi.
    expect(kpaToPsi(300)).toBeCloseTo(43.511, 3);
    expect(kpaToPsi(400)).toBeCloseTo(58.015, 3);
  });
});
