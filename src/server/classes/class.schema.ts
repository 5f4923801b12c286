// Request bodies for classes, lessons, invitations and progress. Limits are stated here once.
import { z } from 'zod';

const text = (max: number) => z.string().trim().min(1, 'Required.').max(max, `At most ${max} characters.`);
const isoDate = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'Use a date like 2027-01-15.').refine((s) => !Number.isNaN(Date.parse(`${s}T00:00:00Z`)), 'Not a real date.');

export const createClassSchema = z
  .object({
    title: text(200),
    description: z.string().trim().max(5000, 'At most 5000 characters.').default(''),
    startsOn: isoDate,
    /** Price in the smallest currency unit (cents); kept for a later payments feature. Null or absent = free. */
    priceCents: z.number().int().min(0).max(10_000_000).nullable().default(null),
    currency: z.string().regex(/^[A-Z]{3}$/, 'A three-letter currency code, e.g. USD.').nullable().default(null),
  })
  .strict();
export const updateClassSchema = createClassSchema.partial().strict();

export const NOTES_MAX = 20_000;
export const createLessonSchema = z
  .object({
    title: text(200),
    releaseAt: z.iso.datetime({ offset: true, message: 'Use an ISO date and time, e.g. 2027-01-15T09:00:00Z.' }),
    notes: z.string().max(NOTES_MAX, `At most ${NOTES_MAX} characters.`).default(''),
    templateVersionId: z.uuid('Choose a template version.'),
  })
  .strict();
export const updateLessonSchema = createLessonSchema.partial().strict();

export const INVITATIONS_PER_REQUEST = 50;
export const inviteSchema = z
  .object({
    emails: z.array(z.email('Not an e-mail address.').max(254)).min(1, 'Add at least one e-mail address.').max(INVITATIONS_PER_REQUEST, `At most ${INVITATIONS_PER_REQUEST} at once.`),
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
