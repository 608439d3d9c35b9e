import type { Finding, FitSpec, FitWindow, Placement } from '@swapwright/shared';
import { Flex, Typography } from 'antd';
import { useId, useMemo, useRef } from 'react';
import { palette } from '@/config/theme';
import { useUnits } from '@/hooks/use-units';
import { placeLabels, segmentBoxes, wrapLabel, type Box, type LabelRequest } from '../lib/label-placement';
import { buildSideScene, type GapDimension } from '../lib/side-scene';
import type { Pt } from '../lib/scene-geometry';
import { statusColors } from '@/components/check-status-tag';
import { DRAWING_TEXT_PX, DrawingLabel, drawingScale, useRenderedWidth } from './drawing-label';

const MAX_HEIGHT_PX = 560;
/** On a phone the side view keeps this width and scrolls sideways, so its labels do not pile up. */
const MIN_DRAWING_PX = 640;

export type SideViewProps = {
  spec: FitSpec;
  findings?: readonly Finding[];
  /** The band of crank heights over setback where every clearance passes. */
  window?: FitWindow | null;
  /** The placement the fit window proposes. */
  proposed?: Placement | null;
  /** How many of the tightest clearances to dimension. */
  maxDimensions?: number;
};

const colors = {
  obstacle: '#8c969a',
  obstacleStroke: '#4d585c',
  structure: '#6b5a4a',
  hood: palette.teal800,
  radiator: palette.brass500,
  block: palette.teal100,
  blockStroke: palette.teal600,
  profile: palette.teal700,
  pan: palette.oxide100,
  panStroke: palette.oxide500,
  trans: '#ece6d8',
  transStroke: '#8a7a5a',
  window: palette.teal500,
  ground: palette.ink,
};

const legend: Array<{ key: string; label: string; swatch: { fill: string; stroke: string; dash?: string } }> = [
  { key: 'obstacle', label: 'Chassis obstacle', swatch: { fill: colors.obstacle, stroke: colors.obstacleStroke } },
  { key: 'hood', label: 'Hood underside', swatch: { fill: 'none', stroke: colors.hood, dash: '6 4' } },
  { key: 'radiator', label: 'Radiator core', swatch: { fill: colors.radiator, stroke: colors.radiator } },
  { key: 'block', label: 'Engine, top and rear profile', swatch: { fill: colors.block, stroke: colors.blockStroke } },
  { key: 'pan', label: 'Oil pan', swatch: { fill: colors.pan, stroke: colors.panStroke } },
  { key: 'trans', label: 'Bellhousing and transmission', swatch: { fill: colors.trans, stroke: colors.transStroke } },
  { key: 'window', label: 'Fit window: crank heights that clear', swatch: { fill: colors.window, stroke: colors.window, dash: '4 3' } },
];

export function LegendSwatch({ fill, stroke, dash }: { fill: string; stroke: string; dash?: string }) {
  return (
    <svg width="22" height="12" aria-hidden="true" style={{ flex: 'none' }}>
      <rect x="1" y="1" width="20" height="10" rx="2" fill={fill} fillOpacity={fill === 'none' ? 0 : 0.55} stroke={stroke} strokeWidth="1.5" strokeDasharray={dash} />
    </svg>
  );
}

/** Side view of the chassis and the placed engine: front to the left, up is up, clearances dimensioned. */
export function SideView({ spec, findings = [], window, proposed, maxDimensions = 5 }: SideViewProps) {
  const units = useUnits();
  const uid = useId().replace(/:/g, '');
  const scene = useMemo(() => buildSideScene(spec, findings, maxDimensions), [spec, findings, maxDimensions]);

  const windowBands = useMemo(() => {
    if (!window) return [] as Pt[][];
    const bands: Pt[][] = [];
    let run: typeof window.columns = [];
    const flush = () => {
      if (run.length > 0) {
        const top = run.map((c) => ({ x: c.setbackMm, z: c.highMm as number }));
        const bottom = [...run].reverse().map((c) => ({ x: c.setbackMm, z: c.lowMm as number }));
        bands.push([...top, ...bottom]);
      }
      run = [];
    };
    for (const col of window.columns) {
      if (col.feasible && col.lowMm !== null && col.highMm !== null && Number.isFinite(col.highMm)) run.push(col);
      else flush();
    }
    flush();
    return bands;
  }, [window]);

  const b = scene.bounds;
  const width = b.xMax - b.xMin;
  const height = b.zMax - b.zMin;
  const pad = Math.max(width, height) * 0.06;
  const vbW = width + 2 * pad;
  const vbH = height + 2 * pad;
  const X = (x: number) => x - b.xMin + pad;
  const Y = (z: number) => b.zMax - z + pad;
  // line weights and markers follow the drawing; text follows the screen, so it stays readable when the drawing shrinks
  const fs = Math.max(vbW, vbH) / 62;
  const sw = fs / 7;
  // measured on the drawing itself: on a phone it keeps MIN_DRAWING_PX and scrolls sideways in its frame
  const drawingRef = useRef<HTMLDivElement>(null);
  const scale = drawingScale(useRenderedWidth(drawingRef), vbW, vbH, MAX_HEIGHT_PX);
  const text = { note: DRAWING_TEXT_PX.note / scale, name: DRAWING_TEXT_PX.name / scale, figure: DRAWING_TEXT_PX.figure / scale };
  const pts = (p: readonly Pt[]) => p.map((q) => `${X(q.x).toFixed(1)},${Y(q.z).toFixed(1)}`).join(' ');
  const origin = scene.crank.origin;

  const dimLabel = (d: GapDimension) => (d.valueMm < 0 ? `overlap ${units.formatLength(-d.valueMm)}` : units.formatLength(d.valueMm));

  const labels = useMemo(() => {
    const wrapAt = Math.max(vbW * 0.3, text.name * 6);
    const requests: LabelRequest[] = [];
    const avoid: Box[] = [];
    // the figures first: they sit on their dimension line and matter most
    for (const d of scene.dimensions) {
      const from = { x: X(d.from.x), y: Y(d.from.z) };
      const to = { x: X(d.to.x), y: Y(d.to.z) };
      const vertical = Math.abs(to.y - from.y) >= Math.abs(to.x - from.x);
      requests.push({ id: `dim:${d.checkId}`, anchor: { x: (from.x + to.x) / 2, y: (from.y + to.y) / 2 }, lines: [dimLabel(d)], fontSize: text.figure, bold: true, prefer: vertical ? ['right', 'left'] : ['above', 'below'] });
      avoid.push(...segmentBoxes(from, to, sw * 4));
    }
    // labels tied to the frame of the drawing next, then the names of things
    requests.push({ id: 'axle', anchor: { x: X(0), y: Y(b.zMax) - pad * 0.5 }, lines: ['front axle'], fontSize: text.note, prefer: ['right', 'below-right'] });
    requests.push({ id: 'ground', anchor: { x: fs * 0.3, y: Y(0) }, lines: ['ground at ride height'], fontSize: text.note, prefer: ['above-right'] });
    for (const o of scene.obstacles) {
      if (o.outline.length === 0) continue;
      // small obstacles that sit close together (link, axle, crossmember): names keep off all of them
      const xs = o.outline.map((p) => X(p.x));
      const ys = o.outline.map((p) => Y(p.z));
      const box = { x: Math.min(...xs), y: Math.min(...ys), w: Math.max(...xs) - Math.min(...xs), h: Math.max(...ys) - Math.min(...ys) };
      if (box.w < vbW * 0.15 && box.h < vbH * 0.15) avoid.push(box);
    }
    for (const o of scene.obstacles) {
      if (o.outline.length === 0) continue;
      const top = o.outline.reduce((t, p) => (p.z > t.z ? p : t), o.outline[0]);
      const cx = o.outline.reduce((sum, p) => sum + p.x, 0) / o.outline.length;
      requests.push({ id: `obstacle:${o.id}`, anchor: { x: X(cx), y: Y(top.z) }, lines: wrapLabel(o.name, text.name, wrapAt), fontSize: text.name, prefer: ['above', 'above-right', 'above-left'] });
    }
    if (scene.hoodLine.length > 1) requests.push({ id: 'hood', anchor: { x: X(scene.hoodLine[0].x), y: Y(scene.hoodLine[0].z) }, lines: ['hood'], fontSize: text.name, prefer: ['above-right', 'above'] });
    if (scene.radiator) requests.push({ id: 'radiator', anchor: { x: X(scene.radiator.x) - fs * 0.45, y: Y(scene.radiator.zTo) }, lines: ['radiator'], fontSize: text.name, prefer: ['above', 'above-left'] });
    const originAt = { x: X(origin.x), y: Y(origin.z) };
    avoid.push({ x: originAt.x - fs, y: originAt.y - fs, w: fs * 2, h: fs * 2 });
    requests.push({
      id: 'origin',
      anchor: originAt,
      lines: wrapLabel(`crank origin ${units.formatLength(origin.x)} back, ${units.formatLength(origin.z)} up`, text.note, wrapAt),
      fontSize: text.note,
      prefer: ['below-right', 'below', 'below-left'],
    });
    const placed = placeLabels(requests, { bounds: { x: 0, y: 0, w: vbW, h: vbH }, avoid });
    return new Map(placed.map((l) => [l.id, l]));
  }, [scene, vbW, vbH, scale, units]);

  const halo = text.name / 4;
  const labelOf = (id: string, fill: string, bold = false) => {
    const l = labels.get(id);
    return l ? <DrawingLabel label={l} fill={fill} bold={bold} halo={halo} leaderWidth={sw} /> : null;
  };

  return (
    <figure className="fit-side-view" data-testid="side-view" style={{ margin: 0 }}>
      {/* above the frame, where it is read before the cut-off right edge, not under a drawing taller than the screen */}
      <Typography.Text type="secondary" className="drawing-scroll-hint" style={{ fontSize: 12 }}>
        Swipe the drawing sideways to see all of it.
      </Typography.Text>
      <div className="drawing-scroll" data-testid="side-view-scroll">
        <div ref={drawingRef} style={{ minWidth: MIN_DRAWING_PX }}>
          <svg
            viewBox={`0 0 ${vbW.toFixed(0)} ${vbH.toFixed(0)}`}
            width="100%"
            role="img"
            aria-labelledby={`${uid}-title ${uid}-desc`}
            style={{ display: 'block', background: '#fbfaf7', border: `1px solid ${palette.line}`, borderRadius: 6, maxHeight: MAX_HEIGHT_PX }}
          >
            <title id={`${uid}-title`}>Side view of the engine in the chassis</title>
            <desc id={`${uid}-desc`}>
              Front of the vehicle to the left. {scene.dimensions.map((d) => `${d.title}: ${dimLabel(d)}.`).join(' ')}
            </desc>
            <defs>
              <marker id={`${uid}-arrow`} viewBox="0 0 10 10" refX="9" refY="5" markerWidth="6" markerHeight="6" orient="auto-start-reverse">
                <path d="M0,0 L10,5 L0,10 z" fill="context-stroke" />
              </marker>
              <pattern id={`${uid}-hatch`} width={fs / 2} height={fs / 2} patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
                <line x1="0" y1="0" x2="0" y2={fs / 2} stroke={colors.obstacleStroke} strokeWidth={sw} strokeOpacity="0.5" />
              </pattern>
            </defs>

            {/* ground */}
            <g data-testid="side-ground">
              <rect x={0} y={Y(0)} width={vbW} height={pad} fill={`url(#${uid}-hatch)`} opacity="0.6" />
              <line x1={0} x2={vbW} y1={Y(0)} y2={Y(0)} stroke={colors.ground} strokeWidth={sw * 1.5} />
            </g>

            {/* front axle centerline */}
            <line x1={X(0)} x2={X(0)} y1={Y(b.zMax) - pad * 0.5} y2={Y(0)} stroke={palette.inkMuted} strokeWidth={sw} strokeDasharray={`${fs} ${fs / 3} ${fs / 6} ${fs / 3}`} />

            {/* fit window */}
            {windowBands.map((band, i) => (
              <polygon
                key={i}
                data-testid="side-fit-window"
                points={pts(band)}
                fill={colors.window}
                fillOpacity="0.16"
                stroke={colors.window}
                strokeWidth={sw}
                strokeDasharray={`${fs / 2} ${fs / 3}`}
              />
            ))}

            {/* hood line */}
            {scene.hoodLine.length > 1 && (
              <g data-testid="side-hood">
                <polyline points={pts(scene.hoodLine)} fill="none" stroke={colors.hood} strokeWidth={sw * 2} strokeDasharray={`${fs / 1.5} ${fs / 3}`} />
              </g>
            )}

            {/* radiator core */}
            {scene.radiator && (
              <g data-testid="side-radiator">
                <rect
                  x={X(scene.radiator.x) - fs * 0.9}
                  y={Y(scene.radiator.zTo)}
                  width={fs * 0.9}
                  height={scene.radiator.zTo - scene.radiator.zFrom}
                  fill={colors.radiator}
                  fillOpacity="0.5"
                  stroke={colors.radiator}
                  strokeWidth={sw}
                />
              </g>
            )}

            {/* chassis obstacles */}
            {scene.obstacles.map((o) => {
              const structural = o.kind === 'firewall' || o.kind === 'tunnel';
              return (
                <g key={o.id} data-testid={`side-obstacle-${o.id}`}>
                  <title>{o.name}</title>
                  <polygon
                    points={pts(o.outline)}
                    fill={structural ? colors.structure : colors.obstacle}
                    fillOpacity={structural ? 0.25 : 0.45}
                    stroke={structural ? colors.structure : colors.obstacleStroke}
                    strokeWidth={sw * 1.3}
                  />
                </g>
              );
            })}

            {/* transmission */}
            {scene.transmission && (
              <polygon data-testid="side-transmission" points={pts(scene.transmission)} fill={colors.trans} fillOpacity="0.8" stroke={colors.transStroke} strokeWidth={sw * 1.3} />
            )}

            {/* engine block, top and rear profiles */}
            <g data-testid="side-engine">
              <polygon points={pts(scene.block)} fill={colors.block} fillOpacity="0.75" stroke="none" />
              <polyline points={pts(scene.topProfile)} fill="none" stroke={colors.profile} strokeWidth={sw * 2.2} strokeLinejoin="round" />
              <polyline points={pts(scene.rearProfile)} fill="none" stroke={colors.profile} strokeWidth={sw * 2.2} strokeLinejoin="round" />
              <line
                x1={X(scene.fanFace[0].x)}
                y1={Y(scene.fanFace[0].z)}
                x2={X(scene.fanFace[1].x)}
                y2={Y(scene.fanFace[1].z)}
                stroke={colors.profile}
                strokeWidth={sw * 3}
                strokeLinecap="round"
              />
            </g>

            {/* oil pan */}
            {scene.pan && <polygon data-testid="side-pan" points={pts(scene.pan)} fill={colors.pan} stroke={colors.panStroke} strokeWidth={sw * 1.6} strokeLinejoin="round" />}

            {/* crank centerline and origin */}
            <line
              x1={X(scene.crank.front.x)}
              y1={Y(scene.crank.front.z)}
              x2={X(scene.crank.rear.x)}
              y2={Y(scene.crank.rear.z)}
              stroke={palette.teal900}
              strokeWidth={sw}
              strokeDasharray={`${fs} ${fs / 3} ${fs / 6} ${fs / 3}`}
            />
            <g data-testid="side-origin">
              <circle cx={X(origin.x)} cy={Y(origin.z)} r={fs * 0.45} fill="#fff" stroke={palette.oxide600} strokeWidth={sw * 1.5} />
              <line x1={X(origin.x) - fs * 0.8} x2={X(origin.x) + fs * 0.8} y1={Y(origin.z)} y2={Y(origin.z)} stroke={palette.oxide600} strokeWidth={sw * 1.2} />
              <line x1={X(origin.x)} x2={X(origin.x)} y1={Y(origin.z) - fs * 0.8} y2={Y(origin.z) + fs * 0.8} stroke={palette.oxide600} strokeWidth={sw * 1.2} />
            </g>

            {/* proposed placement */}
            {proposed && (
              <g data-testid="side-proposed">
                <title>Proposed placement</title>
                <rect
                  x={X(proposed.setbackMm) - fs * 0.4}
                  y={Y(proposed.heightMm) - fs * 0.4}
                  width={fs * 0.8}
                  height={fs * 0.8}
                  transform={`rotate(45 ${X(proposed.setbackMm)} ${Y(proposed.heightMm)})`}
                  fill={colors.window}
                  stroke="#fff"
                  strokeWidth={sw}
                />
              </g>
            )}

            {/* names, placed clear of each other */}
            <g data-testid="side-labels">
              {scene.obstacles.map((o) => <g key={o.id}>{labelOf(`obstacle:${o.id}`, palette.ink)}</g>)}
              {labelOf('hood', colors.hood)}
              {labelOf('radiator', '#7d5d22')}
              {labelOf('origin', palette.oxide600)}
              {labelOf('axle', palette.inkMuted)}
              {labelOf('ground', palette.inkMuted)}
            </g>

            {/* dimensions of the tightest clearances */}
            {scene.dimensions.map((d) => {
              const c = statusColors[d.status].fg;
              const x1 = X(d.from.x);
              const y1 = Y(d.from.z);
              const x2 = X(d.to.x);
              const y2 = Y(d.to.z);
              const len = Math.hypot(x2 - x1, y2 - y1);
              return (
                <g key={d.checkId} data-testid={`side-dim-${d.checkId}`} data-status={d.status}>
                  <title>{`${d.title}: ${dimLabel(d)}`}</title>
                  {len > fs * 0.3 ? (
                    <line x1={x1} y1={y1} x2={x2} y2={y2} stroke={c} strokeWidth={sw * 1.4} markerStart={`url(#${uid}-arrow)`} markerEnd={`url(#${uid}-arrow)`} />
                  ) : (
                    <circle cx={x1} cy={y1} r={fs * 0.25} fill={c} />
                  )}
                  {labelOf(`dim:${d.checkId}`, c, true)}
                </g>
              );
            })}
          </svg>
        </div>
      </div>
      <figcaption>
        <Flex wrap gap="4px 16px" style={{ marginTop: 8, fontSize: 13 }} className="fit-legend">
          {legend
            .filter((l) => l.key !== 'window' || windowBands.length > 0)
            .map((l) => (
              <Flex key={l.key} align="center" gap={6}>
                <LegendSwatch {...l.swatch} />
                <span>{l.label}</span>
              </Flex>
            ))}
          <Flex align="center" gap={6}>
            <svg width="14" height="14" aria-hidden="true">
              <circle cx="7" cy="7" r="4.5" fill="#fff" stroke={palette.oxide600} strokeWidth="1.5" />
            </svg>
            <span>Crank centerline at the bellhousing face</span>
          </Flex>
        </Flex>
        <Typography.Text type="secondary" style={{ fontSize: 12 }}>
          Seen from the left side, front of the vehicle to the left. Dimensions show the tightest clearances found.
        </Typography.Text>
      </figcaption>
    </figure>
  );
}
