/**
 * Thresholds of the rule set. A shop can override any of them; each default says where it comes from.
 * Lengths in millimetres, angles in degrees.
 */
export interface FitSettings {
  /** Clearance between the pan and anything below it (crossmember, steering, axle at full bump). */
  minGapBelowMm: number;
  /** A passing figure within this much of its limit is reported `tight`. */
  tightBandMm: number;
  minGroundClearanceMm: number;
  minHoodGapMm: number;
  minFanToCoreMm: number;
  minFirewallGapMm: number;
  minRailGapMm: number;
  minSteeringBoxGapMm: number;
  /** Mount offset a bolt-on adapter may bridge before fabrication is needed. */
  mountFabricationHours: number;
  transmissionCrossmemberFabricationHours: number;
  /** Installed tilt the fit window works at unless told otherwise. */
  defaultTiltDeg: number;
  uJointMinDeg: number;
  uJointMaxDeg: number;
  uJointMaxDifferenceDeg: number;
  /** Shaft speed may be at most this fraction of the critical speed. */
  criticalSpeedFraction: number;
  slipYokeMinEngagementMm: number;
  bsfcLbPerHpH: number;
  injectorMaxDuty: number;
  fuelPumpMargin: number;
  fuelDensityLbPerGal: number;
  fuelSpecificGravity: number;
  /** Heat to coolant as a fraction of brake power at full throttle. */
  heatToCoolantFraction: number;
  coolingMargin: number;
  /** Rev limit above which a stock crank-driven oil pump is flagged, where the pump gives no limit of its own. */
  stockOilPumpLimitRpm: number;
  oilPumpTightBandRpm: number;
}

export const DEFAULT_FIT_SETTINGS: FitSettings = {
  // Common practice (no published source): half an inch, since the engine rocks on its mounts under torque.
  minGapBelowMm: 12.7,
  // Common practice (no published source).
  tightBandMm: 6,
  // Common practice (no published source): about 4 in under the lowest point of a street truck.
  minGroundClearanceMm: 100,
  // Common practice (no published source): half an inch for hood flex and engine rock.
  minHoodGapMm: 12.7,
  // Common practice (no published source): an inch between fan and core.
  minFanToCoreMm: 25.4,
  // Common practice (no published source).
  minFirewallGapMm: 12.7,
  // Common practice (no published source): hot exhaust and moving accessories near the rails.
  minRailGapMm: 12.7,
  minSteeringBoxGapMm: 12.7,
  // Common practice (no published source): cut, fit and weld one pair of mount brackets.
  mountFabricationHours: 6,
  transmissionCrossmemberFabricationHours: 4,
  // Common practice (no published source): 3° down at the rear, pinion parallel.
  defaultTiltDeg: 3,
  // Source: published driveline-maker guidance: each joint at least 1/2°, front and rear within 1°, at most 3° for vibration-free running.
  uJointMinDeg: 0.5,
  uJointMaxDeg: 3,
  uJointMaxDifferenceDeg: 1,
  // Common practice (no published source): keep shaft speed at or under 75 % of critical.
  criticalSpeedFraction: 0.75,
  // Common practice (no published source): an inch of spline engagement left at full extension.
  slipYokeMinEngagementMm: 25.4,
  // Source: published EFI sizing note, BSFC 0.50–0.55 lb/hp·h at maximum power for naturally aspirated petrol engines.
  bsfcLbPerHpH: 0.5,
  // Common practice (no published source): 80 % maximum injector duty.
  injectorMaxDuty: 0.8,
  // Common practice (no published source): 20–30 % pump flow margin.
  fuelPumpMargin: 0.25,
  // Source: US DOE Alternative Fuels Data Center, gasoline 6.0–6.5 lb/gal at 60 °F.
  fuelDensityLbPerGal: 6.0,
  // Source: US DOE Alternative Fuels Data Center, gasoline specific gravity 0.72–0.78.
  fuelSpecificGravity: 0.74,
  // Common practice (no published source): heat to coolant about equal to brake power at full throttle.
  heatToCoolantFraction: 1.0,
  // Common practice (no published source).
  coolingMargin: 0.1,
  // Common practice (no published source): a stock pump driven at crank speed is flagged above about 6,000 rpm.
  stockOilPumpLimitRpm: 6000,
  oilPumpTightBandRpm: 250,
};

export function resolveFitSettings(overrides: Partial<FitSettings> = {}): FitSettings {
  return { ...DEFAULT_FIT_SETTINGS, ...overrides };
}
