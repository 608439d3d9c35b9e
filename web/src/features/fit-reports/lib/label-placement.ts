/**
 * Places the text labels of a drawing so that they do not cover each other: each label tries positions around
 * its anchor, nearest first, and takes the first free one; a label pushed away from its anchor gets a leader line.
 * Coordinates are the drawing's own (SVG user units, y down).
 */

export type Box = { x: number; y: number; w: number; h: number };
export type Point = { x: number; y: number };

/** Where a label sits relative to its anchor. */
export type Side = 'above' | 'below' | 'right' | 'left' | 'above-right' | 'above-left' | 'below-right' | 'below-left';

export type LabelRequest = {
  id: string;
  anchor: Point;
  /** Lines of text, top to bottom. */
  lines: readonly string[];
  /** Font size in drawing units. */
  fontSize: number;
  bold?: boolean;
  /** Sides to try first, in order; the others follow. */
  prefer?: readonly Side[];
};

export type PlacedLabel = {
  id: string;
  anchor: Point;
  box: Box;
  lines: readonly string[];
  fontSize: number;
  /** Centre of the text block, for `text-anchor: middle`. */
  centerX: number;
  /** Baseline of each line. */
  baselines: number[];
  /** From the anchor to the label's nearest edge, when the label had to move away from its anchor. */
  leader: { from: Point; to: Point } | null;
};

export type PlacementOptions = {
  /** The drawing's extent: labels stay inside it. */
  bounds: Box;
  /** Areas labels should keep off (markers, dimension lines). */
  avoid?: readonly Box[];
  /** Gap between anchor and label, in drawing units (default: a third of the label's font size). */
  gap?: number;
  /** How many rings of positions further out to try before settling for the least overlap (default 12). */
  rings?: number;
};

const ALL_SIDES: readonly Side[] = ['above', 'right', 'below', 'left', 'above-right', 'above-left', 'below-right', 'below-left'];

/** Average advance of a character of the UI font, as a share of the font size (a little generous). */
const CHAR_WIDTH = 0.56;
const BOLD_CHAR_WIDTH = 0.6;
const LINE_HEIGHT = 1.2;

/** Estimated width and height of a block of text lines. */
export function measureText(lines: readonly string[], fontSize: number, bold = false): { w: number; h: number } {
  const longest = lines.reduce((n, l) => Math.max(n, l.length), 0);
  return { w: longest * fontSize * (bold ? BOLD_CHAR_WIDTH : CHAR_WIDTH), h: lines.length * fontSize * LINE_HEIGHT };
}

/** Breaks a label into lines no wider than `maxWidth` (a single word longer than that keeps its own line). */
export function wrapLabel(text: string, fontSize: number, maxWidth: number, bold = false): string[] {
  const perChar = fontSize * (bold ? BOLD_CHAR_WIDTH : CHAR_WIDTH);
  const maxChars = Math.max(1, Math.floor(maxWidth / perChar));
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(/\s+/).filter(Boolean)) {
    const next = line ? `${line} ${word}` : word;
    if (next.length <= maxChars || !line) line = next;
    else {
      lines.push(line);
      line = word;
    }
  }
  if (line) lines.push(line);
  return lines;
}

export function overlapArea(a: Box, b: Box): number {
  const w = Math.min(a.x + a.w, b.x + b.w) - Math.max(a.x, b.x);
  const h = Math.min(a.y + a.h, b.y + b.h) - Math.max(a.y, b.y);
  return w > 0 && h > 0 ? w * h : 0;
}

function outsideArea(box: Box, bounds: Box): number {
  return box.w * box.h - overlapArea(box, bounds);
}

function boxAt(side: Side, anchor: Point, w: number, h: number, d: number): Box {
  const diag = d * Math.SQRT1_2;
  switch (side) {
    case 'above':
      return { x: anchor.x - w / 2, y: anchor.y - d - h, w, h };
    case 'below':
      return { x: anchor.x - w / 2, y: anchor.y + d, w, h };
    case 'right':
      return { x: anchor.x + d, y: anchor.y - h / 2, w, h };
    case 'left':
      return { x: anchor.x - d - w, y: anchor.y - h / 2, w, h };
    case 'above-right':
      return { x: anchor.x + diag, y: anchor.y - diag - h, w, h };
    case 'above-left':
      return { x: anchor.x - diag - w, y: anchor.y - diag - h, w, h };
    case 'below-right':
      return { x: anchor.x + diag, y: anchor.y + diag, w, h };
    case 'below-left':
      return { x: anchor.x - diag - w, y: anchor.y + diag, w, h };
  }
}

/** Moves a box inside the bounds where it fits (a box larger than the bounds keeps its top-left corner inside). */
function clampInto(box: Box, bounds: Box): Box {
  const x = Math.max(bounds.x, Math.min(box.x, bounds.x + bounds.w - box.w));
  const y = Math.max(bounds.y, Math.min(box.y, bounds.y + bounds.h - box.h));
  return { ...box, x, y };
}

/** The point of the box nearest to p. */
export function nearestOnBox(box: Box, p: Point): Point {
  return { x: Math.max(box.x, Math.min(p.x, box.x + box.w)), y: Math.max(box.y, Math.min(p.y, box.y + box.h)) };
}

/** Places the labels in the order given (put the most important first): none covers another where room allows. */
export function placeLabels(requests: readonly LabelRequest[], options: PlacementOptions): PlacedLabel[] {
  const { bounds, avoid = [], rings = 12 } = options;
  const placed: PlacedLabel[] = [];
  const taken: Box[] = [];

  for (const req of requests) {
    const { w, h } = measureText(req.lines, req.fontSize, req.bold);
    const gap = options.gap ?? req.fontSize / 3;
    const step = Math.max(req.fontSize * 0.9, gap);
    const order = [...(req.prefer ?? []), ...ALL_SIDES.filter((s) => !req.prefer?.includes(s))];

    let best: { box: Box; cost: number; ring: number } | null = null;
    search: for (let ring = 0; ring <= rings; ring++) {
      for (const side of order) {
        const box = clampInto(boxAt(side, req.anchor, w, h, gap + ring * step), bounds);
        const cost =
          taken.reduce((s, t) => s + overlapArea(box, t), 0) * 4 +
          avoid.reduce((s, t) => s + overlapArea(box, t), 0) +
          outsideArea(box, bounds) * 8;
        if (!best || cost < best.cost - 1e-9) best = { box, cost, ring };
        if (cost <= 1e-9) break search;
      }
    }
    const box = best!.box;
    const near = nearestOnBox(box, req.anchor);
    const away = Math.hypot(near.x - req.anchor.x, near.y - req.anchor.y);
    const lineHeight = req.fontSize * LINE_HEIGHT;
    placed.push({
      id: req.id,
      anchor: req.anchor,
      box,
      lines: req.lines,
      fontSize: req.fontSize,
      centerX: box.x + box.w / 2,
      // the baseline sits about 0.8 of a line down from the line's top for Latin text
      baselines: req.lines.map((_, i) => box.y + i * lineHeight + lineHeight * 0.8),
      leader: away > gap + step * 0.5 ? { from: req.anchor, to: near } : null,
    });
    taken.push(box);
  }
  return placed;
}

/** Small boxes along a segment, so labels keep off a drawn line without avoiding its whole bounding box. */
export function segmentBoxes(from: Point, to: Point, thickness: number): Box[] {
  const length = Math.hypot(to.x - from.x, to.y - from.y);
  const n = Math.max(1, Math.ceil(length / thickness));
  const out: Box[] = [];
  for (let i = 0; i <= n; i++) {
    const t = i / n;
    const x = from.x + (to.x - from.x) * t;
    const y = from.y + (to.y - from.y) * t;
    out.push({ x: x - thickness / 2, y: y - thickness / 2, w: thickness, h: thickness });
  }
  return out;
}
