// /api/classes/join — POST { code }: join a class with its join code → 200 { classId, newlyJoined }.
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

/** 20 wrong join codes per hour per account. */
const JOIN_RULE: GateRule = { limit: 20, windowMs: 60 * 60 * 1000 };

export const POST = (async ({ locals, request }) => {
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
  if (!joined.ok) return problem(400, 'invalid_input', 'You teach this class, so you cannot join it as a student.', { code: 'This is your own class.' });
  return json(joined.value);
}) satisfies APIRoute;
