import type { LineTarget } from '../design/commands.ts';
import type { Design } from '../design/design.schema.ts';
import { closestParameter, pointSegmentDistance } from '../geometry/distance.ts';
import type { Point, Polyline } from '../geometry/point.ts';

/** A line under the pointer: which list, its index, the segment hit (end point index ≥ 1) and the nearest point on it. */
export interface LineHit {
  readonly target: LineTarget;
  readonly index: number;
  readonly segment: number;
  readonly point: Point;
  readonly distance: number;
}

/**
 * The line nearest to `p` within `radius` design units; quilting lines win over seams at equal distance
 * (they are what the quilter edits most). Linear scan: fine for a click, not meant for every pointer move
 * on very large designs.
 */
export function pickLine(design: Pick<Design, 'lines' | 'seams'>, p: Point, radius: number, targets: readonly LineTarget[] = ['lines', 'seams']): LineHit | null {
  let best: LineHit | null = null;
  for (const target of targets) {
    design[target].forEach((line, index) => {
      for (let i = 1; i < line.length; i++) {
        const a = line[i - 1]!;
        const b = line[i]!;
        const d = pointSegmentDistance(p, a, b);
        if (d <= radius && (best === null || d < best.distance)) {
          const t = closestParameter(p, a, b);
          best = { target, index, segment: i, point: [a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t], distance: d };
        }
      }
    });
  }
  return best;
}

/**
 * Lines in the quilter's clicked order turned into a stitching order: each line is run in the direction
 * whose start is nearer the previous line's end (the first line keeps its drawn direction unless the
 * second is nearer its start). Closed loops keep their direction.
 */
export function orientOwnRoute(lines: readonly Polyline[]): Polyline[] {
  const out: Polyline[] = [];
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i]!;
    const prev = out[out.length - 1];
    if (!prev) {
      const next = lines[i + 1];
      if (next) {
        const end = line[line.length - 1]!;
        const start = line[0]!;
        const dEnd = Math.min(dist(end, next[0]!), dist(end, next[next.length - 1]!));
        const dStart = Math.min(dist(start, next[0]!), dist(start, next[next.length - 1]!));
        out.push(dStart < dEnd ? [...line].reverse() : line);
      } else out.push(line);
      continue;
    }
    const from = prev[prev.length - 1]!;
    out.push(dist(from, line[line.length - 1]!) < dist(from, line[0]!) ? [...line].reverse() : line);
  }
  return out;
}

function dist(a: Point, b: Point): number {
  return Math.hypot(a[0] - b[0], a[1] - b[1]);
}
