// /api/lessons/:id/progress — the walkthrough's saved place for the signed-in student (enrolled, lesson released).
// GET → { lessonId, stepIndex, totalSteps, finished, finishedAt, lastActiveAt } (zeros before the first save);
// PUT { stepIndex, totalSteps, finished? } → the same shape. Teachers previewing a lesson get 404: nothing to save.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { json, problem, readJson } from '@server/http.ts';
import { requireUser } from '@server/auth/guards.ts';
import { findLessonAccess } from '@server/classes/classAccess.ts';
import { progressSchema } from '@server/classes/class.schema.ts';
import { readProgress, saveProgress } from '@server/classes/progress.ts';

export const GET = (async ({ locals, params }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const access = await findLessonAccess(db, signedIn.value.user, params['id']);
  if (!access || access.standing !== 'student') return problem(404, 'not_found', 'Not found.');
  return json(await readProgress(db, access.lessonId, signedIn.value.user.id));
}) satisfies APIRoute;

export const PUT = (async ({ locals, params, request }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const access = await findLessonAccess(db, signedIn.value.user, params['id']);
  if (!access || access.standing !== 'student') return problem(404, 'not_found', 'Not found.');
  const body = await readJson(request, progressSchema);
  if (!body.ok) return body.error;
  return json(await saveProgress(db, access.lessonId, signedIn.value.user.id, body.value));
}) satisfies APIRoute;
