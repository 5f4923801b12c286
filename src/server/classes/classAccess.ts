// Who may do what with a class. The class's teacher and admins manage it; enrolled students read it;
// everyone else gets the same answer as for a class that does not exist (null → 404). The teacher's role is read
// on every request: a teacher demoted to quilter stops managing their classes at once (the classes stay, read-only
// for their students and managed by admins; see DEVELOPERS.md "Who may see what").
import type { Kysely, Selectable, Transaction } from 'kysely';
import type { ClassTable, Database } from '@db/schema.ts';
import { hasRole } from '../auth/guards.ts';
import type { SessionUser } from '../auth/session.ts';
import { findClassById, findEnrollmentAccess, findLessonRelease } from './class.repository.ts';

type Db = Kysely<Database> | Transaction<Database>;
export type ClassRow = Selectable<ClassTable>;
/** How the user stands toward one class. Admins who also teach it count as its teacher. */
export type ClassStanding = 'teacher' | 'admin' | 'student';

export interface ClassAccess {
  cls: ClassRow;
  standing: ClassStanding;
  /** Students whose payment was refunded: lessons released after this stay closed to them. Null otherwise. */
  accessUntil: Date | null;
}

export const isManager = (standing: ClassStanding): boolean => standing === 'teacher' || standing === 'admin';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
export const isUuid = (s: string | undefined): s is string => s !== undefined && UUID.test(s);

/** The class and the user's standing toward it, or null when the user may not see it at all. */
export async function findClassAccess(db: Db, user: SessionUser, classId: string | undefined): Promise<ClassAccess | null> {
  if (!isUuid(classId)) return null;
  const cls = await findClassById(db, classId);
  if (!cls) return null;
  if (cls.teacher_id === user.id && hasRole(user, 'teacher')) return { cls, standing: 'teacher', accessUntil: null };
  if (user.role === 'admin') return { cls, standing: 'admin', accessUntil: null };
  const enrollment = await findEnrollmentAccess(db, cls.id, user.id);
  return enrollment ? { cls, standing: 'student', accessUntil: enrollment.access_until } : null;
}

export interface LessonAccess extends ClassAccess {
  lessonId: string;
  released: boolean;
}

/**
 * A lesson as the user may see it: managers see every lesson; students only released ones (the server's
 * clock decides: release_at <= now()), and after a refund only those released by then. Null → 404.
 */
export async function findLessonAccess(db: Db, user: SessionUser, lessonId: string | undefined): Promise<LessonAccess | null> {
  if (!isUuid(lessonId)) return null;
  const lesson = await findLessonRelease(db, lessonId);
  if (!lesson) return null;
  const access = await findClassAccess(db, user, lesson.class_id);
  if (!access) return null;
  if (access.standing === 'student' && !lesson.released) return null;
  if (access.standing === 'student' && access.accessUntil !== null && lesson.release_at > access.accessUntil) return null;
  return { ...access, lessonId: lesson.id, released: lesson.released };
}
