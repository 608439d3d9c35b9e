import { inchesToMm, mmToInches } from '../units/length';
import { placeEnginePoint } from './placement';

describe('placeEnginePoint', () => {
  it('level: x = x_e − u, z = z_e + w', () => {
    expect(placeEnginePoint({ u: 300, w: -100 }, { setbackMm: 1000, heightMm: 500, tiltDeg: 0 })).toEqual({ x: 700, z: 400 });
  });

  it('derived: rotating 3° about the front mounts drops a point 30 in behind the pivot by 1.5701 in', () => {
    // Derived: rotating 3° about the front mounts drops a point 30 in behind the pivot by 30·sin 3° = 1.5701 in (common practice: install tilt 2–4°, typically 3°).
    // Derived: drop = 30 in · sin 3° = 30 · 0.0523360 = 1.570080 in (the pivot stays put; the point is on the crank line).
    const pivotU = 600; // front mounts
    const pointU = pivotU - inchesToMm(30);
    const level = { setbackMm: 1000, heightMm: 500, tiltDeg: 0 };
    // Tilt about the pivot: choose the new origin so the pivot keeps its chassis position.
    const sin = Math.sin((3 * Math.PI) / 180);
    const cos = Math.cos((3 * Math.PI) / 180);
    const tilted = { setbackMm: level.setbackMm - pivotU + pivotU * cos, heightMm: level.heightMm - pivotU * sin, tiltDeg: 3 };
    const pivotBefore = placeEnginePoint({ u: pivotU, w: 0 }, level);
    const pivotAfter = placeEnginePoint({ u: pivotU, w: 0 }, tilted);
    expect(pivotAfter.x).toBeCloseTo(pivotBefore.x, 9);
    expect(pivotAfter.z).toBeCloseTo(pivotBefore.z, 9);
    const drop = placeEnginePoint({ u: pointU, w: 0 }, level).z - placeEnginePoint({ u: pointU, w: 0 }, tilted).z;
    expect(mmToInches(drop)).toBeCloseTo(1.5701, 4);
  });

  it('tilt 3° follows x = x_e − u·cosθ + w·sinθ, z = z_e + u·sinθ + w·cosθ', () => {
    // Derived: (500, −200) at (1000, 500, 3°): x = 1000 − 499.315 − 10.467 = 490.218, z = 500 + 26.168 − 199.726 = 326.442.
    const p = placeEnginePoint({ u: 500, w: -200 }, { setbackMm: 1000, heightMm: 500, tiltDeg: 3 });
    expect(p.x).toBeCloseTo(490.218, 3);
    expect(p.z).toBeCloseTo(326.442, 3);
  });
});
