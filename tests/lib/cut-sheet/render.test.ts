// The cut sheet as the apprentice reads it: numbers, units, steps, cautions, pages, fonts.
import { beforeAll, describe, expect, it } from 'vitest';
import { renderCutSheet, renderCutSheets } from '@/lib/server/cut-sheet/render';
import { UNSAVED_TITLE } from '@/lib/server/cut-sheet/content';
import { buildCutSheet } from '@/lib/server/cut-sheet/build';
import { flatText, fonts, layoutText, pageInfo, pdfFile, words } from './poppler';
import { busyLegs, cuffInch, cuffMetric, hemSloped, sheet, UNSAVED } from './sheets';
import type { LegOrder } from '@/lib/server/cut-sheet/build';

describe('a 1 1/2 in cuff with 5 in of cloth, inches', () => {
  let file = '';
  beforeAll(async () => {
    file = pdfFile(await renderCutSheet(sheet([cuffInch])));
  });

  it('cuts at 4 1/2 in below the mark and 1/2 in above the raw edge', () => {
    // TRADE.md: cut three cuff depths below the mark: 1 1/2 in cuff → 4 1/2 in; 5 in − 4 1/2 in = 1/2 in.
    const text = layoutText(file);
    expect(text).toMatch(/4 1\/2 in\s+below the pin/);
    expect(text).toMatch(/\n\s*1\/2 in\s+above the/);
  });

  it('puts the folds at 1 1/2 and 3 in below the mark, 3 1/2 and 2 in above the raw edge', () => {
    // TRADE.md: folds at 1 1/2 and 3 in from the cut edge for a 1 1/2 in cuff.
    const text = layoutText(file);
    expect(text).toMatch(/1 Finished edge\s+0 in\s+5 in/);
    expect(text).toMatch(/2 Cuff top\s+1 1\/2 in\s+3 1\/2 in/);
    expect(text).toMatch(/3 Inner fold\s+3 in\s+2 in/);
  });

  it('checks the cloth: needs 4 1/2 in, has 5 in, 1/2 in to spare', () => {
    expect(flatText(file)).toContain('needs 4 1/2 in below the pin mark, has 5 in, 1/2 in to spare');
  });

  it('prints the cutting line at 20 pt or more and the other lines at 14 pt or more', () => {
    // A word box is about 1.2 × the font size tall in Inter (ascender + descender).
    const w = words(file);
    const tallest = (t: string) => Math.max(...w.filter((x) => x.text === t).map((x) => x.yMax - x.yMin));
    expect(tallest('4')).toBeGreaterThanOrEqual(20 * 1.15);
    for (const t of ['5', '3', '2']) expect(tallest(t)).toBeGreaterThanOrEqual(14 * 1.15);
    expect(w.some((x) => x.text === 'CUT')).toBe(true);
  });

  it('sets digits tabular, so "1 1/2" cannot close up into "11/2" and columns line up', () => {
    // Common practice (no source): figures of equal width in tables of numbers. Inter's
    // proportional "1" is narrow enough that "1 7/16" read as "17/16" at arm's length.
    // Single digits set in the lines table's 14 pt (word boxes of one height), widths compared.
    const digits = words(file).filter((x) => /^\d$/.test(x.text));
    const height = (x: { yMin: number; yMax: number }) => Math.round((x.yMax - x.yMin) * 10);
    const row = digits.filter((x) => height(x) === height(digits.find((d) => d.text === '1' && d.yMax - d.yMin > 16 && d.yMax - d.yMin < 20)!));
    const widths = new Map(row.map((x) => [x.text, x.xMax - x.xMin]));
    expect([...widths.keys()].sort()).toEqual(expect.arrayContaining(['0', '1', '3']));
    for (const wd of widths.values()) expect(wd).toBeCloseTo(widths.get('1')!, 2);
  });

  it('lists the bench steps in order, with stitch lengths per inch and mm beside on an inch sheet', () => {
    // TRADE.md common practice: dry chalk not wax; press at the seams first; turn-under with a long
    // stitch (about 4 mm: 25.4/4 ≈ 6 per inch); press with a cloth; tack a little below the cuff top,
    // short stitch (about 2 mm: 25.4/2 ≈ 13 per inch).
    const text = flatText(file);
    const order = [
      "dry tailor's chalk, not wax",
      'Cut on line 4',
      'Press the folds at the seams first, then front and back',
      'Turn under 1/2 in at the raw edge and stitch it with a long stitch (about 6 per inch, 4 mm)',
      'Turn the bottom up to the outside at line 1',
      'Press with a cloth',
      '1/8 to 3/16 in below the cuff top',
      'short stitch (about 13 per inch, 2 mm), back-stitched',
    ].map((p) => text.indexOf(p));
    expect(order.every((i) => i >= 0)).toBe(true);
    expect([...order].sort((a, b) => a - b)).toEqual(order);
  });

  it('shows the usual cautions and defers to the shop', () => {
    // TRADE.md, "Cautions to show".
    const text = flatText(file);
    expect(text).toContain('Iron and steam burn: rest the iron on its heel; unplug it to fill or empty.');
    expect(text).toContain('cut away from you;');
    expect(text).toContain('close or cover them');
    expect(text).toMatch(/count them out and back.*sharps jar/);
    expect(text).toContain('spent blades in the sharps jar');
    expect(text).toContain("shop's own practice and local rules come first");
  });

  it('shows the shop, ticket, garment, due date and assignee, and how to check the print', () => {
    const text = flatText(file);
    for (const t of ['Hartley & Sons Alterations', 'Ticket 1042', 'Navy wool flannel trousers', 'Due Fri, 14 Mar 2025', 'For Sam Ortiz'])
      expect(text).toContain(t);
    // Our own printer check (issue 15): a ruler in the sheet's unit, not the home-pattern squares.
    expect(text).toContain('Check the printer: this ruler should measure exactly 2 in.');
    expect(text).not.toContain('100 %');
    expect(text).not.toContain('fit to page');
    expect(text).not.toContain('squares');
    expect(text).not.toContain(UNSAVED_TITLE);
  });

  it('embeds every font it uses (Inter), nothing left to the printer', () => {
    const list = fonts(file);
    expect(list.length).toBeGreaterThan(0);
    for (const f of list) {
      expect(f.name).toMatch(/Inter/);
      expect(f.embedded).toBe(true);
    }
  });
});

describe('a 40 mm cuff with 150 mm of cloth, metric, unsaved', () => {
  let file = '';
  beforeAll(async () => {
    file = pdfFile(await renderCutSheet(buildCutSheet(UNSAVED, [cuffMetric])));
  });

  it('cuts at 120 mm below the mark and 30 mm above the raw edge', () => {
    // TRADE.md: three cuff depths: 3 × 40 mm = 120 mm; 150 − 120 = 30 mm.
    const text = layoutText(file);
    expect(text).toMatch(/120 mm\s+below the pin/);
    expect(text).toMatch(/\n\s*30 mm\s+above the/);
    expect(text).toMatch(/2 Cuff top\s+40 mm\s+110 mm/);
    expect(text).toMatch(/3 Inner fold\s+80 mm\s+70 mm/);
  });

  it('gives metric tack and turn-under figures and mm stitch lengths', () => {
    const text = flatText(file);
    // Engine default turn-under 12 mm metric (types.ts); tack 3 to 5 mm ≈ 1/8 to 3/16 in (TRADE.md).
    expect(text).toContain('Turn under 12 mm');
    expect(text).toContain('3 to 5 mm below the cuff top');
    expect(text).toContain('long stitch (about 4 mm)');
    // No inches at all: the check ruler is in the sheet's unit.
    expect(text.match(/[\d/]+ in\b/g)).toBeNull();
    expect(text).toContain('this ruler should measure exactly 50 mm');
  });

  it('says it is an unsaved plan from the calculator, with no shop or ticket', () => {
    const text = flatText(file);
    expect(text).toContain(UNSAVED_TITLE);
    expect(text).not.toContain('Ticket');
    expect(text).not.toContain('Garment page');
  });
});

describe('a plain hem sloped 1/2 in', () => {
  it('gives two lines, the front heights and the hem steps', async () => {
    // TRADE.md: plain hem about 1/2 in lower at the back; allowance 1 1/4 to 2 in (engine default 1 1/2 in).
    const file = pdfFile(await renderCutSheet(sheet([hemSloped])));
    const text = flatText(file);
    expect(layoutText(file)).toMatch(/1 1\/2 in\s+below the pin/);
    expect(text).toContain('Plain hem, 1 1/2 in allowance');
    expect(text).toContain('finished edge 1/2 in above and the cutting line 1 in below the back pin mark');
    expect(text).toContain('standard stitch (8–10 per inch, 2.5–3 mm)');
    expect(text).not.toContain('Inner fold');
    expect(text).toContain('Both legs, at the back');
  });
});

/** Every word inside the page's 28 pt margin, down to the last caution: nothing pushed off the paper. */
function expectInsidePage(file: string, width: number, height: number) {
  const w = words(file);
  expect(w.map((x) => x.text).join(' ')).toContain('local rules come first.');
  for (const x of w) {
    expect(x.xMin).toBeGreaterThanOrEqual(27);
    expect(x.yMin).toBeGreaterThanOrEqual(27);
    expect(x.xMax).toBeLessThanOrEqual(width - 27);
    expect(x.yMax).toBeLessThanOrEqual(height - 27);
  }
}

describe('page sizes and batches', () => {
  // The fullest sheet fits one A4 page; on Letter, with every figure in columns that never touch and
  // each side's share of the seam work printed, the bench steps go whole onto a second page.
  for (const [size, w, h, pages] of [
    ['LETTER', 612, 792, 2],
    ['A4', 595.28, 841.89, 1],
  ] as const) {
    it(`prints the fullest sheet on ${pages} ${size} page${pages > 1 ? 's, the steps whole on the second' : ''}`, async () => {
      const file = pdfFile(await renderCutSheet({ ...sheet(busyLegs), pageSize: size }));
      const info = pageInfo(file);
      expect(info).toEqual({ pages, width: w, height: h });
      if (pages === 1) expectInsidePage(file, w, h);
      else {
        expect(flatText(file, 1)).toContain('CHALK GUIDE 1:1');
        expect(flatText(file, 2)).toMatch(/^\s*AT THE BENCH/);
      }
      const text = flatText(file);
      expect(text).toContain('LEFT LEG');
      expect(text).toContain('RIGHT LEG');
      expect(text).toContain('NOT ENOUGH CLOTH');
      // By hand: 7 1/2 in flat at the edge, 8 1/2 in six inches up → 1/6 in per inch; the cuff top
      // (1 1/2 in up) is 7 3/4 in, so the edge needs 1/4 in and the cut (4 1/2 in down) 1 in more.
      expect(text).toContain('7 3/4 in flat');
      expect(text).toContain('let out 1/4 in at line 1');
      expect(text).toContain('let out 1 in at line 4');
      expect(text).toContain('Left leg: before cutting, unpick both leg seams');
      expect(text).toMatch(/old crease/i);
      expect(text).toContain('AT THE BENCH');
      expect(text).toContain('local rules come first');
    });
  }

  it('fits a plain single-leg sheet on one page of each size', async () => {
    for (const pageSize of ['LETTER', 'A4'] as const) {
      for (const legs of [[cuffInch], [cuffMetric], [hemSloped]]) {
        const file = pdfFile(await renderCutSheet({ ...sheet(legs), pageSize }));
        const info = pageInfo(file);
        expect(info).toEqual({ pages: 1, ...(pageSize === 'A4' ? { width: 595.28, height: 841.89 } : { width: 612, height: 792 }) });
        expectInsidePage(file, info.width, info.height);
      }
    }
  });

  it('spills an overfull sheet onto a second page at the true paper size, the 1:1 guide intact', async () => {
    // Both legs tapered past their seam allowance, an old crease on each, cloth short on one.
    const heavy = (side: 'left' | 'right', available: string): LegOrder => ({
      side,
      finish: 'cuff',
      input: { unit: 'in', precision: 16, cuffDepth: '2 1/4', available, oldCrease: side === 'left' ? 1 : '2 1/2', clothThickness: '1/16' },
      taper: { widthAtEdge: 7.5, widthAbove: 9.5, heightAbove: 5, seamAllowance: '1/4' },
    });
    for (const [pageSize, height] of [
      ['LETTER', 792],
      ['A4', 841.89],
    ] as const) {
      const file = pdfFile(await renderCutSheet({ ...sheet([heavy('left', '7'), heavy('right', '6 1/2')]), pageSize }));
      const info = pageInfo(file);
      // The two 2 1/4 in strips go on over a page of strip after the sheet's own two pages.
      expect(info.pages).toBe(3);
      expect(info.height).toBe(height);
      expect(flatText(file, 1)).toContain('CHALK GUIDE 1:1');
      expect(flatText(file, 2)).toContain('local rules come first');
      expect(flatText(file, 3)).toContain('CHALK GUIDE CONTINUED');
    }
  });

  it('cuts a very long garment description short instead of pushing the sheet off the page', async () => {
    const file = pdfFile(await renderCutSheet(sheet([cuffInch], { garment: 'Navy wool flannel trousers, '.repeat(30) })));
    const info = pageInfo(file);
    expect(info.pages).toBe(1);
    expectInsidePage(file, info.width, info.height);
    expect(flatText(file)).toContain('…');
  });

  it('prints a batch of 3 as 3 pages, one garment each, in order', async () => {
    const list = ['2001', '2002', '2003'].map((ticket, i) => sheet([[cuffInch, cuffMetric, hemSloped][i]!], { ticket }));
    const file = pdfFile(await renderCutSheets(list));
    expect(pageInfo(file).pages).toBe(3);
    expect(flatText(file, 1)).toContain('Ticket 2001');
    expect(flatText(file, 2)).toContain('Ticket 2002');
    expect(flatText(file, 2)).toContain('120 mm');
    expect(flatText(file, 3)).toContain('Ticket 2003');
    expect(flatText(file, 3)).toContain('Plain hem');
  });
});
