// /api/classes/:id/lessons — GET: the lessons (students: released only); POST: add a dated lesson (teacher, admin)
// { title, releaseAt, notes (Markdown), templateVersionId, confirmed? } → 201 { lesson }. A release in the past or
// before the class starts answers 409 `needs_confirmation` until confirmed: true (teachingDates.ts).
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { json, problem, readJson } from '@server/http.ts';
import { requireUser } from '@server/auth/guards.ts';
import { findClassAccess, isManager } from '@server/classes/classAccess.ts';
import { findLessonRow, listLessons } from '@server/classes/class.repository.ts';
import { toLessonJson } from '@server/classes/classJson.ts';
import { createLessonSchema } from '@server/classes/class.schema.ts';
import { canUseTemplateVersion, checkLessonDates, createLesson } from '@server/classes/class.service.ts';
import { dateProblemResponse } from '@server/classes/teachingDates.ts';

export const GET = (async ({ locals, params }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const access = await findClassAccess(db, signedIn.value.user, params['id']);
  if (!access) return problem(404, 'not_found', 'Not found.');
  const manager = isManager(access.standing);
  const lessons = await listLessons(db, access.cls.id, !manager, access.accessUntil);
  return json({ lessons: lessons.map((l) => toLessonJson(l, manager)) });
}) satisfies APIRoute;

export const POST = (async ({ locals, params, request }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const access = await findClassAccess(db, signedIn.value.user, params['id']);
  if (!access || !isManager(access.standing)) return problem(404, 'not_found', 'Not found.');
  const body = await readJson(request, createLessonSchema);
  if (!body.ok) return body.error;
  if (!(await canUseTemplateVersion(db, access.cls.teacher_id, signedIn.value.user, body.value.templateVersionId))) {
    return problem(400, 'invalid_input', 'Choose a version of one of your templates or of a public template.', { templateVersionId: 'No such template version.' });
  }
  const dates = await checkLessonDates(db, access.cls.id, body.value);
  if (!dates.ok) return dateProblemResponse(dates.error);
  const id = await createLesson(db, access.cls.id, body.value);
  const row = await findLessonRow(db, id);
  if (!row) throw new Error('api/classes/[id]/lessons: the lesson just created is missing');
  return json({ lesson: toLessonJson(row, true) }, 201);
}) satisfies APIRoute;
