import type { Point } from './point.ts';

/**
 * Parameter t ∈ [0, 1] of the point of segment a→b closest to p (0 for a degenerate segment).
 * Planar; design units.
 */
export function closestParameter(p: Point, a: Point, b: Point): number {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len2 = dx * dx + dy * dy;
  if (len2 === 0) return 0;
  const t = ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / len2;
  return t < 0 ? 0 : t > 1 ? 1 : t;
}

/** Distance from p to the closed segment a–b (planar, design units). */
export function pointSegmentDistance(p: Point, a: Point, b: Point): number {
  return Math.sqrt(pointSegmentDistanceSquared(p[0], p[1], a[0], a[1], b[0], b[1]));
}

/** Squared distance from (px, py) to the segment (ax, ay)–(bx, by); scalar form for hot loops. */
export function pointSegmentDistanceSquared(px: number, py: number, ax: number, ay: number, bx: number, by: number): number {
  const dx = bx - ax;
  const dy = by - ay;
  const len2 = dx * dx + dy * dy;
  let t = len2 === 0 ? 0 : ((px - ax) * dx + (py - ay) * dy) / len2;
  if (t < 0) t = 0;
  else if (t > 1) t = 1;
  const ex = ax + t * dx - px;
  const ey = ay + t * dy - py;
  return ex * ex + ey * ey;
}
