import type { Point } from '../geometry/point.ts';
import { closestParameter } from '../geometry/distance.ts';
import type { Polygon } from '../layouts/patch.ts';

/** A place on a ring: on the side from corner `seg` to corner `seg + 1`, at fraction t, and the point itself. */
export interface RingPoint {
  readonly seg: number;
  readonly t: number;
  readonly point: Point;
}

/** A step-over leg from a point on the outer ring (or the outline) to a corner of the inner ring. */
export interface Leg {
  readonly from: RingPoint;
  readonly on: RingPoint;
}

/** Interior angle at each corner of a positively oriented polygon, radians (over π at a reflex corner). */
export function interiorAngles(outline: Polygon): number[] {
  return outline.map((b, i) => {
    const a = outline[(i + outline.length - 1) % outline.length]!;
    const c = outline[(i + 1) % outline.length]!;
    const u: Point = [b[0] - a[0], b[1] - a[1]];
    const v: Point = [c[0] - b[0], c[1] - b[1]];
    return Math.PI - Math.atan2(u[0] * v[1] - u[1] * v[0], u[0] * v[0] + u[1] * v[1]);
  });
}

/**
 * The leg that joins `inner` to `outer`: from the inner ring's corner nearest `reference` among those whose
 * nearest point on the outer ring is `step` away (within 1e-6 of it), square down onto the outer ring; when
 * no corner is that close, from the corner with the shortest way out. Among outer sides equally near, the one
 * most nearly parallel to `along` takes the leg, so every leg of a patch steps the same way.
 */
export function attachLeg(inner: readonly Point[], outer: readonly Point[], reference: Point, along: Point, step: number): Leg {
  const options = inner.map((v, i) => ({ on: { seg: i, t: 0, point: v }, from: nearestOn(outer, v, along), near: Math.hypot(v[0] - reference[0], v[1] - reference[1]) }));
  const length = (o: (typeof options)[number]) => Math.hypot(o.from.point[0] - o.on.point[0], o.from.point[1] - o.on.point[1]);
  const exact = options.filter((o) => length(o) <= step * (1 + 1e-6));
  const pick = exact.length > 0 ? exact.reduce((a, b) => (b.near < a.near ? b : a)) : options.reduce((a, b) => (length(b) < length(a) ? b : a));
  return { from: pick.from, on: pick.on };
}

/** The point of the closed ring nearest p; among sides within rounding of the nearest, the one most parallel to `along`. */
function nearestOn(ring: readonly Point[], p: Point, along: Point): RingPoint {
  const sides = ring.map((a, i) => {
    const b = ring[(i + 1) % ring.length]!;
    const t = closestParameter(p, a, b);
    const point: Point = t === 0 ? a : t === 1 ? b : [a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t];
    const len = Math.hypot(b[0] - a[0], b[1] - a[1]) || 1;
    const parallel = Math.abs(((b[0] - a[0]) * along[0] + (b[1] - a[1]) * along[1]) / len);
    return { seg: i, t, point, d: Math.hypot(point[0] - p[0], point[1] - p[1]), parallel };
  });
  const best = Math.min(...sides.map((s) => s.d));
  const tied = sides.filter((s) => s.d <= best + 1e-9 * (1 + best));
  const s = tied.reduce((a, b) => (b.parallel > a.parallel + 1e-9 ? b : a));
  return { seg: s.seg, t: s.t, point: s.point };
}

/**
 * The closed ring walked from `entry` to `exit` the long way round, leaving out the shorter stretch between
 * them; null when that stretch is longer than `limit`. When entry and exit are the same place, the whole
 * ring from entry back to entry. Points run from entry.point to exit.point.
 */
export function openRing(ring: readonly Point[], entry: RingPoint, exit: RingPoint, limit: number): Point[] | null {
  const n = ring.length;
  const cum: number[] = [0];
  for (let i = 0; i < n; i++) {
    const a = ring[i]!;
    const b = ring[(i + 1) % n]!;
    cum.push(cum[i]! + Math.hypot(b[0] - a[0], b[1] - a[1]));
  }
  const perimeter = cum[n]!;
  const pos = (rp: RingPoint): number => cum[rp.seg]! + rp.t * (cum[rp.seg + 1]! - cum[rp.seg]!);
  const tiny = perimeter * 1e-12;
  const wrap = (x: number): number => ((x % perimeter) + perimeter) % perimeter;
  const ahead = wrap(pos(exit) - pos(entry));
  const same = ahead <= tiny || perimeter - ahead <= tiny;
  if (!same && Math.min(ahead, perimeter - ahead) > limit) return null;
  const forward = same || ahead >= perimeter - ahead;
  const span = same ? perimeter : forward ? ahead : perimeter - ahead;
  const corners = ring
    .map((point, v) => ({ point, d: forward ? wrap(cum[v]! - pos(entry)) : wrap(pos(entry) - cum[v]!) }))
    .filter((c) => c.d > tiny && c.d < span - tiny)
    .sort((a, b) => a.d - b.d)
    .map((c) => c.point);
  return [entry.point, ...corners, same ? entry.point : exit.point];
}
