import {
  CAM_SIGNALS,
  CRANK_SIGNALS,
  DIPSTICK_LOCATIONS,
  ENGINE_LAYOUTS,
  OBSTACLE_KINDS,
  OIL_PUMP_DRIVES,
  PICKUP_MOUNTS,
  SIDES,
  SUMP_POSITIONS,
  THROTTLES,
} from '@swapwright/shared';
import type { CatalogKind } from '../types';

export type FieldType = 'length' | 'number' | 'text' | 'select' | 'multi' | 'tags' | 'boolean';

export type ScalarField = {
  name: string;
  label: string;
  type: FieldType;
  required?: boolean;
  options?: Array<{ value: string; label: string }>;
  min?: number;
  max?: number;
  /** For plain numbers: the unit shown after the value. */
  suffix?: string;
  help?: string;
};

export type OutlineField = {
  name: string;
  label: string;
  axes: ['u', 'w'] | ['x', 'z'];
  closed: boolean;
  minPoints: number;
  help: string;
  /** An axis every point must keep below zero (the API refuses the rest). */
  negativeAxis?: 'w' | 'z';
};

export type JsonField = { name: string; label: string; shape: 'object' | 'array'; help: string; required?: boolean };

export type KindDefinition = {
  kind: CatalogKind;
  label: string;
  singular: string;
  fields: ScalarField[];
  outlines: OutlineField[];
  /** chassis only: obstacles edited as named outlines */
  obstacles?: boolean;
  json: JsonField[];
  /** Columns of the table besides the name. */
  columns: string[];
  /** Headings of columns that are not form fields (figures the server computes). */
  columnLabels?: Record<string, string>;
  /** The spec a new entry starts from. */
  defaults: Record<string, unknown>;
  /** Shows the drawing of where its figures are measured from. */
  measuredFrom?: MeasuredFrom;
};

/** Readable names for the enum values the catalog stores. */
const optionLabels: Record<string, string> = {
  front: 'Front',
  center: 'Center',
  rear: 'Rear',
  dual: 'Dual',
  'pump-bolted': 'Bolted to the pump',
  'block-bolted': 'Bolted to the block',
  'press-in': 'Pressed into the pump',
  'block-left': 'Block, left',
  'block-right': 'Block, right',
  'pan-left': 'Pan, left',
  'pan-right': 'Pan, right',
  left: 'Left',
  right: 'Right',
  cable: 'Cable',
  electronic: 'Electronic',
  crossmember: 'Crossmember',
  'steering-linkage': 'Steering linkage',
  'axle-at-bump': 'Axle at full bump',
  'differential-at-bump': 'Differential at full bump',
  firewall: 'Firewall',
  tunnel: 'Tunnel',
  other: 'Other',
  inline: 'Inline',
  v: 'V',
  crank: 'crank speed',
  cam: 'cam speed',
};
const opts = (values: readonly string[]) => values.map((v) => ({ value: v, label: optionLabels[v] ?? v }));
const sumpPositions = opts(SUMP_POSITIONS);
const pickupMounts = opts(PICKUP_MOUNTS);
const dipsticks = opts(DIPSTICK_LOCATIONS);
const sides = opts(SIDES);
const throttles = opts(THROTTLES);
const crankSignals = opts(CRANK_SIGNALS);
const camSignals = opts(CAM_SIGNALS);

/** Where the figures of a form are measured from; the form shows the matching drawing. */
export type MeasuredFrom = 'engine' | 'chassis';

/** Plain names of the measuring directions (the stored keys stay u/w for the engine and x/z for the chassis). */
const axisLabels: Record<string, string> = { u: 'Forward', w: 'Height', x: 'Back', z: 'Height' };
export const axisLabel = (axis: string): string => axisLabels[axis] ?? axis;

const ENGINE_FRAME =
  'Measured from the crank centerline at the bellhousing face: forward along the crank, height above the crank centerline (below it is negative).';
const CHASSIS_FRAME = 'Measured from the front axle centerline on the ground at ride height: back toward the rear, height above the ground.';

export const kindDefinitions: Record<CatalogKind, KindDefinition> = {
  engines: {
    kind: 'engines',
    label: 'Engines',
    singular: 'engine',
    measuredFrom: 'engine',
    fields: [
      { name: 'cylinders', label: 'Cylinders', type: 'number', required: true, min: 1, max: 16 },
      { name: 'layout', label: 'Layout', type: 'select', required: true, options: opts(ENGINE_LAYOUTS) },
      { name: 'displacementL', label: 'Displacement', type: 'number', suffix: 'L', min: 0.5, max: 15 },
      { name: 'ratedPowerKw', label: 'Rated power', type: 'number', suffix: 'kW', min: 1, max: 2000 },
      { name: 'weightKg', label: 'Weight', type: 'number', suffix: 'kg', min: 1, max: 2000 },
      { name: 'fanFrontU', label: 'Fan or front pulley face, forward', type: 'length', required: true, min: 1 },
      { name: 'fanWFrom', label: 'Fan, lowest edge height', type: 'length', required: true },
      { name: 'fanWTo', label: 'Fan, highest edge height', type: 'length', required: true },
      { name: 'bellPattern', label: 'Bellhousing pattern', type: 'text', required: true },
      { name: 'crankSignal', label: 'Crank signal', type: 'select', required: true, options: crankSignals },
      { name: 'camSignal', label: 'Cam signal', type: 'select', required: true, options: camSignals },
      { name: 'throttle', label: 'Throttle', type: 'select', required: true, options: throttles },
      { name: 'oilPumpDrive', label: 'Oil pump turns at', type: 'select', required: true, options: opts(OIL_PUMP_DRIVES) },
      { name: 'dipstickLocation', label: 'Dipstick', type: 'select', required: true, options: dipsticks },
      { name: 'fuelPressurePsi', label: 'Fuel pressure', type: 'number', suffix: 'psi', required: true, min: 0, max: 120 },
      { name: 'injectorFlowLbh', label: 'Injector flow', type: 'number', suffix: 'lb/h', min: 0, max: 300 },
      { name: 'injectorRatedPsi', label: 'Injector rated at', type: 'number', suffix: 'psi', min: 0, max: 120 },
      { name: 'coolantOutletSide', label: 'Coolant outlet side', type: 'select', required: true, options: sides },
      { name: 'coolantInletSide', label: 'Coolant inlet side', type: 'select', required: true, options: sides },
    ],
    outlines: [
      { name: 'topProfile', label: 'Top profile (intake, throttle body, air cleaner)', axes: ['u', 'w'], closed: false, minPoints: 2, help: ENGINE_FRAME },
      { name: 'rearProfile', label: 'Rear profile (heads, rear of the engine)', axes: ['u', 'w'], closed: false, minPoints: 1, help: ENGINE_FRAME },
    ],
    json: [
      { name: 'panRail', label: 'Pan rail', shape: 'object', required: true, help: '{ "w": -75, "uFrom": 20, "uTo": 600, "pattern": "…" } in mm' },
      { name: 'mountBosses', label: 'Mount bosses', shape: 'object', required: true, help: '{ "left": { "u", "v", "w" }, "right": { … } } in mm' },
      { name: 'widthFeatures', label: 'Width features', shape: 'array', required: true, help: 'Boxes seen from the front (exhaust, heads), mm' },
      { name: 'accessoryDrives', label: 'Accessory drives', shape: 'array', required: true, help: 'Pulleys, widths and extent of each drive, mm' },
      { name: 'cam', label: 'Cam', shape: 'object', required: true, help: '{ "advanceGroundDeg": 4, "recommendedTotalDeg": 4 }' },
    ],
    columns: ['cylinders', 'layout', 'displacementL', 'bellPattern'],
    defaults: {
      cylinders: 8,
      layout: 'v',
      topProfile: [],
      rearProfile: [],
      widthFeatures: [],
      accessoryDrives: [],
      panRail: { w: -75, uFrom: 0, uTo: 600, pattern: '' },
      mountBosses: { left: { u: 0, v: -250, w: 0 }, right: { u: 0, v: 250, w: 0 } },
      cam: { advanceGroundDeg: 0, recommendedTotalDeg: 0 },
      throttle: 'electronic',
      oilPumpDrive: 'crank',
      dipstickLocation: 'block-left',
      coolantOutletSide: 'left',
      coolantInletSide: 'right',
    },
  },
  'oil-pans': {
    kind: 'oil-pans',
    label: 'Oil pans',
    singular: 'oil pan',
    measuredFrom: 'engine',
    fields: [
      { name: 'railPattern', label: 'Rail pattern', type: 'text', required: true },
      { name: 'sumpPosition', label: 'Sump', type: 'select', required: true, options: sumpPositions },
      { name: 'pickupMount', label: 'Pickup mounting', type: 'select', required: true, options: pickupMounts },
      { name: 'sumpCenterU', label: 'Sump centre, forward', type: 'length', required: true, min: 1, help: 'Ahead of the bellhousing face.' },
      { name: 'sumpFloorW', label: 'Sump floor height', type: 'length', required: true, max: 0, help: 'Below the crank: negative.' },
      { name: 'capacityL', label: 'Capacity', type: 'number', suffix: 'L', required: true, min: 0.5, max: 30 },
      { name: 'dipstickProvision', label: 'Dipstick provision', type: 'multi', options: dipsticks },
    ],
    outlines: [
      {
        name: 'bottomProfile',
        label: 'Bottom profile',
        axes: ['u', 'w'],
        closed: true,
        minPoints: 3,
        negativeAxis: 'w',
        help: `${ENGINE_FRAME} Points below the crank (w negative), front to rear; the outline closes along the pan rail.`,
      },
    ],
    json: [],
    columns: ['sumpPosition', 'railPattern', 'capacityL'],
    defaults: { sumpPosition: 'rear', pickupMount: 'pump-bolted', dipstickProvision: [], bottomProfile: [] },
  },
  'oil-pickups': {
    kind: 'oil-pickups',
    label: 'Oil pickups',
    singular: 'oil pickup',
    measuredFrom: 'engine',
    fields: [
      { name: 'sumpPosition', label: 'Sump', type: 'select', required: true, options: sumpPositions },
      { name: 'mount', label: 'Mounting', type: 'select', required: true, options: pickupMounts },
      { name: 'pumpInlet', label: 'Pump inlet', type: 'text', required: true },
      { name: 'screenU', label: 'Pickup screen, forward', type: 'length', required: true, min: 1, help: 'Ahead of the bellhousing face.' },
      { name: 'screenW', label: 'Pickup screen height', type: 'length', required: true, max: 0, help: 'Below the crank: negative.' },
    ],
    outlines: [],
    json: [],
    columns: ['sumpPosition', 'mount', 'pumpInlet'],
    defaults: { sumpPosition: 'rear', mount: 'pump-bolted' },
  },
  'oil-pumps': {
    kind: 'oil-pumps',
    label: 'Oil pumps',
    singular: 'oil pump',
    fields: [
      { name: 'inlet', label: 'Inlet', type: 'text', required: true },
      { name: 'speedLimitRpm', label: 'Speed limit', type: 'number', suffix: 'rpm', required: true, min: 0, max: 15000, help: '0 when the maker gives none.' },
      { name: 'highVolume', label: 'High volume', type: 'boolean' },
    ],
    outlines: [],
    json: [],
    columns: ['inlet', 'speedLimitRpm', 'highVolume'],
    defaults: { highVolume: false, speedLimitRpm: 0 },
  },
  transmissions: {
    kind: 'transmissions',
    label: 'Transmissions',
    singular: 'transmission',
    measuredFrom: 'engine',
    fields: [
      { name: 'bellPattern', label: 'Bellhousing pattern', type: 'text', required: true },
      { name: 'lengthToOutputMm', label: 'Bell face to output U-joint', type: 'length', required: true, min: 1 },
      { name: 'slipYokeTravelMm', label: 'Slip-yoke travel', type: 'length', required: true, min: 0 },
      { name: 'topGearRatio', label: 'Top gear ratio', type: 'number', required: true, min: 0.3, max: 3 },
      { name: 'weightKg', label: 'Weight', type: 'number', suffix: 'kg', min: 1, max: 1000 },
    ],
    outlines: [
      { name: 'sideProfile', label: 'Side outline (bellhousing and case)', axes: ['u', 'w'], closed: true, minPoints: 0, help: `${ENGINE_FRAME} u is negative behind the bell face.` },
    ],
    json: [{ name: 'mountPoint', label: 'Mount pad', shape: 'object', required: true, help: '{ "u": -760, "w": -120 } in mm' }],
    columns: ['bellPattern', 'topGearRatio'],
    defaults: { sideProfile: [], mountPoint: { u: -700, w: -100 } },
  },
  chassis: {
    kind: 'chassis',
    label: 'Chassis',
    singular: 'chassis',
    measuredFrom: 'chassis',
    fields: [
      { name: 'wheelbaseMm', label: 'Wheelbase', type: 'length', required: true, min: 1 },
      { name: 'rideHeightMm', label: 'Ride height reference', type: 'length' },
      { name: 'pedal', label: 'Throttle pedal', type: 'select', required: true, options: throttles },
    ],
    outlines: [{ name: 'hoodLine', label: 'Hood underside, front to rear', axes: ['x', 'z'], closed: false, minPoints: 0, help: CHASSIS_FRAME }],
    obstacles: true,
    json: [
      { name: 'radiatorCore', label: 'Radiator core', shape: 'object', required: true, help: '{ "x", "zFrom", "zTo", "ratedKw", "inletSide", "outletSide" }' },
      { name: 'railStations', label: 'Frame rail stations', shape: 'array', required: true, help: '[{ "x", "insideWidthMm", "zBottom", "zTop" }] in mm' },
      { name: 'steeringBox', label: 'Steering box', shape: 'object', help: '{ "side", "inboardY", "xFrom", "xTo", "zFrom", "zTo" } in mm' },
      { name: 'mountPads', label: 'Mount pads', shape: 'object', required: true, help: '{ "left": { "x", "y", "z" }, "right": { … } } in mm' },
      { name: 'transmissionCrossmember', label: 'Transmission crossmember', shape: 'object', required: true, help: '{ "x", "z", "adjustableXMm" }' },
      { name: 'pinion', label: 'Pinion', shape: 'object', required: true, help: '{ "x", "z", "angleDeg" }' },
      { name: 'fuelSystem', label: 'Fuel system', shape: 'object', required: true, help: '{ "kind", "pumpFlowLph", "pumpRatedPsi", "regulatorPsi" }' },
    ],
    columns: ['wheelbaseMm', 'pedal'],
    defaults: {
      obstacles: [],
      hoodLine: [],
      railStations: [],
      pedal: 'cable',
      radiatorCore: { x: -200, zFrom: 400, zTo: 900, ratedKw: 200, inletSide: 'right', outletSide: 'left' },
      mountPads: { left: { x: 300, y: -300, z: 440 }, right: { x: 300, y: 300, z: 440 } },
      transmissionCrossmember: { x: 1400, z: 340, adjustableXMm: 0 },
      pinion: { x: 2700, z: 370, angleDeg: 3 },
      fuelSystem: { kind: 'carburetor', pumpFlowLph: 100, pumpRatedPsi: 7, regulatorPsi: 0 },
    },
  },
  controllers: {
    kind: 'controllers',
    label: 'Engine controllers',
    singular: 'engine controller',
    fields: [
      { name: 'maxCylinders', label: 'Most cylinders', type: 'number', required: true, min: 1, max: 16 },
      { name: 'crankSignals', label: 'Crank signals it reads', type: 'multi', required: true, options: crankSignals },
      { name: 'camSignals', label: 'Cam signals it reads', type: 'multi', options: camSignals },
      { name: 'throttles', label: 'Throttles it drives', type: 'multi', required: true, options: throttles },
    ],
    outlines: [],
    json: [],
    columns: ['maxCylinders', 'crankSignals'],
    defaults: { crankSignals: [], camSignals: [], throttles: ['cable'] },
  },
  'mount-adapters': {
    kind: 'mount-adapters',
    label: 'Mount adapters',
    singular: 'mount adapter',
    fields: [
      { name: 'maxDxMm', label: 'Bridges fore-aft up to', type: 'length', required: true, min: 0 },
      { name: 'maxDzMm', label: 'Bridges height up to', type: 'length', required: true, min: 0 },
      { name: 'maxDyMm', label: 'Bridges sideways up to', type: 'length', required: true, min: 0 },
      { name: 'price', label: 'Price', type: 'number', min: 0 },
    ],
    outlines: [],
    json: [],
    columns: ['maxDxMm', 'maxDzMm', 'maxDyMm'],
    defaults: {},
  },
  'bellhousing-adapters': {
    kind: 'bellhousing-adapters',
    label: 'Bellhousing adapters',
    singular: 'bellhousing adapter',
    fields: [
      { name: 'enginePattern', label: 'Engine pattern', type: 'text', required: true },
      { name: 'transmissionPattern', label: 'Transmission pattern', type: 'text', required: true },
      { name: 'thicknessMm', label: 'Thickness', type: 'length', required: true, min: 0 },
    ],
    outlines: [],
    json: [],
    columns: ['enginePattern', 'transmissionPattern', 'thicknessMm'],
    defaults: {},
  },
  belts: {
    kind: 'belts',
    label: 'Accessory drive belts',
    singular: 'accessory drive belt',
    fields: [
      { name: 'ribs', label: 'Ribs', type: 'number', required: true, min: 3, max: 12, help: 'PK profile, 3.56 mm per rib.' },
      {
        name: 'effectiveLengthMm',
        label: 'Effective length',
        type: 'length',
        required: true,
        min: 400,
        max: 3000,
        help: 'The outside length printed on the belt, e.g. 1225 in 6PK1225.',
      },
      { name: 'stockOnHand', label: 'On the shelf', type: 'number', min: 0, max: 100000 },
    ],
    outlines: [],
    json: [],
    columns: ['designation', 'ribs', 'effectiveLengthMm', 'stockOnHand'],
    columnLabels: { designation: 'Designation' },
    defaults: { ribs: 6 },
  },
};

export const obstacleKinds = opts(OBSTACLE_KINDS);
