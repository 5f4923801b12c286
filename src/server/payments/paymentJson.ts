// Payment rows as the API and pages show them. Amounts stay in minor units with their currency; the viewer's side
// formats them (shared/format/money.ts).
import type { PaymentListRow, PaymentRow, PaymentTotalRow } from './payment.repository.ts';

export function toPaymentJson(p: PaymentListRow) {
  return {
    id: p.id,
    classId: p.class_id,
    classTitle: p.class_title,
    student: { displayName: p.student_name, email: p.student_email },
    amount: p.amount,
    currency: p.currency,
    state: p.state,
    createdAt: p.created_at.toISOString(),
    paidAt: p.paid_at?.toISOString() ?? null,
    refundedAt: p.refunded_at?.toISOString() ?? null,
  };
}

export function toTotalJson(t: PaymentTotalRow) {
  return {
    classId: t.class_id,
    classTitle: t.class_title,
    currency: t.currency,
    paidCount: t.paid_count,
    paidAmount: t.paid_amount,
    refundedCount: t.refunded_count,
    refundedAmount: t.refunded_amount,
  };
}

/** A student's own receipt: what they paid for and when, never anyone else's. */
export function toReceiptJson(p: PaymentRow) {
  return {
    id: p.id,
    classId: p.class_id,
    classTitle: p.class_title,
    amount: p.amount,
    currency: p.currency,
    state: p.state,
    paidAt: p.paid_at?.toISOString() ?? null,
    refundedAt: p.refunded_at?.toISOString() ?? null,
  };
}
