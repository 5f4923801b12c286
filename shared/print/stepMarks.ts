import type { Point } from '../geometry/point.ts';
import { joinPoints } from '../walkthrough/stepText.ts';
import type { RouteStrokeInput, Walkthrough } from '../walkthrough/walkthrough.types.ts';

/**
 * A mark on the printed block: a step's number where the needle is halfway along it, with the direction it moves
 * there (an arrow is drawn along `angle`), or a pass's start.
 */
export interface StepMark {
  readonly kind: 'start' | 'stitch' | 'travel';
  /** The step's number as the printed list counts it (1-based), or for a start, its pass. */
  readonly number: number;
  readonly at: Point;
  /** Direction of sewing at `at`, radians, in drawing coordinates (x right, y down): 0 = toward the right edge. */
  readonly angle: number;
}

/**
 * Marks for a walkthrough over its route (both in the same units): one per stitch or travel step at half its
 * length, one per pass start at the needle's first point. Zero-length steps get none.
 */
export function findStepMarks(walkthrough: Walkthrough, route: readonly RouteStrokeInput[]): StepMark[] {
  const marks: StepMark[] = [];
  for (const step of walkthrough.steps) {
    if (step.kind === 'start') {
      marks.push({ kind: 'start', number: step.pass, at: step.from, angle: 0 });
      continue;
    }
    if (step.kind === 'tie-off') continue;
    const half = halfway(joinPoints(step.strokes.map((i) => route[i]!.points)));
    if (half) marks.push({ kind: step.kind, number: step.index + 1, ...half });
  }
  return marks;
}

/** The point at half a polyline's length and the direction of the segment it lies on; null when it has no length. */
export function halfway(points: readonly Point[]): { at: Point; angle: number } | null {
  let total = 0;
  for (let i = 1; i < points.length; i++) total += Math.hypot(points[i]![0] - points[i - 1]![0], points[i]![1] - points[i - 1]![1]);
  if (!(total > 0)) return null;
  let walked = 0;
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1]!;
    const b = points[i]!;
    const d = Math.hypot(b[0] - a[0], b[1] - a[1]);
    if (d > 0 && walked + d >= total / 2) {
      const t = (total / 2 - walked) / d;
      return { at: [a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t], angle: Math.atan2(b[1] - a[1], b[0] - a[0]) };
    }
    walked += d;
  }
  return null;
}

/**
 * Where each step number's disc goes on the page (points): beside its mark, to the left of the direction of sewing
 * first, then to the right, then ahead and behind, at 9 pt and then 16 pt, with the first spot whose disc (radius `r`)
 * overlaps no disc placed before it and no other mark's arrow. When every spot is taken the number still prints at the
 * first spot (a number is never dropped: the list refers to it). Greedy in the given order.
 */
export function placeStepNumbers(marks: readonly { readonly at: Point; readonly angle: number }[], r: number): Point[] {
  const placed: Point[] = [];
  const clear = (p: Point, upTo: number): boolean =>
    placed.every((q) => Math.hypot(p[0] - q[0], p[1] - q[1]) >= 2 * r) &&
    marks.every((m, j) => j === upTo || Math.hypot(p[0] - m.at[0], p[1] - m.at[1]) >= r + 3);
  marks.forEach((m, i) => {
    const c = Math.cos(m.angle);
    const s = Math.sin(m.angle);
    // Left of the direction of sewing is (s, −c) in y-down coordinates.
    const directions: Point[] = [[s, -c], [-s, c], [c, s], [-c, -s], [s + c, s - c], [s - c, -c - s], [c - s, s + c], [-s - c, c - s]];
    const spots: Point[] = [];
    for (const d of [9, 16]) for (const [dx, dy] of directions) {
      const len = Math.hypot(dx, dy);
      spots.push([m.at[0] + (dx / len) * d, m.at[1] + (dy / len) * d]);
    }
    placed.push(spots.find((p) => clear(p, i)) ?? spots[0]!);
  });
  return placed;
}
