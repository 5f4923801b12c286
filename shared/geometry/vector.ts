import type { Point } from './point.ts';

/** Planar vector helpers on [x, y] tuples (design units). Pure; no allocation beyond the returned tuple. */

export const add = (a: Point, b: Point): Point => [a[0] + b[0], a[1] + b[1]];
export const subtract = (a: Point, b: Point): Point => [a[0] - b[0], a[1] - b[1]];
export const scale = (a: Point, k: number): Point => [a[0] * k, a[1] * k];
export const dot = (a: Point, b: Point): number => a[0] * b[0] + a[1] * b[1];
/** z-component of the 3D cross product a × b (positive when b turns counter-clockwise from a in x-right, y-up axes). */
export const cross = (a: Point, b: Point): number => a[0] * b[1] - a[1] * b[0];
/** Point at parameter t on the segment a→b (t = 0 gives a, t = 1 gives b). */
export const lerp = (a: Point, b: Point, t: number): Point => [a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t];

/** Euclidean distance between two points (planar). */
export function distance(a: Point, b: Point): number {
  return Math.hypot(b[0] - a[0], b[1] - a[1]);
}

/** Squared Euclidean distance; cheaper for comparisons. */
export function distanceSquared(a: Point, b: Point): number {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  return dx * dx + dy * dy;
}

/** True when both coordinates are finite numbers. */
export function isFinitePoint(p: Point): boolean {
  return Number.isFinite(p[0]) && Number.isFinite(p[1]);
}
