import type { Point } from './point.ts';

/** Axis-aligned bounding box in design units. */
export interface BBox {
  readonly minX: number;
  readonly minY: number;
  readonly maxX: number;
  readonly maxY: number;
}

/** Bounding box of a non-empty point list. Throws on an empty list (a caller bug). */
export function bboxOfPoints(points: readonly Point[]): BBox {
  if (points.length === 0) throw new Error('geometry/bbox: bboxOfPoints needs at least one point');
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const [x, y] of points) {
    if (x < minX) minX = x;
    if (y < minY) minY = y;
    if (x > maxX) maxX = x;
    if (y > maxY) maxY = y;
  }
  return { minX, minY, maxX, maxY };
}

/** The box grown by `margin` on every side. */
export function expandBBox(box: BBox, margin: number): BBox {
  return { minX: box.minX - margin, minY: box.minY - margin, maxX: box.maxX + margin, maxY: box.maxY + margin };
}

/** True when the two boxes share at least one point (closed boxes). */
export function bboxesOverlap(a: BBox, b: BBox): boolean {
  return a.minX <= b.maxX && b.minX <= a.maxX && a.minY <= b.maxY && b.minY <= a.maxY;
}
