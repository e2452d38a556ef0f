// The demo shop's overview is not empty: its garments came in over the past days, moved along the
// bench, and two tickets took money whose sums still hold at the counter (paid never over total).
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';
import { eq } from 'drizzle-orm';

vi.mock('astro:env/server', async () => (await import('./server-env')).serverEnv({ PAYMENTS_WEBHOOK_SECRET: 'whsec_demo_overview' }));
vi.mock('@/db', () => import('../db/db-mock'));

const { db, handle } = await import('@/db');
const { customers, tickets } = await import('@/db/schema');
const { seedBenchDemo } = await import('@/services/demo-bench-seed');
const { seedCounterDemo } = await import('@/services/demo-counter-seed');
const { seedOverviewDemo } = await import('@/services/demo-overview-seed');
const { shopOverview } = await import('@/services/overview');
const { counterSummary } = await import('@/services/counter/summary');
const { makeShop } = await import('./fixtures');

let shop: Shop;
const NOW = new Date();

beforeAll(async () => {
  shop = await makeShop('Demo Overview Shop');
  const people = await db
    .insert(customers)
    .values(['One', 'Two', 'Three', 'Four'].map((name) => ({ name, shopId: shop.shopId })))
    .returning({ id: customers.id });
  const ids = { lead: shop.lead.userId, tailor: shop.tailor.userId, apprentice: shop.apprentice.userId, counter: shop.counter.userId };
  await seedBenchDemo(
    shop.shopId,
    people.map((p) => p.id),
    ids,
  );
  await seedCounterDemo(shop.shopId);
  await seedOverviewDemo(shop.shopId, ids, NOW);
});
afterAll(() => handle.close());

describe('demo overview seed', () => {
  it('gives the last four weeks intake, a hand-over, takings by two methods and a time to ready', async () => {
    const o = await shopOverview(shop.shopId, '4w', NOW);
    const sum = (pick: (d: (typeof o.days)[number]) => number) => o.days.reduce((s, d) => s + pick(d), 0);
    expect(sum((d) => d.takenIn)).toBe(7);
    expect(sum((d) => d.handedOver)).toBe(1);
    expect(o.takings).toEqual([
      { method: 'cash', amountMinor: 650 + 1500, payments: 2, refundedMinor: 0 },
      { method: 'card', amountMinor: 1000, payments: 1, refundedMinor: 0 },
    ]);
    expect(o.intakeToReady.garments).toBeGreaterThanOrEqual(1);
    expect(o.intakeToReady.averageDays).toBeGreaterThan(0);
    expect(o.waiting.reduce((s, w) => s + w.garments, 0)).toBe(6);
    // Today's intake is in this week whatever the weekday.
    const week = await shopOverview(shop.shopId, 'week', NOW);
    expect(week.days.find((d) => d.day === week.today)!.takenIn).toBeGreaterThan(0);
  });

  it('keeps the counter sums: the linen pair paid in full, the chinos with a deposit below their total', async () => {
    const rows = await db.select().from(tickets).where(eq(tickets.shopId, shop.shopId));
    const linen = await counterSummary(shop, rows.find((t) => t.status === 'collected')!.id);
    expect([linen.total, linen.paid, linen.due, linen.credit]).toEqual([1650, 1650, 0, 0]);
    const chinos = await counterSummary(shop, rows.find((t) => t.number === 1002)!.id);
    expect([chinos.total, chinos.paid, chinos.due]).toEqual([3300, 1500, 1800]);
  });
});
