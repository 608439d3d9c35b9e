import { DEFAULT_FIT_SETTINGS } from '../settings/fit-settings';
import { maxOperatingAngleAtSpeed, uJointOperatingAngles } from './operating-angles';

const TABLE = DEFAULT_FIT_SETTINGS.uJointMaxAngleBySpeed;

describe('U-joint operating angles', () => {
  it('4.0 in drop over a 50.0 in shaft, transmission 3° down at the rear, pinion parallel', () => {
    // Source: published driveline-maker guidance (front = |trans − shaft|, rear = |pinion − shaft|); Derived: asin(4/50) = 4.5886°.
    const shaftDeg = (Math.asin(4 / 50) * 180) / Math.PI;
    expect(shaftDeg).toBeCloseTo(4.5886, 4);
    const angles = uJointOperatingAngles(3, shaftDeg, 3);
    expect(angles.frontDeg).toBeCloseTo(1.5886, 4);
    expect(angles.rearDeg).toBeCloseTo(1.5886, 4);
    expect(angles.differenceDeg).toBeCloseTo(0, 12);
  });

  it('keeps signs consistent when the shaft is flatter than the transmission', () => {
    // Derived: trans 3°, shaft 1°, pinion 0° → front 2°, rear 1°, difference 1°.
    expect(uJointOperatingAngles(3, 1, 0)).toMatchObject({ frontDeg: 2, rearDeg: 1, differenceDeg: 1 });
  });
});

describe('maximum operating angle against shaft speed', () => {
  it.each([
    [5000, 3.2],
    [4500, 3.7],
    [4000, 4.2],
    [3500, 5.0],
  ])('%d rpm → %d°', (rpm, deg) => {
    // Source: published driveline-maker guidance, maximum operating angle by driveshaft speed.
    expect(maxOperatingAngleAtSpeed(rpm, TABLE)).toBeCloseTo(deg, 12);
  });

  it.each([
    [3000, 5.8],
    [2500, 7.0],
    [2000, 8.7],
    [1500, 11.5],
  ])('%d rpm → %d°', (rpm, deg) => {
    // From memory: the slower rows of the same guidance.
    expect(maxOperatingAngleAtSpeed(rpm, TABLE)).toBeCloseTo(deg, 12);
  });

  it('interpolates between rows and continues the last slope past the table', () => {
    // Derived: linear between 4000 (4.2°) and 4500 (3.7°); past 5000 at −1.0° per 1000 rpm, floored.
    expect(maxOperatingAngleAtSpeed(4250, TABLE)).toBeCloseTo(3.95, 12);
    expect(maxOperatingAngleAtSpeed(5500, TABLE)).toBeCloseTo(2.7, 12);
    expect(maxOperatingAngleAtSpeed(1000, TABLE)).toBe(11.5);
    expect(maxOperatingAngleAtSpeed(20000, TABLE, 0.5)).toBe(0.5);
    expect(() => maxOperatingAngleAtSpeed(1000, [])).toThrow(RangeError);
  });
});
