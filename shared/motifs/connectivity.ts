import Flatbush from 'flatbush';
import type { Point, Polyline } from '../geometry/point.ts';
import { pointSegmentDistanceSquared } from '../geometry/distance.ts';
import { properCrossing } from '../geometry/intersect.ts';
import type { Polygon } from '../layouts/patch.ts';

/**
 * How many pieces the lines make together with the closed outline: two lines are in one piece when some of
 * their segments come within `tolerance` of each other (touch, cross or overlap); the outline is one more
 * line. 1 means a route can reach every line from the outline without a stop. Segments are found through a
 * flatbush index, so this stays near-linear in the number of segments.
 */
export function countPieces(lines: readonly Polyline[], outline: Polygon, tolerance: number): number {
  const all: Polyline[] = [[...outline, outline[0]!], ...lines];
  const segs: { line: number; a: Point; b: Point }[] = [];
  all.forEach((line, i) => {
    for (let k = 1; k < line.length; k++) segs.push({ line: i, a: line[k - 1]!, b: line[k]! });
  });
  const parent = all.map((_, i) => i);
  const find = (i: number): number => (parent[i] === i ? i : (parent[i] = find(parent[i]!)));
  if (segs.length === 0) return all.length;
  const index = new Flatbush(segs.length);
  for (const s of segs) index.add(Math.min(s.a[0], s.b[0]) - tolerance, Math.min(s.a[1], s.b[1]) - tolerance, Math.max(s.a[0], s.b[0]) + tolerance, Math.max(s.a[1], s.b[1]) + tolerance);
  index.finish();
  const tol2 = tolerance * tolerance;
  segs.forEach((s, i) => {
    const box = [Math.min(s.a[0], s.b[0]), Math.min(s.a[1], s.b[1]), Math.max(s.a[0], s.b[0]), Math.max(s.a[1], s.b[1])] as const;
    for (const j of index.search(box[0], box[1], box[2], box[3])) {
      if (j <= i) continue;
      const t = segs[j]!;
      if (find(s.line) === find(t.line)) continue;
      if (segmentsMeet(s.a, s.b, t.a, t.b, tol2)) parent[find(s.line)] = find(t.line);
    }
  });
  return new Set(all.map((_, i) => find(i))).size;
}

/** Whether segments ab and cd cross or come within √tol2 (closest distance of two segments: an end is nearest, unless they cross). */
function segmentsMeet(a: Point, b: Point, c: Point, d: Point, tol2: number): boolean {
  if (properCrossing(a, b, c, d)) return true;
  return (
    pointSegmentDistanceSquared(a[0], a[1], c[0], c[1], d[0], d[1]) <= tol2 ||
    pointSegmentDistanceSquared(b[0], b[1], c[0], c[1], d[0], d[1]) <= tol2 ||
    pointSegmentDistanceSquared(c[0], c[1], a[0], a[1], b[0], b[1]) <= tol2 ||
    pointSegmentDistanceSquared(d[0], d[1], a[0], a[1], b[0], b[1]) <= tol2
  );
}
