// POST /api/designs/:id/plan { design?, settings? } — the planner's route for the saved design or an unsaved draft.
// settings: { timeBudgetMs (100–6000, default 2000), extraStops (0–3), hiddenEndAllowance (design units, default 0) }.
// 200 { designVersion, draft, plan: { passes, stops, …figures, optimal, travelLowerBound, lowerBound, gapPercent,
// stopsTable, threadEnds, settings, units, route, threadBudget } }.
import type { APIRoute } from 'astro';
import { json, readJson } from '../../../../server/http.ts';
import { DESIGN_BODY_LIMIT, planRequestSchema } from '../../../../server/designs/designApi.schema.ts';
import { designProblemResponse, engineFailureResponse, requireOwnedDesign } from '../../../../server/designs/designHttp.ts';
import { storedDesign } from '../../../../server/designs/designRecord.ts';
import { planDesignOnServer } from '../../../../server/designs/designRoute.service.ts';

export const POST = (async ({ locals, params, request }) => {
  const owned = await requireOwnedDesign(locals, params);
  if (!owned.ok) return owned.error;
  const body = await readJson(request, planRequestSchema, DESIGN_BODY_LIMIT);
  if (!body.ok) return body.error;
  const { row } = owned.value;
  const planned = await planDesignOnServer(body.value.design ?? storedDesign(row), body.value.settings);
  if (!planned.ok) return planned.error.kind === 'problem' ? designProblemResponse(planned.error.problem) : engineFailureResponse(planned.error.failure);
  return json({ designVersion: row.version, draft: body.value.design !== undefined, plan: planned.value });
}) satisfies APIRoute;
