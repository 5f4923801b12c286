import { describe, expect, it } from 'vitest';
import type { Point, Polyline } from '../geometry/point.ts';
import { angleOfLine } from './polygon.ts';
import { centredOffsets, generateCrosshatch, generateStraightLines } from './straightLines.ts';

const rectangle = (w: number, h: number): Point[] => [[0, 0], [w, 0], [w, h], [0, h]];
const xOf = (line: Polyline) => line[0]![0];

describe('motifs/straightLines', () => {
  // Analytic: n = ⌊w/s⌋ lines, neighbours exactly s apart, centred (border gaps equal, in [s/2, s)).
  it.each([
    [12, 1, 12], [12, 0.75, 16], [10, 3, 3], [7.5, 2, 3], [1, 2, 0], [6, 6, 1],
  ])('across width %s at spacing %s: %s lines', (w, s, n) => {
    const { lines } = generateStraightLines(rectangle(w, 5), { spacing: s, angle: 90 });
    expect(lines.length).toBe(n);
    expect(n).toBe(Math.floor(w / s));
    const xs = lines.map(xOf).sort((a, b) => a - b);
    xs.slice(1).forEach((x, i) => expect(x - xs[i]!).toBeCloseTo(s, 12));
    if (n > 0) {
      const left = xs[0]!;
      const right = w - xs[n - 1]!;
      expect(left).toBeCloseTo(right, 12);
      expect(left).toBeGreaterThanOrEqual(s / 2 - 1e-12);
      expect(left).toBeLessThan(s);
    }
    // Each vertical line spans the full height of the rectangle.
    lines.forEach((l) => expect(Math.abs(l[1]![1] - l[0]![1])).toBeCloseTo(5, 12));
  });

  it('centredOffsets never lands on the border, even for exact multiples', () => {
    expect(centredOffsets(4, 1)).toEqual([0.5, 1.5, 2.5, 3.5]);
  });

  it('runs parallel to a chosen seam', () => {
    // In a half-square triangle (legs 6), lines parallel to the diagonal seam (6,0)→(0,6).
    const triangle: Point[] = [[0, 0], [6, 0], [0, 6]];
    const angle = angleOfLine([6, 0], [0, 6]);
    const { lines } = generateStraightLines(triangle, { spacing: 1, angle });
    // Width across the seam is the triangle's height over the hypotenuse: 6/√2 ≈ 4.243 → 4 lines.
    expect(lines.length).toBe(Math.floor(6 / Math.SQRT2));
    lines.forEach((l) => {
      expect(Math.abs(angleOfLine(l[0]!, l[1]!) - angle) % 180).toBeCloseTo(0, 9);
    });
  });

  it('crosshatch has ⌊w/s⌋ + ⌊h/s⌋ lines at 0°/90°, and ⌊d/s⌋ each way on the diagonal', () => {
    expect(generateCrosshatch(rectangle(10, 6), { kind: 'crosshatch', spacing: 1.5, angle: 0, crossAngle: 90 }).lines.length).toBe(4 + 6);
    // A square of side 8 measures 8√2 across its diagonal (Pythagoras).
    const diagonal = generateCrosshatch(rectangle(8, 8), { kind: 'crosshatch', spacing: 1, angle: 45, crossAngle: 90 });
    expect(diagonal.lines.length).toBe(2 * Math.floor(8 * Math.SQRT2));
  });
});
