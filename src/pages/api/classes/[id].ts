// /api/classes/:id — GET: the class and its lessons (students: released lessons only, no join code);
// PATCH: change title, description, start date or price (teacher, admin; a changed start date is checked as on
// POST /api/classes); DELETE: remove the class with its lessons, enrolments, progress and photos (teacher, admin).
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { json, problem, readJson } from '@server/http.ts';
import { requireUser } from '@server/auth/guards.ts';
import { findClassAccess, isManager } from '@server/classes/classAccess.ts';
import { deleteClass, findClassRow, listLessons } from '@server/classes/class.repository.ts';
import { toClassJson, toLessonJson } from '@server/classes/classJson.ts';
import { updateClassSchema } from '@server/classes/class.schema.ts';
import { checkClassDates, updateClass, checkClassPrice, priceProblemResponse } from '@server/classes/class.service.ts';
import { dateProblemResponse } from '@server/classes/teachingDates.ts';
import { deletePhotoObjectsOf } from '@server/photos/photoCleanup.ts';

const notFound = () => problem(404, 'not_found', 'Not found.');

export const GET = (async ({ locals, params }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const access = await findClassAccess(db, signedIn.value.user, params['id']);
  if (!access) return notFound();
  const manager = isManager(access.standing);
  const row = await findClassRow(db, access.cls.id);
  if (!row) return notFound();
  const lessons = await listLessons(db, access.cls.id, !manager, access.accessUntil);
  return json({ class: toClassJson(row, manager), standing: access.standing, lessons: lessons.map((l) => toLessonJson(l, manager)) });
}) satisfies APIRoute;

export const PATCH = (async ({ locals, params, request }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const access = await findClassAccess(db, signedIn.value.user, params['id']);
  if (!access || !isManager(access.standing)) return notFound();
  const body = await readJson(request, updateClassSchema);
  if (!body.ok) return body.error;
  const before = await findClassRow(db, access.cls.id);
  if (!before) return notFound();
  const price = checkClassPrice(body.value.priceCents !== undefined ? body.value.priceCents : before.price_cents, body.value.currency !== undefined ? body.value.currency : before.currency);
  if (price) return priceProblemResponse(price);
  const dates = checkClassDates(body.value, before.starts_on_text);
  if (!dates.ok) return dateProblemResponse(dates.error);
  await updateClass(db, access.cls.id, body.value);
  const row = await findClassRow(db, access.cls.id);
  if (!row) return notFound();
  return json({ class: toClassJson(row, true) });
}) satisfies APIRoute;

export const DELETE = (async ({ locals, params }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const access = await findClassAccess(db, signedIn.value.user, params['id']);
  if (!access || !isManager(access.standing)) return notFound();
  await deletePhotoObjectsOf(db, { classId: access.cls.id });
  await deleteClass(db, access.cls.id);
  return new Response(null, { status: 204 });
}) satisfies APIRoute;
