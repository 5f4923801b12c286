import { z } from 'zod';
import type { Point, Polyline } from '../geometry/point.ts';
import type { Polygon } from '../layouts/patch.ts';
import { buildAxisFrame, halfTurnAt, halfTurnSteps } from './axisFrame.ts';
import { clipPolyline } from './clip.ts';
import { angleSchema, chordErrorSchema, positiveNumber, type MotifLines } from './motif.types.ts';
import { directionOf, extentAlong } from './polygon.ts';

export const archesParamsSchema = z
  .object({
    kind: z.literal('arches'),
    /** Width of one arch along its row, design units. */
    archWidth: positiveNumber,
    /** Distance between the base lines of neighbouring rows, design units. */
    rowSpacing: positiveNumber,
    /** Height of an arch above its base line; defaults to rowSpacing, so arch tops touch the row above. */
    archHeight: positiveNumber.optional(),
    /** Direction the rows run in, degrees; for arches along a strip use the strip's long axis. */
    angle: angleSchema,
    chordError: chordErrorSchema,
  })
  .strict();
export type ArchesParams = z.output<typeof archesParamsSchema>;

/**
 * Rows of arches: each row is one continuous line of half-ellipse arches (width archWidth, height
 * archHeight) standing on a base line and bulging toward −n (upward for angle 0). Base lines lie at
 * rowSpacing, 2·rowSpacing, … from the patch's low side in n, up to and including the first one at or
 * past the high side, so the arch tops fill the last row. Rows start at the patch's low end in u, where
 * an arch begins. Every row is clipped to the patch (a row may fall into several pieces).
 */
export function generateArches(polygon: Polygon, params: ArchesParams): MotifLines {
  const d = directionOf(params.angle);
  const frame = buildAxisFrame(polygon, d);
  const [uLo, uHi] = extentAlong(polygon, d);
  const [vLo, vHi] = extentAlong(polygon, frame.n);
  const height = params.archHeight ?? params.rowSpacing;
  const arches = Math.max(1, Math.ceil((uHi - uLo) / params.archWidth));
  const rows = Math.max(1, Math.ceil((vHi - vLo) / params.rowSpacing));
  const steps = halfTurnSteps(Math.hypot(params.archWidth / 2, height), params.chordError);
  const lines: Polyline[] = [];
  for (let r = 1; r <= rows; r++) {
    const base = vLo + r * params.rowSpacing;
    const row: Point[] = [];
    for (let a = 0; a < arches; a++) {
      const mid = uLo + (a + 0.5) * params.archWidth;
      for (let i = a === 0 ? 0 : 1; i <= steps; i++) {
        const [cos, sin] = halfTurnAt(i, steps);
        row.push(frame.toPoint(mid + (params.archWidth / 2) * cos, base - height * sin));
      }
    }
    lines.push(...clipPolyline(row, polygon));
  }
  return { lines };
}
