// /api/payments — GET (teachers: payments for the classes they teach; admins: every class) → { payments, totals }:
// the newest 500 payments, and per class and currency the count and sum kept (paid) and refunded, in minor units.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { json } from '@server/http.ts';
import { requireRole } from '@server/auth/guards.ts';
import { listPaymentsFor, listPaymentTotals } from '@server/payments/payment.repository.ts';
import { toPaymentJson, toTotalJson } from '@server/payments/paymentJson.ts';

export const GET = (async ({ locals }) => {
  const signedIn = requireRole(locals, 'teacher');
  if (!signedIn.ok) return signedIn.error;
  const { user } = signedIn.value;
  const scope = user.role === 'admin' ? null : user.id;
  const [payments, totals] = await Promise.all([listPaymentsFor(db, scope, 500), listPaymentTotals(db, scope)]);
  return json({ payments: payments.map(toPaymentJson), totals: totals.map(toTotalJson) });
}) satisfies APIRoute;
