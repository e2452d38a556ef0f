// The demo bench: numbered tickets whose garments stand at every step, a ticket at its slowest
// garment, fittings that differ by leg with their history, and work overdue and due today.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';
import { asc, eq } from 'drizzle-orm';

vi.mock('@/db', () => import('../db/db-mock'));

const { db, handle } = await import('@/db');
const { customers, tickets } = await import('@/db/schema');
const { seedBenchDemo } = await import('@/services/demo-bench-seed');
const { getGarment, listQueue } = await import('@/services/garments');
const { fittingOf } = await import('@/services/measurements');
const { GARMENT_STEPS, leastAdvanced } = await import('@/lib/shared/garment-steps');
const { todayIso } = await import('@/lib/shared/due-date');
const { makeShop } = await import('./fixtures');

let shop: Shop;

beforeAll(async () => {
  shop = await makeShop('Demo Bench Shop');
  const people = await db
    .insert(customers)
    .values(['One', 'Two', 'Three', 'Four'].map((name) => ({ name, shopId: shop.shopId })))
    .returning({ id: customers.id });
  await seedBenchDemo(
    shop.shopId,
    people.map((p) => p.id),
    { tailor: shop.tailor.userId, apprentice: shop.apprentice.userId, counter: shop.counter.userId },
  );
});
afterAll(() => handle.close());

describe('demo bench seed', () => {
  it('numbers six tickets from 1001, each standing at its least advanced garment', async () => {
    const rows = await db.select().from(tickets).where(eq(tickets.shopId, shop.shopId)).orderBy(asc(tickets.number));
    expect(rows.map((t) => t.number)).toEqual([1001, 1002, 1003, 1004, 1005, 1006]);
    const queue = await listQueue(shop.lead);
    for (const t of rows) expect(t.status).toBe(leastAdvanced(queue.filter((g) => g.ticketId === t.id).map((g) => g.status)));
  });

  it('puts garments at every step but pressed, with some overdue and some due today', async () => {
    const queue = await listQueue(shop.lead);
    const steps = new Set(queue.map((g) => g.status));
    expect(GARMENT_STEPS.filter((s) => !steps.has(s))).toEqual(['pressed']);
    const today = todayIso();
    expect(queue.some((g) => g.dueOn! < today && g.status !== 'collected')).toBe(true);
    expect(queue.some((g) => g.dueOn === today)).toBe(true);
  });

  it('keeps fittings per leg, the navy pair differing by leg, with the history of typing them in', async () => {
    const navy = (await listQueue(shop.lead)).find((g) => g.description === 'Navy suit trousers')!;
    const fitting = await fittingOf(shop.lead, navy.id);
    const [left, right] = fitting.legs;
    expect(left!.values.backPin).toEqual({ text: '31 1/4', mm: 793.75 });
    expect(right!.values.backPin).toEqual({ text: '31 1/2', mm: 800.1 });
    expect(fitting.history.filter((e) => e.action === 'measurement.changed')).toHaveLength(8);
  });

  it('brings one pair in with an old cuff (the charcoal wool), every other pair with a plain hem', async () => {
    const queue = await listQueue(shop.lead);
    const came = await Promise.all(queue.map(async (g) => [g.description, (await getGarment(shop.lead, g.id)).existingFinish]));
    expect(came.filter(([, f]) => f === 'cuff')).toEqual([['Charcoal wool trousers', 'cuff']]);
    expect(came.filter(([, f]) => f !== 'cuff' && f !== 'plain-hem')).toEqual([]);
  });
});
