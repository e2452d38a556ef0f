// Fitting measurements: each leg read exactly by the engine's parser, kept as typed, with one
// audit event per changed value (who, when, old and new); unreadable lengths named by field.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';
import { chained } from './history-chain';

vi.mock('@/db', () => import('../db/db-mock'));

const { db, handle } = await import('@/db');
const { sql } = await import('drizzle-orm');
const { fittingOf, legsOf, readLengths } = await import('@/services/measurements');
const { makeShop } = await import('./fixtures');
const { fittingRequest, openTicket, saveFitting } = await import('./garment-fixtures');

let a: Shop;
let b: Shop;

beforeAll(async () => {
  a = await makeShop('Fitting Shop A');
  b = await makeShop('Fitting Shop B');
});
afterAll(() => handle.close());

async function garmentOf(shop = a) {
  return (await openTicket(shop, { garments: [{ description: 'Fitting trousers' }] })).garment;
}

describe('measurements', () => {
  it('keep each leg as typed and in exact mm (1 in = 25.4 mm exactly: TRADE.md, NBS 1959)', async () => {
    const g = await garmentOf();
    const saved = await saveFitting(
      a.tailor,
      g.id,
      fittingRequest({ backPin: '31 1/4', cuffDepth: '1 1/2', available: '5' }, { backPin: '31 1/2', cuffDepth: '1½' }),
    );
    const left = saved.legs.find((l) => l.leg === 'left')!;
    const right = saved.legs.find((l) => l.leg === 'right')!;
    expect(left.values.backPin).toEqual({ text: '31 1/4', mm: 793.75 });
    expect(left.values.cuffDepth).toEqual({ text: '1 1/2', mm: 38.1 });
    expect(right.values.cuffDepth).toEqual({ text: '1½', mm: 38.1 });
    expect(right.values.backPin?.mm).toBe(800.1);
    expect(right.values.available).toBeUndefined();
    expect(left.takenBy).toBe('tailor of Fitting Shop A');
  });

  it('record one audit event per changed value, with old and new', async () => {
    const g = await garmentOf();
    await saveFitting(a.tailor, g.id, fittingRequest({ cuffDepth: '1 1/2', available: '5' }));
    const first = (await fittingOf(a.lead, g.id)).history.filter((e) => e.action === 'measurement.changed');
    // Both legs: finish, cuff depth and cloth each went from nothing to a value.
    expect(first).toHaveLength(6);
    await saveFitting(a.lead, g.id, fittingRequest({ cuffDepth: '1 3/4', available: '5' }, { cuffDepth: '1 1/2', available: '5' }));
    const history = (await fittingOf(a.lead, g.id)).history.filter((e) => e.action === 'measurement.changed');
    expect(history).toHaveLength(7);
    expect(history[0]).toMatchObject({
      actorName: 'lead of Fitting Shop A',
      detail: { leg: 'left', field: 'cuffDepth', old: '1 1/2', new: '1 3/4', unit: 'in' },
    });
    expect(Date.parse(history[0]!.at)).toBeGreaterThan(Date.now() - 60_000);
  });

  it('record nothing when nothing changed', async () => {
    const g = await garmentOf();
    const same = fittingRequest({ cuffDepth: '40' }, { cuffDepth: '40' }, 'mm');
    await saveFitting(a.tailor, g.id, same);
    const before = (await fittingOf(a.tailor, g.id)).history.length;
    await saveFitting(a.tailor, g.id, same);
    expect((await fittingOf(a.tailor, g.id)).history.length).toBe(before);
  });

  it('name every length the engine cannot read by its field', () => {
    const read = readLengths(fittingRequest({ cuffDepth: '1 1/2 furlongs', available: '5' }, { backPin: 'abc' }));
    expect(read.ok).toBe(false);
    if (!read.ok) expect(Object.keys(read.issues).sort()).toEqual(['legs.left.cuffDepth', 'legs.right.backPin']);
  });

  it('refuse a taper whose widths make the plan impossible, on the field, before it is saved (arithmetic: 1.5 mm at the edge, 220 mm 150 mm up gives no leg at the cut)', () => {
    const impossible = { cuffDepth: '38', widthAtEdge: '1.5', widthAbove: '220', heightAbove: '150' };
    const read = readLengths(fittingRequest(impossible, { cuffDepth: '38' }, 'mm'));
    expect(read.ok).toBe(false);
    if (!read.ok) {
      expect(Object.keys(read.issues)).toEqual(['legs.left.widthAbove']);
      expect(read.issues['legs.left.widthAbove']).toMatch(/no leg/);
    }
    // a sound taper still saves (7 in flat, 8 in 24 in up: TRADE.md, Fit For A Queen 2012 example)
    expect(readLengths(fittingRequest({ cuffDepth: '1 1/2', widthAtEdge: '7', widthAbove: '8', heightAbove: '24' })).ok).toBe(true);
  });

  it('check a plain hem on a tapered leg too: impossible widths are refused on the field (arithmetic, as above)', () => {
    const impossible = { hemAllowance: '40', widthAtEdge: '1.5', widthAbove: '220', heightAbove: '150' };
    const read = readLengths(fittingRequest(impossible, {}, 'mm', 'plain'));
    expect(read.ok).toBe(false);
    if (!read.ok) expect(Object.keys(read.issues)).toEqual(['legs.left.widthAbove']);
  });

  it('refuse a cuff the engine would refuse (under 3/4 in, common practice (no source)) on its field', () => {
    const read = readLengths(fittingRequest({ cuffDepth: '0.0001' }));
    expect(read.ok).toBe(false);
    if (!read.ok) expect(read.issues['legs.left.cuffDepth']).toMatch(/at least 3\/4 in/);
  });

  it("refuse another shop's garment with 404", async () => {
    const g = await garmentOf(b);
    await expect(saveFitting(a.tailor, g.id, fittingRequest({ cuffDepth: '1 1/2' }))).rejects.toMatchObject({ status: 404 });
    await expect(fittingOf(a.tailor, g.id)).rejects.toMatchObject({ status: 404 });
  });
});

describe('two fittings of one pair saved at the same moment', () => {
  it('each record the change from what the other saved: every leg’s history links up and ends at the saved value', async () => {
    for (let round = 0; round < 6; round += 1) {
      const g = await garmentOf();
      await saveFitting(a.tailor, g.id, fittingRequest({ cuffDepth: '1 1/2', available: '5' }));
      // The second save starts a few database round trips after the first, a different moment each round.
      const late = async () => {
        for (let hop = 0; hop < round; hop += 1) await db.execute(sql`select 1`);
        return saveFitting(a.lead, g.id, fittingRequest({ cuffDepth: '1 1/4', available: '5' }));
      };
      await Promise.all([saveFitting(a.tailor, g.id, fittingRequest({ cuffDepth: '1 3/4', available: '5' })), late()]);
      const legs = await legsOf(g.id);
      const history = (await fittingOf(a.lead, g.id)).history.filter((e) => e.action === 'measurement.changed');
      for (const leg of ['left', 'right'] as const) {
        const saved = legs.find((l) => l.leg === leg)?.values.cuffDepth?.text;
        const depth = history
          .map((e) => e.detail as { leg: string; field: string; old: unknown; new: unknown })
          .filter((d) => d.leg === leg && d.field === 'cuffDepth');
        expect(depth.length, `round ${round}, ${leg}`).toBe(3);
        expect(chained(depth, null, saved), `round ${round}, ${leg}: ${JSON.stringify(depth)} ending at ${saved}`).toBe(true);
      }
    }
  });
});
