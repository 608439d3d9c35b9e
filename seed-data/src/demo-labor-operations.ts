/**
 * The demo shop's labor operations: book hours, build order, hazards, torque specs with their tightening
 * sequences, and the checks the bay records. Hours and torques are the invented shop's own figures for its
 * invented engines (realistic, not copied from any maker's manual); a real shop enters its parts' data.
 */
export type DemoHazard = 'lifting' | 'support' | 'fuel' | 'welding' | 'steering' | 'brakes';

export interface DemoLaborOperation {
  id: string;
  code: string;
  name: string;
  bookHours: number;
  buildOrder: number;
  /** The part categories this operation installs (a quote draws its install labor, the work order its parts, by category). */
  matches: string[];
  hazards: DemoHazard[];
  /** `joint`: the stable name of the joint a figure tightens; a part's own figure for the same joint replaces it. */
  torqueSpecs: { joint?: string; fastener: string; lbfFt: number; sequence: string | null }[];
  checks: { key: string; label: string; unit: string | null; min: number | null; max: number | null; fitCheckId?: string }[];
}

const id = (n: number) => `5a0b1c2d-0000-4000-8000-0000000007${String(n).padStart(2, '0')}`;

export const DEMO_LABOR_OPERATIONS: DemoLaborOperation[] = [
  {
    id: id(1),
    code: 'crossmember-modify',
    name: 'Modify front crossmember for pan clearance',
    bookHours: 4.0,
    buildOrder: 10,
    matches: [],
    hazards: ['support', 'welding'],
    torqueSpecs: [],
    checks: [{ key: 'weld-inspected', label: 'Crossmember welds inspected: full fusion, no cracks or undercut', unit: null, min: null, max: null }],
  },
  {
    id: id(2),
    code: 'cam-timing-set',
    name: 'Install camshaft and timing set',
    bookHours: 3.0,
    buildOrder: 20,
    matches: ['cam-timing-set'],
    hazards: [],
    torqueSpecs: [{ joint: 'cam-sprocket', fastener: 'Cam sprocket bolts', lbfFt: 25, sequence: 'Alternate bolts, in two stages (snug, then full torque)' }],
    checks: [
      { key: 'cam-turns', label: 'Camshaft turns by hand after the cam bearings go in', unit: null, min: null, max: null },
      { key: 'cam-marks', label: 'Cam installed with the timing marks aligned (advance ground into the cam)', unit: null, min: null, max: null, fitCheckId: 'cam.timing-advance' },
    ],
  },
  {
    id: id(3),
    code: 'oil-pan-pickup',
    name: 'Install swap oil pan, pickup and pump',
    bookHours: 2.5,
    buildOrder: 30,
    matches: ['oil-pan', 'oil-pickup', 'oil-pump'],
    hazards: ['support'],
    torqueSpecs: [
      { joint: 'oil-pump-to-main-cap', fastener: 'Oil pump to rear main cap', lbfFt: 18, sequence: null },
      { joint: 'pickup-tube-tabs', fastener: 'Pickup tube bolts', lbfFt: 9, sequence: 'Both tabs, snug, then full torque' },
      { joint: 'oil-pan-to-block', fastener: 'Oil pan bolts', lbfFt: 9, sequence: 'Crisscross from the centre out, in two stages (half, then full torque)' },
    ],
    checks: [
      { key: 'pickup-tabs', label: 'Pickup bolted at both tabs', unit: null, min: null, max: null },
      { key: 'screen-height', label: 'Pickup screen height above the sump floor', unit: 'mm', min: 6, max: 10 },
      { key: 'rear-main-lip', label: 'Rear main seal lip not rolled', unit: null, min: null, max: null },
    ],
  },
  {
    id: id(4),
    code: 'mount-adapters',
    name: 'Fabricate or fit engine mount adapters',
    bookHours: 2.0,
    buildOrder: 40,
    matches: ['mount-adapter'],
    hazards: ['lifting', 'welding'],
    torqueSpecs: [{ joint: 'mount-adapter-to-block', fastener: 'Mount adapter to block bolts', lbfFt: 40, sequence: 'Upper bolts first, then lower, each side alike' }],
    checks: [],
  },
  {
    id: id(5),
    code: 'engine-remove-install',
    name: 'Remove the old engine and install the swap engine and transmission',
    bookHours: 10.0,
    buildOrder: 50,
    matches: ['bellhousing-adapter'],
    hazards: ['lifting', 'support', 'fuel'],
    torqueSpecs: [
      { joint: 'bellhousing-to-block', fastener: 'Bellhousing to block bolts', lbfFt: 35, sequence: 'Alternate sides, in two stages' },
      { joint: 'engine-mount-through-bolt', fastener: 'Engine mount through-bolts', lbfFt: 55, sequence: null },
    ],
    checks: [{ key: 'mount-gap', label: 'Oil pan to crossmember gap with the engine on its mounts', unit: 'mm', min: 12.7, max: null, fitCheckId: 'envelope.sump-crossmember' }],
  },
  {
    id: id(6),
    code: 'driveshaft-shorten',
    name: 'Shorten and balance the driveshaft',
    bookHours: 1.5,
    buildOrder: 60,
    matches: ['driveshaft', 'driveshaft-service'],
    hazards: ['support'],
    torqueSpecs: [{ joint: 'u-joint-straps', fastener: 'U-joint strap bolts', lbfFt: 15, sequence: 'Alternate bolts' }],
    checks: [{ key: 'slip-engagement', label: 'Slip-yoke engagement at ride height', unit: 'mm', min: 25.4, max: null }],
  },
  {
    id: id(7),
    code: 'fuel-system',
    name: 'Install fuel pump, regulator and lines',
    bookHours: 3.5,
    buildOrder: 70,
    matches: ['fuel-pump', 'fuel-regulator', 'fuel-lines'],
    hazards: ['fuel', 'support'],
    torqueSpecs: [],
    checks: [
      { key: 'fuel-pressure', label: 'Fuel pressure at idle', unit: 'psi', min: 55, max: 62 },
      { key: 'fuel-leaks', label: 'No leaks at any fitting with the pump running', unit: null, min: null, max: null },
    ],
  },
  {
    id: id(8),
    code: 'controller-wiring',
    name: 'Wire the engine controller, sensors and pedal',
    bookHours: 6.0,
    buildOrder: 80,
    matches: ['engine-controller', 'throttle-pedal'],
    hazards: [],
    torqueSpecs: [],
    checks: [{ key: 'no-faults', label: 'No fault codes with the engine running', unit: null, min: null, max: null }],
  },
  {
    id: id(9),
    code: 'transmission-crossmember',
    name: 'Relocate or rework the transmission crossmember',
    bookHours: 4.0,
    buildOrder: 15,
    matches: ['transmission-crossmember', 'transmission-mount'],
    hazards: ['support', 'welding'],
    torqueSpecs: [],
    checks: [
      { key: 'weld-inspected', label: 'Crossmember welds inspected: full fusion, no cracks or undercut', unit: null, min: null, max: null },
      { key: 'mount-seated', label: 'Transmission mount bolted down flat on the crossmember pad, no spacer past the shop limit', unit: null, min: null, max: null },
    ],
  },
];
