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
  /** Maximum U-joint operating angle against driveshaft speed, interpolated between rows. */
  uJointMaxAngleBySpeed: Array<{ rpm: number; maxDeg: number }>;
  /** A U-joint figure within this much of a limit is reported `tight`. */
  uJointTightBandDeg: number;
  /** A shaft speed within this much of its allowed fraction of critical is reported `tight`. */
  shaftSpeedTightBandRpm: number;
  /** Pickup screen height above the sump floor. */
  pickupScreenMinGapMm: number;
  pickupScreenMaxGapMm: number;
  pickupScreenTightBandMm: number;
  /** The pan floor under the screen counts as the sump floor when within this of it. */
  pickupSumpToleranceMm: number;
  /** Fuel and cooling figures within this fraction of their requirement are reported `tight`. */
  fuelTightBandFraction: number;
  coolingTightBandFraction: number;
  /** How far the fuel regulator may sit from the engine's rated fuel pressure. */
  fuelPressureTolerancePsi: number;
  /** How far the installed cam timing may sit from the recommended total. */
  camTimingToleranceDeg: number;
  /** A stock belt within this much of either end of the tensioner's range is reported `tight`. */
  beltTightBandMm: number;
  minPulleyDiameterMm: number;
  /** Labor for shimming the pinion angle (axle wedges or adjustable arms). */
  pinionAngleShimHours: number;
  /** Labor for rerouting crossed coolant hoses. */
  coolantHoseRerouteHours: number;
  /** Envelope and mount thresholds of the geometric checks (fit engine, geometry owner). */
  /** Offset a mount boss may sit from its pad and still bolt up directly (slotted holes, rubber give). */
  mountDirectFitToleranceMm: number;
  /** Thickest spacer that may go under a transmission mount before the crossmember must be reworked. */
  transmissionMountSpacerMaxMm: number;
  /** Labor hours of the envelope checks' fabrication remedies. */
  crossmemberFabricationHours: number;
  steeringLinkageFabricationHours: number;
  axleBumpStopFabricationHours: number;
  hoodFabricationHours: number;
  radiatorSupportFabricationHours: number;
  firewallFabricationHours: number;
  tunnelFabricationHours: number;
  railClearanceFabricationHours: number;
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
  // Source: published driveline-maker guidance: 5000 rpm 3.2°, 4500 3.7°, 4000 4.2°, 3500 5.0°; the slower rows from memory.
  uJointMaxAngleBySpeed: [
    { rpm: 1500, maxDeg: 11.5 },
    { rpm: 2000, maxDeg: 8.7 },
    { rpm: 2500, maxDeg: 7.0 },
    { rpm: 3000, maxDeg: 5.8 },
    { rpm: 3500, maxDeg: 5.0 },
    { rpm: 4000, maxDeg: 4.2 },
    { rpm: 4500, maxDeg: 3.7 },
    { rpm: 5000, maxDeg: 3.2 },
  ],
  // Common practice (no published source): a quarter degree is about what an angle finder reads to.
  uJointTightBandDeg: 0.25,
  // Common practice (no published source).
  shaftSpeedTightBandRpm: 250,
  // Common practice (no published source): the pickup screen sits 1/4–3/8 in above the sump floor.
  pickupScreenMinGapMm: 6,
  pickupScreenMaxGapMm: 10,
  pickupScreenTightBandMm: 1,
  // Common practice (no published source).
  pickupSumpToleranceMm: 5,
  // Common practice (no published source).
  fuelTightBandFraction: 0.05,
  coolingTightBandFraction: 0.05,
  // Common practice (no published source): regulators are set within a few psi of the rated pressure.
  fuelPressureTolerancePsi: 3,
  // Common practice (no published source): a cam is degreed in to within a degree of its card.
  camTimingToleranceDeg: 1,
  // Common practice (no published source).
  beltTightBandMm: 5,
  // Source: ISO 9981:2020, PK profile pulleys: minimum effective diameter 45 mm.
  minPulleyDiameterMm: 45,
  // Common practice (no published source): set the pinion angle with wedge shims or adjustable arms.
  pinionAngleShimHours: 1.5,
  // Common practice (no published source): crossover hoses and brackets across the front of the engine.
  coolantHoseRerouteHours: 1,
  // Geometric checks (fit engine). Common practice (no published source): slotted mount holes and rubber isolators take up about 3 mm.
  mountDirectFitToleranceMm: 3,
  // Common practice (no published source): stacked spacers beyond an inch make a poor mount; rework the crossmember instead.
  transmissionMountSpacerMaxMm: 25.4,
  // Common practice (no published source): notch and plate, or cut out and re-weld, the front crossmember.
  crossmemberFabricationHours: 8,
  // Common practice (no published source): relocate or re-route the steering linkage, then align.
  steeringLinkageFabricationHours: 5,
  // Common practice (no published source): taller bump stops to limit axle up-travel.
  axleBumpStopFabricationHours: 2,
  // Common practice (no published source): fit a cowl or scoop hood, or a lower air-cleaner base.
  hoodFabricationHours: 4,
  // Common practice (no published source): move the radiator support forward.
  radiatorSupportFabricationHours: 4,
  // Common practice (no published source): recess the firewall behind the heads.
  firewallFabricationHours: 8,
  // Common practice (no published source): open up and re-skin the transmission tunnel.
  tunnelFabricationHours: 6,
  // Common practice (no published source): relieve and plate the frame rail, or re-route the exhaust.
  railClearanceFabricationHours: 4,
};

export function resolveFitSettings(overrides: Partial<FitSettings> = {}): FitSettings {
  return { ...DEFAULT_FIT_SETTINGS, ...overrides };
}
