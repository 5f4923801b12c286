// The PostgreSQL-backed job queue for heavy planning (npm pg-boss 10.4.2, the last line that runs on Node 20; its
// tables live in their own schema, `pgboss`, created by pg-boss itself on first start). App instances only send
// and look up jobs; planning worker processes (planWorker.ts) take them. Both open the queue here so the queue's
// settings are written in one place.
//
// Retries: a job whose handler throws (an engine thread crashed, the database went away) is tried again after
// PLAN_RETRY_DELAY_SECONDS, up to PLAN_RETRY_LIMIT more times. A worker process that dies mid-job leaves its job
// `active`: the job is failed (and so retried) either when its heartbeat goes stale (planWorker.ts, every worker
// watches the others: PLAN_HEARTBEAT_STALE_SECONDS) or, at the latest, by pg-boss's own expiry after
// PLAN_JOB_TIMEOUT_SECONDS (the job timeout).
import PgBoss from 'pg-boss';

export const PLAN_QUILT_QUEUE = 'plan-quilt';
/** Tries after the first: a job survives two worker deaths or crashes. */
export const PLAN_RETRY_LIMIT = 2;
export const PLAN_RETRY_DELAY_SECONDS = 1;
/** The job timeout: a job still running after this is failed by pg-boss (and retried while tries remain). */
export const PLAN_JOB_TIMEOUT_SECONDS = 300;
/** A running job whose worker has written nothing for this long is taken to be dead and is failed (and retried). */
export const PLAN_HEARTBEAT_STALE_SECONDS = 20;
/** Jobs kept in pg-boss's tables after they end (our own quilt_plan_job row keeps the result). */
const RETENTION_MINUTES = 60;

/** What a plan-quilt job carries: only our own job row's id (the row holds everything else). */
export interface PlanQuiltJobData {
  readonly planJobId: string;
}

export interface PlanQueueOptions {
  /** `worker`: also runs pg-boss's maintenance (expiry, archiving) and polls for jobs. */
  readonly role: 'app' | 'worker';
  /** Connections pg-boss may open (its own pool). */
  readonly maxConnections?: number;
}

/** Starts pg-boss on `connectionString` (creating or migrating its schema) and makes sure the queue exists with our settings. */
export async function openPlanQueue(connectionString: string, { role, maxConnections = role === 'app' ? 2 : 4 }: PlanQueueOptions): Promise<PgBoss> {
  const boss = new PgBoss({
    connectionString,
    max: maxConnections,
    application_name: `threadway-${role}-queue`,
    supervise: role === 'worker',
    // Every 5 s one worker (pg-boss takes turns through a lock) fails jobs past their expiry, so they are retried.
    maintenanceIntervalSeconds: 5,
    schedule: false,
    migrate: true,
  });
  // An error event with no listener would end the process; pg-boss reports lost connections this way.
  boss.on('error', (error) => console.error(`[plan-queue] ${error.message}`));
  await boss.start();
  const settings = { retryLimit: PLAN_RETRY_LIMIT, retryDelay: PLAN_RETRY_DELAY_SECONDS, expireInSeconds: PLAN_JOB_TIMEOUT_SECONDS, retentionMinutes: RETENTION_MINUTES };
  await boss.createQueue(PLAN_QUILT_QUEUE, { name: PLAN_QUILT_QUEUE, policy: 'standard', ...settings });
  // createQueue leaves an existing queue as it was: write the settings again so a changed constant takes effect.
  await boss.updateQueue(PLAN_QUILT_QUEUE, { name: PLAN_QUILT_QUEUE, ...settings });
  return boss;
}

/** Puts one plan-quilt job on the queue; pg-boss's id. */
export async function sendPlanQuiltJob(boss: PgBoss, data: PlanQuiltJobData): Promise<string> {
  const id = await boss.send(PLAN_QUILT_QUEUE, { ...data }, { retryLimit: PLAN_RETRY_LIMIT, retryDelay: PLAN_RETRY_DELAY_SECONDS, expireInSeconds: PLAN_JOB_TIMEOUT_SECONDS });
  if (!id) throw new Error('server/jobs/planQueue: pg-boss refused the job');
  return id;
}

/** pg-boss's state of a job ('created' | 'retry' | 'active' | 'completed' | 'cancelled' | 'failed'), null when gone. */
export async function queueJobState(boss: PgBoss, id: string): Promise<string | null> {
  const job = await boss.getJobById(PLAN_QUILT_QUEUE, id, { includeArchive: true });
  return job?.state ?? null;
}
