import { coolantMassFlowKgPerS, heatToCoolantKw, requiredRadiatorRatingKw, usableRadiatorKw } from './heat-rejection';

describe('heat rejection', () => {
  it('heat to coolant as a fraction of power', () => {
    // Common practice (no published source): heat to coolant about equal to brake power at full throttle.
    expect(heatToCoolantKw(298.28, 1)).toBe(298.28);
    expect(heatToCoolantKw(200, 0.8)).toBeCloseTo(160, 12);
  });

  it('usable and required radiator rating are inverse', () => {
    // Derived: rated × (1 − margin) and heat / (1 − margin).
    expect(usableRadiatorKw(200, 0.1)).toBeCloseTo(180, 12);
    expect(requiredRadiatorRatingKw(180, 0.1)).toBeCloseTo(200, 12);
  });

  it('coolant flow Q = ṁ·cp·ΔT', () => {
    // From memory: 50/50 glycol cp 3.5 kJ/kg·K; 150 kW at ΔT 8 K → 5.357 kg/s.
    expect(coolantMassFlowKgPerS(150, 3.5, 8)).toBeCloseTo(5.357, 3);
  });
});
