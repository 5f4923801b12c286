import { strokePathsSchema } from '../contract/strokes.ts';
import { designSchema, type Design, type Units } from '../design/design.schema.ts';
import { convertDesign, convertStrokes } from '../units/convertDesign.ts';
import { err, ok, type Result } from '../result.ts';
import type { RouteStrokeInput } from './walkthrough.types.ts';

/**
 * Checks a design and route that arrived from outside (an API response) before a walkthrough is built from
 * them. The failure is a sentence a quilter can read. With `viewerUnits`, both are redrawn in the viewer's units,
 * so every step length reads in them.
 */
export function parseWalkthroughInput(design: unknown, route: unknown, viewerUnits?: Units): Result<{ design: Design; route: RouteStrokeInput[] }, string> {
  const d = designSchema.safeParse(design);
  if (!d.success) return err('This design could not be read.');
  if (route === null || route === undefined) return err('This design has no saved route yet.');
  const r = strokePathsSchema.safeParse(route);
  if (!r.success) return err('The saved route could not be read.');
  if (r.data.length === 0) return err('The saved route is empty.');
  if (!viewerUnits || viewerUnits === d.data.units) return ok({ design: d.data, route: r.data });
  return ok({ design: convertDesign(d.data, viewerUnits), route: convertStrokes(r.data, d.data.units, viewerUnits) });
}
