// POST /api/designs/:id/check { design? } — route check of the saved design, or of an unsaved draft sent in the
// body (the workbench checks after each edit). 200 { designVersion, draft, check, plan, threadBudget }.
// 400 names a line the engine refuses; 422 engine_timeout; 503 engine_busy.
import type { APIRoute } from 'astro';
import { json, readJson } from '../../../../server/http.ts';
import { DESIGN_BODY_LIMIT, draftSchema } from '../../../../server/designs/designApi.schema.ts';
import { designProblemResponse, engineFailureResponse, requireOwnedDesign } from '../../../../server/designs/designHttp.ts';
import { storedDesign } from '../../../../server/designs/designRecord.ts';
import { checkDesignOnServer } from '../../../../server/designs/designRoute.service.ts';

export const POST = (async ({ locals, params, request }) => {
  const owned = await requireOwnedDesign(locals, params);
  if (!owned.ok) return owned.error;
  const body = await readJson(request, draftSchema, DESIGN_BODY_LIMIT);
  if (!body.ok) return body.error;
  const { row } = owned.value;
  const checked = await checkDesignOnServer(body.value.design ?? storedDesign(row));
  if (!checked.ok) return checked.error.kind === 'problem' ? designProblemResponse(checked.error.problem) : engineFailureResponse(checked.error.failure);
  return json({ designVersion: row.version, draft: body.value.design !== undefined, ...checked.value });
}) satisfies APIRoute;
