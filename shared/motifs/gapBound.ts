import type { Polygon } from '../layouts/patch.ts';
import { assertNever } from '../assertNever.ts';
import { interiorAngles } from './echoLegs.ts';
import type { MotifParams } from './motifs.ts';
import { orientedPositive } from './polygon.ts';

/**
 * The widest gap (the diameter of the largest empty disc, as the gap check measures it) a joined fill of
 * this patch leaves, from the sizes the quilter chose (design units). Checked on every pieced layout in
 * fillBlocks.test.ts.
 * - Straight lines, crosshatch: the spacing (neighbours a spacing apart, border gaps under a spacing; a
 *   crosshatch cell is a parallelogram whose heights are the spacing).
 * - Ribbon candy: the pitch (strokes running the same way stand one pitch apart).
 * - Arches: the row spacing (each row stands a row spacing above the last, so every line across the rows
 *   meets a row at least that often).
 * - Pebbles: the largest pebble's diameter (its inside is a gap of its own).
 * - Echo: 2s / (1 + sin(α/2)) for spacing s and the patch's sharpest corner α. Between two echoes at a
 *   corner the band turns; the disc touching both sides of the outer echo and the inner echo's corner has
 *   radius s / (1 + sin(α/2)) (the inner corner lies s / sin(α/2) from the outer one along the bisector).
 *   That is 1.17 s at a square corner and s where the outline runs straight; the middle left inside the last
 *   echo is at most s across (the half-step echo).
 */
export function fillGapBound(polygon: Polygon, params: MotifParams): number {
  switch (params.kind) {
    case 'straight-lines':
    case 'crosshatch':
      return params.spacing;
    case 'ribbon-candy':
      return params.pitch;
    case 'arches':
      return Math.max(params.rowSpacing, params.archHeight ?? params.rowSpacing);
    case 'pebbles':
      return 2 * params.maxRadius;
    case 'echo': {
      const sharpest = Math.min(...interiorAngles(orientedPositive(polygon)).filter((a) => a < Math.PI));
      return (2 * params.spacing) / (1 + Math.sin(sharpest / 2));
    }
    default:
      return assertNever(params);
  }
}
