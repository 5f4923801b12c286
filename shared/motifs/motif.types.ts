import { z } from 'zod';
import type { Polyline } from '../geometry/point.ts';

/** What every motif generator returns: quilting lines in design units, each inside the patch. */
export interface MotifLines {
  readonly lines: readonly Polyline[];
  /** Pebbles only: the share of the patch's area the pebbles cover (overlaps counted once), 0…1. */
  readonly coveredFraction?: number;
}

const positive = z.number().finite().positive();

/**
 * Largest distance allowed between a curve and the polyline standing for it, in design units.
 * Default 0.005 (about 1/200 in, far below a 1/10 in stitch; common practice, no source).
 */
export const chordErrorSchema = positive.default(0.005);

/** Direction in degrees from +x toward +y (y down); use `angleOfLine` to run parallel to a seam. */
export const angleSchema = z.number().finite().default(0);

/**
 * The per-placement setting every motif takes. `false` (the default): the fill is one piece with the patch's
 * outline, so the route reaches it from the seams and the edge without a stop (pebbles touch each other and
 * the outline, echoes are joined by step-over legs, ribbon candy turns on the sides, arch rows are joined at
 * their ends). `true`: the older look, shapes kept apart with a clear gap (pebbles' `gap`, ribbon candy's
 * `margin`, closed echo rings), each one its own line group. Straight lines and crosshatch end on the outline
 * either way.
 */
export const separateSchema = z.boolean().default(false);

export { positive as positiveNumber };
