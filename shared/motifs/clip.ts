import { intersectSegments } from '../geometry/intersect.ts';
import type { Point, Polyline } from '../geometry/point.ts';
import type { Polygon } from '../layouts/patch.ts';
import { distanceToOutline, isInsideOrOn, toleranceFor } from './polygon.ts';

/**
 * Clips a polyline to a simple polygon (convex or not; closed set: pieces running along the outline
 * are kept). Each segment is cut at every place it meets the outline (crossings, touching vertices,
 * collinear overlaps, via geometry/intersect), and a piece is kept when its midpoint is inside or on the
 * outline. Consecutive kept pieces are joined, so a line that never leaves the polygon comes back whole.
 * Returns the pieces in drawing order, each with ≥ 2 distinct points; every point lies inside or within
 * about 1e-12 × the polygon's size of it.
 */
export function clipPolyline(line: Polyline, polygon: Polygon): Polyline[] {
  const tol = toleranceFor(polygon);
  const pieces: Point[][] = [];
  let current: Point[] | null = null;
  for (let i = 0; i + 1 < line.length; i++) {
    const a = line[i]!;
    const b = line[i + 1]!;
    if (a[0] === b[0] && a[1] === b[1]) continue;
    const ts = cutParameters(a, b, polygon, tol);
    for (let k = 0; k + 1 < ts.length; k++) {
      const t0 = ts[k]!;
      const t1 = ts[k + 1]!;
      const mid = at(a, b, (t0 + t1) / 2);
      if (!isInsideOrOn(mid, polygon, tol)) {
        current = null;
        continue;
      }
      const p0 = at(a, b, t0);
      const p1 = at(a, b, t1);
      if (current === null) {
        current = [p0];
        pieces.push(current);
      }
      current.push(p1);
    }
  }
  return pieces.filter((p) => p.length >= 2);
}

/** Clips every line and returns all pieces, in order. */
export function clipLines(lines: readonly Polyline[], polygon: Polygon): Polyline[] {
  return lines.flatMap((line) => clipPolyline(line, polygon));
}

/** Sorted parameters in [0,1] where segment a→b meets the outline, with 0 and 1 always present. */
function cutParameters(a: Point, b: Point, polygon: Polygon, tol: number): number[] {
  const ts = [0, 1];
  const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
  // A segment shorter than a's distance to the outline cannot meet it (the common case, and a cheap test).
  if (distanceToOutline(a, polygon) > len + 2 * tol) return ts;
  for (let i = 0; i < polygon.length; i++) {
    const hit = intersectSegments(a, b, polygon[i]!, polygon[(i + 1) % polygon.length]!, tol);
    for (const c of hit.contacts) ts.push(c.t);
  }
  ts.sort((x, y) => x - y);
  const minGap = tol / len;
  const out = [0];
  for (const t of ts) if (t > 0 && t < 1 && t - out[out.length - 1]! > minGap) out.push(t);
  if (out.length > 1 && 1 - out[out.length - 1]! <= minGap) out.pop();
  out.push(1);
  return out;
}

function at(a: Point, b: Point, t: number): Point {
  if (t === 0) return a;
  if (t === 1) return b;
  return [a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t];
}
