// GET /api/designs/:id/route — { route: SavedRoute | null }.
// PUT /api/designs/:id/route { kind: 'planned', designVersion } | { kind: 'own', designVersion, route: Polyline[] }
//   — keep the planner's route or the quilter's own for the design at `designVersion`; 200 { route: SavedRoute }.
//   The server computes strokes and figures itself. 409 { error, design: current } when designVersion is not current.
// SavedRoute = { kind, designVersion, current, strokes: [{ pass, kind, points, length }], summary, createdAt, updatedAt }.
import type { APIRoute } from 'astro';
import type { SavedRouteAnswer } from '@shared/contract/designs.ts';
import { db } from '@server/db.ts';
import { invalidInput, json } from '@server/http.ts';
import { assertNever } from '@shared/assertNever.ts';
import { findDesignRoute } from '@server/designs/design.repository.ts';
import { readDesignBody } from '@server/designs/designBody.ts';
import { conflict, designProblemResponse, engineFailureResponse, requireOwnedDesign } from '@server/designs/designHttp.ts';
import { toSavedRouteJson } from '@server/designs/designRecord.ts';
import { saveOwnRoute, savePlannedRoute } from '@server/designs/designRoute.service.ts';

export const GET = (async ({ locals, params }) => {
  const owned = await requireOwnedDesign(locals, params);
  if (!owned.ok) return owned.error;
  const { row } = owned.value;
  const route = await findDesignRoute(db, row.id);
  return json({ route: route ? toSavedRouteJson(route, row.version) : null } satisfies SavedRouteAnswer);
}) satisfies APIRoute;

export const PUT = (async ({ locals, params, request }) => {
  const owned = await requireOwnedDesign(locals, params);
  if (!owned.ok) return owned.error;
  const body = await readDesignBody(request, 'route', owned.value.user.id);
  if (!body.ok) return body.error;
  const { row } = owned.value;
  const { fields, routeText } = body.value;
  if (fields.designVersion !== row.version) return conflict(row, owned.value.user.id);
  const saved = fields.kind === 'own' && routeText !== null ? await saveOwnRoute(db, row, routeText) : await savePlannedRoute(db, row);
  if (!saved.ok) {
    const f = saved.error;
    switch (f.kind) {
      case 'invalid':
        return invalidInput(f.error, 'Some route strokes need attention.');
      case 'problem':
        return designProblemResponse(f.problem);
      case 'engine':
        return engineFailureResponse(f.failure);
      default:
        return assertNever(f);
    }
  }
  return json({ route: toSavedRouteJson(saved.value, row.version) } satisfies SavedRouteAnswer);
}) satisfies APIRoute;
