import { orient2d } from 'robust-predicates';
import type { Point } from './point.ts';
import { closestParameter, pointSegmentDistanceSquared } from './distance.ts';

/** Which segment end a contact sits on, or null for a proper crossing of two interiors. */
export type SegmentEnd = 'a0' | 'a1' | 'b0' | 'b1';

/** One place where segment a = a0→a1 meets segment b = b0→b1. */
export interface SegmentContact {
  readonly point: Point;
  /** Parameter on a (0 at a0, 1 at a1). */
  readonly t: number;
  /** Parameter on b (0 at b0, 1 at b1). */
  readonly u: number;
  /** The segment end lying on the other segment (within tolerance), or null for a proper crossing. */
  readonly end: SegmentEnd | null;
}

/**
 * How two segments meet:
 * - `none`: no common point within tolerance;
 * - `crossing`: the interiors cross properly (one contact, `end` null);
 * - `touch`: one place where an end lies on the other segment (T-junction or ends touching), possibly
 *   reported by several ends that coincide;
 * - `overlap`: collinear overlap longer than the tolerance; the contacts are the ends inside the overlap.
 */
export interface SegmentIntersection {
  readonly kind: 'none' | 'crossing' | 'touch' | 'overlap';
  readonly contacts: readonly SegmentContact[];
}

/**
 * Intersects two closed segments with tolerance `tolerance` (design units, ≥ 0).
 * An end within `tolerance` of the other segment counts as lying on it (T-junctions, touching ends,
 * collinear overlaps). Proper crossings are decided by the signs of Shewchuk's adaptive exact
 * `orient2d` (robust-predicates), so nearly parallel segments never give a false crossing; the crossing
 * point itself is computed in floating point from the same determinants.
 */
export function intersectSegments(a0: Point, a1: Point, b0: Point, b1: Point, tolerance: number): SegmentIntersection {
  const tol2 = tolerance * tolerance;
  const contacts: SegmentContact[] = [];
  const onB = (p: Point, end: SegmentEnd, t: number): void => {
    if (pointSegmentDistanceSquared(p[0], p[1], b0[0], b0[1], b1[0], b1[1]) <= tol2) {
      contacts.push({ point: p, t, u: closestParameter(p, b0, b1), end });
    }
  };
  const onA = (p: Point, end: SegmentEnd, u: number): void => {
    if (pointSegmentDistanceSquared(p[0], p[1], a0[0], a0[1], a1[0], a1[1]) <= tol2) {
      contacts.push({ point: p, t: closestParameter(p, a0, a1), u, end });
    }
  };
  onB(a0, 'a0', 0);
  onB(a1, 'a1', 1);
  onA(b0, 'b0', 0);
  onA(b1, 'b1', 1);

  const first = contacts[0]?.point;
  if (first !== undefined && contacts.some((c) => !near(c.point, first, tol2))) return { kind: 'overlap', contacts };
  // Ends at two places within tolerance of the other segment make an overlap, and the segments stay within
  // tolerance of each other all along it: a proper crossing there adds nothing. It is also ill-conditioned
  // (the lines meet at an angle near rounding level, e.g. a route stroke laid along a line through a rounded
  // crossing vertex), so its point and its parameters t and u need not agree; splitting at it moved a vertex
  // by more than the tolerance and left the two segments cut in different orders.
  const crossing = properCrossing(a0, a1, b0, b1);
  if (crossing !== null && !contacts.some((c) => near(c.point, crossing.point, tol2))) contacts.push(crossing);
  if (contacts.length === 0) return { kind: 'none', contacts };
  if (contacts.length === 1 && contacts[0]!.end === null) return { kind: 'crossing', contacts };
  return { kind: contacts.length > 1 && contacts.some((c) => !near(c.point, contacts[0]!.point, tol2)) ? 'overlap' : 'touch', contacts };
}

/** The proper crossing of two segment interiors (strictly opposite orientations on both sides), or null. */
export function properCrossing(a0: Point, a1: Point, b0: Point, b1: Point): SegmentContact | null {
  const o1 = orient2d(a0[0], a0[1], a1[0], a1[1], b0[0], b0[1]);
  const o2 = orient2d(a0[0], a0[1], a1[0], a1[1], b1[0], b1[1]);
  if (!(o1 > 0 && o2 < 0) && !(o1 < 0 && o2 > 0)) return null;
  const o3 = orient2d(b0[0], b0[1], b1[0], b1[1], a0[0], a0[1]);
  const o4 = orient2d(b0[0], b0[1], b1[0], b1[1], a1[0], a1[1]);
  if (!(o3 > 0 && o4 < 0) && !(o3 < 0 && o4 > 0)) return null;
  // orient2d(b0, b1, a(t)) is affine in t, so it vanishes at t = o3 / (o3 − o4); likewise for u.
  const t = o3 / (o3 - o4);
  const u = o1 / (o1 - o2);
  return { point: [a0[0] + (a1[0] - a0[0]) * t, a0[1] + (a1[1] - a0[1]) * t], t, u, end: null };
}

function near(p: Point, q: Point, tol2: number): boolean {
  const dx = p[0] - q[0];
  const dy = p[1] - q[1];
  return dx * dx + dy * dy <= tol2;
}
