import { z } from 'zod';
import type { Point, Polyline } from '../geometry/point.ts';
import type { Polygon } from '../layouts/patch.ts';
import { buildAxisFrame, halfTurnAt, halfTurnSteps } from './axisFrame.ts';
import { clipPolyline } from './clip.ts';
import { chordErrorSchema, positiveNumber, type MotifLines } from './motif.types.ts';
import { directionOf, extentAlong, longAxisAngle } from './polygon.ts';

export const ribbonCandyParamsSchema = z
  .object({
    kind: z.literal('ribbon-candy'),
    /** Length of one loop along the axis, design units (rounded so the loops fill the axis exactly). */
    pitch: positiveNumber,
    /** Clear distance kept from the outline, design units. */
    margin: z.number().finite().min(0).default(0),
    /** Axis direction in degrees; by default the triangle's apex-to-base axis or the patch's long axis. */
    angle: z.number().finite().optional(),
    chordError: chordErrorSchema,
  })
  .strict();
export type RibbonCandyParams = z.output<typeof ribbonCandyParamsSchema>;

/**
 * Ribbon candy: one continuous line of loops that alternate left and right of the patch's centre line
 * while it moves along the axis. Loop k spans [u_k, u_k+1] along the axis (pitch rounded to fill the
 * axis) and is half an ellipse standing on the centre line; its height is the largest that keeps every
 * vertex `margin` inside the patch, so loops grow where the patch is wide and shrink where it narrows
 * (in a triangle they grow from the point toward the base). Vertices are inside the patch; the line is
 * finally clipped to the patch, which leaves it whole in a convex patch.
 */
export function generateRibbonCandy(polygon: Polygon, params: RibbonCandyParams): MotifLines {
  const d = directionOf(params.angle ?? defaultAxisAngle(polygon));
  const frame = buildAxisFrame(polygon, d);
  const [uLo, uHi] = extentAlong(polygon, d);
  const [vLo, vHi] = extentAlong(polygon, frame.n);
  const start = uLo + params.margin;
  const length = uHi - params.margin - start;
  if (!(length > 0)) return { lines: [] };
  const loops = Math.max(1, Math.round(length / params.pitch));
  const pitch = length / loops;
  const centre = (u: number): number => {
    const cross = frame.crossAt(u);
    return cross ? (cross[0] + cross[1]) / 2 : (vLo + vHi) / 2;
  };
  const steps = halfTurnSteps(Math.hypot(pitch, vHi - vLo) * 2, params.chordError);
  const points: Point[] = [];
  for (let k = 0; k < loops; k++) {
    const u0 = start + k * pitch;
    const c0 = centre(u0);
    const c1 = centre(u0 + pitch);
    const side = k % 2 === 0 ? 1 : -1;
    const samples = Array.from({ length: steps + 1 }, (_, i) => {
      const [cos, lift] = halfTurnAt(i, steps);
      const t = (1 + cos) / 2;
      return { u: u0 + pitch * t, base: c0 + (c1 - c0) * t, lift };
    });
    let height = Infinity;
    for (const s of samples) {
      if (s.lift <= 1e-12) continue;
      const cross = frame.crossAt(s.u);
      const room = cross ? (side > 0 ? cross[1] - params.margin - s.base : s.base - cross[0] - params.margin) : 0;
      height = Math.min(height, Math.max(0, room) / s.lift);
    }
    if (!Number.isFinite(height)) height = 0;
    samples.forEach((s, i) => {
      if (k > 0 && i === 0) return;
      points.push(frame.toPoint(s.u, s.base + side * height * s.lift));
    });
  }
  const line: Polyline = points;
  return { lines: clipPolyline(line, polygon) };
}

/** Apex-to-base axis for a triangle (perpendicular to its longest edge), else the long axis. */
function defaultAxisAngle(polygon: Polygon): number {
  if (polygon.length !== 3) return longAxisAngle(polygon);
  let best = 0;
  let bestLen = -1;
  for (let i = 0; i < 3; i++) {
    const a = polygon[i]!;
    const b = polygon[(i + 1) % 3]!;
    const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
    if (len > bestLen) [best, bestLen] = [i, len];
  }
  const a = polygon[best]!;
  const b = polygon[(best + 1) % 3]!;
  const apex = polygon[(best + 2) % 3]!;
  const mid: Point = [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];
  const along: Point = [b[0] - a[0], b[1] - a[1]];
  const len2 = along[0] * along[0] + along[1] * along[1];
  const t = ((apex[0] - mid[0]) * along[0] + (apex[1] - mid[1]) * along[1]) / len2;
  const foot: Point = [mid[0] + along[0] * t, mid[1] + along[1] * t];
  return (Math.atan2(foot[1] - apex[1], foot[0] - apex[0]) * 180) / Math.PI;
}
