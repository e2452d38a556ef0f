// The counter on the database: price list, lines from garments, payments (any number, up to what
// is due), the signed and idempotent webhook, pickup, and ready notices through a real SMTP
// capture, including a failure on a closed port and its retry.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';
import { createServer } from 'node:net';
import { mkdtempSync, readdirSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { eq } from 'drizzle-orm';
import nodemailer from 'nodemailer';
import Stripe from 'stripe';

const WEBHOOK_SECRET = 'whsec_counter_test_secret';
const mailTarget = vi.hoisted(() => ({ port: 1 }));

vi.mock('astro:env/server', async () => (await import('./server-env')).serverEnv({ PAYMENTS_WEBHOOK_SECRET: 'whsec_counter_test_secret' }));
// The real mail path minus astro:env: nodemailer over SMTP to whatever port the test points at.
vi.mock('@/lib/server/mail', () => ({
  sendMail: async (m: { to: string; subject: string; text: string }) => {
    const transport = nodemailer.createTransport({ host: '127.0.0.1', port: mailTarget.port, secure: false, ignoreTLS: true, connectionTimeout: 2000 });
    await transport.sendMail({ from: 'Cuffwright <no-reply@cuffwright.test>', ...m });
  },
}));
vi.mock('@/db', () => import('../db/db-mock'));

const { db, handle } = await import('@/db');
const { customers, garments, measurements, notices, payments, paymentLinks, tickets } = await import('@/db/schema');
const prices = await import('@/services/counter/prices');
const pay = await import('@/services/counter/payments');
const notice = await import('@/services/notices');
const { makeShop, TEST_PRICES } = await import('./fixtures');
const { startMailCapture } = await import('../../scripts/mail-capture.mjs');

let a: Shop;
let b: Shop;
let ticketNo = 1000;
const signer = new Stripe('sk_test_signing_only');

const LIST = TEST_PRICES;

async function ticketFor(shop: Shop, opts: { status?: 'received' | 'ready'; email?: string | null } = {}) {
  const [c] = await db
    .insert(customers)
    .values({ shopId: shop.shopId, name: 'Wendel Orrin', email: opts.email === undefined ? 'wendel@example.com' : opts.email })
    .returning();
  ticketNo += 1;
  const [t] = await db
    .insert(tickets)
    .values({ shopId: shop.shopId, number: ticketNo, customerId: c!.id, status: opts.status ?? 'received' })
    .returning();
  return t!;
}

async function priced(shop: Shop, opts: Parameters<typeof ticketFor>[1] = {}) {
  const t = await ticketFor(shop, opts);
  await prices.addLine(shop.counter, t.id, { source: 'list', key: 'cuff-from-hem' });
  return t;
}

function signedEvent(event: object, secret = WEBHOOK_SECRET, timestamp?: number) {
  const payload = JSON.stringify(event);
  return { payload, signature: signer.webhooks.generateTestHeaderString({ payload, secret, timestamp }) };
}

function completed(sessionId: string, amount: number, eventId = `evt_${Math.random().toString(36).slice(2)}`) {
  return {
    id: eventId,
    object: 'event',
    type: 'checkout.session.completed',
    data: { object: { id: sessionId, object: 'checkout.session', payment_status: 'paid', amount_total: amount, currency: 'eur' } },
  };
}

async function openLink(shop: Shop, ticketId: string, amountMinor: number) {
  const sessionId = `cs_test_${Math.random().toString(36).slice(2)}`;
  await db.insert(paymentLinks).values({ shopId: shop.shopId, ticketId, sessionId, url: `http://127.0.0.1:9/pay/${sessionId}`, amountMinor, currency: 'EUR' });
  return sessionId;
}

function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const srv = createServer();
    srv.listen(0, '127.0.0.1', () => {
      const port = (srv.address() as { port: number }).port;
      srv.close(() => resolve(port));
    });
  });
}

beforeAll(async () => {
  a = await makeShop('Fenmarsh Alterations');
  b = await makeShop('Other Hems');
  await prices.savePriceList(a.lead, {
    currency: 'EUR',
    hours: 'Tue–Sat 9:00–17:30',
    location: '4 Tallow Lane, Lower Fenmarsh',
    autoReadyNotice: false,
    items: [...LIST],
  });
});
afterAll(() => handle.close());

describe('price list', () => {
  it('keeps the lead’s amounts per shop; another shop still has zeros', async () => {
    const mine = await prices.getPriceList(a.counter);
    expect(mine.items.find((i) => i.key === 'cuff-from-hem')).toEqual({ key: 'cuff-from-hem', label: 'Cuff from a plain hem', amountMinor: 2600 });
    expect(mine.hours).toBe('Tue–Sat 9:00–17:30');
    const theirs = await prices.getPriceList(b.counter);
    expect(theirs.items.every((i) => i.amountMinor === 0)).toBe(true);
  });
});

describe('price lines', () => {
  it('come from the garments: a cuff whose taper plan needs a let-out gets both lines, rush once', async () => {
    const t = await ticketFor(a);
    const [g1] = await db.insert(garments).values({ shopId: a.shopId, ticketId: t.id, description: 'Navy twill', finish: 'cuff', position: 0 }).returning();
    await db.insert(garments).values({ shopId: a.shopId, ticketId: t.id, description: 'Chinos', finish: 'plain', position: 1 });
    // A leg narrowing 1 in over 10 in towards the hem under a 1½ in cuff: the engine asks for a let-out.
    await db.insert(measurements).values({
      shopId: a.shopId,
      garmentId: g1!.id,
      leg: 'left',
      unit: 'in',
      finish: 'cuff',
      values: {
        cuffDepth: { text: '1 1/2' },
        widthAtEdge: { text: '8' },
        widthAbove: { text: '9' },
        heightAbove: { text: '10' },
        seamAllowance: { text: '1' },
      },
    });
    const { lines } = await prices.priceFromGarments(a.counter, t.id, { rush: true });
    expect(lines.map((l) => [l.key, l.amountMinor])).toEqual([
      ['cuff-from-hem', 2600],
      ['taper-let-out', 1200],
      ['plain-hem', 1800],
      ['rush', 1000],
    ]);
    // Pricing again replaces the worked-out lines rather than adding to them.
    const again = await prices.priceFromGarments(a.counter, t.id, { rush: false });
    expect(again.lines.map((l) => l.key)).toEqual(['cuff-from-hem', 'taper-let-out', 'plain-hem']);
  });

  it('take an adjustment with its reason into the total', async () => {
    const t = await priced(a);
    const line = await prices.addLine(a.counter, t.id, { source: 'adjust', label: 'Regular customer', amountMinor: -400, reason: 'Second pair this month' });
    expect(line.reason).toBe('Second pair this month');
    expect((await pay.counterSummary(a.counter, t.id)).total).toBe(2200);
  });

  it("answer 404 for another shop's ticket", async () => {
    const t = await ticketFor(b);
    await expect(prices.listLines(a.counter, t.id)).rejects.toMatchObject({ status: 404 });
    await expect(pay.takePayment(a.counter, t.id, { method: 'cash', amountMinor: 100 })).rejects.toMatchObject({ status: 404 });
  });
});

describe('payments at the counter', () => {
  it('take part payments up to what is due; nothing once paid; a later price rise is due again', async () => {
    const t = await priced(a);
    const afterDeposit = await pay.takePayment(a.counter, t.id, { method: 'cash', amountMinor: 1000 });
    expect([afterDeposit.paid, afterDeposit.due]).toEqual([1000, 1600]);
    await pay.takePayment(a.counter, t.id, { method: 'card', amountMinor: 500 });
    await expect(pay.takePayment(a.counter, t.id, { method: 'card', amountMinor: 1101 })).rejects.toMatchObject({ status: 422 });
    const paid = await pay.takePayment(a.counter, t.id, { method: 'card', amountMinor: 1100 });
    expect(paid.due).toBe(0);
    await expect(pay.takePayment(a.counter, t.id, { method: 'cash', amountMinor: 1600 })).rejects.toMatchObject({ status: 422 });
    await prices.addLine(a.counter, t.id, { source: 'list', key: 'rush' });
    expect((await pay.counterSummary(a.counter, t.id)).due).toBe(1000);
  });

  it('refuse a deposit above the total', async () => {
    const t = await priced(a);
    await expect(pay.takePayment(a.counter, t.id, { method: 'cash', amountMinor: 2601 })).rejects.toMatchObject({ status: 422 });
  });

  it('hand over only a ready ticket with nothing due, closing every garment', async () => {
    const t = await priced(a, { status: 'ready' });
    await db.insert(garments).values({ shopId: a.shopId, ticketId: t.id, finish: 'cuff', status: 'ready' });
    await expect(pay.pickUp(a.counter, t.id)).rejects.toMatchObject({ status: 422 });
    await pay.takePayment(a.counter, t.id, { method: 'cash', amountMinor: 2600 });
    const done = await pay.pickUp(a.counter, t.id);
    expect(done.ticket.status).toBe('collected');
    const left = await db.select().from(garments).where(eq(garments.ticketId, t.id));
    expect(left.map((g) => g.status)).toEqual(['collected']);
    await expect(pay.pickUp(a.counter, t.id)).rejects.toMatchObject({ status: 422 });
  });
});

describe('payment webhook', () => {
  it('records the balance once for a correctly signed event', async () => {
    const t = await priced(a);
    const session = await openLink(a, t.id, 2600);
    const { payload, signature } = signedEvent(completed(session, 2600));
    expect(await pay.receiveWebhook(payload, signature)).toEqual({ status: 200, message: 'Payment recorded.' });
    const summary = await pay.counterSummary(a.counter, t.id);
    expect(summary.due).toBe(0);
    expect(summary.payments.map((p) => [p.purpose, p.method, p.amountMinor, p.reference])).toEqual([['balance', 'online', 2600, session]]);
    expect(summary.link?.status).toBe('paid');
  });

  it('refuses a replay of the same event and changes nothing', async () => {
    const t = await priced(a);
    const session = await openLink(a, t.id, 2600);
    const { payload, signature } = signedEvent(completed(session, 2600, 'evt_replayed_once'));
    expect((await pay.receiveWebhook(payload, signature)).status).toBe(200);
    expect(await pay.receiveWebhook(payload, signature)).toEqual({ status: 409, message: 'Event already processed.' });
    expect(await db.select().from(payments).where(eq(payments.ticketId, t.id))).toHaveLength(1);
  });

  it('refuses a forged signature, a wrong secret, a changed body and a stale timestamp', async () => {
    const t = await priced(a);
    const session = await openLink(a, t.id, 2600);
    const event = completed(session, 2600);
    const good = signedEvent(event);
    expect((await pay.receiveWebhook(good.payload, 't=1,v1=deadbeef')).status).toBe(400);
    expect((await pay.receiveWebhook(good.payload, signedEvent(event, 'whsec_someone_else').signature)).status).toBe(400);
    expect((await pay.receiveWebhook(good.payload.replace('2600', '1'), good.signature)).status).toBe(400);
    expect((await pay.receiveWebhook(good.payload, null)).status).toBe(400);
    // The SDK's default tolerance is 300 s: an event signed an hour ago is a replay.
    const stale = signedEvent(event, WEBHOOK_SECRET, Math.floor(Date.now() / 1000) - 3600);
    expect((await pay.receiveWebhook(stale.payload, stale.signature)).status).toBe(400);
    expect(await db.select().from(payments).where(eq(payments.ticketId, t.id))).toEqual([]);
  });

  it('records money the service took twice as a credit owed; a link closed before cash was taken stays refused', async () => {
    const t = await priced(a);
    const first = await openLink(a, t.id, 2600);
    const second = await openLink(a, t.id, 2600);
    const one = signedEvent(completed(first, 2600));
    const two = signedEvent(completed(second, 2600));
    expect((await pay.receiveWebhook(one.payload, one.signature)).status).toBe(200);
    // The service took the money twice: it is on record, and owed back, never lost.
    expect((await pay.receiveWebhook(two.payload, two.signature)).status).toBe(200);
    expect(await pay.counterSummary(a.counter, t.id)).toMatchObject({ paid: 5200, due: 0, credit: 2600 });

    const cash = await priced(a);
    const link = await openLink(a, cash.id, 2600);
    await pay.takePayment(a.counter, cash.id, { method: 'cash', amountMinor: 2600 });
    const late = signedEvent(completed(link, 2600));
    expect((await pay.receiveWebhook(late.payload, late.signature)).status).toBe(409);
    expect(await db.select().from(payments).where(eq(payments.ticketId, cash.id))).toHaveLength(1);
  });

  it('refuses a link made before the price changed, so a stale amount cannot settle the balance', async () => {
    const t = await priced(a);
    const stale = await openLink(a, t.id, 2600);
    await prices.addLine(a.counter, t.id, { source: 'list', key: 'rush' });
    const paid = signedEvent(completed(stale, 2600));
    expect((await pay.receiveWebhook(paid.payload, paid.signature)).status).toBe(409);
    expect((await pay.counterSummary(a, t.id)).due).toBe(3600);
  });
});

describe('ready notices', () => {
  let dir = '';
  let capture: { port: number; close: () => Promise<void> };
  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), 'cuffwright-notices-'));
    capture = await startMailCapture({ dir, port: 0, quiet: true });
  });
  afterAll(() => capture.close());
  const captured = () =>
    readdirSync(dir)
      .filter((n) => n.endsWith('.json'))
      .map((n) => JSON.parse(readFileSync(join(dir, n), 'utf8')) as { to: string[]; subject: string; text: string });

  it('go out through SMTP with the balance due and the shop hours', async () => {
    mailTarget.port = capture.port;
    const t = await priced(a, { status: 'ready', email: 'orrin.ready@example.com' });
    await pay.takePayment(a.counter, t.id, { method: 'cash', amountMinor: 1000 });
    const sent = await notice.sendReadyNotice(a.counter, t.id);
    expect([sent.status, sent.attempts]).toEqual(['sent', 1]);
    const mail = captured().find((m) => m.to.includes('orrin.ready@example.com'))!;
    expect(mail.subject).toBe(`Ready to collect: ticket FA ${t.number}`);
    expect(mail.text).toContain('Balance due at pickup: €16.00.');
    expect(mail.text).toContain('Opening hours: Tue–Sat 9:00–17:30');
    await expect(notice.sendReadyNotice(a.counter, t.id)).rejects.toMatchObject({ status: 409 });
  });

  it('are refused before the ticket is ready, and without an e-mail address', async () => {
    const early = await priced(a, { status: 'received' });
    await expect(notice.sendReadyNotice(a.counter, early.id)).rejects.toMatchObject({ status: 422 });
    const noMail = await priced(a, { status: 'ready', email: null });
    await expect(notice.sendReadyNotice(a.counter, noMail.id)).rejects.toMatchObject({ status: 422 });
  });

  it('that fail on a closed port stay visible as failed with the error, and go out on retry', async () => {
    mailTarget.port = await freePort();
    const t = await priced(a, { status: 'ready', email: 'orrin.retry@example.com' });
    const failed = await notice.sendReadyNotice(a.counter, t.id);
    expect(failed.status).toBe('failed');
    expect(failed.attempts).toBe(1);
    expect(failed.lastError).toMatch(/ECONNREFUSED|connect/i);
    expect(failed.nextAttemptAt!.getTime()).toBeGreaterThan(Date.now());
    // Not yet due: the timer leaves it; once due (a minute on), it retries and delivers.
    expect(await notice.retryDueNotices(new Date())).toBe(0);
    mailTarget.port = capture.port;
    expect(await notice.retryDueNotices(new Date(Date.now() + 60_000))).toBeGreaterThanOrEqual(1);
    const [row] = await db.select().from(notices).where(eq(notices.id, failed.id));
    expect([row!.status, row!.attempts, row!.lastError]).toEqual(['sent', 2, null]);
    expect(captured().some((m) => m.to.includes('orrin.retry@example.com'))).toBe(true);
  });

  it('claimed by a server that died before sending are sent by another once the lease ends, once', async () => {
    mailTarget.port = capture.port;
    const t = await priced(a, { status: 'ready', email: 'orrin.lease@example.com' });
    // The row as a server leaves it when killed between claiming the attempt and sending.
    const [claimed] = await db
      .insert(notices)
      .values({
        shopId: a.shopId,
        ticketId: t.id,
        kind: 'ready',
        to: 'orrin.lease@example.com',
        subject: 'Ready',
        body: 'Ready.',
        attempts: 1,
        nextAttemptAt: new Date(Date.now() + notice.SEND_LEASE_MS),
      })
      .returning();
    expect(await notice.retryDueNotices(new Date())).toBe(0);
    const later = new Date(Date.now() + notice.SEND_LEASE_MS + 1000);
    // Two servers' timers at the same moment: one mail.
    const tried = await Promise.all([notice.retryDueNotices(later), notice.retryDueNotices(later)]);
    expect(tried.reduce((x, y) => x + y, 0)).toBeGreaterThanOrEqual(1);
    const [row] = await db.select().from(notices).where(eq(notices.id, claimed!.id));
    expect([row!.status, row!.attempts]).toEqual(['sent', 2]);
    expect(captured().filter((m) => m.to.includes('orrin.lease@example.com'))).toHaveLength(1);
    expect(await notice.retryDueNotices(new Date(Date.now() + 10 * notice.SEND_LEASE_MS))).toBe(0);
  });

  it('retry by hand after the automatic tries give up', async () => {
    mailTarget.port = await freePort();
    const t = await priced(a, { status: 'ready', email: 'orrin.manual@example.com' });
    let n = await notice.sendReadyNotice(a.counter, t.id);
    for (let i = 1; i < notice.MAX_AUTO_ATTEMPTS; i += 1) n = await notice.attemptDelivery(n);
    expect([n.status, n.attempts, n.nextAttemptAt]).toEqual(['failed', notice.MAX_AUTO_ATTEMPTS, null]);
    mailTarget.port = capture.port;
    const again = await notice.retryNotice(a.counter, t.id, n.id);
    expect(again.status).toBe('sent');
    await expect(notice.retryNotice(b.counter, t.id, n.id)).rejects.toMatchObject({ status: 404 });
  });

  it('go out by themselves for a shop that turned it on, only for tickets ready since then', async () => {
    mailTarget.port = capture.port;
    const before = await ticketFor(a, { status: 'ready', email: 'orrin.before@example.com' });
    await db
      .update(tickets)
      .set({ updatedAt: new Date(Date.now() - 3_600_000) })
      .where(eq(tickets.id, before.id));
    await prices.savePriceList(a.lead, { currency: 'EUR', hours: 'Tue–Sat 9:00–17:30', location: '', autoReadyNotice: true, items: [...LIST] });
    const after = await ticketFor(a, { status: 'ready', email: 'orrin.auto@example.com' });
    expect(await notice.sweepReadyTickets()).toBeGreaterThanOrEqual(1);
    const rows = await db.select().from(notices).where(eq(notices.ticketId, after.id));
    expect(rows.map((r) => [r.status, r.createdById])).toEqual([['sent', null]]);
    expect(await db.select().from(notices).where(eq(notices.ticketId, before.id))).toEqual([]);
    expect(await notice.sweepReadyTickets()).toBe(0);
  });
});
