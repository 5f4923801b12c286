// Queries on `lesson_progress`: one row per student and lesson (the walkthrough step, finished_at, last activity).
import type { Kysely, Transaction } from 'kysely';
import type { Database } from '@db/schema.ts';

type Db = Kysely<Database> | Transaction<Database>;

export async function findProgress(db: Db, lessonId: string, studentId: string) {
  return db.selectFrom('lesson_progress').selectAll().where('lesson_id', '=', lessonId).where('student_id', '=', studentId).executeTakeFirst();
}

/**
 * Upserts the student's place. `finished: true` stamps finished_at once (an earlier stamp stays); `false` clears it.
 * With `clientAt` (when the student made the move, by the device's clock) a save older than the stored one changes
 * nothing, and one at the same instant writes the same values again: re-sent saves are idempotent and late ones
 * never move the student back. Saves without `clientAt` always apply (and clear the stored instant).
 */
export async function upsertProgress(
  db: Db,
  v: { lessonId: string; studentId: string; stepIndex: number; totalSteps: number; finished: boolean; clientAt: Date | null; now: Date },
): Promise<void> {
  await db
    .insertInto('lesson_progress')
    .values({ lesson_id: v.lessonId, student_id: v.studentId, step_index: v.stepIndex, total_steps: v.totalSteps, finished_at: v.finished ? v.now : null, last_active_at: v.now, client_at: v.clientAt })
    .onConflict((oc) =>
      oc
        .columns(['lesson_id', 'student_id'])
        .doUpdateSet((eb) => ({
          step_index: v.stepIndex,
          total_steps: v.totalSteps,
          last_active_at: v.now,
          client_at: v.clientAt,
          finished_at: v.finished ? eb.fn.coalesce('lesson_progress.finished_at', eb.val(v.now)) : null,
        }))
        .where((eb) => (v.clientAt === null ? eb.val(true) : eb.or([eb('lesson_progress.client_at', 'is', null), eb('lesson_progress.client_at', '<=', v.clientAt)]))),
    )
    .execute();
}
