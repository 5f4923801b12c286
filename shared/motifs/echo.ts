import { z } from 'zod';
import type { Point, Polyline } from '../geometry/point.ts';
import { signedArea, type Polygon } from '../layouts/patch.ts';
import { err, ok, type Result } from '../result.ts';
import { positiveNumber, type MotifLines } from './motif.types.ts';
import { clipToHalfPlane, isConvex, orientedPositive } from './polygon.ts';

export const echoParamsSchema = z
  .object({
    kind: z.literal('echo'),
    /** Distance between the outline and the first echo, and between echoes, design units. */
    spacing: positiveNumber,
    /** Most echoes to draw; the generator stops earlier when the patch runs out. */
    maxCount: z.number().int().min(1).max(500).default(100),
  })
  .strict();
export type EchoParams = z.output<typeof echoParamsSchema>;

export type EchoError = { readonly kind: 'patch-not-convex' };

/**
 * Echo lines: closed loops (first point repeated last) at k·spacing inside the outline, k = 1, 2, …,
 * outermost first, until the inset is empty. Each loop is the inner parallel body of the convex patch:
 * the intersection of the half-planes bounded by the edge lines moved inward by k·spacing. So every loop
 * vertex is exactly k·spacing from the nearest edge line and no point of the loop is closer (corners
 * stay sharp, as a quilter echoes with a ruler). Non-convex patches are refused.
 */
export function generateEcho(polygon: Polygon, params: EchoParams): Result<MotifLines, EchoError> {
  if (!isConvex(polygon)) return err({ kind: 'patch-not-convex' });
  const outline = orientedPositive(polygon);
  const area = signedArea(outline);
  const lines: Polyline[] = [];
  for (let k = 1; k <= params.maxCount; k++) {
    const inset = insetConvex(outline, k * params.spacing);
    if (inset.length < 3 || signedArea(inset) <= area * 1e-12) break;
    lines.push([...inset, inset[0]!]);
  }
  return ok({ lines });
}

/** The convex polygon moved inward by `distance` on every edge (positive orientation expected). */
export function insetConvex(outline: Polygon, distance: number): Point[] {
  let inset: Point[] = [...outline];
  for (let i = 0; i < outline.length && inset.length > 0; i++) {
    const a = outline[i]!;
    const b = outline[(i + 1) % outline.length]!;
    const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
    // Positive shoelace area puts the interior to the left of a→b: the left normal points inward.
    const n: Point = [-(b[1] - a[1]) / len, (b[0] - a[0]) / len];
    inset = clipToHalfPlane(inset, n, n[0] * a[0] + n[1] * a[1] + distance);
  }
  return inset;
}
