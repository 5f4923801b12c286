import { pointSegmentDistance } from '../geometry/distance.ts';
import type { Point } from '../geometry/point.ts';
import { signedArea, type Polygon } from '../layouts/patch.ts';

/** Distance from p to the polygon's outline (design units), whether p is inside or not. */
export function distanceToOutline(p: Point, polygon: Polygon): number {
  let best = Infinity;
  for (let i = 0; i < polygon.length; i++) {
    best = Math.min(best, pointSegmentDistance(p, polygon[i]!, polygon[(i + 1) % polygon.length]!));
  }
  return best;
}

/**
 * Whether p lies inside the simple polygon or within `tolerance` of its outline (closed set).
 * Crossing-number test (Jordan curve theorem) for the interior.
 */
export function isInsideOrOn(p: Point, polygon: Polygon, tolerance: number): boolean {
  if (distanceToOutline(p, polygon) <= tolerance) return true;
  let inside = false;
  for (let i = 0, j = polygon.length - 1; i < polygon.length; j = i++) {
    const [xi, yi] = polygon[i]!;
    const [xj, yj] = polygon[j]!;
    if (yi > p[1] !== yj > p[1] && p[0] < ((xj - xi) * (p[1] - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

/** Whether the polygon is convex (every turn has the same sign; collinear vertices allowed). */
export function isConvex(polygon: Polygon): boolean {
  let sign = 0;
  for (let i = 0; i < polygon.length; i++) {
    const [ax, ay] = polygon[i]!;
    const [bx, by] = polygon[(i + 1) % polygon.length]!;
    const [cx, cy] = polygon[(i + 2) % polygon.length]!;
    const turn = (bx - ax) * (cy - by) - (by - ay) * (cx - bx);
    if (turn === 0) continue;
    if (sign !== 0 && Math.sign(turn) !== sign) return false;
    sign = Math.sign(turn);
  }
  return sign !== 0;
}

/** A tolerance proportional to the polygon's size: 1e-12 of its largest coordinate span (at least 1e-15). */
export function toleranceFor(polygon: Polygon): number {
  const xs = polygon.map((p) => p[0]);
  const ys = polygon.map((p) => p[1]);
  const span = Math.max(Math.max(...xs) - Math.min(...xs), Math.max(...ys) - Math.min(...ys));
  return Math.max(span * 1e-12, 1e-15);
}

/** Unit direction of an angle in degrees, measured from +x toward +y (clockwise on screen, y down). */
export function directionOf(angleDegrees: number): Point {
  const a = (angleDegrees * Math.PI) / 180;
  return [Math.cos(a), Math.sin(a)];
}

/** The angle in degrees of the line through a and b (e.g. a chosen seam), for motifs that run parallel to it. */
export function angleOfLine(a: Point, b: Point): number {
  return (Math.atan2(b[1] - a[1], b[0] - a[0]) * 180) / Math.PI;
}

/** Smallest and largest projection of the polygon's vertices onto the unit direction d. */
export function extentAlong(polygon: Polygon, d: Point): readonly [number, number] {
  const values = polygon.map((p) => p[0] * d[0] + p[1] * d[1]);
  return [Math.min(...values), Math.max(...values)];
}

/**
 * The angle (degrees) of the patch's long axis: the direction of the edge across which the patch is
 * narrowest (for a convex polygon the narrowest width is always measured across an edge, as rotating
 * calipers use). For a strip or rectangle this is its long side; for a triangle its longest edge.
 */
export function longAxisAngle(polygon: Polygon): number {
  let best = { angle: 0, width: Infinity };
  polygon.forEach((a, i) => {
    const b = polygon[(i + 1) % polygon.length]!;
    if (a[0] === b[0] && a[1] === b[1]) return;
    const angle = angleOfLine(a, b);
    const d = directionOf(angle);
    const [lo, hi] = extentAlong(polygon, [-d[1], d[0]]);
    if (hi - lo < best.width * (1 - 1e-12)) best = { angle, width: hi - lo };
  });
  return best.angle;
}

/**
 * The polygon clipped to the half-plane {p : n·p ≥ c} (Sutherland–Hodgman, one plane). For a convex
 * polygon the result is convex; consecutive duplicate vertices are dropped.
 */
export function clipToHalfPlane(polygon: Polygon, n: Point, c: number): Point[] {
  const out: Point[] = [];
  const side = (p: Point): number => n[0] * p[0] + n[1] * p[1] - c;
  for (let i = 0; i < polygon.length; i++) {
    const a = polygon[i]!;
    const b = polygon[(i + 1) % polygon.length]!;
    const sa = side(a);
    const sb = side(b);
    if (sa >= 0) out.push(a);
    if ((sa >= 0) !== (sb >= 0)) {
      const t = sa / (sa - sb);
      out.push([a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t]);
    }
  }
  return out.filter((p, i) => {
    const q = out[(i + 1) % out.length]!;
    return out.length === 1 || p[0] !== q[0] || p[1] !== q[1];
  });
}

/** The polygon with positive shoelace area (see layouts/patch.ts), so the interior is left of each edge. */
export function orientedPositive(polygon: Polygon): Polygon {
  return signedArea(polygon) >= 0 ? polygon : [...polygon].reverse();
}
