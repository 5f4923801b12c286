// Edits of what frames the blocks: the sashing width and the borders (innermost first, each with its own finished
// width, at most QUILT_LIMITS.maxBorders), and the quilt's finished size as each border is added. Lengths in the
// quilt's units.
import { QUILT_LIMITS, type Quilt } from '@shared/quilt/quilt.schema.ts';
import { finishedSize, type Size } from '@shared/quilt/finishedSize.ts';

/** Sashing between the blocks (0: blocks sewn straight together); a negative or non-finite width counts as 0. */
export function setSashing(quilt: Quilt, width: number): Quilt {
  return { ...quilt, sashing: Number.isFinite(width) && width > 0 ? width : 0 };
}

/** A new outermost border; refused (the quilt unchanged) at the limit or for a width that is not above 0. */
export function addBorder(quilt: Quilt, width: number): Quilt {
  if (quilt.borders.length >= QUILT_LIMITS.maxBorders || !(width > 0) || !Number.isFinite(width)) return quilt;
  return { ...quilt, borders: [...quilt.borders, width] };
}

/** The width of border `index` (0: innermost); a width not above 0 changes nothing (remove the border instead). */
export function setBorderWidth(quilt: Quilt, index: number, width: number): Quilt {
  if (index < 0 || index >= quilt.borders.length || !(width > 0) || !Number.isFinite(width)) return quilt;
  return { ...quilt, borders: quilt.borders.map((b, i) => (i === index ? width : b)) };
}

/** Takes border `index` away; the borders outside it move in. */
export function removeBorder(quilt: Quilt, index: number): Quilt {
  return { ...quilt, borders: quilt.borders.filter((_, i) => i !== index) };
}

/**
 * The finished size inside any border (blocks and sashing), then after each border in turn; the last entry is the
 * finished quilt (finishedSize). `sizes[k]` grows by twice border k on each side.
 */
export function sizesByBorder(quilt: Quilt): Size[] {
  return [0, ...quilt.borders.map((_, i) => i + 1)].map((k) => finishedSize({ ...quilt, borders: quilt.borders.slice(0, k) }));
}
