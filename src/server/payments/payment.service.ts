// Starting a checkout for a paid class, refunding a payment, and who may see which payments. The payments service
// takes the card on its own page; our server only ever holds the checkout's id and, once paid, its payment intent.
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import { err, ok, type Result } from '@shared/result.ts';
import { isRefundable } from '@shared/payments/paymentState.ts';
import { hasRole } from '../auth/guards.ts';
import type { SessionUser } from '../auth/session.ts';
import { paymentsClient } from './paymentsClient.ts';
import { findPaymentById, insertPayment, setCheckoutSession, updatePaymentState, type PaymentRow } from './payment.repository.ts';

export type PaymentsError = { kind: 'not-configured' } | { kind: 'service-failed'; message: string };

export interface PaidClass {
  id: string;
  title: string;
  teacherId: string;
  priceCents: number;
  currency: string;
}

/**
 * A pending payment and a hosted checkout for it. The checkout comes back to `/payments/return` (which waits for
 * the webhook), or to the classes page when the student cancels. `locale`: the student's, for the receipt.
 */
export async function startCheckout(
  db: Kysely<Database>,
  student: SessionUser,
  cls: PaidClass,
  origin: string,
  locale: string | null,
): Promise<Result<{ paymentId: string; checkoutUrl: string }, PaymentsError>> {
  const sdk = paymentsClient();
  if (!sdk) return err({ kind: 'not-configured' });
  const paymentId = await insertPayment(db, { classId: cls.id, teacherId: cls.teacherId, classTitle: cls.title, studentId: student.id, amount: cls.priceCents, currency: cls.currency, locale });
  try {
    const session = await sdk.checkout.sessions.create(
      {
        mode: 'payment',
        line_items: [{ quantity: 1, price_data: { currency: cls.currency.toLowerCase(), unit_amount: cls.priceCents, product_data: { name: `Class: ${cls.title}` } } }],
        client_reference_id: paymentId,
        metadata: { payment_id: paymentId, class_id: cls.id },
        customer_email: student.email,
        success_url: `${origin}/payments/return?session_id={CHECKOUT_SESSION_ID}`,
        cancel_url: `${origin}/classes?checkout=cancelled`,
      },
      { idempotencyKey: `checkout:${paymentId}` },
    );
    if (!session.url) throw new Error('the checkout has no page address');
    await setCheckoutSession(db, paymentId, session.id);
    return ok({ paymentId, checkoutUrl: session.url });
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    console.error(`[payments] checkout for payment ${paymentId} failed: ${message}`);
    await updatePaymentState(db, paymentId, { state: 'expired' });
    return err({ kind: 'service-failed', message });
  }
}

/** The payment when the user may manage it (its class's teacher, still a teacher, or an admin); else null → 404. */
export async function findManagedPayment(db: Kysely<Database>, user: SessionUser, paymentId: string): Promise<PaymentRow | null> {
  const payment = await findPaymentById(db, paymentId);
  if (!payment) return null;
  if (user.role === 'admin') return payment;
  return payment.teacher_id === user.id && hasRole(user, 'teacher') ? payment : null;
}

export type RefundError = PaymentsError | { kind: 'not-refundable' };

/**
 * Asks the payments service to refund the payment in full. The state changes when the service's charge.refunded
 * event arrives (paymentWebhook.service.ts), not here, so a refund made on the service's own dashboard takes the
 * same path. The idempotency key makes a double click one refund.
 */
export async function requestRefund(payment: PaymentRow): Promise<Result<void, RefundError>> {
  if (!isRefundable(payment.state) || !payment.payment_intent_id) return err({ kind: 'not-refundable' });
  const sdk = paymentsClient();
  if (!sdk) return err({ kind: 'not-configured' });
  try {
    await sdk.refunds.create({ payment_intent: payment.payment_intent_id, metadata: { payment_id: payment.id } }, { idempotencyKey: `refund:${payment.id}` });
    return ok(undefined);
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    console.error(`[payments] refund of payment ${payment.id} failed: ${message}`);
    return err({ kind: 'service-failed', message });
  }
}
