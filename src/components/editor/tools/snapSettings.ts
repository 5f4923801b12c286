import type { Units } from '@shared/design/design.schema.ts';

/** Snap radius on screen: points within this many CSS px of a target jump to it. */
export const SNAP_RADIUS_PX = 10;

/** Grid pitch for snapping: 1/8 in, the finest mark on a quilting ruler; 0.5 cm for cm designs (common practice, no source). */
export function snapGridPitch(units: Units): number {
  return units === 'in' ? 0.125 : 0.5;
}
