// Who may see a template. The owner and admins always; anyone (signed in or not) a public one; an unlisted one
// only through its link token; a class-only one the students of a class with a released lesson that uses it
// (the same rule also opens unlisted templates to those students, since their teacher chose it for them).
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import { hasRole } from '../auth/guards.ts';
import type { SessionUser } from '../auth/session.ts';
import { hasReleasedLessonUsingTemplate } from '../classes/lessonRelease.repository.ts';
import type { TemplateRow } from './template.repository.ts';

export async function canSeeTemplate(db: Kysely<Database>, user: SessionUser | null, tpl: TemplateRow, viaLink: boolean): Promise<boolean> {
  if (tpl.visibility === 'public') return true;
  if (tpl.visibility === 'unlisted' && viaLink) return true;
  if (!user) return false;
  if (tpl.owner_id === user.id || user.role === 'admin') return true;
  return hasReleasedLessonUsingTemplate(db, tpl.id, user.id);
}

/** The owner while they are a teacher (a demoted teacher keeps reading their templates, no more), and admins. */
export function canEditTemplate(user: SessionUser | null, tpl: TemplateRow): boolean {
  return user !== null && ((tpl.owner_id === user.id && hasRole(user, 'teacher')) || user.role === 'admin');
}
