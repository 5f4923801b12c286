// The local payments fake (scripts/lib/paymentsFake.mjs) driven through the payments service's own SDK (npm
// `stripe` 23.2.0): the SDK is the outside reference for the wire format and for the webhook signature scheme,
// which the fake implements on its own from the service's documentation. Nothing else runs: a node:http receiver
// plays the app's webhook endpoint.
import { createServer, type Server } from 'node:http';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import Stripe from 'stripe';
import { signPayload, parseForm, startPaymentsFake } from '../../scripts/lib/paymentsFake.mjs';

type Fake = Awaited<ReturnType<typeof startPaymentsFake>>;
let fake: Fake;
let receiver: Server;
const received: Stripe.Event[] = [];
let stripe: Stripe;

beforeAll(async () => {
  fake = await startPaymentsFake({});
  receiver = createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on('data', (c: Buffer) => chunks.push(c));
    req.on('end', () => {
      try {
        received.push(stripe.webhooks.constructEvent(Buffer.concat(chunks).toString('utf8'), String(req.headers['stripe-signature']), fake.env.PAYMENTS_WEBHOOK_SECRET));
        res.writeHead(200).end('{}');
      } catch {
        res.writeHead(400).end('{}');
      }
    });
  });
  await new Promise<void>((r) => receiver.listen(0, '127.0.0.1', r));
  const address = receiver.address();
  if (typeof address !== 'object' || address === null) throw new Error('tests/unit/paymentsFake: receiver has no port');
  fake.setWebhookUrl(`http://127.0.0.1:${address.port}/hook`);
  stripe = new Stripe(fake.env.PAYMENTS_API_KEY, { host: '127.0.0.1', port: fake.port, protocol: 'http', maxNetworkRetries: 0, telemetry: false });
});
afterAll(async () => {
  await fake.close();
  await new Promise((r) => receiver.close(r));
});

const waitFor = async (type: string) => {
  for (let i = 0; i < 100; i += 1) {
    const e = received.find((x) => x.type === type);
    if (e) return e;
    await new Promise((r) => setTimeout(r, 20));
  }
  throw new Error(`no ${type} event arrived`);
};

describe('payments fake through the SDK', () => {
  it('parses the SDK’s bracket notation', () => {
    expect(parseForm('line_items[0][price_data][unit_amount]=2500&line_items[0][quantity]=1&metadata[payment_id]=p1')).toEqual({
      line_items: [{ price_data: { unit_amount: '2500' }, quantity: '1' }],
      metadata: { payment_id: 'p1' },
    });
  });

  it('signs webhooks so that the SDK accepts them, and the SDK refuses a wrong secret and an old timestamp', () => {
    const payload = JSON.stringify({ id: 'evt_1', object: 'event', type: 'x', data: { object: {} } });
    expect(stripe.webhooks.constructEvent(payload, signPayload(payload, 'whsec_a'), 'whsec_a').id).toBe('evt_1');
    expect(() => stripe.webhooks.constructEvent(payload, signPayload(payload, 'whsec_b'), 'whsec_a')).toThrow();
    const tenMinutesAgo = Math.floor(Date.now() / 1000) - 600;
    expect(() => stripe.webhooks.constructEvent(payload, signPayload(payload, 'whsec_a', tenMinutesAgo), 'whsec_a')).toThrow(/tolerance/i);
    // The SDK's own test header agrees with the fake's signature byte for byte.
    const t = 1_760_000_000;
    expect(stripe.webhooks.generateTestHeaderString({ payload, secret: 'whsec_a', timestamp: t })).toBe(signPayload(payload, 'whsec_a', t));
  });

  it('creates and retrieves a checkout; paying on its page sends checkout.session.completed and redirects; a refund sends charge.refunded', async () => {
    const session = await stripe.checkout.sessions.create({
      mode: 'payment',
      line_items: [{ quantity: 1, price_data: { currency: 'eur', unit_amount: 4500, product_data: { name: 'Heron Bend evening class' } } }],
      success_url: 'http://127.0.0.1:9/back?session_id={CHECKOUT_SESSION_ID}',
      cancel_url: 'http://127.0.0.1:9/cancelled',
      client_reference_id: 'pay-1',
      metadata: { payment_id: 'pay-1' },
    });
    expect(session).toMatchObject({ status: 'open', payment_status: 'unpaid', amount_total: 4500, currency: 'eur', metadata: { payment_id: 'pay-1' } });
    expect((await stripe.checkout.sessions.retrieve(session.id)).id).toBe(session.id);

    const page = await fetch(session.url!);
    expect(await page.text()).toContain('Local stand-in for the payments service');
    const declined = await fetch(session.url!, { method: 'POST', body: new URLSearchParams({ card: '4000 0000 0000 0002', action: 'pay' }), redirect: 'manual' });
    expect(declined.status).toBe(402);
    const paid = await fetch(session.url!, { method: 'POST', body: new URLSearchParams({ card: '4242 4242 4242 4242', action: 'pay' }), redirect: 'manual' });
    expect(paid.status).toBe(303);
    expect(paid.headers.get('location')).toBe(`http://127.0.0.1:9/back?session_id=${session.id}`);
    const completed = await waitFor('checkout.session.completed');
    const done = completed.data.object as Stripe.Checkout.Session;
    expect(done).toMatchObject({ id: session.id, payment_status: 'paid', client_reference_id: 'pay-1' });

    const refund = await stripe.refunds.create({ payment_intent: String(done.payment_intent) });
    expect(refund).toMatchObject({ status: 'succeeded', amount: 4500 });
    const refunded = (await waitFor('charge.refunded')).data.object as Stripe.Charge;
    expect(refunded).toMatchObject({ payment_intent: done.payment_intent, refunded: true, amount_refunded: 4500 });
    await expect(stripe.refunds.create({ payment_intent: String(done.payment_intent) })).rejects.toThrow(/already been refunded/);
  });

  it('refuses a wrong API key as the service does (401, authentication error in the SDK)', async () => {
    const wrong = new Stripe('sk_test_wrong', { host: '127.0.0.1', port: fake.port, protocol: 'http', maxNetworkRetries: 0, telemetry: false });
    await expect(wrong.checkout.sessions.retrieve('cs_x')).rejects.toMatchObject({ statusCode: 401 });
  });
});
