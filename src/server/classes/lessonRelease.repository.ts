// The query behind lesson-release e-mails (releaseSweep.ts). The database clock decides what is released.
import { sql, type Kysely, type Transaction } from 'kysely';
import type { Database } from '@db/schema.ts';

type Db = Kysely<Database> | Transaction<Database>;

/**
 * (lesson, student) pairs still to announce: released within `windowDays`, the student enrolled before the lesson
 * came out (or was last changed), and no outbox row with the dedupe key `lesson-release:<lesson>:<student>` yet.
 * Oldest release first, at most `limit`.
 */
export async function listUnannouncedReleases(db: Db, windowDays: number, limit: number) {
  return db
    .selectFrom('lesson')
    .innerJoin('class', 'class.id', 'lesson.class_id')
    .innerJoin('enrollment', 'enrollment.class_id', 'lesson.class_id')
    .innerJoin('account as student', 'student.id', 'enrollment.student_id')
    .select(['lesson.id as lesson_id', 'lesson.title', 'class.id as class_id', 'class.title as class_title', 'student.id as student_id', 'student.email', 'student.display_name'])
    .where('lesson.release_at', '<=', sql<Date>`now()`)
    .where('lesson.release_at', '>', sql<Date>`now() - make_interval(days => ${windowDays})`)
    .where(sql<boolean>`greatest(lesson.release_at, lesson.updated_at) >= enrollment.joined_at`)
    // A refunded student hears of no lesson released after the refund (it stays closed to them).
    .where(sql<boolean>`(enrollment.access_until is null or lesson.release_at <= enrollment.access_until)`)
    .where((eb) =>
      eb.not(
        eb.exists(
          eb.selectFrom('email_message').select('email_message.id').whereRef('email_message.dedupe_key', '=', sql<string>`'lesson-release:' || lesson.id || ':' || student.id`),
        ),
      ),
    )
    .orderBy('lesson.release_at')
    .limit(limit)
    .execute();
}

/**
 * True when the student is enrolled in a class with a released lesson that uses a version of the template (after a
 * refund: released by then).
 */
export async function hasReleasedLessonUsingTemplate(db: Db, templateId: string, studentId: string): Promise<boolean> {
  const lesson = await db
    .selectFrom('lesson')
    .innerJoin('template_version as tv', 'tv.id', 'lesson.template_version_id')
    .innerJoin('enrollment', 'enrollment.class_id', 'lesson.class_id')
    .select('lesson.id')
    .where('tv.template_id', '=', templateId)
    .where('enrollment.student_id', '=', studentId)
    .where('lesson.release_at', '<=', sql<Date>`now()`)
    .where(sql<boolean>`(enrollment.access_until is null or lesson.release_at <= enrollment.access_until)`)
    .executeTakeFirst();
  return lesson !== undefined;
}
