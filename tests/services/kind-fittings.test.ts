// Garments fitted once, not per leg (a skirt or dress), through the services: intake takes the kind
// (zod refuses one it does not know) and prices its own line; the fitting is saved as typed and in
// exact mm, refused by field where its engine would refuse it (nothing saved), kept within its shop
// (another shop's garment is 404 to read and to write), counted as fitted, and printed on its own
// sheet, also in a batch beside trousers. Amounts are this test's own invented list.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';
import { chained } from './history-chain';

vi.mock('@/db', () => import('../db/db-mock'));

const { handle, db } = await import('@/db');
const { auditEvents, kindFittings } = await import('@/db/schema');
const { and, eq, sql } = await import('drizzle-orm');
const { intakeRequest, garmentPatch } = await import('@/lib/shared/bench-requests');
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
  a = await makeShop('Hemline Yard');
  b = await makeShop('Pleat Corner');
  for (const s of [a, b]) await prices.savePriceList(s.lead, { currency: 'EUR', hours: '', location: '', autoReadyNotice: false, items: [...TEST_PRICES] });
});
afterAll(() => handle.close());

// A half-circle skirt, 110 in round, hemmed 1 in and levelled from the floor (invented figures).
const HALF_CIRCLE = {
  hemRound: '110',
  flare: 'circle',
  circleFraction: '1/2',
  hemDepth: '1',
  markerHeight: '16',
  hemFromFloor: '15',
  'pin-centre-front': '2 1/4',
  'pin-centre-back': '2 3/4',
  'cloth-centre-front': '1 1/2',
};
const request = (fields: Record<string, string>, unit: 'in' | 'cm' | 'mm' = 'in') => kindFittingRequest.parse({ kind: 'skirt', unit, fields });

async function skirt(shop: Shop, description = 'Green half-circle skirt') {
  return openTicket(shop, { customer: { name: 'Ottilie Marchbank' }, garments: [{ description, kind: 'skirt' }] });
}

const status = (e: unknown) => (e instanceof ServiceError ? e.status : e);

describe('intake of a skirt', () => {
  it('keeps the kind, refuses a kind it does not know or a trouser finish on it, and prices the skirt at its own line', async () => {
    expect(intakeRequest.safeParse({ garments: [{ description: 'Kilt', kind: 'kilt' }] }).success).toBe(false);
    const finish = intakeRequest.safeParse({ garments: [{ description: 'Skirt', kind: 'skirt', finish: 'cuff' }] });
    expect(finish.success).toBe(false);
    expect(finish.error?.issues[0]?.path).toEqual(['garments', 0, 'finish']);
    // The kind is fixed at intake: a garment's change cannot carry it.
    expect(Object.keys(garmentPatch.shape)).not.toContain('kind');
    const { ticket, garment } = await skirt(a);
    expect(garment.kind).toBe('skirt');
    expect((await getGarment(a.tailor, garment.id)).kind).toBe('skirt');
    const lines = await prices.listLines(a.counter, ticket.id);
    expect(lines.map((l) => [l.key, l.label, l.amountMinor])).toEqual([['skirt-hem', 'Skirt or dress hem — Green half-circle skirt', 2700]]);
  });

  it('is taken in unpriced by a tailor (who may not price), and priced from the garments at the counter later', async () => {
    const ticket = (await openTicket(a, { customer: { name: 'Ottilie Marchbank' }, garments: [{ description: 'Linen dress', kind: 'skirt' }] })).ticket;
    const { createTicket } = await import('@/services/tickets');
    const byTailor = await createTicket(a.tailor, { customer: { name: 'Bram Ellery' }, garments: [{ description: 'Wool skirt', kind: 'skirt' }] });
    expect(await prices.listLines(a.counter, byTailor.id)).toEqual([]);
    const { lines } = await prices.priceFromGarments(a.counter, byTailor.id, { rush: false });
    expect(lines.map((l) => l.key)).toEqual(['skirt-hem']);
    expect((await prices.listLines(a.counter, ticket.id)).map((l) => l.key)).toEqual(['skirt-hem']);
  });
});

describe('a skirt fitting', () => {
  it('is saved as typed and in exact mm, each change in the history, and counts as fitted', async () => {
    const { garment } = await skirt(a);
    const before = await svc.kindFittingOf(a.tailor, garment.id);
    expect(before).toMatchObject({ kind: 'skirt', unit: null, values: {}, choices: {} });
    const view = await svc.saveKindFitting(a.tailor, garment.id, request(HALF_CIRCLE));
    expect(view.unit).toBe('in');
    expect(view.values.hemRound).toEqual({ text: '110', mm: 2794 }); // 110 × 25.4 (1 in = 25.4 mm exactly, NBS 1959)
    expect(view.values['pin-centre-front']?.mm).toBeCloseTo(57.15, 9); // 2 1/4 × 25.4
    expect(view.choices).toEqual({ flare: 'circle', circleFraction: '1/2' });
    expect(view.takenBy).toBe(`tailor of Hemline Yard`);
    const events = await db.select().from(auditEvents).where(eq(auditEvents.subject, garment.id));
    expect(events.filter((e) => e.action === 'kind-fitting.changed').length).toBe(Object.keys(HALF_CIRCLE).length);
    // The answer carries the garment's history too, as its page shows it.
    expect(view.history.filter((e) => e.action === 'kind-fitting.changed').length).toBe(Object.keys(HALF_CIRCLE).length);
    expect((await getGarment(a.tailor, garment.id)).fitted).toBe(true);
    // Saved again with one change: one more event.
    await svc.saveKindFitting(a.tailor, garment.id, request({ ...HALF_CIRCLE, hemDepth: '7/8' }));
    const after = await db.select().from(auditEvents).where(eq(auditEvents.subject, garment.id));
    expect(after.filter((e) => e.action === 'kind-fitting.changed').length).toBe(Object.keys(HALF_CIRCLE).length + 1);
  });

  it('refuses by field what the engine refuses, and keeps nothing of it', async () => {
    const { garment } = await skirt(a);
    // 6 in deep on a 20 in round full circle: the pattern's radius is 20/2π ≈ 3.2 in, so the hem passes the pattern's point (docs/KINDS.md).
    const deep = await svc
      .saveKindFitting(a.tailor, garment.id, request({ hemRound: '20', flare: 'circle', circleFraction: '1', hemDepth: '6' }))
      .catch((e) => e);
    expect(status(deep)).toBe(422);
    expect(deep.issues).toEqual({ 'fields.hemDepth': 'The hem is deeper than the flare allows.' });
    const unread = await svc.saveKindFitting(a.tailor, garment.id, request({ ...HALF_CIRCLE, hemRound: 'a lot' })).catch((e) => e);
    expect(status(unread)).toBe(422);
    expect(Object.keys(unread.issues)).toEqual(['fields.hemRound']);
    // The levelling needs the marker and the floor once any of it is typed.
    const half = await svc.saveKindFitting(a.tailor, garment.id, request({ hemRound: '40', 'pin-left-side': '1' })).catch((e) => e);
    expect(status(half)).toBe(422);
    expect(Object.keys(half.issues).sort()).toEqual(['fields.hemFromFloor', 'fields.markerHeight']);
    expect(await db.select().from(kindFittings).where(eq(kindFittings.garmentId, garment.id))).toEqual([]);
  });

  it('is never filled from a trouser fitting "same as last time": the intake is refused whole', async () => {
    const { ticket, garment } = await openTicket(a, { customer: { name: 'Bram Ellery' }, garments: [{ description: 'Grey flannel trousers' }] });
    await saveFitting(a.tailor, garment.id, fittingRequest({ backPin: '31', cuffDepth: '1 1/2', available: '5' }));
    const { createTicket } = await import('@/services/tickets');
    const err = await createTicket(a.counter, {
      customerId: ticket.customerId,
      garments: [{ description: 'Wool skirt', kind: 'skirt', fittingFrom: garment.id }],
    }).catch((e) => e);
    expect(status(err)).toBe(422);
  });

  it('refuses fields of no kind, a kind it does not know, and a skirt fitting on trousers', async () => {
    expect(kindFittingRequest.safeParse({ kind: 'skirt', unit: 'in', fields: { backPin: '30' } }).success).toBe(false);
    expect(kindFittingRequest.safeParse({ kind: 'kilt', unit: 'in', fields: {} }).success).toBe(false);
    expect(kindFittingRequest.safeParse({ kind: 'skirt', unit: 'in', fields: { flare: 'spiral' } }).success).toBe(false);
    const { garment } = await openTicket(a, { customer: { name: 'Bram Ellery' }, garments: [{ description: 'Grey flannel trousers' }] });
    expect(status(await svc.saveKindFitting(a.tailor, garment.id, request(HALF_CIRCLE)).catch((e) => e))).toBe(422);
    expect(status(await svc.kindFittingOf(a.tailor, garment.id).catch((e) => e))).toBe(422);
  });

  it('is another shop’s: 404 to read and to write, and left as it was', async () => {
    const { garment } = await skirt(a);
    await svc.saveKindFitting(a.tailor, garment.id, request(HALF_CIRCLE));
    for (const actor of [b.lead, b.tailor]) {
      expect(status(await svc.kindFittingOf(actor, garment.id).catch((e) => e))).toBe(404);
      expect(status(await svc.saveKindFitting(actor, garment.id, request({ ...HALF_CIRCLE, hemDepth: '1/2' })).catch((e) => e))).toBe(404);
    }
    expect((await svc.kindFittingOf(a.tailor, garment.id)).values.hemDepth?.text).toBe('1');
    // A batch read for shop B never carries shop A's row, even when asked for A's garment by id.
    expect((await svc.kindFittingsOf(b.shopId, [garment.id])).size).toBe(0);
  });
});

describe('two saves of one skirt at the same moment', () => {
  it('each record the change from what the other saved: the history links up and ends at the saved value', async () => {
    for (let round = 0; round < 6; round += 1) {
      const { garment } = await skirt(a, `Racing skirt ${round}`);
      await svc.saveKindFitting(a.tailor, garment.id, request(HALF_CIRCLE));
      // The second save starts a few database round trips after the first, a different moment each round.
      const late = async () => {
        for (let hop = 0; hop < round; hop += 1) await db.execute(sql`select 1`);
        return svc.saveKindFitting(a.lead, garment.id, request({ ...HALF_CIRCLE, hemDepth: '3/4' }));
      };
      await Promise.all([svc.saveKindFitting(a.tailor, garment.id, request({ ...HALF_CIRCLE, hemDepth: '7/8' })), late()]);
      const saved = (await svc.kindFittingOf(a.tailor, garment.id)).values.hemDepth?.text;
      const events = await db
        .select()
        .from(auditEvents)
        .where(and(eq(auditEvents.subject, garment.id), eq(auditEvents.action, 'kind-fitting.changed')));
      const depth = events.map((e) => e.detail as { field: string; old: unknown; new: unknown }).filter((d) => d.field === 'hemDepth');
      expect(depth.length, `round ${round}`).toBe(3);
      expect(chained(depth, null, saved), `round ${round}: ${JSON.stringify(depth)} ending at ${saved}`).toBe(true);
    }
  });
});

describe('a skirt on the cut sheet', () => {
  it('prints its own sheet, and a batch with trousers beside it prints both', async () => {
    const shop = await makeShop('Selvedge Row');
    const { garment } = await skirt(shop, 'Rust half-circle skirt');
    await svc.saveKindFitting(shop.tailor, garment.id, request(HALF_CIRCLE));
    const one = flatText(pdfFile((await garmentSheet(shop.tailor, garment.id, {}, BASE)).bytes));
    expect(one).toContain('Skirt or dress hem');
    expect(one).toContain('Rust half-circle skirt');
    expect(one).toContain('Centre front');
    expect(one).toContain('Iron and steam');
    const trousers = await openTicket(shop, { customer: { name: 'Bram Ellery' }, garments: [{ description: 'Grey flannel trousers' }] });
    await saveFitting(shop.tailor, trousers.garment.id, fittingRequest({ backPin: '31', cuffDepth: '1 1/2', available: '5' }));
    const batch = await queueSheets(shop.lead, DEFAULT_QUEUE_FILTER, '2026-12-04', {}, BASE);
    expect(batch.sheets).toBe(2);
    expect(batch.skipped).toEqual([]);
    const text = flatText(pdfFile(batch.bytes));
    expect(text).toContain('Skirt or dress hem');
    expect(text).toContain('Grey flannel trousers');
    expect(text).toContain('Rust half-circle skirt');
  });

  it('is refused without a fitting, and the batch lists it as skipped', async () => {
    const shop = await makeShop('Bias Lane');
    const { garment } = await skirt(shop, 'Unfitted dress');
    expect(status(await garmentSheet(shop.tailor, garment.id, {}, BASE).catch((e) => e))).toBe(422);
  });
});
