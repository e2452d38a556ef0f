// The width measured at the cutting line on a let-down pair: saved with the fitting as typed and in
// exact mm, refused on its field when it cannot be a width, and used on the sheet only for a pair
// that came in with an old hem or cuff (an unfinished pair has no old hem to flare). A plain hem on
// a tapered leg gets its taper note on the sheet too. Base leg: TRADE.md's tapered example (7 in flat
// at the edge, 8 in higher up: Fit For A Queen 2012); the let-down figures are arithmetic on it.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';

vi.mock('@/db', () => import('../db/db-mock'));

const { handle } = await import('@/db');
const { readLengths } = await import('@/services/measurements');
const { updateGarment } = await import('@/services/garments');
const { garmentSheet } = await import('@/services/cut-sheets');
const { garmentFacts } = await import('@/services/counter/prices');
const { makeShop } = await import('./fixtures');
const { fittingRequest, openTicket, saveFitting } = await import('./garment-fixtures');
const { flatText, pdfFile } = await import('../lib/cut-sheet/poppler');

let a: Shop;

beforeAll(async () => {
  a = await makeShop('Letdown Alterations');
});
afterAll(() => handle.close());

const HEM_LEG = { backPin: '32', hemAllowance: '1 1/2', widthAtEdge: '7', widthAbove: '8', heightAbove: '12', widthAtCut: '7 1/2' };

async function garment(existingFinish: 'plain-hem' | 'cuff' | 'unfinished') {
  return (await openTicket(a, { customer: { name: 'Odile Farrant' }, garments: [{ description: 'Fawn twill trousers', existingFinish }] })).garment;
}

const sheetText = async (id: string) => flatText(pdfFile((await garmentSheet(a.tailor, id, {}, 'https://bench.cuffwright.test')).bytes));

describe('the width at the cutting line', () => {
  it('is saved as typed and in exact mm (7 1/2 in = 190.5 mm: 1 in = 25.4 mm, TRADE.md, NBS 1959)', async () => {
    const g = await garment('plain-hem');
    const saved = await saveFitting(a.tailor, g.id, fittingRequest(HEM_LEG, HEM_LEG, 'in', 'plain'));
    expect(saved.legs.find((l) => l.leg === 'left')!.values.widthAtCut).toEqual({ text: '7 1/2', mm: 190.5 });
    expect(saved.history.some((e) => e.action === 'measurement.changed' && (e.detail as { field?: string }).field === 'widthAtCut')).toBe(true);
  });

  it('is refused on its own field when it is no width (0, or less), on a cuff and on a plain hem', () => {
    for (const finish of ['cuff', 'plain'] as const) {
      const leg = { ...HEM_LEG, cuffDepth: '1 1/2', widthAtCut: '0' };
      const read = readLengths(fittingRequest(leg, { ...leg, widthAtCut: '-1' }, 'in', finish));
      expect(read.ok).toBe(false);
      if (!read.ok) {
        expect(read.issues['legs.left.widthAtCut']).toBe('Width at the cutting line must be more than 0.');
        expect(read.issues['legs.right.widthAtCut']).toBe('Width at the cutting line must be more than 0.');
      }
    }
  });

  it('does not make a taper with no leg savable: still refused on the width higher up (arithmetic: 200 mm less 2 × 110 mm at the old fold)', () => {
    const leg = { cuffDepth: '38', oldCrease: '110', widthAtEdge: '200', widthAbove: '220', heightAbove: '10', widthAtCut: '190' };
    const read = readLengths(fittingRequest(leg, { cuffDepth: '38' }, 'mm'));
    expect(read.ok).toBe(false);
    if (!read.ok) expect(read.issues['legs.left.widthAbove']).toMatch(/no leg/);
  });

  it('is used on the sheet of a pair let down first, and said to be measured; not on an unfinished pair', async () => {
    const g = await garment('plain-hem');
    await saveFitting(a.tailor, g.id, fittingRequest(HEM_LEG, HEM_LEG, 'in', 'plain'));
    // 7 1/2 in at the cut, the leg 1 1/2 in above the edge 7 1/8 in: take in 3/8 in at each seam.
    const letDown = await sheetText(g.id);
    expect(letDown).toContain('measured on the let-down leg: 7 1/2 in flat');
    expect(letDown).toContain('take in 3/8 in at line 2');
    await updateGarment(a.counter, g.id, { existingFinish: 'unfinished' });
    // New trousers: the taper followed down, 6 7/8 in at the cut, let out 1/4 in.
    const fresh = await sheetText(g.id);
    expect(fresh).not.toContain('measured on the let-down leg');
    expect(fresh).toContain('let out 1/4 in at line 2');
  });
});

describe('a plain hem on a tapered leg, from the bench', () => {
  it('prints its taper check: the hem turned up must match the leg 1 1/2 in above the edge (7 1/8 in flat)', async () => {
    const g = await garment('unfinished');
    const { widthAtCut: _w, ...leg } = HEM_LEG;
    await saveFitting(a.tailor, g.id, fittingRequest(leg, leg, 'in', 'slope'));
    const text = await sheetText(g.id);
    expect(text).toContain('the hem must match the leg 1 1/2 in above the edge (7 1/8 in flat)');
  });
});

describe('the price of a taper let-out', () => {
  it('follows the width measured at the cut on a let-down pair, as the sheet does (arithmetic: 7 1/8 in at the cut is within 1/8 in of every line; followed down, 1/4 in to let out)', async () => {
    const leg = { cuffDepth: '1 1/2', widthAtEdge: '7', widthAbove: '8', heightAbove: '24', widthAtCut: '7 1/8' };
    const g = await garment('cuff');
    await saveFitting(a.tailor, g.id, fittingRequest(leg));
    const facts = async () => (await garmentFacts(a.shopId, g.ticketId)).find((f) => f.garmentId === g.id)!;
    expect((await facts()).taperLetOut).toBe(false);
    await updateGarment(a.counter, g.id, { existingFinish: 'unfinished' });
    expect((await facts()).taperLetOut).toBe(true);
  });
});
