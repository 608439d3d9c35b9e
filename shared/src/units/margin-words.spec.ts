import { DEMO_FIT_SPEC, DEMO_REAR_SUMP_PAN } from '../fixtures/demo-fit-spec';
import { runFitCheck } from '../fit-report/fit-report';
import type { FitSpec } from '../types/fit-spec';
import { formatDegrees, mmWithInches } from './figure-format';
import { marginWords } from './margin-words';

describe('marginWords: a signed margin in honest words', () => {
  // Common practice (no published source): room inside a limit is "to spare"; past a minimum a figure is
  // "short by" the amount, past a maximum it is "over" by it.
  it('only a positive margin is to spare', () => {
    expect(marginWords(6.4, mmWithInches)).toBe('6.4 mm (0.25 in) to spare');
    expect(marginWords(2, (d) => formatDegrees(d, 1), 'max')).toBe('2.0° to spare');
  });

  it('a negative margin is short of a minimum and over a maximum, with its size unsigned', () => {
    expect(marginWords(-3, mmWithInches)).toBe('short by 3.0 mm (0.12 in)');
    expect(marginWords(-2, (d) => formatDegrees(d, 1), 'max')).toBe('2.0° over');
    expect(marginWords(-2, (d) => formatDegrees(d, 1), 'max')).not.toMatch(/spare|-|\u2212/);
  });

  it('a margin that rounds to nothing is right at the limit, whichever its sign', () => {
    expect(marginWords(-0.02, mmWithInches)).toBe('right at the limit');
    expect(marginWords(0.001, (d) => formatDegrees(d, 1), 'max')).toBe('right at the limit');
  });

  it('refuses a figure that is not a number', () => {
    expect(() => marginWords(Number.NaN, mmWithInches)).toThrow(RangeError);
  });
});

describe('no finding calls a shortfall room to spare', () => {
  const NEGATIVE_SPARE = /[-\u2212]\d[\d.]*\s*(?:mm|°|in)[^;.:]*to spare/;
  const NEGATIVE_MARGIN_OF = /margin of [-\u2212]/;
  const placements = [
    DEMO_FIT_SPEC.placement,
    { ...DEMO_FIT_SPEC.placement, heightMm: DEMO_FIT_SPEC.placement.heightMm + 60 },
    { ...DEMO_FIT_SPEC.placement, heightMm: DEMO_FIT_SPEC.placement.heightMm + 200 },
    { ...DEMO_FIT_SPEC.placement, setbackMm: DEMO_FIT_SPEC.placement.setbackMm - 120 },
    { ...DEMO_FIT_SPEC.placement, setbackMm: DEMO_FIT_SPEC.placement.setbackMm + 200, tiltDeg: 6 },
  ];

  it.each(placements.map((p, i) => [i, p] as const))('placement %i: every sentence with a failing or tight margin says so', (_, placement) => {
    for (const oilPan of [DEMO_FIT_SPEC.oilPan, DEMO_REAR_SUMP_PAN]) {
      const spec: FitSpec = { ...DEMO_FIT_SPEC, oilPan, placement };
      for (const f of runFitCheck(spec).findings) {
        expect(f.message).not.toMatch(NEGATIVE_SPARE);
        expect(f.message).not.toMatch(NEGATIVE_MARGIN_OF);
        // A clearance that is present but under its minimum says it is short, never "to spare".
        if (f.status === 'fails' && f.margin !== null && f.margin < -0.05) expect(f.message).not.toMatch(/to spare/);
      }
    }
  });
});
