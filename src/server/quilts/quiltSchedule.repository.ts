// Queries behind a quilt's schedule: its class and monthly start, the class's dated lessons, and lesson progress.
import { sql, type Kysely, type Transaction } from 'kysely';
import type { Database } from '@db/schema.ts';

type Db = Kysely<Database> | Transaction<Database>;

/** The owner's live quilt's map and schedule settings; dates as `YYYY-MM-DD` (the made-on day in UTC). */
export async function findQuiltScheduleRow(db: Db, ownerId: string, id: string) {
  return db
    .selectFrom('quilt')
    .select([
      'id',
      'data',
      'class_id',
      sql<string | null>`to_char(schedule_start, 'YYYY-MM-DD')`.as('start'),
      sql<string>`to_char(created_at at time zone 'UTC', 'YYYY-MM-DD')`.as('made_on'),
    ])
    .where('id', '=', id)
    .where('owner_id', '=', ownerId)
    .where('deleted_at', 'is', null)
    .executeTakeFirst();
}

export async function updateQuiltSchedule(db: Db, ownerId: string, id: string, v: { classId: string | null; start: string | null }): Promise<boolean> {
  const r = await db
    .updateTable('quilt')
    .set({ class_id: v.classId, schedule_start: v.start })
    .where('id', '=', id)
    .where('owner_id', '=', ownerId)
    .where('deleted_at', 'is', null)
    .executeTakeFirst();
  return r.numUpdatedRows > 0n;
}

/** A class's lessons in date order: the day each is released (UTC), its title, and whether that moment has passed. */
export async function listLessonDays(db: Db, classId: string) {
  return db
    .selectFrom('lesson')
    .select(['id', 'title', sql<string>`to_char(release_at at time zone 'UTC', 'YYYY-MM-DD')`.as('day'), sql<boolean>`release_at <= now()`.as('released')])
    .where('class_id', '=', classId)
    .orderBy('release_at')
    .orderBy('created_at')
    .execute();
}

/** The lessons (of those given) the student has finished. */
export async function finishedLessonIds(db: Db, studentId: string, lessonIds: readonly string[]): Promise<Set<string>> {
  if (lessonIds.length === 0) return new Set();
  const rows = await db.selectFrom('lesson_progress').select('lesson_id').where('student_id', '=', studentId).where('lesson_id', 'in', [...lessonIds]).where('finished_at', 'is not', null).execute();
  return new Set(rows.map((r) => r.lesson_id));
}

/** How many students have finished each lesson (lessons nobody finished are absent). */
export async function finishedCounts(db: Db, lessonIds: readonly string[]): Promise<Map<string, number>> {
  if (lessonIds.length === 0) return new Map();
  const rows = await db
    .selectFrom('lesson_progress')
    .select(['lesson_id', (eb) => eb.fn.countAll<string>().as('n')])
    .where('lesson_id', 'in', [...lessonIds])
    .where('finished_at', 'is not', null)
    .groupBy('lesson_id')
    .execute();
  return new Map(rows.map((r) => [r.lesson_id, Number(r.n)]));
}

/**
 * Ties a quilt that has no schedule yet (no class, no start) to a class; a schedule the owner chose is left alone.
 * For the demo seed, which runs on every start. Returns whether the quilt changed.
 */
export async function tieUnscheduledQuiltToClass(db: Db, ownerId: string, id: string, classId: string): Promise<boolean> {
  const r = await db
    .updateTable('quilt')
    .set({ class_id: classId })
    .where('id', '=', id)
    .where('owner_id', '=', ownerId)
    .where('class_id', 'is', null)
    .where('schedule_start', 'is', null)
    .where('deleted_at', 'is', null)
    .executeTakeFirst();
  return r.numUpdatedRows > 0n;
}
