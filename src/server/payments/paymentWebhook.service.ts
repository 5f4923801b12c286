// Applies one verified webhook event, exactly once. In one transaction: the event id is recorded (an id seen
// before → nothing happens), the payment row is locked, shared/payments/paymentState.ts decides the new state and
// effects, and the enrolment changes land with it. E-mails go after the commit (the outbox's dedupe keys make them
// send-once). A refund that arrives before the completion naming its payment intent is parked, unapplied, and the
// completion applies it, so every order of events ends in the same state.
import type { Kysely, Transaction } from 'kysely';
import type Stripe from 'stripe';
import type { Database } from '@db/schema.ts';
import { applyPaymentEvent, type PaymentEffect, type PaymentEvent, type PaymentState } from '@shared/payments/paymentState.ts';
import { assertNever } from '@shared/assertNever.ts';
import { inTransaction } from '../transaction.repository.ts';
import { sendEmail } from '../mail/mailer.ts';
import {
  endEnrollmentAccess,
  enrollPaidStudent,
  findAccountContact,
  listWaitingEvents,
  lockPayment,
  lockPaymentIntent,
  markEventsApplied,
  recordPaymentEvent,
  updatePaymentState,
  type PaymentRow,
} from './payment.repository.ts';
import { mapWebhookEvent } from './webhookEvent.ts';
import { receiptEmail, refundEmail } from './paymentEmails.ts';

export type WebhookOutcome = 'applied' | 'duplicate' | 'ignored' | 'waiting';

interface Applied {
  outcome: WebhookOutcome;
  payment?: PaymentRow;
  effects: PaymentEffect[];
  paidAt?: Date;
  refundedAt?: Date;
}

/** Folds events into the payment's state and writes the result and the enrolment effects on `trx`. */
async function applyToPayment(trx: Transaction<Database>, payment: PaymentRow, events: readonly PaymentEvent[], paymentIntentId: string | null): Promise<Applied> {
  let state: PaymentState = payment.state;
  const effects: PaymentEffect[] = [];
  let paidAt: Date | undefined;
  let refundedAt: Date | undefined;
  for (const e of events) {
    const step = applyPaymentEvent(state, e);
    if (step.state === 'paid' && state !== 'paid') paidAt = new Date(e.at);
    if (step.state === 'refunded' && state !== 'refunded') refundedAt = new Date(e.at);
    state = step.state;
    effects.push(...step.effects);
  }
  await updatePaymentState(trx, payment.id, { state, paymentIntentId, ...(paidAt && { paidAt }), ...(refundedAt && { refundedAt }) });
  for (const effect of effects) {
    if (payment.class_id === null) break; // the class was deleted: nothing left to open or close
    switch (effect.kind) {
      case 'grant-access':
        await enrollPaidStudent(trx, payment.class_id, payment.student_id);
        break;
      case 'end-access':
        await endEnrollmentAccess(trx, payment.class_id, payment.student_id, new Date(effect.at));
        break;
      case 'send-receipt':
      case 'send-refund-notice':
        break; // after the commit
      default:
        assertNever(effect);
    }
  }
  return { outcome: 'applied', payment, effects, ...(paidAt && { paidAt }), ...(refundedAt && { refundedAt }) };
}

async function applyInTransaction(trx: Transaction<Database>, event: Stripe.Event): Promise<Applied> {
  const occurredAt = new Date(event.created * 1000);
  const mapped = mapWebhookEvent(event);
  if (!mapped) {
    const fresh = await recordPaymentEvent(trx, { eventId: event.id, type: event.type, paymentId: null, paymentIntentId: null, occurredAt, applied: true });
    return { outcome: fresh ? 'ignored' : 'duplicate', effects: [] };
  }
  const { ref } = mapped;
  if (ref.paymentIntentId) await lockPaymentIntent(trx, ref.paymentIntentId);
  const payment = ref.paymentId !== null ? await lockPayment(trx, { id: ref.paymentId }) : await lockPayment(trx, { paymentIntentId: ref.paymentIntentId });
  if (!payment) {
    // A refund before its completion waits for it; a checkout event for no payment of ours is kept and ignored.
    const waiting = ref.paymentId === null;
    const fresh = await recordPaymentEvent(trx, { eventId: event.id, type: event.type, paymentId: null, paymentIntentId: ref.paymentIntentId, occurredAt, applied: !waiting });
    return { outcome: !fresh ? 'duplicate' : waiting ? 'waiting' : 'ignored', effects: [] };
  }
  const fresh = await recordPaymentEvent(trx, { eventId: event.id, type: event.type, paymentId: payment.id, paymentIntentId: ref.paymentIntentId, occurredAt, applied: true });
  if (!fresh) return { outcome: 'duplicate', effects: [] };
  const events: PaymentEvent[] = [mapped.event];
  if (mapped.event.kind === 'checkout-completed' && ref.paymentIntentId) {
    const parked = await listWaitingEvents(trx, ref.paymentIntentId);
    events.push(...parked.map((p): PaymentEvent => ({ kind: 'refunded', at: p.occurred_at.getTime() })));
    await markEventsApplied(trx, parked.map((p) => p.event_id), payment.id);
  }
  return applyToPayment(trx, payment, events, ref.paymentIntentId);
}

/** Applies the event and sends the e-mails its effects ask for. `origin`: the site's address for links. */
export async function handleWebhookEvent(db: Kysely<Database>, event: Stripe.Event, origin: string): Promise<WebhookOutcome> {
  const done = await inTransaction(db, (trx) => applyInTransaction(trx, event));
  const payment = done.payment;
  if (!payment || done.effects.length === 0) return done.outcome;
  const contact = await findAccountContact(db, payment.student_id);
  if (!contact) return done.outcome;
  const facts = { id: payment.id, classTitle: payment.class_title, amount: payment.amount, currency: payment.currency, locale: payment.locale };
  for (const effect of done.effects) {
    if (effect.kind === 'send-receipt') {
      await sendEmail(db, receiptEmail(contact.email, contact.display_name, facts, done.paidAt ?? new Date(), `${origin}/classes/${payment.class_id ?? ''}`));
    } else if (effect.kind === 'send-refund-notice') {
      await sendEmail(db, refundEmail(contact.email, contact.display_name, facts, done.refundedAt ?? new Date()));
    }
  }
  return done.outcome;
}
