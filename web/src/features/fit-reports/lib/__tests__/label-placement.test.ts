import { describe, expect, it } from 'vitest';
import { measureText, overlapArea, placeLabels, segmentBoxes, wrapLabel, type Box, type LabelRequest } from '../label-placement';

const bounds: Box = { x: 0, y: 0, w: 1000, h: 600 };
const label = (id: string, x: number, y: number, text = 'Steering link', prefer?: LabelRequest['prefer']): LabelRequest => ({
  id,
  anchor: { x, y },
  lines: [text],
  fontSize: 20,
  prefer,
});

const inside = (b: Box, outer: Box) => b.x >= outer.x - 1e-9 && b.y >= outer.y - 1e-9 && b.x + b.w <= outer.x + outer.w + 1e-9 && b.y + b.h <= outer.y + outer.h + 1e-9;

describe('placeLabels', () => {
  it('puts a lone label on its preferred side, next to its anchor and without a leader', () => {
    const [placed] = placeLabels([label('a', 500, 300, 'hood', ['above'])], { bounds });
    expect(placed.box.y + placed.box.h).toBeLessThanOrEqual(300);
    expect(placed.centerX).toBeCloseTo(500);
    expect(placed.leader).toBeNull();
  });

  it('keeps labels whose anchors nearly coincide off each other', () => {
    // three obstacles a few units apart, as the steering link, the axle at full bump and a dimension can sit
    const placed = placeLabels([label('dim', 500, 300, '1.25 in'), label('link', 505, 298), label('axle', 510, 305, 'Front axle beam at full bump')], {
      bounds,
    });
    for (let i = 0; i < placed.length; i++)
      for (let j = i + 1; j < placed.length; j++) expect(overlapArea(placed[i].box, placed[j].box)).toBe(0);
  });

  it('draws a leader line to a label that had to move away from its anchor', () => {
    const placed = placeLabels(
      Array.from({ length: 6 }, (_, i) => label(`l${i}`, 500 + i, 300)),
      { bounds },
    );
    const withLeader = placed.filter((p) => p.leader);
    expect(withLeader.length).toBeGreaterThan(0);
    for (const p of withLeader) {
      expect(p.leader!.from).toEqual(p.anchor);
      // the leader ends on the label's edge
      const { x, y } = p.leader!.to;
      expect(x >= p.box.x - 1e-9 && x <= p.box.x + p.box.w + 1e-9 && y >= p.box.y - 1e-9 && y <= p.box.y + p.box.h + 1e-9).toBe(true);
    }
  });

  it('keeps every label inside the drawing, even when its anchor sits at the edge', () => {
    const placed = placeLabels([label('corner', 2, 2, 'Front crossmember'), label('right', 998, 590, 'radiator')], { bounds });
    for (const p of placed) expect(inside(p.box, bounds)).toBe(true);
  });

  it('keeps off the areas it is told to avoid where there is room', () => {
    const avoid = segmentBoxes({ x: 400, y: 260 }, { x: 600, y: 260 }, 10);
    const [placed] = placeLabels([label('a', 500, 300, 'overlap 1.4 in', ['above'])], { bounds, avoid });
    expect(avoid.every((b) => overlapArea(b, placed.box) === 0)).toBe(true);
  });

  it('gives the same answer every time (no jitter between renders)', () => {
    const reqs = [label('a', 100, 100), label('b', 104, 102), label('c', 90, 95)];
    expect(placeLabels(reqs, { bounds })).toEqual(placeLabels(reqs, { bounds }));
  });

  it('places the first labels given before the later ones', () => {
    const [first] = placeLabels([label('first', 500, 300, 'x', ['above']), label('second', 500, 300, 'x', ['above'])], { bounds });
    expect(first.leader).toBeNull();
    expect(first.box.y + first.box.h).toBeLessThanOrEqual(300);
  });
});

describe('wrapLabel and measureText', () => {
  it('breaks a long name at spaces to fit a width', () => {
    const lines = wrapLabel('Front axle beam at full bump', 10, 80);
    expect(lines.length).toBeGreaterThan(1);
    expect(lines.join(' ')).toBe('Front axle beam at full bump');
    for (const l of lines) expect(measureText([l], 10).w).toBeLessThanOrEqual(80);
  });

  it('keeps a word longer than the width on its own line', () => {
    expect(wrapLabel('Crossmember', 10, 20)).toEqual(['Crossmember']);
  });

  it('grows with the number of lines and the longest line', () => {
    const one = measureText(['abc'], 10);
    const two = measureText(['abc', 'abcdef'], 10);
    expect(two.h).toBeCloseTo(2 * one.h);
    expect(two.w).toBeCloseTo(2 * one.w);
  });
});
