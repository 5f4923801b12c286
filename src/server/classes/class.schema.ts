// Request bodies for classes, lessons, invitations and progress. Limits are stated here once.
import { z } from 'zod';
import { calendarDate, isoInstant } from '../inputRules.ts';

// Lengths and ranges without a message of their own are worded by shared/forms/plainMessages.ts, naming the field.
const text = (max: number) => z.string().trim().min(1).max(max);

const classFields = {
  title: text(200),
  description: z.string().trim().max(5000),
  startsOn: calendarDate,
  /** Price in the smallest currency unit (cents); kept for a later payments feature. Null = free. */
  priceCents: z.number().int().min(0).max(10_000_000).nullable(),
  currency: z.string().regex(/^[A-Z]{3}$/, 'A three-letter currency code, e.g. USD.').nullable(),
};
export const createClassSchema = z
  .object({ ...classFields, description: classFields.description.default(''), priceCents: classFields.priceCents.default(null), currency: classFields.currency.default(null) })
  .strict();
// Written out, not createClassSchema.partial(): zod would fill the defaults and overwrite fields left out.
export const updateClassSchema = z
  .object(Object.fromEntries(Object.entries(classFields).map(([k, v]) => [k, v.optional()])) as { [K in keyof typeof classFields]: z.ZodOptional<(typeof classFields)[K]> })
  .strict();

export const NOTES_MAX = 20_000;
const lessonFields = {
  title: text(200),
  releaseAt: isoInstant,
  notes: z.string().max(NOTES_MAX),
  templateVersionId: z.uuid('Choose a template version.'),
};
export const createLessonSchema = z.object({ ...lessonFields, notes: lessonFields.notes.default('') }).strict();
export const updateLessonSchema = z
  .object(Object.fromEntries(Object.entries(lessonFields).map(([k, v]) => [k, v.optional()])) as { [K in keyof typeof lessonFields]: z.ZodOptional<(typeof lessonFields)[K]> })
  .strict();

export const INVITATIONS_PER_REQUEST = 50;
export const inviteSchema = z
  .object({
    emails: z.array(z.email({ error: (issue) => `Address ${Number(issue.path?.at(-1) ?? 0) + 1} is not an e-mail address, like name@example.org.` }).max(254)).min(1, 'Add at least one e-mail address.').max(INVITATIONS_PER_REQUEST, `At most ${INVITATIONS_PER_REQUEST} at once.`),
  })
  .strict();

export const joinSchema = z.object({ code: z.string().trim().min(4).max(32) }).strict();

export const progressSchema = z
  .object({
    stepIndex: z.number().int().min(0).max(100_000),
    totalSteps: z.number().int().min(0).max(100_000),
    finished: z.boolean().default(false),
  })
  .strict()
  .refine((p) => p.stepIndex <= p.totalSteps, { path: ['stepIndex'], message: 'The step is past the last step.' });
