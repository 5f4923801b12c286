import { describe, expect, it } from 'vitest';
import type { Point } from '../geometry/point.ts';
import { generateArches } from './arches.ts';
import { distanceToOutline } from './polygon.ts';
import { FOLD_RADIUS } from './ribbonFolds.ts';
import { generateRibbonCandy } from './ribbonCandy.ts';

const candy = { kind: 'ribbon-candy' as const, margin: 0, chordError: 0.005, separate: false };
/** Distance from p to the infinite line through a and b (analytic geometry). */
const lineDistance = (p: Point, a: Point, b: Point) =>
  Math.abs((b[0] - a[0]) * (p[1] - a[1]) - (b[1] - a[1]) * (p[0] - a[0])) / Math.hypot(b[0] - a[0], b[1] - a[1]);

describe('motifs/ribbonCandy (joined): turns on the sides', () => {
  it('turns on the two long sides of a 12 × 4 strip, alternately, half a pitch apart, folding in a loop between', () => {
    const strip: Point[] = [[0, 0], [12, 0], [12, 4], [0, 4]];
    const { lines } = generateRibbonCandy(strip, { ...candy, pitch: 2 });
    expect(lines.length).toBe(1);
    const line = lines[0]!;
    // Turn k touches y = 4 (k even) or y = 0 (k odd) at x = k: 13 turns, the ends included.
    const touches = line.filter((p) => p[1] === 0 || Math.abs(p[1] - 4) < 1e-12);
    expect(touches.length).toBe(13);
    touches.forEach((p, k) => {
      expect(p[0]).toBeCloseTo(k, 12);
      expect(p[1]).toBeCloseTo(k % 2 === 0 ? 4 : 0, 12);
    });
    expect(line[0]).toEqual(touches[0]);
    expect(line[line.length - 1]).toEqual(touches[12]);
    // Each inner turn runs round a circle of radius FOLD_RADIUS·pitch tangent to the side at the touch point:
    // the points next to it lie on that circle, and the line crosses itself once per fold.
    const r = FOLD_RADIUS * 1;
    touches.slice(1, -1).forEach((t, k) => {
      const i = line.indexOf(t);
      const centre: Point = [t[0], (k + 1) % 2 === 0 ? 4 - r : r];
      for (const q of [line[i - 1]!, line[i + 1]!]) expect(Math.hypot(q[0] - centre[0], q[1] - centre[1])).toBeCloseTo(r, 12);
    });
    line.forEach((p) => expect(p[1] >= -1e-12 && p[1] <= 4 + 1e-12 && p[0] >= -1e-12 && p[0] <= 12 + 1e-12).toBe(true));
  });

  it('turns on both legs of a flying-geese goose, the last turn in its point', () => {
    // Goose with its point at (3, 0) and base y = 3; axis from the base to the point (the 90° corner).
    const goose: Point[] = [[0, 3], [3, 0], [6, 3]];
    const { lines } = generateRibbonCandy(goose, { ...candy, pitch: 1 });
    expect(lines.length).toBe(1);
    const line = lines[0]!;
    const left = (p: Point) => lineDistance(p, [0, 3], [3, 0]);
    const right = (p: Point) => lineDistance(p, [3, 0], [6, 3]);
    const onLeft = line.filter((p) => left(p) < 1e-9);
    const onRight = line.filter((p) => right(p) < 1e-9);
    // Axis length 3 (base to point) at pitch 1 (two strokes per pitch): 6 strokes, 7 turns: 4 on one leg, 3 on the other (the point on both).
    expect(onLeft.length + onRight.length).toBe(8);
    expect(line[line.length - 1]![0]).toBeCloseTo(3, 9);
    expect(line[line.length - 1]![1]).toBeCloseTo(0, 9);
    line.forEach((p) => expect(p[1] <= 3 + 1e-9 && left(p) >= -1e-9 && p[1] >= Math.abs(p[0] - 3) - 1e-9).toBe(true));
  });

  it('touches the outline at every turn in a square and a half-square triangle', () => {
    for (const shape of [[[0, 0], [6, 0], [6, 6], [0, 6]], [[0, 0], [6, 0], [0, 6]]] as Point[][]) {
      const { lines } = generateRibbonCandy(shape, { ...candy, pitch: 1.5 });
      expect(lines.length).toBe(1);
      const onOutline = lines[0]!.filter((p) => distanceToOutline(p, shape) < 1e-9).length;
      // round(2·6 / 1.5) = 8 strokes in the square, 9 turns; the triangle's axis is 6/√2 long: round(5.66) = 6 strokes, 7 turns.
      expect(onOutline).toBeGreaterThanOrEqual(shape.length === 4 ? 9 : 7);
    }
  });
});

describe('motifs/arches (joined)', () => {
  it('stands the first row on the base, steps each row up one row spacing, and joins the rows at the sides', () => {
    const rect: Point[] = [[0, 0], [6, 0], [6, 4], [0, 4]];
    const { lines } = generateArches(rect, { kind: 'arches', archWidth: 1, rowSpacing: 1, angle: 0, chordError: 0.005, separate: false });
    expect(lines.length).toBe(1);
    const line = lines[0]!;
    // Feet of row r on y = 4 − r at x = 0 … 6: seven per row, four rows.
    for (let r = 0; r < 4; r++) {
      const feet = line.filter((p) => Math.abs(p[1] - (4 - r)) < 1e-12 && p[0] > -1e-12 && p[0] < 6 + 1e-12 && Math.abs(p[0] - Math.round(p[0])) < 1e-12);
      expect(new Set(feet.map((p) => Math.round(p[0]))).size).toBe(7);
    }
    // The line starts at the bottom-left corner and climbs the sides between rows (runs along x = 0 or x = 6).
    expect(line[0]).toEqual([0, 4]);
    const runs = line.slice(1).filter((p, i) => (p[0] === 0 || p[0] === 6) && line[i]![0] === p[0] && p[1] !== line[i]![1]);
    expect(runs.length).toBeGreaterThanOrEqual(3);
  });
});
