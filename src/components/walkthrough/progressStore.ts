import { EMPTY_QUEUE, readQueue, type ProgressQueue } from '@shared/walkthrough/progressQueue.ts';

// The device's walkthrough places, pending or taken by the server (shared/walkthrough/progressQueue.ts), in
// localStorage so they outlive a closed tab or a reload without a connection.
const KEY = 'threadway.progressQueue';

export function loadProgressQueue(): ProgressQueue {
  try {
    const raw = localStorage.getItem(KEY);
    return raw === null ? EMPTY_QUEUE : readQueue(JSON.parse(raw));
  } catch {
    return EMPTY_QUEUE;
  }
}

export function saveProgressQueue(queue: ProgressQueue): void {
  try {
    if (queue.entries.length === 0) localStorage.removeItem(KEY);
    else localStorage.setItem(KEY, JSON.stringify(queue));
  } catch {
    // Storage full or blocked (private mode): the place still goes to the server while online.
  }
}
