// /api/payments/:id/refund — POST (the class's teacher, or an admin; anyone else 404): ask the payments service to
// refund the payment in full → 202 { state: 'refund-requested' }. The payment turns `refunded`, and the student's
// unreleased lessons close, when the service's signed charge.refunded event arrives. Not paid (pending, expired,
// already refunded) → 409.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { json, problem } from '@server/http.ts';
import { requireRole } from '@server/auth/guards.ts';
import { isUuid } from '@server/classes/classAccess.ts';
import { findManagedPayment, requestRefund } from '@server/payments/payment.service.ts';
import { assertNever } from '@shared/assertNever.ts';

export const POST = (async ({ locals, params }) => {
  const signedIn = requireRole(locals, 'teacher');
  if (!signedIn.ok) return signedIn.error;
  const id = params['id'];
  const payment = isUuid(id) ? await findManagedPayment(db, signedIn.value.user, id) : null;
  if (!payment) return problem(404, 'not_found', 'Not found.');
  const refund = await requestRefund(payment);
  if (refund.ok) return json({ state: 'refund-requested' }, 202);
  switch (refund.error.kind) {
    case 'not-refundable':
      return problem(409, 'conflict', `Only a paid payment can be refunded; this one is ${payment.state}.`);
    case 'not-configured':
    case 'service-failed':
      return problem(503, 'payments_unavailable', 'The payments service did not take the refund. Please try again later.');
    default:
      return assertNever(refund.error);
  }
}) satisfies APIRoute;
