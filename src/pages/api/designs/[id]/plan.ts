// POST /api/designs/:id/plan { design?, settings? } — the planner's route for the saved design or an unsaved draft.
// settings: { timeBudgetMs (100–6000, default 2000), extraStops (0–3), hiddenEndAllowance (design units, default 0) }.
// 200 { designVersion, draft, plan: { passes, stops, …figures, optimal, travelLowerBound, lowerBound, gapPercent,
// stopsTable, threadEnds, settings, units, route, threadBudget } }.
// 429 rate_limited when this account already has its share of checks and plans waiting; 503 engine_busy.
import type { APIRoute } from 'astro';
import type { PlanAnswer } from '@shared/contract/plan.ts';
import { json } from '@server/http.ts';
import { readDesignBody } from '@server/designs/designBody.ts';
import { designProblemResponse, engineFailureResponse, requireOwnedDesign } from '@server/designs/designHttp.ts';
import { designPayloadOf, planDesignOnServer } from '@server/designs/designRoute.service.ts';

export const POST = (async ({ locals, params, request }) => {
  const owned = await requireOwnedDesign(locals, params);
  if (!owned.ok) return owned.error;
  const account = owned.value.user.id;
  const body = await readDesignBody(request, 'plan', account);
  if (!body.ok) return body.error;
  const { row } = owned.value;
  const draft = body.value.design;
  const planned = await planDesignOnServer(designPayloadOf(row, draft?.text ?? null), account, body.value.fields.settings, request.signal);
  if (!planned.ok) return planned.error.kind === 'problem' ? designProblemResponse(planned.error.problem) : engineFailureResponse(planned.error.failure);
  return json({ designVersion: row.version, draft: draft !== null, plan: planned.value } satisfies PlanAnswer);
}) satisfies APIRoute;
