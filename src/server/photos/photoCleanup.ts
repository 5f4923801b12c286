// Removing stored photo objects before the rows go (a class or lesson delete cascades to lesson_photo, which
// would otherwise leave the objects behind in the bucket).
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import { deleteObject } from '../storage/objectStore.ts';
import { listPhotoKeys } from './photo.repository.ts';

export async function deletePhotoObjectsOf(db: Kysely<Database>, scope: { lessonId: string } | { classId: string }): Promise<void> {
  const rows = await listPhotoKeys(db, scope);
  await Promise.allSettled(rows.flatMap((r) => [deleteObject(r.object_key), deleteObject(r.thumb_key)]));
}
