import { formatFindingFigure, type FigureUnit, type Finding } from '@swapwright/shared';
import type { UnitsApi } from '@/hooks/use-units';

/** Plain words for the inputs a check names as missing; unknown paths show as they come. */
export const missingInputLabels: Record<string, string> = {
  accessoryDrive: 'Accessory drive',
  controller: 'Engine controller',
  oilPan: 'Oil pan',
  oilPickup: 'Oil pickup',
  oilPump: 'Oil pump',
  transmission: 'Transmission',
  driveshaft: 'Driveshaft',
  'oilPan.bottomProfile': 'Oil pan bottom outline',
  'chassis.hoodLine': 'Hood underside line',
  'chassis.radiatorCore': 'Radiator core position',
  'chassis.radiatorCore.ratedKw': 'Radiator rated heat rejection',
  'chassis.steeringBox': 'Steering box position',
  'chassis.railStations': 'Frame rail widths',
  'chassis.transmissionCrossmember': 'Transmission crossmember',
  'chassis.mountPads.left': 'Chassis left mount pad',
  'chassis.mountPads.right': 'Chassis right mount pad',
  'engine.mountBosses.left': 'Engine left mount boss',
  'engine.mountBosses.right': 'Engine right mount boss',
  'candidates.stockBeltLengthsMm': 'Stock belt lengths',
  'engine.rearProfile': 'Engine rear outline',
  'engine.topProfile': 'Engine top outline',
  'engine.fanFrontU': 'Fan position on the engine',
  'engine.widthFeatures or engine.accessoryDrives': 'Engine width features or accessory drives',
  'engine.injectorFlowLbh': 'Injector flow rating',
  'engine.injectorRatedPsi': 'Injector rated pressure',
  'goals.revLimitRpm': 'Planned rev limit',
  'goals.targetPowerKw': 'Target power',
  'transmission.topGearRatio': 'Transmission top gear ratio',
  'transmission.sideProfile': 'Transmission side outline',
};

export function missingInputLabel(path: string): string {
  return missingInputLabels[path] ?? path;
}

/** Attribute names of a part remedy's `requires`. */
export const requirementLabels: Record<string, string> = {
  advanceDeg: 'advance',
  atPsi: 'rated at',
  count: 'count',
  crankSignal: 'crank signal',
  designation: 'size',
  dipstickProvision: 'dipstick provision',
  electricFan: 'electric fan',
  enginePattern: 'engine bolt pattern',
  inlet: 'pump inlet',
  inletSide: 'inlet side',
  lengthMm: 'length',
  location: 'dipstick location',
  maxDepthBelowRailMm: 'depth below the pan rail at most',
  maxFrontFaceU: 'front face at most',
  maxHalfWidthMm: 'half width at most',
  maxLengthMm: 'length at most',
  minCriticalSpeedRpm: 'critical speed at least',
  minCylinders: 'cylinders at least',
  minFlowLbh: 'flow at least',
  minFlowLph: 'flow at least',
  minLengthMm: 'length at least',
  minPressurePsi: 'pressure at least',
  minRatedKw: 'rating at least',
  minSlipYokeEngagementMm: 'slip yoke engagement at least',
  minSpeedLimitRpm: 'speed limit at least',
  offsetXMm: 'offset',
  outletSide: 'outlet side',
  pressurePsi: 'pressure',
  railPattern: 'pan rail pattern',
  ribs: 'ribs',
  side: 'side',
  spacerMm: 'spacer',
  sumpPosition: 'sump position',
  transmissionPattern: 'transmission bolt pattern',
};

const suffixUnits: Array<[RegExp, FigureUnit]> = [
  [/Kw$/, 'kW'],
  [/Psi$/, 'psi'],
  [/Lbh$/, 'lb/h'],
  [/Lph$/, 'L/h'],
  [/Rpm$/, 'rpm'],
  [/Deg$/, 'deg'],
];

/** "inlet side left", "length at least 1,214 mm" for one attribute a part must have. */
export function describeRequirement(key: string, value: string | number | boolean, units: Pick<UnitsApi, 'formatLength' | 'system'>): string {
  const label = requirementLabels[key] ?? key;
  let shown: string;
  if (typeof value === 'boolean') shown = value ? 'yes' : 'no';
  else if (typeof value === 'number' && /Mm$/.test(key)) shown = units.formatLength(value);
  else if (typeof value === 'number') {
    // in the person's system, as every figure: a rating asked in kW reads in hp in inch mode
    const unit = suffixUnits.find(([re]) => re.test(key))?.[1];
    shown = unit ? formatFindingFigure(value, unit, units.system) : value.toLocaleString('en-US');
  } else shown = String(value);
  return `${label} ${shown}`;
}

/** For checks whose rule is a match rather than a figure: what the report found, in words. */
export function matchResult(finding: Pick<Finding, 'status' | 'limit'>): string {
  if (finding.status === 'unknown') return '—';
  return finding.status === 'fails' ? 'Does not match' : 'Matches';
}
