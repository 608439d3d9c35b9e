import { formatDegrees, formatFigure, mmWithInches } from '../units/figure-format';
import type { PartAttributeValue } from './part-attributes';

/**
 * Plain words for the fitment attributes of parts and the requirements of part remedies: the one table the
 * plan's explanations, the catalog needs of a shortfall and the fit report's "add one to the catalog with" read,
 * so the API, the printed quote and the web say the same thing. Figures are written by the engine's own
 * formatters (`1214.0 mm (47.80 in)`, `140 L/h`, `58 psi`, `120 kW`, `2.00°`), which the web reads back and shows
 * in the person's unit system (`renderText`).
 */
export interface AttributeWording {
  /** What the attribute is, for "must agree on the sump position and the pickup mounting". */
  noun: string;
  /** The attribute with its value, as a person says it: "sump at the rear", "rated at least 120 kW". */
  says: (value: PartAttributeValue) => string;
}

/** A figure with as many decimals as it was given (at most one): `140 L/h`, `137.5 L/h`. */
function figure(value: PartAttributeValue, unit: string): string {
  const n = Number(value);
  return formatFigure(n, unit, { decimals: Number.isInteger(n) ? 0 : 1 });
}

const length = (value: PartAttributeValue) => mmWithInches(Number(value));
const list = (value: PartAttributeValue, joiner = ' or ') => (Array.isArray(value) ? value.join(joiner) : String(value));
const article = (word: string) => (/^[aeiou]/i.test(word) ? 'an' : 'a');

const SUMP_WORDS: Record<string, string> = {
  front: 'sump at the front',
  center: 'sump in the center',
  rear: 'sump at the rear',
  dual: 'sumps front and rear',
};

const PICKUP_MOUNT_WORDS: Record<string, string> = {
  'pump-bolted': 'pickup bolted to the pump',
  'block-bolted': 'pickup bolted to the block',
  'press-in': 'press-in pickup',
};

/** `block-left` → "left side of the block", `pan-right` → "right side of the pan". */
function dipstickPlace(location: string): string {
  const match = /^(block|pan)-(left|right)$/.exec(location);
  return match ? `${match[2]} side of the ${match[1]}` : location;
}

const sump = (value: PartAttributeValue) => list(value, '/').split('/').map((v) => SUMP_WORDS[v] ?? `sump position ${v}`).join(' or ');
const pickupMount = (value: PartAttributeValue) => list(value, '/').split('/').map((v) => PICKUP_MOUNT_WORDS[v] ?? `pickup mounting ${v}`).join(' or ');

export const ATTRIBUTE_WORDS: Record<string, AttributeWording> = {
  // oiling
  sumpPosition: { noun: 'sump position', says: sump },
  pickupMount: { noun: 'pickup mounting', says: pickupMount },
  mount: { noun: 'pickup mounting', says: pickupMount },
  pumpInlet: { noun: 'pump inlet', says: (v) => `pump inlet ${list(v)}` },
  inlet: { noun: 'pump inlet', says: (v) => `pump inlet ${list(v)}` },
  railPattern: { noun: 'pan rail', says: (v) => `for the ${list(v)} pan rail` },
  dipstickProvision: {
    noun: 'dipstick provision',
    says: (v) => `room for a dipstick on the ${list(v, '/').split('/').map(dipstickPlace).join(' or ')}`,
  },
  location: { noun: 'dipstick location', says: (v) => `dipstick on the ${dipstickPlace(String(v))}` },
  speedLimitRpm: { noun: 'speed limit', says: (v) => `rated to ${v} rpm` },
  minSpeedLimitRpm: { noun: 'speed limit', says: (v) => `rated to at least ${v} rpm` },
  highVolume: { noun: 'volume', says: (v) => (v ? 'high volume' : 'standard volume') },
  screenU: { noun: 'screen position', says: (v) => `screen ${length(v)} forward of the block's rear face` },
  screenHeightAboveFloorMm: { noun: 'screen height', says: (v) => `screen ${length(v)} above the sump floor` },
  maxDepthBelowRailMm: { noun: 'depth', says: (v) => `at most ${length(v)} deep below the pan rail` },
  maxFrontFaceU: { noun: 'front face', says: (v) => `front face at most ${length(v)} forward of the block's rear face` },
  // engine management
  crankSignal: { noun: 'crank signal', says: (v) => `reads ${article(String(v))} ${v} crank signal` },
  camSignal: { noun: 'cam signal', says: (v) => `reads ${article(String(v))} ${v} cam signal` },
  crankSignals: { noun: 'crank signals', says: (v) => `reads ${list(v, ', ')} crank signals` },
  camSignals: { noun: 'cam signals', says: (v) => `reads ${list(v, ', ')} cam signals` },
  throttle: { noun: 'throttle', says: (v) => `drives ${article(String(v))} ${v} throttle` },
  throttles: { noun: 'throttles', says: (v) => `drives ${list(v)} throttles` },
  type: { noun: 'throttle type', says: (v) => `for ${article(String(v))} ${v} throttle` },
  minCylinders: { noun: 'cylinders', says: (v) => `runs at least ${v} cylinders` },
  maxCylinders: { noun: 'cylinders', says: (v) => `runs up to ${v} cylinders` },
  // mounts and drivetrain
  maxDxMm: { noun: 'fore-and-aft reach', says: (v) => `bridges up to ${length(v)} fore and aft` },
  maxDzMm: { noun: 'height reach', says: (v) => `bridges up to ${length(v)} up or down` },
  maxDyMm: { noun: 'sideways reach', says: (v) => `bridges up to ${length(v)} sideways` },
  enginePattern: { noun: 'engine bolt pattern', says: (v) => `${v} bolt pattern on the engine side` },
  transmissionPattern: { noun: 'transmission bolt pattern', says: (v) => `${v} bolt pattern on the transmission side` },
  thicknessMm: { noun: 'thickness', says: (v) => `${length(v)} thick` },
  offsetXMm: { noun: 'offset', says: (v) => `offset ${length(v)}` },
  spacerMm: { noun: 'spacer', says: (v) => `spacer ${length(v)}` },
  lengthMm: { noun: 'length', says: (v) => `length ${length(v)}` },
  minSlipYokeEngagementMm: { noun: 'slip-yoke engagement', says: (v) => `slip-yoke engagement at least ${length(v)}` },
  minCriticalSpeedRpm: { noun: 'critical speed', says: (v) => `critical speed at least ${v} rpm` },
  maxHalfWidthMm: { noun: 'half-width', says: (v) => `half-width at most ${length(v)}` },
  side: { noun: 'side', says: (v) => `on the ${v} side` },
  // fuel
  flowLph: { noun: 'flow', says: (v) => `flows ${figure(v, 'L/h')}` },
  minFlowLph: { noun: 'flow', says: (v) => `flow at least ${figure(v, 'L/h')}` },
  pressurePsi: { noun: 'pressure', says: (v) => `rated for ${figure(v, 'psi')}` },
  minPressurePsi: { noun: 'pressure', says: (v) => `rated for at least ${figure(v, 'psi')}` },
  minFlowLbh: { noun: 'flow', says: (v) => `flow at least ${figure(v, 'lb/h')}` },
  atPsi: { noun: 'rating pressure', says: (v) => `at ${figure(v, 'psi')}` },
  count: { noun: 'count', says: (v) => `a set of ${v}` },
  // cooling
  ratedKw: { noun: 'rating', says: (v) => `rated ${figure(v, 'kW')}` },
  minRatedKw: { noun: 'rating', says: (v) => `rated at least ${figure(v, 'kW')}` },
  inletSide: { noun: 'inlet side', says: (v) => `inlet on the ${v}` },
  outletSide: { noun: 'outlet side', says: (v) => `outlet on the ${v}` },
  electricFan: { noun: 'electric fan', says: (v) => (v ? 'with an electric fan' : 'without an electric fan') },
  // belt and cam
  ribs: { noun: 'ribs', says: (v) => `${v} ribs` },
  effectiveLengthMm: { noun: 'length', says: (v) => `effective length ${length(v)}` },
  minLengthMm: { noun: 'length', says: (v) => `length at least ${length(v)}` },
  maxLengthMm: { noun: 'length', says: (v) => `length at most ${length(v)}` },
  designation: { noun: 'size', says: (v) => `size ${v}` },
  advanceDeg: { noun: 'advance', says: (v) => `${formatDegrees(Number(v))} advance` },
  fabricationHours: { noun: 'fabrication', says: (v) => `${v} h of fabrication` },
};

/** `someNewKey` → "some new key", for a key the table does not know yet. */
function keyWords(key: string): string {
  return key.replace(/([a-z0-9])([A-Z])/g, '$1 $2').toLowerCase();
}

/** What an attribute is: "sump position", "pickup mounting". */
export function attributeNoun(key: string): string {
  return ATTRIBUTE_WORDS[key]?.noun ?? keyWords(key);
}

/** One attribute or requirement in plain words: "sump at the rear", "rated at least 120 kW", "length at least 1214.0 mm (47.80 in)". */
export function describeAttribute(key: string, value: PartAttributeValue): string {
  const wording = ATTRIBUTE_WORDS[key];
  if (wording) return wording.says(value);
  const shown = typeof value === 'boolean' ? (value ? 'yes' : 'no') : Array.isArray(value) ? value.join(' or ') : String(value);
  return `${keyWords(key)} ${shown}`;
}

/** Several attributes or requirements in plain words, joined with commas. */
export function describeAttributeList(entries: Iterable<[string, PartAttributeValue]>): string {
  return [...entries].map(([key, value]) => describeAttribute(key, value)).join(', ');
}
