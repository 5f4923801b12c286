// Lesson photos: stored in the object store under photos/<id>/{full,thumb}.jpg, listed from lesson_photo.
// Objects are written before the row; if the row insert fails the objects are removed again.
import { randomUUID } from 'node:crypto';
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import { deleteObject, putObject } from '../storage/objectStore.ts';
import type { ProcessedPhoto } from './photoImage.ts';

/** Photos one student may keep per lesson (front and back, plus a few retakes). */
export const MAX_PHOTOS_PER_LESSON = 12;

export interface PhotoJson {
  id: string;
  lessonId: string;
  lessonTitle: string;
  student: { id: string; displayName: string };
  side: 'front' | 'back';
  width: number;
  height: number;
  bytes: number;
  createdAt: string;
  url: string;
  thumbUrl: string;
}

export async function countPhotos(db: Kysely<Database>, lessonId: string, studentId: string): Promise<number> {
  const r = await db.selectFrom('lesson_photo').select((eb) => eb.fn.countAll<number>().as('n')).where('lesson_id', '=', lessonId).where('student_id', '=', studentId).executeTakeFirstOrThrow();
  return Number(r.n);
}

export async function storePhoto(db: Kysely<Database>, lessonId: string, studentId: string, side: 'front' | 'back', photo: ProcessedPhoto): Promise<string> {
  const id = randomUUID();
  const objectKey = `photos/${id}/full.jpg`;
  const thumbKey = `photos/${id}/thumb.jpg`;
  await putObject(objectKey, photo.full, 'image/jpeg');
  await putObject(thumbKey, photo.thumb, 'image/jpeg');
  try {
    await db
      .insertInto('lesson_photo')
      .values({ id, lesson_id: lessonId, student_id: studentId, side, object_key: objectKey, thumb_key: thumbKey, width: photo.width, height: photo.height, bytes: photo.full.length })
      .execute();
  } catch (error) {
    await Promise.allSettled([deleteObject(objectKey), deleteObject(thumbKey)]);
    throw error;
  }
  return id;
}

function selectPhotos(db: Kysely<Database>) {
  return db
    .selectFrom('lesson_photo as p')
    .innerJoin('lesson as l', 'l.id', 'p.lesson_id')
    .innerJoin('account as s', 's.id', 'p.student_id')
    .select(['p.id', 'p.lesson_id', 'l.title as lesson_title', 'l.class_id', 'p.student_id', 's.display_name', 'p.side', 'p.width', 'p.height', 'p.bytes', 'p.created_at', 'p.object_key', 'p.thumb_key']);
}
type PhotoRow = Awaited<ReturnType<ReturnType<typeof selectPhotos>['executeTakeFirstOrThrow']>>;

function toPhotoJson(r: PhotoRow): PhotoJson {
  return {
    id: r.id,
    lessonId: r.lesson_id,
    lessonTitle: r.lesson_title,
    student: { id: r.student_id, displayName: r.display_name },
    side: r.side,
    width: r.width,
    height: r.height,
    bytes: r.bytes,
    createdAt: r.created_at.toISOString(),
    url: `/api/photos/${r.id}`,
    thumbUrl: `/api/photos/${r.id}?size=thumb`,
  };
}

/** Photos of a class, narrowed to one lesson and/or one student; newest first. */
export async function listPhotos(db: Kysely<Database>, filter: { classId: string; lessonId?: string; studentId?: string }): Promise<PhotoJson[]> {
  let q = selectPhotos(db).where('l.class_id', '=', filter.classId);
  if (filter.lessonId) q = q.where('p.lesson_id', '=', filter.lessonId);
  if (filter.studentId) q = q.where('p.student_id', '=', filter.studentId);
  return (await q.orderBy('p.created_at', 'desc').execute()).map(toPhotoJson);
}

export async function findPhotoRow(db: Kysely<Database>, id: string): Promise<PhotoRow | undefined> {
  return selectPhotos(db).where('p.id', '=', id).executeTakeFirst();
}

export async function deletePhoto(db: Kysely<Database>, row: PhotoRow): Promise<void> {
  await db.deleteFrom('lesson_photo').where('id', '=', row.id).execute();
  await Promise.allSettled([deleteObject(row.object_key), deleteObject(row.thumb_key)]);
}
