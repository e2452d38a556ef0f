// Issue 13, "Hand-over through the counter skips the garment-moved event: every move goes through
// one path". The counter's pickup of a whole ticket records each garment's move and tells the
// listeners, like a garment moved on the bench, and the overview counts the pair handed over once.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { and, eq } from 'drizzle-orm';
import type { Shop } from './fixtures';

vi.mock('astro:env/server', () => ({ BODY_IDLE_SECONDS: 20, PAYMENTS_API_KEY: undefined, PAYMENTS_API_BASE: undefined, PAYMENTS_WEBHOOK_SECRET: undefined }));
vi.mock('@/db', () => import('../db/db-mock'));

const { db, handle } = await import('@/db');
const { auditEvents, customers, garments, tickets } = await import('@/db/schema');
const prices = await import('@/services/counter/prices');
const pay = await import('@/services/counter/payments');
const { garmentMovedListeners } = await import('@/services/garment-events');
const { shopOverview } = await import('@/services/overview');
const { makeShop, TEST_PRICES } = await import('./fixtures');

let a: Shop;

beforeAll(async () => {
  a = await makeShop('One Path Hems');
  await prices.savePriceList(a.lead, { currency: 'EUR', hours: '', location: '', autoReadyNotice: false, items: [...TEST_PRICES] });
});
afterAll(() => handle.close());

/** A ready ticket with two ready garments, priced and paid. */
async function paidReadyTicket() {
  const [c] = await db.insert(customers).values({ shopId: a.shopId, name: 'Isolde Marrowfield' }).returning();
  const [t] = await db.insert(tickets).values({ shopId: a.shopId, number: 9101, customerId: c!.id, status: 'ready' }).returning();
  const gs = await db
    .insert(garments)
    .values([0, 1].map((position) => ({ shopId: a.shopId, ticketId: t!.id, status: 'ready' as const, position })))
    .returning();
  await prices.addLine(a.counter, t!.id, { source: 'adjust', label: 'Shorten with cuffs', amountMinor: 3000, reason: 'agreed at the counter' });
  await pay.takePayment(a.counter, t!.id, { method: 'cash', amountMinor: 3000 });
  return { ticket: t!, garments: gs };
}

describe('the counter handing a ticket over', () => {
  it('records garment.moved ready → collected for each garment, and tells the listeners', async () => {
    const heard: string[] = [];
    const listener = async (actor: { role: string }, garment: { id: string; status: string }) =>
      void heard.push(`${actor.role}:${garment.status}:${garment.id}`);
    garmentMovedListeners.push(listener);
    try {
      const { ticket, garments: gs } = await paidReadyTicket();
      await pay.pickUp(a.counter, ticket.id);
      const moves = await db
        .select()
        .from(auditEvents)
        .where(and(eq(auditEvents.shopId, a.shopId), eq(auditEvents.action, 'garment.moved')));
      expect(moves.map((m) => [m.subject, m.detail]).sort()).toEqual(gs.map((g) => [g.id, { from: 'ready', to: 'collected' }]).sort());
      expect(heard.sort()).toEqual(gs.map((g) => `counter:collected:${g.id}`).sort());
      const [t] = await db.select().from(tickets).where(eq(tickets.id, ticket.id));
      expect(t!.status).toBe('collected');
      const overview = await shopOverview(a.shopId, 'week');
      expect(overview.days.reduce((n, d) => n + d.handedOver, 0)).toBe(2);
    } finally {
      garmentMovedListeners.splice(garmentMovedListeners.indexOf(listener), 1);
    }
  });
});
