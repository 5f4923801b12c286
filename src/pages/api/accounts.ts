// POST /api/accounts — sign up. Creates the account (role quilter) and signs it in (201 + session cookie).
import type { APIRoute } from 'astro';
import { db } from '../../server/db.ts';
import { json, problem, readJson } from '../../server/http.ts';
import { signUpSchema } from '../../server/accounts/account.schema.ts';
import { signUp } from '../../server/accounts/account.service.ts';
import { toAccountJson } from '../../server/accounts/accountJson.ts';
import { createSession, generateSessionToken, setSessionCookie } from '../../server/auth/session.ts';

export const POST = (async ({ request, cookies, url }) => {
  const body = await readJson(request, signUpSchema);
  if (!body.ok) return body.error;
  const created = await signUp(db, body.value);
  if (!created.ok) {
    return problem(409, 'conflict', 'An account with this e-mail address already exists. Sign in, or reset your password.', {
      email: 'This e-mail address is already registered.',
    });
  }
  const token = generateSessionToken();
  const session = await createSession(db, token, created.value.id);
  setSessionCookie(cookies, url, token, session.expiresAt);
  return json({ account: toAccountJson(created.value) }, 201);
}) satisfies APIRoute;
