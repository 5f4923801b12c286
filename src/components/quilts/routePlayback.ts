// The chained route's replay on the quilt map as a pure function of elapsed time: block by block in quilting order,
// the needle runs through each block from its entry to its exit corner (along the curve the map draws), then along
// the link to the next block. With reduced motion (prefers-reduced-motion) nothing slides: the needle stands at the
// block's entry, then its exit, a block at a time.
import type { Point } from '@shared/geometry/point.ts';
import type { ChainLeg } from '@shared/quilt/chainOverview.ts';

/** Seconds spent on each block, and on each link that has a length. */
export const BLOCK_SECONDS = 1.2;
export const LINK_SECONDS = 0.6;

export interface PlaybackFrame {
  /** Index of the block in `legs` the needle is on or travelling to. */
  readonly leg: number;
  readonly phase: 'link' | 'block';
  readonly needle: Point;
}

/** Total replay time in seconds. */
export function playbackSeconds(legs: readonly ChainLeg[]): number {
  return legs.reduce((s, l) => s + BLOCK_SECONDS + (l.linkLength > 0 ? LINK_SECONDS : 0), 0);
}

/** A point on the quadratic Bézier a → c → b at parameter u in [0, 1]. */
export function quadPoint(a: Point, c: Point, b: Point, u: number): Point {
  const v = 1 - u;
  return [v * v * a[0] + 2 * v * u * c[0] + u * u * b[0], v * v * a[1] + 2 * v * u * c[1] + u * u * b[1]];
}

/** The same curve's control point, so that it passes through the block's centre at u = 1/2. */
export function controlThroughCentre(leg: Pick<ChainLeg, 'entry' | 'exit' | 'centre'>): Point {
  return [2 * leg.centre[0] - (leg.entry[0] + leg.exit[0]) / 2, 2 * leg.centre[1] - (leg.entry[1] + leg.exit[1]) / 2];
}

function alongPolyline(points: readonly Point[], u: number): Point {
  const lengths = points.slice(1).map((p, i) => Math.hypot(p[0] - points[i]![0], p[1] - points[i]![1]));
  let rest = u * lengths.reduce((s, l) => s + l, 0);
  for (let i = 0; i < lengths.length; i++) {
    if (rest <= lengths[i]! || i === lengths.length - 1) {
      const f = lengths[i]! === 0 ? 1 : Math.min(1, rest / lengths[i]!);
      const a = points[i]!;
      const b = points[i + 1]!;
      return [a[0] + (b[0] - a[0]) * f, a[1] + (b[1] - a[1]) * f];
    }
    rest -= lengths[i]!;
  }
  return points[points.length - 1]!;
}

/** Where the replay is `t` seconds in (clamped to the start and the end). Null when there is nothing to replay. */
export function frameAt(legs: readonly ChainLeg[], t: number, reduceMotion: boolean): PlaybackFrame | null {
  if (legs.length === 0) return null;
  let rest = Math.max(0, t);
  for (let i = 0; i < legs.length; i++) {
    const leg = legs[i]!;
    if (leg.linkLength > 0) {
      if (rest < LINK_SECONDS) return { leg: i, phase: 'link', needle: reduceMotion ? leg.link[0]! : alongPolyline(leg.link, rest / LINK_SECONDS) };
      rest -= LINK_SECONDS;
    }
    if (rest < BLOCK_SECONDS || i === legs.length - 1) {
      const u = Math.min(1, rest / BLOCK_SECONDS);
      const needle = reduceMotion ? (u < 0.5 ? leg.entry : leg.exit) : quadPoint(leg.entry, controlThroughCentre(leg), leg.exit, u);
      return { leg: i, phase: 'block', needle };
    }
    rest -= BLOCK_SECONDS;
  }
  return null;
}
