// Rules for a quilt's schedule. A quilt may belong to a class its owner teaches (a quilt-along's sample quilt) or is
// enrolled in (a student's own quilt); then the class's dated lessons give one block each, in the quilting order.
// For the teacher a lesson is done once its date has passed, with how many students finished it; for a student,
// once they finished it (their lesson progress). Lessons a student may not see yet show their date, not their
// title. Without a class (or when the owner no longer has the class), one block a month from the start date, done
// once its date has passed. Asking to tie a quilt to any other class is refused naming the field, never revealing it.
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import type { QuiltSchedule, QuiltScheduleSettings } from '@shared/contract/quiltSchedule.ts';
import { orderCells, rowOrder } from '@shared/quilt/order.ts';
import { quiltSchema } from '@shared/quilt/quilt.schema.ts';
import { buildQuiltSchedule, type ScheduleLesson } from '@shared/quilt/quiltSchedule.ts';
import { err, ok, type Result } from '@shared/result.ts';
import type { SessionUser } from '../auth/session.ts';
import { findClassAccess, isManager } from '../classes/classAccess.ts';
import { listClassesFor } from '../classes/class.repository.ts';
import { hasRole } from '../auth/guards.ts';
import { findQuiltScheduleRow, finishedCounts, finishedLessonIds, listLessonDays, updateQuiltSchedule } from './quiltSchedule.repository.ts';

type Db = Kysely<Database>;
type Standing = 'teacher' | 'student';

/** Today as a calendar day in UTC (the lessons' days are UTC days too). */
function utcDay(now: Date): string {
  const p = (n: number) => String(n).padStart(2, '0');
  return `${now.getUTCFullYear()}-${p(now.getUTCMonth() + 1)}-${p(now.getUTCDate())}`;
}

/** The classes the user may tie a quilt to, with how they stand. */
async function eligibleClasses(db: Db, user: SessionUser): Promise<{ id: string; title: string; standing: Standing }[]> {
  const { teaching, enrolled } = await listClassesFor(db, user.id);
  const taught = hasRole(user, 'teacher') ? teaching.map((c) => ({ id: c.id, title: c.title, standing: 'teacher' as const })) : [];
  return [...taught, ...enrolled.filter((c) => !taught.some((t) => t.id === c.id)).map((c) => ({ id: c.id, title: c.title, standing: 'student' as const }))];
}

/** The schedule of the owner's quilt, or null when it is not theirs (404). */
export async function getQuiltSchedule(db: Db, user: SessionUser, quiltId: string, now: Date): Promise<QuiltSchedule | null> {
  if (!/^[0-9a-f-]{36}$/i.test(quiltId)) return null;
  const row = await findQuiltScheduleRow(db, user.id, quiltId);
  if (!row) return null;
  const quilt = quiltSchema.parse(row.data);
  const ordered = orderCells(quilt, quilt.order);
  const order = ordered.ok ? ordered.value : rowOrder(quilt);
  const today = utcDay(now);
  const classes = await eligibleClasses(db, user);
  const access = row.class_id ? await findClassAccess(db, user, row.class_id) : null;
  const base = { classId: row.class_id, start: row.start, today, classes };
  if (!access) {
    const monthlyStart = row.start ?? row.made_on;
    return { ...base, source: { kind: 'monthly', monthlyStart }, rows: buildQuiltSchedule(order, { kind: 'monthly', start: monthlyStart, today }) };
  }
  const standing: Standing = isManager(access.standing) ? 'teacher' : 'student';
  const days = await listLessonDays(db, access.cls.id);
  const ids = days.map((d) => d.id);
  const lessons: ScheduleLesson[] =
    standing === 'teacher'
      ? await finishedCounts(db, ids).then((counts) => days.map((d) => ({ date: d.day, title: d.title, done: d.released, finishedBy: counts.get(d.id) ?? 0 })))
      : await finishedLessonIds(db, user.id, ids).then((mine) => days.map((d) => ({ date: d.day, title: d.released ? d.title : null, done: mine.has(d.id), finishedBy: null })));
  return { ...base, source: { kind: 'class', classTitle: access.cls.title, standing, lessons: days.length }, rows: buildQuiltSchedule(order, { kind: 'lessons', lessons }) };
}

export type ScheduleSaveFailure = { readonly kind: 'not-found' } | { readonly kind: 'not-your-class' };

/** Ties the quilt to one of the owner's classes (or none) and sets the monthly start. */
export async function saveQuiltSchedule(db: Db, user: SessionUser, quiltId: string, settings: QuiltScheduleSettings): Promise<Result<true, ScheduleSaveFailure>> {
  if (settings.classId !== null && !(await eligibleClasses(db, user)).some((c) => c.id === settings.classId)) return err({ kind: 'not-your-class' });
  return (await updateQuiltSchedule(db, user.id, quiltId, settings)) ? ok(true) : err({ kind: 'not-found' });
}
