// A fitting saved before the engine refused it (here seeded straight into the database: widths
// that give no leg at the cuff top) never breaks a print: the garment's sheet and both sheet
// endpoints answer 422 with a JSON message, and the morning batch prints every other garment and
// names this one, with the reason, on its last page.
import type { APIContext } from 'astro';
import { eq, and } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';

vi.mock('@/db', () => import('../db/db-mock'));

const { handle, db } = await import('@/db');
const { measurements } = await import('@/db/schema');
const { garmentSheet, queueSheets } = await import('@/services/cut-sheets');
const { ServiceError } = await import('@/services/errors');
const { DEFAULT_QUEUE_FILTER } = await import('@/lib/shared/queue-filter');
const { makeShop } = await import('./fixtures');
const { fittingRequest, openTicket, saveFitting } = await import('./garment-fixtures');
const { flatText, pageInfo, pdfFile } = await import('../lib/cut-sheet/poppler');
const sheetRoute = await import('@/pages/api/garments/[id]/sheet');
const batchRoute = await import('@/pages/api/queue/sheets');

const BASE = 'https://bench.cuffwright.test';
const TODAY = '2026-12-01';

let shop: Shop;
let bad = '';
let good = '';
let badTicket = 0;

/** Widths 8 in at the edge and 1 in one inch higher: followed up to a 1 1/2 in cuff top there is no leg left. */
async function seedImpossibleTaper(garmentId: string) {
  const inch = (text: string) => ({ text, mm: Number(text) * 25.4 });
  for (const leg of ['left', 'right'] as const) {
    const [row] = await db
      .select()
      .from(measurements)
      .where(and(eq(measurements.garmentId, garmentId), eq(measurements.leg, leg)));
    const values = { ...(row!.values as Record<string, unknown>), widthAtEdge: inch('8'), widthAbove: inch('1'), heightAbove: inch('1') };
    await db.update(measurements).set({ values }).where(eq(measurements.id, row!.id));
  }
}

beforeAll(async () => {
  shop = await makeShop('Refused Sheet Shop');
  const first = await openTicket(shop, {
    customer: { name: 'Ansel Brightwater' },
    garments: [{ description: 'Impossible taper pair', dueOn: '2026-12-01', assigneeId: shop.tailor.userId }],
  });
  bad = first.garment.id;
  badTicket = first.ticket.number;
  await saveFitting(shop.tailor, bad, fittingRequest({ cuffDepth: '1 1/2', available: '5', widthAtEdge: '8', widthAbove: '8 1/2', heightAbove: '6' }));
  await seedImpossibleTaper(bad);
  const second = await openTicket(shop, {
    customer: { name: 'Ines Marchbank' },
    garments: [{ description: 'Sound pair', dueOn: '2026-12-02', assigneeId: shop.tailor.userId }],
  });
  good = second.garment.id;
  await saveFitting(shop.tailor, good, fittingRequest({ cuffDepth: '1 1/2', available: '5' }));
});
afterAll(() => handle.close());

function locals(actor: Shop['tailor']) {
  return {
    user: { id: actor.userId, name: actor.userName, email: actor.email },
    member: { id: actor.memberId, role: actor.role, shopId: actor.shopId, shopName: actor.shopName },
  };
}

describe('a saved fitting the engine refuses', () => {
  it("refuses the garment's sheet with 422 and the engine's reason", async () => {
    const err = await garmentSheet(shop.tailor, bad, {}, BASE).catch((e) => e);
    expect(err).toBeInstanceOf(ServiceError);
    expect(err.status).toBe(422);
    expect(err.message).toMatch(/no leg/);
  });

  it('answers GET /api/garments/[id]/sheet with 422 JSON, not 500', async () => {
    const url = new URL(`http://localhost/api/garments/${bad}/sheet`);
    const res = await sheetRoute.GET({ locals: locals(shop.tailor), params: { id: bad }, url, request: new Request(url) } as unknown as APIContext);
    expect(res.status).toBe(422);
    expect(res.headers.get('content-type')).toMatch(/json/);
    expect((await res.json()).error).toMatch(/no leg/);
  });

  it('prints every other garment of the batch and names this one with the reason on the last page', async () => {
    const batch = await queueSheets(shop.tailor, DEFAULT_QUEUE_FILTER, TODAY, {}, BASE);
    expect(batch.sheets).toBe(1);
    expect(batch.skipped).toEqual([expect.stringMatching(new RegExp(`^RSS ${badTicket} Impossible taper pair: .*no leg`))]);
    const path = pdfFile(batch.bytes);
    expect(pageInfo(path).pages).toBe(2);
    expect(flatText(path, 1)).toContain('Sound pair');
    expect(flatText(path, 2)).toContain('Not in this batch');
    expect(flatText(path, 2)).toContain('Impossible taper pair');
    expect(flatText(path, 2)).toMatch(/no leg/);
  });

  it('answers GET /api/queue/sheets with the PDF of the printable garments (X-Skipped 1)', async () => {
    const url = new URL(`http://localhost/api/queue/sheets?today=${TODAY}`);
    const res = await batchRoute.GET({ locals: locals(shop.tailor), url, request: new Request(url) } as unknown as APIContext);
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('application/pdf');
    expect(res.headers.get('x-skipped')).toBe('1');
  });

  it('answers 422 JSON for a batch whose only garment is refused', async () => {
    const url = new URL(`http://localhost/api/queue/sheets?today=${TODAY}&search=Ansel`);
    const res = await batchRoute.GET({ locals: locals(shop.tailor), url, request: new Request(url) } as unknown as APIContext);
    expect(res.status).toBe(422);
    expect((await res.json()).error).toMatch(/no leg/);
  });

  it('still prints the sound garment on its own', async () => {
    const file = await garmentSheet(shop.tailor, good, {}, BASE);
    expect(flatText(pdfFile(file.bytes))).toContain('4 1/2 in');
  });
});
