import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { designSchema } from '@shared/design/design.schema.ts';
import type { EngineAnswers, EngineTask } from './engine.types.ts';
import { engineWorkerLocation } from './enginePool.ts';
import { WorkerPool } from './workerPool.ts';

const root = path.resolve(import.meta.dirname, '../../..');
const spin = {
  file: path.join(root, 'src/server/engine/tsWorkerBoot.mjs'),
  workerData: { tsFile: path.join(root, 'src/server/engine/testing/spin.worker.ts') },
};
type SpinIn = { ms: number; fail?: boolean; tag?: string };
type SpinOut = { threadId: number; tag?: string };

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

/** Runs short jobs (one account each) until `n` different worker threads have answered: every worker has loaded. */
async function warm(pool: WorkerPool<SpinIn, SpinOut>, n: number): Promise<void> {
  const seen = new Set<number>();
  for (let round = 0; seen.size < n; round++) {
    if (round > 200) throw new Error(`only ${seen.size} of ${n} workers answered`);
    const answers = await Promise.all(Array.from({ length: n }, (_, i) => pool.run({ ms: 30 }, { key: `warm-${i}` })));
    for (const r of answers) if (r.ok) seen.add(r.value.threadId);
  }
}

describe('WorkerPool fairness between accounts', () => {
  it('serves waiting jobs round-robin by account: a flooding account does not hold up another', async () => {
    const pool = makePool<SpinIn, SpinOut>({ ...spin, size: 1 });
    expect((await pool.run({ ms: 0 })).ok).toBe(true); // loaded
    const order: string[] = [];
    const done = (r: Awaited<ReturnType<typeof pool.run>>) => r.ok && order.push(r.value.tag!);
    const jobs = [1, 2, 3, 4].map((i) => pool.run({ ms: 100, tag: `flood${i}` }, { key: 'flood' }).then(done));
    jobs.push(pool.run({ ms: 0, tag: 'ann' }, { key: 'ann' }).then(done));
    await Promise.all(jobs);
    // flood1 was already running; ann comes next, not after the three other flood jobs.
    expect(order).toEqual(['flood1', 'ann', 'flood2', 'flood3', 'flood4']);
  });

  it('keeps a worker free of a flooding account (maxRunningPerKey), so another account is served at once', async () => {
    const pool = makePool<SpinIn, SpinOut>({ ...spin, size: 2, maxRunningPerKey: 1 });
    await warm(pool, 2);
    const order: string[] = [];
    const done = (r: Awaited<ReturnType<typeof pool.run>>) => r.ok && order.push(r.value.tag!);
    const flood = [1, 2, 3].map((i) => pool.run({ ms: 400, tag: `flood${i}` }, { key: 'flood' }).then(done));
    expect(pool.statsOf('flood')).toEqual({ queued: 2, running: 1 });
    await pool.run({ ms: 0, tag: 'ann' }, { key: 'ann' }).then(done);
    // Without the per-account share flood2 would hold the second worker and ann would finish after flood1.
    expect(order).toEqual(['ann']);
    await Promise.all(flood);
  });

  it('refuses an account past its own queue cap while others still get in, and gives up on a job that waits too long', async () => {
    const pool = makePool<SpinIn, SpinOut>({ ...spin, size: 1, maxQueue: 10, maxQueuedPerKey: 2, queueTimeoutMs: 300 });
    expect((await pool.run({ ms: 0 })).ok).toBe(true);
    const running = pool.run({ ms: 1_000 }, { key: 'flood' });
    await new Promise((r) => setTimeout(r, 50)); // the first job is on the worker, not waiting
    const waiting = [pool.run({ ms: 0 }, { key: 'flood' }), pool.run({ ms: 0 }, { key: 'flood' })];
    expect(await pool.run({ ms: 0 }, { key: 'flood' })).toEqual({ ok: false, error: { kind: 'account-busy', queued: 2 } });
    const ann = pool.run({ ms: 0 }, { key: 'ann' });
    expect(pool.stats.queued).toBe(3);
    // All three wait behind the 1 s job and give up after 300 ms.
    for (const r of [...(await Promise.all(waiting)), await ann]) expect(r).toEqual({ ok: false, error: { kind: 'queue-timeout', ms: 300 } });
    expect(pool.stats.queued).toBe(0);
    expect((await running).ok).toBe(true);
  });

  it('runs background jobs only when no interactive job is waiting, and never on every worker', async () => {
    const pool = makePool<SpinIn, SpinOut>({ ...spin, size: 2, maxRunningBackground: 1 });
    await warm(pool, 2);
    const order: string[] = [];
    const done = (r: Awaited<ReturnType<typeof pool.run>>) => r.ok && order.push(r.value.tag!);
    const jobs = [
      pool.run({ ms: 200, tag: 'bg1' }, { key: 'ann', lane: 'background' }).then(done),
      pool.run({ ms: 200, tag: 'bg2' }, { key: 'bea', lane: 'background' }).then(done),
      pool.run({ ms: 50, tag: 'check' }, { key: 'cal' }).then(done),
    ];
    await Promise.all(jobs);
    // bg1 takes one worker; bg2 may not take the second (background share), so the check runs there first.
    expect(order).toEqual(['check', 'bg1', 'bg2']);
  });

  it('takes a waiting job out when its caller goes away, and does not count background jobs against an account', async () => {
    const pool = makePool<SpinIn, SpinOut>({ ...spin, size: 2, maxRunningPerKey: 1, maxRunningBackground: 1 });
    await warm(pool, 2);
    // ann's own figures are being worked out in the background; her check still gets the other worker.
    const summary = pool.run({ ms: 300, tag: 'summary' }, { key: 'ann', lane: 'background' });
    const check = pool.run({ ms: 300, tag: 'check' }, { key: 'ann' });
    expect(pool.statsOf('ann')).toEqual({ queued: 0, running: 2 });
    const gone = new AbortController();
    const abandoned = pool.run({ ms: 0, tag: 'abandoned' }, { key: 'ann', signal: gone.signal });
    expect(pool.stats.queued).toBe(1);
    gone.abort();
    expect(await abandoned).toEqual({ ok: false, error: { kind: 'cancelled' } });
    expect(pool.stats.queued).toBe(0);
    expect((await check).ok && (await summary).ok).toBe(true);
  });
});
