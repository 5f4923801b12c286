// The app instance's handle on the job queue: opened on first use (a page that never plans a quilt never starts
// pg-boss) and shared by every request of this process. It only sends jobs and reads their state; planning workers
// (planWorker.ts) do the work.
import { DATABASE_URL } from 'astro:env/server';
import type PgBoss from 'pg-boss';
import { openPlanQueue } from './planQueue.ts';

let opening: Promise<PgBoss> | undefined;

export function appPlanQueue(): Promise<PgBoss> {
  opening ??= openPlanQueue(DATABASE_URL, { role: 'app' }).catch((error: unknown) => {
    // Not opened (the database was away): the next request tries again rather than failing for ever.
    opening = undefined;
    throw error;
  });
  return opening;
}
