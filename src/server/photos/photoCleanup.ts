// Removing stored photo objects before the rows go (a class or lesson delete cascades to lesson_photo, which
// would otherwise leave the objects behind in the bucket).
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import { deleteObject } from '../storage/objectStore.ts';

export async function deletePhotoObjectsOf(db: Kysely<Database>, scope: { lessonId: string } | { classId: string }): Promise<void> {
  let q = db.selectFrom('lesson_photo as p').innerJoin('lesson as l', 'l.id', 'p.lesson_id').select(['p.object_key', 'p.thumb_key']);
  q = 'lessonId' in scope ? q.where('p.lesson_id', '=', scope.lessonId) : q.where('l.class_id', '=', scope.classId);
  const rows = await q.execute();
  await Promise.allSettled(rows.flatMap((r) => [deleteObject(r.object_key), deleteObject(r.thumb_key)]));
}
