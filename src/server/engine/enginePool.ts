// The app's engine pools: route checks and planning run here, off the request thread, fairly between accounts;
// and a one-worker codec pool that parses, validates and serialises heavy designs for saves and reads.
// Built app: dist/engine/engine.worker.mjs (bundled by scripts/lib/engineWorker.mjs during the build;
// the scripts start the server with cwd = repo root). `astro dev`: the TypeScript worker through tsx.
import { availableParallelism } from 'node:os';
import path from 'node:path';
import type { Result } from '@shared/result.ts';
import type { EngineAnswers, EngineTask } from './engine.types.ts';
import { WorkerPool, type JobOptions, type PoolFailure } from './workerPool.ts';

/** Longest a check or plan may run before its worker is stopped (ms). A 12 in block with ~30,000 planar
 * edges plans in under 1 s (issue 3 target), so 8 s only stops designs far beyond a real block. */
export const ENGINE_TIMEOUT_MS = 8_000;
/** Jobs waiting beyond this many (all accounts) get 503 engine_busy instead of queueing without end. */
export const ENGINE_MAX_QUEUE = 32;
/** Checks and plans one account may have waiting; one more gets 429 with Retry-After. The workbench has at
 * most one check and one plan in flight, so only a flood reaches this. */
export const ENGINE_MAX_QUEUED_PER_ACCOUNT = 4;
/** Longest a job waits for a worker before it gives up with 503 (ms): an answer later than this is stale. */
export const ENGINE_QUEUE_WAIT_MS = 10_000;
/** Two workers on a 2-core machine, at most four: the request thread keeps a core for I/O on bigger ones. */
export const ENGINE_POOL_SIZE = Math.max(2, Math.min(4, availableParallelism()));
/** Workers one account may hold at once: all but one, so one account's flood always leaves a worker to others. */
export const ENGINE_MAX_RUNNING_PER_ACCOUNT = Math.max(1, ENGINE_POOL_SIZE - 1);
/** The codec pool (parsing and serialising heavy designs for saves and reads): one worker of its own, so a
 * save never waits behind planning. */
export const CODEC_POOL_SIZE = 1;
export const CODEC_MAX_QUEUE = 16;
export const CODEC_MAX_QUEUED_PER_ACCOUNT = 2;

export function engineWorkerLocation(dev: boolean, root = process.cwd()): { file: string; workerData?: unknown } {
  if (dev) {
    return {
      file: path.join(root, 'src/server/engine/tsWorkerBoot.mjs'),
      workerData: { tsFile: path.join(root, 'src/server/engine/engine.worker.ts') },
    };
  }
  return { file: path.join(root, 'dist/engine/engine.worker.mjs') };
}

type Pool = WorkerPool<EngineTask, unknown>;
let pool: Pool | undefined;
let codecPool: Pool | undefined;

function enginePool(): Pool {
  pool ??= new WorkerPool<EngineTask, unknown>({
    ...engineWorkerLocation(import.meta.env.DEV),
    size: ENGINE_POOL_SIZE,
    timeoutMs: ENGINE_TIMEOUT_MS,
    maxQueue: ENGINE_MAX_QUEUE,
    maxQueuedPerKey: ENGINE_MAX_QUEUED_PER_ACCOUNT,
    maxRunningPerKey: ENGINE_MAX_RUNNING_PER_ACCOUNT,
    maxRunningBackground: ENGINE_MAX_RUNNING_PER_ACCOUNT,
    queueTimeoutMs: ENGINE_QUEUE_WAIT_MS,
  });
  return pool;
}

function designCodecPool(): Pool {
  codecPool ??= new WorkerPool<EngineTask, unknown>({
    ...engineWorkerLocation(import.meta.env.DEV),
    size: CODEC_POOL_SIZE,
    timeoutMs: ENGINE_TIMEOUT_MS,
    maxQueue: CODEC_MAX_QUEUE,
    maxQueuedPerKey: CODEC_MAX_QUEUED_PER_ACCOUNT,
    queueTimeoutMs: ENGINE_QUEUE_WAIT_MS,
  });
  return codecPool;
}

type EngineOp = 'summary' | 'check' | 'plan' | 'ownRoute' | 'cornerPair';
type CodecOp = 'acceptBody' | 'acceptStored' | 'exportSvg';

/**
 * Runs one engine task in the pool for `account`: the engine's answer, or why there is none (timeout, busy,
 * account-busy, queue-timeout, failed). `background` jobs (table figures) run only when no check or plan can.
 */
export async function runEngine<T extends Extract<EngineTask, { op: EngineOp }>>(
  task: T,
  job: JobOptions = {},
): Promise<Result<EngineAnswers[T['op']], PoolFailure>> {
  return (await enginePool().run(task, job)) as Result<EngineAnswers[T['op']], PoolFailure>;
}

/** Runs one design codec task (heavy design text) in the codec pool for `account`. */
export async function runCodec<T extends Extract<EngineTask, { op: CodecOp }>>(task: T, account: string): Promise<Result<EngineAnswers[T['op']], PoolFailure>> {
  return (await designCodecPool().run(task, { key: account })) as Result<EngineAnswers[T['op']], PoolFailure>;
}
