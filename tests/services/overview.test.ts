// The lead's overview on the database: counted per day in the shop's time zone, only the shop's own
// rows (another shop's busy week changes nothing), totals equal to the sum of the days, and the
// SQL's day buckets the same as the pure helpers'. London's clock goes forward on Sun 29 Mar 2026.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';

vi.mock('@/db', () => import('../db/db-mock'));

const { db, handle } = await import('@/db');
const { auditEvents, customers, garments, payments, refunds, tickets } = await import('@/db/schema');
const { shopOverview } = await import('@/services/overview');
const { saveShopTimeZone, shopTimeZone } = await import('@/services/shop-time-zone');
const { countByDay, dayBounds } = await import('@/lib/shared/overview/shop-days');
const { makeShop } = await import('./fixtures');

// Friday 27 Mar 2026, 10:00 in London (GMT): the week is Mon 23 … Sun 29 Mar.
const NOW = new Date('2026-03-27T10:00:00Z');
const WEEK = ['2026-03-23', '2026-03-24', '2026-03-25', '2026-03-26', '2026-03-27', '2026-03-28', '2026-03-29'];

let a: Shop;
let b: Shop;
let ticketNo = 5000;

afterAll(() => handle.close());

async function ticketOf(shop: Shop) {
  const [c] = await db.insert(customers).values({ shopId: shop.shopId, name: 'Hollis Brack' }).returning();
  ticketNo += 1;
  const [t] = await db.insert(tickets).values({ shopId: shop.shopId, number: ticketNo, customerId: c!.id }).returning();
  return t!;
}

async function garment(shop: Shop, opts: { createdAt: string; status?: (typeof garments.$inferInsert)['status']; dueOn?: string }) {
  const t = await ticketOf(shop);
  const [g] = await db
    .insert(garments)
    .values({
      shopId: shop.shopId,
      ticketId: t.id,
      description: 'Test trousers',
      status: opts.status ?? 'received',
      dueOn: opts.dueOn,
      createdAt: new Date(opts.createdAt),
    })
    .returning();
  return { ticket: t, garment: g! };
}

async function moved(shop: Shop, garmentId: string, to: string, at: string, back = false) {
  await db
    .insert(auditEvents)
    .values({ shopId: shop.shopId, action: 'garment.moved', subject: garmentId, detail: back ? { to, back: true } : { to }, at: new Date(at) });
}

async function paid(
  shop: Shop,
  ticketId: string,
  method: 'cash' | 'card' | 'online' | 'credit',
  amountMinor: number,
  at: string,
  purpose: 'deposit' | 'balance' = 'deposit',
) {
  await db.insert(payments).values({ shopId: shop.shopId, ticketId, purpose, method, amountMinor, currency: 'EUR', at: new Date(at) });
}

// Shop A's intake moments: Monday morning, Saturday 23:30 GMT, Sunday 23:30 UTC (= Monday 00:30
// BST, next week), and the Sunday before the week (outside).
const A_INTAKE = ['2026-03-23T08:00:00Z', '2026-03-23T17:00:00Z', '2026-03-28T23:30:00Z', '2026-03-29T23:30:00Z', '2026-03-22T12:00:00Z'];

beforeAll(async () => {
  a = await makeShop('Overview Shop A');
  b = await makeShop('Overview Shop B');
  const made = [];
  for (const at of A_INTAKE) made.push(await garment(a, { createdAt: at }));
  // Due work: one overdue Tuesday (not ready), one done Tuesday, two still due Saturday, one overdue before the week.
  await garment(a, { createdAt: '2026-03-20T09:00:00Z', dueOn: '2026-03-24', status: 'cut' });
  const done = await garment(a, { createdAt: '2026-03-20T09:00:00Z', dueOn: '2026-03-24', status: 'ready' });
  await garment(a, { createdAt: '2026-03-21T09:00:00Z', dueOn: '2026-03-28', status: 'received' });
  await garment(a, { createdAt: '2026-03-21T09:00:00Z', dueOn: '2026-03-28', status: 'pressed' });
  await garment(a, { createdAt: '2026-03-10T09:00:00Z', dueOn: '2026-03-19', status: 'stitched' });
  // Ready 2 days after intake (Fri 20 09:00 → Sun 22 09:00 is before the week; the last move counts):
  await moved(a, done.garment.id, 'ready', '2026-03-22T09:00:00Z');
  await moved(a, done.garment.id, 'ready', '2026-03-24T09:00:00Z'); // 4 days after intake, in the week
  await moved(a, done.garment.id, 'pressed', '2026-03-24T10:00:00Z', true); // a step back is no move to ready
  // One handed over Wednesday, one in the week's last hour (Sun 29 Mar 22:59 UTC = 23:59 BST).
  await moved(a, made[0]!.garment.id, 'collected', '2026-03-25T12:00:00Z');
  await moved(a, made[1]!.garment.id, 'collected', '2026-03-29T22:59:00Z');
  // Takings: cash Monday, card and cash Thursday, online next Monday (outside).
  await paid(a, made[0]!.ticket.id, 'cash', 1650, '2026-03-23T10:00:00Z');
  await paid(a, made[1]!.ticket.id, 'card', 2400, '2026-03-26T15:00:00Z');
  await paid(a, made[1]!.ticket.id, 'cash', 550, '2026-03-26T16:00:00Z', 'balance');
  await paid(a, made[2]!.ticket.id, 'online', 999, '2026-03-29T23:30:00Z');

  // Shop B: a busy week of its own on the same days, which A must never see.
  for (let i = 0; i < 6; i++) {
    const g = await garment(b, { createdAt: '2026-03-24T10:00:00Z', dueOn: '2026-03-24', status: 'cut' });
    await moved(b, g.garment.id, 'ready', '2026-03-25T10:00:00Z');
    await moved(b, g.garment.id, 'collected', '2026-03-25T11:00:00Z');
    await paid(b, g.ticket.id, 'card', 100_000, '2026-03-25T11:00:00Z');
  }
});

describe('the shop overview', () => {
  it('counts intake per day in the shop time zone, as the pure helpers bucket it', async () => {
    const o = await shopOverview(a.shopId, 'week', NOW);
    expect(o.timeZone).toBe('Europe/London');
    expect(o.today).toBe('2026-03-27');
    expect(o.days.map((d) => d.day)).toEqual(WEEK);
    const created = (await db.select({ at: garments.createdAt }).from(garments)).map((r) => r.at);
    // Every garment of both shops through the helper would be wrong; the shop's own, right.
    const own = (await db.select({ at: garments.createdAt, shop: garments.shopId }).from(garments)).filter((r) => r.shop === a.shopId).map((r) => r.at);
    expect(o.days.map((d) => d.takenIn)).toEqual(countByDay(own, dayBounds(WEEK, 'Europe/London')));
    expect(o.days.map((d) => d.takenIn)).not.toEqual(countByDay(created, dayBounds(WEEK, 'Europe/London')));
    // Mon: two; Sat 23:30 GMT: Saturday; Sun 23:30 UTC is Monday 00:30 BST, next week.
    expect(o.days.map((d) => d.takenIn)).toEqual([2, 0, 0, 0, 0, 1, 0]);
  });

  it('hands over, due, overdue and takings per day; totals are the sums of the days', async () => {
    const o = await shopOverview(a.shopId, 'week', NOW);
    expect(o.days.map((d) => d.handedOver)).toEqual([0, 0, 1, 0, 0, 0, 1]);
    expect(o.days.map((d) => [d.dueDone, d.dueOpen, d.overdue])).toEqual([
      [0, 0, 0],
      [1, 0, 1],
      [0, 0, 0],
      [0, 0, 0],
      [0, 0, 0],
      [0, 2, 0],
      [0, 0, 0],
    ]);
    expect(o.overdueBefore).toBe(1);
    expect(o.overdueNow).toBe(2);
    expect(o.days.map((d) => d.takings)).toEqual([{ cash: 1650 }, {}, {}, { card: 2400, cash: 550 }, {}, {}, {}]);
    expect(o.takings).toEqual([
      { method: 'card', amountMinor: 2400, payments: 1, refundedMinor: 0 },
      { method: 'cash', amountMinor: 2200, payments: 2, refundedMinor: 0 },
    ]);
    for (const t of o.takings) expect(o.days.reduce((s, d) => s + (d.takings[t.method] ?? 0), 0)).toBe(t.amountMinor);
    expect(o.intakeToReady).toEqual({ garments: 1, averageDays: 4 });
    expect(o.currency).toBe('EUR');
  });

  it('waiting work per step is the shop garments at each step, collected left out', async () => {
    const o = await shopOverview(a.shopId, 'week', NOW);
    const all = await db.select({ status: garments.status, shop: garments.shopId }).from(garments);
    const own = all.filter((g) => g.shop === a.shopId && g.status !== 'collected');
    expect(o.waiting.map((w) => w.step)).toEqual(['received', 'marked', 'cut', 'stitched', 'pressed', 'ready']);
    expect(o.waiting.reduce((s, w) => s + w.garments, 0)).toBe(own.length);
    expect(o.waiting.find((w) => w.step === 'cut')!.garments).toBe(1);
  });

  it('another shop sees only its own figures', async () => {
    const o = await shopOverview(b.shopId, 'week', NOW);
    expect(o.days.map((d) => d.takenIn)).toEqual([0, 6, 0, 0, 0, 0, 0]);
    expect(o.days.map((d) => d.handedOver)).toEqual([0, 0, 6, 0, 0, 0, 0]);
    expect(o.takings).toEqual([{ method: 'card', amountMinor: 600_000, payments: 6, refundedMinor: 0 }]);
    expect(o.intakeToReady).toEqual({ garments: 6, averageDays: 1 });
    expect(o.overdueBefore).toBe(0);
    expect(o.waiting.reduce((s, w) => s + w.garments, 0)).toBe(6);
    // A shop with nothing: zeros, no average.
    const empty = await makeShop('Overview Empty');
    const e = await shopOverview(empty.shopId, '4w', NOW);
    expect(e.days).toHaveLength(28);
    expect(e.days.every((d) => d.takenIn === 0 && d.handedOver === 0 && Object.keys(d.takings).length === 0)).toBe(true);
    expect(e.intakeToReady).toEqual({ garments: 0, averageDays: null });
  });

  it('takings are money in: refunds given back come off their method and day, kept credit and pending refunds do not', async () => {
    const shop = await makeShop('Overview Refunds');
    const t = await ticketOf(shop);
    await paid(shop, t.id, 'card', 3000, '2026-03-23T10:00:00Z');
    await paid(shop, t.id, 'credit', 500, '2026-03-24T10:00:00Z', 'balance');
    const refund = (method: 'cash' | 'card' | 'online' | 'credit', status: 'pending' | 'done' | 'failed', amountMinor: number, at: string) =>
      db.insert(refunds).values({ shopId: shop.shopId, ticketId: t.id, method, status, amountMinor, currency: 'EUR', at: new Date(at) });
    await refund('card', 'done', 700, '2026-03-25T10:00:00Z');
    await refund('online', 'pending', 100, '2026-03-25T10:00:00Z');
    await refund('cash', 'failed', 100, '2026-03-25T10:00:00Z');
    await refund('credit', 'done', 200, '2026-03-25T10:00:00Z');
    const o = await shopOverview(shop.shopId, 'week', NOW);
    expect(o.takings).toEqual([{ method: 'card', amountMinor: 2300, payments: 1, refundedMinor: 700 }]);
    expect(o.days.map((d) => d.takings)).toEqual([{ card: 3000 }, {}, { card: -700 }, {}, {}, {}, {}]);
  });

  it('four weeks reach back three weeks before this one', async () => {
    const o = await shopOverview(a.shopId, '4w', NOW);
    expect(o.days[0]!.day).toBe('2026-03-02');
    expect(o.days.at(-1)!.day).toBe('2026-03-29');
    // Sun 22 Mar: one intake now inside the period; the ready move that day is not the garment's last.
    expect(o.days.find((d) => d.day === '2026-03-22')!.takenIn).toBe(1);
    expect(o.overdueBefore).toBe(0);
    expect(o.days.find((d) => d.day === '2026-03-19')!.overdue).toBe(1);
  });

  it('the shop time zone moves the day boundaries; an unknown zone is refused', async () => {
    await saveShopTimeZone(a.lead, 'America/New_York');
    expect(await shopTimeZone(a.shopId)).toEqual({ timeZone: 'America/New_York', chosen: true });
    const o = await shopOverview(a.shopId, 'week', NOW);
    // Sat 23:30 GMT is Sat 19:30 in New York; Sun 23:30 UTC is Sun 19:30, now inside the week.
    expect(o.days.map((d) => d.takenIn)).toEqual([2, 0, 0, 0, 0, 1, 1]);
    expect(o.days.find((d) => d.day === '2026-03-29')!.takings).toEqual({ online: 999 });
    await expect(saveShopTimeZone(a.lead, 'Mars/Olympus_Mons')).rejects.toMatchObject({ status: 422 });
    expect((await shopTimeZone(a.shopId)).timeZone).toBe('America/New_York');
    await saveShopTimeZone(a.lead, 'Europe/London');
  });
});
