import { Flex, Typography } from 'antd';
import { palette } from '@/config/theme';
import type { MeasuredFrom } from '../lib/catalog-kinds';

const ink = palette.ink;
const accent = palette.oxide600;

function Arrow({ x1, y1, x2, y2, id }: { x1: number; y1: number; x2: number; y2: number; id: string }) {
  return <line x1={x1} y1={y1} x2={x2} y2={y2} stroke={accent} strokeWidth={2} markerEnd={`url(#${id})`} />;
}

/** Where the figures start, with the two directions they run in. */
function Origin({ x, y, alongX, upY, arrow }: { x: number; y: number; alongX: number; upY: number; arrow: string }) {
  return (
    <>
      <Arrow x1={x} y1={y} x2={alongX} y2={y} id={arrow} />
      <Arrow x1={x} y1={y} x2={x} y2={upY} id={arrow} />
      <circle cx={x} cy={y} r={4.5} fill="#fff" stroke={accent} strokeWidth={2} />
    </>
  );
}

/** A word on the drawing: the directions in the accent colour, the rest in ink; never below 11.5 px. */
function Note({ x, y, strong, children }: { x: number; y: number; strong?: boolean; children: string }) {
  return (
    <text x={x} y={y} fontSize={strong ? 12 : 11.5} fill={strong ? accent : ink} fontWeight={strong ? 600 : 400}>
      {children}
    </text>
  );
}

function ArrowHead({ id }: { id: string }) {
  return (
    <marker id={id} viewBox="0 0 10 10" refX="9" refY="5" markerWidth="7" markerHeight="7" orient="auto">
      <path d="M0,0 L10,5 L0,10 z" fill={accent} />
    </marker>
  );
}

/** Engine figures: from the crank centerline at the bellhousing face, forward along the crank and up. */
function EngineFrame() {
  return (
    <svg width="280" height="150" viewBox="0 0 280 150" role="img" aria-labelledby="engine-frame-title" data-testid="engine-frame-diagram">
      <title id="engine-frame-title">Where engine figures are measured from: the crank centerline at the bellhousing face</title>
      <defs>
        <ArrowHead id="engine-frame-arrow" />
      </defs>
      {/* engine block and pan, front to the left */}
      <path d="M40,30 H180 V100 H165 L160,122 H70 L62,100 H40 Z" fill={palette.teal100} stroke={palette.teal600} strokeWidth={1.5} />
      {/* bellhousing */}
      <path d="M180,40 L225,55 V95 L180,108 Z" fill="#ece6d8" stroke="#8a7a5a" strokeWidth={1.5} />
      {/* bellhousing face and crank centerline */}
      <line x1={180} y1={14} x2={180} y2={140} stroke={ink} strokeWidth={1} strokeDasharray="4 3" />
      <line x1={20} y1={80} x2={260} y2={80} stroke={ink} strokeWidth={1} strokeDasharray="10 3 2 3" />
      <Origin x={180} y={80} alongX={110} upY={30} arrow="engine-frame-arrow" />
      <Note x={112} y={74} strong>
        Forward
      </Note>
      <Note x={186} y={30} strong>
        Height
      </Note>
      <Note x={186} y={138}>
        bellhousing face
      </Note>
      <Note x={20} y={96}>
        crank centerline
      </Note>
      <Note x={70} y={145}>
        below the crank: negative
      </Note>
    </svg>
  );
}

/** Chassis figures: from the front axle centerline on the ground, back toward the rear and up. */
function ChassisFrame() {
  return (
    <svg width="280" height="150" viewBox="0 0 280 150" role="img" aria-labelledby="chassis-frame-title" data-testid="chassis-frame-diagram">
      <title id="chassis-frame-title">Where chassis figures are measured from: the front axle centerline on the ground at ride height</title>
      <defs>
        <ArrowHead id="chassis-frame-arrow" />
      </defs>
      {/* frame rail and front wheel, front to the left */}
      <rect x={30} y={62} width={235} height={14} fill="#8c969a" fillOpacity={0.5} stroke="#4d585c" />
      <circle cx={60} cy={100} r={28} fill="none" stroke={ink} strokeWidth={3} />
      <line x1={0} y1={128} x2={280} y2={128} stroke={ink} strokeWidth={1.5} />
      <line x1={60} y1={14} x2={60} y2={128} stroke={ink} strokeWidth={1} strokeDasharray="10 3 2 3" />
      <Origin x={60} y={128} alongX={170} upY={30} arrow="chassis-frame-arrow" />
      <Note x={120} y={122} strong>
        Back
      </Note>
      <Note x={66} y={28} strong>
        Height
      </Note>
      <Note x={66} y={46}>
        front axle centerline
      </Note>
      <Note x={180} y={144}>
        ground at ride height
      </Note>
    </svg>
  );
}

export type FrameDiagramProps = { from: MeasuredFrom };

/** A small drawing of where a form's figures are measured from, beside a sentence saying the same. */
export function FrameDiagram({ from }: FrameDiagramProps) {
  return (
    <Flex gap={16} align="center" wrap style={{ marginBottom: 16 }}>
      {from === 'engine' ? <EngineFrame /> : <ChassisFrame />}
      <Typography.Paragraph type="secondary" style={{ flex: '1 1 200px', margin: 0, fontSize: 13 }}>
        {from === 'engine'
          ? 'Engine figures are measured from where the crank centerline meets the bellhousing face: forward along the crank toward the fan, and height above the crank centerline (below it is negative). Seen from the left side, front to the left.'
          : 'Chassis figures are measured from the front axle centerline on the ground at ride height: back toward the rear, and height above the ground. Seen from the left side, front to the left.'}
      </Typography.Paragraph>
    </Flex>
  );
}
