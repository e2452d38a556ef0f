// Stepping a garment back one step after a wrong tap: whoever may move it on may step it back;
// only the lead steps a collected garment back; a move made meanwhile is not undone blind; the
// step back is a move in the history, the ticket follows, and another shop's garment is 404.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';

vi.mock('@/db', () => import('../db/db-mock'));

const { db, handle } = await import('@/db');
const { sql } = await import('drizzle-orm');
const { pickUp } = await import('@/services/counter/payments');
const { garmentsOfTicket } = await import('@/services/garments');
const { leastAdvanced } = await import('@/lib/shared/garment-steps');
const { getGarment, moveGarment } = await import('@/services/garments');
const { stepBackGarment } = await import('@/services/garment-step-back');
const { garmentMovedListeners } = await import('@/services/garment-events');
const { fittingOf } = await import('@/services/measurements');
const { makeShop } = await import('./fixtures');
const { openTicket } = await import('./garment-fixtures');
const { addLine } = await import('@/services/counter/prices');

/** Unpriced work is handed over only as "no charge" with a reason (issue 14): these tests price nothing. */
const noCharge = (shop: Shop, ticketId: string) => addLine(shop.counter, ticketId, { source: 'no-charge', reason: 'Test work, not priced' });

let a: Shop;
let b: Shop;

beforeAll(async () => {
  a = await makeShop('Step Back Shop A');
  b = await makeShop('Step Back Shop B');
});
afterAll(() => handle.close());

async function garmentAt(steps: readonly string[], shop = a, assigneeId: string | null = null) {
  const { ticket, garment } = await openTicket(shop, { customer: { name: 'Step Back Customer' }, garments: [{ description: 'Test trousers', assigneeId }] });
  if (steps.includes('collected')) await noCharge(shop, ticket.id);
  for (const to of steps) await moveGarment(to === 'collected' ? shop.counter : shop.lead, garment.id, to as never);
  return garment;
}

describe('stepping a garment back', () => {
  it('moves it back one step, records the move as a step back, and the ticket follows', async () => {
    const g = await garmentAt(['marked', 'cut']);
    const back = await stepBackGarment(a.apprentice, g.id, 'cut');
    expect(back.status).toBe('marked');
    const seen = await getGarment(a.tailor, g.id);
    expect(seen.status).toBe('marked');
    expect(seen.ticket.status).toBe('marked');
    const [latest, before] = (await fittingOf(a.tailor, g.id)).history;
    expect(latest).toMatchObject({ action: 'garment.moved', actorName: 'apprentice of Step Back Shop A', detail: { from: 'cut', to: 'marked', back: true } });
    expect(before).toMatchObject({ action: 'garment.moved', detail: { from: 'marked', to: 'cut' } });
  });

  it('refuses a garment that has only been received', async () => {
    const g = await garmentAt([]);
    await expect(stepBackGarment(a.lead, g.id, 'received')).rejects.toMatchObject({ status: 422 });
  });

  it('refuses when the garment is no longer where the caller saw it (409), and changes nothing', async () => {
    const g = await garmentAt(['marked', 'cut']);
    await expect(stepBackGarment(a.tailor, g.id, 'marked')).rejects.toMatchObject({ status: 409 });
    expect((await getGarment(a.tailor, g.id)).status).toBe('cut');
  });

  it('lets only the lead step a collected garment back to ready', async () => {
    const g = await garmentAt(['marked', 'cut', 'stitched', 'pressed', 'ready', 'collected']);
    for (const who of [a.tailor, a.apprentice, a.counter]) {
      await expect(stepBackGarment(who, g.id, 'collected')).rejects.toMatchObject({ status: 422, message: 'Only the lead can step a collected garment back.' });
    }
    expect((await stepBackGarment(a.lead, g.id, 'collected')).status).toBe('ready');
    expect((await getGarment(a.lead, g.id)).ticket.status).toBe('ready');
  });

  it('refuses the counter a bench step (it may not move garments on; the route already answers it 403)', async () => {
    const g = await garmentAt(['marked']);
    await expect(stepBackGarment(a.counter, g.id, 'marked')).rejects.toMatchObject({ status: 422 });
  });

  it('tells the garment-moved listeners, with the step it went back to', async () => {
    const g = await garmentAt(['marked']);
    const heard: string[] = [];
    const listener = async (actor: { role: string }, garment: { status: string }) => void heard.push(`${actor.role}:${garment.status}`);
    garmentMovedListeners.push(listener);
    try {
      await stepBackGarment(a.tailor, g.id, 'marked');
      expect(heard).toEqual(['tailor:received']);
    } finally {
      garmentMovedListeners.splice(garmentMovedListeners.indexOf(listener), 1);
    }
  });

  it('answers 404 for another shop’s garment and for one hidden from the apprentice', async () => {
    const foreign = await garmentAt(['marked'], b);
    const tailors = await garmentAt(['marked'], a, a.tailor.userId);
    await expect(stepBackGarment(a.lead, foreign.id, 'marked')).rejects.toMatchObject({ status: 404 });
    await expect(stepBackGarment(a.apprentice, tailors.id, 'marked')).rejects.toMatchObject({ status: 404 });
    expect((await getGarment(b.lead, foreign.id)).status).toBe('marked');
  });

  it('under the ticket lock: pickup at the same moment never hands over a ticket with a garment stepped back', async () => {
    for (let round = 0; round < 12; round += 1) {
      const { ticket, garment } = await openTicket(a, {
        customer: { name: 'Step Back Race' },
        garments: [{ description: 'Grey flannel' }, { description: 'Navy twill' }],
      });
      const [, second] = await garmentsOfTicket(a.shopId, ticket.id);
      await noCharge(a, ticket.id);
      for (const to of ['marked', 'cut', 'stitched', 'pressed', 'ready'] as const) {
        await moveGarment(a.lead, garment.id, to);
        await moveGarment(a.lead, second!.id, to);
      }
      // One of the two starts a few database round trips after the other: a different moment each round.
      const hops = round % 6;
      const later = async <T>(work: () => Promise<T>) => {
        for (let hop = 0; hop < hops; hop += 1) await db.execute(sql`select 1`);
        return work();
      };
      const pick = () => pickUp(a.counter, ticket.id);
      const stepBack = () => stepBackGarment(a.lead, second!.id, 'ready');
      const [picked, back] = round < 6 ? await Promise.allSettled([pick(), later(stepBack)]) : await Promise.allSettled([later(pick), stepBack()]);
      const after = await garmentsOfTicket(a.shopId, ticket.id);
      const seen = await getGarment(a.lead, garment.id);
      expect(picked.status === 'fulfilled' || back.status === 'fulfilled', `round ${round}`).toBe(true);
      // Pickup that went ahead took every garment; the ticket's status is its least advanced garment's.
      if (picked.status === 'fulfilled')
        expect(
          after.map((g) => g.status),
          `round ${round}`,
        ).toEqual(['collected', 'collected']);
      else
        expect(
          after.map((g) => g.status),
          `round ${round}`,
        ).toEqual(['ready', 'pressed']);
      expect(seen.ticket.status, `round ${round}`).toBe(leastAdvanced(after.map((g) => g.status)));
    }
  });
});
