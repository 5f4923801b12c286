// Designs as the API sends them: one design (read, save, 409), a row of the designs table, the saved route, and the
// design list's sort keys.
import { z } from 'zod';
import { designSchema, unitsSchema } from '../design/design.schema.ts';
import { checkResultSchema } from './check.ts';
import { problemDetailSchema } from './errors.ts';
import { designSummarySchema, savedRouteSummarySchema } from './figures.ts';
import { strokePathsSchema } from './strokes.ts';
import type { Wire } from './wire.ts';

/** Sort keys of the designs table (GET /api/designs?sort=): dates newest first, titles A→Z, figures fewest first. */
export const DESIGN_SORTS = ['title', 'updated', 'created', 'passes', 'stops', 'travel', 'thread'] as const;
export const designSortSchema = z.enum(DESIGN_SORTS);
export type DesignSort = z.infer<typeof designSortSchema>;

const version = z.number().int().positive();
const instant = z.string();

/** One design with its drawing (GET /api/designs/:id, a save, the `design` of a 409). */
export const designRecordSchema = z.object({
  id: z.string(),
  title: z.string(),
  notes: z.string(),
  version,
  design: designSchema,
  /** The planner's figures of this version; null while pending or when the planner refused the drawing. */
  summary: designSummarySchema.nullable(),
  /** True while this version's figures are still being computed (saves do not wait for the planner). */
  summaryPending: z.boolean(),
  createdAt: instant,
  updatedAt: instant,
});
export type DesignRecord = Wire<z.infer<typeof designRecordSchema>>;

/** `{ design }`: the answer of a read, a create or a save. */
export const designAnswerSchema = z.object({ design: designRecordSchema });

/**
 * PUT /api/designs/:id?check=1: the saved version and the route check of its drawing in one answer. When the engine
 * cannot check the drawing (it refuses it, or is busy), `check` is null and `checkError` says why; the save stands.
 */
export const savedWithCheckAnswerSchema = z.object({
  design: designRecordSchema,
  check: checkResultSchema.nullable(),
  checkError: problemDetailSchema.nullable(),
});
export type SavedWithCheckAnswer = Wire<z.infer<typeof savedWithCheckAnswerSchema>>;

/** One row of the designs table (no drawing). */
export const designListItemSchema = z.object({
  id: z.string(),
  title: z.string(),
  version,
  units: unitsSchema,
  width: z.number(),
  height: z.number(),
  summary: designSummarySchema.nullable(),
  summaryPending: z.boolean(),
  /** Null while a new thumbnail is being made (one from before thumbnails had a point budget). */
  thumbnailSvg: z.string().nullable(),
  createdAt: instant,
  updatedAt: instant,
});
export type DesignListItem = Wire<z.infer<typeof designListItemSchema>>;

/** GET /api/designs. */
export const designListSchema = z.object({
  designs: z.array(designListItemSchema),
  total: z.number().int(),
  page: z.number().int(),
  pageSize: z.number().int(),
  sort: designSortSchema,
  dir: z.enum(['asc', 'desc']),
  q: z.string(),
});
export type DesignList = Wire<z.infer<typeof designListSchema>>;

/** The route kept with a design: the planner's or the quilter's own, for one saved version. */
export const savedRouteSchema = z.object({
  kind: z.enum(['planned', 'own']),
  designVersion: version,
  /** False once the design was saved again after this route was computed. */
  current: z.boolean(),
  strokes: strokePathsSchema,
  summary: savedRouteSummarySchema,
  createdAt: instant,
  updatedAt: instant,
});
export type SavedRoute = Wire<z.infer<typeof savedRouteSchema>>;

/** GET/PUT /api/designs/:id/route. */
export const savedRouteAnswerSchema = z.object({ route: savedRouteSchema.nullable() });
export type SavedRouteAnswer = Wire<z.infer<typeof savedRouteAnswerSchema>>;
