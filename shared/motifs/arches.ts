import { z } from 'zod';
import type { Point, Polyline } from '../geometry/point.ts';
import type { Polygon } from '../layouts/patch.ts';
import { buildAxisFrame, halfTurnAt, halfTurnSteps } from './axisFrame.ts';
import { clipPolyline } from './clip.ts';
import { angleSchema, chordErrorSchema, positiveNumber, separateSchema, type MotifLines } from './motif.types.ts';
import { boundaryPath } from './outlinePath.ts';
import { directionOf, extentAlong, orientedPositive } from './polygon.ts';

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
    separate: separateSchema,
  })
  .strict();
export type ArchesParams = z.output<typeof archesParamsSchema>;

/**
 * Rows of arches: each row is one continuous line of half-ellipse arches (width archWidth, height
 * archHeight) standing on a base line and bulging toward −n (upward for angle 0); rows start at the patch's
 * low end in u, where an arch begins, and every row is clipped to the patch.
 * Joined (the default): the first row's feet stand on the patch's base — its far side in n (the bottom for
 * angle 0) — and each further row stands rowSpacing above the one before, up to the last that still reaches
 * into the patch. Rows run alternately left and right, and where a row ends on the outline a run along the
 * outline takes the line to where the next row begins (stitched in the ditch), so a convex patch's rows are
 * one line. Separate (the older look): base lines at rowSpacing, 2·rowSpacing, … from the low side, rows
 * apart from each other.
 */
export function generateArches(polygon: Polygon, params: ArchesParams): MotifLines {
  const d = directionOf(params.angle);
  const frame = buildAxisFrame(polygon, d);
  const [uLo, uHi] = extentAlong(polygon, d);
  const [vLo, vHi] = extentAlong(polygon, frame.n);
  const height = params.archHeight ?? params.rowSpacing;
  const arches = Math.max(1, Math.ceil((uHi - uLo) / params.archWidth));
  const steps = halfTurnSteps(Math.hypot(params.archWidth / 2, height), params.chordError);
  const row = (base: number): Point[] => {
    const points: Point[] = [];
    for (let a = 0; a < arches; a++) {
      const mid = uLo + (a + 0.5) * params.archWidth;
      for (let i = a === 0 ? 0 : 1; i <= steps; i++) {
        const [cos, sin] = halfTurnAt(i, steps);
        points.push(frame.toPoint(mid + (params.archWidth / 2) * cos, base - height * sin));
      }
    }
    return points;
  };
  if (params.separate) {
    const rows = Math.max(1, Math.ceil((vHi - vLo) / params.rowSpacing));
    return { lines: Array.from({ length: rows }, (_, r) => clipPolyline(row(vLo + (r + 1) * params.rowSpacing), polygon)).flat() };
  }
  const rows = Math.max(1, Math.ceil((vHi - vLo) / params.rowSpacing - 1e-9));
  const pieces = Array.from({ length: rows }, (_, r) => {
    const clipped = clipPolyline(row(vHi - r * params.rowSpacing), polygon);
    // Odd rows run back the other way, so one row's end is next to the next row's start.
    return r % 2 === 0 ? clipped : clipped.map((l) => [...l].reverse()).reverse();
  });
  return { lines: joinRows(orientedPositive(polygon), pieces) };
}

/**
 * Joins consecutive rows where one ends and the next starts on the outline: the shorter way along the
 * outline between the two points is added, and the rows become one polyline. Rows in pieces (a non-convex
 * patch) join only at their outer ends; every piece ends on the outline anyway.
 */
function joinRows(outline: Polygon, rows: readonly Polyline[][]): Polyline[] {
  const lines: Point[][] = [];
  let current: Point[] | null = null;
  for (const pieces of rows) {
    pieces.forEach((piece, i) => {
      if (current && i === 0) {
        const run = boundaryPath(outline, current[current.length - 1]!, piece[0]!);
        if (run) {
          current.push(...run.slice(1), ...piece.slice(1));
          return;
        }
      }
      current = [...piece];
      lines.push(current);
    });
  }
  return lines;
}
