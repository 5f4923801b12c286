// POST /api/password-resets/confirm — set a new password with an e-mailed token. The token works once,
// within its hour; afterwards every session of the account is signed out.
import type { APIRoute } from 'astro';
import { db } from '../../../server/db.ts';
import { json, problem, readJson } from '../../../server/http.ts';
import { resetConfirmSchema } from '../../../server/accounts/account.schema.ts';
import { hashPassword } from '../../../server/auth/password.ts';
import { consumePasswordReset, type ResetTokenError } from '../../../server/auth/passwordReset.ts';
import { assertNever } from '../../../../shared/assertNever.ts';

function tokenMessage(e: ResetTokenError): string {
  switch (e) {
    case 'unknown':
      return 'This reset link is not valid. Ask for a new one.';
    case 'expired':
      return 'This reset link has expired (links work for one hour). Ask for a new one.';
    case 'used':
      return 'This reset link has already been used. Ask for a new one if you still need it.';
    default:
      return assertNever(e);
  }
}

export const POST = (async ({ request }) => {
  const body = await readJson(request, resetConfirmSchema);
  if (!body.ok) return body.error;
  const result = await consumePasswordReset(db, body.value.token, await hashPassword(body.value.password));
  if (!result.ok) return problem(400, 'invalid_token', tokenMessage(result.error), { token: tokenMessage(result.error) });
  return json({ message: 'Your password is changed. Sign in with the new one.' });
}) satisfies APIRoute;
