import { describe, expect, it } from 'vitest';
import { FairQueue, type Lane } from './fairQueue.ts';

const all = () => true;
function drainOrder(q: FairQueue<string>, canRun: (key: string, lane: Lane) => boolean = all): string[] {
  const out: string[] = [];
  for (let next = q.take(canRun); next; next = q.take(canRun)) out.push(next.job);
  return out;
}

describe('FairQueue', () => {
  it('serves accounts round-robin: a flood from one account does not push the others back', () => {
    const q = new FairQueue<string>({ maxQueued: 100, maxQueuedPerKey: 10 });
    for (let i = 1; i <= 5; i++) q.push('flood', 'interactive', `flood${i}`);
    q.push('ann', 'interactive', 'ann1');
    q.push('bea', 'interactive', 'bea1');
    q.push('ann', 'interactive', 'ann2');
    expect(drainOrder(q)).toEqual(['flood1', 'ann1', 'bea1', 'flood2', 'ann2', 'flood3', 'flood4', 'flood5']);
    expect(q.size).toBe(0);
  });

  it('caps waiting jobs per account and in all, and refuses with the count', () => {
    const q = new FairQueue<string>({ maxQueued: 4, maxQueuedPerKey: 2 });
    expect(q.push('flood', 'interactive', 'a').ok).toBe(true);
    expect(q.push('flood', 'interactive', 'b').ok).toBe(true);
    expect(q.push('flood', 'interactive', 'c')).toEqual({ ok: false, error: { kind: 'key-full', queued: 2 } });
    expect(q.push('ann', 'interactive', 'd').ok).toBe(true);
    expect(q.push('flood', 'background', 'e').ok).toBe(true); // background jobs count only against the total
    expect(q.push('bea', 'interactive', 'f')).toEqual({ ok: false, error: { kind: 'full', queued: 4 } });
    expect(q.waitingOf('flood')).toBe(2);
  });

  it('runs interactive jobs before background ones, and skips keys the pool holds back', () => {
    const q = new FairQueue<string>({ maxQueued: 10, maxQueuedPerKey: 10 });
    q.push('ann', 'background', 'ann-summary');
    q.push('flood', 'interactive', 'flood1');
    q.push('flood', 'interactive', 'flood2');
    q.push('bea', 'interactive', 'bea1');
    // 'flood' already runs its share: its jobs wait, the others go first.
    expect(drainOrder(q, (key) => key !== 'flood')).toEqual(['bea1', 'ann-summary']);
    expect(drainOrder(q)).toEqual(['flood1', 'flood2']);
  });

  it('takes out a job whose wait ran out, and drains the rest', () => {
    const q = new FairQueue<string>({ maxQueued: 10, maxQueuedPerKey: 10 });
    q.push('ann', 'interactive', 'a');
    q.push('ann', 'interactive', 'b');
    q.push('bea', 'background', 'c');
    expect(q.remove('ann', 'interactive', 'a')).toBe(true);
    expect(q.remove('ann', 'interactive', 'a')).toBe(false);
    expect(q.size).toBe(2);
    expect(q.drain().sort()).toEqual(['b', 'c']);
    expect(q.size).toBe(0);
    expect(q.take(all)).toBeUndefined();
  });

  it('serves the account that used the least engine time lately first; the use halves every 20 s', () => {
    const q = new FairQueue<string>({ maxQueued: 10, maxQueuedPerKey: 10 });
    q.charge('flood', 2_000, 0); // two seconds of plans just finished
    q.charge('ann', 30, 0); // three quick checks
    q.push('flood', 'interactive', 'flood-plan');
    q.push('ann', 'interactive', 'ann-check');
    q.push('bea', 'interactive', 'bea-check'); // nothing used yet
    expect(drainOrderAt(q, 0)).toEqual(['bea-check', 'ann-check', 'flood-plan']);
    expect(q.usageOf('flood', 20_000)).toBeCloseTo(1_000, 9);
    expect(q.usageOf('flood', 40_000)).toBeCloseTo(500, 9);
    // Forgiven over time, but the order still follows use: 2 s of plans a minute ago still outweighs 30 ms now.
    q.push('flood', 'interactive', 'flood-plan-2');
    q.push('ann', 'interactive', 'ann-check-2');
    expect(drainOrderAt(q, 60_000)).toEqual(['ann-check-2', 'flood-plan-2']);
  });
});

function drainOrderAt(q: FairQueue<string>, now: number): string[] {
  const out: string[] = [];
  for (let next = q.take(all, now); next; next = q.take(all, now)) out.push(next.job);
  return out;
}
