// Queries on template and template_version. A template row carries who owns it and who may see it; every
// published version is a separate, immutable row (a database trigger refuses updates).
import { sql, type Kysely, type Selectable, type Transaction } from 'kysely';
import type { Database, Difficulty, TemplateTable, TemplateVersionTable, TemplateVisibility, UnitsPreference } from '@db/schema.ts';
import { SIZE_BUCKETS, type GalleryQuery } from './template.schema.ts';

type Db = Kysely<Database> | Transaction<Database>;
export type TemplateRow = Selectable<TemplateTable>;
export type TemplateVersionRow = Selectable<TemplateVersionTable>;

/** What one published version holds: the drawing, its route and the route's figures, plus the card text. */
export interface VersionContent {
  title: string;
  description: string;
  difficulty: Difficulty;
  motifs: string[];
  units: UnitsPreference;
  width: number;
  height: number;
  design: unknown;
  route: unknown;
  figures: unknown;
  sourceDesignId: string | null;
}

export async function insertTemplate(trx: Db, ownerId: string, visibility: TemplateVisibility, linkToken: string): Promise<TemplateRow> {
  return trx.insertInto('template').values({ owner_id: ownerId, visibility, link_token: linkToken }).returningAll().executeTakeFirstOrThrow();
}

export async function insertVersion(trx: Db, templateId: string, version: number, c: VersionContent): Promise<TemplateVersionRow> {
  return trx
    .insertInto('template_version')
    .values({
      template_id: templateId,
      version,
      title: c.title,
      description: c.description,
      difficulty: c.difficulty,
      motifs: c.motifs,
      units: c.units,
      width: c.width,
      height: c.height,
      design: JSON.stringify(c.design),
      route: JSON.stringify(c.route),
      figures: JSON.stringify(c.figures),
      source_design_id: c.sourceDesignId,
    })
    .returningAll()
    .executeTakeFirstOrThrow();
}

/** Locks the template row so two edits cannot both publish "version n+1". */
export async function lockTemplate(trx: Transaction<Database>, id: string): Promise<TemplateRow | undefined> {
  return trx.selectFrom('template').selectAll().where('id', '=', id).forUpdate().executeTakeFirst();
}

/** Moves the template to its new latest version (and visibility); the updated row. */
export async function setLatestVersion(trx: Db, id: string, latestVersion: number, visibility: TemplateVisibility): Promise<TemplateRow> {
  return trx
    .updateTable('template')
    .set({ latest_version: latestVersion, visibility, updated_at: new Date() })
    .where('id', '=', id)
    .returningAll()
    .executeTakeFirstOrThrow();
}

/** The first version with exactly this title among the owner's templates (the demo seed's idempotency key). */
export async function findOwnedVersionIdByTitle(db: Db, ownerId: string, title: string): Promise<string | undefined> {
  const row = await db
    .selectFrom('template')
    .innerJoin('template_version as tv', 'tv.template_id', 'template.id')
    .select('tv.id')
    .where('template.owner_id', '=', ownerId)
    .where('tv.title', '=', title)
    .orderBy('tv.version')
    .executeTakeFirst();
  return row?.id;
}

/** Who owns the template a version belongs to and who may see it; undefined for an unknown version. */
export async function findVersionAccess(db: Db, versionId: string): Promise<{ owner_id: string; visibility: TemplateVisibility } | undefined> {
  return db
    .selectFrom('template_version as tv')
    .innerJoin('template', 'template.id', 'tv.template_id')
    .select(['template.owner_id', 'template.visibility'])
    .where('tv.id', '=', versionId)
    .executeTakeFirst();
}

export async function findTemplate(db: Db, id: string): Promise<TemplateRow | undefined> {
  return db.selectFrom('template').selectAll().where('id', '=', id).executeTakeFirst();
}

export async function findTemplateByLink(db: Db, token: string): Promise<TemplateRow | undefined> {
  return db.selectFrom('template').selectAll().where('link_token', '=', token).executeTakeFirst();
}

export async function findVersion(db: Db, templateId: string, version: number): Promise<TemplateVersionRow | undefined> {
  return db.selectFrom('template_version').selectAll().where('template_id', '=', templateId).where('version', '=', version).executeTakeFirst();
}

export async function findVersionById(db: Db, id: string): Promise<TemplateVersionRow | undefined> {
  return db.selectFrom('template_version').selectAll().where('id', '=', id).executeTakeFirst();
}

export async function listVersionNumbers(db: Db, templateId: string): Promise<{ id: string; version: number; title: string; published_at: Date }[]> {
  return db.selectFrom('template_version').select(['id', 'version', 'title', 'published_at']).where('template_id', '=', templateId).orderBy('version', 'desc').execute();
}

function latestVersions(db: Db) {
  return db
    .selectFrom('template')
    .innerJoin('template_version as tv', (j) => j.onRef('tv.template_id', '=', 'template.id').onRef('tv.version', '=', 'template.latest_version'))
    .innerJoin('account as owner', 'owner.id', 'template.owner_id')
    .select([
      'template.id',
      'template.visibility',
      'template.latest_version',
      'template.owner_id',
      'owner.display_name as owner_name',
      'tv.id as version_id',
      'tv.title',
      'tv.description',
      'tv.difficulty',
      'tv.motifs',
      'tv.units',
      'tv.width',
      'tv.height',
      'tv.figures',
      'tv.published_at',
    ]);
}
export type TemplateCardRow = Awaited<ReturnType<ReturnType<typeof latestVersions>['executeTakeFirstOrThrow']>>;

export const GALLERY_PAGE_SIZE = 24;

/** Public templates (latest versions), filtered; newest first. */
export async function listGallery(db: Db, query: GalleryQuery): Promise<{ rows: TemplateCardRow[]; total: number }> {
  let q = latestVersions(db).where('template.visibility', '=', 'public');
  if (query.q) {
    const like = `%${query.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    q = q.where((eb) => eb.or([eb('tv.title', 'ilike', like), eb('tv.description', 'ilike', like)]));
  }
  if (query.motif) q = q.where(sql<boolean>`${query.motif} = any(tv.motifs)`);
  if (query.difficulty) q = q.where('tv.difficulty', '=', query.difficulty);
  if (query.size) {
    // The longer side in inches decides the bucket (1 in = 2.54 cm exactly).
    const side = sql<number>`greatest(tv.width, tv.height) / (case when tv.units = 'cm' then 2.54 else 1 end)`;
    const order = ['small', 'medium', 'large'] as const;
    const i = order.indexOf(query.size);
    const below = i > 0 ? SIZE_BUCKETS[order[i - 1]!].maxInches : 0;
    const upTo = SIZE_BUCKETS[query.size].maxInches;
    q = q.where(sql<boolean>`${side} > ${below}`);
    if (Number.isFinite(upTo)) q = q.where(sql<boolean>`${side} <= ${upTo}`);
  }
  const total = await q.clearSelect().select((eb) => eb.fn.countAll<number>().as('n')).executeTakeFirstOrThrow();
  const rows = await q
    .orderBy('tv.published_at', 'desc')
    .limit(GALLERY_PAGE_SIZE)
    .offset((query.page - 1) * GALLERY_PAGE_SIZE)
    .execute();
  return { rows, total: Number(total.n) };
}

export async function listOwnedTemplates(db: Db, ownerId: string): Promise<TemplateCardRow[]> {
  return latestVersions(db).where('template.owner_id', '=', ownerId).orderBy('tv.published_at', 'desc').execute();
}

export async function findTemplateCard(db: Db, id: string): Promise<TemplateCardRow | undefined> {
  return latestVersions(db).where('template.id', '=', id).executeTakeFirst();
}
