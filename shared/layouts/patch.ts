import type { Point } from '../geometry/point.ts';

/** A simple polygon given by its vertices (not repeated at the end), in design units. */
export type Polygon = readonly Point[];

/** What a quilter would call the patch's shape; chosen from its geometry by `classifyPatch`. */
export type PatchShape = 'triangle' | 'square' | 'rectangle' | 'strip' | 'polygon';

/** One piece of fabric in a pieced layout, as the quilter sees it on the finished block. */
export interface Patch {
  /** Plain name of its place in the block, e.g. "top-left triangle", "round 2 right log". */
  readonly name: string;
  readonly shape: PatchShape;
  /**
   * Vertices in design units, ordered so that the shoelace signed area is positive
   * (clockwise as seen on screen, where y points down).
   */
  readonly polygon: Polygon;
}

/**
 * A rectangle whose long side is at least this many times its short side is called a strip
 * (common practice, no source: log cabin logs and sashing strips are long and narrow).
 */
export const STRIP_ASPECT = 3;

/** Shoelace signed area (positive = clockwise on screen with y down), in square design units. */
export function signedArea(polygon: Polygon): number {
  let twice = 0;
  for (let i = 0; i < polygon.length; i++) {
    const [x0, y0] = polygon[i]!;
    const [x1, y1] = polygon[(i + 1) % polygon.length]!;
    twice += x0 * y1 - x1 * y0;
  }
  return twice / 2;
}

/** The polygon with its vertices ordered so that `signedArea` is positive. */
export function orientPositive(polygon: Polygon): Polygon {
  return signedArea(polygon) >= 0 ? polygon : [...polygon].reverse();
}

/**
 * Names the shape of a patch from its geometry: 3 vertices → triangle; 4 vertices with right angles →
 * square (equal sides), strip (aspect ≥ STRIP_ASPECT) or rectangle; anything else → polygon.
 * `relTol` is relative to the longest side.
 */
export function classifyPatch(polygon: Polygon, relTol = 1e-9): PatchShape {
  if (polygon.length === 3) return 'triangle';
  if (polygon.length !== 4) return 'polygon';
  const sides = polygon.map((p, i) => {
    const q = polygon[(i + 1) % 4]!;
    return [q[0] - p[0], q[1] - p[1]] as const;
  });
  const lengths = sides.map(([dx, dy]) => Math.hypot(dx, dy));
  const longest = Math.max(...lengths);
  const square = (longest * relTol) * longest;
  const rightAngles = sides.every(([dx, dy], i) => {
    const [ex, ey] = sides[(i + 1) % 4]!;
    return Math.abs(dx * ex + dy * ey) <= square;
  });
  if (!rightAngles) return 'polygon';
  const long = Math.max(lengths[0]!, lengths[1]!);
  const short = Math.min(lengths[0]!, lengths[1]!);
  if (long - short <= longest * relTol) return 'square';
  return long >= STRIP_ASPECT * short ? 'strip' : 'rectangle';
}
