// Request bodies for classes, lessons, invitations and progress. Limits are stated here once.
import { z } from 'zod';
import { CLASS_CURRENCIES } from '@shared/format/money.ts';
import { calendarDate, isoInstant } from '../inputRules.ts';

// Lengths and ranges without a message of their own are worded by shared/forms/plainMessages.ts, naming the field.
const text = (max: number) => z.string().trim().min(1).max(max);

const classFields = {
  title: text(200),
  description: z.string().trim().max(5000),
  startsOn: calendarDate,
  /** Price in the currency's minor unit (cents); null or 0 = free. Students pay it through checkout. */
  priceCents: z.number().int().min(0).max(10_000_000).nullable(),
  /** One of the short list the payments offer (shared/format/money.ts); needed with a price. */
  currency: z.enum(CLASS_CURRENCIES).nullable(),
};
/** The teacher's yes to a date the server asked about (teachingDates.ts: in the past, or before the class starts). */
const confirmed = z.boolean().default(false);
export const createClassSchema = z
  .object({ ...classFields, description: classFields.description.default(''), priceCents: classFields.priceCents.default(null), currency: classFields.currency.default(null), confirmed })
  .strict();
// Written out, not createClassSchema.partial(): zod would fill the defaults and overwrite fields left out.
export const updateClassSchema = z
  .object(Object.fromEntries(Object.entries(classFields).map(([k, v]) => [k, v.optional()])) as { [K in keyof typeof classFields]: z.ZodOptional<(typeof classFields)[K]> })
  .extend({ confirmed })
  .strict();

export const NOTES_MAX = 20_000;
const lessonFields = {
  title: text(200),
  releaseAt: isoInstant,
  notes: z.string().max(NOTES_MAX),
  templateVersionId: z.uuid('Choose a template version.'),
};
export const createLessonSchema = z.object({ ...lessonFields, notes: lessonFields.notes.default(''), confirmed }).strict();
export const updateLessonSchema = z
  .object(Object.fromEntries(Object.entries(lessonFields).map(([k, v]) => [k, v.optional()])) as { [K in keyof typeof lessonFields]: z.ZodOptional<(typeof lessonFields)[K]> })
  .extend({ confirmed })
  .strict();

export const INVITATIONS_PER_REQUEST = 50;
/** Addresses are checked one by one after this (`badAddresses`), so the answer can name every one that is wrong. */
export const inviteSchema = z
  .object({
    emails: z.array(z.string().trim().max(254, 'At most 254 characters.')).min(1, 'Add at least one e-mail address.').max(INVITATIONS_PER_REQUEST, `At most ${INVITATIONS_PER_REQUEST} at once.`),
  })
  .strict();

const emailAddress = z.email();
/** The entries that are not e-mail addresses, in the order typed (empty → all good). */
export const badAddresses = (emails: readonly string[]): string[] => emails.filter((e) => !emailAddress.safeParse(e).success);

export const joinSchema = z.object({ code: z.string().trim().min(4).max(32) }).strict();

export const progressSchema = z
  .object({
    stepIndex: z.number().int().min(0).max(100_000),
    totalSteps: z.number().int().min(0).max(100_000),
    finished: z.boolean().default(false),
    /** When the student made this move (device clock); re-sent and late saves older than the stored one are ignored. */
    at: isoInstant.optional(),
  })
  .strict()
  .refine((p) => p.stepIndex <= p.totalSteps, { path: ['stepIndex'], message: 'The step is past the last step.' });
