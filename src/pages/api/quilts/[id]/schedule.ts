// GET /api/quilts/:id/schedule — { schedule }: the quilt's blocks in quilting order with their dates (the class's
// dated lessons, or one a month), what is done and what is next, and the classes it may be tied to. Owner only.
// PUT /api/quilts/:id/schedule { classId, start } — ties the quilt to one of the owner's classes (or none) and sets
// the monthly start; answers the new { schedule }. Another class is a 400 on `classId`, as for one that does not exist.
import type { APIRoute } from 'astro';
import { quiltScheduleSettingsSchema } from '@shared/contract/quiltSchedule.ts';
import { db } from '@server/db.ts';
import { json, problem, readJson } from '@server/http.ts';
import { requireUser } from '@server/auth/guards.ts';
import { getQuiltSchedule, saveQuiltSchedule } from '@server/quilts/quiltSchedule.service.ts';
import { quiltNotFound } from '@server/quilts/quiltHttp.ts';

export const GET = (async ({ locals, params }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const schedule = await getQuiltSchedule(db, signedIn.value.user, params['id'] ?? '', new Date());
  return schedule ? json({ schedule }) : quiltNotFound();
}) satisfies APIRoute;

export const PUT = (async ({ locals, params, request }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const user = signedIn.value.user;
  // The owner guard comes before the body, so a stranger learns nothing from validation messages.
  if (!(await getQuiltSchedule(db, user, params['id'] ?? '', new Date()))) return quiltNotFound();
  const body = await readJson(request, quiltScheduleSettingsSchema);
  if (!body.ok) return body.error;
  const saved = await saveQuiltSchedule(db, user, params['id'] ?? '', body.value);
  if (!saved.ok) {
    return saved.error.kind === 'not-found' ? quiltNotFound() : problem(400, 'invalid_input', 'Class: choose one of the classes you teach or are enrolled in.', { classId: 'Choose one of the classes you teach or are enrolled in.' });
  }
  return json({ schedule: await getQuiltSchedule(db, user, params['id'] ?? '', new Date()) });
}) satisfies APIRoute;
