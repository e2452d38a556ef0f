// A local stand-in for the hosted payment service, for development and tests only: the few API
// endpoints the app calls through the official SDK (checkout sessions: create, read, expire;
// refunds: create, read), a hosted "pay" page on loopback, and webhooks signed with the SDK's
// documented scheme: `checkout.session.completed` when the customer presses pay, and
// `refund.updated` a moment after a refund is asked for (it answers `pending` first, as the hosted
// service may). No money moves; sessions and refunds live in memory.
import { createServer } from 'node:http';
import { randomBytes } from 'node:crypto';
import { fileURLToPath } from 'node:url';
import { listenOrExplain } from './port-taken.mjs';

// The SDK (only to sign webhooks as the real service does) loads at the first webhook, not while npm start starts the server.
let sdk = null;
async function stripeSdk() {
  if (!sdk) {
    const Stripe = (await import('stripe')).default;
    sdk = { Stripe, signer: new Stripe('sk_test_signing_only', { telemetry: false }) };
  }
  return sdk;
}

/** Reads nested form fields (line_items[0][price_data][currency]=eur) into plain objects. */
export function parseForm(body) {
  const out = {};
  for (const [key, value] of new URLSearchParams(body)) {
    const path = key.replace(/\]/g, '').split('[');
    let node = out;
    path.forEach((part, i) => {
      if (i === path.length - 1) node[part] = value;
      else node = node[part] ??= {};
    });
  }
  return out;
}

const id = (prefix) => `${prefix}_test_${randomBytes(12).toString('hex')}`;

function money(minor, currency) {
  const digits = currency.toUpperCase() === 'JPY' ? 0 : 2;
  return new Intl.NumberFormat('en-GB', { style: 'currency', currency: currency.toUpperCase() }).format(minor / 10 ** digits);
}

const escapeHtml = (s) => String(s).replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

function page(title, inner) {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"><title>${escapeHtml(title)}</title>
<style>body{font:18px/1.5 system-ui,sans-serif;background:#f6f4ef;color:#111;margin:0;padding:2rem}main{max-width:30rem;margin:auto;background:#fff;border:2px solid #111;padding:1.5rem}
.amount{font-size:2.5rem;font-weight:800}.note{border:2px dashed #8a4b00;color:#8a4b00;padding:.5rem;font-weight:600}
button{font:inherit;font-weight:700;min-height:48px;padding:.5rem 1.5rem;background:#0b4f6c;color:#fff;border:0;border-radius:4px;cursor:pointer}button:focus-visible{outline:4px solid #e0a100;outline-offset:2px}</style></head>
<body><main>${inner}</main></body></html>`;
}

/** Starts the fake on host:port (0 = any free port); resolves with its port, base URL and a closer. */
export function startPaymentsFake({ port = 12111, host = '127.0.0.1', apiKey, webhookUrl, webhookSecret, quiet = false }) {
  const sessions = new Map();
  let base = '';

  async function sendWebhook(session, type = 'checkout.session.completed') {
    const { Stripe, signer } = await stripeSdk();
    const event = {
      id: id('evt'),
      object: 'event',
      api_version: Stripe.API_VERSION,
      created: Math.floor(Date.now() / 1000),
      livemode: false,
      pending_webhooks: 1,
      request: { id: null, idempotency_key: null },
      type,
      data: { object: session },
    };
    const payload = JSON.stringify(event);
    const signature = signer.webhooks.generateTestHeaderString({ payload, secret: webhookSecret });
    const res = await fetch(webhookUrl, { method: 'POST', headers: { 'content-type': 'application/json', 'stripe-signature': signature }, body: payload });
    if (!quiet) console.log(`[payments] webhook ${event.type} → ${res.status}`);
    return res.ok;
  }

  // Answers to POSTs by Idempotency-Key, kept while the fake runs.
  const answered = new Map();
  // Paid sessions' payment intents, and the refunds made against them.
  const intents = new Map();
  const refunds = new Map();

  function settleRefund(refund) {
    setTimeout(async () => {
      refund.status = 'succeeded';
      try {
        await sendWebhook(refund, 'refund.updated');
      } catch (e) {
        if (!quiet) console.log(`[payments] refund webhook failed: ${e.message}`);
      }
    }, 50);
  }

  const api = {
    'POST /v1/checkout/sessions': (_m, form) => {
      const item = form.line_items?.['0'];
      const amount = Number(item?.price_data?.unit_amount) * Number(item?.quantity ?? 1);
      const currency = item?.price_data?.currency;
      if (!Number.isInteger(amount) || amount <= 0 || !currency)
        return [400, { error: { type: 'invalid_request_error', message: 'line_items[0] needs price_data.unit_amount and currency' } }];
      const sid = id('cs');
      const session = {
        id: sid,
        object: 'checkout.session',
        amount_total: amount,
        currency,
        mode: form.mode ?? 'payment',
        status: 'open',
        payment_status: 'unpaid',
        client_reference_id: form.client_reference_id ?? null,
        metadata: form.metadata ?? {},
        success_url: form.success_url ?? null,
        cancel_url: form.cancel_url ?? null,
        url: `${base}/pay/${sid}`,
        created: Math.floor(Date.now() / 1000),
        livemode: false,
        description: item?.price_data?.product_data?.name ?? '',
      };
      sessions.set(sid, session);
      return [200, session];
    },
    'POST /v1/refunds': (_m, form) => {
      const intent = intents.get(form.payment_intent);
      if (!intent) return [404, { error: { type: 'invalid_request_error', message: `No such payment_intent: '${form.payment_intent}'` } }];
      const amount = form.amount === undefined ? intent.amount - intent.refunded : Number(form.amount);
      if (!Number.isInteger(amount) || amount <= 0) return [400, { error: { type: 'invalid_request_error', message: 'amount must be a positive integer' } }];
      if (amount > intent.amount - intent.refunded) {
        return [
          400,
          {
            error: {
              type: 'invalid_request_error',
              code: 'charge_already_refunded',
              message: `Refund amount (${amount}) is greater than unrefunded amount on charge (${intent.amount - intent.refunded})`,
            },
          },
        ];
      }
      intent.refunded += amount;
      const refund = {
        id: id('re'),
        object: 'refund',
        amount,
        currency: intent.currency,
        payment_intent: form.payment_intent,
        status: 'pending',
        metadata: form.metadata ?? {},
        created: Math.floor(Date.now() / 1000),
      };
      refunds.set(refund.id, refund);
      settleRefund(refund);
      return [200, { ...refund }];
    },
    'GET /v1/refunds/:id': ([rid]) =>
      refunds.has(rid) ? [200, refunds.get(rid)] : [404, { error: { type: 'invalid_request_error', message: `No such refund: '${rid}'` } }],
    'GET /v1/checkout/sessions/:id': ([sid]) =>
      sessions.has(sid) ? [200, sessions.get(sid)] : [404, { error: { type: 'invalid_request_error', message: `No such checkout.session: ${sid}` } }],
    'POST /v1/checkout/sessions/:id/expire': ([sid]) => {
      const s = sessions.get(sid);
      if (!s) return [404, { error: { type: 'invalid_request_error', message: `No such checkout.session: ${sid}` } }];
      if (s.status !== 'open')
        return [400, { error: { type: 'invalid_request_error', message: `Only open sessions can be expired (this one is ${s.status}).` } }];
      s.status = 'expired';
      s.url = null;
      return [200, s];
    },
  };

  function route(method, path) {
    for (const [pattern, handler] of Object.entries(api)) {
      const [m, p] = pattern.split(' ');
      if (m !== method) continue;
      const re = new RegExp(`^${p.replace(/:id/g, '([A-Za-z0-9_]+)')}$`);
      const match = path.match(re);
      if (match) return (form) => handler(match.slice(1), form);
    }
    return null;
  }

  const server = createServer(async (req, res) => {
    const url = new URL(req.url ?? '/', 'http://local');
    let body = '';
    for await (const chunk of req) body += chunk;
    const send = (status, data, type = 'application/json') => {
      res.writeHead(status, { 'content-type': type });
      res.end(type === 'application/json' ? JSON.stringify(data) : data);
    };
    if (url.pathname.startsWith('/v1/')) {
      if (req.headers.authorization !== `Bearer ${apiKey}`)
        return send(401, { error: { type: 'invalid_request_error', message: 'Invalid API Key provided.' } });
      const handler = route(req.method, url.pathname);
      if (!handler) return send(404, { error: { type: 'invalid_request_error', message: `Unrecognized request URL (${req.method}: ${url.pathname}).` } });
      // Like the hosted service: a POST repeated with the same Idempotency-Key gets the first
      // answer again (for the same request), so a retried creation makes no second session.
      const key = req.method === 'POST' ? req.headers['idempotency-key'] : undefined;
      if (typeof key === 'string') {
        const seen = answered.get(key);
        if (seen) {
          if (seen.request !== `${req.method} ${url.pathname} ${body}`)
            return send(400, {
              error: {
                type: 'idempotency_error',
                message: 'Keys for idempotent requests can only be used with the same parameters they were first used with.',
              },
            });
          return send(seen.status, seen.data);
        }
      }
      const [status, data] = handler(parseForm(body));
      if (typeof key === 'string') answered.set(key, { request: `${req.method} ${url.pathname} ${body}`, status, data });
      return send(status, data);
    }
    const pay = url.pathname.match(/^\/pay\/(cs_test_[a-f0-9]+)$/);
    const session = pay && sessions.get(pay[1]);
    if (!session)
      return send(
        404,
        page('Unknown link', '<h1>This payment link is unknown</h1><p>It may be from before the local payment service restarted.</p>'),
        'text/html; charset=utf-8',
      );
    if (req.method === 'GET') {
      const open = session.status === 'open';
      return send(
        200,
        page(
          'Pay your balance',
          `<p class="note">Local test payment service: no real money moves.</p>
<h1>${escapeHtml(session.description)}</h1>
<p class="amount">${escapeHtml(money(session.amount_total, session.currency))}</p>
${open ? `<form method="post"><button type="submit">Pay ${escapeHtml(money(session.amount_total, session.currency))}</button></form>` : `<p><strong>This link is ${session.status === 'complete' ? 'already paid' : 'no longer open'}.</strong></p>`}`,
        ),
        'text/html; charset=utf-8',
      );
    }
    if (req.method === 'POST') {
      if (session.status !== 'open')
        return send(
          409,
          page('Not open', `<h1>This link is ${session.status === 'complete' ? 'already paid' : 'no longer open'}</h1>`),
          'text/html; charset=utf-8',
        );
      session.status = 'complete';
      session.payment_status = 'paid';
      session.payment_intent = id('pi');
      intents.set(session.payment_intent, { amount: session.amount_total, currency: session.currency, refunded: 0 });
      let delivered = false;
      try {
        delivered = await sendWebhook(session);
      } catch (e) {
        if (!quiet) console.log(`[payments] webhook failed: ${e.message}`);
      }
      // Like the hosted service: back to the shop's page once paid, when it gave one.
      if (session.success_url) {
        // The hosted service fills in the session's id where the return address asks for it.
        res.writeHead(303, { location: session.success_url.replaceAll('{CHECKOUT_SESSION_ID}', session.id) });
        return res.end();
      }
      return send(
        200,
        page(
          'Paid',
          `<h1>Payment received</h1><p class="amount">${escapeHtml(money(session.amount_total, session.currency))}</p><p>${delivered ? 'The shop has been told. You may close this page.' : 'The shop could not be told yet: show this page at the counter.'}</p>`,
        ),
        'text/html; charset=utf-8',
      );
    }
    return send(405, { error: 'method not allowed' });
  });

  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => {
      const address = server.address();
      const actual = typeof address === 'object' && address ? address.port : port;
      base = `http://${host}:${actual}`;
      resolve({ port: actual, base, refunds, close: () => new Promise((r) => server.close(r)) });
    });
  });
}

/** Starts the fake with a fresh key and webhook secret for an app at appUrl; returns the app's PAYMENTS_* env. */
export async function startLocalPayments({ appUrl, port = 12111, quiet = false }) {
  const apiKey = `sk_test_local_${randomBytes(12).toString('hex')}`;
  const webhookSecret = `whsec_${randomBytes(24).toString('hex')}`;
  const fake = await startPaymentsFake({ port, apiKey, webhookSecret, webhookUrl: new URL('/api/payments/webhook', appUrl).toString(), quiet });
  return { ...fake, env: { PAYMENTS_API_KEY: apiKey, PAYMENTS_API_BASE: fake.base, PAYMENTS_WEBHOOK_SECRET: webhookSecret } };
}

if (process.argv[1] === fileURLToPath(import.meta.url)) {
  const port = Number(process.env.PAYMENTS_FAKE_PORT || 12111);
  const { base } = await listenOrExplain(
    startPaymentsFake({
      port,
      apiKey: process.env.PAYMENTS_API_KEY || 'sk_test_cuffwright_local',
      webhookSecret: process.env.PAYMENTS_WEBHOOK_SECRET || 'whsec_cuffwright_local',
      webhookUrl: process.env.PAYMENTS_WEBHOOK_URL || 'http://localhost:4321/api/payments/webhook',
    }),
    { port, what: 'local payment fake', setting: 'PAYMENTS_FAKE_PORT' },
  );
  console.log(`Local payment service on ${base}`);
}
