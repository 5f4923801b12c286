// POST /api/accounts/confirm { token } — finish a sign-up with the e-mailed link: creates the account (role
// quilter), signs it in and remembers the browser as a known device → 201 { account }. The link works once.
import type { APIRoute } from 'astro';
import { z } from 'zod';
import { db } from '@server/db.ts';
import { json, problem, readJson } from '@server/http.ts';
import { resetTokenSchema } from '@server/accounts/account.schema.ts';
import { findAccountRowById } from '@server/accounts/account.repository.ts';
import { toAccountJson } from '@server/accounts/accountJson.ts';
import { confirmSignUp, type ConfirmProblem } from '@server/accounts/signUpRequest.ts';
import { rememberThisDevice } from '@server/auth/deviceCookie.ts';
import { createSession, generateSessionToken, setSessionCookie } from '@server/auth/session.ts';
import { assertNever } from '@shared/assertNever.ts';

const confirmSchema = z.strictObject({ token: resetTokenSchema });

function message(p: ConfirmProblem): string {
  switch (p) {
    case 'unknown':
      return 'This link is not valid or has already been used. If your account exists, sign in; otherwise sign up again.';
    case 'expired':
      return 'This link has expired (links work for a day). Sign up again to get a new one.';
    case 'taken':
      return 'This e-mail address already has an account. Sign in, or reset your password if you have forgotten it.';
    default:
      return assertNever(p);
  }
}

export const POST = (async ({ request, cookies, url }) => {
  const body = await readJson(request, confirmSchema);
  if (!body.ok) return body.error;
  const created = await confirmSignUp(db, body.value.token);
  if (!created.ok) return problem(400, 'invalid_token', message(created.error), { token: message(created.error) });
  const account = created.value;
  const row = await findAccountRowById(db, account.id);
  if (!row) throw new Error(`pages/api/accounts/confirm: account ${account.id} vanished right after it was created`);
  await rememberThisDevice(db, cookies, url, { id: account.id, passwordHash: row.password_hash });
  const token = generateSessionToken();
  const session = await createSession(db, token, account.id);
  setSessionCookie(cookies, url, token, session.expiresAt);
  return json({ account: toAccountJson(account) }, 201);
}) satisfies APIRoute;
