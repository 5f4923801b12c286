// mapWebhookEvent: which service events change a payment, and how. Event shapes follow the service's API reference
// for checkout.session and charge objects (from memory; the fields read are the ones the local fake sends too).
import { describe, expect, it } from 'vitest';
import type Stripe from 'stripe';
import { mapWebhookEvent } from './webhookEvent.ts';

const PAYMENT = '0b6f1f9e-5a2d-4c1e-9f3a-2d7c8e1b4a60';
const event = (type: string, object: Record<string, unknown>, created = 1_765_000_000) => ({ id: 'evt_1', object: 'event', type, created, data: { object } }) as unknown as Stripe.Event;

describe('mapWebhookEvent', () => {
  it('a paid completion names our payment and its payment intent; the instant is the event’s own (ms)', () => {
    expect(mapWebhookEvent(event('checkout.session.completed', { id: 'cs_1', client_reference_id: PAYMENT, payment_status: 'paid', payment_intent: 'pi_1' }))).toEqual({
      ref: { paymentId: PAYMENT, paymentIntentId: 'pi_1' },
      event: { kind: 'checkout-completed', at: 1_765_000_000_000 },
    });
  });
  it('reads an expanded payment intent object by its id', () => {
    const mapped = mapWebhookEvent(event('checkout.session.completed', { id: 'cs_1', client_reference_id: PAYMENT, payment_status: 'paid', payment_intent: { id: 'pi_2' } }));
    expect(mapped?.ref.paymentIntentId).toBe('pi_2');
  });
  it('an unpaid completion, a session without our reference, and a partial refund change nothing', () => {
    expect(mapWebhookEvent(event('checkout.session.completed', { id: 'cs_1', client_reference_id: PAYMENT, payment_status: 'unpaid', payment_intent: null }))).toBeNull();
    expect(mapWebhookEvent(event('checkout.session.completed', { id: 'cs_1', client_reference_id: 'not-ours', payment_status: 'paid' }))).toBeNull();
    expect(mapWebhookEvent(event('charge.refunded', { payment_intent: 'pi_1', refunded: false, amount: 4500, amount_refunded: 1000 }))).toBeNull();
  });
  it('a full refund names only the payment intent; an expiry names our payment', () => {
    expect(mapWebhookEvent(event('charge.refunded', { payment_intent: 'pi_1', refunded: true, amount: 4500, amount_refunded: 4500 }))).toEqual({
      ref: { paymentId: null, paymentIntentId: 'pi_1' },
      event: { kind: 'refunded', at: 1_765_000_000_000 },
    });
    expect(mapWebhookEvent(event('checkout.session.expired', { id: 'cs_1', client_reference_id: PAYMENT, payment_status: 'unpaid', payment_intent: null }))?.event.kind).toBe('checkout-expired');
  });
  it('events of other types and malformed objects map to null', () => {
    expect(mapWebhookEvent(event('customer.created', {}))).toBeNull();
    expect(mapWebhookEvent(event('charge.refunded', { payment_intent: 'pi_1' }))).toBeNull();
  });
});
