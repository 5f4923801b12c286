// The local stand-in for the hosted payments service, on loopback (node:http, no dependencies). The app talks to it
// through the service's own SDK (npm `stripe`, pointed here by PAYMENTS_API_URL), exactly as it would to the real
// one. It serves the few API routes the app uses, a plain checkout page of its own that takes only the test card,
// and sends signed webhook events to the app. It holds everything in memory: a restart forgets open checkouts.
//
//   POST /v1/checkout/sessions            create (form-encoded, as the SDK sends it)     → the session
//   GET  /v1/checkout/sessions/:id        retrieve                                        → the session
//   POST /v1/checkout/sessions/:id/expire expire an open one       → checkout.session.expired
//   POST /v1/refunds { payment_intent }   refund a paid checkout in full → the refund; then charge.refunded
//   GET  /checkout/:id                    the hosted page (card 4242 4242 4242 4242 pays; 4000 0000 0000 0002 is declined)
//   POST /checkout/:id                    pay → checkout.session.completed, then 303 to success_url; cancel → cancel_url
//
// Webhook signatures follow the service's published scheme, written here from its documentation rather than with
// the SDK, so the app's SDK verifies an independent implementation: header `t=<unix seconds>,v1=<hex HMAC-SHA256 of
// "<t>.<raw body>" under the endpoint secret>`.
import { createHmac, randomBytes } from 'node:crypto';
import { createServer } from 'node:http';

export const TEST_CARD = '4242424242424242';
export const DECLINED_CARD = '4000000000000002';

const newId = (prefix) => `${prefix}_test_${randomBytes(12).toString('hex')}`;
const nowSeconds = () => Math.floor(Date.now() / 1000);

/** `t=…,v1=…` for `payload` (the exact bytes sent) under `secret`. */
export function signPayload(payload, secret, timestamp = nowSeconds()) {
  const v1 = createHmac('sha256', secret).update(`${timestamp}.${payload}`, 'utf8').digest('hex');
  return `t=${timestamp},v1=${v1}`;
}

/** Form fields in the SDK's bracket notation (`line_items[0][price_data][currency]=usd`) → nested objects/arrays. */
export function parseForm(text) {
  const root = {};
  for (const [key, value] of new URLSearchParams(text)) {
    const parts = key.split(/[[\]]+/).filter((p) => p !== '');
    let node = root;
    parts.forEach((part, i) => {
      if (i === parts.length - 1) node[part] = value;
      else node = node[part] ??= {};
    });
  }
  const arrays = (v) => {
    if (typeof v !== 'object' || v === null) return v;
    const keys = Object.keys(v);
    const mapped = Object.fromEntries(keys.map((k) => [k, arrays(v[k])]));
    return keys.length > 0 && keys.every((k, i) => k === String(i)) ? keys.map((k) => mapped[k]) : mapped;
  };
  return arrays(root);
}

const escapeHtml = (s) => String(s).replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]);

function checkoutPage(session, message) {
  const amount = new Intl.NumberFormat('en', { style: 'currency', currency: session.currency.toUpperCase() }).format(session.amount_total / 100);
  const item = session.line_items_summary;
  const closed = session.status !== 'open';
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>Local test checkout</title>
<style>body{font-family:system-ui,sans-serif;max-width:28rem;margin:2rem auto;padding:0 1rem;color:#222}
.banner{background:#fff3cd;border:1px solid #c9a227;padding:.75rem;border-radius:.4rem;font-size:.9rem}
label{display:block;margin-top:1rem}input{font:inherit;width:100%;box-sizing:border-box;padding:.5rem;margin-top:.25rem}
button{font:inherit;padding:.6rem 1.2rem;margin-top:1rem;margin-right:.5rem;border-radius:.4rem;border:1px solid #555;background:#fff}
button[value=pay]{background:#1d4ed8;color:#fff;border-color:#1d4ed8}.msg{color:#a40000;margin-top:1rem}</style></head>
<body><p class="banner"><strong>Local stand-in for the payments service.</strong> Nothing is charged and no card data is kept.
Only the test card 4242 4242 4242 4242 pays; 4000 0000 0000 0002 is declined.</p>
<h1>Pay for a class</h1><p>${escapeHtml(item)}</p><p><strong>${escapeHtml(amount)}</strong></p>
${closed ? `<p>This checkout is ${escapeHtml(session.status)}.</p>` : `<form method="post">
<label>Test card number<input name="card" inputmode="numeric" autocomplete="off" value="4242 4242 4242 4242"></label>
${message ? `<p class="msg" role="alert">${escapeHtml(message)}</p>` : ''}
<button name="action" value="pay">Pay ${escapeHtml(amount)}</button><button name="action" value="cancel">Cancel</button></form>`}
</body></html>`;
}

/**
 * Starts the fake. `webhookUrl` may be set later (`setWebhookUrl`) when the app's port is chosen after the fake's.
 * Resolves { env, port, url, close, setWebhookUrl, deliveries }; env holds the app's PAYMENTS_* settings.
 */
export async function startPaymentsFake({ apiKey = 'sk_test_threadway_local', webhookSecret = 'whsec_threadway_local', webhookUrl = '', port = 0 } = {}) {
  const sessions = new Map();
  const byIntent = new Map();
  /** Every delivery attempt, newest last: { eventId, type, status } (status 0: the app could not be reached). */
  const deliveries = [];
  let target = webhookUrl;
  let base = '';

  async function deliver(type, object) {
    const event = { id: newId('evt'), object: 'event', api_version: '2025-01-01', created: nowSeconds(), type, livemode: false, pending_webhooks: 1, data: { object } };
    const payload = JSON.stringify(event);
    // The service retries for days; three quick tries keep a local run moving.
    for (let attempt = 0; attempt < 3 && target; attempt += 1) {
      let status = 0;
      try {
        const res = await fetch(target, { method: 'POST', headers: { 'content-type': 'application/json', 'stripe-signature': signPayload(payload, webhookSecret) }, body: payload });
        status = res.status;
        await res.arrayBuffer();
      } catch {
        status = 0;
      }
      deliveries.push({ eventId: event.id, type, status });
      if (status >= 200 && status < 300) return event;
      await new Promise((r) => setTimeout(r, 200 * (attempt + 1)));
    }
    return event;
  }

  const send = (res, status, body) => {
    res.writeHead(status, { 'content-type': 'application/json' });
    res.end(JSON.stringify(body));
  };
  const apiError = (res, status, message, type = 'invalid_request_error') => send(res, status, { error: { type, message } });

  function createSession(form) {
    const line = form.line_items?.[0];
    const amount = Number(line?.price_data?.unit_amount) * Number(line?.quantity ?? 1);
    const currency = line?.price_data?.currency;
    if (form.mode !== 'payment' || !Number.isInteger(amount) || amount <= 0 || !/^[a-z]{3}$/.test(currency ?? '') || !form.success_url) return null;
    const id = newId('cs');
    const session = {
      id,
      object: 'checkout.session',
      mode: 'payment',
      status: 'open',
      payment_status: 'unpaid',
      amount_total: amount,
      currency,
      client_reference_id: form.client_reference_id ?? null,
      customer_email: form.customer_email ?? null,
      metadata: form.metadata ?? {},
      success_url: form.success_url,
      cancel_url: form.cancel_url ?? null,
      payment_intent: null,
      created: nowSeconds(),
      expires_at: nowSeconds() + 24 * 3600,
      url: `${base}/checkout/${id}`,
      line_items_summary: line?.price_data?.product_data?.name ?? 'Class',
    };
    sessions.set(id, session);
    return session;
  }

  const publicSession = ({ line_items_summary: _omit, ...s }) => s;

  async function handleApi(req, res, url, body) {
    if (req.headers.authorization !== `Bearer ${apiKey}`) return apiError(res, 401, 'Invalid API Key provided.');
    const form = parseForm(body);
    const parts = url.pathname.split('/').filter(Boolean);
    if (req.method === 'POST' && url.pathname === '/v1/checkout/sessions') {
      const session = createSession(form);
      return session ? send(res, 200, publicSession(session)) : apiError(res, 400, 'A payment-mode session needs one line item with price_data and a success_url.');
    }
    if (parts[1] === 'checkout' && parts[2] === 'sessions' && parts[3]) {
      const session = sessions.get(parts[3]);
      if (!session) return apiError(res, 404, `No such checkout.session: '${parts[3]}'`);
      if (req.method === 'GET' && parts.length === 4) return send(res, 200, publicSession(session));
      if (req.method === 'POST' && parts[4] === 'expire') {
        if (session.status !== 'open') return apiError(res, 400, `Only open sessions can be expired; this one is ${session.status}.`);
        session.status = 'expired';
        send(res, 200, publicSession(session));
        await deliver('checkout.session.expired', publicSession(session));
        return undefined;
      }
    }
    if (req.method === 'POST' && url.pathname === '/v1/refunds') {
      const session = byIntent.get(form.payment_intent);
      if (!session) return apiError(res, 404, `No such payment_intent: '${form.payment_intent ?? ''}'`);
      if (session.refunded) return apiError(res, 400, `Charge for ${form.payment_intent} has already been refunded.`, 'invalid_request_error');
      session.refunded = true;
      const refund = { id: newId('re'), object: 'refund', amount: session.amount_total, currency: session.currency, payment_intent: session.payment_intent, charge: session.charge, status: 'succeeded', created: nowSeconds(), metadata: form.metadata ?? {} };
      send(res, 200, refund);
      // Like the real service, the event follows the API answer rather than coming inside it.
      setImmediate(() => {
        void deliver('charge.refunded', {
          id: session.charge, object: 'charge', amount: session.amount_total, amount_refunded: session.amount_total, currency: session.currency,
          payment_intent: session.payment_intent, refunded: true, metadata: session.metadata, created: session.paidAt,
        });
      });
      return undefined;
    }
    return apiError(res, 404, `Unrecognized request URL (${req.method}: ${url.pathname}).`);
  }

  async function handleCheckout(req, res, id, body) {
    const session = sessions.get(id);
    const html = (status, text) => {
      res.writeHead(status, { 'content-type': 'text/html; charset=utf-8', 'cache-control': 'no-store' });
      res.end(text);
    };
    if (!session) return html(404, '<!doctype html><title>Unknown checkout</title><p>No such checkout.</p>');
    if (req.method === 'GET') return html(200, checkoutPage(session));
    const form = new URLSearchParams(body);
    if (session.status !== 'open') return html(409, checkoutPage(session));
    if (form.get('action') === 'cancel') {
      res.writeHead(303, { location: session.cancel_url ?? session.success_url });
      return res.end();
    }
    const card = (form.get('card') ?? '').replace(/[\s-]/g, '');
    if (card === DECLINED_CARD) return html(402, checkoutPage(session, 'Your card was declined (test decline card).'));
    if (card !== TEST_CARD) return html(400, checkoutPage(session, 'Only the test card 4242 4242 4242 4242 works here.'));
    session.status = 'complete';
    session.payment_status = 'paid';
    session.payment_intent = newId('pi');
    session.charge = newId('ch');
    session.paidAt = nowSeconds();
    byIntent.set(session.payment_intent, session);
    // The event goes out before the redirect, so the app usually knows by the time the student is back.
    await deliver('checkout.session.completed', publicSession(session));
    res.writeHead(303, { location: session.success_url.replace('{CHECKOUT_SESSION_ID}', session.id) });
    return res.end();
  }

  const server = createServer((req, res) => {
    const chunks = [];
    req.on('data', (c) => chunks.push(c));
    req.on('end', () => {
      const body = Buffer.concat(chunks).toString('utf8');
      const url = new URL(req.url ?? '/', 'http://127.0.0.1');
      const checkout = /^\/checkout\/([A-Za-z0-9_]+)$/.exec(url.pathname);
      const work = url.pathname.startsWith('/v1/') ? handleApi(req, res, url, body) : checkout ? handleCheckout(req, res, checkout[1], body) : Promise.resolve(send(res, 404, { error: { message: 'Not found.' } }));
      work.catch((error) => {
        console.error('[payments fake]', error);
        if (!res.headersSent) apiError(res, 500, 'The local payments fake failed.', 'api_error');
      });
    });
  });
  await new Promise((resolve) => server.listen(port, '127.0.0.1', resolve));
  const address = server.address();
  base = `http://127.0.0.1:${address.port}`;
  return {
    port: address.port,
    url: base,
    env: { PAYMENTS_API_URL: base, PAYMENTS_API_KEY: apiKey, PAYMENTS_WEBHOOK_SECRET: webhookSecret },
    setWebhookUrl: (u) => {
      target = u;
    },
    deliveries,
    close: () => new Promise((resolve) => server.close(() => resolve())),
  };
}
