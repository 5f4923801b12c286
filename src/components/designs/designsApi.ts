import { z } from 'zod';
import { designSchema, unitsSchema } from '@shared/design/design.schema.ts';

/** Sort keys the design list accepts (GET /api/designs?sort=). */
export const DESIGN_SORTS = ['title', 'updated', 'passes', 'stops', 'travel', 'thread'] as const;
export type DesignSort = (typeof DESIGN_SORTS)[number];

/** One row of the design list as the API sends it. */
export const designListItemSchema = z.object({
  id: z.string(),
  title: z.string(),
  units: unitsSchema,
  width: z.number(),
  height: z.number(),
  /** Null while a new thumbnail is being made (one from before thumbnails had a point budget). */
  thumbnailSvg: z.string().nullable(),
  updatedAt: z.string(),
  /** True while the route engine is still working out this version's figures (saves do not wait for it). */
  summaryPending: z.boolean().default(false),
  summary: z
    .object({
      passes: z.number(),
      stops: z.number(),
      travelLength: z.number(),
      thread: z.object({ totalYards: z.number() }),
    })
    .nullable(),
});
export type DesignListItem = z.infer<typeof designListItemSchema>;

export const designListSchema = z.object({
  designs: z.array(designListItemSchema),
  total: z.number().int(),
  page: z.number().int(),
  pageSize: z.number().int(),
});
export type DesignList = z.infer<typeof designListSchema>;

/** How long to wait before asking again for figures or thumbnails still being made; null when none are. */
export function pendingRefreshDelayMs(list: DesignList, round: number): number | null {
  if (!list.designs.some((d) => d.summaryPending || d.thumbnailSvg === null)) return null;
  if (round >= 20) return null; // ~2 minutes: the next visit asks again
  return Math.min(10_000, 1_500 * 1.25 ** round);
}

/** The query string of the list request. */
export function designListPath(q: { sort: DesignSort; dir: 'asc' | 'desc'; q: string; page: number }): string {
  const p = new URLSearchParams({ sort: q.sort, dir: q.dir, page: String(q.page) });
  if (q.q.trim()) p.set('q', q.q.trim());
  return `/api/designs?${p.toString()}`;
}

/** The id of a design in a create or duplicate answer (`{ design: { id } }`), or null when it is not there. */
export function createdDesignId(body: unknown): string | null {
  const parsed = z.object({ design: z.object({ id: z.string() }) }).safeParse(body);
  return parsed.success ? parsed.data.design.id : null;
}

/** One design as the workbench edits it (GET /api/designs/:id). */
export const designRecordSchema = z.object({
  id: z.string(),
  title: z.string(),
  notes: z.string(),
  version: z.number().int(),
  design: designSchema,
});
export type DesignRecord = z.infer<typeof designRecordSchema>;

/** Reads `{ design: record }` from a read, update or 409 answer; null when the shape does not match. */
export function parseDesignRecord(body: unknown): DesignRecord | null {
  const parsed = z.object({ design: designRecordSchema }).safeParse(body);
  return parsed.success ? parsed.data.design : null;
}
