// A cut sheet in the shop's second language (French): its words are the catalog's, its figures the
// same as the English sheet's (the lengths are written as a tailor writes them, 1 1/2 in, whatever
// the language), and the longer words keep the layout: no runs touching, nothing under 9 pt, the
// same pages as in English. The figures' sums are checked once for every language (printed-sums).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { buildCutSheet, type LegOrder } from '@/lib/server/cut-sheet/build';
import { sheetContent } from '@/lib/server/cut-sheet/content';
import { renderCutSheet, renderCutSheets } from '@/lib/server/cut-sheet/render';
import type { CutSheetData } from '@/lib/shared/cut-sheet-types';
import { crowdedRuns, textRuns } from './pdf-runs';
import { flatText, pageInfo, pdfFile } from './poppler';
import { busyLegs, cuffInch, cuffMetric, hemSloped, SHOP, sheet, UNSAVED } from './sheets';

const fr = <T extends CutSheetData>(d: T): T => ({ ...d, language: 'fr' });

// Common practice (no source): 9 pt is about the least a person reads comfortably at arm's length.
const LEAST_PT = 9;

const letDownTaper: LegOrder[] = [
  {
    side: 'left',
    finish: 'hem',
    input: { unit: 'mm', available: 90, slope: 12 },
    taper: { widthAtEdge: 190, widthAbove: 215, heightAbove: 150, seamAllowance: 10, widthAtCut: 180 },
  },
  { side: 'right', finish: 'cuff', input: { unit: 'mm', cuffDepth: 40, available: 100, oldCrease: 60 } },
];

const CASES: [string, CutSheetData][] = [
  ['a saved inch cuff', sheet([cuffInch])],
  ['an unsaved metric cuff', buildCutSheet(UNSAVED, [cuffMetric])],
  ['a sloped plain hem', sheet([hemSloped])],
  ['the fullest sheet, two strips side by side', sheet(busyLegs)],
  ['the fullest sheet on A4', { ...sheet(busyLegs), pageSize: 'A4' }],
  ['a sloped let-down hem and a short cuff, let down first', { ...sheet(letDownTaper), existingFinish: 'cuff', pageSize: 'A4' }],
];

function crowded(pdf: Uint8Array): string[] {
  return crowdedRuns(textRuns(pdf), 2).map(([a, b, gap]) => `"${a.text}" and "${b.text}" ${gap.toFixed(2)} pt apart (page ${a.page})`);
}

describe('a cut sheet in French', () => {
  it('prints the catalog’s French words, the date in French, and the same figures as in English', async () => {
    const data = { ...sheet([cuffInch]), existingFinish: 'cuff' as const };
    const file = pdfFile(await renderCutSheet(fr(data)));
    const text = flatText(file);
    for (const words of [
      'FICHE DE COUPE',
      'Revers, 1 1/2 in de haut',
      'Pli intérieur',
      'Échelle 1:',
      'À L’ÉTABLI, DANS CET ORDRE',
      'Défaites les anciens revers',
      'ATTENTION AUX MAINS',
      'ven. 14 mars 2025',
    ]) {
      expect(text).toContain(words);
    }
    expect(text).not.toMatch(/Cutting line|AT THE BENCH|Cloth check|Due /);
    // The same lengths, in the same order, as the English sheet prints.
    const figures = (t: string) => t.match(/\d+(?: \d+\/\d+)? in\b/g) ?? [];
    const english = flatText(pdfFile(await renderCutSheet(data)));
    expect(figures(text).sort()).toEqual(figures(english).sort());
  });

  it('renders every warning and crease verdict from its code in French (no English sentence of the engine left)', () => {
    const c = sheetContent(fr(sheet(busyLegs)));
    const said = [
      ...c.groups.flatMap((g) => [...g.warnings, g.crease ?? '', g.cloth.text, ...g.cloth.options, g.taper?.summary ?? '', g.taper?.work ?? '']),
      ...c.steps.flatMap((s) => s.items),
    ];
    expect(said.join(' ')).not.toMatch(/\b(the|and|below|above|cuff|cloth|seam)\b/i);
    expect(said.join(' ')).toContain('ancien pli');
  });

  for (const [name, data] of CASES.filter(([n]) => n !== 'the fullest sheet on A4')) {
    it(`${name}: no runs touching, nothing under 9 pt, as many pages as in English`, async () => {
      const pdf = await renderCutSheet(fr(data));
      expect(crowded(pdf)).toEqual([]);
      expect(
        textRuns(pdf)
          .filter((r) => r.size < LEAST_PT - 1e-6)
          .map((r) => `${r.size} pt: ${r.text}`),
      ).toEqual([]);
      expect(pageInfo(pdfFile(pdf)).pages).toBe(pageInfo(pdfFile(await renderCutSheet(data))).pages);
    });
  }

  // The French words are about a sixth longer: the fullest sheet, one page on A4 in English, spills as
  // the fullest Letter sheet does in English: figures and the 1:1 guide on page 1, the steps whole on page 2.
  it('the fullest sheet on A4: spills its bench steps whole onto a second page at paper size, guide on page 1', async () => {
    const pdf = await renderCutSheet(fr({ ...sheet(busyLegs), pageSize: 'A4' }));
    const file = pdfFile(pdf);
    expect(crowded(pdf)).toEqual([]);
    expect(textRuns(pdf).filter((r) => r.size < LEAST_PT - 1e-6)).toEqual([]);
    const info = pageInfo(file);
    expect(info.pages).toBe(2);
    expect(Math.round(info.height)).toBe(842);
    expect(flatText(file, 1)).toContain('GUIDE CRAIE 1:1');
    expect(flatText(file, 1)).toContain('Échelle 1:');
    expect(flatText(file, 2)).toMatch(/^À L’ÉTABLI, DANS CET ORDRE 1\. .*8\. .*ATTENTION AUX MAINS .*priment\.\s*$/s);
  });

  it('a batch with a page of garments left out, in French', async () => {
    const file = pdfFile(await renderCutSheets([fr(sheet([cuffInch]))], ['PH 7 Pantalon gris : pas encore de mesures']));
    expect(flatText(file)).toContain('Absents de ce lot');
  });

  it('over generated sheets in every unit, both papers: no runs touching', async () => {
    const leg = fc.record({
      scale: fc.constantFrom<['in' | 'cm' | 'mm', 8 | 16 | 32]>(['in', 8], ['in', 16], ['in', 32], ['cm', 8], ['mm', 8]),
      finish: fc.constantFrom('cuff', 'hem'),
      depthMm: fc.integer({ min: 200, max: 700 }).map((k) => k / 10),
      availableMm: fc.option(
        fc.integer({ min: 0, max: 50800 }).map((k) => k / 10),
        { nil: undefined },
      ),
      pageSize: fc.constantFrom<'LETTER' | 'A4'>('LETTER', 'A4'),
    });
    await fc.assert(
      fc.asyncProperty(leg, async (o) => {
        const [unit, precision] = o.scale;
        const available = o.availableMm === undefined ? {} : { available: `${o.availableMm} mm` };
        const order: LegOrder =
          o.finish === 'cuff'
            ? { side: 'left', finish: 'cuff', input: { unit, precision, cuffDepth: `${o.depthMm} mm`, ...available } }
            : { side: 'left', finish: 'hem', input: { unit, precision, hemAllowance: `${o.depthMm} mm`, ...available } };
        const pdf = await renderCutSheet({ ...buildCutSheet({ ...SHOP, language: 'fr' }, [order]), pageSize: o.pageSize });
        expect(crowded(pdf)).toEqual([]);
      }),
      { numRuns: 15, seed: 20261203 },
    );
  });
});
