// The printed sleeve sheet, a kind's sheet in the shared frame: drawn to PDF and read back with poppler. It carries the chalk lines from
// the present edge, the cut in words, the sums, the buttons' moves, the vent, the lining, the bench
// steps with the engine's advice, the cautions and the 1:1 strip; it fits one page in every unit,
// on both papers and in French, with no two runs of text touching and every font embedded.
import { describe, expect, it } from 'vitest';
import type { SleeveInput } from '@/lib/allowance';
import type { SheetHeader } from '@/lib/server/cut-sheet/build';
import { sheetStripColumns } from '@/lib/server/cut-sheet/CutSheet';
import { renderCutSheet } from '@/lib/server/cut-sheet/render';
import type { CutSheetData } from '@/lib/shared/cut-sheet-types';
import { SLEEVE_ADAPTER } from '@/lib/shared/fitting/sleeve-fitting';
import { crowdedRuns, textRuns } from './pdf-runs';
import { flatText, fonts, pageInfo, pdfFile } from './poppler';
import { SHOP } from './sheets';

const JACKET = { ...SHOP, garment: 'Charcoal wool jacket' };

/** A sleeve sheet as a saved garment's is built: the fields as typed through the kind's adapter, in the input's unit. */
function buildSleeveSheet(header: SheetHeader, input: SleeveInput): CutSheetData {
  const { unit, precision = 16, ...typed } = input;
  const texts = Object.fromEntries(Object.entries(typed).map(([k, v]) => [k, String(v)]));
  return { ...header, unit, precision, legs: [], kindSheet: { kind: 'sleeves', plan: SLEEVE_ADAPTER.plan(texts, unit, precision) } };
}

// 1 in off at the cuff of a sleeve with four buttons on decorative buttonholes and a 4 1/2 in vent;
// hem, buttons and margin as the engine's defaults (kind-defaults.ts, common practice (no source)).
const DECORATIVE: SleeveInput = { unit: 'in', precision: 8, shortenBy: '1', buttonholes: 'decorative', ventLength: '4 1/2' };

describe('the printed sleeve sheet', () => {
  it('prints the chalk lines, the cut, the sums, the buttons, the vent, the lining, the steps, the cautions and the strip', async () => {
    const file = pdfFile(await renderCutSheet(buildSleeveSheet(JACKET, DECORATIVE)));
    const text = flatText(file);
    for (const words of [
      'Charcoal wool jacket',
      'Distances are measured from the sleeve',
      'Shortened 1 in at the cuff, hem 1 1/2 in deep',
      '1 New finished edge',
      '1 in above',
      '2 CUT · Cutting line',
      '1/2 in below',
      // docs/KINDS.md (derived): cut h below the new edge, s above the present one.
      'Cut 1 1/2 in below the new edge: 1 1/2 in − 1 in = 1/2 in below the present edge',
      'BUTTONS: 4, 5/8 in apart',
      '3 Button 1',
      'now + move up = new centre',
      'Vent: 4 1/2 in now − 1 in = 3 1/2 in after (its top stays).',
      'Lining: shorten it 1 in, as the sleeve',
      'Check: The shortened vent is 1/8 in too short for the buttons',
      'Unpick the vent',
      'The buttonholes are decorative: stitch them again 1 in higher.',
      'Sew the 4 buttons back 1 in higher each',
      'fell it to the hem by hand',
      'Iron and steam burn',
      'Shears, blades, seam rippers',
      'Needles and pins',
      "Your shop's own practice",
      'CHALK GUIDE 1:1',
      '▼ top on the top button',
      '▶ present edge',
      '6 button 4',
    ])
      expect(text).toContain(words);
    expect(fonts(file).every((f) => f.embedded)).toBe(true);
  });

  it('lays the 1:1 strip from the top button’s new centre: 1 in = 72 pt', () => {
    const [strip] = sheetStripColumns(buildSleeveSheet(JACKET, DECORATIVE)).column;
    // New centres above the present edge: 4 1/8, 3 1/2, 2 7/8, 2 1/4; new edge 1; present edge 0; cut −1/2 (arithmetic).
    expect(strip!.segment.ticks.map((t) => [t.name, Math.round(t.y * 1000) / 1000])).toEqual([
      ['button 4', 0],
      ['button 3', 45],
      ['button 2', 90],
      ['button 1', 135],
      ['new edge', 225],
      ['present edge', 297],
      ['CUT', 333],
    ]);
  });

  it('from the shoulder: the seam lines, the lining at the head and the steps to set the sleeve in again', async () => {
    const text = flatText(pdfFile(await renderCutSheet(buildSleeveSheet(JACKET, { unit: 'mm', shortenBy: 25, buttonholes: 'working', liningFoldNow: 20 }))));
    for (const words of [
      'Shortened 25 mm from the shoulder',
      'FROM THE SEAM LINE NOW',
      '1 Sleeve head',
      '25 mm below',
      'Working (cut) buttonholes cannot be moved',
      // Lining (docs/KINDS.md, derived): 25 + (12 − 20) − 0 = 17 mm lower at the head.
      'Lining: lower its head 17 mm: 25 mm + (12 mm − 20 mm) fold − (12 mm − 12 mm) pleat = 17 mm.',
      'take the sleeve out',
      '▶ seam now',
      '2 lining seam',
    ])
      expect(text).toContain(words);
  });

  it('draws each line once after a sheet whose lines came in another order (a shared React root once printed a moved row twice)', async () => {
    // The shoulder's table (0, 1) then the cuff's (1, 0, 2); each document's tree is made afresh now (pdf-node-tree.ts).
    await renderCutSheet(buildSleeveSheet(JACKET, { unit: 'mm', shortenBy: 25, buttonholes: 'working' }));
    const text = flatText(pdfFile(await renderCutSheet(buildSleeveSheet(JACKET, DECORATIVE))));
    expect(text.split('2 CUT · Cutting line').length - 1).toBe(1);
    expect(text.split('1 New finished edge').length - 1).toBe(1);
  });

  it('fits one page without two runs of text touching: inches to 1/8 and 1/16, mm, both papers, French', async () => {
    const inputs: SleeveInput[] = [
      DECORATIVE,
      { unit: 'in', precision: 16, shortenBy: '1 5/16', buttonholes: 'none', ventLength: 5, liningFoldNow: '3/8', liningPleatNow: '1/4' },
      { unit: 'mm', shortenBy: 30, buttonholes: 'none', ventLength: 100, bottomButtonAboveEdge: 30, buttonSpacing: 20 },
      { unit: 'cm', shortenBy: '2.5', buttonholes: 'working', workingButtonholeSlack: '3 cm', buttons: 3 },
    ];
    for (const input of inputs)
      for (const pageSize of ['LETTER', 'A4'] as const)
        for (const language of ['en', 'fr'] as const) {
          const pdf = await renderCutSheet(buildSleeveSheet({ ...JACKET, pageSize, language }, input));
          const where = `${input.unit} ${input.shortenBy} ${pageSize} ${language}`;
          expect(pageInfo(pdfFile(pdf)).pages, where).toBe(1);
          expect(crowdedRuns(textRuns(pdf), 2).map(([a, b]) => `${where}: ${a.text} | ${b.text}`)).toEqual([]);
        }
  });
});
