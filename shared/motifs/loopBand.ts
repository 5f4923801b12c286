import type { Point } from '../geometry/point.ts';
import type { Polygon } from '../layouts/patch.ts';
import { buildAxisFrame, type AxisFrame } from './axisFrame.ts';
import { insetConvex } from './inset.ts';
import { extentAlong, isConvex, orientedPositive, toleranceFor } from './polygon.ts';

/**
 * The room a line of loops may use, seen along an axis: for every u in [start, end] the band
 * [lo, hi] in v that keeps `margin` clear of the outline. For a convex patch the band is the patch moved
 * inward by `margin` on every edge (so every point of the band is at least `margin` from the outline,
 * measured square to the edge); the band is then convex, and a polyline whose vertices lie in it lies in
 * it. A non-convex patch has no such inset by half-planes, so there the band is each cross-section's
 * outer extent narrowed by `margin` in v, and the caller clips the line to the patch.
 */
export interface LoopBand {
  readonly frame: AxisFrame;
  readonly start: number;
  readonly end: number;
  /** The band's extent across the axis: no cross-section is wider. */
  readonly span: number;
  /** [lo, hi] at u (u is clamped to [start, end]); hi < lo where there is no room. */
  readonly at: (u: number) => readonly [number, number];
  /** Whether the band narrows to one point at `start` / at `end` (a corner of the patch, e.g. a triangle's point). */
  readonly pointedStart: boolean;
  readonly pointedEnd: boolean;
}

/** Builds the band along unit direction d, or null when the margin leaves no room at all. */
export function buildLoopBand(polygon: Polygon, d: Point, margin: number): LoopBand | null {
  const convex = isConvex(polygon);
  const shape = convex ? insetConvex(orientedPositive(polygon), margin) : polygon;
  if (shape.length < 3) return null;
  const frame = buildAxisFrame(shape, d);
  const [uLo, uHi] = extentAlong(shape, d);
  const inner = convex ? 0 : margin;
  const start = uLo + inner;
  const end = uHi - inner;
  if (!(end > start)) return null;
  // Cross-sections are read a rounding-sized step inside the extremes: at an extreme itself an edge
  // square to the axis (its ends a few ulps apart in u) would look like a single point.
  const step = toleranceFor(polygon) / 100;
  const cross = (u: number): readonly [number, number] => {
    const c = frame.crossAt(Math.min(uHi - step, Math.max(uLo + step, u)));
    // crossAt misses only when the shape is thinner than the step: treat that as no room.
    return c ? [c[0] + inner, c[1] - inner] : [0, -1];
  };
  // A point, not an edge, at an end: the vertices at (or within rounding of) that end all coincide.
  const tol = step * 1e5;
  const pointedAt = (u: number): boolean => {
    const vs = shape.filter((p) => Math.abs(p[0] * d[0] + p[1] * d[1] - u) <= tol).map((p) => p[0] * frame.n[0] + p[1] * frame.n[1]);
    return Math.max(...vs) - Math.min(...vs) <= tol;
  };
  const [vLo, vHi] = extentAlong(shape, frame.n);
  return { frame, start, end, span: vHi - vLo, at: cross, pointedStart: pointedAt(uLo), pointedEnd: pointedAt(uHi) };
}
