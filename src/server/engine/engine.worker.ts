// Worker-thread entry for the engine pool (see enginePool.ts). Says `{ ready: true }` once loaded, then answers
// each `{ id, input: EngineTask }` with a
// WorkerReply. A throw inside the engine is a broken invariant: it goes back as `ok: false` with its stack,
// and the worker stays up for the next task. Bundled to dist/engine/engine.worker.mjs by scripts/lib/engineWorker.mjs.
import { parentPort } from 'node:worker_threads';
import type { WorkerReply } from './workerPool.ts';
import type { EngineTask } from './engine.types.ts';
import { runEngineTask } from './engineTasks.ts';

const port = parentPort;
if (!port) throw new Error('server/engine/engine.worker: must run as a worker thread');
port.on('message', ({ id, input }: { id: number; input: EngineTask }) => {
  let reply: WorkerReply;
  try {
    reply = { id, ok: true, value: runEngineTask(input) };
  } catch (error) {
    reply = { id, ok: false, error: error instanceof Error ? (error.stack ?? error.message) : String(error) };
  }
  port.postMessage(reply);
});
port.postMessage({ ready: true } satisfies WorkerReply);
