import { act, renderHook } from '@testing-library/react';
import type { ReactNode } from 'react';
import { describe, expect, it } from 'vitest';
import type { UnitSystem } from '@swapwright/shared';
import { UnitsProvider, useUnits } from '../use-units';

function wrapperFor(shopSystem: UnitSystem) {
  return ({ children }: { children: ReactNode }) => <UnitsProvider shopSystem={shopSystem}>{children}</UnitsProvider>;
}

// 1 in = 25.4 mm exactly (NIST SP 811, appendix B).
describe('useUnits', () => {
  it('turns 12.5 in into 317.5 mm and back', () => {
    const { result } = renderHook(() => useUnits(), { wrapper: wrapperFor('in') });
    expect(result.current.parseLength('12.5')).toBeCloseTo(317.5, 10);
    expect(result.current.parseLength(12.5)).toBeCloseTo(317.5, 10);
    expect(result.current.fromDisplay(12.5)).toBeCloseTo(317.5, 10);
    expect(result.current.formatLength(317.5)).toBe('12.50 in');
    expect(result.current.toDisplay(317.5)).toBe(12.5);
  });

  it('shows millimetres when the shop works in mm', () => {
    const { result } = renderHook(() => useUnits(), { wrapper: wrapperFor('mm') });
    expect(result.current.system).toBe('mm');
    expect(result.current.formatLength(317.5)).toBe('317.5 mm');
    expect(result.current.parseLength('317.5')).toBe(317.5);
  });

  it('accepts either unit on input whatever the display unit', () => {
    const { result } = renderHook(() => useUnits(), { wrapper: wrapperFor('mm') });
    expect(result.current.parseLength('12.5 in')).toBeCloseTo(317.5, 10);
    expect(result.current.parseLength('12.5"')).toBeCloseTo(317.5, 10);
    expect(result.current.parseLength('317,5 mm')).toBe(317.5);
    expect(result.current.parseLength('twelve')).toBeNull();
    expect(result.current.parseLength('')).toBeNull();
  });

  it('a person’s own choice overrides the shop and survives a reload', () => {
    const { result, unmount } = renderHook(() => useUnits(), { wrapper: wrapperFor('in') });
    act(() => result.current.setOverride('mm'));
    expect(result.current.system).toBe('mm');
    expect(result.current.formatLength(317.5)).toBe('317.5 mm');
    unmount();

    const again = renderHook(() => useUnits(), { wrapper: wrapperFor('in') });
    expect(again.result.current.system).toBe('mm');
    act(() => again.result.current.setOverride(null));
    expect(again.result.current.system).toBe('in');
  });

  it('shows a dash for a missing figure', () => {
    const { result } = renderHook(() => useUnits(), { wrapper: wrapperFor('in') });
    expect(result.current.formatLength(null)).toBe('—');
  });
});
