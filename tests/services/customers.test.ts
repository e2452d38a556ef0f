// Customers: read and changed only within their own shop, each change audited with old and new.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';
import { and, eq } from 'drizzle-orm';

vi.mock('@/db', () => import('../db/db-mock'));

const { db, handle } = await import('@/db');
const { auditEvents } = await import('@/db/schema');
const { createCustomer, getCustomer, updateCustomer } = await import('@/services/customers');
const { makeShop } = await import('./fixtures');

let a: Shop;
let b: Shop;

beforeAll(async () => {
  a = await makeShop('Customer Shop A');
  b = await makeShop('Customer Shop B');
});
afterAll(() => handle.close());

describe('customers', () => {
  it('change only what is sent, with the old and new values audited', async () => {
    const c = await createCustomer(a.counter, { name: 'Hollis Brandt', phone: '555-0101' });
    const changed = await updateCustomer(a.tailor, c.id, { phone: '555-0102', notes: 'Likes a short break.' });
    expect(changed).toMatchObject({ name: 'Hollis Brandt', phone: '555-0102', notes: 'Likes a short break.' });
    const [event] = await db
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.subject, c.id), eq(auditEvents.action, 'customer.changed')));
    expect(event!.actorId).toBe(a.tailor.userId);
    expect(event!.detail).toEqual({ phone: { old: '555-0101', new: '555-0102' }, notes: { old: null, new: 'Likes a short break.' } });
  });

  it("answer 404 for another shop's customer, and change nothing there", async () => {
    const theirs = await createCustomer(b.counter, { name: 'Stays in B' });
    await expect(getCustomer(a.lead, theirs.id)).rejects.toMatchObject({ status: 404 });
    await expect(updateCustomer(a.lead, theirs.id, { name: 'Renamed' })).rejects.toMatchObject({ status: 404 });
    expect((await getCustomer(b.lead, theirs.id)).name).toBe('Stays in B');
  });

  it('keep how notices reach them (issue 14): texts need a phone number, kept or sent with it, and the change is audited', async () => {
    const c = await createCustomer(a.counter, { name: 'Wenna Colley', email: 'wenna@example.com' });
    expect(c.contactBy).toBe('email');
    await expect(updateCustomer(a.counter, c.id, { contactBy: 'text' })).rejects.toMatchObject({
      status: 422,
      message: 'A text message needs a phone number: add one, or choose e-mail.',
    });
    const both = await updateCustomer(a.counter, c.id, { contactBy: 'both', phone: '07700 900200' });
    expect([both.contactBy, both.phone]).toEqual(['both', '07700 900200']);
    // Taking the phone away from a customer who wants texts is refused the same way.
    await expect(updateCustomer(a.counter, c.id, { phone: null })).rejects.toMatchObject({ status: 422 });
    const events = await db
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.subject, c.id), eq(auditEvents.action, 'customer.changed')));
    expect(events.map((e) => e.detail)).toEqual([{ phone: { old: null, new: '07700 900200' }, contactBy: { old: 'email', new: 'both' } }]);
  });
});
