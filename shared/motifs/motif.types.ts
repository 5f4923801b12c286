import { z } from 'zod';
import type { Polyline } from '../geometry/point.ts';

/** What every motif generator returns: quilting lines in design units, each inside the patch. */
export interface MotifLines {
  readonly lines: readonly Polyline[];
}

const positive = z.number().finite().positive();

/**
 * Largest distance allowed between a curve and the polyline standing for it, in design units.
 * Default 0.005 (about 1/200 in, far below a 1/10 in stitch; common practice, no source).
 */
export const chordErrorSchema = positive.default(0.005);

/** Direction in degrees from +x toward +y (y down); use `angleOfLine` to run parallel to a seam. */
export const angleSchema = z.number().finite().default(0);

export { positive as positiveNumber };
