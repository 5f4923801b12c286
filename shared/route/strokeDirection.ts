import type { Point } from '../geometry/point.ts';

/** Which way a stroke runs for the quilter sitting at the bottom edge (y grows toward the quilter). */
export type StrokeDirection = 'away' | 'toward' | 'left' | 'right' | 'curved';

/** A stroke is straight when no point strays more than this fraction of its chord from the chord line. */
export const STRAIGHT_TOLERANCE = 0.1;

/**
 * Direction of a stroke relative to the quilter. Rule (ours): take the chord from the first to the last point.
 * If some point lies farther than STRAIGHT_TOLERANCE × chord length from the chord's line, or the stroke ends where
 * it began, it is `curved`. Otherwise the chord's larger component decides (a 45° diagonal counts as vertical):
 * +y is `toward` the quilter, −y `away`, +x `right`, −x `left`.
 */
export function findStrokeDirection(points: readonly Point[]): StrokeDirection {
  const [x0, y0] = points[0]!;
  const [x1, y1] = points[points.length - 1]!;
  const dx = x1 - x0;
  const dy = y1 - y0;
  const chord = Math.hypot(dx, dy);
  if (chord === 0) return 'curved';
  for (const [x, y] of points) {
    // Distance to the chord's line, plus overshoot beyond its ends (a stroke that doubles back is not straight).
    const along = ((x - x0) * dx + (y - y0) * dy) / chord;
    const across = Math.abs((x - x0) * dy - (y - y0) * dx) / chord;
    const beyond = Math.max(0, -along, along - chord);
    if (Math.max(across, beyond) > STRAIGHT_TOLERANCE * chord) return 'curved';
  }
  if (Math.abs(dy) >= Math.abs(dx)) return dy > 0 ? 'toward' : 'away';
  return dx > 0 ? 'right' : 'left';
}
