// /api/lessons/:id/photos — GET: photos of this lesson (teacher/admin: everyone's; student: their own).
// POST ?side=front|back with the image bytes as the body (any content type; the bytes decide): an enrolled
// student uploads a photo of their finished block → 201 { photo }. Limits: 15 MB, 50 megapixels, JPEG/PNG/WebP.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { json, problem } from '@server/http.ts';
import { requireUser } from '@server/auth/guards.ts';
import { findLessonAccess, isManager } from '@server/classes/classAccess.ts';
import { MAX_UPLOAD_BYTES, photoProblemMessage, processPhoto } from '@server/photos/photoImage.ts';
import { MAX_PHOTOS_PER_LESSON, countPhotos, listPhotos, storePhoto } from '@server/photos/photo.service.ts';
import { readBytesCapped } from '@server/readBody.ts';
import { isPhotoCapViolation, photoCapResponse } from '@server/photos/photoCap.ts';

export const GET = (async ({ locals, params }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const access = await findLessonAccess(db, signedIn.value.user, params['id']);
  if (!access) return problem(404, 'not_found', 'Not found.');
  const mine = isManager(access.standing) ? {} : { studentId: signedIn.value.user.id };
  return json({ photos: await listPhotos(db, { classId: access.cls.id, lessonId: access.lessonId, ...mine }) });
}) satisfies APIRoute;

export const POST = (async ({ locals, params, request, url }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const access = await findLessonAccess(db, signedIn.value.user, params['id']);
  if (!access || access.standing !== 'student') return problem(404, 'not_found', 'Not found.');
  const side = url.searchParams.get('side') ?? 'front';
  if (side !== 'front' && side !== 'back') return problem(400, 'invalid_input', 'Say which side the photo shows: front or back.', { side: 'Use front or back.' });
  const studentId = signedIn.value.user.id;
  if ((await countPhotos(db, access.lessonId, studentId)) >= MAX_PHOTOS_PER_LESSON) return photoCapResponse();
  const bytes = await readBytesCapped(request, MAX_UPLOAD_BYTES);
  if (bytes === null) return problem(413, 'payload_too_large', `That photo is larger than ${MAX_UPLOAD_BYTES / (1024 * 1024)} MB. Send a smaller copy.`);
  const processed = await processPhoto(bytes);
  if (!processed.ok) {
    const status = processed.error.kind === 'not-an-image' || processed.error.kind === 'heic' ? 415 : processed.error.kind === 'too-many-pixels' ? 413 : 400;
    return problem(status, status === 415 ? 'unsupported_media_type' : status === 413 ? 'payload_too_large' : 'invalid_input', photoProblemMessage(processed.error));
  }
  let id: string;
  try {
    id = await storePhoto(db, access.lessonId, studentId, side, processed.value);
  } catch (error) {
    // Parallel uploads that all passed the count above: the database cap refused this one (its objects are gone).
    if (isPhotoCapViolation(error)) return photoCapResponse();
    throw error;
  }
  const [photo] = await listPhotos(db, { classId: access.cls.id, lessonId: access.lessonId, studentId }).then((all) => all.filter((p) => p.id === id));
  return json({ photo }, 201);
}) satisfies APIRoute;
