// /api/classes/join — POST { code }: join a class with its join code → 200 { classId, newlyJoined, next } (next: the
// page to go to). A paid class the student is not in yet starts a checkout instead: → 200 { classId, newlyJoined:
// false, checkoutUrl, next: checkoutUrl }, the payments service's page; the class opens when its webhook says paid.
// Wrong codes are rate-limited per account (the code space is large, but guessing must stay slow). The attempt is
// reserved before the lookup and given back when the code was right, so a parallel burst cannot pass the cap.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { json, problem, readJson } from '@server/http.ts';
import { requireUser } from '@server/auth/guards.ts';
import { releaseAttempt, reserveAttempt, type GateRule } from '@server/auth/attemptGate.ts';
import { rateLimitedResponse } from '@server/auth/rateLimitResponse.ts';
import { joinSchema } from '@server/classes/class.schema.ts';
import { joinByCode } from '@server/classes/class.service.ts';
import { startCheckout } from '@server/payments/payment.service.ts';
import { localeFromAcceptLanguage } from '@shared/format/dates.ts';
import { PUBLIC_ORIGIN } from 'astro:env/server';

/** 20 wrong join codes per hour per account. */
const JOIN_RULE: GateRule = { limit: 20, windowMs: 60 * 60 * 1000 };

export const POST = (async ({ locals, request, url }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const body = await readJson(request, joinSchema);
  if (!body.ok) return body.error;
  const key = `join-code:${signedIn.value.user.id}`;
  const gate = await reserveAttempt(db, { key, rule: JOIN_RULE });
  if (!gate.allowed) return rateLimitedResponse('wrong join codes', gate.retryAt);
  const joined = await joinByCode(db, signedIn.value.user, body.value.code);
  if (!joined.ok && joined.error.kind === 'unknown-code') {
    return problem(400, 'invalid_input', 'No class has that join code. Check it with your teacher.', { code: 'Unknown join code.' });
  }
  await releaseAttempt(db, key);
  if (!joined.ok && joined.error.kind === 'payment-required') {
    const locale = localeFromAcceptLanguage(request.headers.get('accept-language')) ?? null;
    const checkout = await startCheckout(db, signedIn.value.user, joined.error.cls, PUBLIC_ORIGIN ?? url.origin, locale);
    if (!checkout.ok) return problem(503, 'payments_unavailable', 'Paying for classes is not possible right now. Please try again later.');
    return json({ classId: joined.error.cls.id, newlyJoined: false, checkoutUrl: checkout.value.checkoutUrl, next: checkout.value.checkoutUrl });
  }
  if (!joined.ok) return problem(400, 'invalid_input', 'You teach this class, so you cannot join it as a student.', { code: 'This is your own class.' });
  return json({ ...joined.value, next: `/classes/${joined.value.classId}` });
}) satisfies APIRoute;
