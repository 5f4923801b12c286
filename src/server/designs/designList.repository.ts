// The "my designs" table query: live designs of one owner, filtered by title, sorted, paged.
// Only the columns the table shows are read (never the full design JSON). A thumbnail larger than
// LIST_THUMBNAIL_MAX_CHARS (written before thumbnails had a point budget) is not sent: it reads as null and the
// list asks for a new one.
import { sql, type RawBuilder } from 'kysely';
import type { Db } from './design.repository.ts';

import type { DesignSort } from '@shared/contract/designs.ts';
import type { Units } from '@shared/design/design.schema.ts';

export interface DesignListQuery {
  /** Case-insensitive substring of the title; '' matches all. */
  q: string;
  sort: DesignSort;
  dir: 'asc' | 'desc';
  limit: number;
  offset: number;
}

// Lengths are compared in inches so inch and cm designs sort together; thread in yards as stored.
const INCHES = sql`(case when data->>'units' = 'cm' then 2.54 else 1 end)`;
const SORT_KEYS: Record<DesignSort, RawBuilder<unknown>> = {
  title: sql`lower(title)`,
  updated: sql`updated_at`,
  created: sql`created_at`,
  passes: sql`(summary->>'passes')::int`,
  stops: sql`(summary->>'stops')::int`,
  travel: sql`((summary->>'travelLength')::float8 / ${INCHES})`,
  thread: sql`(summary->'thread'->>'totalYards')::float8`,
};

/** `%`, `_` and `\` in the search text match themselves. */
function likePattern(q: string): string {
  return `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

/** Thumbnails are ~1–8 KB since the point budget (shared/export/thumbnailLines.ts); older ones reached 2.6 MB. */
export const LIST_THUMBNAIL_MAX_CHARS = 32 * 1024;

export async function listOwnedDesigns(db: Db, ownerId: string, query: DesignListQuery) {
  let base = db.selectFrom('design').where('owner_id', '=', ownerId).where('deleted_at', 'is', null);
  if (query.q) base = base.where(sql<boolean>`title ilike ${likePattern(query.q)}`);
  const key = SORT_KEYS[query.sort];
  const dir = query.dir === 'asc' ? sql`asc` : sql`desc`;
  const [rows, count] = await Promise.all([
    base
      .select([
        'id',
        'title',
        'version',
        'summary',
        sql<boolean>`summary_version is distinct from version`.as('summary_pending'),
        sql<string | null>`case when length(thumbnail_svg) <= ${LIST_THUMBNAIL_MAX_CHARS} then thumbnail_svg end`.as('thumbnail_svg'),
        'created_at',
        'updated_at',
        sql<Units>`data->>'units'`.as('units'), // stored designs passed designSchema
        sql<number>`(data->>'width')::float8`.as('width'),
        sql<number>`(data->>'height')::float8`.as('height'),
      ])
      // Designs without figures (planner refused or timed out) go last in either direction; id breaks ties.
      .orderBy(sql`${key} ${dir} nulls last, id asc`)
      .limit(query.limit)
      .offset(query.offset)
      .execute(),
    base.select((eb) => eb.fn.countAll<number>().as('total')).executeTakeFirstOrThrow(),
  ]);
  return { rows, total: Number(count.total) };
}
