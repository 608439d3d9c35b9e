/**
 * The complete input of one fit check: engine, oil system, transmission, chassis, placement, goals,
 * and the catalog candidates the engine may suggest as remedies. This is also the JSON body of the
 * what-if route. All lengths in millimetres, angles in degrees, power in kW, speeds in rpm.
 *
 * Frames (see docs/fit-spec.md):
 * - chassis, side view: x rearward from the front axle centerline, z up from the ground at ride height;
 *   y to the right of the vehicle centerline (front view).
 * - engine: origin where the crank centerline meets the bellhousing face; u forward along the crank,
 *   w up toward the deck, v to the right.
 */

import type {
  CamSignal,
  CrankSignal,
  DipstickLocation,
  DriveshaftMaterial,
  EngineLayout,
  FuelSystemKind,
  ObstacleKind,
  OilPumpDrive,
  BeltProfile,
  PickupMount,
  PulleyRole,
  PulleySide,
  SideName,
  SumpPosition,
  SwapUse,
  ThrottleKind,
} from './value-lists';

export type { SideName } from './value-lists';

export interface ChassisPoint {
  x: number;
  z: number;
}

export interface EnginePoint {
  u: number;
  w: number;
}

export interface EnginePoint3 {
  u: number;
  v: number;
  w: number;
}

export interface ChassisPoint3 {
  x: number;
  y: number;
  z: number;
}

/** Engine origin at chassis (x, z); tilt positive when the front is higher than the rear. */
export interface Placement {
  setbackMm: number;
  heightMm: number;
  tiltDeg: number;
}


export interface PulleySpec {
  id: string;
  role: PulleyRole;
  /** Centre in the front view of the engine: v right, w up, millimetres. */
  v: number;
  w: number;
  /** Effective diameter. */
  diameterMm: number;
  /** `grooved`: the ribbed side wraps the pulley; `back`: a smooth idler on the back of the belt. */
  side: PulleySide;
}

export interface AccessoryDriveSpec {
  id: string;
  name: string;
  /** Pulleys in the order the belt passes them, counter-clockwise seen from the front. */
  pulleys: PulleySpec[];
  /** How much belt length the tensioner can take up, shortest to longest belt it accepts, relative to the computed length. */
  tensionerTakeUpMm: { shorterMm: number; longerMm: number };
  /** Front-view extent of the drive, from the crank centerline. */
  halfWidthLeftMm: number;
  halfWidthRightMm: number;
  /** Extent along the crank: the drive occupies u from the block front to `frontFaceU`. */
  frontFaceU: number;
  /** Lowest and highest w of the drive's parts (front view). */
  wMin: number;
  wMax: number;
  ribs: number;
}

/** A solid seen from the front: a box in the engine frame, used for width checks against the frame rails. */
export interface WidthFeature {
  id: string;
  name: string;
  uFrom: number;
  uTo: number;
  wFrom: number;
  wTo: number;
  halfWidthLeftMm: number;
  halfWidthRightMm: number;
}

export interface EngineSpec {
  id: string;
  name: string;
  cylinders: number;
  layout: EngineLayout;
  displacementL?: number;
  ratedPowerKw?: number;
  weightKg?: number;
  /** Side profile of the top of the engine (intake, throttle body, air cleaner), engine frame, w > 0. */
  topProfile: EnginePoint[];
  /** Rear top corners of the heads and anything else at the back of the engine, engine frame. */
  rearProfile: EnginePoint[];
  /** The front face of the fan or the front-most pulley (u), and its w span. */
  fanFrontU: number;
  fanWFrom: number;
  fanWTo: number;
  /** Pan rail: where the pan bolts on, engine frame. */
  panRail: { w: number; uFrom: number; uTo: number; pattern: string };
  mountBosses: { left: EnginePoint3; right: EnginePoint3 };
  /** Width features: exhaust manifolds, heads, valve covers; the accessory drive is added from the chosen drive. */
  widthFeatures: WidthFeature[];
  accessoryDrives: AccessoryDriveSpec[];
  bellPattern: string;
  crankSignal: CrankSignal;
  camSignal: CamSignal;
  throttle: ThrottleKind;
  /** Oil pump driven at crank speed (true on these engines) or at half speed from the cam. */
  oilPumpDrive: OilPumpDrive;
  dipstickLocation: DipstickLocation;
  fuelPressurePsi: number;
  injectorFlowLbh?: number;
  injectorRatedPsi?: number;
  coolantOutletSide: SideName;
  coolantInletSide: SideName;
  cam: { advanceGroundDeg: number; recommendedTotalDeg: number };
}

export interface OilPanSpec {
  id: string;
  name: string;
  railPattern: string;
  /** Bottom outline in the engine frame, front to rear or rear to front, w < 0, closed along the pan rail. */
  bottomProfile: EnginePoint[];
  sumpPosition: SumpPosition;
  pickupMount: PickupMount;
  /** The pickup tube's foot position: u of the sump centre and the sump floor w. */
  sumpCenterU: number;
  sumpFloorW: number;
  dipstickProvision: DipstickLocation[];
  capacityL: number;
}

export interface OilPickupSpec {
  id: string;
  name: string;
  sumpPosition: OilPanSpec['sumpPosition'];
  mount: OilPanSpec['pickupMount'];
  pumpInlet: string;
  /** Screen position below the pan rail along the crank; must sit over the sump and 6–10 mm above its floor. */
  screenU: number;
  screenW: number;
}

export interface OilPumpSpec {
  id: string;
  name: string;
  inlet: string;
  speedLimitRpm: number;
  highVolume: boolean;
}

export interface TransmissionSpec {
  id: string;
  name: string;
  bellPattern: string;
  /** Bell face to the slip-yoke U-joint centre at nominal engagement, along the crank line. */
  lengthToOutputMm: number;
  /** Transmission mount pad, engine frame (u negative: behind the bell face). */
  mountPoint: EnginePoint;
  /** Bellhousing and case as a side outline in the engine frame (u ≤ 0), for the tunnel check. */
  sideProfile: EnginePoint[];
  slipYokeTravelMm: number;
  topGearRatio: number;
  weightKg?: number;
}

export interface ChassisObstacle {
  id: string;
  name: string;
  kind: ObstacleKind;
  /** Closed outline, chassis frame side view. */
  outline: ChassisPoint[];
}

export interface RailStation {
  x: number;
  insideWidthMm: number;
  /** The rails' top and bottom at this station: widths only matter where a feature overlaps this height. */
  zBottom: number;
  zTop: number;
}

export interface ChassisSpec {
  id: string;
  name: string;
  wheelbaseMm: number;
  rideHeightMm?: number;
  /**
   * The ground under the wheels when the truck does not sit at the catalog's ride height (measured ride heights):
   * its z under the front axle (x 0) and under the rear axle (x = wheelbase), straight between them. The frame keeps
   * its coordinates; the ground moves. Absent: the ground is z = 0.
   */
  groundLine?: { zAtFrontAxleMm: number; zAtRearAxleMm: number };
  obstacles: ChassisObstacle[];
  /** Underside of the hood, side view, front to rear. */
  hoodLine: ChassisPoint[];
  /** Rear face of the radiator core (x), and its z span. */
  radiatorCore: { x: number; zFrom: number; zTo: number; ratedKw: number; inletSide: SideName; outletSide: SideName };
  railStations: RailStation[];
  /** Steering box in the front view: its inboard face (y, negative on the left) over an x and z span. */
  steeringBox?: { side: SideName; inboardY: number; xFrom: number; xTo: number; zFrom: number; zTo: number };
  mountPads: { left: ChassisPoint3; right: ChassisPoint3 };
  transmissionCrossmember: { x: number; z: number; adjustableXMm: number };
  pinion: { x: number; z: number; angleDeg: number };
  fuelSystem: { kind: FuelSystemKind; pumpFlowLph: number; pumpRatedPsi: number; regulatorPsi: number };
  pedal: ThrottleKind;
}

export interface EngineControllerSpec {
  id: string;
  name: string;
  crankSignals: CrankSignal[];
  camSignals: CamSignal[];
  throttles: ThrottleKind[];
  maxCylinders: number;
}

export interface DriveshaftSpec {
  outerDiameterMm: number;
  wallMm: number;
  /** Steel by default; the elastic modulus is only used by the first-principles cross-check. */
  material: DriveshaftMaterial;
  /** An existing shaft to reuse, U-joint centre to centre; absent when a new shaft is cut to length. */
  lengthMm?: number;
  /** Growth of the output-to-pinion distance from ride height to full droop, taken by the slip yoke. */
  suspensionGrowthMm?: number;
}

export interface MountAdapterSpec {
  id: string;
  name: string;
  /** The largest offset it bridges, chassis frame, per axis. */
  maxDxMm: number;
  maxDzMm: number;
  maxDyMm: number;
  price?: number;
}

export interface BellhousingAdapterSpec {
  id: string;
  name: string;
  enginePattern: string;
  transmissionPattern: string;
  thicknessMm: number;
}

/** A stock ribbed (PK) serpentine belt; `designation` is ribs × profile × effective length, e.g. `6PK1225`. */
export interface SerpentineBeltSpec {
  id: string;
  name: string;
  ribs: number;
  profile: BeltProfile;
  effectiveLengthMm: number;
  designation: string;
  stockOnHand?: number;
}

export interface SwapGoals {
  use: SwapUse;
  targetPowerKw: number;
  /** Power held for long periods (towing, climbing); the radiator is sized for this. */
  continuousPowerKw?: number;
  /** The planned rev limit; without it the checks that read it (oil pump speed, driveshaft speed) are not checked. */
  revLimitRpm?: number;
  topSpeedKph?: number;
  tireDiameterMm?: number;
  axleRatio?: number;
}

export interface FitSpec {
  engine: EngineSpec;
  accessoryDriveId?: string;
  /** The mount adapter chosen for both sides, looked up in `candidates.mountAdapters` by id. */
  mountAdapterId?: string;
  oilPan?: OilPanSpec;
  oilPickup?: OilPickupSpec;
  oilPump?: OilPumpSpec;
  transmission?: TransmissionSpec;
  chassis: ChassisSpec;
  controller?: EngineControllerSpec;
  driveshaft?: DriveshaftSpec;
  /** Timing-set advance: degrees the cam is set advanced at the timing set (0 = marks aligned). */
  timingSetAdvanceDeg?: number;
  placement: Placement;
  goals: SwapGoals;
  /** Catalog parts the engine may name in remedies, evaluated in the same placement. */
  candidates?: {
    oilPans?: OilPanSpec[];
    oilPickups?: OilPickupSpec[];
    oilPumps?: OilPumpSpec[];
    mountAdapters?: MountAdapterSpec[];
    bellhousingAdapters?: BellhousingAdapterSpec[];
    controllers?: EngineControllerSpec[];
    stockBeltLengthsMm?: number[];
  };
}
