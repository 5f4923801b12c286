import { z } from 'zod';
import type { Point, Polyline } from '../geometry/point.ts';
import type { Polygon } from '../layouts/patch.ts';
import { attachLeg, interiorAngles, openRing, type Leg } from './echoLegs.ts';
import { insetRings } from './inset.ts';
import { positiveNumber, separateSchema, type MotifLines } from './motif.types.ts';
import { isInsideOrOn, orientedPositive } from './polygon.ts';

export const echoParamsSchema = z
  .object({
    kind: z.literal('echo'),
    /** Distance between the outline and the first echo, and between echoes, design units. */
    spacing: positiveNumber,
    /** Most echoes to draw; the generator stops earlier when the patch runs out. */
    maxCount: z.number().int().min(1).max(500).default(100),
    separate: separateSchema,
  })
  .strict();
export type EchoParams = z.output<typeof echoParamsSchema>;

/**
 * The longest step-over leg, as a multiple of the spacing (property-tested). A leg is exactly one spacing
 * (half a spacing to the half-step echo) wherever the inner echo's corner finds the outer echo square below
 * it, which is always the case in a convex patch; in a non-convex patch a leg may have to reach further.
 */
export const ECHO_LEG_FACTOR = 2;

/** One echo ring: its corners (positive orientation, not closed), how far in it lies and the ring it sits in. */
export interface EchoRing {
  readonly points: readonly Point[];
  /** Distance from the outline in spacings: 1, 2, … and, for the half-step echo, k + ½. */
  readonly depth: number;
  /** Index of the ring around it in the ring list, or −1 for the patch outline. */
  readonly parent: number;
}

/**
 * Echo rings: the patch moved inward by k·spacing (k = 1, 2, … up to maxCount, mitred corners, see
 * `insetRings`), outermost first, each with the ring it lies in. A non-convex patch may fall apart into
 * several rings at one depth. Unless `halfStep` is false, a ring with nothing inside it whose middle can still
 * hold a ring half a spacing further in gets that half-step echo (and so does the outline when not even the
 * first echo fits), so no part of the fill is wider than one spacing across (except at corners, see README).
 */
export function buildEchoRings(polygon: Polygon, spacing: number, maxCount: number, halfStep: boolean): EchoRing[] {
  const outline = orientedPositive(polygon);
  const rings: EchoRing[] = [];
  let previous: number[] = [-1];
  let k = 1;
  for (; k <= maxCount; k++) {
    const level = insetRings(outline, k * spacing);
    if (level.length === 0) break;
    const current: number[] = [];
    for (const points of level) {
      const parent = previous.find((p) => p < 0 || isInsideOrOn(points[0]!, rings[p]!.points, spacing * 1e-6)) ?? previous[0]!;
      current.push(rings.length);
      rings.push({ points, depth: k, parent });
    }
    previous = current;
  }
  if (!halfStep || k > maxCount) return rings;
  const hasChild = new Set(rings.map((r) => r.parent));
  const leaves = [-1, ...rings.map((_, i) => i)].filter((i) => !hasChild.has(i));
  for (const leaf of leaves) {
    const around = leaf < 0 ? outline : rings[leaf]!.points;
    const depth = leaf < 0 ? 0.5 : rings[leaf]!.depth + 0.5;
    for (const points of insetRings(around, spacing / 2)) rings.push({ points, depth, parent: leaf });
  }
  return rings;
}

/**
 * Echo lines. Joined (the default): the echoes and the outline make one piece, sewn as a spiral. A step-over
 * leg joins each echo to the one around it (the outermost to the outline) at the same corner of the patch —
 * the corner with the widest angle, where legs are shortest — so the legs line up on one side and read as
 * one line. Where an echo holds exactly one inner echo, the short stretch of it between its own leg and the
 * inner echo's leg is left out, so the needle steps in without sewing that corner twice (a squared spiral).
 * Every echo point still lies exactly k·spacing from the outline's edge lines.
 * Separate: closed rings only, no legs and no half-step echo (the older look).
 */
export function generateEcho(polygon: Polygon, params: EchoParams): MotifLines {
  const { rings, legs } = planEcho(polygon, params);
  if (params.separate) return { lines: rings.map((r) => [...r.points, r.points[0]!]) };
  const children = rings.map((_, i) => rings.map((r, j) => (r.parent === i ? j : -1)).filter((j) => j >= 0));
  const lines: Polyline[] = [];
  const emit = (i: number, line: Point[]): void => {
    const ring = rings[i]!;
    const only = children[i]!.length === 1 ? children[i]![0]! : -1;
    const path = only >= 0 ? openRing(ring.points, legs[i]!.on, legs[only]!.from, 2 * params.spacing) : null;
    if (path === null) {
      line.push(...openRing(ring.points, legs[i]!.on, legs[i]!.on, Infinity)!.slice(1));
      lines.push(line);
      for (const c of children[i]!) emit(c, [legs[c]!.from.point, legs[c]!.on.point]);
      return;
    }
    line.push(...path.slice(1), legs[only]!.on.point);
    emit(only, line);
  };
  rings.forEach((r, i) => {
    if (r.parent < 0) emit(i, [legs[i]!.from.point, legs[i]!.on.point]);
  });
  return { lines };
}

/** The echo rings and, unless `separate`, each ring's step-over leg (legs[i] joins ring i to its parent). */
export function planEcho(polygon: Polygon, params: EchoParams): { rings: EchoRing[]; legs: Leg[] } {
  const outline = orientedPositive(polygon);
  const rings = buildEchoRings(outline, params.spacing, params.maxCount, !params.separate);
  if (params.separate) return { rings, legs: [] };
  const corner = widestCorner(outline);
  const along: Point = unit(outline[corner]!, outline[(corner + 1) % outline.length]!);
  const legs = rings.map((r) => {
    const around = r.parent < 0 ? outline : rings[r.parent]!.points;
    const step = (r.depth - (r.parent < 0 ? 0 : rings[r.parent]!.depth)) * params.spacing;
    return attachLeg(r.points, around, outline[corner]!, along, step);
  });
  return { rings, legs };
}

/** Index of the outline corner with the widest interior angle below 180° (the first such on ties). */
function widestCorner(outline: Polygon): number {
  const angles = interiorAngles(outline);
  let best = 0;
  angles.forEach((a, i) => {
    if (a < Math.PI - 1e-9 && (angles[best]! >= Math.PI - 1e-9 || a > angles[best]! + 1e-9)) best = i;
  });
  return best;
}

function unit(a: Point, b: Point): Point {
  const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
  return [(b[0] - a[0]) / len, (b[1] - a[1]) / len];
}
