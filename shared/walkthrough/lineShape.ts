import type { Polyline } from '../geometry/point.ts';
import { findStrokeDirection } from '../route/strokeDirection.ts';

/** What a stitched line looks like to the quilter. */
export type LineShape =
  | { readonly kind: 'straight' }
  | { readonly kind: 'straight-lines'; readonly turns: number }
  | { readonly kind: 'curves' };

/** A bend sharper than this (degrees) is a corner where the quilter stops and pivots; gentler bends are curve. */
export const CORNER_DEGREES = 20;

/**
 * Straight (route/strokeDirection says it is not curved), straight runs joined at corners (every run between
 * bends sharper than CORNER_DEGREES is straight by the same rule), or curves. Flattened arcs bend a few
 * degrees at each vertex, so an arc stays one run and reads as a curve.
 */
export function findLineShape(points: Polyline): LineShape {
  if (findStrokeDirection(points) !== 'curved') return { kind: 'straight' };
  const runs: Polyline[] = [];
  let run = [points[0]!];
  for (let i = 1; i < points.length; i++) {
    run.push(points[i]!);
    if (i + 1 < points.length && turnDegrees(points[i - 1]!, points[i]!, points[i + 1]!) > CORNER_DEGREES) {
      runs.push(run);
      run = [points[i]!];
    }
  }
  runs.push(run);
  if (runs.length > 1 && runs.every((r) => findStrokeDirection(r) !== 'curved')) return { kind: 'straight-lines', turns: runs.length - 1 };
  return { kind: 'curves' };
}

function turnDegrees(a: Polyline[number], b: Polyline[number], c: Polyline[number]): number {
  const ux = b[0] - a[0];
  const uy = b[1] - a[1];
  const vx = c[0] - b[0];
  const vy = c[1] - b[1];
  if ((ux === 0 && uy === 0) || (vx === 0 && vy === 0)) return 0;
  return (Math.abs(Math.atan2(ux * vy - uy * vx, ux * vx + uy * vy)) * 180) / Math.PI;
}
