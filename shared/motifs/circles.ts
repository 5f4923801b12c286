import type { Point } from '../geometry/point.ts';

export interface Circle {
  readonly center: Point;
  readonly radius: number;
}

/**
 * Points where two circles cross (0, 1 or 2): the radical line meets the line of centres at distance
 * a = (d² + r₁² − r₂²) / 2d from the first centre, and the crossings lie h = √(r₁² − a²) either side of it
 * (analytic geometry, e.g. Bourke, "Intersection of two circles", 1997). Tangent circles give one point.
 */
export function circleCircle(p: Circle, q: Circle): Point[] {
  const dx = q.center[0] - p.center[0];
  const dy = q.center[1] - p.center[1];
  const d = Math.hypot(dx, dy);
  if (d === 0 || d > p.radius + q.radius || d < Math.abs(p.radius - q.radius)) return [];
  const a = (d * d + p.radius * p.radius - q.radius * q.radius) / (2 * d);
  const h2 = p.radius * p.radius - a * a;
  const mx = p.center[0] + (dx * a) / d;
  const my = p.center[1] + (dy * a) / d;
  if (h2 <= 0) return [[mx, my]];
  const h = Math.sqrt(h2);
  return [
    [mx - (dy * h) / d, my + (dx * h) / d],
    [mx + (dy * h) / d, my - (dx * h) / d],
  ];
}

/** Points where the line through `at` with unit direction d meets the circle (0, 1 or 2). */
export function lineCircle(at: Point, d: Point, c: Circle): Point[] {
  const fx = at[0] - c.center[0];
  const fy = at[1] - c.center[1];
  const b = fx * d[0] + fy * d[1];
  const disc = b * b - (fx * fx + fy * fy - c.radius * c.radius);
  if (disc < 0) return [];
  if (disc === 0) return [[at[0] - b * d[0], at[1] - b * d[1]]];
  const s = Math.sqrt(disc);
  return [-b - s, -b + s].map((t): Point => [at[0] + t * d[0], at[1] + t * d[1]]);
}

/**
 * Area of the lens two overlapping circles share (0 when apart, the smaller disc when one holds the other):
 * the sum of the two circular segments cut off by the common chord (standard formula, e.g. Weisstein,
 * "Circle-Circle Intersection", MathWorld).
 */
export function lensArea(p: Circle, q: Circle): number {
  const d = Math.hypot(q.center[0] - p.center[0], q.center[1] - p.center[1]);
  const [r, s] = [p.radius, q.radius];
  if (d >= r + s) return 0;
  if (d <= Math.abs(r - s)) return Math.PI * Math.min(r, s) ** 2;
  const alpha = Math.acos(Math.max(-1, Math.min(1, (d * d + r * r - s * s) / (2 * d * r))));
  const beta = Math.acos(Math.max(-1, Math.min(1, (d * d + s * s - r * r) / (2 * d * s))));
  return r * r * (alpha - Math.sin(2 * alpha) / 2) + s * s * (beta - Math.sin(2 * beta) / 2);
}
