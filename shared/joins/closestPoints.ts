import Flatbush from 'flatbush';
import type { Point } from '../geometry/point.ts';
import { closestParameter, pointSegmentDistanceSquared } from '../geometry/distance.ts';
import { properCrossing } from '../geometry/intersect.ts';
import type { LineKind } from '../graph/planarGraph.types.ts';
import type { TravelPart } from './lineGroups.ts';

/** The nearest points of two travel parts and the kinds of line they lie on. */
export interface ClosestPair {
  readonly length: number;
  readonly from: Point;
  readonly to: Point;
  readonly fromKind: LineKind;
  readonly toKind: LineKind;
}

/** A travel part's segments in a flatbush index, for nearest-point searches. */
export interface IndexedPart {
  readonly part: TravelPart;
  readonly index: Flatbush;
}

export function indexPart(part: TravelPart): IndexedPart {
  const index = new Flatbush(Math.max(1, part.segments.length));
  for (const s of part.segments) index.add(Math.min(s.a[0], s.b[0]), Math.min(s.a[1], s.b[1]), Math.max(s.a[0], s.b[0]), Math.max(s.a[1], s.b[1]));
  if (part.segments.length === 0) index.add(0, 0, 0, 0);
  index.finish();
  return { part, index };
}

/**
 * The nearest points of two parts that do not touch: the least distance over all pairs of their segments
 * (for two segments that do not cross, an end of one is nearest the other). Each segment of the smaller part
 * searches the other's index within the best distance found so far, so the answer is exact.
 */
export function closestPair(x: IndexedPart, y: IndexedPart): ClosestPair | null {
  const [small, large, swapped] = x.part.segments.length <= y.part.segments.length ? [x, y, false] : [y, x, true];
  if (small.part.segments.length === 0 || large.part.segments.length === 0) return null;
  let best: ClosestPair | null = null;
  const first = small.part.segments[0]!;
  const seed = large.index.neighbors(first.a[0], first.a[1], 1)[0]!;
  best = pairOf(first, large.part.segments[seed]!);
  for (const s of small.part.segments) {
    const r = best.length;
    const hits = large.index.search(Math.min(s.a[0], s.b[0]) - r, Math.min(s.a[1], s.b[1]) - r, Math.max(s.a[0], s.b[0]) + r, Math.max(s.a[1], s.b[1]) + r);
    for (const h of hits) {
      const c = pairOf(s, large.part.segments[h]!);
      if (c.length < best.length) best = c;
    }
  }
  return swapped ? { length: best.length, from: best.to, to: best.from, fromKind: best.toKind, toKind: best.fromKind } : best;
}

type Segment = TravelPart['segments'][number];

function pairOf(s: Segment, t: Segment): ClosestPair {
  const options: [Point, Point][] = [
    [s.a, at(t, closestParameter(s.a, t.a, t.b))],
    [s.b, at(t, closestParameter(s.b, t.a, t.b))],
    [at(s, closestParameter(t.a, s.a, s.b)), t.a],
    [at(s, closestParameter(t.b, s.a, s.b)), t.b],
  ];
  let best = options[0]!;
  let bestD = Infinity;
  for (const o of options) {
    const d = Math.hypot(o[1][0] - o[0][0], o[1][1] - o[0][1]);
    if (d < bestD) {
      best = o;
      bestD = d;
    }
  }
  return { length: bestD, from: best[0], to: best[1], fromKind: s.kind, toKind: t.kind };
}

function at(s: Segment, t: number): Point {
  if (t === 0) return s.a;
  if (t === 1) return s.b;
  return [s.a[0] + (s.b[0] - s.a[0]) * t, s.a[1] + (s.b[1] - s.a[1]) * t];
}

/**
 * A test whether the segment from→to crosses or comes within `tolerance` of a part other than parts i and j
 * (its own ends lie on those two). One flatbush index over every part's segments.
 */
export function meetsAnotherPart(parts: readonly TravelPart[], tolerance: number): (from: Point, to: Point, i: number, j: number) => boolean {
  const all = parts.flatMap((p, part) => p.segments.map((s) => ({ ...s, part })));
  const index = new Flatbush(Math.max(1, all.length));
  for (const s of all) index.add(Math.min(s.a[0], s.b[0]), Math.min(s.a[1], s.b[1]), Math.max(s.a[0], s.b[0]), Math.max(s.a[1], s.b[1]));
  if (all.length === 0) index.add(0, 0, 0, 0);
  index.finish();
  const t2 = tolerance * tolerance;
  return (from, to, i, j) => {
    const hits = index.search(Math.min(from[0], to[0]) - tolerance, Math.min(from[1], to[1]) - tolerance, Math.max(from[0], to[0]) + tolerance, Math.max(from[1], to[1]) + tolerance);
    return hits.some((h) => {
      const s = all[h];
      if (!s || s.part === i || s.part === j) return false;
      if (properCrossing(from, to, s.a, s.b)) return true;
      return (
        pointSegmentDistanceSquared(s.a[0], s.a[1], from[0], from[1], to[0], to[1]) <= t2 ||
        pointSegmentDistanceSquared(s.b[0], s.b[1], from[0], from[1], to[0], to[1]) <= t2 ||
        pointSegmentDistanceSquared(from[0], from[1], s.a[0], s.a[1], s.b[0], s.b[1]) <= t2 ||
        pointSegmentDistanceSquared(to[0], to[1], s.a[0], s.a[1], s.b[0], s.b[1]) <= t2
      );
    });
  };
}
