// Queries behind the teacher's roster (roster.ts): the class's students with their finished lessons and photos,
// and each student's most recent progress row.
import { sql, type Kysely, type Transaction } from 'kysely';
import type { Database } from '@db/schema.ts';

type Db = Kysely<Database> | Transaction<Database>;

/** Lessons students can open now (the database clock decides, as for access: release_at <= now()). */
export async function countReleasedLessons(db: Db, classId: string): Promise<number> {
  const row = await db
    .selectFrom('lesson')
    .select((eb) => eb.fn.countAll<number>().as('n'))
    .where('class_id', '=', classId)
    .where('release_at', '<=', sql<Date>`now()`)
    .executeTakeFirstOrThrow();
  return Number(row.n);
}

/** Enrolled students by name, with how many of the class's released lessons each finished and how many photos each uploaded. */
export async function listEnrolledStudents(db: Db, classId: string) {
  return db
    .selectFrom('enrollment as e')
    .innerJoin('account as a', 'a.id', 'e.student_id')
    .select(['a.id', 'a.display_name', 'a.email', 'e.joined_at', 'e.joined_via'])
    .select((eb) => [
      eb
        .selectFrom('lesson_progress as p')
        .innerJoin('lesson as l', 'l.id', 'p.lesson_id')
        .select(eb.fn.countAll<number>().as('n'))
        .whereRef('p.student_id', '=', 'a.id')
        .where('l.class_id', '=', classId)
        .where('p.finished_at', 'is not', null)
        .where('l.release_at', '<=', sql<Date>`now()`)
        .as('finished'),
      eb
        .selectFrom('lesson_photo as ph')
        .innerJoin('lesson as l', 'l.id', 'ph.lesson_id')
        .select(eb.fn.countAll<number>().as('n'))
        .whereRef('ph.student_id', '=', 'a.id')
        .where('l.class_id', '=', classId)
        .as('photos'),
    ])
    .where('e.class_id', '=', classId)
    .orderBy('a.display_name')
    .execute();
}

/** Per student, the progress row they touched last in this class (with its lesson's title). */
export async function listLatestProgress(db: Db, classId: string) {
  return db
    .selectFrom('lesson_progress as p')
    .innerJoin('lesson as l', 'l.id', 'p.lesson_id')
    .distinctOn('p.student_id')
    .select(['p.student_id', 'p.lesson_id', 'l.title', 'p.step_index', 'p.total_steps', 'p.finished_at', 'p.last_active_at'])
    .where('l.class_id', '=', classId)
    .orderBy('p.student_id')
    .orderBy('p.last_active_at', 'desc')
    .execute();
}
