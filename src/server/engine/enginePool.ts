// The app's one engine pool: route checks and planning run here, off the request thread.
// Built app: dist/engine/engine.worker.mjs (bundled by scripts/lib/engineWorker.mjs during the build;
// the scripts start the server with cwd = repo root). `astro dev`: the TypeScript worker through tsx.
import { availableParallelism } from 'node:os';
import path from 'node:path';
import type { Result } from '../../../shared/result.ts';
import type { EngineAnswers, EngineTask } from './engine.types.ts';
import { WorkerPool, type PoolFailure } from './workerPool.ts';

/** Longest a check or plan may run before its worker is stopped (ms). A 12 in block with ~30,000 planar
 * edges plans in under 1 s (issue 3 target), so 8 s only stops designs far beyond a real block. */
export const ENGINE_TIMEOUT_MS = 8_000;
/** Jobs waiting beyond this many get 503 (try again) instead of queueing without end. */
export const ENGINE_MAX_QUEUE = 32;
/** Two workers on a 2-core machine, at most four: the request thread keeps a core for I/O on bigger ones. */
export const ENGINE_POOL_SIZE = Math.max(2, Math.min(4, availableParallelism()));

export function engineWorkerLocation(dev: boolean, root = process.cwd()): { file: string; workerData?: unknown } {
  if (dev) {
    return {
      file: path.join(root, 'src/server/engine/tsWorkerBoot.mjs'),
      workerData: { tsFile: path.join(root, 'src/server/engine/engine.worker.ts') },
    };
  }
  return { file: path.join(root, 'dist/engine/engine.worker.mjs') };
}

let pool: WorkerPool<EngineTask, unknown> | undefined;

function enginePool(): WorkerPool<EngineTask, unknown> {
  pool ??= new WorkerPool<EngineTask, unknown>({
    ...engineWorkerLocation(import.meta.env.DEV),
    size: ENGINE_POOL_SIZE,
    timeoutMs: ENGINE_TIMEOUT_MS,
    maxQueue: ENGINE_MAX_QUEUE,
  });
  return pool;
}

/** Runs one engine task in the pool: the engine's answer, or why there is none (timeout, busy, failed). */
export async function runEngine<T extends EngineTask>(task: T): Promise<Result<EngineAnswers[T['op']], PoolFailure>> {
  return (await enginePool().run(task)) as Result<EngineAnswers[T['op']], PoolFailure>;
}
