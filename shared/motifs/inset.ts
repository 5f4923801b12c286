import { Clipper, EndType, JoinType } from 'clipper2-ts';
import type { Point } from '../geometry/point.ts';
import { signedArea, type Polygon } from '../layouts/patch.ts';
import { clipToHalfPlane, isConvex, orientedPositive } from './polygon.ts';

/**
 * Mitre limit for insets of non-convex patches, as a multiple of the inset distance: a reflex corner whose
 * mitre would reach further is squared off there. 5 is Shapely's default `mitre_limit` for buffers (GEOS), so
 * the reference test compares like with like; a reflex corner needs an interior angle over ~337° to reach it.
 */
export const MITRE_LIMIT = 5;

/** Decimal places Clipper2 keeps for PathD coordinates (its maximum): 1e-8 design units. */
const CLIPPER_PRECISION = 8;

/** The convex polygon moved inward by `distance` on every edge (positive orientation expected). */
export function insetConvex(outline: Polygon, distance: number): Point[] {
  let inset: Point[] = [...outline];
  for (let i = 0; i < outline.length && inset.length > 0; i++) {
    const a = outline[i]!;
    const b = outline[(i + 1) % outline.length]!;
    const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
    if (len === 0) continue;
    // Positive shoelace area puts the interior to the left of a→b: the left normal points inward.
    const n: Point = [-(b[1] - a[1]) / len, (b[0] - a[0]) / len];
    inset = clipToHalfPlane(inset, n, n[0] * a[0] + n[1] * a[1] + distance);
  }
  return inset;
}

/**
 * The patch moved inward by `distance` with mitred (sharp) corners, as zero or more simple rings with
 * positive orientation (a non-convex patch may fall apart into several). Every edge of a ring lies on the
 * line of an outline edge moved inward by exactly `distance`.
 * - Convex patch: the intersection of the half-planes bounded by the moved edge lines (exact to rounding).
 * - Non-convex patch: Clipper2's polygon offset (the npm package clipper2-ts, a TypeScript port of Angus
 *   Johnson's Clipper2; JoinType.Miter, limit MITRE_LIMIT), which resolves the raw offset's self-crossings;
 *   coordinates are kept to 1e-8 design units.
 * Rings with no area (within 1e-12 of the patch's) are dropped.
 */
export function insetRings(polygon: Polygon, distance: number): Point[][] {
  const outline = orientedPositive(polygon);
  const area = signedArea(outline);
  if (isConvex(outline)) {
    const ring = insetConvex(outline, distance);
    return ring.length >= 3 && signedArea(ring) > area * 1e-12 ? [ring] : [];
  }
  // Clipper2 works on the origin-shifted patch so its fixed decimal precision is relative to the patch.
  const [ox, oy] = outline[0]!;
  const path = outline.map(([x, y]) => ({ x: x - ox, y: y - oy }));
  const solution = Clipper.inflatePathsD([path], -distance, JoinType.Miter, EndType.Polygon, MITRE_LIMIT, CLIPPER_PRECISION);
  return solution
    .map((ring) => orientedPositive(ring.map((p): Point => [p.x + ox, p.y + oy])) as Point[])
    .filter((ring) => ring.length >= 3 && signedArea(ring) > area * 1e-12);
}
