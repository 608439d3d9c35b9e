import { driveshaftLine, slipYokeEngagement, transmissionOutputPoint } from './driveshaft-geometry';

describe('driveshaft geometry', () => {
  it('places the output on the crank line behind the bell face, adapter included', () => {
    // Derived: x = x_e − u·cosθ, z = z_e + u·sinθ with u = −(700 + 12.7) mm, θ = 3°.
    const out = transmissionOutputPoint({ setbackMm: 1000, heightMm: 600, tiltDeg: 3 }, 700, 12.7);
    const c = Math.cos((3 * Math.PI) / 180);
    const s = Math.sin((3 * Math.PI) / 180);
    expect(out.x).toBeCloseTo(1000 + 712.7 * c, 9);
    expect(out.z).toBeCloseTo(600 - 712.7 * s, 9);
  });

  it('measures the shaft centre to centre and its angle', () => {
    // Derived: a 3-4-5 triangle; a pinion above the output gives a negative drop and angle.
    expect(driveshaftLine({ x: 0, z: 400 }, { x: 1200, z: -500 })).toMatchObject({ lengthMm: 1500, dropMm: 900 });
    const up = driveshaftLine({ x: 0, z: 0 }, { x: 1000, z: 100 });
    expect(up.angleDeg).toBeLessThan(0);
  });

  it('slip-yoke engagement left at full droop', () => {
    // Derived: travel − pull-out − growth.
    expect(slipYokeEngagement({ requiredLengthMm: 1270, slipYokeTravelMm: 60 })).toEqual({ pullOutAtRideMm: 0, remainingMm: 60 });
    expect(slipYokeEngagement({ requiredLengthMm: 1270, slipYokeTravelMm: 60, existingLengthMm: 1250, suspensionGrowthMm: 15 })).toEqual({
      pullOutAtRideMm: 20,
      remainingMm: 25,
    });
  });
});
