import type { Point } from '../geometry/point.ts';
import type { Polygon } from '../layouts/patch.ts';

/**
 * A patch seen in a frame turned to direction d: u runs along d, v along the normal n = (−d_y, d_x).
 * `crossAt(u)` gives the patch's extent in v on the line at u (for a convex patch, the chord).
 */
export interface AxisFrame {
  readonly d: Point;
  readonly n: Point;
  readonly toPoint: (u: number, v: number) => Point;
  /** Smallest and largest v where the line {u = const} meets the outline, or null when it misses. */
  readonly crossAt: (u: number) => readonly [number, number] | null;
}

/** Builds the frame for unit direction d. */
export function buildAxisFrame(polygon: Polygon, d: Point): AxisFrame {
  const n: Point = [-d[1], d[0]];
  const uv = polygon.map((p): Point => [p[0] * d[0] + p[1] * d[1], p[0] * n[0] + p[1] * n[1]]);
  return {
    d,
    n,
    toPoint: (u, v) => [d[0] * u + n[0] * v, d[1] * u + n[1] * v],
    crossAt: (u) => {
      let lo = Infinity;
      let hi = -Infinity;
      for (let i = 0; i < uv.length; i++) {
        const [ua, va] = uv[i]!;
        const [ub, vb] = uv[(i + 1) % uv.length]!;
        if ((u < ua && u < ub) || (u > ua && u > ub)) continue;
        const values = ua === ub ? [va, vb] : [va + ((vb - va) * (u - ua)) / (ub - ua)];
        for (const v of values) {
          lo = Math.min(lo, v);
          hi = Math.max(hi, v);
        }
      }
      return lo <= hi ? [lo, hi] : null;
    },
  };
}

/**
 * Parameter steps for half an ellipse-like curve (an affine image of a half circle whose linear part has
 * Frobenius norm ≤ `radius`) so that its chord error stays ≤ `chordError`: a chord over angle θ of a
 * circle of radius R has sagitta R(1 − cos θ/2), and an affine map stretches distances by at most its norm.
 */
export function halfTurnSteps(radius: number, chordError: number): number {
  if (chordError >= radius) return 2;
  return Math.max(2, Math.ceil(Math.PI / (2 * Math.acos(1 - chordError / radius))));
}

/** [cos θ, sin θ] at θ = π·(1 − i/steps), exact at both ends (sin π is not 0 in floating point). */
export function halfTurnAt(i: number, steps: number): readonly [number, number] {
  if (i === 0) return [-1, 0];
  if (i === steps) return [1, 0];
  const theta = Math.PI * (1 - i / steps);
  return [Math.cos(theta), Math.sin(theta)];
}
