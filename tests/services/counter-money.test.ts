// Issue 14, "Money adds up, always", on the database: a credit owed is shown and settled, a total
// never goes below zero and a large reduction needs the lead, a wrong line is voided with its
// reason, several payments of any amount up to what is due, no hand-over of unpriced work without
// "no charge" and a reason, and one rush rule. Amounts are invented (cents).
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { and, eq } from 'drizzle-orm';
import type { Shop } from './fixtures';

vi.mock('astro:env/server', async () => (await import('./server-env')).serverEnv());
vi.mock('@/db', () => import('../db/db-mock'));

const { db, handle } = await import('@/db');
const { auditEvents, customers, garments, tickets } = await import('@/db/schema');
const prices = await import('@/services/counter/prices');
const pay = await import('@/services/counter/payments');
const { settleCredit } = await import('@/services/counter/refunds');
const { makeShop, TEST_PRICES } = await import('./fixtures');

let a: Shop;
let ticketNo = 8000;

/** A ticket (with one garment at the ticket's step) for a new customer. */
async function ticketFor(shop: Shop, status: 'received' | 'ready' = 'ready', customerId?: string) {
  ticketNo += 1;
  const cid = customerId ?? (await db.insert(customers).values({ shopId: shop.shopId, name: 'Perrin Ashgrove' }).returning())[0]!.id;
  const [t] = await db.insert(tickets).values({ shopId: shop.shopId, number: ticketNo, customerId: cid, status }).returning();
  await db.insert(garments).values({ shopId: shop.shopId, ticketId: t!.id, status, position: 0 });
  return t!;
}

const adjust = (amountMinor: number, label = 'Adjustment') => ({ source: 'adjust' as const, label, amountMinor, reason: 'agreed at the counter' });
const cash = (amountMinor: number) => ({ method: 'cash' as const, amountMinor });

beforeAll(async () => {
  a = await makeShop('Sumbridge Hems');
  await prices.savePriceList(a.lead, { currency: 'EUR', hours: '', location: '', autoReadyNotice: false, items: [...TEST_PRICES] });
});
afterAll(() => handle.close());

describe('an overpayment', () => {
  it('shows as a credit owed to the customer: line 20.00, paid 20.00, adjustment -15.00 leaves 15.00 owed back', async () => {
    const t = await ticketFor(a);
    await prices.addLine(a.counter, t.id, adjust(2000, 'Taper both legs'));
    await pay.takePayment(a.counter, t.id, cash(2000));
    await prices.addLine(a.lead, t.id, adjust(-1500, 'Goodwill'));
    const after = await pay.pickUp(a.counter, t.id);
    expect(after).toMatchObject({ total: 500, paid: 2000, refunded: 0, due: 0, credit: 1500 });
    expect(after.ticket.status).toBe('collected');
  });

  it('is settled as cash back, recorded with who gave it, and the credit is then 0', async () => {
    const t = await ticketFor(a);
    await prices.addLine(a.counter, t.id, adjust(2000));
    await pay.takePayment(a.counter, t.id, cash(2000));
    await prices.addLine(a.lead, t.id, adjust(-1500));
    await expect(settleCredit(a.counter, t.id, { method: 'cash', amountMinor: 1501 })).rejects.toMatchObject({ status: 422 });
    const after = await settleCredit(a.counter, t.id, { method: 'cash', amountMinor: 1500, reason: 'counted back' });
    expect(after).toMatchObject({ paid: 2000, refunded: 1500, credit: 0, due: 0 });
    expect(after.refunds.map((r) => [r.method, r.status, r.amountMinor, r.byName])).toEqual([['cash', 'done', 1500, a.counter.userName]]);
    await expect(settleCredit(a.counter, t.id, { method: 'cash', amountMinor: 1 })).rejects.toMatchObject({ status: 422 });
  });

  it('kept as credit on the customer pays part of their next ticket, once', async () => {
    const first = await ticketFor(a);
    await prices.addLine(a.counter, first.id, adjust(2000));
    await pay.takePayment(a.counter, first.id, cash(2000));
    await prices.addLine(a.counter, first.id, adjust(-800));
    const kept = await settleCredit(a.counter, first.id, { method: 'credit', amountMinor: 800 });
    expect([kept.credit, kept.customerCredit]).toEqual([0, 800]);
    const next = await ticketFor(a, 'received', first.customerId!);
    await prices.addLine(a.counter, next.id, { source: 'list', key: 'plain-hem' });
    await expect(pay.takePayment(a.counter, next.id, { method: 'credit', amountMinor: 900 })).rejects.toMatchObject({ status: 422 });
    const spent = await pay.takePayment(a.counter, next.id, { method: 'credit', amountMinor: 800 });
    expect([spent.paid, spent.due, spent.customerCredit]).toEqual([800, 1000, 0]);
  });
});

describe('a ticket total', () => {
  it('never goes below zero, not even for the lead: -1,000,000.00 is refused', async () => {
    const t = await ticketFor(a);
    await prices.addLine(a.counter, t.id, { source: 'list', key: 'plain-hem' });
    await expect(prices.addLine(a.lead, t.id, adjust(-100_000_000))).rejects.toMatchObject({ status: 422, message: expect.stringMatching(/below zero/) });
    await expect(prices.addLine(a.lead, t.id, adjust(-1801))).rejects.toMatchObject({ status: 422 });
    expect((await pay.counterSummary(a.counter, t.id)).total).toBe(1800);
  });

  it('takes a reduction of more than half only from the lead', async () => {
    const t = await ticketFor(a);
    await prices.addLine(a.counter, t.id, { source: 'list', key: 'plain-hem' });
    await expect(prices.addLine(a.counter, t.id, adjust(-901))).rejects.toMatchObject({ status: 422, message: expect.stringMatching(/lead/) });
    await prices.addLine(a.counter, t.id, adjust(-900));
    await prices.addLine(a.lead, t.id, adjust(-900));
    expect((await pay.counterSummary(a.counter, t.id)).total).toBe(0);
  });
});

describe('a wrong line', () => {
  it('is voided with its reason: it stays on the ticket, leaves the total, and is in the history', async () => {
    const t = await ticketFor(a);
    await prices.addLine(a.counter, t.id, { source: 'list', key: 'plain-hem' });
    const wrong = await prices.addLine(a.counter, t.id, { source: 'list', key: 'cuff-remake' });
    const voided = await prices.voidLine(a.counter, t.id, wrong.id, { reason: 'No old cuff on these' });
    expect([voided.voidReason, voided.voidedById]).toEqual(['No old cuff on these', a.counter.userId]);
    const s = await pay.counterSummary(a.counter, t.id);
    expect(s.total).toBe(1800);
    expect(s.lines.map((l) => [l.key, l.voidReason])).toEqual([
      ['plain-hem', null],
      ['cuff-remake', 'No old cuff on these'],
    ]);
    const events = await db
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.subject, t.id), eq(auditEvents.action, 'prices.line-voided')));
    expect(events.map((e) => (e.detail as { reason: string }).reason)).toEqual(['No old cuff on these']);
    await expect(prices.voidLine(a.counter, t.id, wrong.id, { reason: 'again' })).rejects.toMatchObject({ status: 409 });
  });

  it('cannot be voided when that would leave the total below zero', async () => {
    const t = await ticketFor(a);
    const hem = await prices.addLine(a.counter, t.id, { source: 'list', key: 'plain-hem' });
    await prices.addLine(a.counter, t.id, adjust(-500));
    await expect(prices.voidLine(a.counter, t.id, hem.id, { reason: 'not wanted' })).rejects.toMatchObject({ status: 422 });
  });
});

describe('payments', () => {
  it('are taken several times, any amount up to what is due, each with who, how and when', async () => {
    const t = await ticketFor(a);
    await prices.addLine(a.counter, t.id, { source: 'list', key: 'cuff-from-hem' });
    await pay.takePayment(a.counter, t.id, cash(1000));
    await pay.takePayment(a.lead, t.id, { method: 'card', amountMinor: 700 });
    await expect(pay.takePayment(a.counter, t.id, cash(901))).rejects.toMatchObject({ status: 422 });
    const s = await pay.takePayment(a.counter, t.id, cash(900));
    expect(s.payments.map((p) => [p.method, p.amountMinor, p.takenByName, p.purpose])).toEqual([
      ['cash', 1000, a.counter.userName, 'deposit'],
      ['card', 700, a.lead.userName, 'deposit'],
      ['cash', 900, a.counter.userName, 'balance'],
    ]);
    expect(s.payments.every((p) => p.at instanceof Date)).toBe(true);
    expect([s.paid, s.due]).toEqual([2600, 0]);
    await expect(pay.takePayment(a.counter, t.id, cash(1))).rejects.toMatchObject({ status: 422 });
  });
});

describe('handing over', () => {
  it('refuses a ticket with no price until it is marked no charge with a reason', async () => {
    const t = await ticketFor(a);
    await expect(pay.pickUp(a.counter, t.id)).rejects.toMatchObject({ status: 422, message: expect.stringMatching(/no price/) });
    await prices.addLine(a.counter, t.id, { source: 'no-charge', reason: 'Pressed only, as a favour' });
    const done = await pay.pickUp(a.counter, t.id);
    expect(done.ticket.status).toBe('collected');
    expect(done.lines.map((l) => [l.source, l.amountMinor, l.reason])).toEqual([['no-charge', 0, 'Pressed only, as a favour']]);
  });

  it('refuses "no charge" on a ticket that has a price', async () => {
    const t = await ticketFor(a);
    await prices.addLine(a.counter, t.id, { source: 'list', key: 'plain-hem' });
    await expect(prices.addLine(a.counter, t.id, { source: 'no-charge', reason: 'Favour' })).rejects.toMatchObject({ status: 422 });
  });
});

describe('rush', () => {
  it('is one line per ticket with work on it, also when the work was added by hand', async () => {
    const t = await ticketFor(a, 'received');
    await prices.addLine(a.counter, t.id, { source: 'list', key: 'plain-hem' });
    const { lines } = await prices.priceFromGarments(a.counter, t.id, { rush: true });
    expect(lines.filter((l) => !l.voidedAt).map((l) => l.key)).toEqual(['plain-hem', 'rush']);
    await expect(prices.addLine(a.counter, t.id, { source: 'list', key: 'rush' })).rejects.toMatchObject({ status: 409 });
    const again = await prices.priceFromGarments(a.counter, t.id, { rush: false });
    expect(again.lines.filter((l) => !l.voidedAt).map((l) => l.key)).toEqual(['plain-hem']);
  });

  it('added from the list counts as the rush when pricing from the garments, and needs work first', async () => {
    const t = await ticketFor(a, 'received');
    await expect(prices.addLine(a.counter, t.id, { source: 'list', key: 'rush' })).rejects.toMatchObject({ status: 422 });
    await prices.addLine(a.counter, t.id, { source: 'list', key: 'plain-hem' });
    await prices.addLine(a.counter, t.id, { source: 'list', key: 'rush' });
    const { lines } = await prices.priceFromGarments(a.counter, t.id, { rush: true });
    expect(lines.filter((l) => !l.voidedAt && l.key === 'rush')).toHaveLength(1);
  });
});
