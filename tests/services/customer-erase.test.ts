// Forgetting a customer: personal details, notes, garment photos and old values in the history go;
// tickets, garments, price lines and payments stay. Only the lead may do it, only in their shop.
import { mkdtempSync, existsSync, writeFileSync, mkdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { and, eq } from 'drizzle-orm';
import type { Shop } from './fixtures';

vi.mock('@/db', () => import('../db/db-mock'));

const { db, handle } = await import('@/db');
const { auditEvents, customers, files, garments, payments, priceLines, tickets } = await import('@/db/schema');
const { useStorage } = await import('@/lib/server/storage');
const { DiskStorage } = await import('@/lib/server/storage/disk-storage');
const { createCustomer, eraseCustomer, getCustomer, updateCustomer, customerFile } = await import('@/services/customers');
const { createTicket } = await import('@/services/tickets');
const { garmentsOfTicket } = await import('@/services/garments');
const { makeShop } = await import('./fixtures');

const root = join(mkdtempSync(join(tmpdir(), 'cuffwright-erase-')), 'files');
useStorage(new DiskStorage(root));

let a: Shop;
let b: Shop;

beforeAll(async () => {
  a = await makeShop('Erase Shop A');
  b = await makeShop('Erase Shop B');
});
afterAll(() => handle.close());

async function customerWithMoney(shop: Shop) {
  const c = await createCustomer(shop.counter, { name: 'Oriel Vantry', phone: '555 010 3030', email: 'oriel@example.com', notes: 'Left leg 1 cm shorter.' });
  await updateCustomer(shop.counter, c.id, { phone: '555 010 4040' });
  const t = await createTicket(shop.counter, { customerId: c.id, garments: [{ description: 'Charcoal flannels' }] });
  const [g] = await garmentsOfTicket(shop.shopId, t.id);
  await db
    .insert(priceLines)
    .values({ shopId: shop.shopId, ticketId: t.id, garmentId: g!.id, source: 'list', key: 'plain-hem', label: 'Plain hem', amountMinor: 1800 });
  await db.insert(payments).values({ shopId: shop.shopId, ticketId: t.id, purpose: 'deposit', method: 'cash', amountMinor: 1000, currency: 'EUR' });
  const key = `${shop.shopId}/erase-${g!.id}.jpg`;
  mkdirSync(join(root, shop.shopId), { recursive: true });
  writeFileSync(join(root, key), 'not really a picture');
  await db.insert(files).values({
    shopId: shop.shopId,
    ticketId: t.id,
    garmentId: g!.id,
    kind: 'fitting-photo',
    path: key,
    mimeType: 'image/jpeg',
    bytes: 20,
    originalName: 'hem.jpg',
  });
  return { c, t, g: g!, key };
}

describe('erasing a customer', () => {
  it('removes the personal details and photos and keeps the money records', async () => {
    const { c, t, g, key } = await customerWithMoney(a);
    const erased = await eraseCustomer(a.lead, c.id);
    expect(erased).toMatchObject({ name: 'erased', phone: null, email: null, notes: null });
    const [row] = await db.select().from(customers).where(eq(customers.id, c.id));
    expect(row).toMatchObject({ name: 'erased', phone: null, email: null, notes: null, phoneDigits: '' });
    expect(row!.erasedAt).not.toBeNull();
    // Money and work stay.
    expect(await db.select().from(tickets).where(eq(tickets.id, t.id))).toHaveLength(1);
    expect(await db.select().from(garments).where(eq(garments.id, g.id))).toHaveLength(1);
    expect((await db.select().from(priceLines).where(eq(priceLines.ticketId, t.id))).map((l) => l.amountMinor)).toEqual([1800]);
    expect((await db.select().from(payments).where(eq(payments.ticketId, t.id))).map((p) => p.amountMinor)).toEqual([1000]);
    // Photos: the rows and the bytes in the storage.
    expect(await db.select().from(files).where(eq(files.garmentId, g.id))).toEqual([]);
    expect(existsSync(join(root, key))).toBe(false);
    // The history keeps who changed what, never the old phone number.
    const history = await db
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.shopId, a.shopId), eq(auditEvents.subject, c.id)));
    expect(JSON.stringify(history.map((h) => h.detail))).not.toMatch(/555|oriel|Oriel|shorter/);
    expect(history.map((h) => h.action)).toContain('customer.erased');
    const file = await customerFile(a.lead, c.id);
    expect(file.tickets.map((x) => x.number)).toEqual([t.number]);
    expect(file.tickets[0]!.payments.map((p) => p.amountMinor)).toEqual([1000]);
  });

  it('refuses every role but the lead, and changes nothing', async () => {
    const { c } = await customerWithMoney(a);
    for (const role of ['tailor', 'counter', 'apprentice'] as const) {
      await expect(eraseCustomer(a[role], c.id)).rejects.toMatchObject({ status: 422 });
    }
    expect((await getCustomer(a.lead, c.id)).name).toBe('Oriel Vantry');
  });

  it("answers 404 for another shop's customer, who keeps their details", async () => {
    const { c } = await customerWithMoney(b);
    await expect(eraseCustomer(a.lead, c.id)).rejects.toMatchObject({ status: 404 });
    expect(await getCustomer(b.lead, c.id)).toMatchObject({ name: 'Oriel Vantry', email: 'oriel@example.com' });
  });

  it('refuses to fill an erased customer in again', async () => {
    const { c } = await customerWithMoney(a);
    await eraseCustomer(a.lead, c.id);
    await expect(updateCustomer(a.counter, c.id, { name: 'Oriel Vantry' })).rejects.toMatchObject({ status: 409 });
  });
});
