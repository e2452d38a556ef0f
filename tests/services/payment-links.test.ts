// Online pay links against the local payment fake (scripts/payments-fake.mjs, through the real
// SDK): a link is marked expired only once the service confirms; when it refuses or cannot be
// reached the link stays open, the change is refused with a clear answer, and nothing is written.
import type { APIContext } from 'astro';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { eq } from 'drizzle-orm';
import Stripe from 'stripe';
import type { Shop } from './fixtures';

const fake = await vi.hoisted(async () => {
  const { startPaymentsFake } = await import('../../scripts/payments-fake.mjs');
  // The webhook goes nowhere (port 9): these tests look at the links, not at recording payments.
  return startPaymentsFake({
    port: 0,
    apiKey: 'sk_test_links_only',
    webhookSecret: 'whsec_links_only',
    webhookUrl: 'http://127.0.0.1:9/api/payments/webhook',
    quiet: true,
  });
});
vi.mock('astro:env/server', async () =>
  (await import('./server-env')).serverEnv({
    PAYMENTS_API_KEY: 'sk_test_links_only',
    PAYMENTS_API_BASE: fake.base,
    PAYMENTS_WEBHOOK_SECRET: 'whsec_links_only',
  }),
);
vi.mock('@/db', () => import('../db/db-mock'));

const { db, handle } = await import('@/db');
const { customers, paymentLinks, priceLines, tickets } = await import('@/db/schema');
const prices = await import('@/services/counter/prices');
const pay = await import('@/services/counter/payments');
const priceLinesRoute = await import('@/pages/api/tickets/[id]/price-lines/index');
const { makeShop, TEST_PRICES } = await import('./fixtures');

const ORIGIN = 'http://127.0.0.1:4321';
const base = new URL(fake.base);
const service = new Stripe('sk_test_links_only', { host: base.hostname, port: Number(base.port), protocol: 'http', telemetry: false });
let a: Shop;
let ticketNo = 7000;

/** A received ticket with one plain hem on it: 18.00 due. */
async function pricedTicket(shop: Shop) {
  ticketNo += 1;
  const [c] = await db.insert(customers).values({ shopId: shop.shopId, name: 'Oda Brindle' }).returning();
  const [t] = await db.insert(tickets).values({ shopId: shop.shopId, number: ticketNo, customerId: c!.id }).returning();
  await prices.addLine(shop.counter, t!.id, { source: 'list', key: 'plain-hem' });
  return t!;
}

const linksOf = (ticketId: string) => db.select().from(paymentLinks).where(eq(paymentLinks.ticketId, ticketId));
const linesOn = (ticketId: string) => db.select().from(priceLines).where(eq(priceLines.ticketId, ticketId));
const rush = { source: 'list', key: 'rush' } as const;

beforeAll(async () => {
  a = await makeShop('Linkside Hems');
  await prices.savePriceList(a.lead, {
    currency: 'EUR',
    hours: '',
    location: '',
    autoReadyNotice: false,
    items: [...TEST_PRICES],
  });
});
afterAll(async () => {
  await fake.close();
  await handle.close();
});

describe('making a pay link', () => {
  it('gives one link for a double click: concurrent calls all answer the same open link', async () => {
    for (let round = 0; round < 3; round += 1) {
      const t = await pricedTicket(a);
      const answers = await Promise.all([1, 2, 3].map(() => pay.createPaymentLink(a.counter, t.id, ORIGIN)));
      const rows = await linksOf(t.id);
      expect(
        rows.map((l) => [l.status, l.amountMinor]),
        `round ${round}`,
      ).toEqual([['open', 1800]]);
      expect(new Set(answers.map((s) => s.link?.url))).toEqual(new Set([rows[0]!.url]));
    }
  });

  it('replaces the open link once the amount due has changed', async () => {
    const t = await pricedTicket(a);
    const first = await pay.createPaymentLink(a.counter, t.id, ORIGIN);
    await pay.takePayment(a.counter, t.id, { method: 'cash', amountMinor: 500 });
    const second = await pay.createPaymentLink(a.counter, t.id, ORIGIN);
    expect(second.link).toMatchObject({ amountMinor: 1300, status: 'open' });
    expect(second.link!.url).not.toBe(first.link!.url);
    expect((await linksOf(t.id)).map((l) => l.status).sort()).toEqual(['expired', 'open']);
  });
});

describe('a price change closes the open pay link at the service first', () => {
  it('marks the link expired once the service has expired it', async () => {
    const t = await pricedTicket(a);
    const made = await pay.createPaymentLink(a.counter, t.id, ORIGIN);
    const [link] = await linksOf(t.id);
    await prices.addLine(a.counter, t.id, rush);
    expect((await linksOf(t.id)).map((l) => l.status)).toEqual(['expired']);
    expect((await service.checkout.sessions.retrieve(link!.sessionId!)).status).toBe('expired');
    expect(made.link?.status).toBe('open');
  });

  it('a deposit taken at the counter closes it too: its amount is no longer the balance', async () => {
    const t = await pricedTicket(a);
    await pay.createPaymentLink(a.counter, t.id, ORIGIN);
    const [link] = await linksOf(t.id);
    await pay.takePayment(a.counter, t.id, { method: 'cash', amountMinor: 500 });
    expect((await linksOf(t.id)).map((l) => l.status)).toEqual(['expired']);
    expect((await service.checkout.sessions.retrieve(link!.sessionId!)).status).toBe('expired');
  });

  it('takes a link the service already expired by itself as expired', async () => {
    const t = await pricedTicket(a);
    await pay.createPaymentLink(a.counter, t.id, ORIGIN);
    const [link] = await linksOf(t.id);
    await service.checkout.sessions.expire(link!.sessionId!);
    await prices.addLine(a.counter, t.id, rush);
    expect((await linksOf(t.id)).map((l) => l.status)).toEqual(['expired']);
    expect((await pay.counterSummary(a.counter, t.id)).due).toBe(2800);
  });

  it('refuses with 409 and keeps the link open when the customer has just paid it online', async () => {
    const t = await pricedTicket(a);
    const made = await pay.createPaymentLink(a.counter, t.id, ORIGIN);
    // The customer pays on the hosted page; the webhook has not reached the shop yet.
    const paid = await fetch(made.link!.url, { method: 'POST', redirect: 'manual' });
    expect(paid.status).toBe(303);
    await expect(prices.addLine(a.counter, t.id, rush)).rejects.toMatchObject({ status: 409, message: expect.stringMatching(/just paid/) });
    expect((await linksOf(t.id)).map((l) => l.status)).toEqual(['open']);
    expect(await linesOn(t.id)).toHaveLength(1);
  });
});

describe('when the payment service cannot be reached', () => {
  it('answers 503 with a message, keeps the link open and adds no line', async () => {
    const t = await pricedTicket(a);
    await pay.createPaymentLink(a.counter, t.id, ORIGIN);
    await fake.close();
    await expect(prices.addLine(a.counter, t.id, rush)).rejects.toMatchObject({ status: 503 });
    await expect(pay.takePayment(a.counter, t.id, { method: 'cash', amountMinor: 1800 })).rejects.toMatchObject({ status: 503 });

    // The same through the endpoint: JSON with the reason, not a 500.
    const c = a.counter;
    const res = await priceLinesRoute.POST({
      locals: { user: { id: c.userId, name: c.userName, email: c.email }, member: { id: c.memberId, role: c.role, shopId: c.shopId, shopName: c.shopName } },
      params: { id: t.id },
      request: new Request(`${ORIGIN}/api/tickets/${t.id}/price-lines`, {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify(rush),
      }),
    } as unknown as APIContext);
    expect(res.status).toBe(503);
    expect(res.headers.get('content-type')).toBe('application/json');
    expect((await res.json()).error).toMatch(/payment service cannot be reached/i);

    expect((await linksOf(t.id)).map((l) => l.status)).toEqual(['open']);
    expect(await linesOn(t.id)).toHaveLength(1);
    expect((await pay.counterSummary(a.counter, t.id)).payments).toEqual([]);
  });
});
