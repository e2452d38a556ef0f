// Kept paragraph layouts must never change a sheet: the same page with the memo as without it.
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { renderCutSheet, renderCutSheets } from '@/lib/server/cut-sheet/render';
import { keptLayouts, layoutKey, memoiseTextLayout } from '@/lib/server/pdf-platform/text-layout-memo';
import { comparable } from './pdf-objects';
import { busyLegs, cuffInch, cuffMetric, hemSloped, sheet, UNSAVED } from './sheets';
import type { CutSheetData } from '@/lib/shared/cut-sheet-types';

// Both units, cuff and hem, taper and short cloth, an unsaved plan, A4: every block of the sheet.
const SHEETS: CutSheetData[] = [
  sheet([cuffInch]),
  sheet([cuffMetric], { ticket: '1043', garment: 'Grey worsted suit trousers' }),
  sheet(busyLegs, { ticket: '1044' }),
  sheet([hemSloped], { ticket: '1045', assignee: 'Priya Navarro' }),
  { ...sheet([cuffInch], UNSAVED), pageSize: 'A4' },
];

afterAll(() => memoiseTextLayout(true));

describe('the paragraph layout memo', () => {
  it('renders every sheet exactly as without it, cold and warm, single and batched', async () => {
    memoiseTextLayout(true);
    const cold = await Promise.all(SHEETS.map(async (d) => comparable(await renderCutSheet(d))));
    expect(keptLayouts()).toBeGreaterThan(50);
    const warm = [];
    for (const d of SHEETS) warm.push(comparable(await renderCutSheet(d)));
    const batchWarm = comparable(await renderCutSheets(SHEETS));
    memoiseTextLayout(false);
    const plain = [];
    for (const d of SHEETS) plain.push(comparable(await renderCutSheet(d)));
    const batchPlain = comparable(await renderCutSheets(SHEETS));
    expect(keptLayouts()).toBe(0);
    for (let i = 0; i < SHEETS.length; i++) {
      expect(cold[i]).toEqual(plain[i]);
      expect(warm[i]).toEqual(plain[i]);
    }
    expect(batchWarm).toEqual(batchPlain);
    memoiseTextLayout(true);
  });

  // A loaded font is a class instance (fontkit's); plain objects are settings, compared by content.
  class Face {
    unitsPerEm = 2048;
  }
  const font = new Face();
  const request = (text: string, width: number, fontSize: number) => ({
    text: { string: text, runs: [{ start: 0, end: text.length, attributes: { font: [font], fontSize, color: '#111111', features: { kern: true } } }] },
    container: { x: 0, y: 0, width, height: Infinity, maxLines: undefined, truncateMode: undefined },
    options: { hyphenationPenalty: undefined, shrinkWhitespaceFactor: { before: -0.5, after: -0.5 }, hyphenationCallback: null },
  });

  it('gives two requests the same key only when text, style and box are the same', () => {
    fc.assert(
      fc.property(
        fc.string(),
        fc.string(),
        fc.integer({ min: 1, max: 600 }),
        fc.integer({ min: 1, max: 600 }),
        fc.constantFrom(8, 8.5, 10),
        fc.constantFrom(8, 8.5, 10),
        (t1, t2, w1, w2, f1, f2) => {
          const a = request(t1, w1, f1);
          const b = request(t2, w2, f2);
          const same = t1 === t2 && w1 === w2 && f1 === f2;
          expect(layoutKey(a.text, a.container, a.options) === layoutKey(b.text, b.container, b.options)).toBe(same);
        },
      ),
    );
  });

  it('tells fonts apart by identity and keeps nothing for text flowing round shapes or holding images', () => {
    const a = request('Cuff top', 100, 10);
    const other = { ...a.text, runs: [{ ...a.text.runs[0]!, attributes: { ...a.text.runs[0]!.attributes, font: [new Face()] } }] };
    expect(layoutKey(other, a.container, a.options)).not.toBe(layoutKey(a.text, a.container, a.options));
    expect(layoutKey(a.text, { ...a.container, exclusions: [{ type: 'rect' }] }, a.options)).toBeNull();
    const image = { ...a.text, runs: [{ ...a.text.runs[0]!, attributes: { ...a.text.runs[0]!.attributes, attachment: { width: 10, height: 10 } } }] };
    expect(layoutKey(image, a.container, a.options)).toBeNull();
  });
});
