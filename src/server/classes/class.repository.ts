// Queries on class, lesson and enrollment. Rows become camelCase JSON in classJson.ts.
import { sql, type Kysely, type Selectable, type Transaction } from 'kysely';
import type { ClassTable, Database } from '@db/schema.ts';

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

/**
 * A class's lessons by release date; `releasedOnly` for students, and for a refunded student only those released
 * by `accessUntil` (their enrolment's cut-off).
 */
export async function listLessons(db: Db, classId: string, releasedOnly: boolean, accessUntil: Date | null = null): Promise<LessonListRow[]> {
  let q = selectLessons(db).where('lesson.class_id', '=', classId);
  if (releasedOnly) q = q.where('lesson.release_at', '<=', sql<Date>`now()`);
  if (releasedOnly && accessUntil !== null) q = q.where('lesson.release_at', '<=', accessUntil);
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

export interface NewClassValues {
  teacherId: string;
  title: string;
  description: string;
  /** A calendar date, YYYY-MM-DD. */
  startsOn: string;
  priceCents: number | null;
  currency: string | null;
  joinCode: string;
}

/** Inserts a class; throws PostgreSQL's unique violation (23505) when the join code is taken. */
export async function insertClass(db: Db, v: NewClassValues): Promise<string> {
  const row = await db
    .insertInto('class')
    .values({
      teacher_id: v.teacherId,
      title: v.title,
      description: v.description,
      starts_on: v.startsOn,
      price_cents: v.priceCents,
      currency: v.currency,
      join_code: v.joinCode,
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

export async function updateClassRow(
  db: Db,
  classId: string,
  changes: Partial<{ title: string; description: string; startsOn: string; priceCents: number | null; currency: string | null; joinCode: string }>,
): Promise<void> {
  await db
    .updateTable('class')
    .set({
      ...(changes.title !== undefined && { title: changes.title }),
      ...(changes.description !== undefined && { description: changes.description }),
      ...(changes.startsOn !== undefined && { starts_on: changes.startsOn }),
      ...(changes.priceCents !== undefined && { price_cents: changes.priceCents }),
      ...(changes.currency !== undefined && { currency: changes.currency }),
      ...(changes.joinCode !== undefined && { join_code: changes.joinCode }),
      updated_at: new Date(),
    })
    .where('id', '=', classId)
    .execute();
}

/** The id of the teacher's class with exactly this title, if any (the demo seed's idempotency key). */
export async function findTaughtClassIdByTitle(db: Db, teacherId: string, title: string): Promise<string | undefined> {
  const row = await db.selectFrom('class').select('id').where('teacher_id', '=', teacherId).where('title', '=', title).executeTakeFirst();
  return row?.id;
}

/** The class a join code opens, with its teacher's current role; undefined for an unknown code. */
export async function findClassByJoinCode(db: Db, joinCode: string) {
  return db
    .selectFrom('class')
    .innerJoin('account as teacher', 'teacher.id', 'class.teacher_id')
    .select(['class.id', 'class.teacher_id', 'class.title', 'class.price_cents', 'class.currency', 'teacher.role as teacher_role'])
    .where('class.join_code', '=', joinCode)
    .executeTakeFirst();
}

export interface NewLessonValues {
  classId: string;
  title: string;
  releaseAt: Date;
  notesMd: string;
  templateVersionId: string;
}

export async function insertLesson(db: Db, v: NewLessonValues): Promise<string> {
  const row = await db
    .insertInto('lesson')
    .values({ class_id: v.classId, title: v.title, release_at: v.releaseAt, notes_md: v.notesMd, template_version_id: v.templateVersionId })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

export async function updateLessonRow(
  db: Db,
  lessonId: string,
  changes: Partial<{ title: string; releaseAt: Date; notesMd: string; templateVersionId: string }>,
): Promise<void> {
  await db
    .updateTable('lesson')
    .set({
      ...(changes.title !== undefined && { title: changes.title }),
      ...(changes.releaseAt !== undefined && { release_at: changes.releaseAt }),
      ...(changes.notesMd !== undefined && { notes_md: changes.notesMd }),
      ...(changes.templateVersionId !== undefined && { template_version_id: changes.templateVersionId }),
      updated_at: new Date(),
    })
    .where('id', '=', lessonId)
    .execute();
}

export async function findClassById(db: Db, id: string): Promise<Selectable<ClassTable> | undefined> {
  return db.selectFrom('class').selectAll().where('id', '=', id).executeTakeFirst();
}

/** The student's enrolment: undefined when not enrolled; `access_until` set once a payment for it was refunded. */
export async function findEnrollmentAccess(db: Db, classId: string, studentId: string): Promise<{ access_until: Date | null } | undefined> {
  return db.selectFrom('enrollment').select('access_until').where('class_id', '=', classId).where('student_id', '=', studentId).executeTakeFirst();
}

/** The lesson's class and whether it is out (the database clock decides: release_at <= now()). */
export async function findLessonRelease(db: Db, lessonId: string): Promise<{ id: string; class_id: string; released: boolean; release_at: Date } | undefined> {
  const row = await db
    .selectFrom('lesson')
    .select((eb) => ['id', 'class_id', 'release_at', eb('release_at', '<=', sql<Date>`now()`).as('released')])
    .where('id', '=', lessonId)
    .executeTakeFirst();
  return row && { id: row.id, class_id: row.class_id, released: Boolean(row.released), release_at: row.release_at };
}

/** Deletes the class (its lessons, enrollments, invitations, progress and photo rows go with it, by cascade). */
export async function deleteClass(db: Db, id: string): Promise<void> {
  await db.deleteFrom('class').where('id', '=', id).execute();
}

export async function deleteLesson(db: Db, id: string): Promise<void> {
  await db.deleteFrom('lesson').where('id', '=', id).execute();
}
