// Online payment against the real server and the local payment fake: a link made through the
// SDK, paid on the fake's page, recorded by the signed webhook; replayed, forged and stale
// webhooks refused; a paid balance cannot be paid again; the ready notice reaches the capture.
import { beforeAll, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import Stripe from 'stripe';
import { call, DEMO, freshEmail, newShop, signIn } from './client';
import { waitForMail } from './mail';

let counter = '';
let lead = '';
const signer = new Stripe('sk_test_signing_only');

async function readyPricedTicket(email = freshEmail('pay')): Promise<string> {
  const c = await call('POST', '/api/customers', { cookie: counter, body: { name: 'Perrin Loame', email } });
  const t = await call('POST', '/api/tickets', { cookie: counter, body: { customerId: c.body.id, garments: [{ description: 'Brown moleskin' }] } });
  expect(t.status).toBe(201);
  const line = await call('POST', `/api/tickets/${t.body.id}/price-lines`, { cookie: counter, body: { source: 'list', key: 'cuff-from-hem' } });
  expect(line.status).toBe(201);
  for (const status of ['marked', 'cut', 'stitched', 'pressed', 'ready']) {
    expect((await call('PATCH', `/api/tickets/${t.body.id}`, { cookie: lead, body: { status } })).status).toBe(200);
  }
  return t.body.id;
}

function signed(event: object, secret = inject('paymentsEnv').PAYMENTS_WEBHOOK_SECRET, timestamp?: number) {
  const payload = JSON.stringify(event);
  return { payload, signature: signer.webhooks.generateTestHeaderString({ payload, secret, timestamp }) };
}

async function webhook({ payload, signature }: { payload: string; signature: string }) {
  const res = await fetch(`${inject('baseURL')}/api/payments/webhook`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', 'stripe-signature': signature },
    body: payload,
  });
  return { status: res.status, body: (await res.json()) as { error?: string; message?: string } };
}

const completed = (sessionId: string, amount: number, id = `evt_${Math.random().toString(36).slice(2)}`) => ({
  id,
  object: 'event',
  type: 'checkout.session.completed',
  data: { object: { id: sessionId, object: 'checkout.session', payment_status: 'paid', amount_total: amount, currency: 'eur' } },
});

beforeAll(async () => {
  counter = await signIn(DEMO.counter);
  lead = await signIn(DEMO.lead);
  // The demo list as seeded; another test file may have changed it.
  const list = await call('GET', '/api/prices', { cookie: lead });
  await call('PUT', '/api/prices', { cookie: lead, body: { ...list.body, autoReadyNotice: false } });
});

describe('online payment through the local fake', () => {
  it('pays the balance on the hosted page; the webhook records it once and the link closes', async () => {
    const id = await readyPricedTicket();
    await call('POST', `/api/tickets/${id}/payments`, { cookie: counter, body: { method: 'cash', amountMinor: 400 } });
    const made = await call('POST', `/api/tickets/${id}/payments/link`, { cookie: counter });
    expect(made.status).toBe(201);
    expect(made.body.link).toMatchObject({ amountMinor: 2000, status: 'open' });
    const url: string = made.body.link.url;
    expect(url.startsWith(inject('paymentsEnv').PAYMENTS_API_BASE)).toBe(true);

    const pagehtml = await (await fetch(url)).text();
    expect(pagehtml).toContain('€20.00');
    const paid = await fetch(url, { method: 'POST', redirect: 'manual' });
    expect(paid.status).toBe(303);
    // Back to /paid with the session filled in, as the hosted service does.
    expect(paid.headers.get('location')).toBe(`${inject('baseURL')}/paid?session_id=${url.split('/pay/')[1]}`);

    const after = await call('GET', `/api/tickets/${id}/payments`, { cookie: counter });
    expect([after.body.total, after.body.paid, after.body.due]).toEqual([2400, 2400, 0]);
    expect(after.body.payments.map((p: { purpose: string; method: string }) => `${p.purpose}/${p.method}`)).toEqual(['deposit/cash', 'balance/online']);
    expect(after.body.link.status).toBe('paid');

    // Paying twice: the hosted page refuses, no new link can be made, the counter cannot take it again.
    expect((await fetch(url, { method: 'POST', redirect: 'manual' })).status).toBe(409);
    expect((await call('POST', `/api/tickets/${id}/payments/link`, { cookie: counter })).status).toBe(422);
    expect((await call('POST', `/api/tickets/${id}/payments`, { cookie: counter, body: { method: 'cash', amountMinor: 2000 } })).status).toBe(422);

    const handed = await call('POST', `/api/tickets/${id}/pickup`, { cookie: counter });
    expect(handed.status).toBe(200);
    expect(handed.body.ticket.status).toBe('collected');
  });

  it('/paid shows the ticket number and amount its session proves, and nothing of the shop or customer (issue 14)', async () => {
    const id = await readyPricedTicket();
    const number = (await call('GET', `/api/tickets/${id}`, { cookie: counter })).body.number;
    await call('POST', `/api/tickets/${id}/payments`, { cookie: counter, body: { method: 'cash', amountMinor: 400 } });
    const made = await call('POST', `/api/tickets/${id}/payments/link`, { cookie: counter });
    const sid = String(made.body.link.url).split('/pay/')[1];
    // Before paying: the session is known and open, so the page says it is being confirmed.
    const before = await call('GET', `/paid?session_id=${sid}`);
    expect(before.status).toBe(200);
    expect(before.body).toContain(`PH ${number}`);
    expect(before.body).toContain('Being paid');
    const paid = await fetch(made.body.link.url, { method: 'POST', redirect: 'manual' });
    const back = new URL(paid.headers.get('location')!);
    const page = await call('GET', back.pathname + back.search);
    expect(page.status).toBe(200);
    expect(page.headers.get('cache-control')).toBe('no-store');
    const dl = String(page.body).match(/<dl[^>]*data-testid="paid-session"[\s\S]*?<\/dl>/)?.[0] ?? '';
    expect(
      dl
        .replace(/<[^>]+>/g, ' ')
        .replace(/\s+/g, ' ')
        .trim(),
    ).toBe(`Ticket PH ${number} Paid €20.00`);
    // Nothing personal or of the shop: not the customer's name, not the shop's name.
    expect(page.body).not.toContain('Perrin Loame');
    expect(page.body).not.toContain('Pinmark');
    // An unknown, malformed or missing session shows no ticket at all.
    for (const q of ['?session_id=cs_test_000000000000000000000000', '?session_id=../../etc', '']) {
      const other = await call('GET', `/paid${q}`);
      expect(other.status).toBe(200);
      expect(other.body).not.toContain('paid-session');
      expect(other.body).not.toMatch(/PH \d+/);
    }
  });

  it('refunds a credit owed through the payment service: pending, then done by its signed webhook (issue 14)', async () => {
    const id = await readyPricedTicket();
    const made = await call('POST', `/api/tickets/${id}/payments/link`, { cookie: counter });
    expect((await fetch(made.body.link.url, { method: 'POST', redirect: 'manual' })).status).toBe(303);
    const cut = await call('POST', `/api/tickets/${id}/price-lines`, {
      cookie: counter,
      body: { source: 'adjust', label: 'Shorter than asked', amountMinor: -400, reason: 'customer agreed' },
    });
    expect(cut.status).toBe(201);
    const owed = await call('GET', `/api/tickets/${id}/payments`, { cookie: counter });
    expect([owed.body.total, owed.body.paid, owed.body.due, owed.body.credit]).toEqual([2000, 2400, 0, 400]);
    // More than is owed back is refused before the service is asked.
    expect((await call('POST', `/api/tickets/${id}/refunds`, { cookie: counter, body: { method: 'online', amountMinor: 401 } })).status).toBe(422);
    const asked = await call('POST', `/api/tickets/${id}/refunds`, { cookie: counter, body: { method: 'online', amountMinor: 400 } });
    expect(asked.status).toBe(201);
    expect(asked.body.credit).toBe(0);
    expect(asked.body.refunds[0]).toMatchObject({ method: 'online', amountMinor: 400, reference: expect.stringMatching(/^re_test_/) });
    let status = asked.body.refunds[0].status;
    for (let i = 0; i < 50 && status !== 'done'; i += 1) {
      await new Promise((r) => setTimeout(r, 100));
      status = (await call('GET', `/api/tickets/${id}/payments`, { cookie: counter })).body.refunds[0].status;
    }
    expect(status).toBe('done');
    const handed = await call('POST', `/api/tickets/${id}/pickup`, { cookie: counter });
    expect([handed.status, handed.body.credit, handed.body.refunded]).toEqual([200, 0, 400]);
  });

  it('closes the open link when the balance is paid at the counter, so it cannot be paid again online', async () => {
    const id = await readyPricedTicket();
    const made = await call('POST', `/api/tickets/${id}/payments/link`, { cookie: counter });
    const url: string = made.body.link.url;
    const cash = await call('POST', `/api/tickets/${id}/payments`, { cookie: counter, body: { method: 'cash', amountMinor: 2400 } });
    expect(cash.status).toBe(201);
    expect(cash.body.link.status).toBe('expired');
    // The session was expired through the SDK: the hosted page no longer takes money.
    expect(await (await fetch(url)).text()).toContain('This link is no longer open.');
    expect((await fetch(url, { method: 'POST', redirect: 'manual' })).status).toBe(409);
    const after = await call('GET', `/api/tickets/${id}/payments`, { cookie: counter });
    expect(after.body.payments.map((p: { method: string }) => p.method)).toEqual(['cash']);
  });

  it('gives one link for a double click: both presses answer the same open link', async () => {
    const id = await readyPricedTicket();
    const [one, two] = await Promise.all([1, 2].map(() => call('POST', `/api/tickets/${id}/payments/link`, { cookie: counter })));
    expect([one!.status, two!.status]).toEqual([201, 201]);
    expect(one!.body.link).toMatchObject({ amountMinor: 2400, status: 'open' });
    expect(two!.body.link.url).toBe(one!.body.link.url);
  });

  it('moves a ready ticket to collected only as pickup would: refused while the balance is due', async () => {
    const id = await readyPricedTicket();
    const early = await call('PATCH', `/api/tickets/${id}`, { cookie: counter, body: { status: 'collected' } });
    expect(early.status).toBe(422);
    expect(early.body.error).toMatch(/balance/);
    await call('POST', `/api/tickets/${id}/payments`, { cookie: counter, body: { method: 'cash', amountMinor: 2400 } });
    const moved = await call('PATCH', `/api/tickets/${id}`, { cookie: counter, body: { status: 'collected' } });
    expect([moved.status, moved.body.status]).toEqual([200, 'collected']);
    const garments = await call('GET', `/api/tickets/${id}`, { cookie: counter });
    expect(garments.body.garments.map((g: { status: string }) => g.status)).toEqual(['collected']);
  });

  it('refuses a replayed event, a forged signature and a stale one', async () => {
    const id = await readyPricedTicket();
    const made = await call('POST', `/api/tickets/${id}/payments/link`, { cookie: counter });
    const session = String(made.body.link.url).split('/pay/')[1]!;
    const event = completed(session, 2400);

    expect((await webhook({ payload: JSON.stringify(event), signature: 't=1700000000,v1=00ff' })).status).toBe(400);
    expect((await webhook(signed(event, 'whsec_not_the_shops'))).status).toBe(400);
    expect((await webhook(signed(event, undefined, Math.floor(Date.now() / 1000) - 3600))).status).toBe(400);
    expect((await call('GET', `/api/tickets/${id}/payments`, { cookie: counter })).body.due).toBe(2400);

    const good = signed(event);
    expect(await webhook(good)).toEqual({ status: 200, body: { received: true, message: 'Payment recorded.' } });
    const replay = await webhook(good);
    expect(replay).toEqual({ status: 409, body: { error: 'Event already processed.' } });
    // The same payment under a new event id is refused too: the balance is paid once.
    const again = await webhook(signed(completed(session, 2400)));
    expect(again.status).toBe(409);
    const summary = await call('GET', `/api/tickets/${id}/payments`, { cookie: counter });
    expect(summary.body.payments).toHaveLength(1);
  });
});

describe('ready notice through the mail capture', () => {
  it('tells the customer the balance due and the shop hours', async () => {
    const email = freshEmail('ready-notice');
    const id = await readyPricedTicket(email);
    const sent = await call('POST', `/api/tickets/${id}/notices`, { cookie: counter, body: { kind: 'ready' } });
    expect(sent.status).toBe(201);
    expect(sent.body.status).toBe('sent');
    const mail = await waitForMail(email);
    expect(mail.subject).toMatch(/^Ready to collect: ticket PH \d+$/);
    expect(mail.text).toContain('Balance due at pickup: €24.00.');
    expect(mail.text).toContain('Opening hours: Tue–Fri 9:00–18:00, Sat 9:00–13:00');
    const list = await call('GET', `/api/tickets/${id}/notices`, { cookie: counter });
    expect(list.body.map((n: { status: string; attempts: number }) => [n.status, n.attempts])).toEqual([['sent', 1]]);
  });

  it('is sent again on request once it has gone, as a second numbered notice; the apprentice and other shops may not (issue 14)', async () => {
    const email = freshEmail('ready-again');
    const id = await readyPricedTicket(email);
    expect((await call('POST', `/api/tickets/${id}/notices`, { cookie: counter, body: { kind: 'ready' } })).status).toBe(201);
    expect((await call('POST', `/api/tickets/${id}/notices`, { cookie: counter, body: { kind: 'ready' } })).status).toBe(409);
    expect((await call('POST', `/api/tickets/${id}/notices`, { cookie: await signIn(DEMO.apprentice), body: { kind: 'ready', again: true } })).status).toBe(
      403,
    );
    expect(
      (await call('POST', `/api/tickets/${id}/notices`, { cookie: (await newShop('Resend Stranger HTTP')).cookie, body: { kind: 'ready', again: true } }))
        .status,
    ).toBe(404);
    const again = await call('POST', `/api/tickets/${id}/notices`, { cookie: counter, body: { kind: 'ready', again: true } });
    expect([again.status, again.body.sequence, again.body.status]).toEqual([201, 2, 'sent']);
    const list = await call('GET', `/api/tickets/${id}/notices`, { cookie: counter });
    expect(list.body.map((n: { sequence: number; status: string }) => [n.sequence, n.status])).toEqual([
      [1, 'sent'],
      [2, 'sent'],
    ]);
  });
});
