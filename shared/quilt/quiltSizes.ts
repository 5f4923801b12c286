import { CM_PER_INCH, type Units } from '../design/design.schema.ts';
import { bordersWidth, type QuiltFrame, type Size } from './finishedSize.ts';

/** A usual finished quilt size to start a quilt map from. */
export interface QuiltSizePreset {
  readonly key: 'crib' | 'lap' | 'twin' | 'full' | 'queen' | 'king';
  readonly label: string;
  /** Finished size in inches. */
  readonly widthIn: number;
  readonly heightIn: number;
}

/**
 * Usual finished sizes for bed and crib quilts in inches: common practice, from memory (quilting books and pattern
 * charts vary by several inches with the drop over the mattress side; none was checked). Offered as starting points.
 */
export const QUILT_SIZE_PRESETS: readonly QuiltSizePreset[] = [
  { key: 'crib', label: 'Crib', widthIn: 36, heightIn: 52 },
  { key: 'lap', label: 'Lap or throw', widthIn: 50, heightIn: 65 },
  { key: 'twin', label: 'Twin bed', widthIn: 70, heightIn: 90 },
  { key: 'full', label: 'Full (double) bed', widthIn: 85, heightIn: 108 },
  { key: 'queen', label: 'Queen bed', widthIn: 90, heightIn: 108 },
  { key: 'king', label: 'King bed', widthIn: 108, heightIn: 108 },
];

export const QUILT_SIZE_SOURCE = 'common practice, from memory';

/** A preset's size in the given units (centimetres rounded to whole cm). */
export function presetSize(preset: QuiltSizePreset, units: Units): Size {
  if (units === 'in') return { width: preset.widthIn, height: preset.heightIn };
  return { width: Math.round(preset.widthIn * CM_PER_INCH), height: Math.round(preset.heightIn * CM_PER_INCH) };
}

/**
 * Rows and columns whose finished size comes nearest a target size (quilt units) for the given block size, sashing
 * and borders: the count n minimising |n·block + (n − 1)·sashing + 2·Σborders − target| on each side, at least 1
 * and at most `max`.
 */
export function gridForSize(target: Size, frame: Omit<QuiltFrame, 'rows' | 'columns'>, max: number): { rows: number; columns: number } {
  const nearest = (side: number, block: number): number => {
    const n = (side - 2 * bordersWidth(frame) + frame.sashing) / (block + frame.sashing);
    const lo = Math.max(1, Math.min(max, Math.floor(n)));
    const hi = Math.max(1, Math.min(max, Math.ceil(n)));
    const size = (k: number): number => k * block + (k - 1) * frame.sashing + 2 * bordersWidth(frame);
    return Math.abs(size(hi) - side) < Math.abs(size(lo) - side) ? hi : lo;
  };
  return { columns: nearest(target.width, frame.block.width), rows: nearest(target.height, frame.block.height) };
}
