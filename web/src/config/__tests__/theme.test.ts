import { describe, expect, it } from 'vitest';
import { phoneTheme, theme } from '../theme';

describe('the phone theme', () => {
  it('makes every control, small ones included, at least 40 px high', () => {
    // Source: W3C WCAG 2.2, SC 2.5.5 Target Size (Enhanced): 44 x 44 CSS px; a small control keeps 40 px,
    // Common practice (no published source).
    expect(phoneTheme.token?.controlHeight).toBeGreaterThanOrEqual(44);
    expect(phoneTheme.token?.controlHeightSM).toBeGreaterThanOrEqual(40);
    expect(phoneTheme.token?.controlHeightLG).toBeGreaterThanOrEqual(44);
  });

  it('keeps the shop look otherwise', () => {
    expect(phoneTheme.token?.colorPrimary).toBe(theme.token?.colorPrimary);
    expect(phoneTheme.components).toBe(theme.components);
  });
});
