// The life of one class payment as a small pure state machine. The payments service delivers webhook events at
// least once and in no promised order, so every (state, event) pair has an answer, and the answers are chosen so
// that any order of the same events ends in the same state (paymentState.test.ts checks every permutation):
//   pending ──completed──▶ paid ──refunded──▶ refunded
//      │                    ▲
//      └──expired──▶ expired┘ (a completion that arrives after a stale expiry still counts: the money was taken)
// A refund seen before its completion ends in `refunded` without ever opening the class; a completion or expiry
// seen after a refund changes nothing. Access is granted at most once and ended only after it was granted.
import { assertNever } from '../assertNever.ts';

export const PAYMENT_STATES = ['pending', 'paid', 'refunded', 'expired'] as const;
export type PaymentState = (typeof PAYMENT_STATES)[number];

/** What a verified webhook event means for one payment. `at` is the event's own instant (ms since epoch). */
export type PaymentEvent =
  | { readonly kind: 'checkout-completed'; readonly at: number }
  | { readonly kind: 'checkout-expired'; readonly at: number }
  | { readonly kind: 'refunded'; readonly at: number };

/** What the server must do because of a transition; nothing else changes outside the payment row. */
export type PaymentEffect =
  | { readonly kind: 'grant-access' }
  | { readonly kind: 'send-receipt' }
  /** Lessons released after `at` (ms since epoch) are closed to the student; released ones stay theirs. */
  | { readonly kind: 'end-access'; readonly at: number }
  | { readonly kind: 'send-refund-notice' };

export interface PaymentStep {
  readonly state: PaymentState;
  readonly effects: readonly PaymentEffect[];
}

const stay = (state: PaymentState): PaymentStep => ({ state, effects: [] });

/** The state after `event`, and the effects of that transition (none when the event changes nothing). */
export function applyPaymentEvent(state: PaymentState, event: PaymentEvent): PaymentStep {
  switch (event.kind) {
    case 'checkout-completed':
      return state === 'pending' || state === 'expired' ? { state: 'paid', effects: [{ kind: 'grant-access' }, { kind: 'send-receipt' }] } : stay(state);
    case 'checkout-expired':
      return state === 'pending' ? stay('expired') : stay(state);
    case 'refunded':
      if (state === 'paid') return { state: 'refunded', effects: [{ kind: 'end-access', at: event.at }, { kind: 'send-refund-notice' }] };
      return stay('refunded');
    default:
      return assertNever(event);
  }
}

/** Whether a teacher may ask the payments service to refund a payment in this state. */
export const isRefundable = (state: PaymentState): boolean => state === 'paid';
