// Queries on quilt. Every query that reads or changes one quilt is scoped by owner: a quilt that is not yours is
// the same as one that does not exist. Rules live in quilt.service.ts.
import { sql, type Kysely, type Transaction } from 'kysely';
import type { Database, QuiltRow } from '@db/schema.ts';

export type Db = Kysely<Database> | Transaction<Database>;

/** The owner's live quilts, most recently saved first (at most `limit`). */
export async function listOwnedQuilts(db: Db, ownerId: string, limit: number): Promise<QuiltRow[]> {
  return db
    .selectFrom('quilt')
    .selectAll()
    .where('owner_id', '=', ownerId)
    .where('deleted_at', 'is', null)
    .orderBy('updated_at', 'desc')
    .orderBy('id')
    .limit(limit)
    .execute();
}

/** The owner's live quilt, or undefined. */
export async function findOwnedQuilt(db: Db, ownerId: string, id: string): Promise<QuiltRow | undefined> {
  return db.selectFrom('quilt').selectAll().where('id', '=', id).where('owner_id', '=', ownerId).where('deleted_at', 'is', null).executeTakeFirst();
}

export async function insertQuilt(db: Db, v: { ownerId: string; title: string; dataJson: string }): Promise<QuiltRow> {
  return db.insertInto('quilt').values({ owner_id: v.ownerId, title: v.title, data: v.dataJson }).returningAll().executeTakeFirstOrThrow();
}

/**
 * Writes a new version of a live quilt only if it is still at `baseVersion` (the check and the write are one
 * statement, so a racing save gets the conflict). Undefined when the quilt is gone or has moved on.
 */
export async function updateQuiltIfVersion(db: Db, ownerId: string, id: string, baseVersion: number, c: { title: string; dataJson: string }): Promise<QuiltRow | undefined> {
  return db
    .updateTable('quilt')
    .set({ title: c.title, data: c.dataJson, version: sql<number>`version + 1`, updated_at: sql<Date>`now()` })
    .where('id', '=', id)
    .where('owner_id', '=', ownerId)
    .where('deleted_at', 'is', null)
    .where('version', '=', baseVersion)
    .returningAll()
    .executeTakeFirst();
}

/** Soft-deletes the owner's live quilt; undefined when there is none. */
export async function softDeleteQuilt(db: Db, ownerId: string, id: string): Promise<QuiltRow | undefined> {
  return db
    .updateTable('quilt')
    .set({ deleted_at: sql<Date>`now()` })
    .where('id', '=', id)
    .where('owner_id', '=', ownerId)
    .where('deleted_at', 'is', null)
    .returningAll()
    .executeTakeFirst();
}

/** Which of these design ids are the owner's live designs (ids must already be uuids). */
export async function liveOwnedDesignIds(db: Db, ownerId: string, ids: readonly string[]): Promise<Set<string>> {
  if (ids.length === 0) return new Set();
  const rows = await db.selectFrom('design').select('id').where('owner_id', '=', ownerId).where('deleted_at', 'is', null).where('id', 'in', [...ids]).execute();
  return new Set(rows.map((r) => r.id));
}

/** The owner's live designs among these ids, with their version and drawing as JSON text (ids must be uuids). */
export async function liveOwnedDesignTexts(db: Db, ownerId: string, ids: readonly string[]): Promise<{ id: string; version: number; data_json: string }[]> {
  if (ids.length === 0) return [];
  return db
    .selectFrom('design')
    .select(['id', 'version', sql<string>`data::text`.as('data_json')])
    .where('owner_id', '=', ownerId)
    .where('deleted_at', 'is', null)
    .where('id', 'in', [...ids])
    .execute();
}

/** Size, units and version of the owner's live designs among these ids (ids must be uuids): enough to check a fit. */
export async function liveOwnedDesignShapes(db: Db, ownerId: string, ids: readonly string[]): Promise<{ id: string; version: number; units: string; width: number; height: number }[]> {
  if (ids.length === 0) return [];
  return db
    .selectFrom('design')
    .select(['id', 'version', sql<string>`data->>'units'`.as('units'), sql<number>`(data->>'width')::float8`.as('width'), sql<number>`(data->>'height')::float8`.as('height')])
    .where('owner_id', '=', ownerId)
    .where('deleted_at', 'is', null)
    .where('id', 'in', [...ids])
    .execute();
}

/** A live quilt by id, whoever owns it (for a planning worker, which has the owner from its job row). */
export async function findLiveQuilt(db: Db, id: string): Promise<QuiltRow | undefined> {
  return db.selectFrom('quilt').selectAll().where('id', '=', id).where('deleted_at', 'is', null).executeTakeFirst();
}

/** Versions of the owner's live designs among these ids (ids must be uuids); reads no drawing, so it stays cheap. */
export async function liveOwnedDesignVersions(db: Db, ownerId: string, ids: readonly string[]): Promise<{ id: string; version: number }[]> {
  if (ids.length === 0) return [];
  return db.selectFrom('design').select(['id', 'version']).where('owner_id', '=', ownerId).where('deleted_at', 'is', null).where('id', 'in', [...ids]).execute();
}
