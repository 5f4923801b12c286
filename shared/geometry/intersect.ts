import { orient2d } from 'robust-predicates';
import type { Point } from './point.ts';
import { pointSegmentDistanceSquared } from './distance.ts';

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

/** Contact codes in a `ContactBuffer`: the end lying on the other segment, or CROSSING. */
export const END_A0 = 0;
export const END_A1 = 1;
export const END_B0 = 2;
export const END_B1 = 3;
export const CROSSING = 4;
const END_NAMES: readonly SegmentEnd[] = ['a0', 'a1', 'b0', 'b1'];

/**
 * Room for the contacts of one segment pair (at most 5): contact k is [code, t, u, x, y] at 5k. Hot loops (the
 * noder) reuse one buffer instead of allocating contact objects per pair.
 */
export type ContactBuffer = Float64Array;
export const CONTACT_STRIDE = 5;
export function createContactBuffer(): ContactBuffer {
  return new Float64Array(5 * CONTACT_STRIDE);
}

/**
 * Intersects two closed segments with tolerance `tolerance` (design units, ≥ 0).
 * An end within `tolerance` of the other segment counts as lying on it (T-junctions, touching ends,
 * collinear overlaps). Proper crossings are decided by the signs of Shewchuk's adaptive exact
 * `orient2d` (robust-predicates), so nearly parallel segments never give a false crossing; the crossing
 * point itself is computed in floating point from the same determinants.
 */
export function intersectSegments(a0: Point, a1: Point, b0: Point, b1: Point, tolerance: number): SegmentIntersection {
  const buf = createContactBuffer();
  const count = intersectSegmentsInto(a0[0], a0[1], a1[0], a1[1], b0[0], b0[1], b1[0], b1[1], tolerance, buf);
  const contacts: SegmentContact[] = [];
  for (let k = 0; k < count; k++) {
    const o = k * CONTACT_STRIDE;
    const code = buf[o]!;
    const point: Point = code === END_A0 ? a0 : code === END_A1 ? a1 : code === END_B0 ? b0 : code === END_B1 ? b1 : [buf[o + 3]!, buf[o + 4]!];
    contacts.push({ point, t: buf[o + 1]!, u: buf[o + 2]!, end: code === CROSSING ? null : END_NAMES[code]! });
  }
  if (count === 0) return { kind: 'none', contacts };
  if (count === 1 && contacts[0]!.end === null) return { kind: 'crossing', contacts };
  const tol2 = tolerance * tolerance;
  const [x0, y0] = contacts[0]!.point;
  const spread = contacts.some(({ point: [x, y] }) => (x - x0) * (x - x0) + (y - y0) * (y - y0) > tol2);
  return { kind: spread ? 'overlap' : 'touch', contacts };
}

/**
 * `intersectSegments` on scalars, writing the contacts into `out` (see ContactBuffer) and returning their count;
 * allocation-free. Contacts come in the order a0, a1, b0, b1, crossing.
 * Ends at two places within tolerance of the other segment make an overlap, and the segments stay within
 * tolerance of each other all along it: a proper crossing there adds nothing. It is also ill-conditioned
 * (the lines meet at an angle near rounding level, e.g. a route stroke laid along a line through a rounded
 * crossing vertex), so its point and its parameters t and u need not agree; splitting at it moved a vertex
 * by more than the tolerance and left the two segments cut in different orders. So no crossing is added then.
 */
export function intersectSegmentsInto(
  ax0: number, ay0: number, ax1: number, ay1: number,
  bx0: number, by0: number, bx1: number, by1: number,
  tolerance: number,
  out: ContactBuffer,
): number {
  const tol2 = tolerance * tolerance;
  let n = 0;
  if (pointSegmentDistanceSquared(ax0, ay0, bx0, by0, bx1, by1) <= tol2) n = put(out, n, END_A0, 0, parameter(ax0, ay0, bx0, by0, bx1, by1), ax0, ay0);
  if (pointSegmentDistanceSquared(ax1, ay1, bx0, by0, bx1, by1) <= tol2) n = put(out, n, END_A1, 1, parameter(ax1, ay1, bx0, by0, bx1, by1), ax1, ay1);
  if (pointSegmentDistanceSquared(bx0, by0, ax0, ay0, ax1, ay1) <= tol2) n = put(out, n, END_B0, parameter(bx0, by0, ax0, ay0, ax1, ay1), 0, bx0, by0);
  if (pointSegmentDistanceSquared(bx1, by1, ax0, ay0, ax1, ay1) <= tol2) n = put(out, n, END_B1, parameter(bx1, by1, ax0, ay0, ax1, ay1), 1, bx1, by1);
  for (let k = 1; k < n; k++) {
    const o = k * CONTACT_STRIDE;
    const dx = out[o + 3]! - out[3]!;
    const dy = out[o + 4]! - out[4]!;
    if (dx * dx + dy * dy > tol2) return n; // an overlap
  }
  const o1 = orient2d(ax0, ay0, ax1, ay1, bx0, by0);
  const o2 = orient2d(ax0, ay0, ax1, ay1, bx1, by1);
  if (!(o1 > 0 && o2 < 0) && !(o1 < 0 && o2 > 0)) return n;
  const o3 = orient2d(bx0, by0, bx1, by1, ax0, ay0);
  const o4 = orient2d(bx0, by0, bx1, by1, ax1, ay1);
  if (!(o3 > 0 && o4 < 0) && !(o3 < 0 && o4 > 0)) return n;
  // orient2d(b0, b1, a(t)) is affine in t, so it vanishes at t = o3 / (o3 − o4); likewise for u.
  const t = o3 / (o3 - o4);
  const u = o1 / (o1 - o2);
  const x = ax0 + (ax1 - ax0) * t;
  const y = ay0 + (ay1 - ay0) * t;
  for (let k = 0; k < n; k++) {
    const o = k * CONTACT_STRIDE;
    const dx = out[o + 3]! - x;
    const dy = out[o + 4]! - y;
    if (dx * dx + dy * dy <= tol2) return n;
  }
  return put(out, n, CROSSING, t, u, x, y);
}

/** Writes contact n into `out`; returns n + 1. */
function put(out: ContactBuffer, n: number, code: number, t: number, u: number, x: number, y: number): number {
  const o = n * CONTACT_STRIDE;
  out[o] = code;
  out[o + 1] = t;
  out[o + 2] = u;
  out[o + 3] = x;
  out[o + 4] = y;
  return n + 1;
}

/** The proper crossing of two segment interiors (strictly opposite orientations on both sides), or null. */
export function properCrossing(a0: Point, a1: Point, b0: Point, b1: Point): SegmentContact | null {
  const o1 = orient2d(a0[0], a0[1], a1[0], a1[1], b0[0], b0[1]);
  const o2 = orient2d(a0[0], a0[1], a1[0], a1[1], b1[0], b1[1]);
  if (!(o1 > 0 && o2 < 0) && !(o1 < 0 && o2 > 0)) return null;
  const o3 = orient2d(b0[0], b0[1], b1[0], b1[1], a0[0], a0[1]);
  const o4 = orient2d(b0[0], b0[1], b1[0], b1[1], a1[0], a1[1]);
  if (!(o3 > 0 && o4 < 0) && !(o3 < 0 && o4 > 0)) return null;
  const t = o3 / (o3 - o4);
  const u = o1 / (o1 - o2);
  return { point: [a0[0] + (a1[0] - a0[0]) * t, a0[1] + (a1[1] - a0[1]) * t], t, u, end: null };
}

/** Parameter in [0, 1] of the point of segment a→b closest to p (0 for a degenerate segment); as closestParameter. */
function parameter(px: number, py: number, ax: number, ay: number, bx: number, by: number): number {
  const dx = bx - ax;
  const dy = by - ay;
  const len2 = dx * dx + dy * dy;
  if (len2 === 0) return 0;
  const t = ((px - ax) * dx + (py - ay) * dy) / len2;
  return t < 0 ? 0 : t > 1 ? 1 : t;
}

