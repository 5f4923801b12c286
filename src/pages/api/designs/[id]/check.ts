// POST /api/designs/:id/check { design? } — route check of the saved design, or of an unsaved draft sent in the
// body (the workbench checks after each edit). 200 { designVersion, draft, check, plan, threadBudget }.
// 400 names a line the engine refuses; 422 engine_timeout; 429 rate_limited (this account's queue is full);
// 503 engine_busy.
import type { APIRoute } from 'astro';
import type { CheckAnswer } from '@shared/contract/check.ts';
import { json } from '@server/http.ts';
import { readDesignBody } from '@server/designs/designBody.ts';
import { designProblemResponse, engineFailureResponse, requireOwnedDesign } from '@server/designs/designHttp.ts';
import { checkDesignOnServer, designPayloadOf } from '@server/designs/designRoute.service.ts';

export const POST = (async ({ locals, params, request }) => {
  const owned = await requireOwnedDesign(locals, params);
  if (!owned.ok) return owned.error;
  const account = owned.value.user.id;
  const body = await readDesignBody(request, 'draft', account);
  if (!body.ok) return body.error;
  const { row } = owned.value;
  const draft = body.value.design;
  const checked = await checkDesignOnServer(designPayloadOf(row, draft?.text ?? null), account, request.signal);
  if (!checked.ok) return checked.error.kind === 'problem' ? designProblemResponse(checked.error.problem) : engineFailureResponse(checked.error.failure);
  return json({ designVersion: row.version, draft: draft !== null, ...checked.value } satisfies CheckAnswer);
}) satisfies APIRoute;
