// A saved garment's cut sheet knows how the pair came in: one that came with cuffs starts its bench
// steps by letting the old cuffs down, alone and in the morning's batch; a plain-hemmed or a new
// unfinished pair does not; a change of the finish at the counter shows on the next sheet.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';

vi.mock('@/db', () => import('../db/db-mock'));

const { handle } = await import('@/db');
const { updateGarment } = await import('@/services/garments');
const { garmentSheet, queueSheets } = await import('@/services/cut-sheets');
const { LET_DOWN_OLD_CUFF } = await import('@/lib/server/cut-sheet/content');
const { DEFAULT_QUEUE_FILTER } = await import('@/lib/shared/queue-filter');
const { makeShop } = await import('./fixtures');
const { fittingRequest, openTicket, saveFitting } = await import('./garment-fixtures');
const { flatText, pageInfo, pdfFile } = await import('../lib/cut-sheet/poppler');

const BASE = 'https://bench.cuffwright.test';
const TODAY = '2026-12-02';

let a: Shop;

beforeAll(async () => {
  a = await makeShop('Pressbench Alterations');
});
afterAll(() => handle.close());

type Finish = 'plain-hem' | 'cuff' | 'unfinished';

/** A garment of the given finish, fitted for a 1 3/4 in cuff on a tapered leg (invented figures, like the demo's charcoal pair). */
async function fitted(description: string, existingFinish: Finish, customer: string) {
  const { garment } = await openTicket(a, { customer: { name: customer }, garments: [{ description, existingFinish, dueOn: TODAY }] });
  await saveFitting(
    a.tailor,
    garment.id,
    fittingRequest({
      backPin: '33',
      cuffDepth: '1 3/4',
      available: '5 1/4',
      oldCrease: '-2',
      widthAtEdge: '8',
      widthAbove: '8 3/4',
      heightAbove: '6',
      seamAllowance: '1/2',
    }),
  );
  return garment.id;
}

async function sheetText(id: string) {
  const file = pdfFile((await garmentSheet(a.tailor, id, {}, BASE)).bytes);
  return { text: flatText(file), pages: pageInfo(file).pages };
}

/** The bench steps as printed, from the heading to the cautions. */
const benchOf = (text: string) => text.slice(text.indexOf('AT THE BENCH'), text.indexOf('TAKE CARE'));

describe('one garment that came in with cuffs', () => {
  let id = '';
  beforeAll(async () => {
    id = await fitted('Charcoal wool trousers', 'cuff', 'Ilse Marrow');
  });

  it('prints "let down the old cuffs" as step 1, before the chalk, on one page', async () => {
    const { text, pages } = await sheetText(id);
    const bench = benchOf(text);
    expect(bench).toContain(`1. ${LET_DOWN_OLD_CUFF}`);
    expect(bench.indexOf(LET_DOWN_OLD_CUFF)).toBeLessThan(bench.indexOf('2. Chalk the four lines'));
    expect(pages).toBe(1);
  });

  it('tells it to press the old crease out as the cuffs come down, not before finishing', async () => {
    // By hand from TRADE.md's fold plan: a fold 2 in above the mark with a 1 3/4 in cuff shows on
    // the leg 2 in above the finished edge, 2 − 1 3/4 = 1/4 in above the cuff top.
    const { text } = await sheetText(id);
    expect(text).toContain('The old crease will show on the leg, 2 in above the finished edge, 1/4 in above the cuff top.');
    expect(text).toContain('Press it out as the old cuffs come down');
    expect(text).not.toContain('before finishing');
  });

  it('loses the step once the counter corrects the finish to a plain hem, and gets it back', async () => {
    await updateGarment(a.counter, id, { existingFinish: 'plain-hem' });
    expect((await sheetText(id)).text).not.toContain('Let down');
    await updateGarment(a.counter, id, { existingFinish: 'cuff' });
    expect((await sheetText(id)).text).toContain(LET_DOWN_OLD_CUFF);
  });
});

describe('other ways in', () => {
  it('a plain-hemmed pair starts at the chalk; an unfinished one too, with its noted crease to be checked', async () => {
    const hemmed = await sheetText(await fitted('Fawn twill trousers', 'plain-hem', 'Petra Osk'));
    expect(hemmed.text).not.toContain('Let down');
    expect(benchOf(hemmed.text)).toMatch(/^AT THE BENCH, IN THIS ORDER\D*?1\. Chalk the four lines/);
    const fresh = await sheetText(await fitted('New grey worsted trousers', 'unfinished', 'Tamsin Vell'));
    expect(fresh.text).not.toContain('Let down');
    expect(benchOf(fresh.text)).toMatch(/^AT THE BENCH, IN THIS ORDER\D*?1\. Chalk the four lines/);
    expect(fresh.text).toContain('came in unfinished, yet an old crease is noted');
  });
});

describe("the morning's batch", () => {
  it('prints the step on the cuffed pair’s page only', async () => {
    const batch = await queueSheets(a.tailor, { ...DEFAULT_QUEUE_FILTER, search: 'Ilse' }, TODAY, {}, BASE);
    expect(batch.sheets).toBe(1);
    expect(flatText(pdfFile(batch.bytes))).toContain(LET_DOWN_OLD_CUFF);
    const all = await queueSheets(a.tailor, DEFAULT_QUEUE_FILTER, TODAY, {}, BASE);
    const file = pdfFile(all.bytes);
    const pages = Array.from({ length: all.sheets }, (_, i) => flatText(file, i + 1));
    const withStep = pages.filter((p) => p.includes(LET_DOWN_OLD_CUFF));
    expect(withStep).toHaveLength(1);
    expect(withStep[0]).toContain('Charcoal wool trousers (Ilse Marrow)');
  });
});
