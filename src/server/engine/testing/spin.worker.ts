// A worker for testing WorkerPool itself: it busy-waits `input.ms` milliseconds of CPU (like a dense design
// that blocks its thread) and answers with its thread id (and `input.tag`, to tell jobs apart), or fails when `input.fail` is set.
import { parentPort, threadId } from 'node:worker_threads';

parentPort!.on('message', ({ id, input }: { id: number; input: { ms: number; fail?: boolean; tag?: string } }) => {
  if (input.fail) {
    parentPort!.postMessage({ id, ok: false, error: 'asked to fail' });
    return;
  }
  const until = performance.now() + input.ms;
  while (performance.now() < until) {
    // spin: the thread cannot see messages or timers until this returns
  }
  parentPort!.postMessage({ id, ok: true, value: { threadId, tag: input.tag } });
});
parentPort!.postMessage({ ready: true });
