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

/**
 * Area of the union of discs, exactly: by Green's theorem the area is ½∮(x dy − y dx) over the union's
 * boundary, which is made of arcs of the circles lying outside every other disc. On circle (c, r) the arc
 * from θ₁ to θ₂ contributes ½[r²(θ₂ − θ₁) + r(c_x(sin θ₂ − sin θ₁) − c_y(cos θ₂ − cos θ₁))]. `near(i)` lists
 * the discs that may overlap disc i (a superset is fine).
 */
export function unionArea(discs: readonly Circle[], near: (i: number) => Iterable<number>): number {
  let area = 0;
  discs.forEach((p, i) => {
    const { center: [cx, cy], radius: r } = p;
    const cuts: number[] = [0, 2 * Math.PI];
    const others: Circle[] = [];
    let hidden = false;
    for (const j of near(i)) {
      if (j === i) continue;
      const q = discs[j]!;
      const d = Math.hypot(q.center[0] - cx, q.center[1] - cy);
      if (d >= r + q.radius) continue;
      // Inside another disc (the earlier of two equal ones keeps the boundary).
      if (d + r <= q.radius && (d + r < q.radius || j < i)) hidden = true;
      others.push(q);
      for (const x of circleCircle(p, q)) cuts.push((Math.atan2(x[1] - cy, x[0] - cx) + 2 * Math.PI) % (2 * Math.PI));
    }
    if (hidden) return;
    cuts.sort((a, b) => a - b);
    for (let k = 1; k < cuts.length; k++) {
      const [t1, t2] = [cuts[k - 1]!, cuts[k]!];
      if (t2 - t1 <= 0) continue;
      const mid = (t1 + t2) / 2;
      const m: Point = [cx + r * Math.cos(mid), cy + r * Math.sin(mid)];
      if (others.some((q) => Math.hypot(m[0] - q.center[0], m[1] - q.center[1]) < q.radius)) continue;
      area += 0.5 * (r * r * (t2 - t1) + r * (cx * (Math.sin(t2) - Math.sin(t1)) - cy * (Math.cos(t2) - Math.cos(t1))));
    }
  });
  return area;
}
