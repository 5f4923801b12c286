import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { properCrossing } from '../geometry/intersect.ts';
import type { Point, Polyline } from '../geometry/point.ts';
import { signedArea } from '../layouts/patch.ts';
import { generateMotif, type MotifParamsInput } from './motifs.ts';
import { isInsideOrOn } from './polygon.ts';

/** Andrew's monotone chain convex hull (textbook algorithm), for random convex patches. */
function convexHull(points: readonly Point[]): Point[] {
  const sorted = [...points].sort((a, b) => a[0] - b[0] || a[1] - b[1]);
  const cross = (o: Point, a: Point, b: Point) => (a[0] - o[0]) * (b[1] - o[1]) - (a[1] - o[1]) * (b[0] - o[0]);
  const half = (pts: Point[]) => {
    const out: Point[] = [];
    for (const p of pts) {
      while (out.length >= 2 && cross(out[out.length - 2]!, out[out.length - 1]!, p) <= 0) out.pop();
      out.push(p);
    }
    out.pop();
    return out;
  };
  return [...half(sorted), ...half([...sorted].reverse())];
}

const coord = fc.double({ min: 0, max: 20, noNaN: true });
const point = fc.tuple(coord, coord) as fc.Arbitrary<Point>;
const triangle = fc.tuple(point, point, point).map((t): Point[] => [...t]);
const rectangle = fc.tuple(point, fc.double({ min: 0.5, max: 15, noNaN: true }), fc.double({ min: 0.5, max: 15, noNaN: true }))
  .map(([[x, y], w, h]): Point[] => [[x, y], [x + w, y], [x + w, y + h], [x, y + h]]);
const convex = fc.array(point, { minLength: 3, maxLength: 12 }).map(convexHull);
const patch = fc.oneof(triangle, rectangle, convex).filter((p) => p.length >= 3 && Math.abs(signedArea(p)) > 1);

const angle = fc.double({ min: -180, max: 180, noNaN: true });
const spacing = fc.double({ min: 0.2, max: 3, noNaN: true });
const params: fc.Arbitrary<MotifParamsInput> = fc.oneof(
  fc.record({ kind: fc.constant('straight-lines' as const), spacing, angle }),
  fc.record({ kind: fc.constant('crosshatch' as const), spacing, angle, crossAngle: fc.double({ min: 20, max: 160, noNaN: true }) }),
  fc.record({ kind: fc.constant('echo' as const), spacing }),
  fc.record({ kind: fc.constant('pebbles' as const), minRadius: fc.constant(0.3), maxRadius: fc.double({ min: 0.3, max: 2, noNaN: true }), gap: fc.constant(0.05), seed: fc.integer(), chordError: fc.constant(0.01) }),
  fc.record({ kind: fc.constant('ribbon-candy' as const), pitch: spacing, margin: fc.double({ min: 0, max: 0.3, noNaN: true }), angle: fc.option(angle, { nil: undefined }) }),
  fc.record({ kind: fc.constant('arches' as const), archWidth: spacing, rowSpacing: spacing, angle }),
);

/**
 * Whether the polyline stays in the closed polygon within tol: each segment is cut where it properly
 * crosses the outline, and the vertices and every sub-piece's midpoint must lie inside or within tol
 * (between cuts a piece does not cross the outline, so its midpoint decides for all of it).
 */
function isInside(line: Polyline, polygon: readonly Point[], tol: number): boolean {
  if (!line.every((p) => isInsideOrOn(p, polygon, tol))) return false;
  for (let i = 1; i < line.length; i++) {
    const [a, b] = [line[i - 1]!, line[i]!];
    const ts = [0, 1];
    for (let j = 0; j < polygon.length; j++) {
      const c = properCrossing(a, b, polygon[j]!, polygon[(j + 1) % polygon.length]!);
      if (c) ts.push(c.t);
    }
    ts.sort((x, y) => x - y);
    for (let k = 1; k < ts.length; k++) {
      const t = (ts[k - 1]! + ts[k]!) / 2;
      if (!isInsideOrOn([a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t], polygon, tol)) return false;
    }
  }
  return true;
}

describe('motifs: every generated line lies inside its patch (fast-check, seeded)', () => {
  it('holds for random triangles, rectangles and convex polygons', () => {
    fc.assert(
      fc.property(patch, params, (polygon, p) => {
        const result = generateMotif(polygon, p);
        if (!result.ok) throw new Error(`motif refused: ${JSON.stringify(result.error)}`);
        result.value.lines.forEach((line) => {
          expect(line.length).toBeGreaterThanOrEqual(2);
          expect(isInside(line, polygon, 1e-9)).toBe(true);
        });
      }),
      { seed: 20260, numRuns: 400 },
    );
  });

  it('holds for a simple non-convex patch (all motifs but echo)', () => {
    const ell: Point[] = [[0, 0], [6, 0], [6, 2], [2, 2], [2, 7], [0, 7]];
    fc.assert(
      fc.property(params.filter((p) => p.kind !== 'echo'), (p) => {
        const result = generateMotif(ell, p);
        if (!result.ok) throw new Error(`motif refused: ${JSON.stringify(result.error)}`);
        result.value.lines.forEach((line) => expect(isInside(line, ell, 1e-9)).toBe(true));
      }),
      { seed: 7, numRuns: 150 },
    );
  });

  it('refuses a patch with no area', () => {
    expect(generateMotif([[0, 0], [1, 1], [2, 2]], { kind: 'straight-lines', spacing: 1 })).toEqual({ ok: false, error: { kind: 'degenerate-patch' } });
  });

  it('reports invalid parameters with their paths', () => {
    const result = generateMotif([[0, 0], [1, 0], [0, 1]], { kind: 'straight-lines', spacing: -1 });
    expect(result.ok).toBe(false);
    if (!result.ok && result.error.kind === 'invalid-params') expect(result.error.issues[0]!.path).toBe('spacing');
  });
});
