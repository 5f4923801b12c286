// POST /api/designs/:id/plan { design? } — the planner's route for the saved design or an unsaved draft.
// 200 { designVersion, draft, plan: { passes, stops, …figures, optimal, travelLowerBound, units, route, threadBudget } }.
import type { APIRoute } from 'astro';
import { json, readJson } from '../../../../server/http.ts';
import { DESIGN_BODY_LIMIT, draftSchema } from '../../../../server/designs/designApi.schema.ts';
import { designProblemResponse, engineFailureResponse, requireOwnedDesign } from '../../../../server/designs/designHttp.ts';
import { storedDesign } from '../../../../server/designs/designRecord.ts';
import { planDesignOnServer } from '../../../../server/designs/designRoute.service.ts';

export const POST = (async ({ locals, params, request }) => {
  const owned = await requireOwnedDesign(locals, params);
  if (!owned.ok) return owned.error;
  const body = await readJson(request, draftSchema, DESIGN_BODY_LIMIT);
  if (!body.ok) return body.error;
  const { row } = owned.value;
  const planned = await planDesignOnServer(body.value.design ?? storedDesign(row));
  if (!planned.ok) return planned.error.kind === 'problem' ? designProblemResponse(planned.error.problem) : engineFailureResponse(planned.error.failure);
  return json({ designVersion: row.version, draft: body.value.design !== undefined, plan: planned.value });
}) satisfies APIRoute;
