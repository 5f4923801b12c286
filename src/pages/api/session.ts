// /api/session — GET: who is signed in (401 when nobody); POST: sign in; DELETE: sign out.
import type { APIRoute } from 'astro';
import { db } from '../../server/db.ts';
import { json, problem, readJson } from '../../server/http.ts';
import { signInSchema } from '../../server/accounts/account.schema.ts';
import { checkCredentials } from '../../server/accounts/account.service.ts';
import { toAccountJson } from '../../server/accounts/accountJson.ts';
import { requireUser } from '../../server/auth/guards.ts';
import { SIGN_IN_ACCOUNT_RULE, SIGN_IN_RULE, checkRateLimit, clearRateLimit, consumeRateLimit } from '../../server/auth/rateLimit.ts';
import { rateLimitedResponse } from '../../server/auth/rateLimitResponse.ts';
import { createSession, deleteSessionCookie, generateSessionToken, invalidateSession, setSessionCookie } from '../../server/auth/session.ts';
import { clientIp } from '../../server/clientIp.ts';

export const GET = (({ locals }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  return json({ account: toAccountJson(signedIn.value.user), expiresAt: signedIn.value.session.expiresAt.toISOString() });
}) satisfies APIRoute;

export const POST = (async (context) => {
  const body = await readJson(context.request, signInSchema);
  if (!body.ok) return body.error;
  const { email, password } = body.value;
  // Only failed attempts count, so a guild member signing in often is never locked out.
  const limits = [
    { key: `sign-in:${clientIp(context)}:${email.toLowerCase()}`, rule: SIGN_IN_RULE },
    { key: `sign-in-account:${email.toLowerCase()}`, rule: SIGN_IN_ACCOUNT_RULE },
  ];
  for (const { key, rule } of limits) {
    const gate = await checkRateLimit(db, key, rule);
    if (!gate.allowed) return rateLimitedResponse('sign-in attempts', gate.retryAt);
  }
  const account = await checkCredentials(db, email, password);
  if (!account.ok) {
    for (const { key, rule } of limits) await consumeRateLimit(db, key, rule);
    return problem(401, 'invalid_credentials', 'That e-mail and password do not match an account.');
  }
  for (const { key } of limits) await clearRateLimit(db, key);
  const token = generateSessionToken();
  const session = await createSession(db, token, account.value.id);
  setSessionCookie(context.cookies, context.url, token, session.expiresAt);
  return json({ account: toAccountJson(account.value) });
}) satisfies APIRoute;

export const DELETE = (async ({ locals, cookies, url }) => {
  if (locals.session) await invalidateSession(db, locals.session.id);
  deleteSessionCookie(cookies, url);
  return new Response(null, { status: 204 });
}) satisfies APIRoute;
