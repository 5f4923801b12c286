// What deleting a class or a lesson takes away from its students, counted from the rows (for the confirmation).
import type { Kysely, Transaction } from 'kysely';
import type { Database } from '@db/schema.ts';

type Db = Kysely<Database> | Transaction<Database>;

export interface ClassDeletionCounts {
  students: number;
  lessons: number;
  /** Students who have started at least one of its lessons. */
  studentsWithProgress: number;
  photos: number;
}

export async function countClassDeletionImpact(db: Db, classId: string): Promise<ClassDeletionCounts> {
  const row = await db
    .selectNoFrom((eb) => [
      eb.selectFrom('enrollment').select(eb.fn.countAll<number>().as('n')).where('class_id', '=', classId).as('students'),
      eb.selectFrom('lesson').select(eb.fn.countAll<number>().as('n')).where('class_id', '=', classId).as('lessons'),
      eb
        .selectFrom('lesson_progress as p')
        .innerJoin('lesson as l', 'l.id', 'p.lesson_id')
        .select((inner) => inner.fn.count<number>('p.student_id').distinct().as('n'))
        .where('l.class_id', '=', classId)
        .as('with_progress'),
      eb
        .selectFrom('lesson_photo as ph')
        .innerJoin('lesson as l', 'l.id', 'ph.lesson_id')
        .select(eb.fn.countAll<number>().as('n'))
        .where('l.class_id', '=', classId)
        .as('photos'),
    ])
    .executeTakeFirstOrThrow();
  return { students: Number(row.students ?? 0), lessons: Number(row.lessons ?? 0), studentsWithProgress: Number(row.with_progress ?? 0), photos: Number(row.photos ?? 0) };
}

export interface LessonDeletionCounts {
  /** Enrolled students of its class (who see it once released). */
  students: number;
  studentsWithProgress: number;
  photos: number;
}

export async function countLessonDeletionImpact(db: Db, lessonId: string, classId: string): Promise<LessonDeletionCounts> {
  const row = await db
    .selectNoFrom((eb) => [
      eb.selectFrom('enrollment').select(eb.fn.countAll<number>().as('n')).where('class_id', '=', classId).as('students'),
      eb.selectFrom('lesson_progress').select(eb.fn.countAll<number>().as('n')).where('lesson_id', '=', lessonId).as('with_progress'),
      eb.selectFrom('lesson_photo').select(eb.fn.countAll<number>().as('n')).where('lesson_id', '=', lessonId).as('photos'),
    ])
    .executeTakeFirstOrThrow();
  return { students: Number(row.students ?? 0), studentsWithProgress: Number(row.with_progress ?? 0), photos: Number(row.photos ?? 0) };
}
