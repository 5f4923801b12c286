// Input rules for account data. Every string is capped, Unicode-normalised (NFC) and checked for
// characters that have no place in it. Field names here are the API's JSON field names.
import { z } from 'zod';

export const EMAIL_MAX = 254;
export const DISPLAY_NAME_MAX = 80;
export const PASSWORD_MIN = 10;
export const PASSWORD_MAX = 256;

// C0/C1 controls, lone surrogates, and the invisible bidi/format characters that can disguise a name.
const FORBIDDEN_IN_TEXT = /[\p{Cc}\p{Cs}\u200B-\u200F\u202A-\u202E\u2060-\u2064\u2066-\u2069\uFEFF]/u;
const LONE_SURROGATE = /\p{Cs}/u;

const nfc = (s: string) => s.normalize('NFC');

export const emailSchema = z
  .string({ error: 'Enter your e-mail address.' })
  .max(EMAIL_MAX, `Use at most ${EMAIL_MAX} characters.`)
  .transform((s) => nfc(s).trim())
  .pipe(z.email({ error: 'Enter an e-mail address like name@example.org.' }).max(EMAIL_MAX));

export const displayNameSchema = z
  .string({ error: 'Enter a display name.' })
  .max(DISPLAY_NAME_MAX * 2, `Use at most ${DISPLAY_NAME_MAX} characters.`)
  .transform((s) => nfc(s).trim().replace(/\s+/gu, ' '))
  .pipe(
    z
      .string()
      .min(1, 'Enter a display name.')
      .max(DISPLAY_NAME_MAX, `Use at most ${DISPLAY_NAME_MAX} characters.`)
      .refine((s) => !FORBIDDEN_IN_TEXT.test(s), 'Remove control or invisible characters from the name.'),
  );

/** Passwords are not trimmed; NFC makes the same password typed on different systems match. */
export const newPasswordSchema = z
  .string({ error: 'Enter a password.' })
  .max(PASSWORD_MAX, `Use at most ${PASSWORD_MAX} characters.`)
  .refine((s) => !LONE_SURROGATE.test(s), 'The password contains an invalid character.')
  .transform(nfc)
  .refine((s) => [...s].length >= PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters.`);

/** A password being checked (sign-in, current password): any length up to the cap. */
export const passwordSchema = z
  .string({ error: 'Enter your password.' })
  .min(1, 'Enter your password.')
  .max(PASSWORD_MAX, `Use at most ${PASSWORD_MAX} characters.`)
  .refine((s) => !LONE_SURROGATE.test(s), 'The password contains an invalid character.')
  .transform(nfc);

export const unitsSchema = z.enum(['in', 'cm'], { error: 'Choose inches (in) or centimetres (cm).' });
export const roleSchema = z.enum(['quilter', 'teacher', 'admin'], { error: 'Choose quilter, teacher or admin.' });

export const signUpSchema = z.strictObject({
  email: emailSchema,
  displayName: displayNameSchema,
  password: newPasswordSchema,
  units: unitsSchema.default('in'),
});

export const signInSchema = z.strictObject({ email: emailSchema, password: passwordSchema });

export const resetRequestSchema = z.strictObject({ email: emailSchema });

/** Reset tokens are the 32-character base32 strings this server hands out. */
export const resetTokenSchema = z.string({ error: 'The reset link is missing its token.' }).regex(/^[a-z2-7]{32}$/, 'This reset link is not valid.');

export const resetConfirmSchema = z.strictObject({ token: resetTokenSchema, password: newPasswordSchema });

export const profileUpdateSchema = z
  .strictObject({ displayName: displayNameSchema.optional(), units: unitsSchema.optional() })
  .refine((v) => v.displayName !== undefined || v.units !== undefined, { error: 'Send displayName or units.', path: ['body'] });

export const passwordChangeSchema = z.strictObject({ currentPassword: passwordSchema, newPassword: newPasswordSchema });

export const emailChangeSchema = z.strictObject({ currentPassword: passwordSchema, email: emailSchema });

export const roleChangeSchema = z.strictObject({ role: roleSchema });

export const accountIdSchema = z.uuid({ error: 'Not a valid account id.' });

export const accountListQuerySchema = z.strictObject({
  q: z
    .string()
    .max(100, 'Use at most 100 characters.')
    .transform((s) => nfc(s).trim())
    .refine((s) => !FORBIDDEN_IN_TEXT.test(s), 'Remove control characters from the search.')
    .default(''),
  page: z.coerce.number({ error: 'Page must be a whole number.' }).int('Page must be a whole number.').min(1, 'Page starts at 1.').max(10_000).default(1),
  pageSize: z.coerce.number({ error: 'Page size must be a whole number.' }).int('Page size must be a whole number.').min(1).max(100, 'At most 100 per page.').default(25),
});
