import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Point } from '../geometry/point.ts';
import { signedArea } from '../layouts/patch.ts';
import { generateArches } from './arches.ts';
import { generateRibbonCandy } from './ribbonCandy.ts';

// These tests pin the separate (older) look: loops kept `margin` clear of the outline. Joined ribbon candy,
// the default, is tested in ribbonFolds.test.ts.
const base = { kind: 'ribbon-candy' as const, margin: 0, chordError: 0.005, separate: true };

describe('motifs/ribbonCandy (separate)', () => {
  it('fills a 12 × 4 strip with one line of 12 loops alternating about the centre line', () => {
    const strip: Point[] = [[0, 0], [12, 0], [12, 4], [0, 4]];
    const { lines } = generateRibbonCandy(strip, { ...base, pitch: 1, margin: 0.25 });
    expect(lines.length).toBe(1);
    const line = lines[0]!;
    expect(line[0]![0]).toBeCloseTo(0.25, 12);
    expect(line[line.length - 1]![0]).toBeCloseTo(11.75, 12);
    const offsets = line.map((p) => p[1] - 2);
    // Loops reach the margin line 0.25 inside the outline (half an ellipse peaks at its semi-axis).
    expect(Math.max(...offsets.map(Math.abs))).toBeLessThanOrEqual(1.75 + 1e-12);
    expect(Math.max(...offsets)).toBeGreaterThan(1.74);
    expect(Math.min(...offsets)).toBeLessThan(-1.74);
    const signs = offsets.filter((o) => Math.abs(o) > 1e-9).map(Math.sign);
    const changes = signs.slice(1).filter((s, i) => s !== signs[i]).length;
    expect(changes).toBe(11);
  });
});

/*
 * Analytic checks on isosceles triangles whose point is at the top (axis x = const, running up). A line
 * at distance m inside an edge of a triangle meets the inner line of the next edge at m / sin(α/2) from
 * their corner along the bisector (α the corner's angle; point-to-line distance, analytic geometry). So
 * the triangle below, apex angle 90°, moved in by m has its base at y = 6 − m and its point at y = m√2.
 */
const ISO: Point[] = [[6, 0], [12, 6], [0, 6]];
const M = 0.125;
const BASE_Y = 6 - M;
const TIP_Y = M * Math.SQRT2;
const AXIS = BASE_Y - TIP_Y;

/** Indices of the vertices on the axis x = axisX: loop ends, the final loop's turn in the point, its close. */
function axisTouches(line: readonly Point[], axisX: number): number[] {
  return line.map((p, i) => (Math.abs(p[0] - axisX) < 1e-9 ? i : -1)).filter((i) => i >= 0);
}

/** Splits a line on a vertical axis into its regular loops and its final loop (the last three touches). */
function splitLoops(line: readonly Point[], axisX: number): { regular: Point[][]; final: Point[] } {
  const cuts = axisTouches(line, axisX);
  const regular: Point[][] = [];
  for (let k = 0; k + 3 < cuts.length; k++) regular.push(line.slice(cuts[k]!, cuts[k + 1]! + 1));
  return { regular, final: line.slice(cuts[cuts.length - 3]!) };
}

/** A loop's size: how far it swings across the axis (extent in x here). */
const across = (loop: readonly Point[]): number => Math.max(...loop.map((p) => p[0])) - Math.min(...loop.map((p) => p[0]));

describe('motifs/ribbonCandy (separate) in a triangle: loops sized to the width, one big loop in the point', () => {
  it('is one continuous line from the middle of the base, loop after loop, closing its final loop in the point', () => {
    const { lines } = generateRibbonCandy(ISO, { ...base, pitch: 0.5, margin: M });
    expect(lines.length).toBe(1);
    const line = lines[0]!;
    expect(line[0]![0]).toBeCloseTo(6, 9);
    expect(line[0]![1]).toBeCloseTo(BASE_Y, 9);
    // No jump anywhere: every step is far shorter than one loop slot (0.52 here).
    line.slice(1).forEach((p, i) => expect(Math.hypot(p[0] - line[i]![0], p[1] - line[i]![1])).toBeLessThan(0.25));
    // The line ends exactly where its final loop began (the loop closes on itself).
    const cuts = axisTouches(line, 6);
    expect(line[line.length - 1]).toEqual(line[cuts[cuts.length - 3]!]);
  });

  it('lays round(L / pitch) slots, the last max(2, round(slots / 3)) for the final loop, alternating sides', () => {
    // L = 5.69822…, pitch 0.5 → 11 slots of L / 11; final loop 4 slots, 7 regular loops before it.
    const { lines } = generateRibbonCandy(ISO, { ...base, pitch: 0.5, margin: M });
    const line = lines[0]!;
    const slot = AXIS / 11;
    const expected = [...Array.from({ length: 8 }, (_, k) => BASE_Y - k * slot), TIP_Y, BASE_Y - 7 * slot];
    const touches = axisTouches(line, 6).map((i) => line[i]![1]);
    expect(touches.length).toBe(expected.length);
    touches.forEach((y, i) => expect(y).toBeCloseTo(expected[i]!, 9));
    // Regular loops swing right, left, right, …; the final loop goes out on the next side and back on the other.
    const cuts = axisTouches(line, 6);
    const sideOf = (from: number, to: number) => Math.sign(line[Math.floor((from + to) / 2)]![0] - 6);
    const sides = cuts.slice(1).map((c, k) => sideOf(cuts[k]!, c));
    expect(sides).toEqual([1, -1, 1, -1, 1, -1, 1, -1, 1]);
  });

  it('keeps every loop inside the local width minus the margin, and each regular loop reaches it', () => {
    const { lines } = generateRibbonCandy(ISO, { ...base, pitch: 0.5, margin: M });
    const line = lines[0]!;
    // Square distance to the side x − 6 = ±y is (y − |x − 6|) / √2 ≥ m  ⇔  |x − 6| ≤ y − m√2.
    const room = (p: Point) => p[1] - TIP_Y - Math.abs(p[0] - 6);
    line.forEach((p) => {
      expect(room(p)).toBeGreaterThanOrEqual(-1e-9);
      expect(p[1]).toBeLessThanOrEqual(BASE_Y + 1e-9);
    });
    const { regular } = splitLoops(line, 6);
    expect(regular.length).toBe(7);
    regular.forEach((loop) => expect(Math.min(...loop.map(room))).toBeLessThan(1e-9));
  });

  it('makes the final loop the largest loop reaching into the last third of the axis, for 1 to 24 slots', () => {
    // Rule: the final loop takes max(2, round(slots / 3)) slots, so at most one regular loop reaches into
    // the last third, and the final loop swings wider than it (in a triangle the loops shrink toward the point).
    const cases: { triangle: Point[]; axisX: number; tipY: number }[] = [
      { triangle: ISO, axisX: 6, tipY: TIP_Y },
      // Tall star point, half its apex angle atan(3/10).
      { triangle: [[3, 0], [6, 10], [0, 10]], axisX: 3, tipY: M / Math.sin(Math.atan(3 / 10)) },
      // Flying-geese goose: the 90° point is the corner between the two equal sides.
      { triangle: [[0, 3], [3, 0], [6, 3]], axisX: 3, tipY: M * Math.SQRT2 },
    ];
    let compared = 0;
    for (const { triangle, axisX, tipY } of cases) {
      const axis = Math.max(...triangle.map((p) => p[1])) - M - tipY;
      for (let slots = 1; slots <= 24; slots++) {
        const { lines } = generateRibbonCandy(triangle, { ...base, pitch: axis / slots, margin: M });
        expect(lines.length).toBe(1);
        const { regular, final } = splitLoops(lines[0]!, axisX);
        expect(regular.length).toBe(slots - Math.min(slots, Math.max(2, Math.round(slots / 3))));
        const lastThird = tipY + axis / 3;
        const inLastThird = regular.filter((loop) => Math.min(...loop.map((p) => p[1])) < lastThird - 1e-9);
        expect(inLastThird.length).toBeLessThanOrEqual(1);
        inLastThird.forEach((loop) => expect(across(final)).toBeGreaterThan(across(loop)));
        compared += inLastThird.length;
        // The final loop turns in the point itself (the inner point), not short of it.
        expect(Math.min(...final.map((p) => p[1]))).toBeCloseTo(tipY, 9);
      }
    }
    expect(compared).toBeGreaterThan(10);
  });

  it('grows and then shrinks its loops where the patch widens and narrows', () => {
    // A diamond run point to point along x (half-width 3·(1 − |x − 4| / 4)): the regular loops' swings rise to
    // the middle and fall after it, then the final loop fills the right point.
    const diamond: Point[] = [[0, 3], [4, 0], [8, 3], [4, 6]];
    const { lines } = generateRibbonCandy(diamond, { ...base, pitch: 0.4, margin: 0.1, angle: 0 });
    expect(lines.length).toBe(1);
    const line = lines[0]!;
    const cuts = line.map((p, i) => (Math.abs(p[1] - 3) < 1e-9 ? i : -1)).filter((i) => i >= 0);
    const loops = cuts.slice(1, -2).map((c, k) => line.slice(cuts[k]!, c + 1));
    const swing = loops.map((loop) => Math.max(...loop.map((p) => Math.abs(p[1] - 3))));
    const peak = swing.indexOf(Math.max(...swing));
    swing.slice(1, peak + 1).forEach((s, k) => expect(s).toBeGreaterThan(swing[k]!));
    swing.slice(peak + 1).forEach((s, k) => expect(s).toBeLessThan(swing[peak + k]!));
    const peakX = loops[peak]!.reduce((sum, p) => sum + p[0], 0) / loops[peak]!.length;
    expect(Math.abs(peakX - 4)).toBeLessThan(0.5);
  });

  it('ends a half-square triangle in its square corner (the corner between the equal sides)', () => {
    const hst: Point[] = [[0, 0], [6, 0], [0, 6]];
    const { lines } = generateRibbonCandy(hst, { ...base, pitch: 0.5, margin: M });
    expect(lines.length).toBe(1);
    const line = lines[0]!;
    // Starts on the middle of the hypotenuse moved in by m (x + y = 6 − m√2) and turns in the corner moved in, (m, m).
    expect(line[0]![0]).toBeCloseTo((6 - M * Math.SQRT2) / 2, 9);
    expect(line[0]![1]).toBeCloseTo((6 - M * Math.SQRT2) / 2, 9);
    expect(Math.min(...line.map((p) => Math.hypot(p[0] - M, p[1] - M)))).toBeLessThan(1e-9);
  });
});

describe('motifs/ribbonCandy (separate): one continuous line (fast-check, seeded)', () => {
  it('comes back from the clip as a single polyline in any triangle or rectangle, any pitch, margin and axis', () => {
    const coord = fc.double({ min: 0, max: 20, noNaN: true });
    const point = fc.tuple(coord, coord) as fc.Arbitrary<Point>;
    const size = fc.double({ min: 0.5, max: 15, noNaN: true });
    const patch = fc.oneof(
      fc.tuple(point, point, point).map((t): Point[] => [...t]),
      fc.tuple(point, size, size).map(([[x, y], w, h]): Point[] => [[x, y], [x + w, y], [x + w, y + h], [x, y + h]]),
    ).filter((p) => Math.abs(signedArea(p)) > 1);
    const params = fc.record({
      pitch: fc.double({ min: 0.2, max: 3, noNaN: true }),
      margin: fc.double({ min: 0, max: 0.3, noNaN: true }),
      angle: fc.option(fc.double({ min: -180, max: 180, noNaN: true }), { nil: undefined }),
    });
    let whole = 0;
    fc.assert(
      fc.property(patch, params, (polygon, { pitch, margin, angle }) => {
        const p = { ...base, pitch, margin, ...(angle === undefined ? {} : { angle }) };
        const count = generateRibbonCandy(polygon, p).lines.length;
        // None only when the margin leaves no room (a sliver of a patch).
        expect(count).toBeLessThanOrEqual(1);
        whole += count;
      }),
      { seed: 4242, numRuns: 300 },
    );
    expect(whole).toBeGreaterThan(280);
  });
});

describe('motifs/arches (separate)', () => {
  it('draws one continuous row per base line, arch tops one row spacing up', () => {
    const rect: Point[] = [[0, 0], [6, 0], [6, 4], [0, 4]];
    const { lines } = generateArches(rect, { kind: 'arches', archWidth: 1, rowSpacing: 1, angle: 0, chordError: 0.005, separate: true });
    expect(lines.length).toBe(4);
    lines.forEach((row, r) => {
      const baseY = r + 1;
      expect(row[0]).toEqual([0, baseY]);
      expect(row[row.length - 1]![0]).toBeCloseTo(6, 12);
      // Six arches meet the base line at x = 0 … 6 (seven touch points).
      expect(row.filter((p) => Math.abs(p[1] - baseY) < 1e-12).length).toBe(7);
      expect(Math.min(...row.map((p) => p[1]))).toBeGreaterThanOrEqual(baseY - 1 - 1e-12);
      expect(Math.min(...row.map((p) => p[1]))).toBeLessThan(baseY - 1 + 0.01);
    });
  });
});
