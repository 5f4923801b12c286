// The worker pool's waiting room: one queue per account, the account with the least engine time used lately first,
// then in fair turns (round-robin), so an account that sends a
// hundred plans waits behind its own jobs, not in front of everyone else's. Two lanes: `interactive` (a
// person waits for the answer: checks, plans) before `background` (figures for the designs table).
// Pure bookkeeping, no timers or workers: workerPool.ts decides when to take a job and where it runs.
import { err, ok, type Result } from '@shared/result.ts';

export type Lane = 'interactive' | 'background';

export interface FairQueueLimits {
  /** Most jobs waiting in all (both lanes). */
  readonly maxQueued: number;
  /** Most interactive jobs one key (account) may have waiting; background jobs are bounded by `maxQueued` only. */
  readonly maxQueuedPerKey: number;
}

export type QueueRefusal = { readonly kind: 'full'; readonly queued: number } | { readonly kind: 'key-full'; readonly queued: number };

/**
 * One lane: a FIFO per key, served in "turns" (start-time fair queueing). A job's turn is one after its key's
 * previous job, but never earlier than the turn being served now, so a key that queued ten jobs holds turns
 * n+1…n+10 while a key arriving later gets turn n+1 and goes next. Keys are remembered only while they hold
 * turns at or after the current one, so the bookkeeping stays as small as the set of busy accounts.
 */
class TurnLane<J> {
  private readonly queues = new Map<string, { turn: number; seq: number; job: J }[]>();
  private readonly lastTurn = new Map<string, number>();
  private current = 0;
  private seq = 0;

  push(key: string, job: J): void {
    const turn = Math.max(this.current, (this.lastTurn.get(key) ?? 0) + 1);
    this.lastTurn.set(key, turn);
    const entry = { turn, seq: this.seq++, job };
    const q = this.queues.get(key);
    if (q) q.push(entry);
    else this.queues.set(key, [entry]);
  }

  /**
   * The job of the key with the least engine time used lately (`usage`), then the earliest turn, then the
   * earliest arrival, among keys `canRun` allows.
   */
  take(canRun: (key: string) => boolean, usage: (key: string) => number): { key: string; job: J } | undefined {
    let best: { key: string; used: number; turn: number; seq: number } | undefined;
    for (const [key, q] of this.queues) {
      const head = q[0]!;
      const used = usage(key);
      if (best && (used > best.used || (used === best.used && (head.turn > best.turn || (head.turn === best.turn && head.seq > best.seq))))) continue;
      if (!canRun(key)) continue;
      best = { key, used, turn: head.turn, seq: head.seq };
    }
    if (!best) return undefined;
    const q = this.queues.get(best.key)!;
    const { job } = q.shift()!;
    if (q.length === 0) this.queues.delete(best.key);
    this.current = Math.max(this.current, best.turn);
    for (const [key, turn] of this.lastTurn) if (turn < this.current && !this.queues.has(key)) this.lastTurn.delete(key);
    return { key: best.key, job };
  }

  remove(key: string, job: J): boolean {
    const q = this.queues.get(key);
    const at = q ? q.findIndex((e) => e.job === job) : -1;
    if (!q || at < 0) return false;
    q.splice(at, 1);
    if (q.length === 0) this.queues.delete(key);
    return true;
  }

  countOf(key: string): number {
    return this.queues.get(key)?.length ?? 0;
  }

  drain(): J[] {
    const all = [...this.queues.values()].flat().map((e) => e.job);
    this.queues.clear();
    this.lastTurn.clear();
    return all;
  }
}

/** Engine time used lately counts half after this long (ms): an account that flooded a minute ago is forgiven. */
export const USAGE_HALF_LIFE_MS = 20_000;

export class FairQueue<J> {
  private readonly lanes = { interactive: new TurnLane<J>(), background: new TurnLane<J>() };
  /** Engine time each key used (ms, decaying), as of `at`. */
  private readonly used = new Map<string, { ms: number; at: number }>();
  private count = 0;

  constructor(private readonly limits: FairQueueLimits) {
    if (!(limits.maxQueued >= 0) || !(limits.maxQueuedPerKey >= 1)) throw new Error(`server/engine/fairQueue: bad limits ${JSON.stringify(limits)}`);
  }

  get size(): number {
    return this.count;
  }

  /** Interactive jobs `key` has waiting. */
  waitingOf(key: string): number {
    return this.lanes.interactive.countOf(key);
  }

  push(key: string, lane: Lane, job: J): Result<void, QueueRefusal> {
    if (this.count >= this.limits.maxQueued) return err({ kind: 'full', queued: this.count });
    if (lane === 'interactive' && this.waitingOf(key) >= this.limits.maxQueuedPerKey) return err({ kind: 'key-full', queued: this.waitingOf(key) });
    this.lanes[lane].push(key, job);
    this.count += 1;
    return ok(undefined);
  }

  /**
   * The next job to run: interactive before background; within a lane, round-robin over keys.
   * `canRun(key, lane)` lets the pool hold back a key (it already runs its share) or a lane.
   */
  take(canRun: (key: string, lane: Lane) => boolean, now = Date.now()): { job: J; key: string; lane: Lane } | undefined {
    for (const lane of ['interactive', 'background'] as const) {
      const next = this.lanes[lane].take(
        (key) => canRun(key, lane),
        (key) => this.usageOf(key, now),
      );
      if (next) {
        this.count -= 1;
        return { ...next, lane };
      }
    }
    return undefined;
  }

  /**
   * Records `ms` of engine time used by `key` (a finished job). Turns count jobs, but a plan can cost a hundred
   * checks: keys that used less engine time lately go first, so a flood of slow jobs gets its share by time.
   */
  charge(key: string, ms: number, now = Date.now()): void {
    this.used.set(key, { ms: this.usageOf(key, now) + Math.max(0, ms), at: now });
    if (this.used.size > 1_000) for (const [k] of this.used) if (this.usageOf(k, now) < 1) this.used.delete(k);
  }

  /** Engine time `key` used lately (ms, halved every USAGE_HALF_LIFE_MS). */
  usageOf(key: string, now = Date.now()): number {
    const u = this.used.get(key);
    return u ? u.ms * 0.5 ** (Math.max(0, now - u.at) / USAGE_HALF_LIFE_MS) : 0;
  }

  /** Takes a waiting job out (its wait ran out); false when it is no longer waiting. */
  remove(key: string, lane: Lane, job: J): boolean {
    const removed = this.lanes[lane].remove(key, job);
    if (removed) this.count -= 1;
    return removed;
  }

  /** Every waiting job, emptying the queue. */
  drain(): J[] {
    const all = [...this.lanes.interactive.drain(), ...this.lanes.background.drain()];
    this.count = 0;
    return all;
  }
}
