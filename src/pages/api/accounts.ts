// POST /api/accounts — sign up. Always 202 with the same message, whether or not the address already has an
// account: a new address is e-mailed a link that creates the account (POST /api/accounts/confirm), a registered
// one a note to its owner (src/server/accounts/signUpRequest.ts). Limited per client address and per e-mail.
import type { APIRoute } from 'astro';
import { PUBLIC_ORIGIN } from 'astro:env/server';
import { db } from '@server/db.ts';
import { json, readJson } from '@server/http.ts';
import { signUpSchema } from '@server/accounts/account.schema.ts';
import { SIGN_UP_VALID_HOURS, pruneSignUpRequests, requestSignUp } from '@server/accounts/signUpRequest.ts';
import { reserveAll } from '@server/auth/attemptGate.ts';
import { signUpGates } from '@server/auth/authLimits.ts';
import { rateLimitedResponse } from '@server/auth/rateLimitResponse.ts';
import { clientIp } from '@server/clientIp.ts';

export const POST = (async (context) => {
  const body = await readJson(context.request, signUpSchema);
  if (!body.ok) return body.error;
  const gate = await reserveAll(db, signUpGates(clientIp(context), body.value.email));
  if (!gate.allowed) return rateLimitedResponse('sign-up requests', gate.retryAt);
  await requestSignUp(db, body.value, PUBLIC_ORIGIN ?? context.url.origin);
  if (Math.random() < 0.01) await pruneSignUpRequests(db);
  return json(
    { message: `Check your inbox: we sent you a link to finish creating your account. It works for ${SIGN_UP_VALID_HOURS} hours.` },
    202,
  );
}) satisfies APIRoute;
