import { DEMO_CATALOG_IDS as IDS } from './catalog/demo-catalog-ids';
import { DEMO_ACCESSORY_DRIVE_IDS } from './catalog/demo-catalog';
import { DEMO_CUSTOMER_IDS } from './demo-customers';
import type { DemoProjectStatus, DemoProjectUse } from './demo-projects';

/**
 * The demo shop in the middle of a busy day: one job at every stage, from a truck waiting for the tape to a finished
 * build. `npm start` plays it through the API once per database (api/src/database/seed/demo-story/); the test
 * databases keep only the minimal seed. Customers, vehicles and figures are invented; the catalog is the demo one.
 */

export interface DemoStoryCustomer {
  name: string;
  email: string | null;
  phone: string | null;
  notes: string | null;
}

/** Whole-millimetre (or degree) differences from the catalog figure that this truck's tape showed, with a note. */
export interface DemoStoryReading {
  delta: number;
  note?: string;
}

export interface DemoStoryPhoto {
  pointId: string;
  /** A file name as a phone would give it. */
  fileName: string;
}

export interface DemoStoryJob {
  /** The stage the story leaves the job at. */
  stage: DemoProjectStatus;
  /** An existing demo customer (by id), or a new one the estimator enters. */
  customer: { id: string } | DemoStoryCustomer;
  title: string;
  vehicleDescription: string;
  chassisModelId: string;
  engineProfileId: string;
  transmissionId: string;
  goals: { use: DemoProjectUse; targetPowerKw: number; revLimitRpm: number; budgetCents: number };
  placement: { setbackMm: number; heightMm: number; tiltDeg: number } | null;
  fitSelections: {
    oilPanId: string;
    oilPickupId: string | null;
    oilPumpId: string;
    controllerId: string;
    accessoryDriveId: string;
    driveshaft: { outerDiameterMm: number; wallMm: number; material: 'steel' | 'aluminum' };
    timingSetAdvanceDeg: number;
    topSpeedKph: number;
    tireDiameterMm: number;
    axleRatio: number;
    continuousPowerKw: number;
  } | null;
  /** Readings that differ from the catalog beyond the tape's usual few millimetres. */
  readings?: Record<string, DemoStoryReading>;
  photos?: DemoStoryPhoto[];
  /** A second revision the estimator sends after talking to the customer. */
  revision?: { dropLaborOperationCode?: string; discountPercent?: number; notes: string };
  /** Work-order checks recorded as failed first (with the note), then put right. */
  failedFirst?: Record<string, { value?: number; note: string }>;
}

const KESTREL_TRUCK = {
  oilPanId: IDS.oilPans.kestrelStockFront,
  oilPickupId: IDS.oilPickups.kestrelFront,
  oilPumpId: IDS.oilPumps.kestrelStock,
  controllerId: IDS.controllers.tessaryT8,
  accessoryDriveId: DEMO_ACCESSORY_DRIVE_IDS.truck,
  driveshaft: { outerDiameterMm: 76.2, wallMm: 2.108, material: 'steel' as const },
  timingSetAdvanceDeg: 0,
  topSpeedKph: 150,
  tireDiameterMm: 760,
  axleRatio: 3.73,
  continuousPowerKw: 150,
};

/** The story's jobs, the longest-running first (the done job was the first through the door). */
export const DEMO_STORY_JOBS: DemoStoryJob[] = [
  {
    stage: 'done',
    customer: { name: 'Hollis Marrowby', email: 'hollis.marrowby@example.test', phone: '+1 555 0151', notes: 'Collects the truck on Saturday mornings only.' },
    title: 'Harlan Ridgeback 1978 short bed: Kestrel 5.3 V8 swap',
    vehicleDescription: 'Harlan Ridgeback 1978 half-ton, short bed, two-tone paint; original inline six seized. Frame straight.',
    chassisModelId: IDS.chassis.ridgeback78,
    engineProfileId: IDS.engines.kestrel53,
    transmissionId: IDS.transmissions.marlow45,
    goals: { use: 'street', targetPowerKw: 250, revLimitRpm: 6000, budgetCents: 1_400_000 },
    placement: { setbackMm: 660, heightMm: 500, tiltDeg: 3 },
    fitSelections: KESTREL_TRUCK,
    photos: [{ pointId: 'front-crossmember.bottom', fileName: 'crossmember-underside.png' }],
  },
  {
    stage: 'in-the-bay',
    customer: { name: 'Ottoline Vance-Herrick', email: 'ottoline.vh@example.test', phone: '+1 555 0152', notes: 'Wants the old engine crated and returned.' },
    title: 'Pellam Stag 1984 4x4: Kestrel 5.3 V8 for the hay run',
    vehicleDescription: 'Pellam Stag 1984 three-quarter-ton 4x4, flatbed conversion, new leaf springs last year.',
    chassisModelId: IDS.chassis.stag84,
    engineProfileId: IDS.engines.kestrel53,
    transmissionId: IDS.transmissions.marlow45,
    goals: { use: 'tow', targetPowerKw: 260, revLimitRpm: 5800, budgetCents: 1_600_000 },
    placement: { setbackMm: 700, heightMm: 590, tiltDeg: 3 },
    fitSelections: { ...KESTREL_TRUCK, tireDiameterMm: 800, axleRatio: 4.1, topSpeedKph: 130, continuousPowerKw: 200 },
    readings: {
      'ride-height.rear-left': { delta: 12, note: 'New springs sit higher than the book' },
      'ride-height.rear-right': { delta: 11 },
    },
    photos: [
      { pointId: 'mount-pad.left.height', fileName: 'left-mount-pad.png' },
      { pointId: 'transmission-crossmember.height', fileName: 'trans-crossmember.png' },
    ],
    failedFirst: { 'oil-pan-pickup.screen-height': { value: 11, note: 'Screen sits high; tube re-seated in the pump' } },
  },
  {
    stage: 'deposit-paid',
    customer: { name: 'Dacey Pemberthy', email: 'dacey.pemberthy@example.test', phone: null, notes: 'Prefers text updates.' },
    title: 'Harlan Ridgeback 1978: Kestrel 6.2 V8 with six-speed automatic',
    vehicleDescription: 'Harlan Ridgeback 1978 half-ton, long bed, camper shell; engine already pulled by the owner.',
    chassisModelId: IDS.chassis.ridgeback78,
    engineProfileId: IDS.engines.kestrel62,
    transmissionId: IDS.transmissions.marlow65,
    goals: { use: 'tow', targetPowerKw: 290, revLimitRpm: 5800, budgetCents: 2_000_000 },
    placement: { setbackMm: 660, heightMm: 500, tiltDeg: 3 },
    fitSelections: { ...KESTREL_TRUCK, continuousPowerKw: 190 },
    photos: [{ pointId: 'rail.width@600', fileName: 'rails-at-firewall.png' }],
  },
  {
    stage: 'approved',
    customer: { name: 'Rafferty Quillane', email: 'rafferty.q@example.test', phone: '+1 555 0154', notes: null },
    title: 'Pellam Stag 1984: Kestrel 6.2 V8 and six-speed for the horse float',
    vehicleDescription: 'Pellam Stag 1984 three-quarter-ton 4x4, gooseneck hitch, dual tanks.',
    chassisModelId: IDS.chassis.stag84,
    engineProfileId: IDS.engines.kestrel62,
    transmissionId: IDS.transmissions.marlow65,
    goals: { use: 'tow', targetPowerKw: 300, revLimitRpm: 5800, budgetCents: 2_300_000 },
    placement: { setbackMm: 700, heightMm: 590, tiltDeg: 3 },
    fitSelections: {
      ...KESTREL_TRUCK,
      oilPanId: IDS.oilPans.kestrelCenterTow,
      oilPickupId: IDS.oilPickups.kestrelCenter,
      oilPumpId: IDS.oilPumps.kestrelHighVolume,
      driveshaft: { outerDiameterMm: 88.9, wallMm: 2.108, material: 'steel' },
      topSpeedKph: 130,
      tireDiameterMm: 800,
      axleRatio: 4.1,
      continuousPowerKw: 220,
    },
  },
  {
    stage: 'quote-sent',
    customer: { id: DEMO_CUSTOMER_IDS.juno },
    title: 'Tallgrass Meadowline 1966 wagon: Kestrel 5.3 V8 daily driver',
    vehicleDescription: 'Tallgrass Meadowline 1966 wagon, third-row seat, original paint; the second project of an owner-builder.',
    chassisModelId: IDS.chassis.tallgrass66,
    engineProfileId: IDS.engines.kestrel53,
    transmissionId: IDS.transmissions.marlow45,
    goals: { use: 'street', targetPowerKw: 240, revLimitRpm: 6000, budgetCents: 1_500_000 },
    placement: { setbackMm: 600, heightMm: 470, tiltDeg: 2.5 },
    fitSelections: { ...KESTREL_TRUCK, accessoryDriveId: DEMO_ACCESSORY_DRIVE_IDS.compact, tireDiameterMm: 690, axleRatio: 3.42, topSpeedKph: 170, continuousPowerKw: 100 },
    readings: { 'front-crossmember.bottom': { delta: -6, note: 'Old skid-plate bracket still bolted on' } },
    revision: {
      dropLaborOperationCode: 'controller-wiring',
      notes: 'Revision 2: the customer wires the engine controller, sensors and pedal herself; that labor is taken off.',
    },
  },
  {
    stage: 'parts-planned',
    customer: { name: 'Sunniva Tollard', email: 'sunniva.tollard@example.test', phone: '+1 555 0156', notes: 'Budget is firm.' },
    title: 'Pellam Stag 1984: Kestrel 5.3 V8 with four-speed automatic',
    vehicleDescription: 'Pellam Stag 1984 three-quarter-ton 4x4, snow plough mount, rust repaired at the rear cab corners.',
    chassisModelId: IDS.chassis.stag84,
    engineProfileId: IDS.engines.kestrel53,
    transmissionId: IDS.transmissions.marlow45,
    goals: { use: 'tow', targetPowerKw: 250, revLimitRpm: 5800, budgetCents: 1_300_000 },
    placement: { setbackMm: 700, heightMm: 590, tiltDeg: 3 },
    fitSelections: { ...KESTREL_TRUCK, tireDiameterMm: 790, axleRatio: 4.1, topSpeedKph: 130 },
  },
  {
    stage: 'fit-checked',
    customer: { id: DEMO_CUSTOMER_IDS.caspar },
    title: 'Harlan Ridgeback 1978: Kestrel 5.3 V8 and five-speed manual',
    vehicleDescription: 'Harlan Ridgeback 1978 half-ton, long bed; owner wants three pedals.',
    chassisModelId: IDS.chassis.ridgeback78,
    engineProfileId: IDS.engines.kestrel53,
    transmissionId: IDS.transmissions.dunmore5,
    goals: { use: 'street', targetPowerKw: 250, revLimitRpm: 6200, budgetCents: 1_500_000 },
    placement: { setbackMm: 660, heightMm: 500, tiltDeg: 3 },
    fitSelections: KESTREL_TRUCK,
  },
  {
    stage: 'measured',
    customer: { id: DEMO_CUSTOMER_IDS.tamsin },
    title: 'Tallgrass Meadowline 1966 wagon: Harrow 4.0 inline six',
    vehicleDescription: 'Tallgrass Meadowline 1966 wagon, column shift, sagging rear springs.',
    chassisModelId: IDS.chassis.tallgrass66,
    engineProfileId: IDS.engines.harrow40,
    transmissionId: IDS.transmissions.dunmore5,
    goals: { use: 'street', targetPowerKw: 140, revLimitRpm: 5500, budgetCents: 900_000 },
    placement: { setbackMm: 600, heightMm: 470, tiltDeg: 2.5 },
    fitSelections: {
      oilPanId: IDS.oilPans.harrowStock,
      oilPickupId: null,
      oilPumpId: IDS.oilPumps.harrowStock,
      controllerId: IDS.controllers.tessaryT6,
      accessoryDriveId: 'drive-serpentine',
      driveshaft: { outerDiameterMm: 76.2, wallMm: 1.65, material: 'steel' },
      timingSetAdvanceDeg: 0,
      topSpeedKph: 140,
      tireDiameterMm: 690,
      axleRatio: 3.55,
      continuousPowerKw: 70,
    },
    readings: {
      'ride-height.rear-left': { delta: -24, note: 'Rear springs tired; measured as the car sits' },
      'ride-height.rear-right': { delta: -21 },
      'pinion.angle': { delta: 1.5, note: 'Pinion tips up with the sag' },
    },
    photos: [
      { pointId: 'ride-height.rear-left', fileName: 'rear-ride-height.png' },
      { pointId: 'front-crossmember.top', fileName: 'crossmember-top.png' },
    ],
  },
  {
    stage: 'intake',
    customer: { id: DEMO_CUSTOMER_IDS.bram },
    title: 'Pellam Stag 1984 trail rig: Harrow 4.0 inline six',
    vehicleDescription: 'Pellam Stag 1984 three-quarter-ton 4x4 on 35 in tyres, winch bumper; engine out, waiting in the yard.',
    chassisModelId: IDS.chassis.stag84,
    engineProfileId: IDS.engines.harrow40,
    transmissionId: IDS.transmissions.dunmore5,
    goals: { use: 'off-road', targetPowerKw: 140, revLimitRpm: 5200, budgetCents: 900_000 },
    placement: null,
    fitSelections: null,
  },
];
