import { CM_PER_INCH, type Units } from '../design/design.schema.ts';

/**
 * Snapping tolerance of the planar graph: 1e-4 in (2.54e-4 cm). Far below a stitch (0.06–0.1 in, i.e.
 * 10–16 SPI) and far above floating-point noise on a block of up to 120 in; see
 * docs/engine.md §9. Points closer than this are one vertex; a line end this close
 * to another line (or the block outline) joins it.
 */
export function snapToleranceOf(units: Units): number {
  return units === 'in' ? 1e-4 : 1e-4 * CM_PER_INCH;
}
