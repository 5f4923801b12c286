import type { Point } from '../geometry/point.ts';
import { closestParameter } from '../geometry/distance.ts';
import type { Polygon } from '../layouts/patch.ts';
import { toleranceFor } from './polygon.ts';

/**
 * The shorter way along the outline from p to q (both on it within 1e-9 of the patch's size), as points from
 * p to q with the outline's corners between them; null when either point is off the outline.
 */
export function boundaryPath(outline: Polygon, p: Point, q: Point): Point[] | null {
  const n = outline.length;
  const cum: number[] = [0];
  for (let i = 0; i < n; i++) {
    const a = outline[i]!;
    const b = outline[(i + 1) % n]!;
    cum.push(cum[i]! + Math.hypot(b[0] - a[0], b[1] - a[1]));
  }
  const perimeter = cum[n]!;
  const tol = toleranceFor(outline) * 1e3;
  const place = (x: Point): number | null => {
    for (let i = 0; i < n; i++) {
      const a = outline[i]!;
      const b = outline[(i + 1) % n]!;
      const t = closestParameter(x, a, b);
      if (Math.hypot(a[0] + (b[0] - a[0]) * t - x[0], a[1] + (b[1] - a[1]) * t - x[1]) <= tol) return cum[i]! + t * (cum[i + 1]! - cum[i]!);
    }
    return null;
  };
  const from = place(p);
  const to = place(q);
  if (from === null || to === null) return null;
  const wrap = (x: number): number => ((x % perimeter) + perimeter) % perimeter;
  const ahead = wrap(to - from);
  const forward = ahead <= perimeter - ahead;
  const span = forward ? ahead : perimeter - ahead;
  const tiny = perimeter * 1e-12;
  const corners = outline
    .map((point, v) => ({ point, d: forward ? wrap(cum[v]! - from) : wrap(from - cum[v]!) }))
    .filter((c) => c.d > tiny && c.d < span - tiny)
    .sort((a, b) => a.d - b.d)
    .map((c) => c.point);
  return [p, ...corners, q];
}
