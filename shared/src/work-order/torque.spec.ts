import { unit } from 'mathjs';
import { NM_PER_LBF_FT } from '../units/quantities';
import { torqueInBothUnits } from './torque';

describe('torque in lbf·ft and N·m', () => {
  it('uses the exact factor', () => {
    // Source: NIST SP 811 (2008), Appendix B.9: 1 lbf·ft = 1.355 817 948 331 4004 N·m (lbf = 4.448 221 615 260 5 N, ft = 0.3048 m exactly).
    expect(NM_PER_LBF_FT).toBe(1.3558179483314004);
  });

  it('shows 18 lbf-ft as about 24.4 N·m', () => {
    // Source: NIST SP 811 (2008), Appendix B.9: 18 × 1.355 817 948 331 4004 = 24.404 723 069 965 207 N·m.
    expect(torqueInBothUnits({ lbfFt: 18 })).toEqual({ lbfFt: 18, newtonMetres: 24.4 });
    // Independent reference: mathjs unit conversion.
    expect(Math.round(unit(18, 'lbf ft').toNumber('N m') * 10) / 10).toBe(24.4);
  });

  it('keeps a figure given in N·m and converts the other way', () => {
    // Source: NIST SP 811 (2008), Appendix B.9: 100 lbf·ft = 135.581 794 8 N·m, so 135.6 N·m reads 100.0 lbf·ft.
    expect(torqueInBothUnits({ newtonMetres: 135.5817948331 })).toEqual({ lbfFt: 100, newtonMetres: 135.6 });
    expect(torqueInBothUnits({ newtonMetres: 12 })).toEqual({ lbfFt: 8.9, newtonMetres: 12 });
  });
});
