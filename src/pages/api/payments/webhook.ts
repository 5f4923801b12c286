// /api/payments/webhook — POST from the payments service (not from a browser: no session, no Origin; the origin
// check lets this one path through, src/server/originCheck.ts). The signature over the raw body and its timestamp
// (5 minute replay window) are checked by the service's SDK before anything is read: a bad one → 400 and nothing
// changes. The same event id twice → 200 and nothing changes the second time. → 200 { received, outcome }.
import type { APIRoute } from 'astro';
import { PUBLIC_ORIGIN } from 'astro:env/server';
import { db } from '@server/db.ts';
import { json, problem } from '@server/http.ts';
import { readBytesCapped } from '@server/readBody.ts';
import { verifyWebhook } from '@server/payments/paymentsClient.ts';
import { handleWebhookEvent } from '@server/payments/paymentWebhook.service.ts';

/** The service's events are a few kB; 256 kB leaves room and refuses a flood. */
const WEBHOOK_BODY_LIMIT = 256 * 1024;

export const POST = (async ({ request, url }) => {
  const bytes = await readBytesCapped(request, WEBHOOK_BODY_LIMIT);
  if (bytes === null) return problem(413, 'payload_too_large', 'The event is larger than 256 kB.');
  let raw: string;
  try {
    raw = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    return problem(400, 'invalid_signature', 'The event is not UTF-8 text.');
  }
  const verified = verifyWebhook(raw, request.headers.get('stripe-signature'));
  if (!verified.ok) {
    return verified.reason === 'not-configured'
      ? problem(503, 'payments_unavailable', 'Payments are not set up on this server.')
      : problem(400, 'invalid_signature', 'The event’s signature or timestamp did not check out.');
  }
  const outcome = await handleWebhookEvent(db, verified.event, PUBLIC_ORIGIN ?? url.origin);
  return json({ received: true, outcome });
}) satisfies APIRoute;
