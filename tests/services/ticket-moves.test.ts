// Moving a whole ticket on: all its garments at the ticket's step move in one transaction or none
// does, and moving it to "collected" is the counter's pickup, with pickup's rules.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { eq, sql } from 'drizzle-orm';
import type { Shop } from './fixtures';

vi.mock('@/db', () => import('../db/db-mock'));

const { db, handle } = await import('@/db');
const { garments, tickets } = await import('@/db/schema');
const { createTicket, moveTicket } = await import('@/services/tickets');
const { garmentsOfTicket } = await import('@/services/garments');
const prices = await import('@/services/counter/prices');
const pay = await import('@/services/counter/payments');
const { makeShop } = await import('./fixtures');

let a: Shop;
const STEPS_TO_READY = ['marked', 'cut', 'stitched', 'pressed', 'ready'] as const;

/** A ticket of two garments; the second one is the one the tests jam. */
async function twoGarments() {
  const t = await createTicket(a.counter, { garments: [{ description: 'Navy serge' }, { description: 'Grey flannel' }] });
  const [, second] = await garmentsOfTicket(a.shopId, t.id);
  return { t, second: second! };
}

/** From now on the database refuses to change this garment's step: a failure halfway through. */
const jam = (garmentId: string) => db.execute(sql`insert into test_jam (garment_id) values (${garmentId})`);
const unjam = (garmentId: string) => db.execute(sql`delete from test_jam where garment_id = ${garmentId}`);

async function state(ticketId: string) {
  const [t] = await db.select().from(tickets).where(eq(tickets.id, ticketId));
  const gs = await db.select({ status: garments.status }).from(garments).where(eq(garments.ticketId, ticketId)).orderBy(garments.position);
  return { ticket: t!.status, garments: gs.map((g) => g.status) };
}

beforeAll(async () => {
  a = await makeShop('Moving Hems');
  await db.execute(sql`create table test_jam (garment_id uuid primary key)`);
  await db.execute(sql`create function test_jam_refuse() returns trigger language plpgsql as $$
    begin
      if new.status is distinct from old.status and exists (select 1 from test_jam where garment_id = new.id) then
        raise exception 'test: this garment is jammed';
      end if;
      return new;
    end $$`);
  await db.execute(sql`create trigger test_jam_refuse before update on garments for each row execute function test_jam_refuse()`);
});
afterAll(() => handle.close());

describe('moving a ticket', () => {
  it('moves all of its garments or none: a failure on the second leaves the first where it was', async () => {
    const { t, second } = await twoGarments();
    await jam(second.id);
    await expect(moveTicket(a.lead, t.id, 'marked')).rejects.toThrow();
    expect(await state(t.id)).toEqual({ ticket: 'received', garments: ['received', 'received'] });
    await unjam(second.id);
    await moveTicket(a.lead, t.id, 'marked');
    expect(await state(t.id)).toEqual({ ticket: 'marked', garments: ['marked', 'marked'] });
  });

  it('to collected obeys pickup: refused while money is due, then all at once or not at all', async () => {
    const { t, second } = await twoGarments();
    for (const step of STEPS_TO_READY) await moveTicket(a.lead, t.id, step);
    await prices.addLine(a.counter, t.id, { source: 'adjust', label: 'Two hems', amountMinor: 3000, reason: 'agreed at intake' });
    await expect(moveTicket(a.counter, t.id, 'collected')).rejects.toMatchObject({ status: 422, message: expect.stringMatching(/balance/) });
    await pay.takePayment(a.counter, t.id, { method: 'card', amountMinor: 3000 });

    await jam(second.id);
    await expect(moveTicket(a.counter, t.id, 'collected')).rejects.toThrow();
    expect(await state(t.id)).toEqual({ ticket: 'ready', garments: ['ready', 'ready'] });
    await unjam(second.id);

    await moveTicket(a.counter, t.id, 'collected');
    expect(await state(t.id)).toEqual({ ticket: 'collected', garments: ['collected', 'collected'] });
  });

  it('to collected never hands over with a balance due, nor half the garments, against a line added meanwhile', async () => {
    for (let round = 0; round < 16; round += 1) {
      const { t } = await twoGarments();
      for (const step of STEPS_TO_READY) await moveTicket(a.lead, t.id, step);
      const lateLine = async () => {
        for (let hop = 0; hop < round; hop += 1) await db.execute(sql`select 1`);
        return prices.addLine(a.counter, t.id, { source: 'adjust', label: 'Extra pressing', amountMinor: 500, reason: 'asked at pickup' });
      };
      await Promise.allSettled([moveTicket(a.counter, t.id, 'collected'), lateLine()]);
      const after = await state(t.id);
      const due = (await pay.counterSummary(a.counter, t.id)).due;
      expect(new Set(after.garments).size, `round ${round}: ${after.garments.join(', ')}`).toBe(1);
      expect(after.ticket === 'collected' && due > 0, `round ${round}: collected with ${due} due`).toBe(false);
    }
  });
});
