// The counter under concurrent writes on the database: pickup against a price line added at the
// same moment, so a ticket is never handed over with money still due.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { sql } from 'drizzle-orm';
import type { Shop } from './fixtures';

vi.mock('astro:env/server', async () => (await import('./server-env')).serverEnv());
vi.mock('@/db', () => import('../db/db-mock'));

const { db, handle } = await import('@/db');
const { customers, garments, tickets } = await import('@/db/schema');
const prices = await import('@/services/counter/prices');
const pay = await import('@/services/counter/payments');
const { makeShop, TEST_PRICES } = await import('./fixtures');

let a: Shop;
let ticketNo = 5000;

/** A ready ticket with one ready garment, priced and paid in full by its deposit: pickup may go ahead. */
async function readyAndPaid(shop: Shop) {
  ticketNo += 1;
  const [c] = await db.insert(customers).values({ shopId: shop.shopId, name: 'Ilse Marrow' }).returning();
  const [t] = await db.insert(tickets).values({ shopId: shop.shopId, number: ticketNo, customerId: c!.id, status: 'ready' }).returning();
  await db.insert(garments).values({ shopId: shop.shopId, ticketId: t!.id, status: 'ready', position: 0 });
  await prices.addLine(shop.counter, t!.id, { source: 'list', key: 'plain-hem' });
  await pay.takePayment(shop.counter, t!.id, { method: 'cash', amountMinor: 1800 });
  return t!;
}

beforeAll(async () => {
  a = await makeShop('Racing Hems');
  await prices.savePriceList(a.lead, {
    currency: 'EUR',
    hours: '',
    location: '',
    autoReadyNotice: false,
    items: [...TEST_PRICES],
  });
});
afterAll(() => handle.close());

describe('pickup against a price change at the same moment', () => {
  it('never hands a ticket over with a balance due', async () => {
    for (let round = 0; round < 12; round += 1) {
      const t = await readyAndPaid(a);
      // The line starts a few database round trips after pickup, a different moment each round.
      const lateLine = async () => {
        for (let hop = 0; hop < round; hop += 1) await db.execute(sql`select 1`);
        return prices.addLine(a.counter, t.id, { source: 'adjust', label: 'Extra pressing', amountMinor: 500, reason: 'asked at pickup' });
      };
      const results = await Promise.allSettled([pay.pickUp(a.counter, t.id), lateLine()]);
      const after = await pay.counterSummary(a.counter, t.id);
      expect(
        results.some((r) => r.status === 'fulfilled'),
        `round ${round}`,
      ).toBe(true);
      expect(after.ticket.status === 'collected' && after.due > 0, `round ${round}: collected with ${after.due} due`).toBe(false);
    }
  });
});
