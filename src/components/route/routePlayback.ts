import type { Point } from '@shared/geometry/point.ts';
import type { StrokeKind, StrokePath } from '@shared/contract/strokes.ts';

/** What playback reads of a route's stroke (shared/contract/strokes.ts); lengths are recomputed from the points. */
export type RouteStroke = Pick<StrokePath, 'pass' | 'kind' | 'points'>;

/**
 * A route laid out along one distance axis, so a player can ask "where is the needle after d units".
 * Passes follow each other with no distance between them (the thread is cut and the needle lifted).
 * `starts[i]` is the distance at which stroke i begins; `total` the whole route's length (design units).
 */
export interface Playback {
  readonly strokes: readonly RouteStroke[];
  readonly starts: readonly number[];
  /** Cumulative length at each point of each stroke, from the stroke's start. */
  readonly partials: readonly (readonly number[])[];
  readonly total: number;
}

/** Where the needle is: the point, its heading (radians, screen y down) and the stroke it is on. */
export interface NeedlePosition {
  readonly point: Point;
  readonly angle: number;
  readonly strokeIndex: number;
  /** Index in the stroke's points of the end of the segment the needle is on (≥ 1). */
  readonly segment: number;
  readonly pass: number;
  readonly kind: StrokeKind;
}

export function buildPlayback(strokes: readonly RouteStroke[]): Playback {
  const starts: number[] = [];
  const partials: number[][] = [];
  let total = 0;
  for (const s of strokes) {
    starts.push(total);
    const acc = [0];
    for (let i = 1; i < s.points.length; i++) {
      const [x0, y0] = s.points[i - 1]!;
      const [x1, y1] = s.points[i]!;
      acc.push(acc[i - 1]! + Math.hypot(x1 - x0, y1 - y0));
    }
    partials.push(acc);
    total += acc[acc.length - 1]!;
  }
  return { strokes, starts, partials, total };
}

/** The needle after `distance` design units (clamped to [0, total]); null for an empty route. */
export function needleAt(playback: Playback, distance: number): NeedlePosition | null {
  const { strokes, starts, partials, total } = playback;
  if (strokes.length === 0) return null;
  const d = Math.min(total, Math.max(0, distance));
  const si = Math.max(0, upperBound(starts, d) - 1);
  const stroke = strokes[si]!;
  const acc = partials[si]!;
  const local = d - starts[si]!;
  const k = Math.min(acc.length - 1, Math.max(1, upperBound(acc, local)));
  const a = stroke.points[k - 1]!;
  const b = stroke.points[k]!;
  const seg = acc[k]! - acc[k - 1]!;
  const t = seg > 0 ? Math.min(1, (local - acc[k - 1]!) / seg) : 0;
  return {
    point: [a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t],
    angle: Math.atan2(b[1] - a[1], b[0] - a[0]),
    strokeIndex: si,
    segment: k,
    pass: stroke.pass,
    kind: stroke.kind,
  };
}

/**
 * The distance of the next stroke boundary after `distance` (step forward) or the last one before it
 * (step back); the route's ends when there is none.
 */
export function stepFrom(playback: Playback, distance: number, direction: 1 | -1): number {
  const marks = [...playback.starts, playback.total];
  const eps = 1e-9 * Math.max(1, playback.total);
  if (direction === 1) return marks.find((m) => m > distance + eps) ?? playback.total;
  for (let i = marks.length - 1; i >= 0; i--) if (marks[i]! < distance - eps) return marks[i]!;
  return 0;
}

/** Direction arrows for a stroke: one at every `spacing` units along it (at least one, at its middle). */
export function arrowMarks(points: readonly Point[], spacing: number): { point: Point; angle: number }[] {
  const single = buildPlayback([{ pass: 1, kind: 'stitch', points }]);
  if (single.total <= 0) return [];
  const count = Math.max(1, Math.floor(single.total / spacing));
  const out: { point: Point; angle: number }[] = [];
  for (let i = 0; i < count; i++) {
    const at = needleAt(single, ((i + 0.5) * single.total) / count)!;
    out.push({ point: at.point, angle: at.angle });
  }
  return out;
}

/** Where each pass begins, with its number, for the pass labels on the canvas. */
export function passStarts(strokes: readonly RouteStroke[]): { pass: number; point: Point }[] {
  const out: { pass: number; point: Point }[] = [];
  for (const s of strokes) {
    if (out.length > 0 && out[out.length - 1]!.pass === s.pass) continue;
    const p = s.points[0];
    if (p) out.push({ pass: s.pass, point: p });
  }
  return out;
}

/** First index whose value is greater than `v` in ascending `xs`. */
function upperBound(xs: readonly number[], v: number): number {
  let lo = 0;
  let hi = xs.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (xs[mid]! <= v) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}
