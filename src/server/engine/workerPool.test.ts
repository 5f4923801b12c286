import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { designSchema } from '../../../shared/design/design.schema.ts';
import type { EngineAnswers, EngineTask } from './engine.types.ts';
import { engineWorkerLocation } from './enginePool.ts';
import { WorkerPool } from './workerPool.ts';

const root = path.resolve(import.meta.dirname, '../../..');
const spin = {
  file: path.join(root, 'src/server/engine/tsWorkerBoot.mjs'),
  workerData: { tsFile: path.join(root, 'src/server/engine/testing/spin.worker.ts') },
};
type SpinIn = { ms: number; fail?: boolean };
type SpinOut = { threadId: number };

const pools: WorkerPool<any, any>[] = [];
function makePool<I, O>(opts: Partial<ConstructorParameters<typeof WorkerPool>[0]> & { file: string }): WorkerPool<I, O> {
  const p = new WorkerPool<I, O>({ size: 2, timeoutMs: 5_000, maxQueue: 8, ...opts });
  pools.push(p);
  return p;
}
afterEach(async () => {
  await Promise.all(pools.splice(0).map((p) => p.close()));
});

describe('WorkerPool', () => {
  it('stops a job at its time cap, replaces the worker, and the new worker serves the next job', async () => {
    const pool = makePool<SpinIn, SpinOut>({ ...spin, size: 1, timeoutMs: 1_500 });
    const first = await pool.run({ ms: 0 });
    expect(first.ok).toBe(true);
    const before = first.ok ? first.value.threadId : -1;

    const stuck = await pool.run({ ms: 60_000 });
    expect(stuck).toEqual({ ok: false, error: { kind: 'timeout', ms: 1_500 } });
    expect(pool.stats.replaced).toBe(1);
    expect(pool.stats.size).toBe(1);

    const after = await pool.run({ ms: 0 });
    expect(after.ok).toBe(true);
    if (after.ok) expect(after.value.threadId).not.toBe(before);
  });

  it('serves jobs on different threads at once: a long job does not hold up a short one', async () => {
    const pool = makePool<SpinIn, SpinOut>({ ...spin, size: 2 });
    await Promise.all([pool.run({ ms: 0 }), pool.run({ ms: 0 })]); // both workers started
    const order: string[] = [];
    const long = pool.run({ ms: 1_500 }).then((r) => (order.push('long'), r));
    const short = pool.run({ ms: 10 }).then((r) => (order.push('short'), r));
    const [a, b] = await Promise.all([long, short]);
    expect(order).toEqual(['short', 'long']);
    expect(a.ok && b.ok && a.value.threadId !== b.value.threadId).toBe(true);
  });

  it('queues beyond its size, refuses beyond the queue cap as busy, and passes worker errors on as failed', async () => {
    const pool = makePool<SpinIn, SpinOut>({ ...spin, size: 1, maxQueue: 1 });
    expect((await pool.run({ ms: 0 })).ok).toBe(true); // loaded: the next job runs at once instead of waiting
    const running = pool.run({ ms: 300 });
    const queued = pool.run({ ms: 0 });
    const refused = await pool.run({ ms: 0 });
    expect(refused).toEqual({ ok: false, error: { kind: 'busy', queued: 1 } });
    expect((await running).ok).toBe(true);
    expect((await queued).ok).toBe(true);
    expect(await pool.run({ ms: 0, fail: true })).toEqual({ ok: false, error: { kind: 'failed', message: 'asked to fail' } });
    expect((await pool.run({ ms: 0 })).ok).toBe(true);
  });

  it('does not count a cold start against the time cap, and fails jobs when the worker file cannot load', async () => {
    // tsx compiles the engine on first load, which takes longer than this cap on a busy machine.
    const cold = makePool<EngineTask, EngineAnswers['plan']>({ ...engineWorkerLocation(true, root), size: 1, timeoutMs: 300 });
    const design = designSchema.parse({ version: 1, units: 'in', width: 12, height: 12, seams: [], lines: [[[0, 6], [12, 6]]] });
    expect((await cold.run({ op: 'plan', design })).ok).toBe(true);
    const broken = makePool<SpinIn, SpinOut>({ file: path.join(root, 'src/server/engine/testing/no-such.worker.mjs'), size: 1 });
    const r = await broken.run({ ms: 0 });
    expect(r.ok === false && r.error.kind).toBe('failed');
  });

  it('answers closed after close()', async () => {
    const pool = makePool<SpinIn, SpinOut>({ ...spin, size: 1 });
    await pool.close();
    expect(await pool.run({ ms: 0 })).toEqual({ ok: false, error: { kind: 'closed' } });
  });

  it('runs the real engine worker (TypeScript through tsx, as in astro dev)', async () => {
    const pool = makePool<EngineTask, EngineAnswers['plan']>({ ...engineWorkerLocation(true, root), size: 1 });
    // Two crossing quilting lines: 4 odd points at the line ends on the block edge (12 in block).
    const design = designSchema.parse({ version: 1, units: 'in', width: 12, height: 12, seams: [], lines: [[[0, 6], [12, 6]], [[6, 0], [6, 12]]] });
    const r = await pool.run({ op: 'plan', design });
    expect(r.ok).toBe(true);
    if (!r.ok || !r.value.ok) throw new Error('plan failed');
    expect(r.value.value.passes).toBe(1);
    expect(r.value.value.stitchLength).toBeCloseTo(24, 9);
  });
});
