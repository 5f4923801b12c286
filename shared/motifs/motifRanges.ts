import type { Units } from '../design/design.schema.ts';
import type { MotifKind } from './motifs.ts';

/** A number the motif panel offers: its least and greatest value; `length` values are in inches. */
export interface MotifRange {
  readonly min: number;
  readonly max: number;
  readonly unit: 'length' | 'degrees' | 'count';
}

const len = (min: number, max: number): MotifRange => ({ min, max, unit: 'length' });
const deg = (min: number, max: number): MotifRange => ({ min, max, unit: 'degrees' });
const count = (min: number, max: number): MotifRange => ({ min, max, unit: 'count' });

/**
 * The ranges the motif panel offers for each motif's numbers, in inches (cm designs: × 2.54). Property tests
 * draw parameters from them. Common practice, no source: walking-foot lines 1/4 in to 2 in apart; free-motion
 * pebbles from about 3/8 in across; echoes 1/4 in to 1 1/2 in apart. Pebbles: maxRadius from minRadius to
 * 2.5 × minRadius (a wider spread looks like a scatter, not pebbles), overlap up to a quarter of minRadius.
 */
export const MOTIF_RANGES: Readonly<Record<MotifKind, Readonly<Record<string, MotifRange>>>> = {
  'straight-lines': { spacing: len(0.25, 2), angle: deg(-180, 180) },
  crosshatch: { spacing: len(0.5, 2), angle: deg(-180, 180), crossAngle: deg(30, 150) },
  echo: { spacing: len(0.25, 1.5), maxCount: count(1, 40) },
  pebbles: { minRadius: len(0.2, 1), maxRadius: len(0.2, 2.5), gap: len(0, 0.125), overlap: len(0, 0.25), seed: count(1, 1000) },
  'ribbon-candy': { pitch: len(0.5, 2), margin: len(0, 0.25) },
  arches: { archWidth: len(0.75, 3), rowSpacing: len(0.5, 2), angle: deg(-180, 180) },
};

/** A range in the design's units. */
export function rangeIn(range: MotifRange, units: Units): MotifRange {
  if (range.unit !== 'length' || units === 'in') return range;
  return { ...range, min: range.min * 2.54, max: range.max * 2.54 };
}
