import type { Point, Polyline } from './point.ts';

/** Planar length of a polyline in its own units (sum of its segment lengths). */
export function polylineLength(points: Polyline): number {
  let total = 0;
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1]!;
    const b = points[i]!;
    total += Math.hypot(b[0] - a[0], b[1] - a[1]);
  }
  return total;
}

/** The polyline without consecutive repeated points (exact equality). */
export function dropRepeatedPoints(points: Polyline): Point[] {
  const out: Point[] = [];
  for (const p of points) {
    const last = out[out.length - 1];
    if (last === undefined || last[0] !== p[0] || last[1] !== p[1]) out.push(p);
  }
  return out;
}

/** The polyline in reverse order (a new array). */
export function reversePolyline(points: Polyline): Point[] {
  return [...points].reverse();
}
