import { z } from 'zod';
import type { Point, Polyline } from '../geometry/point.ts';
import type { Polygon } from '../layouts/patch.ts';
import { clipPolyline } from './clip.ts';
import { angleSchema, positiveNumber, separateSchema, type MotifLines } from './motif.types.ts';
import { directionOf, extentAlong } from './polygon.ts';

export const straightLinesParamsSchema = z
  .object({
    kind: z.literal('straight-lines'),
    /** Distance between neighbouring lines, design units. */
    spacing: positiveNumber,
    /** Direction the lines run in, degrees (see angleSchema). */
    angle: angleSchema,
    /** Accepted for every motif; straight lines end on the outline either way. */
    separate: separateSchema,
  })
  .strict();
export type StraightLinesParams = z.output<typeof straightLinesParamsSchema>;

export const crosshatchParamsSchema = z
  .object({
    kind: z.literal('crosshatch'),
    spacing: positiveNumber,
    /** Direction of the first set, degrees. */
    angle: angleSchema,
    /** Angle between the two sets, degrees (90 = square grid, 60 = diamonds). */
    crossAngle: z.number().finite().gt(0).lt(180).default(90),
    /** Accepted for every motif; crosshatch ends on the outline either way. */
    separate: separateSchema,
  })
  .strict();
export type CrosshatchParams = z.output<typeof crosshatchParamsSchema>;

/**
 * Positions across a width `w` for lines `s` apart: n = ⌊w/s⌋ lines, centred, so the two border gaps are
 * equal and each lies in [s/2, s). Convention: no line ever lands on the border; a width that is an exact
 * multiple k·s gets k lines with s/2 at each border. Returns offsets from the low side.
 */
export function centredOffsets(w: number, s: number): number[] {
  const n = Math.floor(w / s);
  const margin = (w - (n - 1) * s) / 2;
  return Array.from({ length: n }, (_, i) => margin + i * s);
}

/**
 * Straight parallel lines across the patch at `spacing`, running in direction `angle`; the n = ⌊w/s⌋
 * lines (w = the patch's width across the lines) follow `centredOffsets`, so neighbours are exactly
 * `spacing` apart. Each line is clipped to the patch: one piece per line in a convex patch, maybe more
 * in a non-convex one.
 */
export function generateStraightLines(polygon: Polygon, params: Pick<StraightLinesParams, 'spacing' | 'angle'>): MotifLines {
  const d = directionOf(params.angle);
  const n: Point = [-d[1], d[0]];
  const [nLo, nHi] = extentAlong(polygon, n);
  const [dLo, dHi] = extentAlong(polygon, d);
  const reach = dHi - dLo;
  const lines: Polyline[] = [];
  for (const offset of centredOffsets(nHi - nLo, params.spacing)) {
    const v = nLo + offset;
    const from: Point = [d[0] * (dLo - reach) + n[0] * v, d[1] * (dLo - reach) + n[1] * v];
    const to: Point = [d[0] * (dHi + reach) + n[0] * v, d[1] * (dHi + reach) + n[1] * v];
    lines.push(...clipPolyline([from, to], polygon));
  }
  return { lines };
}

/** Two straight-line sets at the same spacing, the second turned by `crossAngle` from the first. */
export function generateCrosshatch(polygon: Polygon, params: Omit<CrosshatchParams, 'separate'>): MotifLines {
  const first = generateStraightLines(polygon, { spacing: params.spacing, angle: params.angle });
  const second = generateStraightLines(polygon, { spacing: params.spacing, angle: params.angle + params.crossAngle });
  return { lines: [...first.lines, ...second.lines] };
}
