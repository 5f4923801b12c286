// Quilts as the API takes and sends them. The quilt map itself is shared/quilt/quilt.schema.ts (the one contract for
// that shape); these are only the envelopes around it: create and save bodies, one quilt, a row of the quilts list.
import { z } from 'zod';
import { quiltSchema, QUILT_LIMITS } from '../quilt/quilt.schema.ts';
import { unitsSchema } from '../design/design.schema.ts';
import type { Wire } from './wire.ts';

const title = z.string().trim().min(1, 'Give the quilt a title.').max(200, 'Keep the title to 200 characters.');
const version = z.number({ error: 'Use a whole number.' }).int('Use a whole number.').min(1, 'Use 1 or more.').max(2_147_483_647, 'Use at most 2147483647.');
const instant = z.string();

/** POST /api/quilts. */
export const createQuiltSchema = z.object({ title, quilt: quiltSchema }).strict();
export type CreateQuiltInput = z.input<typeof createQuiltSchema>;

/** PUT /api/quilts/:id: the version this save is based on (a stale one answers 409) and what changes. */
export const updateQuiltSchema = z
  .object({ baseVersion: version, title: title.optional(), quilt: quiltSchema.optional() })
  .strict()
  .refine((b) => b.title !== undefined || b.quilt !== undefined, { message: 'Send a title or a quilt to save.' });
export type UpdateQuiltInput = z.input<typeof updateQuiltSchema>;

/** One quilt with its map (GET /api/quilts/:id, a create, a save, the `quilt` of a 409). */
export const quiltRecordSchema = z.object({
  id: z.string(),
  title: z.string(),
  version: z.number().int().positive(),
  quilt: quiltSchema,
  createdAt: instant,
  updatedAt: instant,
});
export type QuiltRecord = Wire<z.infer<typeof quiltRecordSchema>>;

/** `{ quilt }`: the answer of a read, a create or a save. */
export const quiltAnswerSchema = z.object({ quilt: quiltRecordSchema });

/** One row of the quilts list (no map). */
export const quiltListItemSchema = z.object({
  id: z.string(),
  title: z.string(),
  version: z.number().int().positive(),
  units: unitsSchema,
  rows: z.number().int().min(1).max(QUILT_LIMITS.maxRows),
  columns: z.number().int().min(1).max(QUILT_LIMITS.maxColumns),
  /** Filled cells. */
  placed: z.number().int().min(0),
  updatedAt: instant,
});
export type QuiltListItem = Wire<z.infer<typeof quiltListItemSchema>>;

/** GET /api/quilts: the owner's live quilts, most recently saved first. */
export const quiltListSchema = z.object({ quilts: z.array(quiltListItemSchema) });
export type QuiltList = Wire<z.infer<typeof quiltListSchema>>;
