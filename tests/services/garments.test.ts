// Garments: the queue per role, one step at a time with the pickup kept for the counter, the
// garment-moved hook, edits kept in the history, and 404 across shops.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';

vi.mock('@/db', () => import('../db/db-mock'));

const { db, handle } = await import('@/db');
const { createTicket } = await import('@/services/tickets');
const { addGarment, garmentsOfTicket, getGarment, listQueue, lockGarment, moveGarment, updateGarment } = await import('@/services/garments');
const { garmentMovedListeners } = await import('@/services/garment-events');
const { fittingOf } = await import('@/services/measurements');
const { makeShop } = await import('./fixtures');
const { openTicket } = await import('./garment-fixtures');

let a: Shop;
let b: Shop;

beforeAll(async () => {
  a = await makeShop('Garment Shop A');
  b = await makeShop('Garment Shop B');
});
afterAll(() => handle.close());

async function oneGarment(shop = a, assigneeId: string | null = null) {
  return (await openTicket(shop, { customer: { name: 'Queue Customer' }, garments: [{ description: 'Test trousers', assigneeId }] })).garment;
}

describe('garments', () => {
  it('queue: the apprentice sees their own and unassigned work, not the tailor’s or another shop’s', async () => {
    const mine = await oneGarment(a, a.apprentice.userId);
    const open = await oneGarment(a);
    const tailors = await oneGarment(a, a.tailor.userId);
    const foreign = await oneGarment(b);
    const seen = (await listQueue(a.apprentice)).map((r) => r.id);
    expect(seen).toEqual(expect.arrayContaining([mine.id, open.id]));
    expect(seen).not.toContain(tailors.id);
    expect(seen).not.toContain(foreign.id);
    const row = (await listQueue(a.lead)).find((r) => r.id === tailors.id)!;
    expect(row.assigneeName).toBe('tailor of Garment Shop A');
    expect(row.customerName).toBe('Queue Customer');
    expect(row.ticketNumber).toBeGreaterThan(1000);
  });

  it('move one step at a time, and only the counter or lead collects', async () => {
    const g = await oneGarment();
    await expect(moveGarment(a.apprentice, g.id, 'cut')).rejects.toMatchObject({ status: 422 });
    for (const to of ['marked', 'cut', 'stitched', 'pressed', 'ready'] as const) expect((await moveGarment(a.apprentice, g.id, to)).status).toBe(to);
    await expect(moveGarment(a.apprentice, g.id, 'collected')).rejects.toMatchObject({ status: 422 });
    // Unpriced work is handed over only as "no charge" with a reason (issue 14).
    const { addLine } = await import('@/services/counter/prices');
    await addLine(a.counter, g.ticketId, { source: 'no-charge', reason: 'Test work, not priced' });
    expect((await moveGarment(a.counter, g.id, 'collected')).status).toBe('collected');
    await expect(moveGarment(a.lead, g.id, 'collected')).rejects.toMatchObject({ status: 422 });
  });

  it('hand over only a ready ticket with nothing left to pay (the counter’s rule)', async () => {
    const { addLine } = await import('@/services/counter/prices');
    const g = await oneGarment();
    for (const to of ['marked', 'cut', 'stitched', 'pressed', 'ready'] as const) await moveGarment(a.tailor, g.id, to);
    await addLine(a.counter, g.ticketId, { source: 'adjust', label: 'Shorten with cuffs', amountMinor: 2500, reason: 'Agreed at the counter' });
    await expect(moveGarment(a.counter, g.id, 'collected')).rejects.toMatchObject({ status: 422, message: expect.stringMatching(/balance/) });
  });

  it('tell every garment-moved listener after each move, with who moved it', async () => {
    const heard: string[] = [];
    const listener = async (actor: { role: string }, garment: { status: string }) => void heard.push(`${actor.role}:${garment.status}`);
    garmentMovedListeners.push(listener);
    try {
      const g = await oneGarment();
      await moveGarment(a.tailor, g.id, 'marked');
      await expect(moveGarment(a.tailor, g.id, 'stitched')).rejects.toMatchObject({ status: 422 });
      expect(heard).toEqual(['tailor:marked']);
    } finally {
      garmentMovedListeners.splice(garmentMovedListeners.indexOf(listener), 1);
    }
  });

  it('keep each change of description, due date or assignee in the history', async () => {
    const g = await oneGarment();
    await updateGarment(a.tailor, g.id, { dueOn: '2026-12-24', assigneeId: a.apprentice.userId });
    const history = (await fittingOf(a.tailor, g.id)).history;
    expect(history[0]).toMatchObject({
      action: 'garment.changed',
      actorName: 'tailor of Garment Shop A',
      detail: { dueOn: { old: null, new: '2026-12-24' }, assigneeId: { old: null, new: a.apprentice.userId } },
    });
    expect((await getGarment(a.tailor, g.id)).assigneeName).toBe('apprentice of Garment Shop A');
  });

  it('refuse an assignee from another shop', async () => {
    const g = await oneGarment();
    await expect(updateGarment(a.lead, g.id, { assigneeId: b.tailor.userId })).rejects.toMatchObject({ status: 422 });
  });

  it('add a garment to an open ticket, not to another shop’s', async () => {
    const t = await createTicket(a.counter, { garments: [{ description: 'first' }] });
    await addGarment(a.counter, t.id, { description: 'second', dueOn: null, assigneeId: null });
    expect((await garmentsOfTicket(a.shopId, t.id)).map((g) => g.description)).toEqual(['first', 'second']);
    await expect(addGarment(b.counter, t.id, { description: 'sneaky', dueOn: null, assigneeId: null })).rejects.toMatchObject({ status: 404 });
  });

  it("answer 404 for another shop's garment, a garment hidden from the apprentice, and non-ids", async () => {
    const foreign = await oneGarment(b);
    const tailors = await oneGarment(a, a.tailor.userId);
    await expect(getGarment(a.lead, foreign.id)).rejects.toMatchObject({ status: 404 });
    await expect(moveGarment(a.lead, foreign.id, 'marked')).rejects.toMatchObject({ status: 404 });
    await expect(getGarment(a.apprentice, tailors.id)).rejects.toMatchObject({ status: 404 });
    await expect(getGarment(a.lead, 'nope')).rejects.toMatchObject({ status: 404 });
  });
});

describe('lockGarment', () => {
  it('locks and answers the shop’s own garment, and is 404 for another shop’s garment or an id that is not one', async () => {
    const mine = await oneGarment(a);
    const foreign = await oneGarment(b);
    expect((await db.transaction((tx) => lockGarment(tx, a.shopId, mine.id))).id).toBe(mine.id);
    for (const id of [foreign.id, 'not-an-id']) await expect(db.transaction((tx) => lockGarment(tx, a.shopId, id))).rejects.toMatchObject({ status: 404 });
  });
});
