// Paid classes in tests: the local payments fake that scripts/test.mjs starts (its address, API key and webhook
// secret come as PAYMENTS_*), events signed with the service's own SDK (npm `stripe`, the outside reference for the
// signature scheme), and paying on the fake's checkout page without a browser.
import Stripe from 'stripe';
import { randomBytes } from 'node:crypto';
import { testEnv } from './env.ts';

function required(name: string): string {
  const v = process.env[name];
  if (!v) throw new Error(`tests/helpers/payments: ${name} is not set; run the tests through \`npm test\``);
  return v;
}

export const paymentsEnv = {
  get apiUrl() {
    return required('PAYMENTS_API_URL');
  },
  get webhookSecret() {
    return required('PAYMENTS_WEBHOOK_SECRET');
  },
};

// The SDK's webhook helpers need no network; the key is never used to call anything here.
const sdk = new Stripe('sk_test_helper_offline', { telemetry: false, maxNetworkRetries: 0 });

export const testId = (prefix: string) => `${prefix}_test_${randomBytes(10).toString('hex')}`;

/** A `checkout.session.completed` (paid) event for our payment `paymentId`, paid through `paymentIntent`. */
export function completedEvent(paymentId: string, paymentIntent: string, createdSeconds = Math.floor(Date.now() / 1000), id = testId('evt')) {
  return {
    id, object: 'event', type: 'checkout.session.completed', created: createdSeconds, livemode: false, api_version: '2025-01-01', pending_webhooks: 1,
    data: { object: { id: testId('cs'), object: 'checkout.session', client_reference_id: paymentId, payment_status: 'paid', status: 'complete', payment_intent: paymentIntent, amount_total: 4500, currency: 'eur' } },
  };
}

export function expiredEvent(paymentId: string, createdSeconds = Math.floor(Date.now() / 1000), id = testId('evt')) {
  return {
    id, object: 'event', type: 'checkout.session.expired', created: createdSeconds, livemode: false, api_version: '2025-01-01', pending_webhooks: 1,
    data: { object: { id: testId('cs'), object: 'checkout.session', client_reference_id: paymentId, payment_status: 'unpaid', status: 'expired', payment_intent: null } },
  };
}

/** A full refund (`charge.refunded`) of the payment made through `paymentIntent`. */
export function refundedEvent(paymentIntent: string, createdSeconds = Math.floor(Date.now() / 1000), id = testId('evt')) {
  return {
    id, object: 'event', type: 'charge.refunded', created: createdSeconds, livemode: false, api_version: '2025-01-01', pending_webhooks: 1,
    data: { object: { id: testId('ch'), object: 'charge', payment_intent: paymentIntent, refunded: true, amount: 4500, amount_refunded: 4500, currency: 'eur' } },
  };
}

/** The `Stripe-Signature` header the service would send for exactly these bytes. */
export const signatureFor = (payload: string, secret = paymentsEnv.webhookSecret) => sdk.webhooks.generateTestHeaderString({ payload, secret });

/** Posts the event to the app's webhook as the service would (no Origin, no cookie), signed with `secret`. */
export async function sendWebhook(event: unknown, opts: { secret?: string; timestamp?: number; signature?: string | null } = {}) {
  const payload = JSON.stringify(event);
  const signature =
    opts.signature !== undefined
      ? opts.signature
      : sdk.webhooks.generateTestHeaderString({ payload, secret: opts.secret ?? paymentsEnv.webhookSecret, ...(opts.timestamp !== undefined && { timestamp: opts.timestamp }) });
  const headers: Record<string, string> = { 'content-type': 'application/json' };
  if (signature !== null) headers['stripe-signature'] = signature;
  const res = await fetch(new URL('/api/payments/webhook', testEnv.appUrl), { method: 'POST', headers, body: payload });
  const text = await res.text();
  return { status: res.status, body: text ? JSON.parse(text) : null, text };
}

/** Pays on the fake's hosted checkout page with `card` (default the test card); the redirect it answers with. */
export async function payOnCheckoutPage(checkoutUrl: string, card = '4242 4242 4242 4242'): Promise<{ status: number; location: string | null }> {
  const res = await fetch(checkoutUrl, { method: 'POST', body: new URLSearchParams({ card, action: 'pay' }), redirect: 'manual' });
  await res.arrayBuffer();
  return { status: res.status, location: res.headers.get('location') };
}
