// Planning a quilt's chained route, as an app instance sees it. When every placed design's corner-pair table is in
// PostgreSQL, the plan is the dynamic programme alone and is answered at once, on the request thread (milliseconds
// for 6 × 8); a quilt version planned before answers with its stored plan. Otherwise a job goes on the queue
// (planQueue.ts) for a planning worker process (src/server/jobs/planWorker.ts), and the answer is the job: its
// state and progress live in quilt_plan_job, so any app instance can answer a poll. One job per quilt version and
// inputs: asking again while it runs answers the same job. An account may have PLAN_JOBS_PER_ACCOUNT jobs open.
import type { Kysely } from 'kysely';
import type PgBoss from 'pg-boss';
import type { Database, QuiltPlanJobRow } from '@db/schema.ts';
import type { ProblemDetail } from '@shared/contract/errors.ts';
import { problemDetailSchema } from '@shared/contract/errors.ts';
import { quiltPlanSchema, type QuiltPlan, type QuiltPlanJob } from '@shared/contract/quiltPlan.ts';
import type { Quilt } from '@shared/quilt/quilt.schema.ts';
import type { QuiltRouteProblem } from '@shared/quilt/quiltRoute.ts';
import { err, ok, type Result } from '@shared/result.ts';
import { inputsKey, placedDesignShapes, placedDesignVersions, postgresCornerCostStore } from '../jobs/planInputs.ts';
import { queueJobState, sendPlanQuiltJob } from '../jobs/planQueue.ts';
import { planFromStoredTables } from '../jobs/quiltPlanRun.ts';
import { countOpenPlanJobs, failPlanJob, findOwnedPlanJob, findPlanJobByInputs, insertPlanJob, requeuePlanJob, setPlanJobQueueId } from '../jobs/quiltPlanJob.repository.ts';
import { quiltPlanOf } from './quiltPlanAnswer.ts';

/** A queued row with no queue job this long after it was made was never sent (its request's instance stopped). */
const UNSENT_AFTER_MS = 30_000;

/** Whole-quilt plans one account may have queued or running at once; one more is 429. */
export const PLAN_JOBS_PER_ACCOUNT = 2;

export type QuiltPlanFailure =
  | { readonly kind: 'empty' }
  | { readonly kind: 'problem'; readonly problem: QuiltRouteProblem }
  | { readonly kind: 'too-many'; readonly open: number };

export type QuiltPlanOutcome = { readonly kind: 'planned'; readonly plan: QuiltPlan } | { readonly kind: 'queued'; readonly job: QuiltPlanJob };

/** The plan of the quilt as saved (`quiltVersion`), from the cache at once, or the job that will make it. */
export async function requestQuiltPlan(
  db: Kysely<Database>,
  queue: () => Promise<PgBoss>,
  ownerId: string,
  quilt: { id: string; version: number; map: Quilt },
): Promise<Result<QuiltPlanOutcome, QuiltPlanFailure>> {
  if (!quilt.map.placements.some((row) => row.some((p) => p !== null))) return err({ kind: 'empty' });
  const known = await knownQuiltPlan(db, ownerId, quilt);
  if (!known.ok) return known;
  const { key, existing, plan } = known.value;
  if (plan) return ok({ kind: 'planned', plan });

  if (existing && existing.state !== 'failed') {
    // A row whose queue job was never sent (the instance stopped between the two writes): send it now.
    if (existing.state === 'queued' && existing.queue_job_id === null && Date.now() - existing.created_at.getTime() > UNSENT_AFTER_MS) {
      await setPlanJobQueueId(db, existing.id, await sendPlanQuiltJob(await queue(), { planJobId: existing.id }));
    }
    return ok({ kind: 'queued', job: jobOfRow(existing) });
  }
  const open = await countOpenPlanJobs(db, ownerId);
  if (open >= PLAN_JOBS_PER_ACCOUNT) return err({ kind: 'too-many', open });
  const row = existing ? await requeuePlanJob(db, existing.id) : await insertPlanJob(db, { quiltId: quilt.id, ownerId, quiltVersion: quilt.version, inputsKey: key });
  // Another request made (or re-queued) the same job a moment ago: answer that one.
  if (!row) return ok({ kind: 'queued', job: jobOfRow((await findPlanJobByInputs(db, quilt.id, quilt.version, key))!) });
  const queueJobId = await sendPlanQuiltJob(await queue(), { planJobId: row.id });
  await setPlanJobQueueId(db, row.id, queueJobId);
  return ok({ kind: 'queued', job: jobOfRow(row) });
}

/**
 * The plan of this quilt version that needs no worker: its stored plan (this version over these design versions,
 * planned before), else the dynamic programme over the stored corner-pair tables when every placed design has one
 * (pairs proved by earlier jobs included; `proven` says whether it is least); else null. Makes no job.
 */
async function knownQuiltPlan(
  db: Kysely<Database>,
  ownerId: string,
  quilt: { id: string; version: number; map: Quilt },
): Promise<Result<{ key: string; existing: QuiltPlanJobRow | undefined; plan: QuiltPlan | null }, QuiltPlanFailure>> {
  const key = inputsKey(await placedDesignVersions(db, ownerId, quilt.map));
  const existing = await findPlanJobByInputs(db, quilt.id, quilt.version, key);
  const stored = existing ? planOfRow(existing) : null;
  if (stored) return ok({ key, existing, plan: stored });
  const designs = await placedDesignShapes(db, ownerId, quilt.map);
  const tables = await postgresCornerCostStore(db).load(designs);
  const cached = planFromStoredTables(quilt.map, designs, tables, false);
  if (!cached.ok) return err({ kind: 'problem', problem: cached.error });
  return ok({ key, existing, plan: cached.value ? quiltPlanOf(cached.value) : null });
}

/** The chained route of the saved quilt when it is known without planning (for the printed plan), else null. */
export async function storedQuiltPlan(db: Kysely<Database>, ownerId: string, quilt: { id: string; version: number; map: Quilt }): Promise<QuiltPlan | null> {
  if (!quilt.map.placements.some((row) => row.some((p) => p !== null))) return null;
  const known = await knownQuiltPlan(db, ownerId, quilt);
  return known.ok ? known.value.plan : null;
}

/**
 * The owner's job with its plan once done. A job the queue has given up on while our row still says queued or
 * running (its worker died on the last try) is marked failed here, so the page stops waiting.
 */
export async function readQuiltPlanJob(
  db: Kysely<Database>,
  queue: () => Promise<PgBoss>,
  ownerId: string,
  quiltId: string,
  jobId: string,
): Promise<{ job: QuiltPlanJob; plan: QuiltPlan | null } | undefined> {
  let row = await findOwnedPlanJob(db, ownerId, quiltId, jobId);
  if (!row) return undefined;
  if ((row.state === 'queued' || row.state === 'running') && row.queue_job_id) {
    const state = await queueJobState(await queue(), row.queue_job_id);
    if (state === 'failed' || state === 'cancelled') {
      await failPlanJob(db, row.id, JSON.stringify(GAVE_UP));
      row = (await findOwnedPlanJob(db, ownerId, quiltId, jobId))!;
    }
  }
  return { job: jobOfRow(row), plan: planOfRow(row) };
}

const GAVE_UP: ProblemDetail = { code: 'internal', message: 'Planning this quilt stopped after several tries. Try again; if it stops again, plan fewer blocks at a time.' };

function jobOfRow(row: QuiltPlanJobRow): QuiltPlanJob {
  const failure = row.failure === null ? null : problemDetailSchema.safeParse(row.failure);
  return {
    id: row.id,
    quiltVersion: row.quilt_version,
    state: row.state,
    done: Math.min(row.done, row.total),
    total: row.total,
    failure: failure === null ? null : failure.success ? failure.data : GAVE_UP,
  };
}

/** The stored plan of a done job (checked by the contract's schema: a stored plan it refuses is a bug). */
function planOfRow(row: QuiltPlanJobRow): QuiltPlan | null {
  if (row.state !== 'done' || row.result === null) return null;
  const parsed = quiltPlanSchema.safeParse(row.result);
  if (!parsed.success) throw new Error(`server/quilts/quiltPlan.service: stored plan of job ${row.id} fails its schema`);
  return parsed.data;
}
