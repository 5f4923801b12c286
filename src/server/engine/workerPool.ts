// A small pool of worker threads, each running one job at a time, with a time cap per job.
// Why: route checks and planning are CPU-bound; run on the request thread, one dense design would stall
// every other request. A job that runs past the cap has its worker terminated (the only way to stop
// synchronous JS) and replaced by a fresh one, so the pool keeps its size.
// Fairness: jobs carry a key (the account); waiting jobs are served round-robin between keys (fairQueue.ts),
// one key may hold only so many jobs waiting and so many workers, and a job that waits too long gives up.
import { Worker } from 'node:worker_threads';
import { err, ok, type Result } from '@shared/result.ts';
import { FairQueue, type Lane } from './fairQueue.ts';

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
  /** Most interactive jobs one key may have waiting; one more is refused as `account-busy`. Default: maxQueue. */
  readonly maxQueuedPerKey?: number;
  /** Most workers one key's interactive jobs may hold at once (the rest stay free for others). Default: size. */
  readonly maxRunningPerKey?: number;
  /** Most workers background jobs may hold at once. Default: size. */
  readonly maxRunningBackground?: number;
  /** Longest a job may wait for a worker (ms); then it ends as `queue-timeout`. Default: no limit. */
  readonly queueTimeoutMs?: number;
}

/** Who a job is for and how urgent it is. */
export interface JobOptions {
  /** Fairness key, e.g. the account id ('' when there is none). */
  readonly key?: string;
  /** `background`: nobody waits for it (runs when no interactive job can). Default `interactive`. */
  readonly lane?: Lane;
  /** The request's signal: a job whose client went away is taken out of the queue (`cancelled`). */
  readonly signal?: AbortSignal;
}

/** Why a job gave no answer. `failed` means the worker threw (a broken invariant in the engine). */
export type PoolFailure =
  | { readonly kind: 'timeout'; readonly ms: number }
  | { readonly kind: 'busy'; readonly queued: number }
  /** This key already has `queued` jobs waiting (its cap): try again after one has run. */
  | { readonly kind: 'account-busy'; readonly queued: number }
  /** Waited `ms` for a worker without getting one. */
  | { readonly kind: 'queue-timeout'; readonly ms: number }
  /** The caller's signal aborted while the job waited (the client went away); the job never ran. */
  | { readonly kind: 'cancelled' }
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
  readonly key: string;
  readonly lane: Lane;
  readonly resolve: (r: Result<unknown, PoolFailure>) => void;
  waitTimer: NodeJS.Timeout | null;
  /** When a worker took it (ms, Date.now()), to charge its key the engine time it used. */
  startedAt: number;
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
  private readonly queue: FairQueue<Job>;
  private readonly maxRunningPerKey: number;
  private readonly maxRunningBackground: number;
  private nextId = 1;
  private replaced = 0;
  private closed = false;

  constructor(private readonly options: WorkerPoolOptions) {
    const { size, timeoutMs, maxQueue, maxQueuedPerKey = maxQueue, maxRunningPerKey = size, maxRunningBackground = size, queueTimeoutMs = Infinity } = options;
    if (!(size >= 1) || !(timeoutMs > 0) || !(maxQueue >= 0) || !(maxQueuedPerKey >= 1) || !(maxRunningPerKey >= 1) || !(maxRunningBackground >= 1) || !(queueTimeoutMs > 0)) {
      throw new Error(`server/engine/workerPool: bad options ${JSON.stringify({ ...options, file: String(options.file) })}`);
    }
    this.queue = new FairQueue<Job>({ maxQueued: maxQueue, maxQueuedPerKey });
    this.maxRunningPerKey = maxRunningPerKey;
    this.maxRunningBackground = maxRunningBackground;
  }

  /**
   * Runs one job; never rejects. Workers start on first use; a job waits while every worker is busy or loading,
   * or while its key already holds its share of workers.
   */
  run(input: TIn, { key = '', lane = 'interactive', signal }: JobOptions = {}): Promise<Result<TOut, PoolFailure>> {
    if (this.closed) return Promise.resolve(err({ kind: 'closed' }));
    if (signal?.aborted) return Promise.resolve(err({ kind: 'cancelled' }));
    return new Promise((resolve) => {
      const job: Job = { id: this.nextId++, input, key, lane, resolve: resolve as Job['resolve'], waitTimer: null, startedAt: 0 };
      const queued = this.queue.push(key, lane, job);
      if (!queued.ok) {
        resolve(err(queued.error.kind === 'full' ? { kind: 'busy', queued: queued.error.queued } : { kind: 'account-busy', queued: queued.error.queued }));
        return;
      }
      const waitMs = this.options.queueTimeoutMs;
      if (waitMs !== undefined && Number.isFinite(waitMs)) {
        // The wait is counted only while some worker is up: a cold start (workers still loading) is not waiting.
        const expire = () => {
          if (!this.slots.some((s) => s.ready)) {
            job.waitTimer = setTimeout(expire, waitMs).unref();
            return;
          }
          if (this.queue.remove(key, lane, job)) job.resolve(err({ kind: 'queue-timeout', ms: waitMs }));
        };
        job.waitTimer = setTimeout(expire, waitMs).unref();
      }
      signal?.addEventListener(
        'abort',
        () => {
          if (!this.queue.remove(key, lane, job)) return;
          if (job.waitTimer) clearTimeout(job.waitTimer);
          job.resolve(err({ kind: 'cancelled' }));
        },
        { once: true },
      );
      while (this.slots.length < this.options.size) this.slots.push(this.spawn());
      this.dispatch();
    });
  }

  get stats(): WorkerPoolStats {
    return { size: this.slots.length, busy: this.slots.filter((s) => s.job).length, queued: this.queue.size, replaced: this.replaced };
  }

  /** Jobs of `key` waiting (interactive) and running now. */
  statsOf(key: string): { readonly queued: number; readonly running: number } {
    return { queued: this.queue.waitingOf(key), running: this.slots.filter((s) => s.job?.key === key).length };
  }

  /** Refuses queued jobs and stops every worker. */
  async close(): Promise<void> {
    this.closed = true;
    for (const job of this.queue.drain()) {
      if (job.waitTimer) clearTimeout(job.waitTimer);
      job.resolve(err({ kind: 'closed' }));
    }
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

  /** Gives queued jobs to ready, idle workers (fair order, per-key and background shares); the time cap starts here. */
  private dispatch(): void {
    for (const slot of this.slots) {
      if (!slot.ready || slot.job) continue;
      const next = this.queue.take((key, lane) => this.mayRun(key, lane));
      if (!next) break;
      const job = next.job;
      if (job.waitTimer) clearTimeout(job.waitTimer);
      job.waitTimer = null;
      job.startedAt = Date.now();
      slot.job = job;
      slot.timer = setTimeout(() => this.replace(slot, { kind: 'timeout', ms: this.options.timeoutMs }), this.options.timeoutMs);
      slot.worker.postMessage({ id: job.id, input: job.input });
    }
    // Workers keep the process alive only while there is work (a job running or waiting for a loading worker);
    // an idle pool must not hold a script or test run open.
    const working = this.queue.size > 0 || this.slots.some((s) => s.job);
    for (const slot of this.slots) {
      if (working) slot.worker.ref();
      else slot.worker.unref();
    }
  }

  /** Interactive jobs: within the key's share of workers. Background jobs: within the background share. */
  private mayRun(key: string, lane: Lane): boolean {
    let running = 0;
    for (const s of this.slots) {
      if (s.job?.lane !== lane) continue;
      if (lane === 'background' || s.job.key === key) running += 1;
    }
    return running < (lane === 'interactive' ? this.maxRunningPerKey : this.maxRunningBackground);
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
    if (this.slots.length === 0) {
      for (const job of this.queue.drain()) {
        if (job.waitTimer) clearTimeout(job.waitTimer);
        job.resolve(err({ kind: 'failed', message }));
      }
    }
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
    if (slot.job) this.queue.charge(slot.job.key, Date.now() - slot.job.startedAt);
    if (slot.timer) clearTimeout(slot.timer);
    slot.timer = null;
    slot.job = null;
  }
}
