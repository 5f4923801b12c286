// What a verified payments-service event means for us. The signature proved who sent it; its shape is still
// checked here (only the fields we read) before anything trusts it. Events we do not use map to null.
import { z } from 'zod';
import type Stripe from 'stripe';
import type { PaymentEvent } from '@shared/payments/paymentState.ts';

const idOf = z.union([z.string(), z.object({ id: z.string() }).transform((o) => o.id)]);
const sessionSchema = z.object({
  id: z.string(),
  client_reference_id: z.string().nullable().optional(),
  payment_status: z.string(),
  payment_intent: idOf.nullable().optional(),
});
const chargeSchema = z.object({
  payment_intent: idOf.nullable().optional(),
  refunded: z.boolean(),
  amount: z.number().int(),
  amount_refunded: z.number().int(),
});

/** Which payment an event is about: our id (we put it in client_reference_id) or the service's payment intent. */
export type PaymentRef = { readonly paymentId: string; readonly paymentIntentId: string | null } | { readonly paymentId: null; readonly paymentIntentId: string };

export interface MappedEvent {
  readonly ref: PaymentRef;
  readonly event: PaymentEvent;
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** The payment event in a service event, or null for an event (or a state of one) that changes no payment. */
export function mapWebhookEvent(event: Stripe.Event): MappedEvent | null {
  const at = event.created * 1000;
  switch (event.type) {
    case 'checkout.session.completed':
    case 'checkout.session.expired': {
      const s = sessionSchema.safeParse(event.data.object);
      if (!s.success || !s.data.client_reference_id || !UUID.test(s.data.client_reference_id)) return null;
      const ref = { paymentId: s.data.client_reference_id, paymentIntentId: s.data.payment_intent ?? null };
      if (event.type === 'checkout.session.expired') return { ref, event: { kind: 'checkout-expired', at } };
      // A card checkout is paid when it completes; a delayed method would complete 'unpaid' and is not offered.
      return s.data.payment_status === 'paid' ? { ref, event: { kind: 'checkout-completed', at } } : null;
    }
    case 'charge.refunded': {
      const c = chargeSchema.safeParse(event.data.object);
      // Only a full refund ends access; the teacher's refund button always refunds in full.
      if (!c.success || !c.data.payment_intent || !c.data.refunded || c.data.amount_refunded < c.data.amount) return null;
      return { ref: { paymentId: null, paymentIntentId: c.data.payment_intent }, event: { kind: 'refunded', at } };
    }
    default:
      return null;
  }
}
