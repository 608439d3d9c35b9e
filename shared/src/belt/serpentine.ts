import { mmWithInches } from '../units/figure-format';

/**
 * Length of a belt around several pulleys, grooved side or back side, from the pulley centres.
 * Derived: walk the pulleys in belt order around a counter-clockwise loop; signed radius a = +r where the
 * grooved side wraps the pulley, −r for a back-side idler. For consecutive centres Cᵢ → Cⱼ at distance d and
 * heading β the tangent heading is θ = β + asin((aᵢ − aⱼ)/d), with tangent points Cᵢ + aᵢ·n̂ and Cⱼ + aⱼ·n̂,
 * n̂ = (sin θ, −cos θ), and the run is √(d² − (aᵢ − aⱼ)²) long. The wrap at a pulley is the change of tangent
 * heading (negative on a back-side idler); the arc is r·|wrap|. Signed wraps of a real belt sum to +360°,
 * and each back-side wrap lies in (−180°, 0).
 */
export interface BeltPulley {
  id: string;
  /** Centre in a plane seen from the belt's front, x right, y up. */
  x: number;
  y: number;
  diameter: number;
  side: 'grooved' | 'back';
}

export interface BeltRun {
  fromId: string;
  toId: string;
  length: number;
  start: { x: number; y: number };
  end: { x: number; y: number };
}

export interface BeltWrap {
  pulleyId: string;
  /** Signed wrap, degrees: positive on the grooved side, negative on a back-side idler. */
  wrapDeg: number;
  arcLength: number;
}

export interface SerpentineLayout {
  ok: true;
  length: number;
  runs: BeltRun[];
  wraps: BeltWrap[];
  /** The order the layout was computed in: `given`, or `reversed` when the pulleys were listed clockwise. */
  order: 'given' | 'reversed';
}

export type SerpentineRefusalCode = 'too-few-pulleys' | 'bad-pulley' | 'pulleys-overlap' | 'idler-not-touching' | 'not-a-loop';

export interface SerpentineRefusal {
  ok: false;
  code: SerpentineRefusalCode;
  /** The pulley the layout fails at, when there is one. */
  pulleyId?: string;
  message: string;
}

export type SerpentineResult = SerpentineLayout | SerpentineRefusal;

export interface SerpentineOptions {
  /** `ccw` (default): the pulleys are listed counter-clockwise; `either`: also try the reverse order. */
  orientation?: 'ccw' | 'either';
}

const TWO_PI = 2 * Math.PI;
const LOOP_TOLERANCE_RAD = 1e-6;

export function serpentineLength(pulleys: readonly BeltPulley[], options: SerpentineOptions = {}): SerpentineResult {
  const given = walkLoop(pulleys, 'given');
  if (given.ok || options.orientation !== 'either' || given.code === 'too-few-pulleys' || given.code === 'bad-pulley') {
    return given;
  }
  const reversed = walkLoop([...pulleys].reverse(), 'reversed');
  return reversed.ok ? reversed : given;
}

function walkLoop(pulleys: readonly BeltPulley[], order: SerpentineLayout['order']): SerpentineResult {
  const count = pulleys.length;
  if (count < 2) return { ok: false, code: 'too-few-pulleys', message: 'A belt needs at least two pulleys.' };
  for (const pulley of pulleys) {
    if (!(pulley.diameter > 0) || !Number.isFinite(pulley.x) || !Number.isFinite(pulley.y)) {
      return { ok: false, code: 'bad-pulley', pulleyId: pulley.id, message: `Pulley ${pulley.id} needs a positive diameter and a finite centre.` };
    }
  }
  if (pulleys.every((pulley) => pulley.side === 'back')) {
    return { ok: false, code: 'not-a-loop', message: 'At least one pulley must run on the grooved side of the belt.' };
  }
  const signed = pulleys.map((pulley) => (pulley.side === 'grooved' ? 1 : -1) * (pulley.diameter / 2));
  const headings: number[] = [];
  const runs: BeltRun[] = [];
  for (let i = 0; i < count; i += 1) {
    const j = (i + 1) % count;
    const from = pulleys[i];
    const to = pulleys[j];
    const dx = to.x - from.x;
    const dy = to.y - from.y;
    const distance = Math.hypot(dx, dy);
    const radiusSum = from.diameter / 2 + to.diameter / 2;
    if (distance < radiusSum) {
      return { ok: false, code: 'pulleys-overlap', pulleyId: to.id, message: `Pulleys ${from.id} and ${to.id} overlap: their centres are ${mmWithInches(distance)} apart, their radii add to ${mmWithInches(radiusSum)}.` };
    }
    const offset = signed[i] - signed[j];
    const theta = Math.atan2(dy, dx) + Math.asin(offset / distance);
    const nx = Math.sin(theta);
    const ny = -Math.cos(theta);
    headings.push(theta);
    runs.push({
      fromId: from.id,
      toId: to.id,
      length: Math.sqrt(distance * distance - offset * offset),
      start: { x: from.x + signed[i] * nx, y: from.y + signed[i] * ny },
      end: { x: to.x + signed[j] * nx, y: to.y + signed[j] * ny },
    });
  }
  const wraps: BeltWrap[] = [];
  let wrapSum = 0;
  for (let j = 0; j < count; j += 1) {
    const pulley = pulleys[j];
    const incoming = headings[(j - 1 + count) % count];
    const outgoing = headings[j];
    let wrap = normalise(outgoing - incoming);
    if (pulley.side === 'back') {
      if (wrap > 0) wrap -= TWO_PI;
      if (!(wrap > -Math.PI && wrap < 0)) {
        return { ok: false, code: 'idler-not-touching', pulleyId: pulley.id, message: `Back-side idler ${pulley.id} does not press on the belt run between its neighbours: move it into the run or remove it.` };
      }
    } else if (wrap <= 0) {
      return { ok: false, code: 'not-a-loop', pulleyId: pulley.id, message: `The belt does not wrap pulley ${pulley.id} on its grooved side in this order: check the pulley order and sides.` };
    }
    wrapSum += wrap;
    wraps.push({ pulleyId: pulley.id, wrapDeg: (wrap * 180) / Math.PI, arcLength: (pulley.diameter / 2) * Math.abs(wrap) });
  }
  if (Math.abs(wrapSum - TWO_PI) > LOOP_TOLERANCE_RAD) {
    return { ok: false, code: 'not-a-loop', message: `The pulleys in this order do not make one counter-clockwise belt loop (wraps add to ${((wrapSum * 180) / Math.PI).toFixed(1)}°, not 360°).` };
  }
  const length = runs.reduce((sum, run) => sum + run.length, 0) + wraps.reduce((sum, w) => sum + w.arcLength, 0);
  return { ok: true, length, runs, wraps, order };
}

/** Into [0, 2π). */
function normalise(angle: number): number {
  const turned = angle % TWO_PI;
  return turned < 0 ? turned + TWO_PI : turned;
}
