import { lbFtToNm } from '@swapwright/shared';
import { DEMO_CATALOG_IDS as IDS } from './demo-catalog-ids';

/** The demo shop's invented suppliers and parts, with fixed ids; prices and costs in cents. */
export interface DemoSupplier {
  id: string;
  name: string;
  contact: string;
  email: string;
  phone: string;
}

export interface DemoPart {
  id: string;
  sku: string;
  description: string;
  category: string;
  priceCents: number;
  costCents: number;
  supplierId: string;
  supplierSku: string;
  laborHours: number;
  /** `joint`: the stable name of the joint a figure tightens, so the work order gives each joint one figure. */
  torqueSpecs: Array<{ fastener: string; newtonMetres: number; sequence?: string; joint?: string }>;
  instructions: string | null;
  attributes: Record<string, string | number | boolean | string[]>;
  requiresSkus: string[];
  excludesSkus: string[];
  replacesSkus: string[];
  fitKind: string | null;
  fitSpecId: string | null;
  stock: Array<{ id: string; location: string; bin: string; onHand: number }>;
}

export const DEMO_SUPPLIER_IDS = {
  coldwater: '5a0b1c2d-0000-4000-8000-000000000601',
  ridgeline: '5a0b1c2d-0000-4000-8000-000000000602',
  pinecrest: '5a0b1c2d-0000-4000-8000-000000000603',
} as const;

export const DEMO_SUPPLIERS: DemoSupplier[] = [
  { id: DEMO_SUPPLIER_IDS.coldwater, name: 'Coldwater Swap Supply', contact: 'Parts desk', email: 'orders@coldwater-swap.test', phone: '555-0141' },
  { id: DEMO_SUPPLIER_IDS.ridgeline, name: 'Ridgeline Fabrication Parts', contact: 'Counter', email: 'sales@ridgeline-fab.test', phone: '555-0172' },
  { id: DEMO_SUPPLIER_IDS.pinecrest, name: 'Pinecrest Fuel Systems', contact: 'Orders', email: 'orders@pinecrest-fuel.test', phone: '555-0188' },
];

const KESTREL_RAIL = 'KS-V8';
const KESTREL_INLET = 'KS-19';
const MAIN = 'Main store';

let serial = 0;
function part(p: Partial<DemoPart> & Pick<DemoPart, 'sku' | 'description' | 'category' | 'priceCents'>, onHand: number | null, bin = ''): DemoPart {
  serial += 1;
  const id = `5a0b1c2d-0000-4000-8000-000000000${String(700 + serial).padStart(3, '0')}`;
  return {
    id,
    costCents: Math.round(p.priceCents * 0.68),
    supplierId: DEMO_SUPPLIER_IDS.coldwater,
    supplierSku: `V-${p.sku}`,
    laborHours: 0,
    torqueSpecs: [],
    instructions: null,
    attributes: {},
    requiresSkus: [],
    excludesSkus: [],
    replacesSkus: [],
    fitKind: null,
    fitSpecId: null,
    stock: onHand === null ? [] : [{ id: `5a0b1c2d-0000-4000-8000-000000000${String(800 + serial).padStart(3, '0')}`, location: MAIN, bin, onHand }],
    ...p,
  };
}

/**
 * Tightening figures of the invented parts. From memory: typical values for these fastener sizes on a small-block V8
 * (not any maker's published figures); a spec given in lbf·ft is stored in N·m with the exact factor, so it reads back
 * as given. Pan and cover flanges: snug every bolt, then from the centre outward in a crisscross, in stages
 * (common practice; ASME PCC-1 prescribes cross-pattern passes for pressure flanges).
 */
const torque = (joint: string, fastener: string, lbfFt: number, sequence?: string) => ({ joint, fastener, newtonMetres: lbFtToNm(lbfFt), ...(sequence && { sequence }) });
const PAN_BOLTS = { joint: 'oil-pan-to-block', fastener: 'Oil pan bolts (M6)', newtonMetres: 12, sequence: 'Snug all, then crisscross from the centre out, in two stages (half, then full torque)' };
const PICKUP_BOLTS = torque('pickup-tube-tabs', 'Pickup tube bolts (M6), both tabs', 9, 'Both tabs snug, then full torque');
const PUMP_BOLTS = torque('oil-pump-to-main-cap', 'Oil pump to rear main cap bolts (M8)', 18, 'Alternate bolts, two passes');
/** Pickup screen height above the sump floor for the pan it is made for (the work order's measured check). */
const SCREEN_HEIGHT = { 'screen-height.min': 6, 'screen-height.max': 10 };

export const DEMO_PARTS: DemoPart[] = [
  part({ sku: 'KS-PAN-STK', description: 'Kestrel 5.3 stock front-sump pan', category: 'oil-pan', priceCents: 18_900, laborHours: 3, fitKind: 'oil-pans', fitSpecId: IDS.oilPans.kestrelStockFront, torqueSpecs: [PAN_BOLTS] }, 0, 'A-01-1'),
  part({ sku: 'TR-4410', description: 'Rear-sump swap pan, Kestrel rail', category: 'oil-pan', priceCents: 32_900, laborHours: 3, fitKind: 'oil-pans', fitSpecId: IDS.oilPans.kestrelRearSwap, torqueSpecs: [PAN_BOLTS, { joint: 'oil-pan-drain-plug', fastener: 'Drain plug', newtonMetres: 25 }], instructions: 'Clean the rail, use the supplied gasket dry, fit the pickup before the pan.' }, 2, 'A-01-2'),
  part({ sku: 'TR-4480', description: 'Deep rear-sump pan, Kestrel rail', category: 'oil-pan', priceCents: 28_900, laborHours: 3, fitKind: 'oil-pans', fitSpecId: IDS.oilPans.kestrelDeepRear, torqueSpecs: [PAN_BOLTS] }, 1, 'A-01-3'),
  part({ sku: 'KS-PAN-CTR', description: 'Kestrel centre-sump tow pan', category: 'oil-pan', priceCents: 27_900, laborHours: 3, fitKind: 'oil-pans', fitSpecId: IDS.oilPans.kestrelCenterTow, torqueSpecs: [PAN_BOLTS] }, 1, 'A-01-4'),
  part({ sku: 'KS-PU-FRT', description: 'Kestrel stock front-sump pickup', category: 'oil-pickup', priceCents: 4_200, laborHours: 0.5, fitKind: 'oil-pickups', fitSpecId: IDS.oilPickups.kestrelFront, torqueSpecs: [PICKUP_BOLTS], attributes: SCREEN_HEIGHT }, 2, 'A-02-1'),
  part({ sku: 'TR-4411', description: 'Rear-sump pickup for the TR-4410 pan', category: 'oil-pickup', priceCents: 6_400, laborHours: 0.5, fitKind: 'oil-pickups', fitSpecId: IDS.oilPickups.kestrelRear, torqueSpecs: [{ joint: 'pickup-to-pump', fastener: 'Pickup to pump bolts (M8)', newtonMetres: 25 }, PICKUP_BOLTS], attributes: { 'screen-height.min': 6, 'screen-height.max': 9 } }, 1, 'A-02-2'),
  part({ sku: 'BR-220', description: 'Budget rear-sump pickup, block-bolted', category: 'oil-pickup', priceCents: 2_900, laborHours: 0.5, attributes: { sumpPosition: 'rear', pickupMount: 'block-bolted', pumpInlet: KESTREL_INLET, ...SCREEN_HEIGHT }, torqueSpecs: [PICKUP_BOLTS] }, 4, 'A-02-3'),
  part({ sku: 'KS-PU-CTR', description: 'Kestrel centre-sump pickup', category: 'oil-pickup', priceCents: 4_800, laborHours: 0.5, fitKind: 'oil-pickups', fitSpecId: IDS.oilPickups.kestrelCenter, torqueSpecs: [PICKUP_BOLTS], attributes: SCREEN_HEIGHT }, 1, 'A-02-4'),
  part({ sku: 'KS-OP-STK', description: 'Kestrel stock oil pump', category: 'oil-pump', priceCents: 8_900, laborHours: 1, fitKind: 'oil-pumps', fitSpecId: IDS.oilPumps.kestrelStock, torqueSpecs: [PUMP_BOLTS] }, 1, 'A-03-1'),
  part({ sku: 'TR-OP-HV', description: 'High-volume oil pump, Kestrel', category: 'oil-pump', priceCents: 13_900, laborHours: 1, fitKind: 'oil-pumps', fitSpecId: IDS.oilPumps.kestrelHighVolume, torqueSpecs: [PUMP_BOLTS] }, 1, 'A-03-2'),
  part({ sku: 'WT-4410', description: 'Windage tray for rear-sump Kestrel pans', category: 'windage-tray', priceCents: 7_900, laborHours: 0.5, attributes: { railPattern: KESTREL_RAIL, sumpPosition: 'rear' }, torqueSpecs: [torque('windage-tray-studs', 'Windage tray stud nuts (M8)', 18, 'Centre studs first, then outward')] }, 2, 'A-03-3'),
  part({ sku: 'DS-PL', description: 'Pan-left dipstick and tube', category: 'dipstick', priceCents: 3_900, laborHours: 0.3, attributes: { location: 'pan-left' } }, 3, 'A-03-4'),
  part({ sku: 'TS-T8', description: 'Standalone eight-cylinder controller', category: 'engine-controller', priceCents: 129_500, laborHours: 4, fitKind: 'controllers', fitSpecId: IDS.controllers.tessaryT8, supplierId: DEMO_SUPPLIER_IDS.pinecrest }, 1, 'C-01-1'),
  part({ sku: 'HN-KS', description: 'Kestrel stand-alone wiring harness', category: 'harness', priceCents: 38_900, laborHours: 3, supplierId: DEMO_SUPPLIER_IDS.pinecrest }, 1, 'C-01-2'),
  part({ sku: 'SW-40', description: 'Mount plates, 40 mm', category: 'mount-adapter', priceCents: 12_900, laborHours: 2, fitKind: 'mount-adapters', fitSpecId: IDS.mountAdapters.plates40, supplierId: DEMO_SUPPLIER_IDS.ridgeline, torqueSpecs: [{ joint: 'mount-adapter-to-block', fastener: 'Mount plate to block (M10)', newtonMetres: 50 }] }, 2, 'B-01-1'),
  part({ sku: 'SW-60', description: 'Drop mount plates, 60 mm', category: 'mount-adapter', priceCents: 18_900, laborHours: 2, fitKind: 'mount-adapters', fitSpecId: IDS.mountAdapters.drop60, supplierId: DEMO_SUPPLIER_IDS.ridgeline, torqueSpecs: [{ joint: 'mount-adapter-to-block', fastener: 'Mount plate to block (M10)', newtonMetres: 50 }, { joint: 'engine-mount-through-bolt', fastener: 'Through-bolt (M12)', newtonMetres: 90 }] }, 1, 'B-01-2'),
  part({ sku: 'SW-90', description: 'Heavy mount kit, 90 mm', category: 'mount-adapter', priceCents: 24_900, laborHours: 2.5, fitKind: 'mount-adapters', fitSpecId: IDS.mountAdapters.heavy90, supplierId: DEMO_SUPPLIER_IDS.ridgeline, torqueSpecs: [torque('mount-adapter-to-block', 'Mount kit to block (M10)', 37, 'Upper bolts first, then lower, each side alike'), torque('engine-mount-through-bolt', 'Through-bolt (M12)', 66)] }, 1, 'B-01-3'),
  part({ sku: 'KB-DM5', description: 'KB-1 to DM-5 bellhousing adapter plate', category: 'bellhousing-adapter', priceCents: 42_900, laborHours: 2, fitKind: 'bellhousing-adapters', fitSpecId: IDS.bellhousingAdapters.kb1ToDm5, supplierId: DEMO_SUPPLIER_IDS.ridgeline, torqueSpecs: [torque('bellhousing-adapter-to-block', 'Adapter plate to block (M10)', 37, 'Alternate sides, in two stages')] }, 0, 'B-02-1'),
  part({ sku: 'FP-190', description: 'In-tank injection pump, 190 L/h', category: 'fuel-pump', priceCents: 17_900, laborHours: 1.5, attributes: { flowLph: 190, pressurePsi: 70 }, requiresSkus: ['REG-58'], supplierId: DEMO_SUPPLIER_IDS.pinecrest }, 0, 'D-01-1'),
  part({ sku: 'FP-120', description: 'Inline pump, 120 L/h', category: 'fuel-pump', priceCents: 9_900, laborHours: 1, attributes: { flowLph: 120, pressurePsi: 60 }, supplierId: DEMO_SUPPLIER_IDS.pinecrest }, 2, 'D-01-2'),
  part({ sku: 'REG-58', description: 'Return-style regulator, 58 psi', category: 'fuel-regulator', priceCents: 7_900, laborHours: 0.5, attributes: { pressurePsi: 58 }, requiresSkus: ['FL-KIT'], supplierId: DEMO_SUPPLIER_IDS.pinecrest, torqueSpecs: [torque('fuel-regulator-bracket', 'Regulator bracket bolts (M6)', 7)] }, 3, 'D-01-3'),
  part({ sku: 'FL-KIT', description: 'Injection-rated fuel line kit', category: 'fuel-lines', priceCents: 11_900, laborHours: 1.5, supplierId: DEMO_SUPPLIER_IDS.pinecrest, instructions: 'Relieve fuel pressure first; use only hose and fittings rated for injection pressure.' }, 2, 'D-01-4'),
  part({ sku: 'EP-1', description: 'Electronic throttle pedal assembly', category: 'throttle-pedal', priceCents: 14_900, laborHours: 1, attributes: { type: 'electronic' } }, 1, 'C-02-1'),
  part({ sku: 'RAD-XL', description: 'Crossflow radiator, left inlet, right outlet', category: 'radiator', priceCents: 45_900, laborHours: 2, attributes: { inletSide: 'left', outletSide: 'right', ratedKw: 320 } }, 1, 'E-01-1'),
  part({ sku: 'FX-KS', description: 'Kestrel flexplate', category: 'flexplate-flywheel', priceCents: 11_900, laborHours: 1, torqueSpecs: [{ joint: 'flexplate-to-crank', fastener: 'Flexplate to crank (M11)', newtonMetres: 100, sequence: 'Star pattern, two passes' }] }, 2, 'B-03-1'),
  part({ sku: 'CS-6', description: 'Crank spacer, 6 mm', category: 'crank-spacer', priceCents: 3_500, laborHours: 0.2 }, 3, 'B-03-2'),
  part({ sku: 'PB-KS', description: 'Pilot bearing', category: 'pilot-bearing', priceCents: 1_900, laborHours: 0.3 }, 5, 'B-03-3'),
  part({ sku: 'TX-XM', description: 'Adjustable transmission crossmember', category: 'transmission-crossmember', priceCents: 21_900, laborHours: 2, supplierId: DEMO_SUPPLIER_IDS.ridgeline, torqueSpecs: [torque('transmission-crossmember-to-frame', 'Crossmember to frame (M12)', 50), torque('transmission-mount-to-transmission', 'Mount to transmission (M10)', 37)] }, 1, 'B-04-1'),
  part({ sku: 'DS-SVC', description: 'Driveshaft shorten and balance (service)', category: 'driveshaft-service', priceCents: 24_500, laborHours: 0 }, null),
  part({ sku: 'TS-KS', description: 'Timing set, marks aligned', category: 'cam-timing-set', priceCents: 8_900, laborHours: 4, torqueSpecs: [torque('cam-sprocket', 'Cam sprocket bolts (M8)', 25, 'Alternate bolts, in two stages (snug, then full torque)')] }, 1, 'C-03-1'),
  part({ sku: 'TD-KS', description: 'Timing-chain damper with bushings for the Kestrel block', category: 'timing-chain-damper', priceCents: 2_900, laborHours: 0.5, torqueSpecs: [torque('timing-chain-damper', 'Damper bolts (M6)', 9)] }, 2, 'C-03-2'),
  part({ sku: 'TN-6', description: 'Belt tensioner, six-rib', category: 'tensioner', priceCents: 6_900, laborHours: 0.5, torqueSpecs: [torque('tensioner-mount', 'Tensioner mounting bolt (M10)', 37)] }, 1, 'C-03-3'),
  part({ sku: 'FN-16', description: '16 in electric fan with shroud', category: 'fan', priceCents: 15_900, laborHours: 1.5 }, 1, 'E-01-2'),
  part({ sku: 'HS-XO', description: 'Crossover coolant hose set', category: 'hoses', priceCents: 5_900, laborHours: 1 }, 2, 'E-01-3'),
  part({ sku: 'EX-SH', description: 'Shorty headers, pair', category: 'exhaust', priceCents: 39_900, laborHours: 4, torqueSpecs: [torque('exhaust-header-flange', 'Header flange bolts (M8)', 18, 'Centre bolts first, then outward, in two stages')] }, 0, 'E-02-1'),
];
