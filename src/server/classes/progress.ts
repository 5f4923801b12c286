// Walkthrough progress per student and lesson: the step the student is on, how many steps the walkthrough has,
// whether the lesson is finished, and when they were last active. Saved by the walkthrough island.
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import { findProgress, upsertProgress } from './progress.repository.ts';

export interface ProgressJson {
  lessonId: string;
  stepIndex: number;
  totalSteps: number;
  finished: boolean;
  finishedAt: string | null;
  lastActiveAt: string | null;
  /** When the student made the saved move (device clock, as sent); null before the first save or when none was sent. */
  clientAt: string | null;
}

export async function readProgress(db: Kysely<Database>, lessonId: string, studentId: string): Promise<ProgressJson> {
  const row = await findProgress(db, lessonId, studentId);
  if (!row) return { lessonId, stepIndex: 0, totalSteps: 0, finished: false, finishedAt: null, lastActiveAt: null, clientAt: null };
  return {
    lessonId,
    stepIndex: row.step_index,
    totalSteps: row.total_steps,
    finished: row.finished_at !== null,
    finishedAt: row.finished_at?.toISOString() ?? null,
    lastActiveAt: row.last_active_at.toISOString(),
    clientAt: row.client_at?.toISOString() ?? null,
  };
}

/**
 * Upserts the student's place. `finished: true` stamps finished_at once; `false` clears it (lesson re-opened). A save
 * carrying `at` older than the stored one is ignored (see upsertProgress); the answer is always what is stored.
 */
export async function saveProgress(
  db: Kysely<Database>,
  lessonId: string,
  studentId: string,
  p: { stepIndex: number; totalSteps: number; finished: boolean; at?: string | undefined },
  now = new Date(),
): Promise<ProgressJson> {
  const clientAt = p.at === undefined ? null : new Date(p.at);
  await upsertProgress(db, { lessonId, studentId, stepIndex: p.stepIndex, totalSteps: p.totalSteps, finished: p.finished, clientAt, now });
  return readProgress(db, lessonId, studentId);
}
