// /api/invitations/:token/sign-up — POST { displayName, email, password, units? }: create an account for the address
// the invitation was sent to, sign it in and join the class → 201 { classId, account }. Any other address is
// refused (sign up on /sign-up, then open the link again). Limited like sign-up (authLimits.ts).
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { json, problem, readJson } from '@server/http.ts';
import { signUpSchema } from '@server/accounts/account.schema.ts';
import { toAccountJson } from '@server/accounts/accountJson.ts';
import { reserveAll } from '@server/auth/attemptGate.ts';
import { signUpGates } from '@server/auth/authLimits.ts';
import { rememberThisDevice } from '@server/auth/deviceCookie.ts';
import { rateLimitedResponse } from '@server/auth/rateLimitResponse.ts';
import { createSession, generateSessionToken, setSessionCookie } from '@server/auth/session.ts';
import { invitationProblemResponse } from '@server/classes/invitationErrors.ts';
import { signUpFromInvitation } from '@server/classes/invitationSignUp.ts';
import { clientIp } from '@server/clientIp.ts';

export const POST = (async (context) => {
  const body = await readJson(context.request, signUpSchema);
  if (!body.ok) return body.error;
  const gate = await reserveAll(db, signUpGates(clientIp(context), body.value.email));
  if (!gate.allowed) return rateLimitedResponse('sign-up requests', gate.retryAt);
  const created = await signUpFromInvitation(db, context.params['token'] ?? '', body.value);
  if (!created.ok) {
    const p = created.error;
    if (p.kind === 'other-email') {
      const message = `This invitation is for ${p.invited}. To use another address, sign up on the sign-up page, then open this link again.`;
      return problem(400, 'invalid_input', message, { email: message });
    }
    if (p.kind === 'email-taken') {
      const message = 'This e-mail address already has an account. Sign in, then open this link again to join.';
      return problem(409, 'conflict', message, { email: message });
    }
    return invitationProblemResponse(p);
  }
  const { account, passwordHash, classId } = created.value;
  await rememberThisDevice(db, context.cookies, context.url, { id: account.id, passwordHash });
  const token = generateSessionToken();
  const session = await createSession(db, token, account.id);
  setSessionCookie(context.cookies, context.url, token, session.expiresAt);
  return json({ classId, account: toAccountJson(account) }, 201);
}) satisfies APIRoute;
