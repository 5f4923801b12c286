// GET /api/quilts/:id/plan-jobs/:jobId — a whole-quilt plan being made by a planning worker: its state
// (queued, running, done, failed), progress (corner-pair plans done / total, kept in PostgreSQL so any app instance
// answers), and the plan once done. Owner only: another account, an unknown or malformed id → 404.
import type { APIRoute } from 'astro';
import type { QuiltPlanJobAnswer } from '@shared/contract/quiltPlan.ts';
import { db } from '@server/db.ts';
import { json } from '@server/http.ts';
import { requireUser } from '@server/auth/guards.ts';
import { readQuiltPlanJob } from '@server/quilts/quiltPlan.service.ts';
import { quiltNotFound } from '@server/quilts/quiltHttp.ts';
import { appPlanQueue } from '@server/jobs/appQueue.ts';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export const GET = (async ({ locals, params }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const quiltId = params['id'] ?? '';
  const jobId = params['jobId'] ?? '';
  if (!UUID.test(quiltId) || !UUID.test(jobId)) return quiltNotFound();
  const found = await readQuiltPlanJob(db, appPlanQueue, signedIn.value.user.id, quiltId, jobId);
  if (!found) return quiltNotFound();
  return json(found satisfies QuiltPlanJobAnswer);
}) satisfies APIRoute;
