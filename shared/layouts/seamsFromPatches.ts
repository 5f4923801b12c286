import type { Point, Polyline } from '../geometry/point.ts';
import type { Polygon } from './patch.ts';

/** Coordinates closer than this (in unit-square layout space) count as the same. */
const EPS = 1e-9;

const keyOf = (p: Point): string => `${Math.round(p[0] / EPS)},${Math.round(p[1] / EPS)}`;

/**
 * Seam lines of a layout drawn in the unit square [0,1]×[0,1]: every patch edge that is not on the
 * block outline, split at T-junctions, de-duplicated, and merged into maximal straight lines.
 * Guarantees: no seam lies on the outline; two seams never overlap; each seam has exactly 2 points.
 */
export function buildSeamsFromPatches(patches: readonly Polygon[]): Polyline[] {
  const vertices = uniquePoints(patches.flat());
  const pieces = new Map<string, readonly [Point, Point]>();
  for (const polygon of patches) {
    polygon.forEach((a, i) => {
      const b = polygon[(i + 1) % polygon.length]!;
      const cuts = vertices
        .map((v) => ({ v, t: paramOn(a, b, v) }))
        .filter((c): c is { v: Point; t: number } => c.t !== null)
        .sort((c, d) => c.t - d.t)
        .map((c) => c.v);
      const chain = [a, ...cuts, b];
      for (let j = 0; j + 1 < chain.length; j++) {
        const p = chain[j]!;
        const q = chain[j + 1]!;
        if (isOnOutline(p, q)) continue;
        const [k1, k2] = [keyOf(p), keyOf(q)].sort();
        pieces.set(`${k1}|${k2}`, [p, q]);
      }
    });
  }
  return mergeCollinear([...pieces.values()]);
}

function uniquePoints(points: readonly Point[]): Point[] {
  const seen = new Map<string, Point>();
  for (const p of points) if (!seen.has(keyOf(p))) seen.set(keyOf(p), p);
  return [...seen.values()];
}

/** Parameter t ∈ (0,1) of v on the open segment ab, or null when v is not strictly inside it. */
function paramOn(a: Point, b: Point, v: Point): number | null {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len2 = dx * dx + dy * dy;
  const cross = (v[0] - a[0]) * dy - (v[1] - a[1]) * dx;
  if (Math.abs(cross) > EPS * Math.sqrt(len2)) return null;
  const t = ((v[0] - a[0]) * dx + (v[1] - a[1]) * dy) / len2;
  return t > EPS && t < 1 - EPS ? t : null;
}

function isOnOutline(p: Point, q: Point): boolean {
  return [0, 1].some((side) => (near(p[0], side) && near(q[0], side)) || (near(p[1], side) && near(q[1], side)));
}

const near = (a: number, b: number): boolean => Math.abs(a - b) <= EPS;

/** Joins segments that lie on one straight line and touch end to end. */
function mergeCollinear(segments: readonly (readonly [Point, Point])[]): Polyline[] {
  const groups = new Map<string, { t0: number; t1: number; p0: Point; p1: Point }[]>();
  for (const [a, b] of segments) {
    let dx = b[0] - a[0];
    let dy = b[1] - a[1];
    const len = Math.hypot(dx, dy);
    dx /= len;
    dy /= len;
    if (dx < -EPS || (Math.abs(dx) <= EPS && dy < 0)) [dx, dy] = [-dx, -dy];
    const offset = a[0] * dy - a[1] * dx;
    const key = `${Math.round(dx / EPS)},${Math.round(dy / EPS)},${Math.round(offset / EPS)}`;
    const ta = a[0] * dx + a[1] * dy;
    const tb = b[0] * dx + b[1] * dy;
    const entry = ta <= tb ? { t0: ta, t1: tb, p0: a, p1: b } : { t0: tb, t1: ta, p0: b, p1: a };
    groups.set(key, [...(groups.get(key) ?? []), entry]);
  }
  const seams: Polyline[] = [];
  for (const group of groups.values()) {
    group.sort((u, v) => u.t0 - v.t0);
    let run = group[0]!;
    for (const next of group.slice(1)) {
      if (next.t0 <= run.t1 + EPS) {
        if (next.t1 > run.t1) run = { ...run, t1: next.t1, p1: next.p1 };
      } else {
        seams.push([run.p0, run.p1]);
        run = next;
      }
    }
    seams.push([run.p0, run.p1]);
  }
  return seams;
}
