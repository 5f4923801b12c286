// Request bodies and query strings for templates.
import { z } from 'zod';
import type { Units } from '@shared/design/design.schema.ts';
import { formatLength } from '@shared/units/units.ts';
import { pgInt } from '../inputRules.ts';
import { isStorableText, UNSTORABLE_MESSAGE } from '../storableText.ts';

export const difficultySchema = z.enum(['beginner', 'intermediate', 'advanced']);
export const visibilitySchema = z.enum(['public', 'class', 'unlisted']);

const motif = z.string().trim().toLowerCase().min(1).max(40).regex(/^[\p{L}\p{N} -]+$/u, 'Letters, digits, spaces and dashes only.');

export const publishTemplateSchema = z
  .object({
    /** The teacher's own design; its saved route and figures are copied into the published version. */
    designId: z.uuid('Choose one of your designs.'),
    title: z.string().trim().min(1).max(200),
    description: z.string().trim().max(5000).default(''),
    difficulty: difficultySchema,
    motifs: z.array(motif).max(12, 'At most 12 motif tags.').default([]),
    visibility: visibilitySchema,
  })
  .strict();

/** A new version: any field left out is taken from the latest version; without designId the drawing stays.
 *  (Written out rather than `.partial()`: zod would still fill the defaults above and wipe kept fields.) */
export const newVersionSchema = z
  .object({
    designId: z.uuid('Choose one of your designs.').optional(),
    title: z.string().trim().min(1).max(200).optional(),
    description: z.string().trim().max(5000).optional(),
    difficulty: difficultySchema.optional(),
    motifs: z.array(motif).max(12, 'At most 12 motif tags.').optional(),
    visibility: visibilitySchema.optional(),
  })
  .strict();

export const SIZE_BUCKETS = {
  small: { maxInches: 8 },
  medium: { maxInches: 14 },
  large: { maxInches: Infinity },
} as const;
export type SizeBucket = keyof typeof SIZE_BUCKETS;

/** A size bucket's label in the viewer's units ("up to 8 in", "20.3–35.6 cm"). */
export function sizeBucketLabel(bucket: SizeBucket, viewer: Units): string {
  const side = (inches: number) => formatLength(inches, 'in', viewer).replace(/ (in|cm|m)$/, '');
  const unit = viewer;
  if (bucket === 'small') return `up to ${side(SIZE_BUCKETS.small.maxInches)} ${unit}`;
  if (bucket === 'medium') return `${side(SIZE_BUCKETS.small.maxInches)}–${side(SIZE_BUCKETS.medium.maxInches)} ${unit}`;
  return `over ${side(SIZE_BUCKETS.medium.maxInches)} ${unit}`;
}

export const galleryQuerySchema = z.object({
  q: z.string().trim().max(100).refine(isStorableText, UNSTORABLE_MESSAGE).optional(),
  motif: motif.optional(),
  difficulty: difficultySchema.optional(),
  size: z.enum(['small', 'medium', 'large']).optional(),
  page: z.coerce.number().int().min(1).max(1000).default(1),
});
export type GalleryQuery = z.infer<typeof galleryQuerySchema>;

export const copySchema = z.object({ version: pgInt(1).optional() }).strict();
