import { describeAttribute, renderText, textParts, type Finding } from '@swapwright/shared';
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
  'chassis.fuelSystem.pumpFlowLph': "Chassis fuel pump's rated flow: not given, enter it under the chassis model's fuel system",
  'chassis.fuelSystem.pumpRatedPsi': "Chassis fuel pump's rated pressure: not given, enter it under the chassis model's fuel system",
  'chassis.fuelSystem.regulatorPsi': "Chassis fuel regulator pressure: not given, enter it under the chassis model's fuel system",
  'goals.revLimitRpm': 'Planned rev limit',
  'goals.targetPowerKw': 'Target power',
  'transmission.topGearRatio': 'Transmission top gear ratio',
  'transmission.sideProfile': 'Transmission side outline',
};

export function missingInputLabel(path: string): string {
  return missingInputLabels[path] ?? path;
}

/**
 * "inlet on the left", "length at least 47.80 in" for one attribute a part must have: shared's one table of
 * attribute words (the plan and the API say the same), its figures in the person's unit system.
 */
export function describeRequirement(key: string, value: string | number | boolean, units: Pick<UnitsApi, 'system'>): string {
  return renderText(textParts(describeAttribute(key, value)), units.system);
}

/** For checks whose rule is a match rather than a figure: what the report found, in words. */
export function matchResult(finding: Pick<Finding, 'status' | 'limit'>): string {
  if (finding.status === 'unknown') return '—';
  return finding.status === 'fails' ? 'Does not match' : 'Matches';
}
