// Issue 14: receipts and claim slips print moments in the shop's time zone (shop_settings.time_zone),
// never in the server's. A payment at 02:30 UTC on 1 March is 18:30 on 28 February in Los Angeles
// (UTC−8 in winter: the IANA zone data through Intl); the ticket taken in then was received on the 28th.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';

vi.mock('astro:env/server', async () => (await import('./server-env')).serverEnv());
vi.mock('@/lib/server/mail', () => ({ sendMail: vi.fn(async () => {}) }));
vi.mock('@/db', () => import('../db/db-mock'));

const { db, handle } = await import('@/db');
const { customers, payments, tickets } = await import('@/db/schema');
const { eq } = await import('drizzle-orm');
const prices = await import('@/services/counter/prices');
const pay = await import('@/services/counter/payments');
const { receiptData } = await import('@/services/counter/receipts');
const { saveShopTimeZone } = await import('@/services/shop-time-zone');
const { makeShop, TEST_PRICES } = await import('./fixtures');

let a: Shop;
const AT = new Date('2026-03-01T02:30:00Z');

beforeAll(async () => {
  a = await makeShop('Westward Hems');
  await prices.savePriceList(a.lead, { currency: 'USD', hours: '', location: '', autoReadyNotice: false, items: [...TEST_PRICES] });
  await saveShopTimeZone(a.lead, 'America/Los_Angeles');
});
afterAll(() => handle.close());

describe('times on paper are the shop’s', () => {
  it('a receipt prints the payment and the printing time in the shop’s zone', async () => {
    const [c] = await db.insert(customers).values({ shopId: a.shopId, name: 'Perrin Ashgrove' }).returning();
    const [t] = await db.insert(tickets).values({ shopId: a.shopId, number: 5101, customerId: c!.id, status: 'ready' }).returning();
    await prices.addLine(a.counter, t!.id, { source: 'list', key: 'plain-hem' });
    const after = await pay.takePayment(a.counter, t!.id, { method: 'cash', amountMinor: 1800 });
    await db.update(payments).set({ at: AT }).where(eq(payments.id, after.payments[0]!.id));
    const data = await receiptData(a.counter, t!.id, after.payments[0]!.id, new Date('2026-03-01T02:45:00Z'));
    expect(data.payment.at).toBe('28 Feb 2026, 18:30');
    expect(data.payments[0]!.at).toBe('28 Feb 2026, 18:30');
    expect(data.printedAt).toBe('28 Feb 2026, 18:45');
  });

  it('a claim slip prints the day the trousers came in as the shop’s day', async () => {
    const [c] = await db.insert(customers).values({ shopId: a.shopId, name: 'Perrin Ashgrove' }).returning();
    const [t] = await db.insert(tickets).values({ shopId: a.shopId, number: 5102, customerId: c!.id, createdAt: AT }).returning();
    const slip = await pay.claimSlipData(a.counter, t!.id);
    expect(slip.receivedOn).toBe('2026-02-28');
  });
});
