import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  acknowledgeProgress, choosePlace, EMPTY_QUEUE, findPending, findQueued, nextMoveInstant, queueProgress, readQueue,
  type ProgressQueue, type QueuedProgress,
} from './progressQueue.ts';

const move = (stepIndex: number, at: string, over: Partial<QueuedProgress> = {}): QueuedProgress =>
  ({ lessonId: 'L1', studentId: 'S1', stepIndex, totalSteps: 20, finished: false, at, pending: true, ...over });

describe('the offline progress queue', () => {
  it('keeps the newest move per lesson and student, and only drops what the server took', () => {
    let q = queueProgress(EMPTY_QUEUE, move(3, '2027-01-05T10:00:00.000Z'));
    q = queueProgress(q, move(4, '2027-01-05T10:00:01.000Z'));
    q = queueProgress(q, move(2, '2027-01-05T09:59:59.000Z')); // a late report from a slower tab: ignored
    q = queueProgress(q, move(7, '2027-01-05T10:00:00.000Z', { lessonId: 'L2' }));
    expect(findQueued(q, 'L1', 'S1')?.stepIndex).toBe(4);
    expect(q.entries).toHaveLength(2);
    const sent = findQueued(q, 'L1', 'S1')!;
    const newer = queueProgress(q, move(5, '2027-01-05T10:00:02.000Z')); // moved on while the save was out
    expect(findPending(acknowledgeProgress(newer, sent), 'L1', 'S1')?.stepIndex).toBe(5);
    // Taken: nothing left to send, but the device still knows the place (a stale page copy must not win later).
    expect(findPending(acknowledgeProgress(q, sent), 'L1', 'S1')).toBeNull();
    expect(findQueued(acknowledgeProgress(q, sent), 'L1', 'S1')).toMatchObject({ stepIndex: 4, pending: false });
  });

  it('keeps at most 400 places, dropping the oldest ones already sent, never a pending one', () => {
    let q: ProgressQueue = EMPTY_QUEUE;
    for (let i = 0; i < 450; i++) {
      const m = move(1, new Date(Date.UTC(2027, 0, 5, 10, 0, i)).toISOString(), { lessonId: `L${i}` });
      q = queueProgress(q, m);
      if (i % 2 === 0) q = acknowledgeProgress(q, findQueued(q, `L${i}`, 'S1')!);
    }
    expect(q.entries.length).toBeLessThanOrEqual(400);
    for (let i = 1; i < 450; i += 2) expect(findPending(q, `L${i}`, 'S1')).not.toBeNull();
  });

  it('stamps moves in order even within one millisecond or with a clock set back', () => {
    const a = nextMoveInstant(null, Date.parse('2027-01-05T10:00:00.000Z'));
    const b = nextMoveInstant(a, Date.parse('2027-01-05T10:00:00.000Z'));
    const c = nextMoveInstant(b, Date.parse('2027-01-05T09:00:00.000Z'));
    expect([a, b, c]).toEqual(['2027-01-05T10:00:00.000Z', '2027-01-05T10:00:00.001Z', '2027-01-05T10:00:00.002Z']);
  });

  it('resumes from the queued place when it is newer than the server’s', () => {
    const server = { stepIndex: 2, totalSteps: 20, finished: false, clientAt: '2027-01-05T10:00:00.000Z' };
    expect(choosePlace(server, move(6, '2027-01-05T10:05:00.000Z'))).toMatchObject({ stepIndex: 6, fromQueue: true });
    // A place the server already took still beats an older copy of the page (opened offline from the worker's cache).
    expect(choosePlace(server, move(8, '2027-01-05T10:05:00.000Z', { pending: false }))).toMatchObject({ stepIndex: 8 });
    expect(choosePlace(server, move(6, '2027-01-05T09:05:00.000Z'))).toMatchObject({ stepIndex: 2, fromQueue: false });
    expect(choosePlace(null, null)).toBeNull();
  });

  it('reads anything unreadable in storage as an empty queue', () => {
    expect(readQueue('garbage')).toEqual(EMPTY_QUEUE);
    expect(readQueue({ version: 1, entries: [{ lessonId: 'L1' }] })).toEqual(EMPTY_QUEUE);
    const q = queueProgress(EMPTY_QUEUE, move(1, '2027-01-05T10:00:00.000Z'));
    expect(readQueue(JSON.parse(JSON.stringify(q)))).toEqual(q);
  });
});

/** The server's rule (src/server/classes/progress.repository.ts upsertProgress): a save older than the stored one is ignored. */
interface FakeServer { stepIndex: number; clientAt: string | null; writes: number }
function serverSave(s: FakeServer, e: QueuedProgress): void {
  if (s.clientAt !== null && Date.parse(s.clientAt) > Date.parse(e.at)) return;
  s.stepIndex = e.stepIndex;
  s.clientAt = e.at;
  s.writes += 1;
}

type Event =
  | { kind: 'move'; step: number }
  | { kind: 'send'; outcome: 'ok' | 'lost-before' | 'lost-after' }
  | { kind: 'stale-arrives' };

const eventArb: fc.Arbitrary<Event> = fc.oneof(
  fc.integer({ min: 0, max: 19 }).map((step): Event => ({ kind: 'move', step })),
  fc.constantFrom<Event>({ kind: 'send', outcome: 'ok' }, { kind: 'send', outcome: 'lost-before' }, { kind: 'send', outcome: 'lost-after' }),
  fc.constant<Event>({ kind: 'stale-arrives' }),
);

describe('the offline progress queue against a server that ignores older saves (random sessions)', () => {
  it('ends with the server at the last move, never moving the student back on the way, whatever is lost or re-sent', () => {
    fc.assert(
      fc.property(fc.array(eventArb, { maxLength: 80 }), fc.integer({ min: 0, max: 1e6 }), (events, clock0) => {
        const server: FakeServer = { stepIndex: 0, clientAt: null, writes: 0 };
        let queue: ProgressQueue = EMPTY_QUEUE;
        let now = Date.parse('2027-01-05T10:00:00.000Z') + clock0;
        let last: string | null = null;
        let lastStep: number | null = null;
        const sentBefore: QueuedProgress[] = [];
        for (const e of events) {
          now += 250;
          const before = server.clientAt;
          if (e.kind === 'move') {
            last = nextMoveInstant(last, now);
            lastStep = e.step;
            queue = queueProgress(queue, move(e.step, last));
          } else if (e.kind === 'send') {
            const entry = findPending(queue, 'L1', 'S1');
            if (!entry) continue;
            sentBefore.push(entry);
            if (e.outcome !== 'lost-before') serverSave(server, entry);
            if (e.outcome === 'ok') queue = acknowledgeProgress(queue, entry);
          } else if (sentBefore.length > 0) {
            // A request sent long ago, retried by the network, reaches the server late.
            serverSave(server, sentBefore[0]!);
          }
          if (before !== null) expect(Date.parse(server.clientAt!)).toBeGreaterThanOrEqual(Date.parse(before));
        }
        // Back online: send until the queue is empty.
        for (let entry = findPending(queue, 'L1', 'S1'); entry; entry = findPending(queue, 'L1', 'S1')) {
          serverSave(server, entry);
          queue = acknowledgeProgress(queue, entry);
        }
        if (lastStep !== null) {
          expect(server.stepIndex).toBe(lastStep);
          expect(server.clientAt).toBe(last);
        }
      }),
      { numRuns: 1000 },
    );
  });
});
