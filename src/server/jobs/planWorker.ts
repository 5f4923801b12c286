// A planning worker: takes 'plan-quilt' jobs from the queue (pg-boss, one job at a time per process) and plans each
// whole quilt with its own pool of engine threads (the app's WorkerPool over engine.worker, `cornerPair` tasks), so
// M worker processes on other machines add M × threads to planning without slowing any page. Progress goes to the
// job's row at most every PROGRESS_EVERY_MS (and as a heartbeat every HEARTBEAT_MS while a job runs); every worker
// also fails (so pg-boss retries) running jobs whose heartbeat has stopped: their worker died.
//
// A job's outcomes: done (the plan stored on the row), failed with a 400-style detail naming the cell (the planner
// refused a design: trying again cannot help, so no retry), or a throw (an engine thread crashed or timed out, the
// database went away): pg-boss tries it again, and on the last try the row is marked failed.
import type { Kysely } from 'kysely';
import type PgBoss from 'pg-boss';
import { connectDatabase } from '@db/connect.ts';
import type { Database } from '@db/schema.ts';
import type { ProblemDetail } from '@shared/contract/errors.ts';
import type { CornerPairPlan } from '@shared/quilt/cornerCosts.ts';
import type { DesignProblem } from '@shared/graph/designProblem.ts';
import { err, ok } from '@shared/result.ts';
import type { EngineAnswers, EngineTask } from '../engine/engine.types.ts';
import { WorkerPool } from '../engine/workerPool.ts';
import { quiltOf } from '../quilts/quilt.service.ts';
import { findLiveQuilt, liveOwnedDesignTexts } from '../quilts/quilt.repository.ts';
import { quiltPlanOf } from '../quilts/quiltPlanAnswer.ts';
import { inputsKey, placedDesignShapes, placedDesignVersions, postgresCornerCostStore, QUILT_JOB_PROVE_WITHIN_MS, QUILT_JOB_PROVES, QUILT_JOB_SETTINGS } from './planInputs.ts';
import { openPlanQueue, PLAN_HEARTBEAT_STALE_SECONDS, PLAN_QUILT_QUEUE, type PlanQuiltJobData } from './planQueue.ts';
import { failPlanJob, finishPlanJob, findStalePlanJobs, markPlanJobRequeued, requeueRunningPlanJob, setPlanJobProgress, startPlanJob } from './quiltPlanJob.repository.ts';
import { runQuiltPlan, type PairRunner, type RunDesign } from './quiltPlanRun.ts';

/** Longest one corner-pair plan may hold a thread (ms): the exact search stops itself at 100 ms, so this only catches a broken plan. */
const PAIR_TIMEOUT_MS = 60_000;
const PROGRESS_EVERY_MS = 250;
const HEARTBEAT_MS = 3_000;
const SWEEP_EVERY_MS = 5_000;

export interface PlanWorkerOptions {
  readonly databaseUrl: string;
  /** Engine threads (corner-pair plans side by side). */
  readonly threads: number;
  /** The engine thread's entry (enginePool.ts engineWorkerLocation). */
  readonly engine: { readonly file: string; readonly workerData?: unknown };
  readonly log?: (line: string) => void;
}

export interface PlanWorker {
  /** Stops taking jobs, lets the running one finish for up to `graceMs` (else pg-boss fails it, so it is retried), then closes. */
  stop(graceMs?: number): Promise<void>;
}

export async function startPlanWorker(options: PlanWorkerOptions): Promise<PlanWorker> {
  const log = options.log ?? ((line: string) => console.log(`[plan-worker] ${line}`));
  const db = connectDatabase(options.databaseUrl, 4);
  const pool = new WorkerPool<EngineTask, unknown>({ ...options.engine, size: options.threads, timeoutMs: PAIR_TIMEOUT_MS, maxQueue: 1_000_000 });
  const boss = await openPlanQueue(options.databaseUrl, { role: 'worker' });

  const runPair: PairRunner = async (designText, a, b, exact) => {
    const r = await pool.run({ op: 'cornerPair', designText, a, b, exact, settings: QUILT_JOB_SETTINGS });
    // No answer from the engine (a thread crashed or ran past the cap): the whole job is tried again.
    if (!r.ok) throw new Error(`server/jobs/planWorker: corner pair not planned (${r.error.kind})`);
    const answer = r.value as EngineAnswers['cornerPair'];
    return answer.ok ? ok<CornerPairPlan>(answer.value) : err<DesignProblem>(answer.problem);
  };

  await boss.work<PlanQuiltJobData>(PLAN_QUILT_QUEUE, { batchSize: 1, pollingIntervalSeconds: 0.5, includeMetadata: true }, async ([job]) => {
    if (!job) return;
    try {
      await planOne(db, job.data.planJobId, runPair, log);
    } catch (error) {
      const last = job.retryCount >= job.retryLimit;
      log(`job ${job.data.planJobId} try ${job.retryCount + 1} failed${last ? ' (last try)' : ''}: ${error instanceof Error ? error.message : String(error)}`);
      // Last try: the row says failed. Otherwise pg-boss tries again; until a worker takes it the row is queued, so the
      // stale-job sweep does not count the wait as a dead worker (and spend a retry).
      await (last ? failPlanJob(db, job.data.planJobId, JSON.stringify(GAVE_UP)) : requeueRunningPlanJob(db, job.data.planJobId)).catch(() => {});
      throw error;
    }
  });

  const sweep = setInterval(() => void sweepStaleJobs(db, boss, log).catch((e: unknown) => log(`stale-job sweep: ${String(e)}`)), SWEEP_EVERY_MS);
  log(`taking '${PLAN_QUILT_QUEUE}' jobs with ${options.threads} engine threads`);

  return {
    async stop(graceMs = 10_000) {
      clearInterval(sweep);
      await boss.stop({ graceful: true, timeout: graceMs, wait: true });
      await pool.close();
      await db.destroy();
    },
  };
}

const GAVE_UP: ProblemDetail = { code: 'internal', message: 'Planning this quilt stopped after several tries. Try again; if it stops again, plan fewer blocks at a time.' };
const STALE: ProblemDetail = { code: 'conflict', message: 'The quilt or one of its designs was saved again while it waited to be planned. Plan it again.' };

/** Plans one job from its row; returns when the row says done or failed. Throws for anything worth another try. */
async function planOne(db: Kysely<Database>, planJobId: string, runPair: PairRunner, log: (line: string) => void): Promise<void> {
  const started = Date.now();
  const row = await startPlanJob(db, planJobId);
  if (!row) return; // done or failed already (a duplicate delivery)
  const quiltRow = await findLiveQuilt(db, row.quilt_id);
  if (!quiltRow || quiltRow.owner_id !== row.owner_id || quiltRow.version !== row.quilt_version) {
    await failPlanJob(db, row.id, JSON.stringify(STALE));
    return;
  }
  const quilt = quiltOf(quiltRow);
  if (inputsKey(await placedDesignVersions(db, row.owner_id, quilt)) !== row.inputs_key) {
    await failPlanJob(db, row.id, JSON.stringify(STALE));
    return;
  }
  const shapes = await placedDesignShapes(db, row.owner_id, quilt);
  const texts = new Map((await liveOwnedDesignTexts(db, row.owner_id, shapes.map((s) => s.id))).map((t) => [t.id, t] as const));
  const designs: RunDesign[] = shapes.flatMap((s) => {
    const t = texts.get(s.id);
    return t && t.version === s.version ? [{ ...s, designText: t.data_json }] : [];
  });

  let last = { done: 0, total: 0 };
  let written = 0;
  let writing: Promise<void> = Promise.resolve();
  const write = (): void => {
    written = Date.now();
    const { done, total } = last;
    writing = writing.then(() => setPlanJobProgress(db, row.id, done, total)).catch((e: unknown) => log(`progress of ${row.id}: ${String(e)}`));
  };
  const heartbeat = setInterval(write, HEARTBEAT_MS);
  let result;
  try {
    result = await runQuiltPlan(quilt, designs, {
      store: postgresCornerCostStore(db),
      runPair,
      prove: QUILT_JOB_PROVES,
      proveWithinMs: QUILT_JOB_PROVE_WITHIN_MS,
      onProgress: (done, total) => {
        last = { done, total };
        if (Date.now() - written >= PROGRESS_EVERY_MS) write();
      },
    });
  } finally {
    clearInterval(heartbeat);
    await writing;
  }
  if (!result.ok) {
    const p = result.error;
    const at = p.kind === 'order' ? 'quilt.order' : `quilt.placements.${p.cell.row}.${p.cell.column}.designId`;
    await failPlanJob(db, row.id, JSON.stringify({ code: 'invalid_input', message: `The quilt cannot be planned: ${p.message}`, fields: { [at]: p.message } } satisfies ProblemDetail));
    return;
  }
  await setPlanJobProgress(db, row.id, last.done, last.total);
  await finishPlanJob(db, row.id, JSON.stringify(quiltPlanOf(result.value.route)));
  const s = result.value.stats;
  log(`job ${row.id}: ${designs.length} designs (${s.cachedDesigns} cached), ${s.heuristicPlans} heuristic + ${s.provedPlans} proved pair plans in ${((Date.now() - started) / 1000).toFixed(1)} s${s.proofCut ? ' (proving stopped at its time limit)' : ''}`);
}

/** Fails (so pg-boss retries) running jobs whose worker stopped writing: it died mid-job. */
async function sweepStaleJobs(db: Kysely<Database>, boss: PgBoss, log: (line: string) => void): Promise<void> {
  for (const stale of await findStalePlanJobs(db, PLAN_HEARTBEAT_STALE_SECONDS)) {
    if (!(await markPlanJobRequeued(db, stale.id, PLAN_HEARTBEAT_STALE_SECONDS))) continue;
    await boss.fail(PLAN_QUILT_QUEUE, stale.queue_job_id, { message: `no heartbeat for ${PLAN_HEARTBEAT_STALE_SECONDS} s: its worker is gone` });
    log(`job ${stale.id}: no heartbeat for ${PLAN_HEARTBEAT_STALE_SECONDS} s, handed back to the queue`);
  }
}
