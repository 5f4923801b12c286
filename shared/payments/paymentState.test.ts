// The payment state machine: worked transitions, then invariants over every order of the same events (the
// payments service promises at-least-once delivery in no particular order; its webhook guide says so, from memory).
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { applyPaymentEvent, PAYMENT_STATES, type PaymentEffect, type PaymentEvent, type PaymentState } from './paymentState.ts';

const completed: PaymentEvent = { kind: 'checkout-completed', at: 1_000 };
const expired: PaymentEvent = { kind: 'checkout-expired', at: 2_000 };
const refunded: PaymentEvent = { kind: 'refunded', at: 3_000 };

function run(events: readonly PaymentEvent[], from: PaymentState = 'pending'): { state: PaymentState; effects: PaymentEffect[] } {
  let state = from;
  const effects: PaymentEffect[] = [];
  for (const e of events) {
    const step = applyPaymentEvent(state, e);
    state = step.state;
    effects.push(...step.effects);
  }
  return { state, effects };
}

describe('applyPaymentEvent, worked cases', () => {
  it('a completed checkout opens the class and sends a receipt', () => {
    expect(applyPaymentEvent('pending', completed)).toEqual({ state: 'paid', effects: [{ kind: 'grant-access' }, { kind: 'send-receipt' }] });
  });
  it('the same completion twice changes nothing the second time', () => {
    expect(run([completed, completed])).toEqual({ state: 'paid', effects: [{ kind: 'grant-access' }, { kind: 'send-receipt' }] });
  });
  it('a refund after payment ends access at the refund instant and sends a notice', () => {
    expect(run([completed, refunded]).effects.slice(2)).toEqual([{ kind: 'end-access', at: 3_000 }, { kind: 'send-refund-notice' }]);
  });
  it('a refund seen before its completion never opens the class', () => {
    expect(run([refunded, completed])).toEqual({ state: 'refunded', effects: [] });
  });
  it('a stale expiry cannot undo a payment, and a completion after an expiry still counts', () => {
    expect(run([completed, expired]).state).toBe('paid');
    expect(run([expired, completed]).state).toBe('paid');
  });
  it('an expired checkout stays closed', () => {
    expect(run([expired, expired])).toEqual({ state: 'expired', effects: [] });
  });
});

const eventArb = fc.constantFrom(completed, expired, refunded);

describe('applyPaymentEvent, any delivery order', () => {
  it('the final state depends only on which events arrived, not on their order or repeats', () => {
    fc.assert(
      fc.property(fc.array(eventArb, { minLength: 1, maxLength: 8 }), fc.infiniteStream(fc.nat()), (events, picks) => {
        const shuffled = [...events];
        const it = picks[Symbol.iterator]();
        for (let i = shuffled.length - 1; i > 0; i -= 1) {
          const j = it.next().value! % (i + 1);
          [shuffled[i], shuffled[j]] = [shuffled[j]!, shuffled[i]!];
        }
        const kinds = new Set(events.map((e) => e.kind));
        const expected: PaymentState = kinds.has('refunded') ? 'refunded' : kinds.has('checkout-completed') ? 'paid' : 'expired';
        expect(run(events).state).toBe(expected);
        expect(run(shuffled).state).toBe(expected);
      }),
    );
  });

  it('access is granted at most once, ended at most once and only after it was granted; one receipt at most', () => {
    fc.assert(
      fc.property(fc.array(eventArb, { maxLength: 10 }), (events) => {
        const kinds = run(events).effects.map((e) => e.kind);
        const count = (k: PaymentEffect['kind']) => kinds.filter((x) => x === k).length;
        expect(count('grant-access')).toBeLessThanOrEqual(1);
        expect(count('send-receipt')).toBe(count('grant-access'));
        expect(count('end-access')).toBeLessThanOrEqual(count('grant-access'));
        if (count('end-access') === 1) expect(kinds.indexOf('end-access')).toBeGreaterThan(kinds.indexOf('grant-access'));
      }),
    );
  });

  it('refunded is final: nothing leaves it and nothing happens there', () => {
    for (const e of [completed, expired, refunded]) expect(applyPaymentEvent('refunded', e)).toEqual({ state: 'refunded', effects: [] });
    expect(PAYMENT_STATES).toContain('refunded');
  });
});
