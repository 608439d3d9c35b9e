/**
 * Open (uncrossed) belt on two pulleys. Source: Encyclopaedia Britannica, 11th ed. (1911), "Mechanics" §59,
 * eqs. 32A/32B; Shigley's Mechanical Engineering Design, flat-belt geometry.
 * D and d are the effective diameters (large, small), C the centre distance; any one length unit.
 */
export interface TwoPulleyBelt {
  lengthExact: number;
  lengthApprox: number;
  /** Wrap on the small pulley, π − 2φ, and on the large one, π + 2φ (radians). */
  wrapSmallRad: number;
  wrapLargeRad: number;
}

function assertTwoPulley(largeDiameter: number, smallDiameter: number, centreDistance: number): void {
  if (!(largeDiameter > 0 && smallDiameter > 0 && centreDistance > 0)) {
    throw new RangeError('Pulley diameters and centre distance must be positive.');
  }
  if (Math.abs(largeDiameter - smallDiameter) >= 2 * centreDistance) {
    throw new RangeError('The centre distance is too short for these pulleys: one would sit inside the other.');
  }
}

/** L = 2C·cos φ + π(D + d)/2 + φ(D − d), φ = asin((D − d)/(2C)). */
export function openBeltLengthExact(largeDiameter: number, smallDiameter: number, centreDistance: number): number {
  assertTwoPulley(largeDiameter, smallDiameter, centreDistance);
  const phi = Math.asin((largeDiameter - smallDiameter) / (2 * centreDistance));
  return 2 * centreDistance * Math.cos(phi) + (Math.PI * (largeDiameter + smallDiameter)) / 2 + phi * (largeDiameter - smallDiameter);
}

/** L ≈ 2C + π(D + d)/2 + (D − d)²/(4C). */
export function openBeltLengthApprox(largeDiameter: number, smallDiameter: number, centreDistance: number): number {
  assertTwoPulley(largeDiameter, smallDiameter, centreDistance);
  const diff = largeDiameter - smallDiameter;
  return 2 * centreDistance + (Math.PI * (largeDiameter + smallDiameter)) / 2 + (diff * diff) / (4 * centreDistance);
}

export function twoPulleyBelt(diameterA: number, diameterB: number, centreDistance: number): TwoPulleyBelt {
  const large = Math.max(diameterA, diameterB);
  const small = Math.min(diameterA, diameterB);
  const lengthExact = openBeltLengthExact(large, small, centreDistance);
  const phi = Math.asin((large - small) / (2 * centreDistance));
  return {
    lengthExact,
    lengthApprox: openBeltLengthApprox(large, small, centreDistance),
    wrapSmallRad: Math.PI - 2 * phi,
    wrapLargeRad: Math.PI + 2 * phi,
  };
}
