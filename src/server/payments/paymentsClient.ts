// The payments service's SDK (npm `stripe`), configured once from astro:env. PAYMENTS_API_URL (set by npm start and
// npm test to the local fake on loopback) sends every API call there instead of the real service; an operator
// leaves it unset. Without an API key and a webhook secret, paid classes cannot be bought (free ones are unaffected).
import Stripe from 'stripe';
import { PAYMENTS_API_KEY, PAYMENTS_API_URL, PAYMENTS_WEBHOOK_SECRET } from 'astro:env/server';

/** Seconds a webhook's signed timestamp may lag our clock before the event is refused as a replay. */
export const WEBHOOK_TOLERANCE_SECONDS = 300;

function hostOptions(url: string | undefined): Stripe.StripeConfig {
  if (!url) return {};
  const u = new URL(url);
  const protocol = u.protocol === 'http:' ? 'http' : 'https';
  return { host: u.hostname, port: Number(u.port || (protocol === 'http' ? 80 : 443)), protocol };
}

let client: Stripe | null = null;

/** The SDK client, or null when the service is not configured. */
export function paymentsClient(): Stripe | null {
  if (!PAYMENTS_API_KEY) return null;
  client ??= new Stripe(PAYMENTS_API_KEY, { ...hostOptions(PAYMENTS_API_URL), maxNetworkRetries: 2, telemetry: false, timeout: 20_000 });
  return client;
}

export type VerifiedEvent = { ok: true; event: Stripe.Event } | { ok: false; reason: 'not-configured' | 'bad-signature' };

/**
 * Checks the webhook's signature over the raw body and its timestamp (replay window WEBHOOK_TOLERANCE_SECONDS)
 * with the SDK; only then is the body parsed.
 */
export function verifyWebhook(rawBody: string, signature: string | null): VerifiedEvent {
  const sdk = paymentsClient();
  if (!sdk || !PAYMENTS_WEBHOOK_SECRET) return { ok: false, reason: 'not-configured' };
  if (!signature) return { ok: false, reason: 'bad-signature' };
  try {
    return { ok: true, event: sdk.webhooks.constructEvent(rawBody, signature, PAYMENTS_WEBHOOK_SECRET, WEBHOOK_TOLERANCE_SECONDS) };
  } catch {
    return { ok: false, reason: 'bad-signature' };
  }
}
