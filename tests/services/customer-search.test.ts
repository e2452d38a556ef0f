// Customer search as you type: by name (or a word of it), phone digits, e-mail or ticket number,
// and only ever within the searching member's own shop.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';

vi.mock('@/db', () => import('../db/db-mock'));

const { handle } = await import('@/db');
const { createCustomer, searchCustomers, eraseCustomer } = await import('@/services/customers');
const { createTicket } = await import('@/services/tickets');
const { makeShop } = await import('./fixtures');

let a: Shop;
let stranger: Shop;
let ivo = '';
let ticketNumber = 0;

beforeAll(async () => {
  a = await makeShop('Search Shop A');
  stranger = await makeShop('Search Stranger');
  ivo = (await createCustomer(a.counter, { name: 'Ivo Quendell', phone: '(555) 013-2288', email: 'ivo.q@example.com' })).id;
  await createCustomer(a.counter, { name: 'Marta Quill', phone: '555 019 4400', email: 'mq@example.com' });
  ticketNumber = (await createTicket(a.counter, { customerId: ivo, garments: [{ description: 'Navy chinos' }] })).number;
  // The stranger's shop has a customer named and numbered alike.
  await createCustomer(stranger.counter, { name: 'Ivo Quendell', phone: '555-013-2288', email: 'ivo.q@example.com' });
});
afterAll(() => handle.close());

const names = async (shop: Shop, q: string) => (await searchCustomers(shop.counter, q)).map((c) => c.name).sort();

describe('customer search', () => {
  it('finds by the start of the name or of a word in it, in any case', async () => {
    expect(await names(a, 'iv')).toEqual(['Ivo Quendell']);
    expect(await names(a, 'QUE')).toEqual(['Ivo Quendell']);
    expect(await names(a, 'qu')).toEqual(['Ivo Quendell', 'Marta Quill']);
  });

  it('finds by phone digits however the number was written or typed', async () => {
    expect(await names(a, '013 2288')).toEqual(['Ivo Quendell']);
    expect(await names(a, '0132288')).toEqual(['Ivo Quendell']);
    expect(await names(a, '555')).toEqual(['Ivo Quendell', 'Marta Quill']);
  });

  it('finds by the start of the e-mail and by ticket number, with or without T-', async () => {
    expect(await names(a, 'ivo.q@')).toEqual(['Ivo Quendell']);
    expect(await names(a, `T-${ticketNumber}`)).toEqual(['Ivo Quendell']);
    const [hit] = await searchCustomers(a.counter, String(ticketNumber));
    expect(hit).toMatchObject({ id: ivo, lastTicket: ticketNumber });
  });

  it('reads LIKE wildcards as plain characters', async () => {
    expect(await names(a, '%')).toEqual([]);
    expect(await names(a, '_vo')).toEqual([]);
  });

  it("never finds another shop's customers, by name, phone, e-mail or ticket number", async () => {
    for (const q of ['Ivo', '0132288', 'ivo.q@', `T-${ticketNumber}`, 'Marta', '']) {
      const hits = await searchCustomers(stranger.lead, q);
      expect(
        hits.map((h) => h.id),
        q,
      ).not.toContain(ivo);
      expect(
        hits.every((h) => h.lastTicket === null),
        q,
      ).toBe(true);
    }
    expect(await names(stranger, 'qu')).toEqual(['Ivo Quendell']);
  });

  it('never finds an erased customer', async () => {
    const gone = await createCustomer(a.counter, { name: 'Zora Quist', phone: '555 777 1212' });
    expect(await names(a, 'zora')).toEqual(['Zora Quist']);
    await eraseCustomer(a.lead, gone.id);
    expect(await names(a, 'zora')).toEqual([]);
    expect(await names(a, 'erased')).toEqual([]);
  });
});
