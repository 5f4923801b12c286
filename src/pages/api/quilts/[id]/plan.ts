// POST /api/quilts/:id/plan — the chained route of the saved quilt, its top quilted in one piece: the quilting order,
// each block's entry and exit corner, travel inside the blocks and along the links, the proof of that travel and the
// quilt's budget. Owner only (404 otherwise).
// 200 { quiltVersion, plan } at once when every placed design's corner-pair costs are cached; else
// 202 { quiltVersion, job } (Location: the job) while a planning worker makes it — poll GET …/plan-jobs/:jobId.
// 400 naming the cell when a placed design is missing or does not fit its cell, or when nothing is placed;
// 429 rate_limited (Retry-After) when the account already has its share of plans being made.
import type { APIRoute } from 'astro';
import type { QuiltPlanAnswer, QuiltPlanQueued } from '@shared/contract/quiltPlan.ts';
import { assertNever } from '@shared/assertNever.ts';
import { db } from '@server/db.ts';
import { json, problem } from '@server/http.ts';
import { requireUser } from '@server/auth/guards.ts';
import { findQuilt, quiltOf } from '@server/quilts/quilt.service.ts';
import { PLAN_JOBS_PER_ACCOUNT, requestQuiltPlan, type QuiltPlanFailure } from '@server/quilts/quiltPlan.service.ts';
import { quiltNotFound } from '@server/quilts/quiltHttp.ts';
import { appPlanQueue } from '@server/jobs/appQueue.ts';

export const POST = (async ({ locals, params }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const account = signedIn.value.user.id;
  const row = await findQuilt(db, account, params['id'] ?? '');
  if (!row) return quiltNotFound();
  const r = await requestQuiltPlan(db, appPlanQueue, account, { id: row.id, version: row.version, map: quiltOf(row) });
  if (!r.ok) return failure(r.error);
  if (r.value.kind === 'planned') return json({ quiltVersion: row.version, plan: r.value.plan } satisfies QuiltPlanAnswer);
  return json({ quiltVersion: row.version, job: r.value.job } satisfies QuiltPlanQueued, 202, { location: `/api/quilts/${row.id}/plan-jobs/${r.value.job.id}` });
}) satisfies APIRoute;

function failure(f: QuiltPlanFailure): Response {
  switch (f.kind) {
    case 'empty':
      return problem(400, 'invalid_input', 'Place at least one design before planning the route.', { 'quilt.placements': 'Every cell is empty.' });
    case 'too-many':
      return problem(
        429,
        'rate_limited',
        `You already have ${f.open} quilt plans being made (at most ${PLAN_JOBS_PER_ACCOUNT} at once). Wait for one to finish, then try again.`,
        undefined,
        { 'retry-after': '5' },
      );
    case 'problem': {
      const p = f.problem;
      const at = p.kind === 'order' ? 'quilt.order' : `quilt.placements.${p.cell.row}.${p.cell.column}.designId`;
      return problem(400, 'invalid_input', `The quilt cannot be planned: ${p.message}`, { [at]: p.message });
    }
    default:
      return assertNever(f);
  }
}
