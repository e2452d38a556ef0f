// Jacket and coat sleeves, a garment fitted once, through the services: intake takes the kind and
// prices its own line; the fitting is saved as typed and in exact mm, refused by field where the
// engine refuses it (nothing kept), kept within its shop, and printed on its own sheet, also in a
// batch beside trousers. Amounts are the test's own invented list (fixtures.ts).
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';

vi.mock('@/db', () => import('../db/db-mock'));

const { handle, db } = await import('@/db');
const { kindFittings } = await import('@/db/schema');
const { eq } = await import('drizzle-orm');
const { intakeRequest } = await import('@/lib/shared/bench-requests');
const { kindFittingRequest } = await import('@/lib/shared/kind-fitting-request');
const svc = await import('@/services/kind-fittings');
const prices = await import('@/services/counter/prices');
const { getGarment } = await import('@/services/garments');
const { garmentSheet, queueSheets } = await import('@/services/cut-sheets');
const { DEFAULT_QUEUE_FILTER } = await import('@/lib/shared/queue-filter');
const { ServiceError } = await import('@/services/errors');
const { makeShop, TEST_PRICES } = await import('./fixtures');
const { fittingRequest, openTicket, saveFitting } = await import('./garment-fixtures');
const { flatText, pdfFile } = await import('../lib/cut-sheet/poppler');

const BASE = 'https://bench.cuffwright.test';
let a: Shop;
let b: Shop;

beforeAll(async () => {
  a = await makeShop('Lapel Street');
  b = await makeShop('Gusset Close');
  for (const s of [a, b]) await prices.savePriceList(s.lead, { currency: 'EUR', hours: '', location: '', autoReadyNotice: false, items: [...TEST_PRICES] });
});
afterAll(() => handle.close());

// 1 in off a jacket's sleeves at the cuff, four buttons on decorative buttonholes, a 5 in vent (invented).
const JACKET = { shortenBy: '1', buttonholes: 'decorative', ventLength: '5' };
const request = (fields: Record<string, string>, unit: 'in' | 'cm' | 'mm' = 'in') => kindFittingRequest.parse({ kind: 'sleeves', unit, fields });
const status = (e: unknown) => (e instanceof ServiceError ? e.status : e);

async function jacket(shop: Shop, description = 'Charcoal wool jacket') {
  return openTicket(shop, { customer: { name: 'Wendel Ashcombe' }, garments: [{ description, kind: 'sleeves' }] });
}

describe('sleeves at intake', () => {
  it('keep the kind, refuse a trouser finish, and are priced at their own line', async () => {
    const finish = intakeRequest.safeParse({ garments: [{ description: 'Jacket', kind: 'sleeves', finish: 'cuff' }] });
    expect(finish.success).toBe(false);
    const { ticket, garment } = await jacket(a);
    expect((await getGarment(a.tailor, garment.id)).kind).toBe('sleeves');
    const lines = await prices.listLines(a.counter, ticket.id);
    expect(lines.map((l) => [l.key, l.label, l.amountMinor])).toEqual([['sleeves-shorten', 'Jacket or coat sleeves shortened — Charcoal wool jacket', 3300]]);
  });
});

describe('a sleeve fitting', () => {
  it('is saved as typed and in exact mm, and counts as fitted', async () => {
    const { garment } = await jacket(a);
    const view = await svc.saveKindFitting(a.tailor, garment.id, request({ ...JACKET, buttons: '3', liningFoldNow: '3/8' }));
    expect(view.unit).toBe('in');
    expect(view.values.shortenBy).toEqual({ text: '1', mm: 25.4 }); // 1 in = 25.4 mm exactly (NBS 1959)
    expect(view.values.liningFoldNow?.mm).toBeCloseTo(9.525, 9); // 3/8 × 25.4
    expect(view.choices).toEqual({ buttonholes: 'decorative', buttons: '3' });
    expect((await getGarment(a.tailor, garment.id)).fitted).toBe(true);
  });

  it('refuses by field what the engine refuses, and keeps nothing of it', async () => {
    const { garment } = await jacket(a);
    // Four buttons from 1 1/4 in, 5/8 in apart, reach 3 1/8 in: past a 3 in vent (docs/KINDS.md; defaults common practice (no source)).
    const past = await svc.saveKindFitting(a.tailor, garment.id, request({ ...JACKET, ventLength: '3' })).catch((e) => e);
    expect(status(past)).toBe(422);
    expect(past.issues).toEqual({ 'fields.ventLength': 'The buttons reach past the vent.' });
    const unread = await svc.saveKindFitting(a.tailor, garment.id, request({ ...JACKET, shortenBy: 'a bit' })).catch((e) => e);
    expect(status(unread)).toBe(422);
    expect(Object.keys(unread.issues)).toEqual(['fields.shortenBy']);
    expect(kindFittingRequest.safeParse({ kind: 'sleeves', unit: 'in', fields: { buttonholes: 'painted' } }).success).toBe(false);
    expect(await db.select().from(kindFittings).where(eq(kindFittings.garmentId, garment.id))).toEqual([]);
  });

  it('is another shop’s: 404 to read and to write', async () => {
    const { garment } = await jacket(a);
    await svc.saveKindFitting(a.tailor, garment.id, request(JACKET));
    for (const actor of [b.lead, b.tailor]) {
      expect(status(await svc.kindFittingOf(actor, garment.id).catch((e) => e))).toBe(404);
      expect(status(await svc.saveKindFitting(actor, garment.id, request({ ...JACKET, shortenBy: '2' })).catch((e) => e))).toBe(404);
    }
    expect((await svc.kindFittingOf(a.tailor, garment.id)).values.shortenBy?.text).toBe('1');
  });
});

describe('sleeves on the cut sheet', () => {
  it('print their own sheet, and beside trousers in a batch', async () => {
    const shop = await makeShop('Vent Row');
    const { garment } = await jacket(shop, 'Navy blazer');
    await svc.saveKindFitting(shop.tailor, garment.id, request(JACKET));
    const one = flatText(pdfFile((await garmentSheet(shop.tailor, garment.id, {}, BASE)).bytes));
    for (const words of ['Navy blazer', 'Shortened 1 in at the cuff, hem 1 1/2 in deep', '1/2 in below', 'Iron and steam']) expect(one).toContain(words);
    const trousers = await openTicket(shop, { customer: { name: 'Wendel Ashcombe' }, garments: [{ description: 'Grey flannel trousers' }] });
    await saveFitting(shop.tailor, trousers.garment.id, fittingRequest({ backPin: '31', cuffDepth: '1 1/2', available: '5' }));
    const batch = await queueSheets(shop.lead, DEFAULT_QUEUE_FILTER, '2026-12-04', {}, BASE);
    expect(batch.sheets).toBe(2);
    const text = flatText(pdfFile(batch.bytes));
    expect(text).toContain('Navy blazer');
    expect(text).toContain('Grey flannel trousers');
  });
});
