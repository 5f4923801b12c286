// /api/session — GET: who is signed in (401 when nobody); POST: sign in; DELETE: sign out.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { json, problem, readJson } from '@server/http.ts';
import { signInSchema } from '@server/accounts/account.schema.ts';
import { toAccountJson } from '@server/accounts/accountJson.ts';
import { requireUser } from '@server/auth/guards.ts';
import { DEVICE_COOKIE } from '@server/auth/knownDevice.ts';
import { setDeviceCookie } from '@server/auth/deviceCookie.ts';
import { rateLimitedResponse } from '@server/auth/rateLimitResponse.ts';
import { attemptSignIn } from '@server/auth/signInAttempt.ts';
import { createSession, deleteSessionCookie, generateSessionToken, invalidateSession, setSessionCookie } from '@server/auth/session.ts';
import { clientIp } from '@server/clientIp.ts';

const ACCOUNT_HINT =
  'This account has had many wrong passwords from devices it has not been used on. Sign in from a device you have signed in from before, or reset your password by e-mail (that also lets this device in).';

export const GET = (({ locals }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  return json({ account: toAccountJson(signedIn.value.user), expiresAt: signedIn.value.session.expiresAt.toISOString() });
}) satisfies APIRoute;

export const POST = (async (context) => {
  const body = await readJson(context.request, signInSchema);
  if (!body.ok) return body.error;
  const attempt = await attemptSignIn(db, {
    ...body.value,
    address: clientIp(context),
    deviceCookie: context.cookies.get(DEVICE_COOKIE)?.value,
  });
  if (!attempt.ok) {
    if (attempt.error.kind === 'invalid-credentials') return problem(401, 'invalid_credentials', 'That e-mail and password do not match an account.');
    return rateLimitedResponse('sign-in attempts', attempt.error.retryAt, new Date(), attempt.error.scope === 'account' ? ACCOUNT_HINT : undefined);
  }
  setDeviceCookie(context.cookies, context.url, attempt.value.deviceCookie);
  const token = generateSessionToken();
  const session = await createSession(db, token, attempt.value.account.id);
  setSessionCookie(context.cookies, context.url, token, session.expiresAt);
  return json({ account: toAccountJson(attempt.value.account) });
}) satisfies APIRoute;

export const DELETE = (async ({ locals, cookies, url }) => {
  if (locals.session) await invalidateSession(db, locals.session.id);
  deleteSessionCookie(cookies, url);
  return new Response(null, { status: 204 });
}) satisfies APIRoute;
