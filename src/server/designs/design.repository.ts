// Queries on design, design_version and design_route. Every query that reads or changes one design is
// scoped by owner: a design that is not yours is the same as one that does not exist. Rules live in
// design.service.ts; rows become domain objects in designRecord.ts.
import { sql, type Kysely, type Transaction } from 'kysely';
import type { Database, DesignRouteKind, DesignRouteRow, DesignRow, DesignVersionRow } from '@db/schema.ts';
import type { DesignSummary, SavedRouteSummary } from '@shared/contract/figures.ts';
import type { StrokePath } from '@shared/contract/strokes.ts';

export type Db = Kysely<Database> | Transaction<Database>;

/**
 * A design row as the app handles it: the drawing comes as JSON text (`data_json`, PostgreSQL's jsonb::text),
 * never parsed by pg on the request thread. designPayload.ts validates it (in a worker when it is heavy).
 */
export type DesignRecordRow = Omit<DesignRow, 'data'> & { readonly data_json: string };

const RECORD_COLUMNS = [
  'id',
  'owner_id',
  'title',
  'notes',
  'thumbnail_svg',
  'version',
  'summary',
  'summary_version',
  'created_at',
  'updated_at',
  'deleted_at',
  'copied_from_template_version_id',
  sql<string>`data::text`.as('data_json'),
] as const;

export interface NewDesignValues {
  ownerId: string;
  title: string;
  notes: string;
  /** Validated design as JSON text. */
  dataJson: string;
  thumbnailSvg: string;
  summary: DesignSummary | null;
  /** True when `summary` belongs to this drawing (else the figures are computed after the save). */
  summaryCurrent: boolean;
  /** The template version this design was copied from, or null. */
  copiedFromTemplateVersionId: string | null;
}

export async function insertDesign(db: Db, v: NewDesignValues): Promise<DesignRecordRow> {
  return db
    .insertInto('design')
    .values({
      owner_id: v.ownerId,
      title: v.title,
      notes: v.notes,
      data: v.dataJson,
      thumbnail_svg: v.thumbnailSvg,
      summary: v.summary === null ? null : JSON.stringify(v.summary),
      summary_version: v.summaryCurrent ? 1 : null,
      copied_from_template_version_id: v.copiedFromTemplateVersionId,
    })
    .returning(RECORD_COLUMNS)
    .executeTakeFirstOrThrow();
}

/** The owner's design, or undefined (also for soft-deleted ones unless `includeDeleted`). */
export async function findOwnedDesign(db: Db, ownerId: string, id: string, includeDeleted = false): Promise<DesignRecordRow | undefined> {
  let q = db.selectFrom('design').select(RECORD_COLUMNS).where('id', '=', id).where('owner_id', '=', ownerId);
  if (!includeDeleted) q = q.where('deleted_at', 'is', null);
  return q.executeTakeFirst();
}

/** The id of the owner's live design with exactly this title, if any (the demo seed's idempotency key). */
export async function findLiveDesignIdByTitle(db: Db, ownerId: string, title: string): Promise<string | undefined> {
  const row = await db
    .selectFrom('design')
    .select('id')
    .where('owner_id', '=', ownerId)
    .where('title', '=', title)
    .where('deleted_at', 'is', null)
    .executeTakeFirst();
  return row?.id;
}

/** The owner's live design's drawing (parsed jsonb) with its saved route, if any, and the version that route belongs to. */
export async function findOwnedDesignWithRoute(db: Db, ownerId: string, designId: string) {
  return db
    .selectFrom('design')
    .leftJoin('design_route', 'design_route.design_id', 'design.id')
    .select(['design.data', 'design.version', 'design_route.strokes', 'design_route.summary', 'design_route.design_version as route_version'])
    .where('design.id', '=', designId)
    .where('design.owner_id', '=', ownerId)
    .where('design.deleted_at', 'is', null)
    .executeTakeFirst();
}

/** The owner's live designs whose saved route belongs to their current version (they can be published), newest first. */
export async function listPublishableDesigns(db: Db, ownerId: string, limit: number): Promise<{ id: string; title: string }[]> {
  return db
    .selectFrom('design')
    .innerJoin('design_route', 'design_route.design_id', 'design.id')
    .select(['design.id', 'design.title'])
    .where('design.owner_id', '=', ownerId)
    .where('design.deleted_at', 'is', null)
    .whereRef('design_route.design_version', '=', 'design.version')
    .orderBy('design.updated_at', 'desc')
    .limit(limit)
    .execute();
}

export interface DesignChanges {
  title: string;
  notes: string;
  /** A new drawing (validated JSON text and its thumbnail), or null to keep the current one and its figures. */
  drawing: { readonly dataJson: string; readonly thumbnailSvg: string } | null;
}

/**
 * Writes a new version of a live design only if it is still at `baseVersion` (optimistic concurrency:
 * the check and the write are one statement). Undefined when the design is gone or has moved on.
 * A new drawing clears the figures (computed after the save); otherwise current figures stay current.
 */
export async function updateDesignIfVersion(db: Db, ownerId: string, id: string, baseVersion: number, c: DesignChanges): Promise<DesignRecordRow | undefined> {
  const drawing = c.drawing
    ? { data: c.drawing.dataJson, thumbnail_svg: c.drawing.thumbnailSvg, summary: null, summary_version: null }
    : { summary_version: sql<number | null>`case when summary_version = version then version + 1 else summary_version end` };
  return db
    .updateTable('design')
    .set({
      title: c.title,
      notes: c.notes,
      ...drawing,
      version: sql<number>`version + 1`,
      updated_at: sql<Date>`now()`,
    })
    .where('id', '=', id)
    .where('owner_id', '=', ownerId)
    .where('deleted_at', 'is', null)
    .where('version', '=', baseVersion)
    .returning(RECORD_COLUMNS)
    .executeTakeFirst();
}

/** Sets or clears deleted_at on the owner's design; undefined when there is no such design. */
export async function setDesignDeleted(db: Db, ownerId: string, id: string, deleted: boolean): Promise<DesignRecordRow | undefined> {
  return db
    .updateTable('design')
    .set({ deleted_at: deleted ? sql<Date>`coalesce(deleted_at, now())` : null })
    .where('id', '=', id)
    .where('owner_id', '=', ownerId)
    .returning(RECORD_COLUMNS)
    .executeTakeFirst();
}

/** Copies the design's current row into its history (inside PostgreSQL: the drawing never comes back here). */
export async function insertDesignVersion(db: Db, designId: string): Promise<void> {
  await db
    .insertInto('design_version')
    .columns(['design_id', 'version', 'title', 'notes', 'data'])
    .expression(db.selectFrom('design').select(['id', 'version', 'title', 'notes', 'data']).where('id', '=', designId))
    .execute();
}

/** Writes figures computed after a save, only if the design is still at that version; false when it moved on. */
export async function setDesignSummary(db: Db, id: string, version: number, summary: DesignSummary | null): Promise<boolean> {
  const r = await db
    .updateTable('design')
    .set({ summary: summary === null ? null : JSON.stringify(summary), summary_version: version })
    .where('id', '=', id)
    .where('version', '=', version)
    .executeTakeFirst();
  return r.numUpdatedRows > 0n;
}

/** Replaces the list thumbnail of the design at that version (a rebuilt one); false when it moved on. */
export async function setDesignThumbnail(db: Db, id: string, version: number, thumbnailSvg: string): Promise<boolean> {
  const r = await db.updateTable('design').set({ thumbnail_svg: thumbnailSvg }).where('id', '=', id).where('version', '=', version).executeTakeFirst();
  return r.numUpdatedRows > 0n;
}

/** The drawing of one version of a design as JSON text, or undefined when that version is not current. */
export async function findDesignText(db: Db, id: string, version: number): Promise<{ owner_id: string; data_json: string } | undefined> {
  return db
    .selectFrom('design')
    .select(['owner_id', sql<string>`data::text`.as('data_json')])
    .where('id', '=', id)
    .where('version', '=', version)
    .where('deleted_at', 'is', null)
    .executeTakeFirst();
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

/** One saved version, its drawing as JSON text (see DesignRecordRow). */
export type DesignVersionRecordRow = Omit<DesignVersionRow, 'data'> & { readonly data_json: string };

export async function findDesignVersion(db: Db, designId: string, version: number): Promise<DesignVersionRecordRow | undefined> {
  return db
    .selectFrom('design_version')
    .select(['design_id', 'version', 'title', 'notes', 'saved_at', sql<string>`data::text`.as('data_json')])
    .where('design_id', '=', designId)
    .where('version', '=', version)
    .executeTakeFirst();
}

export async function findDesignRoute(db: Db, designId: string): Promise<DesignRouteRow | undefined> {
  return db.selectFrom('design_route').selectAll().where('design_id', '=', designId).executeTakeFirst();
}

export interface RouteValues {
  designId: string;
  kind: DesignRouteKind;
  strokes: readonly StrokePath[];
  summary: SavedRouteSummary;
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
