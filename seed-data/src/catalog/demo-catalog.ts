import {
  DEMO_CENTER_SUMP_PAN,
  DEMO_CENTER_SUMP_PICKUP,
  DEMO_DEEP_REAR_SUMP_PAN,
  DEMO_FIT_SPEC,
  DEMO_REAR_SUMP_PAN,
  DEMO_REAR_SUMP_PICKUP,
  DEMO_STOCK_PAN,
  DEMO_STOCK_PICKUP,
} from '@swapwright/shared/fixtures';
import {
  formatBeltDesignation,
  type BellhousingAdapterSpec,
  type ChassisSpec,
  type EngineControllerSpec,
  type EngineSpec,
  type MountAdapterSpec,
  type OilPanSpec,
  type OilPickupSpec,
  type OilPumpSpec,
  type Placement,
  type SerpentineBeltSpec,
  type TransmissionSpec,
} from '@swapwright/shared';
import { DEMO_CATALOG_IDS as IDS } from './demo-catalog-ids';

/**
 * The demo shop's catalog: invented parts with realistic invented dimensions (millimetres, degrees).
 * The first engine, chassis, transmission, pans and pickups take their figures from the shared demo fit
 * spec, so the demo project tells the same story as the fit engine's own fixture: the stock front-sump pan
 * sits into the front crossmember, the rear-sump swap pan clears it.
 */

const BASE = DEMO_FIT_SPEC;

/** Pattern codes of the invented engine families. */
const KESTREL_RAIL = 'KS-V8';
const KESTREL_BELL = 'KB-1';
const KESTREL_INLET = 'KS-19';
const HARROW_RAIL = 'HW-6';
const HARROW_BELL = 'HB-2';
const HARROW_INLET = 'HW-12';
const DUNMORE_BELL = 'DM-5';

export const DEMO_ACCESSORY_DRIVE_IDS = { truck: 'drive-truck', compact: 'drive-compact' } as const;

const kestrelDrives = BASE.engine.accessoryDrives.map((drive, index) => ({
  ...drive,
  id: index === 0 ? DEMO_ACCESSORY_DRIVE_IDS.truck : DEMO_ACCESSORY_DRIVE_IDS.compact,
  name: index === 0 ? 'Kestrel truck accessory drive' : 'Kestrel compact accessory drive',
}));

const kestrel53: EngineSpec = {
  ...BASE.engine,
  id: IDS.engines.kestrel53,
  name: 'Kestrel 5.3 V8 (truck)',
  displacementL: 5.3,
  panRail: { ...BASE.engine.panRail, pattern: KESTREL_RAIL },
  bellPattern: KESTREL_BELL,
  accessoryDrives: kestrelDrives,
};

const kestrel62: EngineSpec = {
  ...kestrel53,
  id: IDS.engines.kestrel62,
  name: 'Kestrel 6.2 V8 (tow)',
  displacementL: 6.2,
  ratedPowerKw: 310,
  weightKg: 228,
  injectorFlowLbh: 36,
  // The taller intake of the 6.2.
  topProfile: BASE.engine.topProfile.map((point) => ({ u: point.u, w: point.w + 15 })),
};

const harrow40: EngineSpec = {
  id: IDS.engines.harrow40,
  name: 'Harrow 4.0 inline six',
  cylinders: 6,
  layout: 'inline',
  displacementL: 4.0,
  ratedPowerKw: 145,
  weightKg: 205,
  topProfile: [
    { u: 760, w: 280 },
    { u: 700, w: 460 },
    { u: 520, w: 560 },
    { u: 300, w: 575 },
    { u: 80, w: 540 },
    { u: 0, w: 500 },
  ],
  rearProfile: [
    { u: 20, w: 200 },
    { u: -10, w: 380 },
    { u: 0, w: 520 },
  ],
  fanFrontU: 900,
  fanWFrom: -100,
  fanWTo: 360,
  panRail: { w: -70, uFrom: 20, uTo: 720, pattern: HARROW_RAIL },
  mountBosses: { left: { u: 430, v: -225, w: -30 }, right: { u: 430, v: 225, w: -30 } },
  widthFeatures: [
    // Inline six: intake on the left, exhaust manifold on the right.
    { id: 'exhaust-manifold', name: 'Exhaust manifold', uFrom: 60, uTo: 680, wFrom: 40, wTo: 260, halfWidthLeftMm: 0, halfWidthRightMm: 320 },
    { id: 'intake', name: 'Intake manifold', uFrom: 80, uTo: 660, wFrom: 200, wTo: 420, halfWidthLeftMm: 290, halfWidthRightMm: 0 },
    { id: 'head', name: 'Cylinder head and valve cover', uFrom: 20, uTo: 720, wFrom: 250, wTo: 540, halfWidthLeftMm: 170, halfWidthRightMm: 170 },
  ],
  accessoryDrives: [
    {
      id: 'drive-serpentine',
      name: 'Harrow serpentine drive',
      pulleys: [
        { id: 'crank', role: 'crank', v: 0, w: 0, diameterMm: 165, side: 'grooved' },
        { id: 'water-pump', role: 'water-pump', v: 0, w: 260, diameterMm: 110, side: 'grooved' },
        { id: 'alternator', role: 'alternator', v: -180, w: 300, diameterMm: 62, side: 'grooved' },
      ],
      tensionerTakeUpMm: { shorterMm: 10, longerMm: 16 },
      halfWidthLeftMm: 300,
      halfWidthRightMm: 250,
      frontFaceU: 870,
      wMin: -110,
      wMax: 360,
      ribs: 6,
    },
  ],
  bellPattern: HARROW_BELL,
  crankSignal: '60-2',
  camSignal: '1x',
  throttle: 'cable',
  oilPumpDrive: 'crank',
  dipstickLocation: 'block-left',
  fuelPressurePsi: 43.5,
  injectorFlowLbh: 19,
  injectorRatedPsi: 43.5,
  coolantOutletSide: 'right',
  coolantInletSide: 'left',
  cam: { advanceGroundDeg: 2, recommendedTotalDeg: 2 },
};

const kestrelPans: OilPanSpec[] = [
  { ...DEMO_STOCK_PAN, id: IDS.oilPans.kestrelStockFront, name: 'Kestrel 5.3 stock front-sump pan', railPattern: KESTREL_RAIL },
  { ...DEMO_REAR_SUMP_PAN, id: IDS.oilPans.kestrelRearSwap, name: 'Trailhand TR-4410 rear-sump swap pan', railPattern: KESTREL_RAIL },
  { ...DEMO_DEEP_REAR_SUMP_PAN, id: IDS.oilPans.kestrelDeepRear, name: 'Trailhand TR-4480 deep rear-sump pan', railPattern: KESTREL_RAIL },
  { ...DEMO_CENTER_SUMP_PAN, id: IDS.oilPans.kestrelCenterTow, name: 'Kestrel centre-sump tow pan', railPattern: KESTREL_RAIL },
];

const harrowPan: OilPanSpec = {
  id: IDS.oilPans.harrowStock,
  name: 'Harrow 4.0 stock rear-sump pan',
  railPattern: HARROW_RAIL,
  bottomProfile: [
    { u: 720, w: -70 },
    { u: 700, w: -110 },
    { u: 420, w: -120 },
    { u: 380, w: -230 },
    { u: 60, w: -230 },
    { u: 30, w: -70 },
  ],
  sumpPosition: 'rear',
  pickupMount: 'block-bolted',
  sumpCenterU: 220,
  sumpFloorW: -230,
  dipstickProvision: ['block-left'],
  capacityL: 5.7,
};

const pickups: OilPickupSpec[] = [
  { ...DEMO_STOCK_PICKUP, id: IDS.oilPickups.kestrelFront, name: 'Kestrel stock front-sump pickup', pumpInlet: KESTREL_INLET },
  { ...DEMO_REAR_SUMP_PICKUP, id: IDS.oilPickups.kestrelRear, name: 'Trailhand TR-4411 rear-sump pickup', pumpInlet: KESTREL_INLET },
  { ...DEMO_CENTER_SUMP_PICKUP, id: IDS.oilPickups.kestrelCenter, name: 'Kestrel centre-sump pickup', pumpInlet: KESTREL_INLET },
];

const pumps: OilPumpSpec[] = [
  { ...BASE.oilPump!, id: IDS.oilPumps.kestrelStock, name: 'Kestrel stock oil pump', inlet: KESTREL_INLET },
  {
    ...BASE.candidates!.oilPumps![0],
    id: IDS.oilPumps.kestrelHighVolume,
    name: 'Trailhand high-volume pump (Kestrel)',
    inlet: KESTREL_INLET,
  },
  { id: IDS.oilPumps.harrowStock, name: 'Harrow 4.0 stock oil pump', inlet: HARROW_INLET, speedLimitRpm: 6000, highVolume: false },
];

/** A chassis of the same layout, moved up (dz), with rails wider (dWidth) and the hood higher (dHood). */
function variantOf(
  base: ChassisSpec,
  change: { id: string; name: string; wheelbaseMm: number; dz: number; dWidth: number; dHood: number; pinionX: number },
): ChassisSpec {
  const lift = <T extends { z: number }>(point: T): T => ({ ...point, z: point.z + change.dz });
  return {
    ...base,
    id: change.id,
    name: change.name,
    wheelbaseMm: change.wheelbaseMm,
    obstacles: base.obstacles.map((obstacle) => ({ ...obstacle, outline: obstacle.outline.map(lift) })),
    hoodLine: base.hoodLine.map((point) => ({ x: point.x, z: point.z + change.dz + change.dHood })),
    radiatorCore: { ...base.radiatorCore, zFrom: base.radiatorCore.zFrom + change.dz, zTo: base.radiatorCore.zTo + change.dz },
    railStations: base.railStations.map((station) => ({
      ...station,
      insideWidthMm: station.insideWidthMm + change.dWidth,
      zBottom: station.zBottom + change.dz,
      zTop: station.zTop + change.dz,
    })),
    steeringBox: base.steeringBox && {
      ...base.steeringBox,
      inboardY: base.steeringBox.inboardY - change.dWidth / 2,
      zFrom: base.steeringBox.zFrom + change.dz,
      zTo: base.steeringBox.zTo + change.dz,
    },
    mountPads: {
      left: { ...base.mountPads.left, y: base.mountPads.left.y - change.dWidth / 2, z: base.mountPads.left.z + change.dz },
      right: { ...base.mountPads.right, y: base.mountPads.right.y + change.dWidth / 2, z: base.mountPads.right.z + change.dz },
    },
    transmissionCrossmember: { ...base.transmissionCrossmember, z: base.transmissionCrossmember.z + change.dz },
    pinion: { ...base.pinion, x: change.pinionX, z: base.pinion.z + change.dz },
  };
}

const ridgeback78: ChassisSpec = { ...BASE.chassis, id: IDS.chassis.ridgeback78, name: 'Harlan Ridgeback 1978 half-ton pickup' };

export interface DemoChassis {
  spec: ChassisSpec;
  /** Where the stock engine sat. */
  defaultPlacement: Placement | null;
}

const chassis: DemoChassis[] = [
  { spec: ridgeback78, defaultPlacement: { setbackMm: 640, heightMm: 520, tiltDeg: 3 } },
  {
    spec: {
      ...variantOf(BASE.chassis, {
        id: IDS.chassis.stag84,
        name: 'Pellam Stag 1984 three-quarter-ton 4x4',
        wheelbaseMm: 3330,
        dz: 70,
        dWidth: 40,
        dHood: 30,
        pinionX: 3120,
      }),
      fuelSystem: { kind: 'carburetor', pumpFlowLph: 150, pumpRatedPsi: 8, regulatorPsi: 0 },
    },
    defaultPlacement: { setbackMm: 700, heightMm: 590, tiltDeg: 3 },
  },
  {
    spec: variantOf(BASE.chassis, {
      id: IDS.chassis.tallgrass66,
      name: 'Tallgrass Meadowline 1966 wagon',
      wheelbaseMm: 2790,
      dz: -40,
      dWidth: -50,
      dHood: -60,
      pinionX: 2590,
    }),
    defaultPlacement: { setbackMm: 600, heightMm: 470, tiltDeg: 2.5 },
  },
];

const transmissions: TransmissionSpec[] = [
  { ...BASE.transmission!, id: IDS.transmissions.marlow45, name: 'Marlow MT-45 four-speed automatic', bellPattern: KESTREL_BELL },
  {
    ...BASE.transmission!,
    id: IDS.transmissions.marlow65,
    name: 'Marlow MT-65 six-speed automatic',
    bellPattern: KESTREL_BELL,
    lengthToOutputMm: 1120,
    mountPoint: { u: -820, w: -125 },
    sideProfile: BASE.transmission!.sideProfile.map((point) => ({ u: Math.round(point.u * 1.07), w: point.w })),
    slipYokeTravelMm: 95,
    topGearRatio: 0.67,
    weightKg: 105,
  },
  {
    id: IDS.transmissions.dunmore5,
    name: 'Dunmore DM-5 five-speed manual',
    bellPattern: DUNMORE_BELL,
    lengthToOutputMm: 980,
    mountPoint: { u: -700, w: -110 },
    sideProfile: [
      { u: 0, w: 230 },
      { u: -240, w: 200 },
      { u: -320, w: 120 },
      { u: -940, w: 80 },
      { u: -940, w: -80 },
      { u: -320, w: -130 },
      { u: -240, w: -200 },
      { u: 0, w: -230 },
    ],
    slipYokeTravelMm: 80,
    topGearRatio: 0.78,
    weightKg: 62,
  },
];

const controllers: EngineControllerSpec[] = [
  { ...BASE.controller!, id: IDS.controllers.tessaryT8, name: 'Tessary T8 standalone controller' },
  {
    id: IDS.controllers.tessaryT6,
    name: 'Tessary T6 six-cylinder controller',
    crankSignals: ['60-2', '36-1'],
    camSignals: ['1x'],
    throttles: ['cable'],
    maxCylinders: 6,
  },
  {
    id: IDS.controllers.quillStandalone,
    name: 'Quillon Q-12 universal controller',
    crankSignals: ['58x', '60-2', '36-1', '24x'],
    camSignals: ['4x', '1x'],
    throttles: ['cable', 'electronic'],
    maxCylinders: 8,
  },
];

// Named by what they are, without the demo shop's name: they are also the sample catalog other shops start from.
const mountAdapterNames = ['MP-40 mount plates', 'MP-60 drop mount plates', 'MP-90 heavy mount kit'];
const mountAdapterIds = [IDS.mountAdapters.plates40, IDS.mountAdapters.drop60, IDS.mountAdapters.heavy90];
const mountAdapters: MountAdapterSpec[] = BASE.candidates!.mountAdapters!.map((adapter, index) => ({
  ...adapter,
  id: mountAdapterIds[index],
  name: mountAdapterNames[index],
}));

const bellhousingAdapters: BellhousingAdapterSpec[] = [
  {
    id: IDS.bellhousingAdapters.kb1ToDm5,
    name: 'KB-1 to DM-5 bellhousing adapter plate',
    enginePattern: KESTREL_BELL,
    transmissionPattern: DUNMORE_BELL,
    thicknessMm: 12.7,
  },
];

/**
 * Stock 6-rib belts around the demo drives' computed lengths (serpentineLength: Kestrel truck ≈ 1223 mm, Kestrel
 * compact ≈ 1118 mm, Harrow ≈ 1162 mm), so each drive has one inside its tensioner's take-up; 6PK1195 and 6PK1260
 * sit just outside the truck drive's range, and the 5-rib belt is the wrong width for every demo drive.
 */
function belt(id: string, ribs: number, effectiveLengthMm: number, stockOnHand: number): SerpentineBeltSpec {
  const designation = formatBeltDesignation(ribs, effectiveLengthMm);
  return { id, name: `Ironbark stock ${designation}`, ribs, profile: 'PK', effectiveLengthMm, designation, stockOnHand };
}

const belts: SerpentineBeltSpec[] = [
  belt(IDS.belts.sixPk1120, 6, 1120, 3),
  belt(IDS.belts.sixPk1165, 6, 1165, 2),
  belt(IDS.belts.sixPk1195, 6, 1195, 1),
  belt(IDS.belts.sixPk1225, 6, 1225, 4),
  belt(IDS.belts.sixPk1260, 6, 1260, 2),
  belt(IDS.belts.fivePk1223, 5, 1223, 1),
];

export interface DemoCatalog {
  engines: EngineSpec[];
  oilPans: OilPanSpec[];
  oilPickups: OilPickupSpec[];
  oilPumps: OilPumpSpec[];
  chassis: DemoChassis[];
  transmissions: TransmissionSpec[];
  controllers: EngineControllerSpec[];
  mountAdapters: MountAdapterSpec[];
  bellhousingAdapters: BellhousingAdapterSpec[];
  belts: SerpentineBeltSpec[];
}

export const DEMO_CATALOG: DemoCatalog = {
  engines: [kestrel53, kestrel62, harrow40],
  oilPans: [...kestrelPans, harrowPan],
  oilPickups: pickups,
  oilPumps: pumps,
  chassis,
  transmissions,
  controllers,
  mountAdapters,
  bellhousingAdapters,
  belts,
};
