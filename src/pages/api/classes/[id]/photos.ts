// /api/classes/:id/photos — GET (?lessonId, ?studentId): the photo gallery. The teacher and admins see every
// student's photos; a student sees only their own.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { json, problem } from '@server/http.ts';
import { requireUser } from '@server/auth/guards.ts';
import { findClassAccess, isManager, isUuid } from '@server/classes/classAccess.ts';
import { listPhotos } from '@server/photos/photo.service.ts';

export const GET = (async ({ locals, params, url }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const access = await findClassAccess(db, signedIn.value.user, params['id']);
  if (!access) return problem(404, 'not_found', 'Not found.');
  const lessonId = url.searchParams.get('lessonId') ?? undefined;
  const wanted = url.searchParams.get('studentId') ?? undefined;
  if ((lessonId !== undefined && !isUuid(lessonId)) || (wanted !== undefined && !isUuid(wanted))) {
    return problem(400, 'invalid_input', 'lessonId and studentId must be ids.', { ...(lessonId && { lessonId: 'Not an id.' }), ...(wanted && { studentId: 'Not an id.' }) });
  }
  const studentId = isManager(access.standing) ? wanted : signedIn.value.user.id;
  const photos = await listPhotos(db, { classId: access.cls.id, ...(lessonId && { lessonId }), ...(studentId && { studentId }) });
  return json({ photos });
}) satisfies APIRoute;
