import { describe, expect, it } from 'vitest';
import { outlineRule, translateOutlineErrors } from '../outline-editor';

const outlines = [{ name: 'bottomProfile', label: 'Bottom profile' }];

describe('outline errors', () => {
  it('numbers the point as the table does (from 1)', () => {
    expect(translateOutlineErrors('bottomProfile.1.w must be negative: a pan outline lies below the crank centerline', outlines)).toBe(
      'Bottom profile row 2: w must be negative: a pan outline lies below the crank centerline',
    );
    expect(translateOutlineErrors('spec.bottomProfile.0.u must be a number', outlines)).toBe('Bottom profile row 1: u must be a number');
    expect(translateOutlineErrors('name must not be empty', outlines)).toBe('name must not be empty');
  });

  it('refuses points at or above the crank before saving', async () => {
    const rule = outlineRule(3, 'Bottom profile', 'w');
    await expect(rule.validator(null, [{ u: 1, w: -1 }, { u: 2, w: 5 }, { u: 3, w: -2 }])).rejects.toThrow('Bottom profile: w must be negative (below the crank) in row 2.');
    await expect(rule.validator(null, [{ u: 1, w: -1 }, { u: 2, w: -5 }, { u: 3, w: -2 }])).resolves.toBeUndefined();
  });
});
