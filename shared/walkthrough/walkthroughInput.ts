import { z } from 'zod';
import { designSchema, pointSchema, type Design } from '../design/design.schema.ts';
import { err, ok, type Result } from '../result.ts';
import type { RouteStrokeInput } from './walkthrough.types.ts';

/** A route as an API sends it: the planner's strokes (an optional cached `length` is ignored). */
export const walkthroughRouteSchema = z
  .array(
    z.object({
      pass: z.number().int().min(0),
      kind: z.enum(['stitch', 'retrace', 'ditch', 'edge']),
      points: z.array(pointSchema).min(2),
    }),
  )
  .max(200_000);

/**
 * Checks a design and route that arrived from outside (an API response) before a walkthrough is built from
 * them. The failure is a sentence a quilter can read.
 */
export function parseWalkthroughInput(design: unknown, route: unknown): Result<{ design: Design; route: RouteStrokeInput[] }, string> {
  const d = designSchema.safeParse(design);
  if (!d.success) return err('This design could not be read.');
  if (route === null || route === undefined) return err('This design has no saved route yet.');
  const r = walkthroughRouteSchema.safeParse(route);
  if (!r.success) return err('The saved route could not be read.');
  if (r.data.length === 0) return err('The saved route is empty.');
  return ok({ design: d.data, route: r.data });
}
