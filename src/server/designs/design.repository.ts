// Queries on design, design_version and design_route. Every query that reads or changes one design is
// scoped by owner: a design that is not yours is the same as one that does not exist. Rules live in
// design.service.ts; rows become domain objects in designRecord.ts.
import { sql, type Kysely, type Transaction } from 'kysely';
import type { Database, DesignRouteKind, DesignRouteRow, DesignRow, DesignVersionRow } from '../../../db/schema.ts';

export type Db = Kysely<Database> | Transaction<Database>;

export interface NewDesignValues {
  ownerId: string;
  title: string;
  notes: string;
  /** Validated design JSON. */
  data: unknown;
  thumbnailSvg: string;
  summary: unknown | null;
}

export async function insertDesign(db: Db, v: NewDesignValues): Promise<DesignRow> {
  return db
    .insertInto('design')
    .values({
      owner_id: v.ownerId,
      title: v.title,
      notes: v.notes,
      data: JSON.stringify(v.data),
      thumbnail_svg: v.thumbnailSvg,
      summary: v.summary === null ? null : JSON.stringify(v.summary),
    })
    .returningAll()
    .executeTakeFirstOrThrow();
}

/** The owner's design, or undefined (also for soft-deleted ones unless `includeDeleted`). */
export async function findOwnedDesign(db: Db, ownerId: string, id: string, includeDeleted = false): Promise<DesignRow | undefined> {
  let q = db.selectFrom('design').selectAll().where('id', '=', id).where('owner_id', '=', ownerId);
  if (!includeDeleted) q = q.where('deleted_at', 'is', null);
  return q.executeTakeFirst();
}

export interface DesignChanges {
  title: string;
  notes: string;
  data: unknown;
  thumbnailSvg: string;
  summary: unknown | null;
}

/**
 * Writes a new version of a live design only if it is still at `baseVersion` (optimistic concurrency:
 * the check and the write are one statement). Undefined when the design is gone or has moved on.
 */
export async function updateDesignIfVersion(db: Db, ownerId: string, id: string, baseVersion: number, c: DesignChanges): Promise<DesignRow | undefined> {
  return db
    .updateTable('design')
    .set({
      title: c.title,
      notes: c.notes,
      data: JSON.stringify(c.data),
      thumbnail_svg: c.thumbnailSvg,
      summary: c.summary === null ? null : JSON.stringify(c.summary),
      version: sql<number>`version + 1`,
      updated_at: sql<Date>`now()`,
    })
    .where('id', '=', id)
    .where('owner_id', '=', ownerId)
    .where('deleted_at', 'is', null)
    .where('version', '=', baseVersion)
    .returningAll()
    .executeTakeFirst();
}

/** Sets or clears deleted_at on the owner's design; undefined when there is no such design. */
export async function setDesignDeleted(db: Db, ownerId: string, id: string, deleted: boolean): Promise<DesignRow | undefined> {
  return db
    .updateTable('design')
    .set({ deleted_at: deleted ? sql<Date>`coalesce(deleted_at, now())` : null })
    .where('id', '=', id)
    .where('owner_id', '=', ownerId)
    .returningAll()
    .executeTakeFirst();
}

export async function insertDesignVersion(db: Db, row: DesignRow): Promise<void> {
  await db
    .insertInto('design_version')
    .values({ design_id: row.id, version: row.version, title: row.title, notes: row.notes, data: JSON.stringify(row.data) })
    .execute();
}

/** Saved versions, newest first, without their design JSON (only line counts). */
export async function listDesignVersions(db: Db, designId: string) {
  return db
    .selectFrom('design_version')
    .select([
      'version',
      'title',
      'saved_at',
      sql<number>`jsonb_array_length(data->'lines')`.as('line_count'),
      sql<number>`jsonb_array_length(data->'seams')`.as('seam_count'),
    ])
    .where('design_id', '=', designId)
    .orderBy('version', 'desc')
    .execute();
}

export async function findDesignVersion(db: Db, designId: string, version: number): Promise<DesignVersionRow | undefined> {
  return db.selectFrom('design_version').selectAll().where('design_id', '=', designId).where('version', '=', version).executeTakeFirst();
}

export async function findDesignRoute(db: Db, designId: string): Promise<DesignRouteRow | undefined> {
  return db.selectFrom('design_route').selectAll().where('design_id', '=', designId).executeTakeFirst();
}

export interface RouteValues {
  designId: string;
  kind: DesignRouteKind;
  strokes: unknown;
  summary: unknown;
  designVersion: number;
}

/** One saved route per design: a new save replaces the old one. */
export async function upsertDesignRoute(db: Db, v: RouteValues): Promise<DesignRouteRow> {
  const values = { kind: v.kind, strokes: JSON.stringify(v.strokes), summary: JSON.stringify(v.summary), design_version: v.designVersion };
  return db
    .insertInto('design_route')
    .values({ design_id: v.designId, ...values })
    .onConflict((oc) => oc.column('design_id').doUpdateSet({ ...values, updated_at: sql<Date>`now()` }))
    .returningAll()
    .executeTakeFirstOrThrow();
}
