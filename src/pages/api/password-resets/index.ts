// POST /api/password-resets — ask for a reset link. Always 202, whether or not the e-mail has an
// account, so the answer does not reveal who is registered. Limited per client address and per e-mail
// (authLimits.ts), reserved before anything is sent, so rotating X-Forwarded-For or a parallel burst gains nothing.
import type { APIRoute } from 'astro';
import { PUBLIC_ORIGIN } from 'astro:env/server';
import { db } from '@server/db.ts';
import { json, readJson } from '@server/http.ts';
import { resetRequestSchema } from '@server/accounts/account.schema.ts';
import { findAccountRowByEmail } from '@server/accounts/account.repository.ts';
import { RESET_VALID_MINUTES, createPasswordReset } from '@server/auth/passwordReset.ts';
import { reserveAll } from '@server/auth/attemptGate.ts';
import { resetGates } from '@server/auth/authLimits.ts';
import { rateLimitedResponse } from '@server/auth/rateLimitResponse.ts';
import { clientIp } from '@server/clientIp.ts';
import { sendEmail } from '@server/mail/mailer.ts';
import { passwordResetEmail } from '@server/mail/accountEmails.ts';

export const POST = (async (context) => {
  const body = await readJson(context.request, resetRequestSchema);
  if (!body.ok) return body.error;
  const { email } = body.value;
  const gate = await reserveAll(db, resetGates(clientIp(context), email));
  if (!gate.allowed) return rateLimitedResponse('password-reset requests', gate.retryAt);
  const account = await findAccountRowByEmail(db, email);
  if (account) {
    const token = await createPasswordReset(db, account.id);
    const link = new URL(`/reset-password?token=${token}`, PUBLIC_ORIGIN ?? context.url.origin).href;
    // Not awaited: the answer must not take longer for a registered address. sendEmail records failures itself.
    void sendEmail(db, passwordResetEmail(account.email, account.display_name, link, RESET_VALID_MINUTES)).catch((error: unknown) => {
      console.error('[password-reset] could not queue the e-mail:', error);
    });
  }
  return json({ message: 'If that address has a Threadway account, a reset link is on its way. It works for one hour.' }, 202);
}) satisfies APIRoute;
