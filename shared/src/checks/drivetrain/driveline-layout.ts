import { driveshaftLine, transmissionOutputPoint, type DriveshaftLine } from '../../driveline/driveshaft-geometry';
import { uJointOperatingAngles, type OperatingAngles } from '../../driveline/operating-angles';
import { driveshaftSpeed, type ShaftSpeed } from '../../driveline/shaft-speed';
import type { BellhousingAdapterSpec, ChassisPoint, FitSpec, TransmissionSpec } from '../../types/fit-spec';

/** Adapters from the candidates that join this engine to this transmission, thinnest first. */
export function matchingBellhousingAdapters(spec: FitSpec): BellhousingAdapterSpec[] {
  const transmission = spec.transmission;
  if (!transmission) return [];
  return (spec.candidates?.bellhousingAdapters ?? [])
    .filter((adapter) => adapter.enginePattern === spec.engine.bellPattern && adapter.transmissionPattern === transmission.bellPattern)
    .sort((a, b) => a.thicknessMm - b.thicknessMm);
}

/** The adapter the layout assumes: none when the patterns match, else the thinnest matching candidate. */
export function chosenBellhousingAdapter(spec: FitSpec): BellhousingAdapterSpec | null {
  if (!spec.transmission || spec.transmission.bellPattern === spec.engine.bellPattern) return null;
  return matchingBellhousingAdapters(spec)[0] ?? null;
}

export interface DrivelineLayout {
  transmission: TransmissionSpec;
  adapter: BellhousingAdapterSpec | null;
  output: ChassisPoint;
  line: DriveshaftLine;
  angles: OperatingAngles;
  shaftSpeed: ShaftSpeed | null;
}

export type DrivelineLayoutResult = { ok: true; layout: DrivelineLayout } | { ok: false; missing: string[] };

/** The transmission output placed in the chassis, the driveshaft to the pinion, and the joint angles. */
export function drivelineLayout(spec: FitSpec): DrivelineLayoutResult {
  const transmission = spec.transmission;
  if (!transmission) return { ok: false, missing: ['transmission'] };
  const adapter = chosenBellhousingAdapter(spec);
  const output = transmissionOutputPoint(spec.placement, transmission.lengthToOutputMm, adapter?.thicknessMm ?? 0);
  const pinion = spec.chassis.pinion;
  const line = driveshaftLine(output, pinion);
  const angles = uJointOperatingAngles(spec.placement.tiltDeg, line.angleDeg, pinion.angleDeg);
  const shaftSpeed = driveshaftSpeed({ ...spec.goals, topGearRatio: transmission.topGearRatio });
  return { ok: true, layout: { transmission, adapter, output, line, angles, shaftSpeed } };
}

export function describeShaftSpeed(speed: ShaftSpeed): string {
  return speed.basis === 'road-speed'
    ? `${Math.round(speed.rpm)} rpm at the planned top speed`
    : `${Math.round(speed.rpm)} rpm at the rev limit in top gear`;
}
