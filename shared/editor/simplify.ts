import { pointSegmentDistance } from '../geometry/distance.ts';
import type { Point, Polyline } from '../geometry/point.ts';

/**
 * Ramer–Douglas–Peucker simplification (Ramer 1972; Douglas & Peucker 1973): keeps the ends, and keeps a
 * point only when it lies farther than `tolerance` (design units) from the chord of the span being
 * simplified. Every dropped point lies within `tolerance` of the result. Iterative, so long freehand
 * strokes cannot overflow the stack.
 */
export function simplifyPolyline(points: Polyline, tolerance: number): Point[] {
  if (points.length <= 2) return [...points];
  const keep = new Uint8Array(points.length);
  keep[0] = 1;
  keep[points.length - 1] = 1;
  const stack: [number, number][] = [[0, points.length - 1]];
  while (stack.length > 0) {
    const [first, last] = stack.pop()!;
    let worst = -1;
    let worstDistance = tolerance;
    for (let i = first + 1; i < last; i++) {
      const d = pointSegmentDistance(points[i]!, points[first]!, points[last]!);
      if (d > worstDistance) [worst, worstDistance] = [i, d];
    }
    if (worst >= 0) {
      keep[worst] = 1;
      stack.push([first, worst], [worst, last]);
    }
  }
  return points.filter((_, i) => keep[i] === 1);
}
