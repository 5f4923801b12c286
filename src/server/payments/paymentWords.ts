// How a payment's state reads on screen, in the product's plain words.
import type { PaymentStateColumn } from '@db/schema.ts';

export const PAYMENT_STATE_WORDS: Record<PaymentStateColumn, string> = {
  pending: 'waiting for payment',
  paid: 'paid',
  refunded: 'refunded',
  expired: 'not completed',
};
