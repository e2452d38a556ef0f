// Pay links with the payment service called between two short transactions, never inside one: while
// the service is slow to answer, other shops (and this ticket's readers) go on; a balance changed
// meanwhile gets its own link and the stale session is closed; a making cut short by a crash or a
// timeout holds nothing up and its session is closed by replaying the request; a session that
// cannot be saved is closed again. The fake sits behind tests/services/payments-proxy.ts, which
// holds requests (a slow service) and answers repeated idempotency keys as the hosted service does.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { eq, sql } from 'drizzle-orm';
import Stripe from 'stripe';
import type { Shop } from './fixtures';

const { fake, proxy } = await vi.hoisted(async () => {
  const { startPaymentsFake } = await import('../../scripts/payments-fake.mjs');
  const { startPaymentsProxy } = await import('./payments-proxy');
  // The fake's own webhook goes nowhere (port 9): webhooks are handed to the service directly here.
  const fake = await startPaymentsFake({
    port: 0,
    apiKey: 'sk_test_phases',
    webhookSecret: 'whsec_phases',
    webhookUrl: 'http://127.0.0.1:9/api/payments/webhook',
    quiet: true,
  });
  return { fake, proxy: await startPaymentsProxy(fake.base) };
});
vi.mock('astro:env/server', async () =>
  (await import('./server-env')).serverEnv({ PAYMENTS_API_KEY: 'sk_test_phases', PAYMENTS_API_BASE: proxy.base, PAYMENTS_WEBHOOK_SECRET: 'whsec_phases' }),
);
vi.mock('@/db', () => import('../db/db-mock'));

const { db, handle } = await import('@/db');
const { customers, paymentLinks, priceLines, tickets } = await import('@/db/schema');
const prices = await import('@/services/counter/prices');
const pay = await import('@/services/counter/payments');
const { sessionKey } = await import('@/services/counter/payment-links');
const { makeShop } = await import('./fixtures');
const { PAYMENT_TIMEOUT_MS, setPaymentTimeout } = await import('@/lib/server/payment-service');

const ORIGIN = 'http://127.0.0.1:4321';
const upstream = new URL(fake.base);
// Straight to the fake (not through the proxy), to see what the service holds.
const service = new Stripe('sk_test_phases', { host: upstream.hostname, port: Number(upstream.port), protocol: 'http', telemetry: false });
const viaProxy = new URL(proxy.base);
const serviceViaProxy = new Stripe('sk_test_phases', { host: viaProxy.hostname, port: Number(viaProxy.port), protocol: 'http', telemetry: false });
const signer = new Stripe('sk_test_signing_only', { telemetry: false });
const CREATE = /^\/v1\/checkout\/sessions$/;
const EXPIRE = /^\/v1\/checkout\/sessions\/[^/]+\/expire$/;

let a: Shop;
let b: Shop;
let ticketNo = 8000;

/** A received ticket of the shop with one adjusted line: `amountMinor` due. */
async function ticketDue(shop: Shop, amountMinor = 1800) {
  ticketNo += 1;
  const [c] = await db.insert(customers).values({ shopId: shop.shopId, name: 'Wendel Osk' }).returning();
  const [t] = await db.insert(tickets).values({ shopId: shop.shopId, number: ticketNo, customerId: c!.id }).returning();
  await prices.addLine(shop.counter, t!.id, { source: 'adjust', label: 'Hem', amountMinor, reason: 'test price' });
  return t!;
}

const linksOf = (ticketId: string) => db.select().from(paymentLinks).where(eq(paymentLinks.ticketId, ticketId)).orderBy(paymentLinks.createdAt);
const linesOn = (ticketId: string) => db.select().from(priceLines).where(eq(priceLines.ticketId, ticketId));
const extra = { source: 'adjust', label: 'Extra pressing', amountMinor: 1000, reason: 'asked for' } as const;
const createdSessions = () => proxy.calls.filter((c) => c.method === 'POST' && CREATE.test(c.path) && c.status === 200).map((c) => c.body.id!);

/** Runs `work` and pushes `name` onto `order` when it is done. */
async function noted<T>(order: string[], name: string, work: Promise<T>): Promise<T> {
  const value = await work;
  order.push(name);
  return value;
}

beforeAll(async () => {
  a = await makeShop('Phase Hems A');
  b = await makeShop('Phase Hems B');
});
afterAll(async () => {
  await proxy.close();
  await fake.close();
  await handle.close();
});

describe('the database while the payment service is slow', () => {
  it('goes on for another shop and for readers of the ticket while a link is being made', async () => {
    const t = await ticketDue(a);
    const other = await ticketDue(b);
    const gate = proxy.hold('POST', CREATE);
    // Only so a regression fails on the order below instead of hanging the run.
    const unstick = setTimeout(() => gate.release(), 10_000);
    const order: string[] = [];
    const making = noted(order, 'link made', pay.createPaymentLink(a.counter, t.id, ORIGIN));
    await gate.arrived;
    await noted(order, 'other shop read', pay.counterSummary(b.counter, other.id));
    await noted(order, 'other shop wrote', prices.addLine(b.counter, other.id, extra));
    const seen = await noted(order, 'same ticket read', pay.counterSummary(a.counter, t.id));
    gate.release();
    clearTimeout(unstick);
    const made = await making;
    expect(order).toEqual(['other shop read', 'other shop wrote', 'same ticket read', 'link made']);
    expect(seen.link).toBeNull();
    expect(made.link).toMatchObject({ amountMinor: 1800, status: 'open' });
    expect((await pay.counterSummary(b.counter, other.id)).due).toBe(2800);
  });

  it('goes on while an open link is being closed for a price change; the link reads expiring meanwhile', async () => {
    const t = await ticketDue(a);
    const other = await ticketDue(b);
    await pay.createPaymentLink(a.counter, t.id, ORIGIN);
    const [link] = await linksOf(t.id);
    const gate = proxy.hold('POST', EXPIRE);
    const unstick = setTimeout(() => gate.release(), 10_000);
    const order: string[] = [];
    const changing = noted(order, 'price changed', prices.addLine(a.counter, t.id, extra));
    await gate.arrived;
    await noted(order, 'other shop wrote', prices.addLine(b.counter, other.id, extra));
    const seen = await noted(order, 'same ticket read', pay.counterSummary(a.counter, t.id));
    gate.release();
    clearTimeout(unstick);
    await changing;
    expect(order).toEqual(['other shop wrote', 'same ticket read', 'price changed']);
    // Meanwhile: the intent on record, the old balance still in force.
    expect([seen.link?.status, seen.due]).toEqual(['expiring', 1800]);
    expect((await linksOf(t.id)).map((l) => l.status)).toEqual(['expired']);
    expect((await service.checkout.sessions.retrieve(link!.sessionId!)).status).toBe('expired');
    expect((await pay.counterSummary(a.counter, t.id)).due).toBe(2800);
  });
});

describe('making a link in two phases', () => {
  it('a second click while the first is being made waits for it: one session, one link', async () => {
    const t = await ticketDue(a);
    const before = createdSessions().length;
    const gate = proxy.hold('POST', CREATE);
    const first = pay.createPaymentLink(a.counter, t.id, ORIGIN);
    await gate.arrived;
    const second = pay.createPaymentLink(a.counter, t.id, ORIGIN);
    gate.release();
    const [one, two] = await Promise.all([first, second]);
    expect(gate.count()).toBe(1);
    expect(createdSessions().length - before).toBe(1);
    expect(two.link?.url).toBe(one.link?.url);
    expect((await linksOf(t.id)).map((l) => [l.status, l.amountMinor])).toEqual([['open', 1800]]);
  });

  it('a price change while the link is being made: the link is for the new balance, the session for the old one is closed', async () => {
    const t = await ticketDue(a);
    const before = createdSessions().length;
    const gate = proxy.hold('POST', CREATE);
    const making = pay.createPaymentLink(a.counter, t.id, ORIGIN);
    await gate.arrived;
    await prices.addLine(a.counter, t.id, extra);
    gate.release();
    const made = await making;
    const sessions = createdSessions().slice(before);
    expect(sessions).toHaveLength(2);
    expect((await service.checkout.sessions.retrieve(sessions[0]!)).status).toBe('expired');
    expect((await service.checkout.sessions.retrieve(sessions[1]!)).status).toBe('open');
    expect(made.link).toMatchObject({ amountMinor: 2800, status: 'open' });
    expect((await linksOf(t.id)).map((l) => [l.status, l.amountMinor, l.sessionId])).toEqual([
      ['expired', 1800, sessions[0]],
      ['open', 2800, sessions[1]],
    ]);
  });

  it('a link left creating by a crash holds nothing up, and the session it made is closed', async () => {
    const t = await ticketDue(a);
    // The server stopped after the service made the session and before it was saved.
    const id = crypto.randomUUID();
    const request = {
      mode: 'payment',
      line_items: [
        { quantity: 1, price_data: { currency: 'eur', unit_amount: 1800, product_data: { name: `Phase Hems A: ticket PHA ${t.number}, balance` } } },
      ],
      client_reference_id: t.id,
      metadata: { ticketId: t.id, shopId: a.shopId, linkId: id },
      success_url: `${ORIGIN}/paid`,
      cancel_url: `${ORIGIN}/paid?cancelled=1`,
    } satisfies Stripe.Checkout.SessionCreateParams;
    const orphan = await serviceViaProxy.checkout.sessions.create(request, { idempotencyKey: sessionKey(id) });
    await db.insert(paymentLinks).values({
      id,
      shopId: a.shopId,
      ticketId: t.id,
      status: 'creating',
      amountMinor: 1800,
      currency: 'EUR',
      request,
      createdAt: new Date(Date.now() - 60_000),
    });

    const made = await pay.createPaymentLink(a.counter, t.id, ORIGIN);
    expect(made.link).toMatchObject({ amountMinor: 1800, status: 'open' });
    expect(made.link!.url).not.toBe(orphan.url);
    expect((await service.checkout.sessions.retrieve(orphan.id)).status).toBe('expired');
    const rows = await linksOf(t.id);
    expect(rows.map((l) => [l.status, l.sessionId === orphan.id])).toEqual([
      ['failed', true],
      ['open', false],
    ]);
  });
});

describe('when the service does not answer in time', () => {
  it('makes no second try, answers 503, and the next attempt closes the session the lost answer made', async () => {
    const t = await ticketDue(a);
    const gate = proxy.hold('POST', CREATE);
    // The held call times out as the real 5 s would, in 1 s: the gate holds it for as long as it waits.
    setPaymentTimeout(1_000);
    try {
      const making = expect(pay.createPaymentLink(a.counter, t.id, ORIGIN)).rejects.toMatchObject({ status: 503 });
      await gate.arrived;
      await making;
    } finally {
      setPaymentTimeout(PAYMENT_TIMEOUT_MS);
    }
    expect(gate.count()).toBe(1);
    const [cut] = await linksOf(t.id);
    expect([cut!.status, cut!.sessionId]).toEqual(['failed', null]);
    expect((await pay.counterSummary(a.counter, t.id)).link).toBeNull();

    // The service made the session after all; its answer was lost.
    const before = proxy.calls.length;
    gate.release();
    await vi.waitFor(() => expect(proxy.calls.length).toBeGreaterThan(before));
    const lost = proxy.calls.at(-1)!;
    expect(lost.idempotencyKey).toBe(sessionKey(cut!.id));

    const made = await pay.createPaymentLink(a.counter, t.id, ORIGIN);
    expect(made.link).toMatchObject({ amountMinor: 1800, status: 'open' });
    expect((await service.checkout.sessions.retrieve(lost.body.id!)).status).toBe('expired');
    const rows = await linksOf(t.id);
    expect(rows.map((l) => [l.status, l.sessionId === lost.body.id])).toEqual([
      ['failed', true],
      ['open', false],
    ]);
  });
});

describe('saving a link the service made', () => {
  it('when saving fails, closes the session at the service and leaves no open link', async () => {
    const t = await ticketDue(a, 4242);
    const before = createdSessions().length;
    // A real database refusal on the finalising write, for this amount only.
    await db.execute(sql`create function refuse_4242() returns trigger language plpgsql as $$ begin raise exception 'refused for the test'; end $$`);
    await db.execute(
      sql`create trigger refuse_4242 before update on payment_links for each row when (new.status = 'open' and new.amount_minor = 4242) execute function refuse_4242()`,
    );
    try {
      await expect(pay.createPaymentLink(a.counter, t.id, ORIGIN)).rejects.toThrow();
    } finally {
      await db.execute(sql`drop trigger refuse_4242 on payment_links`);
      await db.execute(sql`drop function refuse_4242()`);
    }
    const [made] = createdSessions().slice(before);
    expect((await service.checkout.sessions.retrieve(made!)).status).toBe('expired');
    expect((await linksOf(t.id)).map((l) => [l.status, l.sessionId])).toEqual([['failed', made]]);
    expect((await pay.counterSummary(a.counter, t.id)).link).toBeNull();
  });
});

describe('closing links in two phases', () => {
  it('a link left expiring by a crash is closed by the next change', async () => {
    const t = await ticketDue(a);
    await pay.createPaymentLink(a.counter, t.id, ORIGIN);
    const [link] = await linksOf(t.id);
    await db.update(paymentLinks).set({ status: 'expiring' }).where(eq(paymentLinks.id, link!.id));
    await pay.takePayment(a.counter, t.id, { method: 'cash', amountMinor: 500 });
    expect((await linksOf(t.id)).map((l) => l.status)).toEqual(['expired']);
    expect((await service.checkout.sessions.retrieve(link!.sessionId!)).status).toBe('expired');
  });

  it('a payment made online while the link is being closed is recorded, and the price change is refused', async () => {
    const t = await ticketDue(a);
    const made = await pay.createPaymentLink(a.counter, t.id, ORIGIN);
    const gate = proxy.hold('POST', EXPIRE);
    const changing = prices.addLine(a.counter, t.id, extra);
    const refused = expect(changing).rejects.toMatchObject({ status: 409, message: expect.stringMatching(/just paid/) });
    await gate.arrived;
    // The customer pays on the hosted page before the service is asked to close it.
    expect((await fetch(made.link!.url, { method: 'POST', redirect: 'manual' })).status).toBe(303);
    const session = await service.checkout.sessions.retrieve(made.link!.url.split('/pay/')[1]!);
    const payload = JSON.stringify({ id: `evt_${crypto.randomUUID()}`, object: 'event', type: 'checkout.session.completed', data: { object: session } });
    const signature = signer.webhooks.generateTestHeaderString({ payload, secret: 'whsec_phases' });
    expect(await pay.receiveWebhook(payload, signature)).toEqual({ status: 200, message: 'Payment recorded.' });
    gate.release();
    await refused;
    const after = await pay.counterSummary(a.counter, t.id);
    expect([after.due, after.link?.status, after.payments.map((p) => `${p.purpose}/${p.method}`)]).toEqual([0, 'paid', ['balance/online']]);
    expect(await linesOn(t.id)).toHaveLength(1);
  });
});
