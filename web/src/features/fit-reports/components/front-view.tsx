import type { FitSpec } from '@swapwright/shared';
import { Flex, Typography } from 'antd';
import { useId, useMemo, useRef } from 'react';
import { palette } from '@/config/theme';
import { useUnits } from '@/hooks/use-units';
import { buildFrontScene, FRONT_RAIL_THICKNESS } from '../lib/front-scene';
import { placeLabels, segmentBoxes, type Box, type LabelRequest } from '../lib/label-placement';
import { DRAWING_TEXT_PX, DrawingLabel, drawingScale, useRenderedWidth } from './drawing-label';
import { LegendSwatch } from './side-view';

const MAX_HEIGHT_PX = 420;

export type FrontViewProps = { spec: FitSpec; minGapMm?: number };

/** Widths seen from the front of the vehicle: frame rails, steering box, accessory drive, exhaust and heads. */
export function FrontView({ spec, minGapMm = 12.7 }: FrontViewProps) {
  const units = useUnits();
  const uid = useId().replace(/:/g, '');
  const scene = useMemo(() => buildFrontScene(spec), [spec]);
  const b = scene.bounds;
  const width = b.yMax - b.yMin;
  const height = b.zMax - b.zMin;
  const pad = Math.max(width, height) * 0.08;
  const vbW = width + 2 * pad;
  const vbH = height + 2 * pad;
  // Seen from the front: the vehicle's right (y > 0) is on the viewer's left.
  const X = (y: number) => b.yMax - y + pad;
  const Y = (z: number) => b.zMax - z + pad;
  // line weights follow the drawing; text follows the screen, so it stays readable when the drawing shrinks
  const fs = Math.max(vbW, vbH) / 40;
  const sw = fs / 8;
  const figureRef = useRef<HTMLElement>(null);
  const scale = drawingScale(useRenderedWidth(figureRef), vbW, vbH, MAX_HEIGHT_PX);
  const text = { note: DRAWING_TEXT_PX.note / scale, name: DRAWING_TEXT_PX.name / scale, figure: DRAWING_TEXT_PX.figure / scale };
  const st = scene.station;

  const gapColor = (v: number) => (v < minGapMm ? (v < 0 ? '#8e2a21' : '#7a4e0e') : '#1f5e3a');
  const gapText = (v: number) => (v < 0 ? `overlap ${units.formatLength(-v)}` : units.formatLength(v));
  const railsY = st ? Y(st.zBottom) + fs * 1.2 : 0;

  const labels = useMemo(() => {
    const requests: LabelRequest[] = [];
    const avoid: Box[] = [];
    for (const g of scene.gaps) {
      const from = { x: X(g.fromY), y: Y(g.z) };
      const to = { x: X(g.toY), y: Y(g.z) };
      requests.push({ id: `gap:${g.id}`, anchor: { x: (from.x + to.x) / 2, y: from.y }, lines: [gapText(g.valueMm)], fontSize: text.figure, bold: true, prefer: ['above', 'below'] });
      avoid.push(...segmentBoxes(from, to, sw * 4));
    }
    if (st) {
      const from = { x: X(-st.insideWidthMm / 2), y: railsY };
      const to = { x: X(st.insideWidthMm / 2), y: railsY };
      avoid.push(...segmentBoxes(from, to, sw * 4));
      requests.push({ id: 'rails', anchor: { x: X(0), y: railsY }, lines: [`rails ${units.formatLength(st.insideWidthMm)} inside`], fontSize: text.name, prefer: ['below', 'above'] });
    }
    if (st)
      for (const side of [-1, 1]) {
        const inner = X((side * st.insideWidthMm) / 2);
        const outer = X((side * st.insideWidthMm) / 2 + side * FRONT_RAIL_THICKNESS);
        avoid.push({ x: Math.min(inner, outer), y: Y(st.zTop), w: FRONT_RAIL_THICKNESS, h: st.zTop - st.zBottom });
      }
    const sbox = scene.steeringBox;
    if (sbox) avoid.push({ x: Math.min(X(sbox.yFrom), X(sbox.yTo)), y: Y(sbox.zTo), w: Math.abs(sbox.yTo - sbox.yFrom), h: sbox.zTo - sbox.zFrom });
    if (sbox) requests.push({ id: 'steering-box', anchor: { x: (X(sbox.yFrom) + X(sbox.yTo)) / 2, y: Y(sbox.zTo) }, lines: ['steering box'], fontSize: text.name, prefer: ['above', 'above-left', 'above-right'] });
    requests.push({ id: 'vehicle-right', anchor: { x: 0, y: 0 }, lines: ['vehicle right'], fontSize: text.note, prefer: ['below-right'] });
    requests.push({ id: 'vehicle-left', anchor: { x: vbW, y: 0 }, lines: ['vehicle left'], fontSize: text.note, prefer: ['below-left'] });
    const placed = placeLabels(requests, { bounds: { x: 0, y: 0, w: vbW, h: vbH }, avoid });
    return new Map(placed.map((l) => [l.id, l]));
  }, [scene, vbW, vbH, scale, units]);

  const labelOf = (id: string, fill: string, bold = false) => {
    const l = labels.get(id);
    return l ? <DrawingLabel label={l} fill={fill} bold={bold} halo={text.name / 4} leaderWidth={sw} /> : null;
  };

  return (
    <figure ref={figureRef} className="fit-front-view" data-testid="front-view" style={{ margin: 0 }}>
      <svg
        viewBox={`0 0 ${vbW.toFixed(0)} ${vbH.toFixed(0)}`}
        width="100%"
        role="img"
        aria-labelledby={`${uid}-title`}
        style={{ display: 'block', background: '#fbfaf7', border: `1px solid ${palette.line}`, borderRadius: 6, maxHeight: MAX_HEIGHT_PX }}
      >
        <title id={`${uid}-title`}>
          Front view widths{st ? `: rails ${units.formatLength(st.insideWidthMm)} apart inside` : ''}.{' '}
          {scene.gaps.map((g) => `${g.label}: ${units.formatLength(g.valueMm)}.`).join(' ')}
        </title>
        <defs>
          <marker id={`${uid}-arrow`} viewBox="0 0 10 10" refX="9" refY="5" markerWidth="6" markerHeight="6" orient="auto-start-reverse">
            <path d="M0,0 L10,5 L0,10 z" fill="context-stroke" />
          </marker>
        </defs>
        {labelOf('vehicle-right', palette.inkMuted)}
        {labelOf('vehicle-left', palette.inkMuted)}
        {/* centerline */}
        <line x1={X(0)} x2={X(0)} y1={pad * 0.8} y2={vbH - pad * 0.3} stroke={palette.inkMuted} strokeWidth={sw} strokeDasharray={`${fs} ${fs / 3} ${fs / 6} ${fs / 3}`} />

        {st && (
          <g data-testid="front-rails">
            {[-1, 1].map((s) => {
              const inner = (s * st.insideWidthMm) / 2;
              const outer = inner + s * FRONT_RAIL_THICKNESS;
              return (
                <rect
                  key={s}
                  x={Math.min(X(inner), X(outer))}
                  y={Y(st.zTop)}
                  width={FRONT_RAIL_THICKNESS}
                  height={st.zTop - st.zBottom}
                  fill="#8c969a"
                  fillOpacity="0.5"
                  stroke="#4d585c"
                  strokeWidth={sw * 1.3}
                />
              );
            })}
            <line
              x1={X(-st.insideWidthMm / 2)}
              x2={X(st.insideWidthMm / 2)}
              y1={railsY}
              y2={railsY}
              stroke={palette.ink}
              strokeWidth={sw}
              markerStart={`url(#${uid}-arrow)`}
              markerEnd={`url(#${uid}-arrow)`}
            />
          </g>
        )}

        {scene.steeringBox && (
          <g data-testid="front-steering-box">
            <rect
              x={Math.min(X(scene.steeringBox.yFrom), X(scene.steeringBox.yTo))}
              y={Y(scene.steeringBox.zTo)}
              width={Math.abs(scene.steeringBox.yTo - scene.steeringBox.yFrom)}
              height={scene.steeringBox.zTo - scene.steeringBox.zFrom}
              fill="#6b5a4a"
              fillOpacity="0.35"
              stroke="#6b5a4a"
              strokeWidth={sw * 1.3}
            />
          </g>
        )}

        {scene.boxes.map((box) => (
          <g key={box.id} data-testid={`front-box-${box.id}`}>
            <title>{box.name}</title>
            <rect
              x={X(box.yRight)}
              y={Y(box.zMax)}
              width={box.yRight - box.yLeft}
              height={box.zMax - box.zMin}
              fill={box.kind === 'accessory-drive' ? palette.teal100 : palette.oxide100}
              fillOpacity="0.55"
              stroke={box.kind === 'accessory-drive' ? palette.teal600 : palette.oxide500}
              strokeWidth={sw * 1.3}
              strokeDasharray={box.kind === 'accessory-drive' ? `${fs / 2} ${fs / 4}` : undefined}
            />
          </g>
        ))}

        <circle cx={X(scene.crank.y)} cy={Y(scene.crank.z)} r={fs * 0.4} fill="#fff" stroke={palette.oxide600} strokeWidth={sw * 1.5} />

        <g data-testid="front-labels">
          {labelOf('rails', palette.ink)}
          {labelOf('steering-box', palette.ink)}
        </g>

        {scene.gaps.map((g) => {
          const c = gapColor(g.valueMm);
          return (
            <g key={g.id} data-testid={`front-gap-${g.id}`}>
              <title>{`${g.label}: ${gapText(g.valueMm)}`}</title>
              <line x1={X(g.fromY)} x2={X(g.toY)} y1={Y(g.z)} y2={Y(g.z)} stroke={c} strokeWidth={sw * 1.5} markerStart={`url(#${uid}-arrow)`} markerEnd={`url(#${uid}-arrow)`} />
              {labelOf(`gap:${g.id}`, c, true)}
            </g>
          );
        })}
      </svg>
      <figcaption>
        <Flex wrap gap="4px 16px" style={{ marginTop: 8, fontSize: 13 }}>
          <Flex align="center" gap={6}>
            <LegendSwatch fill="#8c969a" stroke="#4d585c" />
            Frame rails at the narrowest station
          </Flex>
          <Flex align="center" gap={6}>
            <LegendSwatch fill="#6b5a4a" stroke="#6b5a4a" />
            Steering box
          </Flex>
          <Flex align="center" gap={6}>
            <LegendSwatch fill={palette.teal100} stroke={palette.teal600} dash="4 2" />
            Accessory drive
          </Flex>
          <Flex align="center" gap={6}>
            <LegendSwatch fill={palette.oxide100} stroke={palette.oxide500} />
            Exhaust, heads and covers
          </Flex>
        </Flex>
        <Typography.Text type="secondary" style={{ fontSize: 12 }}>
          Seen from the front of the vehicle.
        </Typography.Text>
      </figcaption>
    </figure>
  );
}
