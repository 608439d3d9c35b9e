import { hpToKw } from '../units/quantities';
import {
  ccPerMinToLbh,
  fuelMassFlowLbh,
  fuelMassFlowLbhFromKw,
  injectorCyclePeriodMs,
  injectorFlowAtPressure,
  lbhToCcPerMin,
  requiredInjectorFlowLbh,
  requiredPumpFlowGph,
  requiredPumpFlowLph,
} from './fuel-flow';

describe('fuel flow', () => {
  // Source: published EFI sizing note (BSFC 0.50 lb/hp·h at maximum power, 80 % duty common practice);
  // US DOE Alternative Fuels Data Center (gasoline 6.0 lb/gal, SG 0.74).
  it('400 hp at BSFC 0.50 burns 200 lb/h', () => {
    expect(fuelMassFlowLbh(400, 0.5)).toBe(200);
    expect(fuelMassFlowLbhFromKw(hpToKw(400), 0.5)).toBeCloseTo(200, 10);
  });

  it('eight injectors at 80 % duty need 31.25 lb/h each', () => {
    expect(requiredInjectorFlowLbh(400, 0.5, 8, 0.8)).toBeCloseTo(31.25, 12);
    expect(() => requiredInjectorFlowLbh(400, 0.5, 0, 0.8)).toThrow(RangeError);
  });

  it('31.25 lb/h is 319.25 cc/min at SG 0.74', () => {
    expect(lbhToCcPerMin(31.25, 0.74)).toBeCloseTo(319.25, 2);
    expect(ccPerMinToLbh(lbhToCcPerMin(31.25, 0.74), 0.74)).toBeCloseTo(31.25, 12);
  });

  it('200 lb/h at 6.0 lb/gal is 33.33 gal/h = 126.18 L/h', () => {
    expect(requiredPumpFlowGph(200, 6)).toBeCloseTo(33.333, 3);
    expect(requiredPumpFlowLph(200, 6)).toBeCloseTo(126.18, 2);
    // Derived: with a 25 % margin, 126.18 × 1.25.
    expect(requiredPumpFlowLph(200, 6, 0.25)).toBeCloseTo(157.73, 2);
  });

  it('31.25 lb/h at 43.5 psi gives 36.08 lb/h at 58 psi', () => {
    expect(injectorFlowAtPressure(31.25, 43.5, 58)).toBeCloseTo(36.08, 2);
    expect(() => injectorFlowAtPressure(31.25, 0, 58)).toThrow(RangeError);
  });

  it('6000 rpm gives a 20 ms cycle, 16 ms at 80 %', () => {
    expect(injectorCyclePeriodMs(6000)).toBe(20);
    expect(injectorCyclePeriodMs(6000) * 0.8).toBeCloseTo(16, 12);
  });
});
