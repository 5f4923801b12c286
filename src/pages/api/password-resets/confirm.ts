// POST /api/password-resets/confirm — set a new password with an e-mailed token. The token works once,
// within its hour; afterwards every session and every other reset link of the account has ended. The browser
// that used the link becomes a known device of the account (it proved the mailbox; see knownDevice.ts), which
// is the way back in when strangers have slowed sign-ins to the account down.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { json, problem, readJson } from '@server/http.ts';
import { resetConfirmSchema } from '@server/accounts/account.schema.ts';
import { hashPassword } from '@server/auth/password.ts';
import { rememberThisDevice } from '@server/auth/deviceCookie.ts';
import { consumePasswordReset, type ResetTokenError } from '@server/auth/passwordReset.ts';
import { assertNever } from '@shared/assertNever.ts';

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

export const POST = (async ({ request, cookies, url }) => {
  const body = await readJson(request, resetConfirmSchema);
  if (!body.ok) return body.error;
  const passwordHash = await hashPassword(body.value.password);
  const result = await consumePasswordReset(db, body.value.token, passwordHash);
  if (!result.ok) return problem(400, 'invalid_token', tokenMessage(result.error), { token: tokenMessage(result.error) });
  await rememberThisDevice(db, cookies, url, { id: result.value.accountId, passwordHash });
  return json({ message: 'Your password is changed. Sign in with the new one.' });
}) satisfies APIRoute;
