// Request shapes for /api/designs/… (zod). Designs themselves go through the shared designSchema, so the
// server and the workbench refuse the same things (non-finite numbers, far-away points, 1-point lines, caps).
import { z } from 'zod';
import { DESIGN_LIMITS, designInputSchema, designSchema } from '@shared/design/design.schema.ts';
import { planSettingsSchema } from '@shared/route/planSettings.ts';
import type { BodyLimit } from '../http.ts';
import { pgInt } from '../inputRules.ts';
import { isStorableText, UNSTORABLE_MESSAGE } from '../storableText.ts';
import { designSortSchema } from '@shared/contract/designs.ts';

/** Largest request body a design endpoint reads. A design at DESIGN_LIMITS.maxPoints (200,000 points) is
 * about 3–4 MB of JSON, so 5 MiB leaves room for the rest of the body; larger gets 413 saying both limits. */
export const DESIGN_BODY_LIMIT: BodyLimit = {
  bytes: 5 * 1024 * 1024,
  hint:
    `A design may have at most ${DESIGN_LIMITS.maxPoints.toLocaleString('en-US')} points in ${DESIGN_LIMITS.maxLines.toLocaleString('en-US')} lines ` +
    '(fewer when coordinates carry many decimals). Split it into smaller blocks or simplify its curves.',
};

const title = z.string().trim().min(1, 'Give the design a title.').max(200, 'Keep the title to 200 characters.');
const notes = z.string().max(10_000, 'Keep notes to 10,000 characters.');
const version = pgInt(1);

// New and saved drawings meet the input rules (batting spacing range, quilting lines inside the block); drafts sent
// for a check or plan only need to be readable: the planner clips lines to the block itself.
export const createDesignSchema = z.object({ title, notes: notes.default(''), design: designInputSchema }).strict();

export const updateDesignSchema = z
  .object({ baseVersion: version, title: title.optional(), notes: notes.optional(), design: designInputSchema.optional() })
  .strict()
  .refine((b) => b.title !== undefined || b.notes !== undefined || b.design !== undefined, { message: 'Send a title, notes or design to save.' });
export type UpdateDesignInput = z.infer<typeof updateDesignSchema>;

export const baseVersionSchema = z.object({ baseVersion: version }).strict();

/** Optional unsaved draft: the workbench checks or plans what is on screen before it is saved. */
export const draftSchema = z.object({ design: designSchema.optional() }).strict();

/** Plan request: an optional draft and optional planner settings (time budget, extra stops, hidden-end allowance). */
export const planRequestSchema = z.object({ design: designSchema.optional(), settings: planSettingsSchema.optional() }).strict();

export const saveRouteSchema = z.discriminatedUnion('kind', [
  /** Keep the planner's route: the server plans the saved design again (same input, same route). */
  z.object({ kind: z.literal('planned'), designVersion: version }).strict(),
  /** Keep the quilter's own route: polylines in stitching order (checked against the block like the design's lines). */
  z.object({ kind: z.literal('own'), designVersion: version, route: z.array(z.unknown()).min(1, 'Draw at least one stroke.') }).strict(),
]);

/** Query of GET /api/designs; paged like the other lists (page from 1, pageSize up to 100). */
export const listQuerySchema = z.strictObject({
  q: z.string().trim().max(200, 'Use at most 200 characters.').refine(isStorableText, UNSTORABLE_MESSAGE).default(''),
  sort: designSortSchema.default('updated'),
  /** Default: newest first for dates; A→Z for titles; fewest first for figures. */
  dir: z.enum(['asc', 'desc']).optional(),
  page: z.coerce.number().int('Page must be a whole number.').min(1, 'Page starts at 1.').max(10_000).default(1),
  pageSize: z.coerce.number().int('Page size must be a whole number.').min(1).max(100, 'At most 100 per page.').default(25),
});

export const idParamSchema = z.uuid();
export const versionParamSchema = z.coerce.number().int().positive().max(2_147_483_647);
