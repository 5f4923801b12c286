import type { Units } from '../design/design.schema.ts';

/**
 * Finished block sizes offered when a design is started (square blocks, side length in the unit).
 * Common practice, no source: pattern books favour 6, 8, 9, 10 and 12 in blocks; metric patterns use
 * round centimetre sizes.
 */
export const COMMON_BLOCK_SIZES: Readonly<Record<Units, readonly number[]>> = {
  in: [4, 6, 8, 9, 10, 12, 14, 16, 18],
  cm: [10, 15, 20, 25, 30, 35, 40, 45],
};
