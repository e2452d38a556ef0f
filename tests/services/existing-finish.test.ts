// The finish a pair comes in with, noted at intake: an old cuff made again as a cuff is priced as
// the list's "cuff let down and re-made" by itself; the other ways in keep the lines they had.
// Amounts are this test's own list, not trade figures.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { and, eq } from 'drizzle-orm';
import type { Shop } from './fixtures';

vi.mock('@/db', () => import('../db/db-mock'));

const { db, handle } = await import('@/db');
const { auditEvents, measurements } = await import('@/db/schema');
const { intakeRequest, garmentPatch } = await import('@/lib/shared/bench-requests');
const tickets = await import('@/services/tickets');
const garmentsSvc = await import('@/services/garments');
const prices = await import('@/services/counter/prices');
const { makeShop, TEST_PRICES } = await import('./fixtures');

let a: Shop;

const LIST = TEST_PRICES;

/** Notes the fitting's finish on both legs, as the fitting form saves it. */
async function fitted(garmentId: string, finish: 'cuff' | 'plain') {
  for (const leg of ['left', 'right'] as const) {
    await db.insert(measurements).values({ shopId: a.shopId, garmentId, leg, unit: 'in', finish, values: {} });
  }
}

beforeAll(async () => {
  a = await makeShop('Quillon Row Alterations');
  await prices.savePriceList(a.lead, { currency: 'EUR', hours: '', location: '', autoReadyNotice: false, items: [...LIST] });
});
afterAll(() => handle.close());

describe('existing finish at intake', () => {
  it('is a plain hem unless the counter says otherwise, and is kept per garment', async () => {
    const t = await tickets.createTicket(a.counter, {
      customer: { name: 'Odile Farrant' },
      garments: [
        { description: 'Fawn cavalry twill' },
        { description: 'Black dinner trousers', existingFinish: 'cuff' },
        { description: 'New grey worsted', existingFinish: 'unfinished' },
      ],
    });
    const ids = (await garmentsSvc.garmentsOfTicket(a.shopId, t.id)).map((g) => g.id);
    const shown = await Promise.all(ids.map((id) => garmentsSvc.getGarment(a.tailor, id)));
    expect(shown.map((g) => g.existingFinish)).toEqual(['plain-hem', 'cuff', 'unfinished']);
  });

  it('refuses a finish that is not one of the three, with a message for the field', () => {
    const r = intakeRequest.safeParse({ garments: [{ description: 'Odd pair', existingFinish: 'turn-up' }] });
    expect(r.success).toBe(false);
    expect(r.error!.issues.map((i) => [i.path.join('.'), i.message])).toEqual([['garments.0.existingFinish', 'Choose plain hem, cuff or unfinished.']]);
  });
});

describe('pricing from the garments', () => {
  it('adds "cuff let down and re-made" by itself for a pair that came with a cuff and gets a cuff again', async () => {
    const t = await tickets.createTicket(a.counter, { customer: { name: 'Hallam Brae' }, garments: [{ description: 'Brown tweed', existingFinish: 'cuff' }] });
    const [g] = await garmentsSvc.garmentsOfTicket(a.shopId, t.id);
    await fitted(g!.id, 'cuff');
    const { lines, unpriced } = await prices.priceFromGarments(a.counter, t.id, { rush: false });
    expect(unpriced).toEqual([]);
    expect(lines.map((l) => [l.source, l.key, l.label, l.amountMinor, l.garmentId])).toEqual([
      ['auto', 'cuff-remake', 'Cuff let down and re-made — Brown tweed', 3200, g!.id],
    ]);
  });

  it('keeps the other ways in to their own lines: plain hem or new trousers to a cuff, and an old cuff to a plain hem', async () => {
    // The list has no line for taking a cuff off: an old cuff finished plain is priced as a plain hem.
    const t = await tickets.createTicket(a.counter, {
      customer: { name: 'Ilse Moorcroft' },
      garments: [
        { description: 'Hemmed pair', existingFinish: 'plain-hem' },
        { description: 'New pair', existingFinish: 'unfinished' },
        { description: 'Cuffed pair', existingFinish: 'cuff' },
      ],
    });
    const [hemmed, fresh, cuffed] = await garmentsSvc.garmentsOfTicket(a.shopId, t.id);
    await fitted(hemmed!.id, 'cuff');
    await fitted(fresh!.id, 'cuff');
    await fitted(cuffed!.id, 'plain');
    const { lines } = await prices.priceFromGarments(a.counter, t.id, { rush: false });
    expect(lines.map((l) => [l.key, l.amountMinor])).toEqual([
      ['cuff-from-hem', 2600],
      ['cuff-from-hem', 2600],
      ['plain-hem', 1800],
    ]);
  });

  it('follows a change of the existing finish on the garment page, which lands in its history', async () => {
    const t = await tickets.createTicket(a.counter, { customer: { name: 'Tobin Larch' }, garments: [{ description: 'Navy serge' }] });
    const [g] = await garmentsSvc.garmentsOfTicket(a.shopId, t.id);
    await fitted(g!.id, 'cuff');
    expect((await prices.priceFromGarments(a.counter, t.id, { rush: false })).lines.map((l) => l.key)).toEqual(['cuff-from-hem']);

    const updated = await garmentsSvc.updateGarment(a.tailor, g!.id, garmentPatch.parse({ existingFinish: 'cuff' }));
    expect(updated.existingFinish).toBe('cuff');
    const repriced = await prices.priceFromGarments(a.counter, t.id, { rush: false });
    expect(repriced.lines.map((l) => [l.key, l.amountMinor])).toEqual([['cuff-remake', 3200]]);
    const events = await db
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.subject, g!.id), eq(auditEvents.action, 'garment.changed')));
    expect(events.map((e) => e.detail)).toEqual([{ existingFinish: { old: 'plain-hem', new: 'cuff' } }]);

    // A patch that does not name the finish leaves it alone.
    await garmentsSvc.updateGarment(a.tailor, g!.id, garmentPatch.parse({ description: 'Navy serge, turn-ups' }));
    expect((await garmentsSvc.getGarment(a.lead, g!.id)).existingFinish).toBe('cuff');
  });
});
