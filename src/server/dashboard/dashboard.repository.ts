// Queries behind the dashboard (dashboard.ts): a quilter's latest designs, the lessons of the classes they joined
// with their own progress, and what a teacher's students did in the last days.
import { sql, type Kysely, type Transaction } from 'kysely';
import type { Database } from '@db/schema.ts';

type Db = Kysely<Database> | Transaction<Database>;

/** The owner's most recently changed live designs, newest first. */
export async function listRecentDesigns(db: Db, ownerId: string, limit: number) {
  return db
    .selectFrom('design')
    .select(['id', 'title', 'updated_at', 'thumbnail_svg', 'summary', 'summary_version', 'version'])
    .where('owner_id', '=', ownerId)
    .where('deleted_at', 'is', null)
    .orderBy('updated_at', 'desc')
    .orderBy('id')
    .limit(limit)
    .execute();
}

/** Every lesson of every class the student is enrolled in (after a refund: those released by then), with the student's own progress (if any), by release. */
export async function listEnrolledLessonsWithProgress(db: Db, studentId: string) {
  return db
    .selectFrom('enrollment')
    .innerJoin('class', 'class.id', 'enrollment.class_id')
    .innerJoin('lesson', 'lesson.class_id', 'class.id')
    .leftJoin('lesson_progress as p', (j) => j.onRef('p.lesson_id', '=', 'lesson.id').on('p.student_id', '=', studentId))
    .select((eb) => [
      'class.id as class_id',
      'class.title as class_title',
      'lesson.id as lesson_id',
      'lesson.title as lesson_title',
      'lesson.release_at',
      eb('lesson.release_at', '<=', sql<Date>`now()`).as('released'),
      'p.step_index',
      'p.total_steps',
      'p.finished_at',
    ])
    .where('enrollment.student_id', '=', studentId)
    // After a refund, lessons released later are not the student's: they are left out, like on the class page.
    .where(sql<boolean>`(enrollment.access_until is null or lesson.release_at <= enrollment.access_until)`)
    .orderBy('lesson.release_at')
    .orderBy('lesson.created_at')
    .execute();
}

/** Per class the teacher teaches: students active, lessons finished and photos added since `since`. */
export async function listTeachingActivitySince(db: Db, teacherId: string, since: Date) {
  return db
    .selectFrom('class')
    .select((eb) => [
      'class.id',
      'class.title',
      eb.selectFrom('enrollment').select(eb.fn.countAll<number>().as('n')).whereRef('enrollment.class_id', '=', 'class.id').as('students'),
      eb
        .selectFrom('lesson_progress as p')
        .innerJoin('lesson', 'lesson.id', 'p.lesson_id')
        .select((sub) => sub.fn.count<number>('p.student_id').distinct().as('n'))
        .whereRef('lesson.class_id', '=', 'class.id')
        .where('p.last_active_at', '>=', since)
        .as('active_students'),
      eb
        .selectFrom('lesson_progress as p')
        .innerJoin('lesson', 'lesson.id', 'p.lesson_id')
        .select(eb.fn.countAll<number>().as('n'))
        .whereRef('lesson.class_id', '=', 'class.id')
        .where('p.finished_at', '>=', since)
        .as('lessons_finished'),
      eb
        .selectFrom('lesson_photo as ph')
        .innerJoin('lesson', 'lesson.id', 'ph.lesson_id')
        .select(eb.fn.countAll<number>().as('n'))
        .whereRef('lesson.class_id', '=', 'class.id')
        .where('ph.created_at', '>=', since)
        .as('photos'),
    ])
    .where('class.teacher_id', '=', teacherId)
    .orderBy('class.starts_on', 'desc')
    .execute();
}
