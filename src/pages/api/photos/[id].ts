// /api/photos/:id — GET (?size=thumb): the photo's bytes, proxied from the object store, only to the student who
// uploaded it, the class's teacher and admins (everyone else: 404). DELETE: the student or the teacher/admin.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { problem } from '@server/http.ts';
import { requireUser } from '@server/auth/guards.ts';
import type { SessionUser } from '@server/auth/session.ts';
import { findClassAccess, isManager, isUuid } from '@server/classes/classAccess.ts';
import { deletePhoto } from '@server/photos/photo.service.ts';
import { findPhotoRow } from '@server/photos/photo.repository.ts';
import { getObject } from '@server/storage/objectStore.ts';

async function findVisiblePhoto(user: SessionUser, id: string | undefined) {
  if (!isUuid(id)) return null;
  const row = await findPhotoRow(db, id);
  if (!row) return null;
  const access = await findClassAccess(db, user, row.class_id);
  if (!access) return null;
  if (!isManager(access.standing) && row.student_id !== user.id) return null;
  return row;
}

export const GET = (async ({ locals, params, url }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const row = await findVisiblePhoto(signedIn.value.user, params['id']);
  if (!row) return problem(404, 'not_found', 'Not found.');
  const bytes = await getObject(url.searchParams.get('size') === 'thumb' ? row.thumb_key : row.object_key);
  if (!bytes) return problem(404, 'not_found', 'Not found.');
  return new Response(bytes as Uint8Array<ArrayBuffer>, {
    headers: {
      'content-type': 'image/jpeg',
      'content-length': String(bytes.byteLength),
      // Private to this signed-in person: browsers may keep it briefly, shared caches never.
      'cache-control': 'private, max-age=300',
      'x-content-type-options': 'nosniff',
      'content-disposition': `inline; filename="block-${row.side}.jpg"`,
    },
  });
}) satisfies APIRoute;

export const DELETE = (async ({ locals, params }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const row = await findVisiblePhoto(signedIn.value.user, params['id']);
  if (!row) return problem(404, 'not_found', 'Not found.');
  await deletePhoto(db, row);
  return new Response(null, { status: 204 });
}) satisfies APIRoute;
