import { driveshaftSpeed, shaftRpmFromEngine, shaftRpmFromRoadSpeed } from './shaft-speed';

describe('driveshaft speed', () => {
  it('from road speed, tyre and axle ratio', () => {
    // Derived: 100 km/h = 1,666,666.7 mm/min; a 700 mm tyre turns 757.88 rpm; × 3.73 = 2826.9 rpm.
    expect(shaftRpmFromRoadSpeed(100, 700, 3.73)).toBeCloseTo(2826.9, 1);
  });

  it('from rev limit through top gear', () => {
    // Source: 6000 engine rpm through a 0.70 overdrive gives 8571 rpm at the shaft (common worked value).
    expect(shaftRpmFromEngine(6000, 0.7)).toBeCloseTo(8571.43, 2);
  });

  it('prefers road speed and falls back to the rev limit', () => {
    expect(driveshaftSpeed({ topSpeedKph: 100, tireDiameterMm: 700, axleRatio: 3.73, revLimitRpm: 6000, topGearRatio: 0.7 })?.basis).toBe('road-speed');
    expect(driveshaftSpeed({ topSpeedKph: 100, revLimitRpm: 6000, topGearRatio: 0.7 })).toEqual({ rpm: 6000 / 0.7, basis: 'rev-limit' });
    expect(driveshaftSpeed({ revLimitRpm: 6000 })).toBeNull();
  });
});
