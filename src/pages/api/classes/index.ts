// /api/classes — GET: my classes { teaching, enrolled } (teaching: only while the account is a teacher); POST: a
// teacher creates a class → 201 { class }. A start date in the past answers 409 `needs_confirmation` until the body
// says confirmed: true; one more than a year ago or five years ahead is refused (teachingDates.ts).
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { json, readJson } from '@server/http.ts';
import { hasRole, requireRole, requireUser } from '@server/auth/guards.ts';
import { createClassSchema } from '@server/classes/class.schema.ts';
import { checkClassDates, createClass, checkClassPrice, priceProblemResponse } from '@server/classes/class.service.ts';
import { dateProblemResponse } from '@server/classes/teachingDates.ts';
import { findClassRow, listClassesFor } from '@server/classes/class.repository.ts';
import { toClassJson } from '@server/classes/classJson.ts';

export const GET = (async ({ locals }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const { teaching, enrolled } = await listClassesFor(db, signedIn.value.user.id);
  const teacher = hasRole(signedIn.value.user, 'teacher');
  return json({ teaching: teacher ? teaching.map((c) => toClassJson(c, true)) : [], enrolled: enrolled.map((c) => toClassJson(c, false)) });
}) satisfies APIRoute;

export const POST = (async ({ locals, request }) => {
  const signedIn = requireRole(locals, 'teacher');
  if (!signedIn.ok) return signedIn.error;
  const body = await readJson(request, createClassSchema);
  if (!body.ok) return body.error;
  const price = checkClassPrice(body.value.priceCents, body.value.currency);
  if (price) return priceProblemResponse(price);
  const dates = checkClassDates(body.value);
  if (!dates.ok) return dateProblemResponse(dates.error);
  const id = await createClass(db, signedIn.value.user.id, body.value);
  const row = await findClassRow(db, id);
  if (!row) throw new Error('api/classes: the class just created is missing');
  return json({ class: toClassJson(row, true) }, 201);
}) satisfies APIRoute;
