import { closestParameter } from '../geometry/distance.ts';
import type { Point } from '../geometry/point.ts';
import { clipPolyline } from '../motifs/clip.ts';

/** A straight guide the quilter can mark along, as a segment in design units. */
export type Guide = readonly [Point, Point];

/**
 * The guide halfway between two chosen straight lines: it joins the midpoints of their matching ends
 * (b is turned round when that pairs nearer ends). For two parallel lines of equal length facing each
 * other it is the centre line, every point equidistant from both — the line a quilter marks with a ruler
 * between two seams.
 */
export function halfwayGuide(a: Guide, b: Guide): Guide {
  const d = (p: Point, q: Point) => Math.hypot(p[0] - q[0], p[1] - q[1]);
  const [b0, b1] = d(a[0], b[0]) + d(a[1], b[1]) <= d(a[0], b[1]) + d(a[1], b[0]) ? b : [b[1], b[0]];
  return [
    [(a[0][0] + b0[0]) / 2, (a[0][1] + b0[1]) / 2],
    [(a[1][0] + b1[0]) / 2, (a[1][1] + b1[1]) / 2],
  ];
}

/**
 * The extension of a seam segment across the whole block: the infinite line through it, clipped to the
 * block rectangle [0,w]×[0,h]. Returns null for a zero-length segment or a line that misses the block.
 */
export function extensionGuide(seam: Guide, width: number, height: number): Guide | null {
  const [a, b] = seam;
  const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
  if (len === 0) return null;
  const reach = (2 * (width + height)) / len;
  const far: Point[] = [
    [a[0] - (b[0] - a[0]) * reach, a[1] - (b[1] - a[1]) * reach],
    [b[0] + (b[0] - a[0]) * reach, b[1] + (b[1] - a[1]) * reach],
  ];
  const piece = clipPolyline(far, [[0, 0], [width, 0], [width, height], [0, height]])[0];
  return piece ? [piece[0]!, piece[piece.length - 1]!] : null;
}

/** The point of the guide nearest to p (to snap a click onto a guide). */
export function projectOntoGuide(p: Point, guide: Guide): Point {
  const t = closestParameter(p, guide[0], guide[1]);
  return [guide[0][0] + (guide[1][0] - guide[0][0]) * t, guide[0][1] + (guide[1][1] - guide[0][1]) * t];
}
