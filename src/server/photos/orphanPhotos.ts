// Photo objects nobody points at. An upload writes its two objects (photos/<id>/full.jpg and thumb.jpg) before
// the lesson_photo row; a crash or a lost database connection in between leaves objects no row names, which
// nothing would ever remove. The sweep lists the bucket's photos/ objects page by page, asks the database which
// of them rows still name, and removes the others once they are older than the grace period (so an upload in
// progress, whose row is moments away, is never touched).
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import type { StoredObject } from '../storage/objectStore.ts';
import { listPhotoKeysAmong } from './photo.repository.ts';

/** An upload writes its objects and its row within seconds; a quarter of an hour is far beyond any in progress. */
export const ORPHAN_GRACE_MS = 15 * 60 * 1000;
export const PHOTO_PREFIX = 'photos/';

/** The keys of `objects` that no row names and that were last written before `cutoff`. */
export function orphanKeys(objects: readonly StoredObject[], referenced: ReadonlySet<string>, cutoff: Date): string[] {
  return objects.filter((o) => o.key.startsWith(PHOTO_PREFIX) && !referenced.has(o.key) && o.lastModified.getTime() < cutoff.getTime()).map((o) => o.key);
}

export interface ObjectStoreAccess {
  listPages(prefix: string): AsyncIterable<StoredObject[]>;
  remove(key: string): Promise<void>;
}

export interface SweepResult {
  checked: number;
  removed: number;
  failed: number;
}

export async function sweepOrphanPhotos(db: Kysely<Database>, store: ObjectStoreAccess, now = new Date()): Promise<SweepResult> {
  const cutoff = new Date(now.getTime() - ORPHAN_GRACE_MS);
  const result: SweepResult = { checked: 0, removed: 0, failed: 0 };
  for await (const page of store.listPages(PHOTO_PREFIX)) {
    result.checked += page.length;
    const keys = page.map((o) => o.key);
    const rows = await listPhotoKeysAmong(db, keys);
    const referenced = new Set(rows.flatMap((r) => [r.object_key, r.thumb_key]));
    const outcomes = await Promise.allSettled(orphanKeys(page, referenced, cutoff).map((key) => store.remove(key)));
    for (const o of outcomes) {
      if (o.status === 'fulfilled') result.removed += 1;
      else result.failed += 1;
    }
  }
  return result;
}
