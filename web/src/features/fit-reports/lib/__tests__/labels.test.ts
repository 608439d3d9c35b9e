import { describe, expect, it } from 'vitest';
import { describeRequirement, matchResult, missingInputLabel } from '../labels';
import { categoryLabels } from '../remedies';

const mm = { system: 'mm' as const };
const inch = { system: 'in' as const };

describe('fit report labels', () => {
  it('names every part category', () => {
    expect(categoryLabels.radiator).toBe('Radiator');
    expect(categoryLabels['throttle-pedal']).toBe('Throttle pedal');
  });

  it('names missing inputs and falls back to the path', () => {
    expect(missingInputLabel('candidates.stockBeltLengthsMm')).toBe('Stock belt lengths');
    expect(missingInputLabel('engine.somethingNew')).toBe('engine.somethingNew');
  });

  it('spells out what a part must have, in the words the plan uses and the person\'s units', () => {
    expect(describeRequirement('inletSide', 'left', mm)).toBe('inlet on the left');
    expect(describeRequirement('minLengthMm', 1214, mm)).toBe('length at least 1214.0 mm');
    expect(describeRequirement('minRatedKw', 332, mm)).toBe('rated at least 332 kW');
    expect(describeRequirement('electricFan', true, mm)).toBe('with an electric fan');
    expect(describeRequirement('someNewKey', 'x', mm)).toBe('some new key x');
    // Source: NIST SP 811 (2008) B.8: 1 in = 25.4 mm; 1 hp = 0.7456999 kW, so 332 kW = 445.2 hp
    expect(describeRequirement('minLengthMm', 1214, inch)).toBe('length at least 47.80 in');
    expect(describeRequirement('minRatedKw', 332, inch)).toBe('rated at least 445 hp');
    expect(describeRequirement('sumpPosition', 'rear', inch)).toBe('sump at the rear');
  });

  it('words match checks instead of figures', () => {
    expect(matchResult({ status: 'ok', limit: 'match' })).toBe('Matches');
    expect(matchResult({ status: 'fails', limit: 'match' })).toBe('Does not match');
    expect(matchResult({ status: 'unknown', limit: 'match' })).toBe('—');
  });
});
