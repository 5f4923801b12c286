// Lesson photos: stored in the object store under photos/<id>/{full,thumb}.jpg, listed from lesson_photo.
// Objects are written before the row; if the row insert fails the objects are removed again.
import { randomUUID } from 'node:crypto';
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import { deleteObject, putObject } from '../storage/objectStore.ts';
import type { ProcessedPhoto } from './photoImage.ts';
import { countStudentPhotos, deletePhotoRow, insertPhoto, listPhotoRows, type PhotoRow } from './photo.repository.ts';

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
  return countStudentPhotos(db, lessonId, studentId);
}

export async function storePhoto(db: Kysely<Database>, lessonId: string, studentId: string, side: 'front' | 'back', photo: ProcessedPhoto): Promise<string> {
  const id = randomUUID();
  const objectKey = `photos/${id}/full.jpg`;
  const thumbKey = `photos/${id}/thumb.jpg`;
  await putObject(objectKey, photo.full, 'image/jpeg');
  await putObject(thumbKey, photo.thumb, 'image/jpeg');
  try {
    await insertPhoto(db, { id, lessonId, studentId, side, objectKey, thumbKey, width: photo.width, height: photo.height, bytes: photo.full.length });
  } catch (error) {
    await Promise.allSettled([deleteObject(objectKey), deleteObject(thumbKey)]);
    throw error;
  }
  return id;
}

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
  return (await listPhotoRows(db, filter)).map(toPhotoJson);
}

export async function deletePhoto(db: Kysely<Database>, row: PhotoRow): Promise<void> {
  await deletePhotoRow(db, row.id);
  await Promise.allSettled([deleteObject(row.object_key), deleteObject(row.thumb_key)]);
}
