// Tickets: each shop sees only its own; an apprentice sees work given to them or to nobody yet,
// without the customer's contact details; a ticket gets the shop's next number, and its status
// follows its least advanced garment.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';
import { eq } from 'drizzle-orm';

vi.mock('@/db', () => import('../db/db-mock'));

const { db, handle } = await import('@/db');
const { tickets, auditEvents } = await import('@/db/schema');
const { createTicket, getTicket, listTickets, moveTicket } = await import('@/services/tickets');
const { nextStep } = await import('@/lib/shared/garment-steps');
const { addGarment, garmentsOfTicket, getGarment, moveGarment, updateGarment } = await import('@/services/garments');
const { createCustomer } = await import('@/services/customers');
const { ServiceError } = await import('@/services/errors');
const { makeShop } = await import('./fixtures');

let a: Shop;
let b: Shop;

beforeAll(async () => {
  a = await makeShop('Shop A');
  b = await makeShop('Shop B');
});
afterAll(() => handle.close());

const pair = [{ description: 'Navy trousers' }, { description: 'Grey trousers' }];

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

  it('are numbered one after another per shop, from 1001', async () => {
    const shop = await makeShop('Numbering Shop', ['counter']);
    const other = await makeShop('Other Numbering Shop', ['counter']);
    const first = await createTicket(shop.counter, {});
    const second = await createTicket(shop.counter, {});
    const elsewhere = await createTicket(other.counter, {});
    expect([first.number, second.number, elsewhere.number]).toEqual([1001, 1002, 1001]);
  });

  it('take their garments and a new customer at intake', async () => {
    const t = await createTicket(a.counter, { customer: { name: 'Walk-in Person', phone: '555-0100' }, garments: pair });
    const detail = await getTicket(a.counter, t.id);
    expect(detail.customer?.name).toBe('Walk-in Person');
    expect(detail.garments.map((g) => [g.description, g.status])).toEqual([
      ['Navy trousers', 'received'],
      ['Grey trousers', 'received'],
    ]);
  });

  it("refuse another shop's customer at intake", async () => {
    const customer = await createCustomer(b.counter, { name: 'Belongs to B' });
    await expect(createTicket(a.counter, { customerId: customer.id })).rejects.toMatchObject({ status: 422 });
  });

  it('refuse to give a garment to someone outside the shop', async () => {
    await expect(createTicket(a.counter, { garments: [{ description: 'x', assigneeId: b.tailor.userId }] })).rejects.toMatchObject({ status: 422 });
  });

  it('show an apprentice only tickets whose work is given to them, or to nobody yet', async () => {
    const open = await createTicket(a.lead, { note: 'unassigned', garments: [{ description: 'open' }] });
    const theirs = await createTicket(a.lead, { note: 'for the apprentice', garments: [{ description: 'x', assigneeId: a.apprentice.userId }] });
    const tailors = await createTicket(a.lead, { note: 'for the tailor', garments: [{ description: 'y', assigneeId: a.tailor.userId }] });
    // Split work: the ticket stands under the first garment's person, and the apprentice still sees
    // it, with only the garments the queue shows them (theirs, nobody's).
    const split = await createTicket(a.lead, {
      garments: [
        { description: 'p', assigneeId: a.tailor.userId },
        { description: 'q', assigneeId: a.apprentice.userId },
      ],
    });
    const partOpen = await createTicket(a.lead, { garments: [{ description: 'r', assigneeId: a.tailor.userId }, { description: 's' }] });
    expect([theirs.assigneeId, tailors.assigneeId, split.assigneeId, open.assigneeId]).toEqual([a.apprentice.userId, a.tailor.userId, a.tailor.userId, null]);
    const seen = (await listTickets(a.apprentice)).map((t) => t.id);
    expect(seen).toEqual(expect.arrayContaining([open.id, theirs.id, split.id, partOpen.id]));
    expect(seen).not.toContain(tailors.id);
    await expect(getTicket(a.apprentice, tailors.id)).rejects.toMatchObject({ status: 404 });
    expect((await getTicket(a.apprentice, split.id)).garments.map((g) => g.description)).toEqual(['q']);
    expect((await getTicket(a.apprentice, partOpen.id)).garments.map((g) => g.description)).toEqual(['s']);
    expect((await listTickets(a.tailor)).map((t) => t.id)).toEqual(expect.arrayContaining([open.id, theirs.id, tailors.id, split.id]));
  });

  it("follow a garment given to someone else: the ticket's assignee and the apprentice's view change with it", async () => {
    const t = await createTicket(a.lead, { garments: [{ description: 'moving work', assigneeId: a.tailor.userId }] });
    const [g] = await garmentsOfTicket(a.shopId, t.id);
    expect((await listTickets(a.apprentice)).map((x) => x.id)).not.toContain(t.id);
    await updateGarment(a.lead, g!.id, { assigneeId: a.apprentice.userId });
    expect((await db.select().from(tickets).where(eq(tickets.id, t.id)))[0]!.assigneeId).toBe(a.apprentice.userId);
    expect((await listTickets(a.apprentice)).map((x) => x.id)).toContain(t.id);
    // A garment added later and given to the tailor does not take the ticket from the apprentice.
    await addGarment(a.lead, t.id, { description: 'second pair', dueOn: null, assigneeId: a.tailor.userId });
    expect((await listTickets(a.apprentice)).map((x) => x.id)).toContain(t.id);
  });

  it("show the customer's e-mail, phone and notes only to roles that may read customers", async () => {
    const contact = { name: 'Contact Person', phone: '555-0199', email: 'contact-person@example.com', notes: 'Prefers a full break' };
    const t = await createTicket(a.counter, { customer: contact, garments: [{ description: 'z', assigneeId: a.apprentice.userId }] });
    const [g] = await garmentsOfTicket(a.shopId, t.id);
    const forApprentice = await getTicket(a.apprentice, t.id);
    expect(forApprentice.customer).toEqual({ id: expect.any(String), name: 'Contact Person' });
    expect((await getGarment(a.apprentice, g!.id)).customer).toEqual({ id: expect.any(String), name: 'Contact Person' });
    for (const who of [a.lead, a.tailor, a.counter]) {
      expect((await getTicket(who, t.id)).customer).toMatchObject(contact);
      expect((await getGarment(who, g!.id)).customer).toMatchObject(contact);
    }
  });

  it('stand at the step of their least advanced garment', async () => {
    const t = await createTicket(a.lead, { garments: pair });
    const [navy, grey] = await garmentsOfTicket(a.shopId, t.id);
    await moveGarment(a.tailor, navy!.id, 'marked');
    await moveGarment(a.tailor, navy!.id, 'cut');
    expect((await getTicket(a.lead, t.id)).status).toBe('received');
    await moveGarment(a.tailor, grey!.id, 'marked');
    expect((await getTicket(a.lead, t.id)).status).toBe('marked');
  });

  it('move all garments at the ticket step one step at a time, never skipping or going back', async () => {
    const t = await createTicket(a.lead, { garments: pair });
    await expect(moveTicket(a.tailor, t.id, 'cut')).rejects.toMatchObject({ status: 422 });
    expect((await moveTicket(a.tailor, t.id, 'marked')).status).toBe('marked');
    expect((await garmentsOfTicket(a.shopId, t.id)).map((g) => g.status)).toEqual(['marked', 'marked']);
    expect((await moveTicket(a.apprentice, t.id, 'cut')).status).toBe('cut');
    await expect(moveTicket(a.apprentice, t.id, 'marked')).rejects.toBeInstanceOf(ServiceError);
    expect(nextStep('collected')).toBeNull();
    const moves = await db.select().from(auditEvents).where(eq(auditEvents.action, 'garment.moved'));
    expect(moves.filter((e) => (e.detail as { to: string }).to === 'cut').length).toBeGreaterThanOrEqual(2);
  });

  it('refuse to move a ticket with no garments', async () => {
    const t = await createTicket(a.lead, {});
    await expect(moveTicket(a.lead, t.id, 'marked')).rejects.toMatchObject({ status: 422 });
  });

  it('leave pickup to the counter and the lead', async () => {
    const t = await createTicket(a.lead, { garments: [{ description: 'pickup' }] });
    for (const s of ['marked', 'cut', 'stitched', 'pressed', 'ready'] as const) await moveTicket(a.tailor, t.id, s);
    await expect(moveTicket(a.apprentice, t.id, 'collected')).rejects.toMatchObject({ status: 422 });
    await expect(moveTicket(a.tailor, t.id, 'collected')).rejects.toMatchObject({ status: 422 });
    // Unpriced work is handed over only as "no charge" with a reason (issue 14).
    await expect(moveTicket(a.counter, t.id, 'collected')).rejects.toMatchObject({ status: 422, message: expect.stringMatching(/no price/) });
    const { addLine } = await import('@/services/counter/prices');
    await addLine(a.counter, t.id, { source: 'no-charge', reason: 'Test work, not priced' });
    expect((await moveTicket(a.counter, t.id, 'collected')).status).toBe('collected');
  });

  it("answer 404 for another shop's ticket and for ids that are not ids", async () => {
    const t = await createTicket(b.lead, { garments: [{ description: 'B' }] });
    await expect(moveTicket(a.lead, t.id, 'marked')).rejects.toMatchObject({ status: 404 });
    await expect(getTicket(a.lead, t.id)).rejects.toMatchObject({ status: 404 });
    await expect(moveTicket(a.lead, 'not-a-uuid', 'marked')).rejects.toMatchObject({ status: 404 });
    expect((await db.select().from(tickets).where(eq(tickets.id, t.id)))[0]!.status).toBe('received');
  });
});
