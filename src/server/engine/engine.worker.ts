// Worker-thread entry for the engine pool (see enginePool.ts). Loads the exact search's solver (HiGHS in
// WebAssembly, shared/route/exact/highsSolver.ts), then says `{ ready: true }` and answers each
// `{ id, input: EngineTask }` with a WorkerReply. A throw inside the engine is a broken invariant: it goes back as
// `ok: false` with its stack, and the worker stays up for the next task. Bundled to dist/engine/engine.worker.mjs
// by scripts/lib/engineWorker.mjs (which copies highs.wasm beside the bundle).
import { parentPort } from 'node:worker_threads';
import { loadHighsSolver } from '@shared/route/exact/highsSolver.ts';
import type { WorkerReply } from './workerPool.ts';
import type { EngineTask } from './engine.types.ts';
import { runEngineTask, type EngineContext } from './engineTasks.ts';
import { installPlainMessages } from '@shared/forms/plainMessages.ts';

// The worker has its own module graph: its design checks need the plain messages too.
installPlainMessages();

const port = parentPort;
if (!port) throw new Error('server/engine/engine.worker: must run as a worker thread');
const solver = await loadHighsSolver();
// No warm-up solve here: it sets the engine's optimising compiler to work in the background, which then slows
// whatever task comes first (measured: a one-line plan took 0.8–1.5 s instead of 20 ms under load).
const context: EngineContext = { solver, clock: () => performance.now() };
port.on('message', ({ id, input }: { id: number; input: EngineTask }) => {
  let reply: WorkerReply;
  try {
    reply = { id, ok: true, value: runEngineTask(input, context) };
  } catch (error) {
    reply = { id, ok: false, error: error instanceof Error ? (error.stack ?? error.message) : String(error) };
  }
  port.postMessage(reply);
});
port.postMessage({ ready: true } satisfies WorkerReply);
