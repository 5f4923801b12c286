// A small pool of worker threads, each running one job at a time, with a time cap per job.
// Why: route checks and planning are CPU-bound; run on the request thread, one dense design would stall
// every other request. A job that runs past the cap has its worker terminated (the only way to stop
// synchronous JS) and replaced by a fresh one, so the pool keeps its size.
import { Worker } from 'node:worker_threads';
import { err, ok, type Result } from '../../../shared/result.ts';

export interface WorkerPoolOptions {
  /** The worker's entry file (an ES module that answers `{ id, input }` with `{ id, ok, value | error }`). */
  readonly file: string | URL;
  /** Passed to every worker as `workerData`. */
  readonly workerData?: unknown;
  /** Number of worker threads (≥ 1). */
  readonly size: number;
  /** Time cap per job in ms, counted from when a worker takes the job (queue time not included). */
  readonly timeoutMs: number;
  /** Most jobs waiting for a worker (busy or still loading); one more is refused as `busy`. */
  readonly maxQueue: number;
}

/** Why a job gave no answer. `failed` means the worker threw (a broken invariant in the engine). */
export type PoolFailure =
  | { readonly kind: 'timeout'; readonly ms: number }
  | { readonly kind: 'busy'; readonly queued: number }
  | { readonly kind: 'failed'; readonly message: string }
  | { readonly kind: 'closed' };

/** What a worker posts: `ready` once it has loaded and listens, then one reply per job. */
export type WorkerReply =
  | { readonly ready: true }
  | { readonly id: number; readonly ok: true; readonly value: unknown }
  | { readonly id: number; readonly ok: false; readonly error: string };

interface Job {
  readonly id: number;
  readonly input: unknown;
  readonly resolve: (r: Result<unknown, PoolFailure>) => void;
}

interface Slot {
  worker: Worker;
  /** False until the worker has loaded (a cold start must not eat into a job's time cap). */
  ready: boolean;
  job: Job | null;
  timer: NodeJS.Timeout | null;
}

export interface WorkerPoolStats {
  readonly size: number;
  readonly busy: number;
  readonly queued: number;
  /** Workers terminated (time cap) or lost (crash) and replaced since the pool started. */
  readonly replaced: number;
}

export class WorkerPool<TIn, TOut> {
  private readonly slots: Slot[] = [];
  private readonly queue: Job[] = [];
  private nextId = 1;
  private replaced = 0;
  private closed = false;

  constructor(private readonly options: WorkerPoolOptions) {
    if (!(options.size >= 1) || !(options.timeoutMs > 0) || !(options.maxQueue >= 0)) {
      throw new Error(`server/engine/workerPool: bad options ${JSON.stringify({ ...options, file: String(options.file) })}`);
    }
  }

  /** Runs one job; never rejects. Workers start on first use; a job waits while every worker is busy or loading. */
  run(input: TIn): Promise<Result<TOut, PoolFailure>> {
    if (this.closed) return Promise.resolve(err({ kind: 'closed' }));
    if (this.queue.length >= this.options.maxQueue) return Promise.resolve(err({ kind: 'busy', queued: this.queue.length }));
    while (this.slots.length < this.options.size) this.slots.push(this.spawn());
    return new Promise((resolve) => {
      this.queue.push({ id: this.nextId++, input, resolve: resolve as Job['resolve'] });
      this.dispatch();
    });
  }

  get stats(): WorkerPoolStats {
    return { size: this.slots.length, busy: this.slots.filter((s) => s.job).length, queued: this.queue.length, replaced: this.replaced };
  }

  /** Refuses queued jobs and stops every worker. */
  async close(): Promise<void> {
    this.closed = true;
    for (const job of this.queue.splice(0)) job.resolve(err({ kind: 'closed' }));
    await Promise.all(
      this.slots.splice(0).map((slot) => {
        if (slot.timer) clearTimeout(slot.timer);
        slot.job?.resolve(err({ kind: 'closed' }));
        slot.job = null;
        return slot.worker.terminate();
      }),
    );
  }

  private spawn(): Slot {
    const worker = new Worker(this.options.file, { workerData: this.options.workerData });
    const slot: Slot = { worker, ready: false, job: null, timer: null };
    worker.on('message', (reply: WorkerReply) => this.receive(slot, reply));
    worker.on('error', (error) => this.lose(slot, error.message));
    worker.on('exit', (code) => {
      if (slot.worker === worker && !this.closed) this.lose(slot, `engine worker exited (code ${code})`);
    });
    return slot;
  }

  private receive(slot: Slot, reply: WorkerReply): void {
    if ('ready' in reply) {
      slot.ready = true;
      this.dispatch();
      return;
    }
    const job = slot.job;
    if (!job || job.id !== reply.id) return;
    this.release(slot);
    job.resolve(reply.ok ? ok(reply.value) : err({ kind: 'failed', message: reply.error }));
    this.dispatch();
  }

  /** Gives queued jobs to ready, idle workers; the time cap starts here. */
  private dispatch(): void {
    for (const slot of this.slots) {
      if (!slot.ready || slot.job) continue;
      const job = this.queue.shift();
      if (!job) break;
      slot.job = job;
      slot.timer = setTimeout(() => this.replace(slot, { kind: 'timeout', ms: this.options.timeoutMs }), this.options.timeoutMs);
      slot.worker.postMessage({ id: job.id, input: job.input });
    }
    // Workers keep the process alive only while there is work (a job running or waiting for a loading worker);
    // an idle pool must not hold a script or test run open.
    const working = this.queue.length > 0 || this.slots.some((s) => s.job);
    for (const slot of this.slots) {
      if (working) slot.worker.ref();
      else slot.worker.unref();
    }
  }

  /**
   * A worker died. If it had loaded, it is replaced like a timed-out one. If it never loaded, the worker file
   * itself is broken: respawning would only fail again, so waiting jobs fail and the slot is dropped (the next
   * run() tries a fresh worker).
   */
  private lose(slot: Slot, message: string): void {
    if (this.closed || !this.slots.includes(slot)) return;
    if (slot.ready) {
      this.replace(slot, { kind: 'failed', message });
      return;
    }
    this.slots.splice(this.slots.indexOf(slot), 1);
    if (this.slots.length === 0) for (const job of this.queue.splice(0)) job.resolve(err({ kind: 'failed', message }));
    this.dispatch();
  }

  /** Ends the slot's job with `failure`, terminates its worker and puts a fresh one in its place. */
  private replace(slot: Slot, failure: PoolFailure): void {
    if (this.closed || !this.slots.includes(slot)) return;
    const job = slot.job;
    this.release(slot);
    const old = slot.worker;
    this.slots[this.slots.indexOf(slot)] = this.spawn();
    this.replaced += 1;
    void old.terminate();
    job?.resolve(err(failure));
    this.dispatch();
  }

  private release(slot: Slot): void {
    if (slot.timer) clearTimeout(slot.timer);
    slot.timer = null;
    slot.job = null;
  }
}
