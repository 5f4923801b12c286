import { plainIssue } from '../forms/plainMessages.ts';
import { z } from 'zod';
import { signedArea, type Polygon } from '../layouts/patch.ts';
import { assertNever } from '../assertNever.ts';
import { err, ok, type Result } from '../result.ts';
import { archesParamsSchema, generateArches } from './arches.ts';
import { echoParamsSchema, generateEcho } from './echo.ts';
import type { MotifLines } from './motif.types.ts';
import { generatePebbles, pebblesParamsSchema } from './pebbles.ts';
import { generateRibbonCandy, ribbonCandyParamsSchema } from './ribbonCandy.ts';
import { crosshatchParamsSchema, generateCrosshatch, generateStraightLines, straightLinesParamsSchema } from './straightLines.ts';

/** Parameters of any motif, tagged by `kind`; lengths in design units, angles in degrees. */
export const motifParamsSchema = z.discriminatedUnion('kind', [
  straightLinesParamsSchema,
  crosshatchParamsSchema,
  echoParamsSchema,
  pebblesParamsSchema,
  ribbonCandyParamsSchema,
  archesParamsSchema,
]);
export type MotifParams = z.output<typeof motifParamsSchema>;
export type MotifParamsInput = z.input<typeof motifParamsSchema>;
export type MotifKind = MotifParams['kind'];

/** The motifs a quilter can place into a patch, in the order the picker shows them. */
export const MOTIFS: readonly { readonly kind: MotifKind; readonly label: string; readonly description: string }[] = [
  { kind: 'straight-lines', label: 'Straight lines', description: 'Parallel lines at an even spacing, optionally along a seam.' },
  { kind: 'crosshatch', label: 'Crosshatch', description: 'Two sets of straight lines crossing in squares or diamonds.' },
  { kind: 'echo', label: 'Echo', description: 'Lines following the patch outline at an even spacing inside it, stepping in at one corner.' },
  { kind: 'pebbles', label: 'Pebbles', description: 'Circles of varied size packed inside the patch, each touching its neighbours.' },
  { kind: 'ribbon-candy', label: 'Ribbon candy', description: 'One line from side to side, folding back in a loop at every turn on the sides.' },
  { kind: 'arches', label: 'Arches', description: 'Rows of arches standing on the base, joined at their ends along the outline.' },
];

export type MotifError =
  | { readonly kind: 'invalid-params'; readonly issues: readonly { readonly path: string; readonly message: string }[] }
  | { readonly kind: 'degenerate-patch' };

/**
 * Generates a motif's quilting lines inside the patch polygon (design units). `params` is checked by
 * `motifParamsSchema` first. Every returned line lies inside the patch (within ~1e-12 × its size, 1e-8 for
 * echoes of a non-convex patch). Unless `separate` is set, the lines and the patch's outline form one
 * piece (property-tested in motifs.property.test.ts): a route reaches the fill from the seams or the edge
 * around it without a stop.
 */
export function generateMotif(polygon: Polygon, params: unknown): Result<MotifLines, MotifError> {
  const parsed = motifParamsSchema.safeParse(params, { error: plainIssue });
  if (!parsed.success) {
    return err({ kind: 'invalid-params', issues: parsed.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message })) });
  }
  const finite = polygon.every((p) => Number.isFinite(p[0]) && Number.isFinite(p[1]));
  if (polygon.length < 3 || !finite || signedArea(polygon) === 0) return err({ kind: 'degenerate-patch' });
  const p = parsed.data;
  switch (p.kind) {
    case 'straight-lines':
      return ok(generateStraightLines(polygon, p));
    case 'crosshatch':
      return ok(generateCrosshatch(polygon, p));
    case 'echo':
      return ok(generateEcho(polygon, p));
    case 'pebbles':
      return ok(generatePebbles(polygon, p));
    case 'ribbon-candy':
      return ok(generateRibbonCandy(polygon, p));
    case 'arches':
      return ok(generateArches(polygon, p));
    default:
      return assertNever(p);
  }
}
