import type { Design } from '../design/design.schema.ts';
import { polylineLength } from '../geometry/polyline.ts';
import { buildBlockPlaces, describePlace } from './locate.ts';
import { findPatchFaces } from './patchFaces.ts';
import { namePatches } from './patchNames.ts';
import { formatRulerLength } from './rulerLength.ts';
import type { RouteStrokeInput } from './walkthrough.types.ts';

/**
 * A teaching note that says what the route really does: where it starts and finishes (in the walkthrough's own
 * words for places), how many passes, and how much travel it uses. Lesson notes of the demo class are written
 * with it, so a note can never say "start at the centre" for a route that starts at the edge.
 */
export function routeNote(design: Design, route: readonly RouteStrokeInput[]): string {
  if (route.length === 0) return 'This template has no route yet.';
  const places = buildBlockPlaces(design, namePatches(findPatchFaces(design), design));
  const start = route[0]!.points[0]!;
  const lastPoints = route[route.length - 1]!.points;
  const end = lastPoints[lastPoints.length - 1]!;
  const passes = new Set(route.map((s) => s.pass)).size;
  const travel = (kind: RouteStrokeInput['kind']) => route.filter((s) => s.kind === kind).reduce((sum, s) => sum + polylineLength(s.points), 0);
  const parts: string[] = [];
  const ditch = travel('ditch');
  const edge = travel('edge');
  const retrace = travel('retrace');
  if (ditch > 0) parts.push(`${formatRulerLength(ditch, design.units)} of travel in the ditch`);
  if (edge > 0) parts.push(`${formatRulerLength(edge, design.units)} along the edge, under the binding`);
  if (retrace > 0) parts.push(`${formatRulerLength(retrace, design.units)} sewn over twice`);
  const how = parts.length === 0 ? 'every line is sewn once, with no travel' : `the route uses ${parts.join(', ')}`;
  const passWords = passes === 1 ? 'in one pass' : `in ${passes} passes (${passes - 1} tie-off${passes === 2 ? '' : 's'} on the way)`;
  return `Start at ${describePlace(places, start)} and follow the route ${passWords}; ${how}. You finish at ${describePlace(places, end)}.`;
}
