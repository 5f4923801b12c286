// POST /api/quilts/:id/plan — the chained route of the saved quilt, its top quilted in one piece: the quilting order,
// each block's entry and exit corner, travel inside the blocks and along the links, the proof of that travel and the
// quilt's budget. Runs in the engine's worker pool (never on the request thread). Owner only (404 otherwise).
// 200 { quiltVersion, plan }; 400 naming the cell when a placed design is missing, does not fit its cell or cannot be
// planned, or when nothing is placed; 422 engine_timeout when the quilt is too big to plan within the cap;
// 429 rate_limited / 503 engine_busy as for every plan.
import type { APIRoute } from 'astro';
import type { QuiltPlanAnswer } from '@shared/contract/quiltPlan.ts';
import { assertNever } from '@shared/assertNever.ts';
import { db } from '@server/db.ts';
import { json, problem } from '@server/http.ts';
import { requireUser } from '@server/auth/guards.ts';
import { engineFailureResponse } from '@server/designs/designHttp.ts';
import { findQuilt, quiltOf } from '@server/quilts/quilt.service.ts';
import { planQuiltOnServer, type QuiltPlanFailure } from '@server/quilts/quiltPlan.service.ts';
import { quiltNotFound } from '@server/quilts/quiltHttp.ts';

export const POST = (async ({ locals, params, request }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const account = signedIn.value.user.id;
  const row = await findQuilt(db, account, params['id'] ?? '');
  if (!row) return quiltNotFound();
  const planned = await planQuiltOnServer(db, account, quiltOf(row), request.signal);
  if (!planned.ok) return failure(planned.error);
  return json({ quiltVersion: row.version, plan: planned.value } satisfies QuiltPlanAnswer);
}) satisfies APIRoute;

function failure(f: QuiltPlanFailure): Response {
  switch (f.kind) {
    case 'empty':
      return problem(400, 'invalid_input', 'Place at least one design before planning the route.', { 'quilt.placements': 'Every cell is empty.' });
    case 'engine':
      return engineFailureResponse(f.failure);
    case 'problem': {
      const p = f.problem;
      const at = p.kind === 'order' ? 'quilt.order' : `quilt.placements.${p.cell.row}.${p.cell.column}.designId`;
      return problem(400, 'invalid_input', `The quilt cannot be planned: ${p.message}`, { [at]: p.message });
    }
    default:
      return assertNever(f);
  }
}
