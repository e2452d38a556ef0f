// Tickets: each shop sees only its own; an apprentice sees assigned-to-them and unassigned; a
// ticket moves one step at a time, and pickup is the counter's (or lead's).
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { eq } from 'drizzle-orm';

vi.mock('@/db', async () => {
  const { openTestDb } = await import('../db/test-db');
  const handle = await openTestDb();
  return { handle, db: handle.db };
});

const { db, handle } = await import('@/db');
const { tickets } = await import('@/db/schema');
const { createTicket, listTickets, moveTicket, nextStatus } = await import('@/services/tickets');
const { createCustomer } = await import('@/services/customers');
const { ServiceError } = await import('@/services/errors');
const { makeShop } = await import('./fixtures');

let a: Awaited<ReturnType<typeof makeShop>>;
let b: Awaited<ReturnType<typeof makeShop>>;

beforeAll(async () => {
  a = await makeShop('Shop A');
  b = await makeShop('Shop B');
});
afterAll(() => handle.close());

describe('tickets', () => {
  it('are listed only to members of their own shop', async () => {
    const mine = await createTicket(a.counter, { note: 'A only' });
    const theirs = await createTicket(b.counter, { note: 'B only' });
    const seenByA = (await listTickets(a.lead)).map((t) => t.id);
    const seenByB = (await listTickets(b.lead)).map((t) => t.id);
    expect(seenByA).toContain(mine.id);
    expect(seenByA).not.toContain(theirs.id);
    expect(seenByB).toContain(theirs.id);
    expect(seenByB).not.toContain(mine.id);
  });

  it("refuse another shop's customer at intake", async () => {
    const customer = await createCustomer(b.counter, { name: 'Belongs to B' });
    await expect(createTicket(a.counter, { customerId: customer.id })).rejects.toMatchObject({ status: 422 });
  });

  it('show an apprentice only tickets assigned to them or to nobody', async () => {
    const open = await createTicket(a.lead, { note: 'unassigned' });
    const theirs = await createTicket(a.lead, { note: 'for the apprentice' });
    const tailors = await createTicket(a.lead, { note: "for the tailor" });
    await db.update(tickets).set({ assigneeId: a.apprentice.userId }).where(eq(tickets.id, theirs.id));
    await db.update(tickets).set({ assigneeId: a.tailor.userId }).where(eq(tickets.id, tailors.id));
    const seen = (await listTickets(a.apprentice)).map((t) => t.id);
    expect(seen).toEqual(expect.arrayContaining([open.id, theirs.id]));
    expect(seen).not.toContain(tailors.id);
    expect((await listTickets(a.tailor)).map((t) => t.id)).toContain(tailors.id);
  });

  it('move one step at a time, never skipping or going back', async () => {
    const t = await createTicket(a.lead, { note: 'steps' });
    await expect(moveTicket(a.tailor, t.id, 'cutting')).rejects.toMatchObject({ status: 422 });
    expect((await moveTicket(a.tailor, t.id, 'queued')).status).toBe('queued');
    expect((await moveTicket(a.apprentice, t.id, 'cutting')).status).toBe('cutting');
    await expect(moveTicket(a.apprentice, t.id, 'queued')).rejects.toBeInstanceOf(ServiceError);
    expect(nextStatus('collected')).toBeNull();
  });

  it('leave pickup to the counter and the lead', async () => {
    const t = await createTicket(a.lead, { note: 'pickup' });
    for (const s of ['queued', 'cutting', 'sewing', 'pressing', 'ready'] as const) await moveTicket(a.tailor, t.id, s);
    await expect(moveTicket(a.apprentice, t.id, 'collected')).rejects.toMatchObject({ status: 422 });
    await expect(moveTicket(a.tailor, t.id, 'collected')).rejects.toMatchObject({ status: 422 });
    expect((await moveTicket(a.counter, t.id, 'collected')).status).toBe('collected');
  });

  it("answer 404 for another shop's ticket and for ids that are not ids", async () => {
    const t = await createTicket(b.lead, { note: 'B' });
    await expect(moveTicket(a.lead, t.id, 'queued')).rejects.toMatchObject({ status: 404 });
    await expect(moveTicket(a.lead, 'not-a-uuid', 'queued')).rejects.toMatchObject({ status: 404 });
    expect((await db.select().from(tickets).where(eq(tickets.id, t.id)))[0]!.status).toBe('intake');
  });
});
