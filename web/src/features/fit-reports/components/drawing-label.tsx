import { useLayoutEffect, useState, type RefObject } from 'react';
import type { PlacedLabel } from '../lib/label-placement';

/** Smallest text a drawing shows, in screen pixels, and the size of its figures. */
export const DRAWING_TEXT_PX = { note: 11.5, name: 12, figure: 13 } as const;

/** Width the element is drawn at, in CSS pixels (null until it has been laid out). */
export function useRenderedWidth(ref: RefObject<Element | null>): number | null {
  const [width, setWidth] = useState<number | null>(null);
  useLayoutEffect(() => {
    const el = ref.current;
    if (!el) return;
    const read = () => {
      const w = el.getBoundingClientRect().width;
      if (w > 0) setWidth((old) => (old !== null && Math.abs(old - w) < 0.5 ? old : w));
    };
    read();
    if (typeof ResizeObserver === 'undefined') return;
    const observer = new ResizeObserver(read);
    observer.observe(el);
    return () => observer.disconnect();
  }, [ref]);
  return width;
}

/**
 * Screen pixels per drawing unit of an SVG drawn at `width: 100%` with a `max-height`, its view box scaled to fit
 * (`preserveAspectRatio` meet). Before layout (and in tests) a 720 px wide figure is assumed.
 */
export function drawingScale(renderedWidthPx: number | null, viewBoxW: number, viewBoxH: number, maxHeightPx: number): number {
  const width = renderedWidthPx ?? 720;
  return Math.min(width / viewBoxW, maxHeightPx / viewBoxH);
}

export type DrawingLabelProps = {
  label: PlacedLabel;
  fill: string;
  bold?: boolean;
  /** Width of the white outline that keeps text readable over lines. */
  halo: number;
  leaderColor?: string;
  leaderWidth: number;
  testId?: string;
};

/** A placed label: its lines of text, and a thin leader back to what it names when it had to move away. */
export function DrawingLabel({ label, fill, bold, halo, leaderColor, leaderWidth, testId }: DrawingLabelProps) {
  const { box } = label;
  return (
    <g data-testid={testId} data-label={label.id} data-box={`${box.x.toFixed(1)} ${box.y.toFixed(1)} ${box.w.toFixed(1)} ${box.h.toFixed(1)}`}>
      {label.leader && (
        <>
          <line
            x1={label.leader.from.x}
            y1={label.leader.from.y}
            x2={label.leader.to.x}
            y2={label.leader.to.y}
            stroke={leaderColor ?? fill}
            strokeWidth={leaderWidth}
            strokeOpacity="0.8"
          />
          <circle cx={label.leader.from.x} cy={label.leader.from.y} r={leaderWidth * 1.6} fill={leaderColor ?? fill} />
        </>
      )}
      <text
        fontSize={label.fontSize}
        fontWeight={bold ? 700 : 400}
        fill={fill}
        textAnchor="middle"
        style={{ paintOrder: 'stroke', stroke: '#fff', strokeWidth: halo, strokeLinejoin: 'round' }}
      >
        {label.lines.map((line, i) => (
          <tspan key={i} x={label.centerX} y={label.baselines[i]}>
            {line}
          </tspan>
        ))}
      </text>
    </g>
  );
}
