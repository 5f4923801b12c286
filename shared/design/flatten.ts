import type { Point } from '../geometry/point.ts';
import { pointSegmentDistance } from '../geometry/distance.ts';

/** Deepest subdivision of one cubic; 2^20 pieces is far past any stitchable detail. */
const MAX_DEPTH = 20;

/**
 * Flattens the cubic Bézier p0 p1 p2 p3 into a polyline from p0 to p3 whose chord error (the largest
 * distance from the curve to the polyline) is at most `maxError` (design units, > 0).
 * Adaptive de Casteljau halving: a piece is flat once both inner control points lie within `maxError`
 * of its chord. The curve stays inside its control polygon's convex hull, and distance to a segment is
 * convex, so that test bounds the chord error. Subdivision stops at depth 20 (~10⁶ pieces) whatever the error.
 */
export function flattenCubic(p0: Point, p1: Point, p2: Point, p3: Point, maxError: number): Point[] {
  assertError(maxError);
  const out: Point[] = [p0];
  subdivide(p0, p1, p2, p3, maxError, 0, out);
  return out;
}

function subdivide(p0: Point, p1: Point, p2: Point, p3: Point, maxError: number, depth: number, out: Point[]): void {
  const flat = pointSegmentDistance(p1, p0, p3) <= maxError && pointSegmentDistance(p2, p0, p3) <= maxError;
  if (flat || depth >= MAX_DEPTH) {
    out.push(p3);
    return;
  }
  const p01 = mid(p0, p1);
  const p12 = mid(p1, p2);
  const p23 = mid(p2, p3);
  const p012 = mid(p01, p12);
  const p123 = mid(p12, p23);
  const m = mid(p012, p123);
  subdivide(p0, p01, p012, m, maxError, depth + 1, out);
  subdivide(m, p123, p23, p3, maxError, depth + 1, out);
}

/** The cubic that traces the same curve as the quadratic Bézier q0 q1 q2 (degree elevation). */
export function quadraticAsCubic(q0: Point, q1: Point, q2: Point): [Point, Point, Point, Point] {
  return [q0, [q0[0] + (2 / 3) * (q1[0] - q0[0]), q0[1] + (2 / 3) * (q1[1] - q0[1])], [q2[0] + (2 / 3) * (q1[0] - q2[0]), q2[1] + (2 / 3) * (q1[1] - q2[1])], q2];
}

/**
 * Flattens the circular arc around `center` with `radius` from `startAngle` to `endAngle` (radians,
 * measured from the +x axis toward +y; with y pointing down that turns clockwise on screen) into a
 * polyline whose chord error is at most `maxError`. A chord spanning angle θ has sagitta r·(1 − cos θ/2),
 * so the sweep is cut into n = ⌈|sweep| / θmax⌉ equal steps with θmax = 2·acos(1 − maxError/r) (≤ π).
 * Every polyline vertex lies on the circle. A sweep of 2π gives a closed polyline.
 */
export function flattenArc(center: Point, radius: number, startAngle: number, endAngle: number, maxError: number): Point[] {
  assertError(maxError);
  if (!(radius > 0) || !Number.isFinite(radius)) throw new Error('design/flatten: radius must be a positive number');
  const sweep = endAngle - startAngle;
  const thetaMax = maxError >= radius ? Math.PI : 2 * Math.acos(1 - maxError / radius);
  const n = Math.max(1, Math.ceil(Math.abs(sweep) / thetaMax));
  const out: Point[] = [];
  for (let i = 0; i <= n; i++) {
    const a = i === n ? endAngle : startAngle + (sweep * i) / n;
    out.push([center[0] + radius * Math.cos(a), center[1] + radius * Math.sin(a)]);
  }
  return out;
}

function mid(a: Point, b: Point): Point {
  return [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];
}

function assertError(maxError: number): void {
  if (!(maxError > 0) || !Number.isFinite(maxError)) throw new Error('design/flatten: maxError must be a positive number');
}
