import { describe, expect, it } from 'vitest';
import { outlineRule, translateOutlineErrors } from '../outline-editor';

const outlines = [{ name: 'bottomProfile', label: 'Bottom profile' }];

describe('outline errors', () => {
  it('numbers the point as the table does (from 1)', () => {
    expect(translateOutlineErrors('bottomProfile.1.w must be negative: a pan outline lies below the crank centerline', outlines)).toBe(
      'Bottom profile row 2: Height must be negative: a pan outline lies below the crank centerline',
    );
    expect(translateOutlineErrors('spec.bottomProfile.0.u must be a number', outlines)).toBe('Bottom profile row 1: Forward must be a number');
    expect(translateOutlineErrors('name must not be empty', outlines)).toBe('name must not be empty');
  });

  it('refuses points at or above the crank before saving', async () => {
    const rule = outlineRule(3, 'Bottom profile', 'w');
    await expect(rule.validator(null, [{ u: 1, w: -1 }, { u: 2, w: 5 }, { u: 3, w: -2 }])).rejects.toThrow('Bottom profile: Height must be negative (below the crank) in row 2.');
    await expect(rule.validator(null, [{ u: 1, w: -1 }, { u: 2, w: -5 }, { u: 3, w: -2 }])).resolves.toBeUndefined();
  });

  it('refuses the same point twice and a figure that was not a length', async () => {
    const rule = outlineRule(3, 'Bottom profile', 'w');
    await expect(rule.validator(null, [{ u: 600, w: -75 }, { u: 330, w: -254 }, { u: 330, w: -254 }])).rejects.toThrow(
      'Bottom profile: rows 2 and 3 are the same point. Change one or remove it.',
    );
    await expect(rule.validator(null, [{ u: 600, w: -75 }, { u: Number.NaN, w: -254 }, { u: 100, w: -80 }])).rejects.toThrow(
      'Bottom profile: row 2 has a figure that is not a length',
    );
  });
});
