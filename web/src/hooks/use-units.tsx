import { createContext, useCallback, useContext, useMemo, useState, type ReactNode } from 'react';
import { displayToMm, formatLength, mmToDisplay, parseLength, unitLabels } from '@/lib/units';
import type { UnitSystem } from '@swapwright/shared';

const OVERRIDE_KEY = 'swapwright.unitSystem';

export type UnitsApi = {
  /** The unit in effect: the person's own choice, else the shop's. */
  system: UnitSystem;
  shopSystem: UnitSystem;
  override: UnitSystem | null;
  setOverride: (system: UnitSystem | null) => void;
  unitLabel: string;
  /** mm → "12.5 in" or "317.5 mm". */
  formatLength: (mm: number | null | undefined) => string;
  /** Typed text or number (bare numbers in the current unit) → mm, or null. */
  parseLength: (input: string | number | null | undefined) => number | null;
  /** mm → number in the current unit, rounded for display (for InputNumber values). */
  toDisplay: (mm: number) => number;
  /** Number in the current unit → mm. */
  fromDisplay: (value: number) => number;
};

function readOverride(): UnitSystem | null {
  try {
    const v = window.localStorage.getItem(OVERRIDE_KEY);
    return v === 'in' || v === 'mm' ? v : null;
  } catch {
    return null;
  }
}

const UnitsContext = createContext<UnitsApi | null>(null);

export type UnitsProviderProps = { shopSystem?: UnitSystem; children: ReactNode };

export function UnitsProvider({ shopSystem = 'in', children }: UnitsProviderProps) {
  const [override, setOverrideState] = useState<UnitSystem | null>(readOverride);

  const setOverride = useCallback((next: UnitSystem | null) => {
    try {
      if (next) window.localStorage.setItem(OVERRIDE_KEY, next);
      else window.localStorage.removeItem(OVERRIDE_KEY);
    } catch {
      // storage may be blocked; the choice still holds for this tab
    }
    setOverrideState(next);
  }, []);

  const value = useMemo<UnitsApi>(() => {
    const system = override ?? shopSystem;
    return {
      system,
      shopSystem,
      override,
      setOverride,
      unitLabel: unitLabels[system],
      formatLength: (mm) => formatLength(mm, system),
      parseLength: (input) => parseLength(input, system),
      toDisplay: (mm) => mmToDisplay(mm, system),
      fromDisplay: (v) => displayToMm(v, system),
    };
  }, [override, shopSystem, setOverride]);

  return <UnitsContext.Provider value={value}>{children}</UnitsContext.Provider>;
}

/** Length helpers in the person's unit. Lengths are always stored in mm. */
export function useUnits(): UnitsApi {
  const ctx = useContext(UnitsContext);
  if (!ctx) throw new Error('useUnits must be used inside <UnitsProvider>');
  return ctx;
}
