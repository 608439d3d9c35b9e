import { generateMeasurementTemplate } from '@swapwright/shared';
import { DEMO_FIT_SPEC } from '@swapwright/shared/fixtures';
import { describe, expect, it } from 'vitest';
import { sheetInUnits } from '../point-words';
import { sheetStub } from './sheet-fixture';

describe('measurement points in the person’s units', () => {
  it('a point named with millimetres reads in inches in inch mode, and as it is in millimetre mode', () => {
    // Source: NIST SP 811 (2008), Appendix B: 1 in = 25.4 mm exactly; 400 mm = 15.748 in → 15 3/4 in to the nearest
    // 1/16 in, as a tape reads.
    const inches = sheetInUnits(sheetStub(), 'in').points.find((p) => p.id === 'hood@400')!;
    expect(inches.label).toBe('Hood underside 15 3/4 in behind the front axle line');
    expect(inches.howTo).toBe('Measure hood underside 15 3/4 in behind the front axle line.');
    expect(sheetInUnits(sheetStub(), 'mm').points.find((p) => p.id === 'hood@400')!.label).toBe('Hood underside 400 mm behind the front axle line');
  });

  it('no point of a generated template shows a millimetre figure in inch mode', () => {
    const points = generateMeasurementTemplate(DEMO_FIT_SPEC.chassis);
    expect(points.some((p) => /\d mm\b/.test(`${p.label} ${p.howTo}`))).toBe(true);
    const shown = sheetInUnits(sheetStub({ points: points as never }), 'in').points;
    for (const p of shown) expect(`${p.label} ${p.howTo}`).not.toMatch(/\bmm\b/);
    const rails = shown.find((p) => p.id === 'rail.width@300')!;
    // Derived: 300 mm / 25.4 = 11.811 in → 11 13/16 in (11.8125); 600 mm = 23.622 in → 23 5/8 in;
    // 900 mm = 35.433 in → 35 7/16 in (35.4375): stations read to the nearest 1/16 in, as on a tape.
    expect(rails.label).toBe('Frame rails: inside width 11 13/16 in behind the front axle line');
    expect(shown.find((p) => p.id === 'rail.width@600')!.label).toBe('Frame rails: inside width 23 5/8 in behind the front axle line');
    expect(shown.find((p) => p.id === 'rail.width@900')!.label).toBe('Frame rails: inside width 35 7/16 in behind the front axle line');
    expect(shown.find((p) => p.id === 'rail.width@-300')!.label).toBe('Frame rails: inside width 11 13/16 in ahead of the front axle line');
    for (const p of shown) expect(`${p.label} ${p.howTo}`).not.toMatch(/\d\.\d{2} in/);
  });
});
