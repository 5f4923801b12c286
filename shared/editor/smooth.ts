import type { Point, Polyline } from '../geometry/point.ts';

/**
 * Chaikin corner cutting (Chaikin 1974): each pass replaces every segment PQ by the points at 1/4 and
 * 3/4 along it, keeping the two ends, so an open stroke keeps its start and end. Converges to the
 * quadratic B-spline of the input points.
 */
export function chaikinSmooth(points: Polyline, passes: number): Point[] {
  let current: Point[] = [...points];
  for (let pass = 0; pass < passes && current.length > 2; pass++) {
    const next: Point[] = [current[0]!];
    for (let i = 0; i + 1 < current.length; i++) {
      const [p, q] = [current[i]!, current[i + 1]!];
      next.push([0.75 * p[0] + 0.25 * q[0], 0.75 * p[1] + 0.25 * q[1]], [0.25 * p[0] + 0.75 * q[0], 0.25 * p[1] + 0.75 * q[1]]);
    }
    next.push(current[current.length - 1]!);
    current = next;
  }
  return current;
}

/**
 * A uniform Catmull–Rom spline through the points (every input point lies on the curve; the ends are
 * extended by mirroring the neighbour), sampled with `samplesPerSpan` pieces between each pair of points.
 */
export function catmullRomCurve(points: Polyline, samplesPerSpan: number): Point[] {
  if (points.length < 3) return [...points];
  const n = points.length;
  const at = (i: number): Point => {
    if (i < 0) return mirror(points[1]!, points[0]!);
    if (i >= n) return mirror(points[n - 2]!, points[n - 1]!);
    return points[i]!;
  };
  const out: Point[] = [points[0]!];
  for (let i = 0; i + 1 < n; i++) {
    const [p0, p1, p2, p3] = [at(i - 1), at(i), at(i + 1), at(i + 2)];
    for (let s = 1; s <= samplesPerSpan; s++) {
      if (s === samplesPerSpan) {
        out.push(p2);
        continue;
      }
      const t = s / samplesPerSpan;
      const c = (k: 0 | 1) =>
        0.5 * (2 * p1[k] + (p2[k] - p0[k]) * t + (2 * p0[k] - 5 * p1[k] + 4 * p2[k] - p3[k]) * t * t + (3 * p1[k] - p0[k] - 3 * p2[k] + p3[k]) * t * t * t);
      out.push([c(0), c(1)]);
    }
  }
  return out;
}

/** q reflected through p's partner: the point 2q − p (extends a stroke beyond its end). */
function mirror(p: Point, q: Point): Point {
  return [2 * q[0] - p[0], 2 * q[1] - p[1]];
}
