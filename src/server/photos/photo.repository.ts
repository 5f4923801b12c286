// Queries on `lesson_photo` (the rows; the images themselves are objects in the store, see photo.service.ts).
import type { Kysely, Transaction } from 'kysely';
import type { Database } from '@db/schema.ts';

type Db = Kysely<Database> | Transaction<Database>;

export async function countStudentPhotos(db: Db, lessonId: string, studentId: string): Promise<number> {
  const r = await db.selectFrom('lesson_photo').select((eb) => eb.fn.countAll<number>().as('n')).where('lesson_id', '=', lessonId).where('student_id', '=', studentId).executeTakeFirstOrThrow();
  return Number(r.n);
}

export interface NewPhotoValues {
  id: string;
  lessonId: string;
  studentId: string;
  side: 'front' | 'back';
  objectKey: string;
  thumbKey: string;
  width: number;
  height: number;
  bytes: number;
}

export async function insertPhoto(db: Db, v: NewPhotoValues): Promise<void> {
  await db
    .insertInto('lesson_photo')
    .values({ id: v.id, lesson_id: v.lessonId, student_id: v.studentId, side: v.side, object_key: v.objectKey, thumb_key: v.thumbKey, width: v.width, height: v.height, bytes: v.bytes })
    .execute();
}

function selectPhotos(db: Db) {
  return db
    .selectFrom('lesson_photo as p')
    .innerJoin('lesson as l', 'l.id', 'p.lesson_id')
    .innerJoin('account as s', 's.id', 'p.student_id')
    .select(['p.id', 'p.lesson_id', 'l.title as lesson_title', 'l.class_id', 'p.student_id', 's.display_name', 'p.side', 'p.width', 'p.height', 'p.bytes', 'p.created_at', 'p.object_key', 'p.thumb_key']);
}
/** A photo with its lesson's title and class and its student's name. */
export type PhotoRow = Awaited<ReturnType<ReturnType<typeof selectPhotos>['executeTakeFirstOrThrow']>>;

/** Photos of a class, narrowed to one lesson and/or one student; newest first. */
export async function listPhotoRows(db: Db, filter: { classId: string; lessonId?: string; studentId?: string }): Promise<PhotoRow[]> {
  let q = selectPhotos(db).where('l.class_id', '=', filter.classId);
  if (filter.lessonId) q = q.where('p.lesson_id', '=', filter.lessonId);
  if (filter.studentId) q = q.where('p.student_id', '=', filter.studentId);
  return q.orderBy('p.created_at', 'desc').execute();
}

export async function findPhotoRow(db: Db, id: string): Promise<PhotoRow | undefined> {
  return selectPhotos(db).where('p.id', '=', id).executeTakeFirst();
}

export async function deletePhotoRow(db: Db, id: string): Promise<void> {
  await db.deleteFrom('lesson_photo').where('id', '=', id).execute();
}

/** The object keys (full and thumbnail) of every photo of one lesson or of a whole class. */
export async function listPhotoKeys(db: Db, scope: { lessonId: string } | { classId: string }): Promise<{ object_key: string; thumb_key: string }[]> {
  let q = db.selectFrom('lesson_photo as p').innerJoin('lesson as l', 'l.id', 'p.lesson_id').select(['p.object_key', 'p.thumb_key']);
  q = 'lessonId' in scope ? q.where('p.lesson_id', '=', scope.lessonId) : q.where('l.class_id', '=', scope.classId);
  return q.execute();
}

/** The rows among `keys` that some photo still points at (as its full image or its thumbnail). */
export async function listPhotoKeysAmong(db: Db, keys: readonly string[]): Promise<{ object_key: string; thumb_key: string }[]> {
  if (keys.length === 0) return [];
  return db
    .selectFrom('lesson_photo')
    .select(['object_key', 'thumb_key'])
    .where((eb) => eb.or([eb('object_key', 'in', keys), eb('thumb_key', 'in', keys)]))
    .execute();
}
