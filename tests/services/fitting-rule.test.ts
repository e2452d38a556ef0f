// Issue 15: a garment could go from Received to Ready with no fitting saved. The lead's rule:
// 'warn' (the default; the screens ask, the server lets it through) or 'refuse' (the server says
// no to any move past Chalk-marked, one garment or a whole ticket, until a fitting is saved).
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';

vi.mock('@/db', () => import('../db/db-mock'));

const { handle } = await import('@/db');
const { createTicket, moveTicket, getTicket } = await import('@/services/tickets');
const { garmentsOfTicket, getGarment, moveGarment } = await import('@/services/garments');
const { benchSettings, saveBenchSettings } = await import('@/services/shop-settings');
const { makeShop } = await import('./fixtures');
const { fittingRequest, openTicket, saveFitting } = await import('./garment-fixtures');

let a: Shop;
let b: Shop;

beforeAll(async () => {
  a = await makeShop('Rule Hems A');
  b = await makeShop('Rule Hems B');
});
afterAll(() => handle.close());

async function markedGarment(shop: Shop, description = 'Charcoal worsted') {
  const { garment } = await openTicket(shop, { customer: { name: 'WendelineArbuth' }, garments: [{ description }] });
  await moveGarment(shop.tailor, garment.id, 'marked');
  return garment;
}

// A usable fitting: a cuff with its depth (the lengths are invented).
const CUFF = fittingRequest({ backPin: '31 1/4', cuffDepth: '1 1/2', available: '5' });

describe('the shop’s rule for a garment passing Chalk-marked with no fitting', () => {
  it('is warn until the lead chooses: the server lets the move through', async () => {
    expect((await benchSettings(a.shopId)).fittingRule).toBe('warn');
    const g = await markedGarment(a);
    expect((await moveGarment(a.tailor, g.id, 'cut')).status).toBe('cut');
  });

  it('refuse: a garment with no fitting is not marked Cut (409, saying why), and is once its fitting is saved', async () => {
    await saveBenchSettings(a.lead, { scale: 'in8', stepLabels: {}, fittingRule: 'refuse' });
    const g = await markedGarment(a, 'Olive gabardine');
    await expect(moveGarment(a.tailor, g.id, 'cut')).rejects.toMatchObject({ status: 409, message: expect.stringContaining('save the fitting first') });
    await expect(moveGarment(a.lead, g.id, 'cut')).rejects.toMatchObject({ status: 409 });
    expect((await getGarment(a.tailor, g.id)).status).toBe('marked');
    await saveFitting(a.tailor, g.id, CUFF);
    expect((await moveGarment(a.tailor, g.id, 'cut')).status).toBe('cut');
  });

  it('refuse: moves up to Chalk-marked are not held up; the step after it is', async () => {
    const { garment } = await openTicket(a, { garments: [{ description: 'Tan chino' }] });
    expect((await moveGarment(a.apprentice, garment.id, 'marked')).status).toBe('marked');
    await expect(moveGarment(a.apprentice, garment.id, 'cut')).rejects.toMatchObject({ status: 409 });
  });

  it('refuse: a fitting saved blank (a cuff with no depth) is no fitting', async () => {
    const g = await markedGarment(a, 'Brown cord');
    await saveFitting(a.tailor, g.id, fittingRequest({ backPin: '30' }));
    await expect(moveGarment(a.tailor, g.id, 'cut')).rejects.toMatchObject({ status: 409 });
  });

  it('refuse: a whole ticket does not move on while one of its garments has no fitting', async () => {
    const t = await createTicket(a.counter, { garments: [{ description: 'Navy serge' }, { description: 'Grey flannel' }] });
    const [first, second] = await garmentsOfTicket(a.shopId, t.id);
    await moveTicket(a.tailor, t.id, 'marked');
    await saveFitting(a.tailor, first!.id, CUFF);
    await expect(moveTicket(a.tailor, t.id, 'cut')).rejects.toMatchObject({ status: 409, message: expect.stringContaining('Grey flannel') });
    expect((await getTicket(a.tailor, t.id)).garments.map((g) => g.status)).toEqual(['marked', 'marked']);
    await saveFitting(a.tailor, second!.id, CUFF);
    expect((await moveTicket(a.tailor, t.id, 'cut')).status).toBe('cut');
  });

  it('a save of the other settings without the rule keeps it; another shop keeps its own', async () => {
    await saveBenchSettings(a.lead, { scale: 'in16', stepLabels: {} });
    expect((await benchSettings(a.shopId)).fittingRule).toBe('refuse');
    expect((await benchSettings(b.shopId)).fittingRule).toBe('warn');
    const g = await markedGarment(b);
    expect((await moveGarment(b.tailor, g.id, 'cut')).status).toBe('cut');
  });

  it('the garment and its ticket say whether a fitting is saved, so the screens can ask first', async () => {
    const { ticket, garment } = await openTicket(b, { garments: [{ description: 'Stone twill' }] });
    expect((await getGarment(b.tailor, garment.id)).fitted).toBe(false);
    expect((await getTicket(b.tailor, ticket.id)).garments[0]!.fitted).toBe(false);
    await saveFitting(b.tailor, garment.id, CUFF);
    expect((await getGarment(b.tailor, garment.id)).fitted).toBe(true);
    expect((await getTicket(b.tailor, ticket.id)).garments[0]!.fitted).toBe(true);
  });
});
