// /api/lessons/:id — GET: the lesson with everything the walkthrough needs (the template version's design,
// route strokes and figures, and the signed-in student's progress); students only once it is released.
// PATCH { title?, releaseAt?, notes?, templateVersionId?, confirmed? } (a changed release is checked as on POST
// /api/classes/:id/lessons) and DELETE (its progress and photos go with it): the class's teacher and admins.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { json, problem, readJson } from '@server/http.ts';
import { requireUser } from '@server/auth/guards.ts';
import { findLessonAccess, isManager } from '@server/classes/classAccess.ts';
import { deleteLesson, findLessonRow } from '@server/classes/class.repository.ts';
import { toLessonJson } from '@server/classes/classJson.ts';
import { updateLessonSchema } from '@server/classes/class.schema.ts';
import { canUseTemplateVersion, checkLessonDates, updateLesson } from '@server/classes/class.service.ts';
import { dateProblemResponse } from '@server/classes/teachingDates.ts';
import { readProgress } from '@server/classes/progress.ts';
import { findVersionById } from '@server/templates/template.repository.ts';
import { toVersionJson } from '@server/templates/templateJson.ts';
import { deletePhotoObjectsOf } from '@server/photos/photoCleanup.ts';

const notFound = () => problem(404, 'not_found', 'Not found.');

export const GET = (async ({ locals, params }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const access = await findLessonAccess(db, signedIn.value.user, params['id']);
  if (!access) return notFound();
  const lesson = await findLessonRow(db, access.lessonId);
  if (!lesson) return notFound();
  const version = await findVersionById(db, lesson.template_version_id);
  if (!version) throw new Error(`api/lessons/[id]: lesson ${lesson.id} points at a missing template version`);
  const manager = isManager(access.standing);
  return json({
    lesson: toLessonJson(lesson, manager),
    class: { id: access.cls.id, title: access.cls.title },
    standing: access.standing,
    template: toVersionJson(version),
    progress: access.standing === 'student' ? await readProgress(db, lesson.id, signedIn.value.user.id) : null,
  });
}) satisfies APIRoute;

export const PATCH = (async ({ locals, params, request }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const access = await findLessonAccess(db, signedIn.value.user, params['id']);
  if (!access || !isManager(access.standing)) return notFound();
  const body = await readJson(request, updateLessonSchema);
  if (!body.ok) return body.error;
  const versionId = body.value.templateVersionId;
  if (versionId !== undefined && !(await canUseTemplateVersion(db, access.cls.teacher_id, signedIn.value.user, versionId))) {
    return problem(400, 'invalid_input', 'Choose a version of one of your templates or of a public template.', { templateVersionId: 'No such template version.' });
  }
  const before = await findLessonRow(db, access.lessonId);
  if (!before) return notFound();
  const dates = await checkLessonDates(db, access.cls.id, body.value, before.release_at);
  if (!dates.ok) return dateProblemResponse(dates.error);
  await updateLesson(db, access.lessonId, body.value);
  const row = await findLessonRow(db, access.lessonId);
  if (!row) return notFound();
  return json({ lesson: toLessonJson(row, true) });
}) satisfies APIRoute;

export const DELETE = (async ({ locals, params }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const access = await findLessonAccess(db, signedIn.value.user, params['id']);
  if (!access || !isManager(access.standing)) return notFound();
  await deletePhotoObjectsOf(db, { lessonId: access.lessonId });
  await deleteLesson(db, access.lessonId);
  return new Response(null, { status: 204 });
}) satisfies APIRoute;
