// GET /api/designs/:id/route — { route: SavedRoute | null }.
// PUT /api/designs/:id/route { kind: 'planned', designVersion } — keep the planner's route for the design at
//   `designVersion`; 200 { route: SavedRoute }.
//   The server computes strokes and figures itself. 409 { error, design: current } when designVersion is not current.
// SavedRoute = { kind, designVersion, current, strokes: [{ pass, kind, points, length }], summary, createdAt, updatedAt }.
import type { APIRoute } from 'astro';
import { db } from '../../../../server/db.ts';
import { json, readJson } from '../../../../server/http.ts';
import { findDesignRoute } from '../../../../server/designs/design.repository.ts';
import { DESIGN_BODY_LIMIT, saveRouteSchema } from '../../../../server/designs/designApi.schema.ts';
import { conflict, designProblemResponse, engineFailureResponse, requireOwnedDesign } from '../../../../server/designs/designHttp.ts';
import { toSavedRouteJson } from '../../../../server/designs/designRecord.ts';
import { savePlannedRoute } from '../../../../server/designs/designRoute.service.ts';

export const GET = (async ({ locals, params }) => {
  const owned = await requireOwnedDesign(locals, params);
  if (!owned.ok) return owned.error;
  const { row } = owned.value;
  const route = await findDesignRoute(db, row.id);
  return json({ route: route ? toSavedRouteJson(route, row.version) : null });
}) satisfies APIRoute;

export const PUT = (async ({ locals, params, request }) => {
  const owned = await requireOwnedDesign(locals, params);
  if (!owned.ok) return owned.error;
  const body = await readJson(request, saveRouteSchema, DESIGN_BODY_LIMIT);
  if (!body.ok) return body.error;
  const { row } = owned.value;
  if (body.value.designVersion !== row.version) return conflict(row);
  const saved = await savePlannedRoute(db, row);
  if (!saved.ok) return saved.error.kind === 'problem' ? designProblemResponse(saved.error.problem) : engineFailureResponse(saved.error.failure);
  return json({ route: toSavedRouteJson(saved.value, row.version) });
}) satisfies APIRoute;
