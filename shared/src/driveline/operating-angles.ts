/**
 * U-joint operating angles of a two-joint driveshaft, side view. Every line's angle is measured the same way:
 * positive when the line falls toward the rear (the front end higher). The transmission output line follows the
 * crank, so its angle is the installed tilt; the pinion angle is positive when the pinion nose points up.
 * Source: published driveline-maker guidance: front = |trans − shaft|, rear = |pinion − shaft|.
 */
export interface OperatingAngles {
  transmissionDeg: number;
  shaftDeg: number;
  pinionDeg: number;
  frontDeg: number;
  rearDeg: number;
  differenceDeg: number;
}

export function uJointOperatingAngles(transmissionDeg: number, shaftDeg: number, pinionDeg: number): OperatingAngles {
  const frontDeg = Math.abs(transmissionDeg - shaftDeg);
  const rearDeg = Math.abs(pinionDeg - shaftDeg);
  return { transmissionDeg, shaftDeg, pinionDeg, frontDeg, rearDeg, differenceDeg: Math.abs(frontDeg - rearDeg) };
}

export interface SpeedAngleLimit {
  rpm: number;
  maxDeg: number;
}

/**
 * Maximum operating angle against shaft speed, interpolated linearly in the table. Below the slowest row the
 * slowest row's angle holds; above the fastest row the last two rows' slope continues (the limit keeps falling),
 * never below `floorDeg`.
 */
export function maxOperatingAngleAtSpeed(shaftRpm: number, table: readonly SpeedAngleLimit[], floorDeg = 0): number {
  if (table.length === 0) throw new RangeError('The speed/angle table is empty.');
  const rows = [...table].sort((a, b) => a.rpm - b.rpm);
  if (rows.length === 1 || shaftRpm <= rows[0].rpm) return rows[0].maxDeg;
  let lower = rows[rows.length - 2];
  let upper = rows[rows.length - 1];
  for (let i = 1; i < rows.length; i += 1) {
    if (shaftRpm <= rows[i].rpm) {
      lower = rows[i - 1];
      upper = rows[i];
      break;
    }
  }
  const fraction = (shaftRpm - lower.rpm) / (upper.rpm - lower.rpm);
  return Math.max(floorDeg, lower.maxDeg + fraction * (upper.maxDeg - lower.maxDeg));
}
