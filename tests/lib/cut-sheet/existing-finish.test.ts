// The cut sheet of a pair that came in with cuffs: the old cuffs are let down and their creases
// pressed out before any chalk, the old-crease note agrees with that, and the page still fits.
// A new unfinished pair and the calculator's sheet get nothing extra.
import { beforeAll, describe, expect, it } from 'vitest';
import { CAUTIONS, LET_DOWN_HEADING, LET_DOWN_OLD_CUFF, sheetContent } from '@/lib/server/cut-sheet/content';
import { buildCutSheet, type LegOrder } from '@/lib/server/cut-sheet/build';
import { renderCutSheet } from '@/lib/server/cut-sheet/render';
import { spawnSync } from 'node:child_process';
import { flatText, pageInfo, pdfFile, words } from './poppler';
import { busyLegs, cuffInch, hemSloped, sheet, UNSAVED } from './sheets';

/** A 1 1/2 in cuff with 5 in of cloth and the old fold at `oldCrease` below the mark. */
const cuffWithCrease = (oldCrease: number | string): LegOrder => ({
  side: 'left',
  finish: 'cuff',
  input: { unit: 'in', precision: 8, cuffDepth: '1 1/2', available: 5, oldCrease },
});

/** One page's size in points (pdfinfo of that page alone). */
function pageSizeOf(file: string, page: number): { width: number; height: number } {
  const info = spawnSync('pdfinfo', ['-f', String(page), '-l', String(page), file], { encoding: 'utf8' }).stdout;
  const m = new RegExp(`Page\\s+${page} size:\\s+([\\d.]+) x ([\\d.]+) pts`).exec(info);
  return { width: Number(m?.[1]), height: Number(m?.[2]) };
}

/** The first words of each numbered step as printed, in order ("1. Let down the old"). */
function stepStarts(text: string): string[] {
  const bench = text.slice(text.indexOf('AT THE BENCH'), text.indexOf('TAKE CARE'));
  return [...bench.matchAll(/(\d+)\. (\S+ \S+ \S+)/g)].map((m) => `${m[1]}. ${m[2]}`);
}

describe('a pair that came in with cuffs, cuffed again', () => {
  let text = '';
  beforeAll(async () => {
    text = flatText(pdfFile(await renderCutSheet(sheet([cuffInch], { existingFinish: 'cuff' }))));
  });

  it('begins the bench steps by letting down the old cuffs, before any chalk', () => {
    expect(text).toContain(LET_DOWN_OLD_CUFF);
    expect(stepStarts(text).slice(0, 3)).toEqual(['1. Let down the', '2. Chalk the four', '3. Cut on line']);
  });

  it('says to unpick the tacks and the turn-under and press out the old creases with a cloth', () => {
    // TRADE.md: tack and turn-under are the cuff's parts; "press with a cloth on the outside to
    // avoid shine; wool takes steam" (common practice, no source).
    const step = text.slice(text.indexOf('1. Let down'), text.indexOf('2. Chalk'));
    expect(step).toContain('unpick tacks and turn-under');
    expect(step).toContain('press out old creases with a cloth');
  });

  it('keeps the cautions for the seam ripper and the iron the step uses', () => {
    // TRADE.md, "Cautions to show".
    for (const c of CAUTIONS) expect(text).toContain(c);
  });
});

describe('the same plan from other ways in', () => {
  const plain = sheetContent(sheet([cuffInch]));

  it('an unfinished new pair gets exactly the steps and notes of a sheet with no finish given', () => {
    const unfinished = sheetContent(sheet([cuffInch], { existingFinish: 'unfinished' }));
    expect(unfinished.steps).toEqual(plain.steps);
    expect(unfinished.groups.map((g) => [g.crease, g.warnings])).toEqual(plain.groups.map((g) => [g.crease, g.warnings]));
    expect(JSON.stringify(unfinished)).not.toContain('Let down');
  });

  it('a pair with a plain hem gets no let-down-the-cuff step', () => {
    const hemmed = sheetContent(sheet([cuffInch], { existingFinish: 'plain-hem' }));
    expect(hemmed.steps).toEqual(plain.steps);
  });

  it("the calculator's unsaved sheet has no existing finish and no let-down step", async () => {
    const data = buildCutSheet(UNSAVED, [cuffInch]);
    expect(data.existingFinish).toBeUndefined();
    const text = flatText(pdfFile(await renderCutSheet(data)));
    expect(text).not.toContain('Let down');
    expect(stepStarts(text)[0]).toBe('1. Chalk the four');
  });
});

describe('an old cuff finished as a plain hem', () => {
  it('lets the cuff down first, then the hem steps', async () => {
    const text = flatText(pdfFile(await renderCutSheet(sheet([hemSloped], { existingFinish: 'cuff' }))));
    expect(text).toContain(LET_DOWN_OLD_CUFF);
    expect(stepStarts(text).slice(0, 3)).toEqual(['1. Let down the', '2. Chalk the two', '3. Cut on line']);
  });
});

describe('legs finished differently, the pair with cuffs', () => {
  it('lets both legs down first, in a block of its own before each leg’s steps', async () => {
    const legs: LegOrder[] = [cuffInch, { ...hemSloped, side: 'right' }];
    const c = sheetContent(sheet(legs, { existingFinish: 'cuff' }));
    expect(c.steps.map((b) => b.heading)).toEqual([LET_DOWN_HEADING, 'Left leg', 'Right leg']);
    expect(c.steps[0]!.items).toEqual([LET_DOWN_OLD_CUFF]);
    const text = flatText(pdfFile(await renderCutSheet(sheet(legs, { existingFinish: 'cuff' }))));
    const at = (s: string) => text.indexOf(s);
    expect(at(LET_DOWN_HEADING)).toBeGreaterThan(at('AT THE BENCH'));
    expect(at(LET_DOWN_OLD_CUFF)).toBeGreaterThan(at(LET_DOWN_HEADING));
    expect(at('Left leg 1. Chalk')).toBeGreaterThan(at(LET_DOWN_OLD_CUFF));
  });
});

describe('the old-crease note agrees with the let-down step', () => {
  it('a crease showing on the leg is pressed out when the cuffs come down, not "before finishing"', async () => {
    // By hand from TRADE.md's fold plan: an old fold 2 in above the mark, a 1 1/2 in cuff: on the
    // leg 2 in above the finished edge, 2 − 1 1/2 = 1/2 in above the cuff top.
    const text = flatText(pdfFile(await renderCutSheet(sheet([cuffWithCrease(-2)], { existingFinish: 'cuff' }))));
    expect(text).toContain('The old crease will show on the leg, 2 in above the finished edge, 1/2 in above the cuff top.');
    expect(text).toContain('Press it out as the old cuffs come down; if it still shows, choose a cuff depth that covers it.');
    expect(text).not.toContain('before finishing');
    expect(text).not.toMatch(/old hem crease/i);
  });

  it('a crease on the face of the cuff likewise', () => {
    // By hand from TRADE.md's fold plan: lines at 0, 1 1/2, 3 and 4 1/2 in; a fold 2 in below the
    // mark lies between the cuff top and the inner fold, 3 − 2 = 1 in above the finished edge.
    const g = sheetContent(sheet([cuffWithCrease(2)], { existingFinish: 'cuff' })).groups[0]!;
    expect(g.crease).toBe(
      'The old crease will show on the face of the cuff, 1 in above the finished edge. Press it out as the old cuffs come down; if it still shows, change the cuff depth so it falls on a fold. Tell the customer it may not press out.',
    );
  });

  it('a crease the new folds hide keeps the engine’s words', () => {
    // By hand: a fold 1 1/2 in below the mark is the new cuff top of a 1 1/2 in cuff.
    const order = cuffWithCrease('1 1/2');
    const [withCuff, without] = [sheet([order], { existingFinish: 'cuff' }), sheet([order])].map((d) => sheetContent(d).groups[0]!.crease);
    expect(withCuff).toBe('The old crease falls on the new cuff top: the new fold takes it, so it will not show.');
    expect(withCuff).toBe(without);
  });

  it('a pair that came with a plain hem keeps the engine’s advice to press before finishing', () => {
    const g = sheetContent(sheet([cuffWithCrease(-2)], { existingFinish: 'plain-hem' })).groups[0]!;
    expect(g.crease).toContain('The old hem crease will show on the leg');
    expect(g.crease).toContain('before finishing');
  });

  it('an unfinished pair with an old crease noted asks for a check, since a new pair has none', () => {
    const g = sheetContent(sheet([cuffWithCrease(-2)], { existingFinish: 'unfinished' })).groups[0]!;
    expect(g.warnings.some((w) => /came in unfinished, yet an old crease is noted/.test(w))).toBe(true);
    const noCrease = sheetContent(sheet([cuffInch], { existingFinish: 'unfinished' })).groups[0]!;
    expect(noCrease.warnings.some((w) => /came in unfinished/.test(w))).toBe(false);
  });
});

describe('the fullest sheet with old cuffs', () => {
  // With the let-out named from the finished edge, the shorter-third-section offer and the word to
  // the customer, this sheet no longer fits one A4 page: the bench steps go whole onto page 2.
  it('on A4, the figures and the 1:1 guide on page 1, the bench steps whole on page 2, down to the last caution', async () => {
    const file = pdfFile(await renderCutSheet({ ...sheet(busyLegs), pageSize: 'A4', existingFinish: 'cuff' }));
    expect(pageInfo(file)).toEqual({ pages: 2, width: 595.28, height: 841.89 });
    expect(flatText(file, 1)).toContain('CHALK GUIDE 1:1');
    expect(flatText(file, 2)).toMatch(/^\s*AT THE BENCH/);
    const text = flatText(file);
    expect(text).toContain(LET_DOWN_OLD_CUFF);
    // The right leg's old fold (2 1/2 in below the mark, 1 3/4 in cuff: lines at 1 3/4 and 3 1/2 in)
    // lies between cuff top and inner fold, so it would show on the cuff face.
    expect(text).toContain('Press it out as the old cuffs come down');
    for (const x of words(file)) {
      expect(x.yMax).toBeLessThanOrEqual(841.89 - 27);
      expect(x.xMax).toBeLessThanOrEqual(595.28 - 27);
    }
    expect(text).toContain('local rules come first');
  });

  it('on Letter, one line fuller than the page, spills at the true paper size with the 1:1 guide on page 1', async () => {
    const file = pdfFile(await renderCutSheet({ ...sheet(busyLegs), pageSize: 'LETTER', existingFinish: 'cuff' }));
    const pages = pageInfo(file).pages;
    expect(pages).toBeLessThanOrEqual(2);
    for (let p = 1; p <= pages; p++) expect(pageSizeOf(file, p)).toEqual({ width: 612, height: 792 });
    expect(flatText(file, 1)).toContain('CHALK GUIDE 1:1');
    const text = flatText(file);
    expect(text).toContain(LET_DOWN_OLD_CUFF);
    expect(text).toContain('local rules come first');
  });
});
