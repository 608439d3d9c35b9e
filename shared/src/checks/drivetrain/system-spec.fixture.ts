import type { FitSpec } from '../../types/fit-spec';

const DEG = Math.PI / 180;
const IN = 25.4;

/**
 * An invented swap for the system checks: a 400 hp V8 (298.28 kW), a transmission whose output sits 50.0 in ahead
 * of the pinion and 4.0 in above it, 3° installed tilt and the pinion parallel. Every check passes on it.
 */
export const FIXTURE_PLACEMENT = { setbackMm: 1000, heightMm: 600, tiltDeg: 3 };
export const FIXTURE_LENGTH_TO_OUTPUT_MM = 700;

// Derived: output point on the crank line, x = x_e − u·cosθ, z = z_e + u·sinθ with u = −700 mm.
const OUTPUT_X = FIXTURE_PLACEMENT.setbackMm + FIXTURE_LENGTH_TO_OUTPUT_MM * Math.cos(3 * DEG);
const OUTPUT_Z = FIXTURE_PLACEMENT.heightMm - FIXTURE_LENGTH_TO_OUTPUT_MM * Math.sin(3 * DEG);
export const FIXTURE_PINION = {
  x: OUTPUT_X + Math.sqrt(50 * 50 - 4 * 4) * IN,
  z: OUTPUT_Z - 4 * IN,
  angleDeg: 3,
};

export function systemFitSpec(): FitSpec {
  return structuredClone(BASE);
}

/** A copy of the fixture with `change` applied to it. */
export function specWith(change: (spec: FitSpec) => void): FitSpec {
  const spec = systemFitSpec();
  change(spec);
  return spec;
}

const BASE: FitSpec = {
  engine: {
    id: 'eng-test-v8',
    name: 'test V8',
    cylinders: 8,
    layout: 'v',
    displacementL: 5.3,
    ratedPowerKw: 298.28,
    topProfile: [{ u: 0, w: 500 }, { u: 600, w: 500 }],
    rearProfile: [{ u: 0, w: 450 }],
    fanFrontU: 800,
    fanWFrom: 0,
    fanWTo: 400,
    panRail: { w: -100, uFrom: 0, uTo: 600, pattern: 'rail-a' },
    mountBosses: { left: { u: 450, v: -250, w: 0 }, right: { u: 450, v: 250, w: 0 } },
    widthFeatures: [],
    accessoryDrives: [
      {
        id: 'drive-a',
        name: 'front drive A',
        // Pulley centres x = −v, y = w seen from the front: crank (0, 0) r 80, water pump (150, 250) r 50, alternator (−150, 250) r 30.
        pulleys: [
          { id: 'crank', role: 'crank', v: 0, w: 0, diameterMm: 160, side: 'grooved' },
          { id: 'water-pump', role: 'water-pump', v: -150, w: 250, diameterMm: 100, side: 'grooved' },
          { id: 'alternator', role: 'alternator', v: 150, w: 250, diameterMm: 60, side: 'grooved' },
        ],
        tensionerTakeUpMm: { shorterMm: 10, longerMm: 15 },
        halfWidthLeftMm: 250,
        halfWidthRightMm: 250,
        frontFaceU: 750,
        wMin: -80,
        wMax: 300,
        ribs: 6,
      },
    ],
    bellPattern: 'bell-a',
    crankSignal: '60-2',
    camSignal: '1x',
    throttle: 'electronic',
    oilPumpDrive: 'crank',
    dipstickLocation: 'block-left',
    fuelPressurePsi: 58,
    injectorFlowLbh: 31.25,
    injectorRatedPsi: 43.5,
    coolantOutletSide: 'left',
    coolantInletSide: 'right',
    cam: { advanceGroundDeg: 4, recommendedTotalDeg: 4 },
  },
  oilPan: {
    id: 'pan-rear-a',
    name: 'rear-sump pan A',
    railPattern: 'rail-a',
    bottomProfile: [
      { u: 600, w: -100 },
      { u: 600, w: -120 },
      { u: 250, w: -120 },
      { u: 200, w: -200 },
      { u: 0, w: -200 },
      { u: 0, w: -100 },
    ],
    sumpPosition: 'rear',
    pickupMount: 'pump-bolted',
    sumpCenterU: 100,
    sumpFloorW: -200,
    dipstickProvision: ['block-left'],
    capacityL: 5.7,
  },
  oilPickup: {
    id: 'pickup-rear-a',
    name: 'rear pickup A',
    sumpPosition: 'rear',
    mount: 'pump-bolted',
    pumpInlet: 'inlet-a',
    screenU: 100,
    screenW: -192,
  },
  oilPump: { id: 'pump-stock-a', name: 'stock pump A', inlet: 'inlet-a', speedLimitRpm: 0, highVolume: false },
  transmission: {
    id: 'trans-a',
    name: 'transmission A',
    bellPattern: 'bell-a',
    lengthToOutputMm: FIXTURE_LENGTH_TO_OUTPUT_MM,
    mountPoint: { u: -600, w: -50 },
    sideProfile: [],
    slipYokeTravelMm: 60,
    topGearRatio: 0.7,
  },
  chassis: {
    id: 'chassis-a',
    name: 'test truck chassis',
    wheelbaseMm: 2921,
    obstacles: [],
    hoodLine: [],
    radiatorCore: { x: -300, zFrom: 500, zTo: 1000, ratedKw: 200, inletSide: 'left', outletSide: 'right' },
    railStations: [],
    mountPads: { left: { x: 550, y: -250, z: 600 }, right: { x: 550, y: 250, z: 600 } },
    transmissionCrossmember: { x: 1600, z: 500, adjustableXMm: 50 },
    pinion: FIXTURE_PINION,
    fuelSystem: { kind: 'efi-returnless', pumpFlowLph: 190, pumpRatedPsi: 58, regulatorPsi: 58 },
    pedal: 'electronic',
  },
  controller: {
    id: 'ecu-a',
    name: 'controller A',
    crankSignals: ['60-2', '36-1'],
    camSignals: ['1x'],
    throttles: ['cable', 'electronic'],
    maxCylinders: 8,
  },
  driveshaft: { outerDiameterMm: 3 * IN, wallMm: 0.083 * IN, material: 'steel' },
  timingSetAdvanceDeg: 0,
  placement: { ...FIXTURE_PLACEMENT },
  goals: {
    use: 'street',
    targetPowerKw: 298.2799486328,
    continuousPowerKw: 150,
    revLimitRpm: 5500,
    topSpeedKph: 160,
    tireDiameterMm: 750,
    axleRatio: 3.42,
  },
  candidates: {
    oilPans: [
      {
        id: 'pan-front-b',
        name: 'front-sump pan B',
        railPattern: 'rail-a',
        bottomProfile: [{ u: 600, w: -200 }, { u: 300, w: -200 }, { u: 250, w: -120 }, { u: 0, w: -120 }],
        sumpPosition: 'front',
        pickupMount: 'pump-bolted',
        sumpCenterU: 450,
        sumpFloorW: -200,
        dipstickProvision: ['pan-left', 'block-left'],
        capacityL: 5.2,
      },
    ],
    oilPickups: [
      { id: 'pickup-front-b', name: 'front pickup B', sumpPosition: 'front', mount: 'pump-bolted', pumpInlet: 'inlet-a', screenU: 450, screenW: -192 },
      { id: 'pickup-rear-c', name: 'rear pickup C', sumpPosition: 'rear', mount: 'pump-bolted', pumpInlet: 'inlet-a', screenU: 100, screenW: -191 },
    ],
    oilPumps: [
      { id: 'pump-hv-a', name: 'high-volume pump A', inlet: 'inlet-a', speedLimitRpm: 7500, highVolume: true },
      { id: 'pump-b', name: 'pump B', inlet: 'inlet-b', speedLimitRpm: 8000, highVolume: false },
    ],
    bellhousingAdapters: [
      { id: 'adapter-thick', name: 'adapter plate 25', enginePattern: 'bell-a', transmissionPattern: 'bell-b', thicknessMm: 25 },
      { id: 'adapter-thin', name: 'adapter plate 12', enginePattern: 'bell-a', transmissionPattern: 'bell-b', thicknessMm: 12.7 },
    ],
    controllers: [
      { id: 'ecu-b', name: 'controller B', crankSignals: ['36-1'], camSignals: ['1x'], throttles: ['cable'], maxCylinders: 6 },
      { id: 'ecu-c', name: 'controller C', crankSignals: ['60-2', '36-1', '24-1'], camSignals: ['1x', '4x'], throttles: ['cable', 'electronic'], maxCylinders: 8 },
    ],
    stockBeltLengthsMm: [1200, 1225, 1250],
  },
};
