import { describe, expect, it } from 'vitest';
import { describeRequirement, matchResult, missingInputLabel } from '../labels';
import { categoryLabels } from '../remedies';

const mm = { formatLength: (v: number | null | undefined) => `${v} mm`, system: 'mm' as const };

describe('fit report labels', () => {
  it('names every part category', () => {
    expect(categoryLabels.radiator).toBe('Radiator');
    expect(categoryLabels['throttle-pedal']).toBe('Throttle pedal');
  });

  it('names missing inputs and falls back to the path', () => {
    expect(missingInputLabel('candidates.stockBeltLengthsMm')).toBe('Stock belt lengths');
    expect(missingInputLabel('engine.somethingNew')).toBe('engine.somethingNew');
  });

  it('spells out what a part must have', () => {
    expect(describeRequirement('inletSide', 'left', mm)).toBe('inlet side left');
    expect(describeRequirement('minLengthMm', 1214, mm)).toBe('length at least 1214 mm');
    expect(describeRequirement('minRatedKw', 332, mm)).toBe('rating at least 332 kW');
    expect(describeRequirement('electricFan', true, mm)).toBe('electric fan yes');
    expect(describeRequirement('someNewKey', 'x', mm)).toBe('someNewKey x');
  });

  it('words match checks instead of figures', () => {
    expect(matchResult({ status: 'ok', limit: 'match' })).toBe('Matches');
    expect(matchResult({ status: 'fails', limit: 'match' })).toBe('Does not match');
    expect(matchResult({ status: 'unknown', limit: 'match' })).toBe('—');
  });
});
