import type { Point } from '../geometry/point.ts';

/**
 * One turn of folded ribbon candy: the point where it touches the side, and the loop circle run round there
 * (radius 0: a plain turn at the point). `spin` +1 runs the circle toward growing angles (counter-clockwise
 * in a frame with y up), −1 the other way.
 */
export interface Turn {
  readonly touch: Point;
  readonly center: Point;
  readonly radius: number;
  readonly spin: 1 | -1;
}

/**
 * The straight stroke leaving circle a and arriving on circle b tangentially, both run in their own spin
 * (a common tangent: internal when the spins differ). With t the stroke's unit direction and ℓ its left
 * normal, a circle run with spin σ has its centre σ·r·ℓ from the tangent point, so the points are
 * A − σ_a r_a ℓ and B − σ_b r_b ℓ, and ℓ·(B − A) = σ_b r_b − σ_a r_a fixes the direction (analytic
 * geometry). Null when the circles are too close for such a tangent.
 */
export function tangentBetween(a: Turn, b: Turn): [Point, Point] | null {
  const dx = b.center[0] - a.center[0];
  const dy = b.center[1] - a.center[1];
  const length = Math.hypot(dx, dy);
  const k = b.spin * b.radius - a.spin * a.radius;
  if (length === 0 || Math.abs(k) >= length) return null;
  const phi = Math.atan2(dy, dx) - Math.asin(k / length);
  const left: Point = [-Math.sin(phi), Math.cos(phi)];
  return [
    [a.center[0] - a.spin * a.radius * left[0], a.center[1] - a.spin * a.radius * left[1]],
    [b.center[0] - b.spin * b.radius * left[0], b.center[1] - b.spin * b.radius * left[1]],
  ];
}

/**
 * Points on the turn's circle strictly between `from` and `to`, run in its spin, with the touching point
 * among them as an exact vertex when the run passes it; steps are short enough that each chord's sagitta
 * r(1 − cos(θ/2)) stays within chordError.
 */
export function arcPoints(turn: Turn, from: Point, to: Point, chordError: number): Point[] {
  const [cx, cy] = turn.center;
  const r = turn.radius;
  const angle = (p: Point): number => Math.atan2(p[1] - cy, p[0] - cx);
  const ahead = (theta: number): number => {
    const d = turn.spin * (theta - angle(from));
    return ((d % (2 * Math.PI)) + 2 * Math.PI) % (2 * Math.PI);
  };
  const sweep = ahead(angle(to));
  const maxStep = chordError >= r ? Math.PI / 2 : 2 * Math.acos(1 - chordError / r);
  const steps = Math.max(2, Math.ceil(sweep / maxStep));
  const touchAt = ahead(angle(turn.touch));
  const out: { at: number; p: Point }[] = [];
  const touches = touchAt > 0 && touchAt < sweep;
  for (let i = 1; i < steps; i++) {
    const at = (sweep * i) / steps;
    // A step landing on the touching point (within rounding) gives way to the exact point.
    if (touches && Math.abs(at - touchAt) < 1e-9) continue;
    const theta = angle(from) + turn.spin * at;
    out.push({ at, p: [cx + r * Math.cos(theta), cy + r * Math.sin(theta)] });
  }
  if (touches) out.push({ at: touchAt, p: turn.touch });
  return out.sort((x, y) => x.at - y.at).map((x) => x.p);
}
