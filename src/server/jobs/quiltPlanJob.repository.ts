// Queries on quilt_plan_job: whole-quilt plans run by planning workers. Reads an app instance answers with are
// scoped by owner (a job on a quilt that is not yours is one that does not exist); the worker's own reads and writes
// go by the job's id.
import { sql, type Kysely, type Transaction } from 'kysely';
import type { Database, QuiltPlanJobRow } from '@db/schema.ts';

export type Db = Kysely<Database> | Transaction<Database>;

/** The job for this quilt version and these inputs, if one was ever made. */
export async function findPlanJobByInputs(db: Db, quiltId: string, quiltVersion: number, inputsKey: string): Promise<QuiltPlanJobRow | undefined> {
  return db.selectFrom('quilt_plan_job').selectAll().where('quilt_id', '=', quiltId).where('quilt_version', '=', quiltVersion).where('inputs_key', '=', inputsKey).executeTakeFirst();
}

/** The owner's job on the owner's quilt, or undefined. */
export async function findOwnedPlanJob(db: Db, ownerId: string, quiltId: string, jobId: string): Promise<QuiltPlanJobRow | undefined> {
  return db.selectFrom('quilt_plan_job').selectAll().where('id', '=', jobId).where('quilt_id', '=', quiltId).where('owner_id', '=', ownerId).executeTakeFirst();
}

export async function findPlanJob(db: Db, jobId: string): Promise<QuiltPlanJobRow | undefined> {
  return db.selectFrom('quilt_plan_job').selectAll().where('id', '=', jobId).executeTakeFirst();
}

/** Jobs of this owner still queued or running. */
export async function countOpenPlanJobs(db: Db, ownerId: string): Promise<number> {
  const row = await db
    .selectFrom('quilt_plan_job')
    .select((eb) => eb.fn.countAll<number>().as('n'))
    .where('owner_id', '=', ownerId)
    .where('state', 'in', ['queued', 'running'])
    .executeTakeFirstOrThrow();
  return Number(row.n);
}

/** A new queued job, or undefined when one for the same quilt version and inputs exists already (a racing request). */
export async function insertPlanJob(db: Db, v: { quiltId: string; ownerId: string; quiltVersion: number; inputsKey: string }): Promise<QuiltPlanJobRow | undefined> {
  return db
    .insertInto('quilt_plan_job')
    .values({ quilt_id: v.quiltId, owner_id: v.ownerId, quilt_version: v.quiltVersion, inputs_key: v.inputsKey })
    .onConflict((oc) => oc.columns(['quilt_id', 'quilt_version', 'inputs_key']).doNothing())
    .returningAll()
    .executeTakeFirst();
}

/** A failed job queued again from the start (a new request for the same inputs). */
export async function requeuePlanJob(db: Db, jobId: string): Promise<QuiltPlanJobRow | undefined> {
  return db
    .updateTable('quilt_plan_job')
    .set({ state: 'queued', done: 0, total: 0, failure: null, queue_job_id: null, updated_at: sql<Date>`now()` })
    .where('id', '=', jobId)
    .where('state', '=', 'failed')
    .returningAll()
    .executeTakeFirst();
}

export async function setPlanJobQueueId(db: Db, jobId: string, queueJobId: string): Promise<void> {
  await db.updateTable('quilt_plan_job').set({ queue_job_id: queueJobId, updated_at: sql<Date>`now()` }).where('id', '=', jobId).execute();
}

/** A worker takes the job (again, after a retry): running, one more attempt, progress from zero. */
export async function startPlanJob(db: Db, jobId: string): Promise<QuiltPlanJobRow | undefined> {
  return db
    .updateTable('quilt_plan_job')
    .set({ state: 'running', attempts: sql<number>`attempts + 1`, done: 0, total: 0, updated_at: sql<Date>`now()` })
    .where('id', '=', jobId)
    .where('state', 'in', ['queued', 'running'])
    .returningAll()
    .executeTakeFirst();
}

/** Progress (and the heartbeat: updated_at) of a running job. */
export async function setPlanJobProgress(db: Db, jobId: string, done: number, total: number): Promise<void> {
  await db.updateTable('quilt_plan_job').set({ done, total, updated_at: sql<Date>`now()` }).where('id', '=', jobId).where('state', '=', 'running').execute();
}

export async function finishPlanJob(db: Db, jobId: string, resultJson: string): Promise<void> {
  await db
    .updateTable('quilt_plan_job')
    .set({ state: 'done', result: resultJson, done: sql<number>`greatest(done, total)`, failure: null, updated_at: sql<Date>`now()` })
    .where('id', '=', jobId)
    .execute();
}

export async function failPlanJob(db: Db, jobId: string, failureJson: string): Promise<void> {
  await db.updateTable('quilt_plan_job').set({ state: 'failed', failure: failureJson, updated_at: sql<Date>`now()` }).where('id', '=', jobId).where('state', '<>', 'done').execute();
}

/** pg-boss ids of running jobs nobody has written to for `staleSeconds` (their worker is gone). */
export async function findStalePlanJobs(db: Db, staleSeconds: number): Promise<{ id: string; queue_job_id: string }[]> {
  const rows = await db
    .selectFrom('quilt_plan_job')
    .select(['id', 'queue_job_id'])
    .where('state', '=', 'running')
    .where('queue_job_id', 'is not', null)
    .where('updated_at', '<', sql<Date>`now() - make_interval(secs => ${staleSeconds})`)
    .execute();
  return rows.map((r) => ({ id: r.id, queue_job_id: r.queue_job_id! }));
}

/**
 * A stale job handed back to the queue: queued again. True only for the one caller whose update changed the row, so
 * of two workers sweeping at once only one fails the queue's job.
 */
export async function markPlanJobRequeued(db: Db, jobId: string, staleSeconds: number): Promise<boolean> {
  const r = await db
    .updateTable('quilt_plan_job')
    .set({ state: 'queued', updated_at: sql<Date>`now()` })
    .where('id', '=', jobId)
    .where('state', '=', 'running')
    .where('updated_at', '<', sql<Date>`now() - make_interval(secs => ${staleSeconds})`)
    .executeTakeFirst();
  return Number(r.numUpdatedRows) === 1;
}

/** A job whose try failed and that pg-boss will try again: queued, so the stale-job sweep leaves it alone meanwhile. */
export async function requeueRunningPlanJob(db: Db, jobId: string): Promise<void> {
  await db.updateTable('quilt_plan_job').set({ state: 'queued', updated_at: sql<Date>`now()` }).where('id', '=', jobId).where('state', '=', 'running').execute();
}
