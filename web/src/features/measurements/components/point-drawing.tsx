import type { MeasurementPoint } from '../types';

/** The drawing's scale: a schematic truck of about this wheelbase, its frame this high. */
const WHEELBASE_MM = 2900;
const W = 168;
const H = 84;
const GROUND_Y = 74;
const X0_MM = -800;
const X1_MM = 3400;
const Z_TOP_MM = 1300;
const px = (xMm: number) => ((xMm - X0_MM) / (X1_MM - X0_MM)) * W;
const pz = (zMm: number) => GROUND_Y - (zMm / Z_TOP_MM) * (GROUND_Y - 6);

const MARK = '#cf1322';
const BODY = '#8c8c8c';

/** Where a point sits along the truck, mm behind the front axle line (a typical spot when the point does not say). */
function stationMm(point: Pick<MeasurementPoint, 'kind' | 'atX' | 'catalogValue' | 'target' | 'reference'>): number {
  if (point.atX !== undefined) return point.atX;
  if (point.reference === 'front-axle-behind' && point.catalogValue !== null) return point.catalogValue;
  if (point.reference === 'front-axle-ahead' && point.catalogValue !== null) return -point.catalogValue;
  switch (point.kind) {
    case 'mount-pad-height':
      return 310;
    case 'radiator-core-top':
    case 'radiator-core-bottom':
      return -190;
    case 'transmission-crossmember-height':
      return 1400;
    case 'pinion-height':
    case 'pinion-angle':
      return WHEELBASE_MM - 250;
    default:
      return 200;
  }
}

/** A typical height for a point of this kind when the catalog gives none. */
function heightMm(point: Pick<MeasurementPoint, 'kind' | 'catalogValue' | 'reference'>): number {
  if (point.reference === 'floor' && point.catalogValue !== null) return point.catalogValue;
  switch (point.kind) {
    case 'obstacle-front-face':
    case 'obstacle-rear-face':
      return 320;
    case 'mount-pad-setback':
      return 440;
    case 'radiator-core-face':
      return 650;
    case 'transmission-crossmember-setback':
      return 340;
    default:
      return 360;
  }
}

function SideTruck() {
  const rail = pz(370);
  return (
    <g stroke={BODY} fill="none" strokeWidth={1}>
      <line x1={0} y1={GROUND_Y} x2={W} y2={GROUND_Y} />
      <circle cx={px(0)} cy={GROUND_Y - 11} r={11} />
      <circle cx={px(WHEELBASE_MM)} cy={GROUND_Y - 11} r={11} />
      <line x1={px(-700)} y1={rail} x2={px(3300)} y2={rail} strokeWidth={2} />
      {/* hood and cab outline */}
      <polyline points={`${px(-700)},${pz(900)} ${px(-650)},${pz(1100)} ${px(800)},${pz(1160)} ${px(900)},${pz(1250)} ${px(1500)},${pz(1250)} ${px(1600)},${rail}`} />
      {/* front crossmember */}
      <rect x={px(90)} y={pz(355)} width={px(290) - px(90)} height={pz(252) - pz(355)} />
    </g>
  );
}

function FrontRails({ label }: { label: string }) {
  const left = W / 2 - 44;
  const right = W / 2 + 44;
  return (
    <g>
      <g stroke={BODY} fill="none" strokeWidth={1}>
        <line x1={0} y1={GROUND_Y} x2={W} y2={GROUND_Y} />
        <rect x={left - 8} y={30} width={8} height={18} />
        <rect x={right} y={30} width={8} height={18} />
        <rect x={8} y={GROUND_Y - 30} width={14} height={30} rx={3} />
        <rect x={W - 22} y={GROUND_Y - 30} width={14} height={30} rx={3} />
      </g>
      <g stroke={MARK} strokeWidth={2} fill={MARK}>
        <line x1={left} y1={39} x2={right} y2={39} />
        <polygon points={`${left},39 ${left + 6},35 ${left + 6},43`} />
        <polygon points={`${right},39 ${right - 6},35 ${right - 6},43`} />
      </g>
      <text x={W / 2} y={24} textAnchor="middle" fontSize={11} fill={MARK}>
        {label}
      </text>
    </g>
  );
}

/**
 * A small drawing marking where the tape goes for a point: a side view with the reading drawn as a red dimension
 * (floor up to the point, or from the plumb line under the front hub fore or aft), or a front view across the rails.
 */
export function PointDrawing({ point }: { point: Pick<MeasurementPoint, 'kind' | 'atX' | 'catalogValue' | 'target' | 'reference' | 'view' | 'label'> }) {
  const common = { width: W, height: H, viewBox: `0 0 ${W} ${H}`, role: 'img', 'aria-label': `Where to measure: ${point.label}`, className: 'point-drawing' } as const;
  if (point.reference === 'across') {
    return (
      <svg {...common}>
        <FrontRails label={point.kind === 'mount-pad-spacing' ? 'pad to pad' : 'inside to inside'} />
      </svg>
    );
  }
  const x = px(stationMm(point));
  const z = pz(heightMm(point));
  const axle = px(0);
  return (
    <svg {...common}>
      <SideTruck />
      <g stroke={MARK} strokeWidth={2} fill={MARK}>
        {point.reference === 'floor' && (
          <>
            <line x1={x} y1={GROUND_Y} x2={x} y2={z} />
            <polygon points={`${x},${z} ${x - 4},${z + 6} ${x + 4},${z + 6}`} />
          </>
        )}
        {(point.reference === 'front-axle-behind' || point.reference === 'front-axle-ahead') && (
          <>
            <line x1={axle} y1={z} x2={axle} y2={GROUND_Y} strokeDasharray="3 2" strokeWidth={1} />
            <line x1={axle} y1={z} x2={x} y2={z} />
            <polygon points={x > axle ? `${x},${z} ${x - 6},${z - 4} ${x - 6},${z + 4}` : `${x},${z} ${x + 6},${z - 4} ${x + 6},${z + 4}`} />
          </>
        )}
        {point.reference === 'level' && (
          <>
            <line x1={x - 16} y1={z} x2={x + 16} y2={z} strokeWidth={1} strokeDasharray="3 2" />
            <line x1={x - 16} y1={z + 5} x2={x + 16} y2={z - 5} />
            <path d={`M ${x + 10} ${z} A 10 10 0 0 0 ${x + 9.5} ${z - 3}`} fill="none" strokeWidth={1.5} />
          </>
        )}
        <circle cx={x} cy={z} r={3} />
      </g>
    </svg>
  );
}
