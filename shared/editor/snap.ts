import { properCrossing } from '../geometry/intersect.ts';
import type { Point, Polyline } from '../geometry/point.ts';
import type { Design } from '../design/design.schema.ts';

/** What a point snapped to. */
export type SnapKind = 'end' | 'corner' | 'crossing' | 'midpoint' | 'grid' | 'none';

/** A place worth snapping to, found once per design change by `collectSnapTargets`. */
export interface SnapTarget {
  readonly point: Point;
  readonly kind: 'end' | 'corner' | 'crossing' | 'midpoint';
}

export interface SnapResult {
  readonly point: Point;
  readonly kind: SnapKind;
}

/**
 * Snap targets of a design: block corners and edge midpoints; ends of every seam and quilting line;
 * midpoints of every straight segment of seams and of two-point quilting lines; crossings of any two
 * segments (seams and lines). Crossings are found by a sweep over segments sorted by their left x.
 */
export function collectSnapTargets(design: Pick<Design, 'width' | 'height' | 'seams' | 'lines'>): SnapTarget[] {
  const { width: w, height: h } = design;
  const targets: SnapTarget[] = [
    ...([[0, 0], [w, 0], [w, h], [0, h]] as const).map((point) => ({ point, kind: 'corner' as const })),
    ...([[w / 2, 0], [w, h / 2], [w / 2, h], [0, h / 2]] as const).map((point) => ({ point, kind: 'midpoint' as const })),
  ];
  const all = [...design.seams, ...design.lines];
  for (const line of all) targets.push({ point: line[0]!, kind: 'end' }, { point: line[line.length - 1]!, kind: 'end' });
  const straight = [...design.seams.flatMap(segmentsOf), ...design.lines.filter((l) => l.length === 2).flatMap(segmentsOf)];
  for (const [a, b] of straight) targets.push({ point: [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2], kind: 'midpoint' });
  for (const point of findCrossings(all.flatMap(segmentsOf))) targets.push({ point, kind: 'crossing' });
  return targets;
}

/**
 * Snaps p (design units): the nearest target within `radius` wins (ties: the earlier kind in
 * end, corner, crossing, midpoint); failing that, the nearest grid point at `gridPitch` when given;
 * else p itself with kind 'none'.
 */
export function snapPoint(p: Point, targets: readonly SnapTarget[], options: { readonly radius: number; readonly gridPitch?: number }): SnapResult {
  const rank = { end: 0, corner: 1, crossing: 2, midpoint: 3 } as const;
  let best: SnapTarget | null = null;
  let bestDistance = Infinity;
  for (const t of targets) {
    const d = Math.hypot(t.point[0] - p[0], t.point[1] - p[1]);
    if (d > options.radius) continue;
    if (best === null || d < bestDistance || (d === bestDistance && rank[t.kind] < rank[best.kind])) {
      best = t;
      bestDistance = d;
    }
  }
  if (best) return { point: best.point, kind: best.kind };
  if (options.gridPitch !== undefined && options.gridPitch > 0) {
    const g = options.gridPitch;
    return { point: [Math.round(p[0] / g) * g, Math.round(p[1] / g) * g], kind: 'grid' };
  }
  return { point: p, kind: 'none' };
}

function segmentsOf(line: Polyline): [Point, Point][] {
  return line.slice(1).map((b, i) => [line[i]!, b]);
}

/** Proper crossings between segments (touching ends are ends already). */
function findCrossings(segments: readonly [Point, Point][]): Point[] {
  const sorted = segments
    .map(([a, b]) => ({ a, b, lo: Math.min(a[0], b[0]), hi: Math.max(a[0], b[0]), ylo: Math.min(a[1], b[1]), yhi: Math.max(a[1], b[1]) }))
    .sort((s, t) => s.lo - t.lo);
  const out: Point[] = [];
  let active: typeof sorted = [];
  for (const s of sorted) {
    active = active.filter((t) => t.hi >= s.lo);
    for (const t of active) {
      if (t.yhi < s.ylo || t.ylo > s.yhi) continue;
      const c = properCrossing(s.a, s.b, t.a, t.b);
      if (c) out.push(c.point);
    }
    active.push(s);
  }
  return out;
}
