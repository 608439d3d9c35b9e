import type {
  AccessoryDriveSpec,
  BellhousingAdapterSpec,
  ChassisSpec,
  EngineControllerSpec,
  EngineSpec,
  MountAdapterSpec,
  OilPanSpec,
  OilPickupSpec,
  OilPumpSpec,
  SerpentineBeltSpec,
  TransmissionSpec,
} from '@swapwright/shared';
import {
  BELT_PROFILES,
  CAM_SIGNALS,
  CRANK_SIGNALS,
  DIPSTICK_LOCATIONS,
  DRIVESHAFT_MATERIALS,
  ENGINE_LAYOUTS,
  FUEL_SYSTEM_KINDS,
  OBSTACLE_KINDS,
  OIL_PUMP_DRIVES,
  PICKUP_MOUNTS,
  PULLEY_ROLES,
  PULLEY_SIDES,
  SIDES,
  SUMP_POSITIONS,
  THROTTLES,
} from '@swapwright/shared';
import { IsNegative, IsPositive } from 'class-validator';
import { WithinOutlineLength } from '../../common/validation/form-values';
import {
  Flag,
  IntIn,
  ListOf,
  Nested,
  NestedList,
  PointList,
  NumberIn,
  OneOf,
  OptionalIntIn,
  OptionalNested,
  OptionalNumberIn,
  Text,
} from './spec-validators';

/**
 * Class-validator mirrors of the shared part specs (shared/src/types/fit-spec.ts). Millimetres and degrees.
 * Engine frame: u forward from the bellhousing face, w up from the crank centerline, v to the right.
 * Chassis frame: x rearward from the front axle centerline, z up from the ground, y to the right.
 * Ranges are generous physical bounds that catch unit mistakes (inches typed as millimetres, metres as mm).
 */

const U = 3000;
const W = 1500;
const X_MIN = -3000;
const X_MAX = 8000;
const Z_MIN = -500;
const Z_MAX = 3000;
const Y = 1500;

export const BELT_RIBS = { min: 3, max: 12 } as const;

// ---------------------------------------------------------------- points

export class EnginePointDto {
  @NumberIn(-U, U, 'Forward of the bellhousing face') u: number;
  @NumberIn(-W, W, 'Above the crank centerline') w: number;
}

/** A point of the top profile: at or above the crank centerline. */
export class EngineTopPointDto {
  @NumberIn(-U, U) u: number;
  @NumberIn(0, W, 'At or above the crank centerline (w ≥ 0)') w: number;
}

/** A point of the pan's bottom outline: always below the crank centerline. */
export class PanPointDto {
  @NumberIn(-U, U) u: number;

  @NumberIn(-W, 0, 'Below the crank centerline (w < 0)')
  @IsNegative({ message: 'w must be negative: a pan outline lies below the crank centerline' })
  w: number;
}

/** A point of the transmission: at or behind the bellhousing face. */
export class TransmissionPointDto {
  @NumberIn(-U, 0, 'At or behind the bellhousing face (u ≤ 0)') u: number;
  @NumberIn(-W, W) w: number;
}

export class EnginePoint3Dto {
  @NumberIn(-U, U) u: number;
  @NumberIn(-W, W, 'Right of the crank centerline') v: number;
  @NumberIn(-W, W) w: number;
}

export class ChassisPointDto {
  @NumberIn(X_MIN, X_MAX, 'Rearward of the front axle centerline') x: number;
  @NumberIn(Z_MIN, Z_MAX, 'Above the ground at ride height') z: number;
}

export class ChassisPoint3Dto {
  @NumberIn(X_MIN, X_MAX) x: number;
  @NumberIn(-Y, Y, 'Right of the vehicle centerline') y: number;
  @NumberIn(Z_MIN, Z_MAX) z: number;
}

// ---------------------------------------------------------------- engine

export class PulleySpecDto {
  @Text(40) id: string;
  @OneOf(PULLEY_ROLES) role: (typeof PULLEY_ROLES)[number];
  @NumberIn(-W, W, 'Centre, front view, right of the crank') v: number;
  @NumberIn(-W, W, 'Centre, front view, above the crank') w: number;
  @NumberIn(20, 600) diameterMm: number;
  @OneOf(PULLEY_SIDES) side: (typeof PULLEY_SIDES)[number];
}

export class TensionerTakeUpDto {
  @NumberIn(0, 200) shorterMm: number;
  @NumberIn(0, 200) longerMm: number;
}

export class AccessoryDriveSpecDto implements AccessoryDriveSpec {
  @Text(40) id: string;
  @Text() name: string;
  @NestedList(() => PulleySpecDto, 2, 12, 'In belt order, counter-clockwise seen from the front') pulleys: PulleySpecDto[];
  @Nested(() => TensionerTakeUpDto) tensionerTakeUpMm: TensionerTakeUpDto;
  @NumberIn(0, W) halfWidthLeftMm: number;
  @NumberIn(0, W) halfWidthRightMm: number;
  @NumberIn(-U, U) frontFaceU: number;
  @NumberIn(-W, W) wMin: number;
  @NumberIn(-W, W) wMax: number;
  @IntIn(3, 12) ribs: number;
}

export class WidthFeatureDto {
  @Text(40) id: string;
  @Text() name: string;
  @NumberIn(-U, U) uFrom: number;
  @NumberIn(-U, U) uTo: number;
  @NumberIn(-W, W) wFrom: number;
  @NumberIn(-W, W) wTo: number;
  @NumberIn(0, W) halfWidthLeftMm: number;
  @NumberIn(0, W) halfWidthRightMm: number;
}

export class PanRailDto {
  @NumberIn(-W, 0, 'Pan rail height, at or below the crank centerline') w: number;
  @NumberIn(-U, U) uFrom: number;
  @NumberIn(-U, U) uTo: number;
  @Text(40, 'Rail pattern code; pans with the same code bolt on') pattern: string;
}

export class MountBossesDto {
  @Nested(() => EnginePoint3Dto) left: EnginePoint3Dto;
  @Nested(() => EnginePoint3Dto) right: EnginePoint3Dto;
}

export class CamSpecDto {
  @NumberIn(-20, 20) advanceGroundDeg: number;
  @NumberIn(-20, 20) recommendedTotalDeg: number;
}

export class EngineSpecDto implements EngineSpec {
  @Text(64) id: string;
  @Text() name: string;
  @IntIn(1, 16) cylinders: number;
  @OneOf(ENGINE_LAYOUTS) layout: (typeof ENGINE_LAYOUTS)[number];
  @OptionalNumberIn(0.3, 15) displacementL?: number;
  @OptionalNumberIn(1, 2000) ratedPowerKw?: number;
  @OptionalNumberIn(20, 1500) weightKg?: number;
  @PointList(() => EngineTopPointDto, 2, 200, 'Side profile of the top of the engine, w ≥ 0') topProfile: EngineTopPointDto[];
  @PointList(() => EnginePointDto, 1, 200, 'Rear of the heads and anything at the back of the engine') rearProfile: EnginePointDto[];
  @NumberIn(-U, U) fanFrontU: number;
  @NumberIn(-W, W) fanWFrom: number;
  @NumberIn(-W, W) fanWTo: number;
  @Nested(() => PanRailDto) panRail: PanRailDto;
  @Nested(() => MountBossesDto) mountBosses: MountBossesDto;
  @NestedList(() => WidthFeatureDto, 0, 40) widthFeatures: WidthFeatureDto[];
  @NestedList(() => AccessoryDriveSpecDto, 0, 10) accessoryDrives: AccessoryDriveSpecDto[];
  @Text(40, 'Bellhousing pattern code, e.g. KB-1') bellPattern: string;
  @OneOf(CRANK_SIGNALS, 'Crank trigger pattern, e.g. 60-2') crankSignal: (typeof CRANK_SIGNALS)[number];
  @OneOf(CAM_SIGNALS, 'Cam sensor pattern, pulses per cam turn') camSignal: (typeof CAM_SIGNALS)[number];
  @OneOf(THROTTLES) throttle: (typeof THROTTLES)[number];
  @OneOf(OIL_PUMP_DRIVES) oilPumpDrive: (typeof OIL_PUMP_DRIVES)[number];
  @OneOf(DIPSTICK_LOCATIONS) dipstickLocation: (typeof DIPSTICK_LOCATIONS)[number];
  @NumberIn(0, 3000) fuelPressurePsi: number;
  @OptionalNumberIn(1, 400) injectorFlowLbh?: number;
  @OptionalNumberIn(1, 3000) injectorRatedPsi?: number;
  @OneOf(SIDES) coolantOutletSide: (typeof SIDES)[number];
  @OneOf(SIDES) coolantInletSide: (typeof SIDES)[number];
  @Nested(() => CamSpecDto) cam: CamSpecDto;
}

// ---------------------------------------------------------------- oiling

export class OilPanSpecDto implements OilPanSpec {
  @Text(64) id: string;
  @Text() name: string;
  @Text(40) railPattern: string;
  @PointList(() => PanPointDto, 3, 200, 'Bottom outline, engine frame, every point below the crank (w < 0)') bottomProfile: PanPointDto[];
  @OneOf(SUMP_POSITIONS) sumpPosition: (typeof SUMP_POSITIONS)[number];
  @OneOf(PICKUP_MOUNTS) pickupMount: (typeof PICKUP_MOUNTS)[number];
  @NumberIn(-U, U, 'Forward of the bellhousing face (u > 0), within the bottom outline')
  @IsPositive({ message: 'sumpCenterU must be more than 0: the sump centre lies forward of the bellhousing face (u grows forward)' })
  @WithinOutlineLength('bottomProfile', 'the sump is part of the pan')
  sumpCenterU: number;
  @NumberIn(-W, 0) @IsNegative({ message: 'sumpFloorW must be negative: the sump floor lies below the crank' }) sumpFloorW: number;
  @ListOf(DIPSTICK_LOCATIONS, 0, 4) dipstickProvision: Array<(typeof DIPSTICK_LOCATIONS)[number]>;
  @NumberIn(0.5, 40) capacityL: number;
}

export class OilPickupSpecDto implements OilPickupSpec {
  @Text(64) id: string;
  @Text() name: string;
  @OneOf(SUMP_POSITIONS) sumpPosition: (typeof SUMP_POSITIONS)[number];
  @OneOf(PICKUP_MOUNTS) mount: (typeof PICKUP_MOUNTS)[number];
  @Text(40) pumpInlet: string;
  @NumberIn(-U, U) screenU: number;
  @NumberIn(-W, 0) @IsNegative({ message: 'screenW must be negative: the screen sits below the crank' }) screenW: number;
}

export class OilPumpSpecDto implements OilPumpSpec {
  @Text(64) id: string;
  @Text() name: string;
  @Text(40) inlet: string;
  @NumberIn(1000, 15000) speedLimitRpm: number;
  @Flag() highVolume: boolean;
}

// ---------------------------------------------------------------- transmission

export class TransmissionSpecDto implements TransmissionSpec {
  @Text(64) id: string;
  @Text() name: string;
  @Text(40) bellPattern: string;
  @NumberIn(100, 3000, 'Bell face to the slip-yoke U-joint centre') lengthToOutputMm: number;
  @Nested(() => TransmissionPointDto) mountPoint: TransmissionPointDto;
  @PointList(() => TransmissionPointDto, 3, 200, 'Side outline, u ≤ 0') sideProfile: TransmissionPointDto[];
  @NumberIn(0, 400) slipYokeTravelMm: number;
  @NumberIn(0.3, 5) topGearRatio: number;
  @OptionalNumberIn(10, 1000) weightKg?: number;
}

// ---------------------------------------------------------------- chassis

export class ChassisObstacleDto {
  @Text(40) id: string;
  @Text() name: string;
  @OneOf(OBSTACLE_KINDS) kind: (typeof OBSTACLE_KINDS)[number];
  @PointList(() => ChassisPointDto, 3, 200, 'Closed outline, chassis frame side view') outline: ChassisPointDto[];
}

export class RailStationDto {
  @NumberIn(X_MIN, X_MAX) x: number;
  @NumberIn(200, 2500) insideWidthMm: number;
  @NumberIn(Z_MIN, Z_MAX) zBottom: number;
  @NumberIn(Z_MIN, Z_MAX) zTop: number;
}

export class RadiatorCoreDto {
  @NumberIn(X_MIN, X_MAX, 'Rear face of the core') x: number;
  @NumberIn(Z_MIN, Z_MAX) zFrom: number;
  @NumberIn(Z_MIN, Z_MAX) zTo: number;
  @NumberIn(1, 2000) ratedKw: number;
  @OneOf(SIDES) inletSide: (typeof SIDES)[number];
  @OneOf(SIDES) outletSide: (typeof SIDES)[number];
}

export class SteeringBoxDto {
  @OneOf(SIDES) side: (typeof SIDES)[number];
  @NumberIn(-Y, Y, 'Inboard face, negative on the left') inboardY: number;
  @NumberIn(X_MIN, X_MAX) xFrom: number;
  @NumberIn(X_MIN, X_MAX) xTo: number;
  @NumberIn(Z_MIN, Z_MAX) zFrom: number;
  @NumberIn(Z_MIN, Z_MAX) zTo: number;
}

export class MountPadsDto {
  @Nested(() => ChassisPoint3Dto) left: ChassisPoint3Dto;
  @Nested(() => ChassisPoint3Dto) right: ChassisPoint3Dto;
}

export class TransmissionCrossmemberDto {
  @NumberIn(X_MIN, X_MAX) x: number;
  @NumberIn(Z_MIN, Z_MAX) z: number;
  @NumberIn(0, 500) adjustableXMm: number;
}

export class PinionDto {
  @NumberIn(X_MIN, X_MAX) x: number;
  @NumberIn(Z_MIN, Z_MAX) z: number;
  @NumberIn(-20, 20) angleDeg: number;
}

export class FuelSystemDto {
  @OneOf(FUEL_SYSTEM_KINDS) kind: (typeof FUEL_SYSTEM_KINDS)[number];
  @NumberIn(0, 2000) pumpFlowLph: number;
  @NumberIn(0, 3000) pumpRatedPsi: number;
  @NumberIn(0, 3000) regulatorPsi: number;
}

export class ChassisSpecDto implements ChassisSpec {
  @Text(64) id: string;
  @Text() name: string;
  @NumberIn(1000, 8000) wheelbaseMm: number;
  @OptionalNumberIn(0, 1500) rideHeightMm?: number;
  @NestedList(() => ChassisObstacleDto, 0, 60) obstacles: ChassisObstacleDto[];
  @PointList(() => ChassisPointDto, 2, 200, 'Underside of the hood, front to rear') hoodLine: ChassisPointDto[];
  @Nested(() => RadiatorCoreDto) radiatorCore: RadiatorCoreDto;
  @NestedList(() => RailStationDto, 1, 60) railStations: RailStationDto[];
  @OptionalNested(() => SteeringBoxDto) steeringBox?: SteeringBoxDto;
  @Nested(() => MountPadsDto) mountPads: MountPadsDto;
  @Nested(() => TransmissionCrossmemberDto) transmissionCrossmember: TransmissionCrossmemberDto;
  @Nested(() => PinionDto) pinion: PinionDto;
  @Nested(() => FuelSystemDto) fuelSystem: FuelSystemDto;
  @OneOf(THROTTLES) pedal: (typeof THROTTLES)[number];
}

// ---------------------------------------------------------------- management, adapters

export class EngineControllerSpecDto implements EngineControllerSpec {
  @Text(64) id: string;
  @Text() name: string;
  @ListOf(CRANK_SIGNALS, 1, 20, 'Crank trigger patterns it reads, e.g. 60-2') crankSignals: Array<(typeof CRANK_SIGNALS)[number]>;
  @ListOf(CAM_SIGNALS, 0, 20, 'Cam sensor patterns it reads') camSignals: Array<(typeof CAM_SIGNALS)[number]>;
  @ListOf(THROTTLES, 1, 2) throttles: Array<(typeof THROTTLES)[number]>;
  @IntIn(1, 16) maxCylinders: number;
}

export class MountAdapterSpecDto implements MountAdapterSpec {
  @Text(64) id: string;
  @Text() name: string;
  @NumberIn(0, 300) maxDxMm: number;
  @NumberIn(0, 300) maxDzMm: number;
  @NumberIn(0, 300) maxDyMm: number;
  @OptionalNumberIn(0, 1_000_000) price?: number;
}

export class BellhousingAdapterSpecDto implements BellhousingAdapterSpec {
  @Text(64) id: string;
  @Text() name: string;
  @Text(40) enginePattern: string;
  @Text(40) transmissionPattern: string;
  @NumberIn(0, 150) thicknessMm: number;
}

// ---------------------------------------------------------------- belts

export class SerpentineBeltSpecDto implements SerpentineBeltSpec {
  @Text(64) id: string;
  @Text() name: string;
  @IntIn(BELT_RIBS.min, BELT_RIBS.max) ribs: number;
  @OneOf(BELT_PROFILES) profile: (typeof BELT_PROFILES)[number];
  @NumberIn(400, 3000, 'Effective (outside) length, ISO 9982') effectiveLengthMm: number;
  @Text(16, 'Ribs × profile × effective length, e.g. 6PK1225; computed by the server') designation: string;
  @OptionalIntIn(0, 100_000, 'Belts on the shelf') stockOnHand?: number;
}

// ---------------------------------------------------------------- placement

/** Engine origin in the chassis frame: x rearward of the front axle, z above ground, tilt front-up positive. */
export class PlacementDto {
  @NumberIn(-1500, 5000) setbackMm: number;
  @NumberIn(0, 2500) heightMm: number;
  @NumberIn(-20, 20) tiltDeg: number;
}
