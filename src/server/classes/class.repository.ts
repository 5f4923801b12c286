// Queries on class, lesson and enrollment. Rows become camelCase JSON in classJson.ts.
import { sql, type Kysely, type Transaction } from 'kysely';
import type { Database } from '@db/schema.ts';

type Db = Kysely<Database> | Transaction<Database>;

const startsOn = sql<string>`to_char(class.starts_on, 'YYYY-MM-DD')`.as('starts_on_text');

export function selectClasses(db: Db) {
  return db
    .selectFrom('class')
    .innerJoin('account as teacher', 'teacher.id', 'class.teacher_id')
    .select([
      'class.id',
      'class.title',
      'class.description',
      startsOn,
      'class.price_cents',
      'class.currency',
      'class.join_code',
      'class.teacher_id',
      'teacher.display_name as teacher_name',
      'class.created_at',
    ])
    .select((eb) => [
      eb.selectFrom('lesson').select(eb.fn.countAll<number>().as('n')).whereRef('lesson.class_id', '=', 'class.id').as('lesson_count'),
      eb.selectFrom('enrollment').select(eb.fn.countAll<number>().as('n')).whereRef('enrollment.class_id', '=', 'class.id').as('student_count'),
    ]);
}
export type ClassListRow = Awaited<ReturnType<ReturnType<typeof selectClasses>['executeTakeFirstOrThrow']>>;

export async function findClassRow(db: Db, id: string): Promise<ClassListRow | undefined> {
  return selectClasses(db).where('class.id', '=', id).executeTakeFirst();
}

/** Classes the user teaches, and classes the user is enrolled in (newest start first). */
export async function listClassesFor(db: Db, userId: string): Promise<{ teaching: ClassListRow[]; enrolled: ClassListRow[] }> {
  const teaching = await selectClasses(db).where('class.teacher_id', '=', userId).orderBy('class.starts_on', 'desc').execute();
  const enrolled = await selectClasses(db)
    .where('class.id', 'in', db.selectFrom('enrollment').select('class_id').where('student_id', '=', userId))
    .orderBy('class.starts_on', 'desc')
    .execute();
  return { teaching, enrolled };
}

export function selectLessons(db: Db) {
  return db
    .selectFrom('lesson')
    .innerJoin('template_version as tv', 'tv.id', 'lesson.template_version_id')
    .select((eb) => [
      'lesson.id',
      'lesson.class_id',
      'lesson.title',
      'lesson.release_at',
      'lesson.notes_md',
      'lesson.template_version_id',
      'tv.template_id',
      'tv.version as template_version',
      'tv.title as template_title',
      eb('lesson.release_at', '<=', sql<Date>`now()`).as('released'),
    ]);
}
export type LessonListRow = Awaited<ReturnType<ReturnType<typeof selectLessons>['executeTakeFirstOrThrow']>>;

/** A class's lessons by release date; `releasedOnly` for students. */
export async function listLessons(db: Db, classId: string, releasedOnly: boolean): Promise<LessonListRow[]> {
  let q = selectLessons(db).where('lesson.class_id', '=', classId);
  if (releasedOnly) q = q.where('lesson.release_at', '<=', sql<Date>`now()`);
  return q.orderBy('lesson.release_at').orderBy('lesson.created_at').execute();
}

export async function findLessonRow(db: Db, id: string): Promise<LessonListRow | undefined> {
  return selectLessons(db).where('lesson.id', '=', id).executeTakeFirst();
}

/** Adds the student to the class; false when already enrolled. */
export async function enrollStudent(db: Db, classId: string, studentId: string, via: 'invitation' | 'join-code'): Promise<boolean> {
  const row = await db
    .insertInto('enrollment')
    .values({ class_id: classId, student_id: studentId, joined_via: via })
    .onConflict((oc) => oc.columns(['class_id', 'student_id']).doNothing())
    .returning('student_id')
    .executeTakeFirst();
  return row !== undefined;
}
