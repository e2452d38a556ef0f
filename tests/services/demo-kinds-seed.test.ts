// The demo shop's skirt and overcoat: two tickets after the bench's six, each one garment of its
// kind for a new customer, marked, given to nobody, due in 3 and 4 days, fitted once with the
// history of typing it in, and printable on a cut sheet.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';
import { asc, eq } from 'drizzle-orm';

vi.mock('@/db', () => import('../db/db-mock'));

const { db, handle } = await import('@/db');
const { customers, tickets } = await import('@/db/schema');
const { seedKindsDemo } = await import('@/services/demo-kinds-seed');
const { garmentsOfTicket, getGarment } = await import('@/services/garments');
const { kindFittingOf } = await import('@/services/kind-fittings');
const { auditOf } = await import('@/services/audit');
const { garmentSheet } = await import('@/services/cut-sheets');
const { todayIso } = await import('@/lib/shared/due-date');
const { makeShop } = await import('./fixtures');
const { flatText, pdfFile } = await import('../lib/cut-sheet/poppler');

let shop: Shop;

beforeAll(async () => {
  shop = await makeShop('Demo Kinds Shop');
  await seedKindsDemo(shop.shopId, { tailor: shop.tailor.userId, counter: shop.counter.userId });
});
afterAll(() => handle.close());

// Whole days from today to an ISO date (both calendar days, so no clock hour changes the count).
const daysFromToday = (iso: string) => Math.round((Date.parse(iso) - Date.parse(todayIso())) / 86_400_000);

async function demoGarments() {
  const rows = await db.select().from(tickets).where(eq(tickets.shopId, shop.shopId)).orderBy(asc(tickets.number));
  return Promise.all(rows.map(async (t) => ({ ticket: t, garments: await garmentsOfTicket(shop.shopId, t.id) })));
}

describe('demo kinds seed', () => {
  it('numbers a skirt 1007 and an overcoat 1008, each for its own new customer, marked, unassigned, due in 3 and 4 days', async () => {
    const all = await demoGarments();
    expect(all.map(({ ticket, garments }) => [ticket.number, ticket.status, garments.map((g) => [g.kind, g.description, g.status, g.assigneeId])])).toEqual([
      [1007, 'marked', [['skirt', 'Teal half-circle skirt', 'marked', null]]],
      [1008, 'marked', [['sleeves', 'Camel overcoat', 'marked', null]]],
    ]);
    expect(all.map(({ garments }) => daysFromToday(garments[0]!.dueOn!))).toEqual([3, 4]);
    const people = await db.select().from(customers).where(eq(customers.shopId, shop.shopId));
    expect(people.map((c) => c.name).sort()).toEqual(['Hollis Brackwater', 'Marisol Tregarthen']);
    expect(new Set(all.map(({ ticket }) => ticket.customerId)).size).toBe(2);
  });

  it('fits the skirt once, read exactly (1 in = 25.4 mm exactly: TRADE.md, NBS 1959), with one history line per field typed', async () => {
    const [skirt] = (await demoGarments())[0]!.garments;
    const fitting = await kindFittingOf(shop.lead, skirt!.id);
    expect(fitting).toMatchObject({ kind: 'skirt', unit: 'in', choices: { flare: 'circle', circleFraction: '1/2' }, takenBy: 'tailor of Demo Kinds Shop' });
    expect(fitting.values.hemRound).toEqual({ text: '104', mm: 2641.6 }); // 104 × 25.4
    expect(fitting.values.hemDepth).toEqual({ text: '1/2', mm: 12.7 }); // 1/2 × 25.4
    const history = await auditOf(shop.shopId, [skirt!.id], ['kind-fitting.changed']);
    expect(history).toHaveLength(Object.keys(fitting.values).length + Object.keys(fitting.choices).length);
    expect(history.every((e) => e.actorName === 'tailor of Demo Kinds Shop' && e.detail.old === null)).toBe(true);
    expect((await getGarment(shop.lead, skirt!.id)).fitted).toBe(true);
  });

  it('fits the overcoat’s sleeves 1 1/4 in shorter, and both print their own cut sheets', async () => {
    const [skirt, coat] = (await demoGarments()).map((t) => t.garments[0]);
    const fitting = await kindFittingOf(shop.lead, coat!.id);
    expect(fitting).toMatchObject({ kind: 'sleeves', unit: 'in', choices: { buttonholes: 'decorative', buttons: '3' } });
    expect(fitting.values.shortenBy).toEqual({ text: '1 1/4', mm: 31.75 }); // 1 1/4 × 25.4
    const coatSheet = flatText(pdfFile((await garmentSheet(shop.tailor, coat!.id, {}, 'https://demo.cuffwright.test')).bytes));
    expect(coatSheet).toContain('Camel overcoat');
    const skirtSheet = flatText(pdfFile((await garmentSheet(shop.tailor, skirt!.id, {}, 'https://demo.cuffwright.test')).bytes));
    expect(skirtSheet).toContain('Teal half-circle skirt');
  });
});
