// /api/payments/receipts — GET (anyone signed in): the signed-in student's own paid and refunded payments.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { json } from '@server/http.ts';
import { requireUser } from '@server/auth/guards.ts';
import { listStudentPayments } from '@server/payments/payment.repository.ts';
import { toReceiptJson } from '@server/payments/paymentJson.ts';

export const GET = (async ({ locals }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  return json({ receipts: (await listStudentPayments(db, signedIn.value.user.id)).map(toReceiptJson) });
}) satisfies APIRoute;
