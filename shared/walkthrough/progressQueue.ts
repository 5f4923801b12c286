import { z } from 'zod';

/**
 * One student's place in one lesson as this device last knew it; `pending` while it has not reached the server
 * (PUT /api/lessons/:id/progress). `at` is when the student made the move (ISO instant, device clock); the server
 * ignores a save older than the one it holds, so sending an entry twice, or after a newer one, never moves the
 * student back. A place the server took stays (not pending): a page copy opened offline later may be older.
 */
export const queuedProgressSchema = z.object({
  lessonId: z.string().min(1).max(100),
  studentId: z.string().min(1).max(100),
  stepIndex: z.number().int().min(0).max(100_000),
  totalSteps: z.number().int().min(0).max(100_000),
  finished: z.boolean(),
  at: z.iso.datetime({ offset: true }),
  pending: z.boolean(),
});
export type QueuedProgress = z.infer<typeof queuedProgressSchema>;

/** What the device keeps (localStorage): at most one entry per lesson and student, the newest move. */
const KEEP_AT_MOST = 400;
export const progressQueueSchema = z.object({ version: z.literal(1), entries: z.array(queuedProgressSchema).max(500) });
export type ProgressQueue = z.infer<typeof progressQueueSchema>;

export const EMPTY_QUEUE: ProgressQueue = { version: 1, entries: [] };

const sameKey = (a: Pick<QueuedProgress, 'lessonId' | 'studentId'>, b: Pick<QueuedProgress, 'lessonId' | 'studentId'>) =>
  a.lessonId === b.lessonId && a.studentId === b.studentId;

/** Reads what storage held; anything unreadable counts as an empty queue (the server still has the last save). */
export function readQueue(raw: unknown): ProgressQueue {
  const parsed = progressQueueSchema.safeParse(raw);
  return parsed.success ? parsed.data : EMPTY_QUEUE;
}

/**
 * Keeps `entry` as the lesson's place to send, replacing an older one; an entry older than the one queued is
 * dropped (a late report from a slower tab). Progress is a place, not a log: the newest move is all the server needs.
 */
export function queueProgress(queue: ProgressQueue, move: Omit<QueuedProgress, 'pending'>): ProgressQueue {
  const current = queue.entries.find((e) => sameKey(e, move));
  if (current && Date.parse(current.at) > Date.parse(move.at)) return queue;
  const others = queue.entries.filter((e) => !sameKey(e, move));
  // Old places the server already holds go first when the list grows long; pending ones are never dropped.
  const excess = Math.max(0, others.length + 1 - KEEP_AT_MOST);
  const settled = others.filter((e) => !e.pending).slice(0, excess);
  return { version: 1, entries: [...others.filter((e) => !settled.includes(e)), { ...move, pending: true }] };
}

/** This device's last known place for the lesson and student, sent or not. */
export function findQueued(queue: ProgressQueue, lessonId: string, studentId: string): QueuedProgress | null {
  return queue.entries.find((e) => e.lessonId === lessonId && e.studentId === studentId) ?? null;
}

/** The place still to send, if any. */
export function findPending(queue: ProgressQueue, lessonId: string, studentId: string): QueuedProgress | null {
  const e = findQueued(queue, lessonId, studentId);
  return e?.pending ? e : null;
}

/** The server took `sent`: nothing left to send, unless a newer move was queued while it was on its way. */
export function acknowledgeProgress(queue: ProgressQueue, sent: QueuedProgress): ProgressQueue {
  return { version: 1, entries: queue.entries.map((e) => (sameKey(e, sent) && e.at === sent.at ? { ...e, pending: false } : e)) };
}

/** The instant to stamp a new move with: the clock, but always after the last stamp (two moves in one ms stay ordered). */
export function nextMoveInstant(lastAt: string | null, nowMs: number): string {
  const last = lastAt === null ? -Infinity : Date.parse(lastAt);
  return new Date(Math.max(nowMs, last + 1)).toISOString();
}

/**
 * Where to resume when the lesson opens: the queued place when it is newer than what the server (or the cached page)
 * says, else the server's. `server.clientAt` null means the server's save carries no instant: a queued move still
 * wins then, being unsent work of this device.
 */
export function choosePlace(
  server: { stepIndex: number; totalSteps: number; finished: boolean; clientAt: string | null } | null,
  queued: QueuedProgress | null,
): { stepIndex: number; totalSteps: number; finished: boolean; fromQueue: boolean } | null {
  const newer = queued && (server?.clientAt == null || Date.parse(queued.at) > Date.parse(server.clientAt));
  if (queued && newer) return { stepIndex: queued.stepIndex, totalSteps: queued.totalSteps, finished: queued.finished, fromQueue: true };
  return server ? { stepIndex: server.stepIndex, totalSteps: server.totalSteps, finished: server.finished, fromQueue: false } : null;
}
