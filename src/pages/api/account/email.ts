// PUT /api/account/email — change the sign-in e-mail (current password required). A notice goes to
// the old address, so a hijacked session cannot quietly move the account.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { json, problem, readJson } from '@server/http.ts';
import { emailChangeSchema } from '@server/accounts/account.schema.ts';
import { changeEmail } from '@server/accounts/account.service.ts';
import { toAccountJson } from '@server/accounts/accountJson.ts';
import { requireUser } from '@server/auth/guards.ts';
import { sendEmail } from '@server/mail/mailer.ts';
import { emailChangedNotice } from '@server/mail/accountEmails.ts';

export const PUT = (async ({ locals, request }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const body = await readJson(request, emailChangeSchema);
  if (!body.ok) return body.error;
  const result = await changeEmail(db, signedIn.value.user.id, body.value);
  if (!result.ok) {
    if (result.error.kind === 'wrong-password') {
      return problem(400, 'invalid_credentials', 'The current password is not right.', { currentPassword: 'The current password is not right.' });
    }
    return problem(409, 'conflict', 'Another account already uses this e-mail address.', { email: 'This e-mail address is already registered.' });
  }
  const { account, previousEmail } = result.value;
  if (previousEmail.toLowerCase() !== account.email.toLowerCase()) {
    await sendEmail(db, emailChangedNotice(previousEmail, account.displayName, account.email));
  }
  return json({ account: toAccountJson(account) });
}) satisfies APIRoute;
