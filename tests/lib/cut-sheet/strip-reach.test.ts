// The 1:1 strip reaches the cutting line: a strip longer than the guide column goes on in a second
// segment beside the first (or a page of strip), the two overlapping at a "match ▲ A" mark, and
// no page holds only a note. Read from the PDF's text runs (pdf-runs.ts).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { buildCutSheet, type LegOrder } from '@/lib/server/cut-sheet/build';
import { PAGE_PT } from '@/lib/server/cut-sheet/CutSheet';
import { sheetContent } from '@/lib/server/cut-sheet/content';
import { renderCutSheet } from '@/lib/server/cut-sheet/render';
import { GUIDE_COLUMN } from '@/lib/server/cut-sheet/styles';
import type { CutSheetData, PageSize } from '@/lib/shared/cut-sheet-types';
import { textRuns, type TextRun } from './pdf-runs';
import { translator } from '@/lib/server/i18n/catalog';
import { SHOP } from './sheets';

// The strip's words in the sheets' language (SHEET_LANGUAGE=fr runs this file on French sheets).
const t = translator(SHOP.language ?? 'en');

const MM = 72 / 25.4;
const PADDING = 28;

function sheetOf(leg: LegOrder, pageSize: PageSize): CutSheetData {
  return { ...buildCutSheet(SHOP, [leg]), pageSize };
}

// Runs right of the main column on the sheet's page, or anywhere on a page of strip.
function stripRuns(runs: TextRun[], data: CutSheetData): TextRun[] {
  const width = PAGE_PT[data.pageSize ?? 'LETTER'].width;
  return runs.filter((r) => r.page > 1 || r.x0 > width - PADDING - GUIDE_COLUMN);
}

/** Each of the plan's lines as the strip prints it: the run naming it, or a message saying it is missing. */
function linesOnStrip(runs: TextRun[], data: CutSheetData): (TextRun | string)[] {
  const strip = stripRuns(runs, data);
  const group = sheetContent(data).groups[0]!;
  return group.lines.map((l) => {
    // The strip names a line in small letters ("1 finished edge"), the cutting line "CUT".
    const word = l.cut ? t('sheet.guide.short.cut') : l.name.toLowerCase().split(' ')[0]!;
    const i = strip.findIndex((r) => r.text.startsWith(`${l.n} ${word}`) && r.size >= 9);
    const figure = strip[i + 1];
    if (i < 0) return `line ${l.n} ${l.name} is not on the strip`;
    // The name may wrap onto a second run; the distance follows it.
    const next = figure && figure.text !== l.belowMark.text ? strip[i + 2] : figure;
    if (next?.text !== l.belowMark.text || next.size < 9) return `line ${l.n} ${l.name} lacks its distance ${l.belowMark.text}`;
    return strip[i]!;
  });
}

/** Pages holding neither the lines table nor a strip line (with its distance). */
function noteOnlyPages(runs: TextRun[], data: CutSheetData): number[] {
  const pages = new Set(runs.map((r) => r.page));
  const onStrip = linesOnStrip(runs, data).filter((x): x is TextRun => typeof x !== 'string');
  return [...pages].filter((p) => !runs.some((r) => r.page === p && r.text === t('sheet.col.line')) && !onStrip.some((r) => r.page === p));
}

/** Pages with strip lines but not the caption that says where to lay the strip. */
function uncaptionedStrips(runs: TextRun[], data: CutSheetData): number[] {
  const onStrip = linesOnStrip(runs, data).filter((x): x is TextRun => typeof x !== 'string');
  const pages = new Set(onStrip.map((r) => r.page));
  return [...pages].filter(
    (p) =>
      !runs.some(
        (r) =>
          r.page === p &&
          (r.text.startsWith(t('sheet.guide.top').split(' ').slice(0, 3).join(' ')) ||
            r.text.startsWith(t('sheet.guide.onMatch', { letter: '' }).trim().split(' ')[0]!)),
      ),
  );
}

const cases: [string, LegOrder, PageSize][] = [
  // Cuff lines at 0, d, 2d and 3d below the mark (TRADE.md).
  ['a 2 1/4 in cuff on Letter', { side: 'left', finish: 'cuff', input: { unit: 'in', precision: 8, cuffDepth: '2 1/4', available: 9 } }, 'LETTER'],
  ['a 57 mm cuff on A4', { side: 'left', finish: 'cuff', input: { unit: 'mm', precision: 8, cuffDepth: 57, available: 250 } }, 'A4'],
  ['a 2 3/4 in cuff on A4', { side: 'left', finish: 'cuff', input: { unit: 'in', precision: 8, cuffDepth: '2 3/4', available: 10 } }, 'A4'],
  ['a 7 in hem on Letter', { side: 'left', finish: 'hem', input: { unit: 'in', precision: 8, hemAllowance: 7, available: 9 } }, 'LETTER'],
];

describe('the strip reaches the cutting line', () => {
  for (const [name, leg, paper] of cases) {
    it(`${name}: every chalk line, CUT included, on a strip with its distance, 9 pt or more`, async () => {
      const data = sheetOf(leg, paper);
      const runs = textRuns(await renderCutSheet(data));
      expect(linesOnStrip(runs, data).filter((x) => typeof x === 'string')).toEqual([]);
      expect(runs.filter((r) => r.text.startsWith('Past the paper'))).toEqual([]);
    });

    it(`${name}: no page holds only a note, and each strip stands under its caption`, async () => {
      const data = sheetOf(leg, paper);
      const runs = textRuns(await renderCutSheet(data));
      expect(noteOnlyPages(runs, data)).toEqual([]);
      expect(uncaptionedStrips(runs, data)).toEqual([]);
    });

    it(`${name}: 1:1 on both segments, lined up by the match mark`, async () => {
      const data = sheetOf(leg, paper);
      const runs = textRuns(await renderCutSheet(data));
      const lines = linesOnStrip(runs, data) as TextRun[];
      const first = lines[0]!;
      const cut = lines.at(-1)!;
      const marks = runs.filter((r) => r.text === t('sheet.guide.match', { letter: 'A' }));
      expect(marks).toHaveLength(2);
      // The upper segment's mark in the column of line 1, the lower one's in the column of CUT.
      const upper = marks.find((m) => m.page === first.page && Math.abs(m.x0 - first.x0) < 1)!;
      const lower = marks.find((m) => m.page === cut.page && Math.abs(m.x0 - cut.x0) < 1 && m !== upper)!;
      expect(upper).toBeDefined();
      expect(lower).toBeDefined();
      // Down the upper segment from line 1 to the mark, then down the lower one from the mark to
      // CUT: together the cutting line's own distance below the pin mark, in points (1 in = 72 pt).
      const down = first.y - upper.y + (lower.y - cut.y);
      const cutMm = sheetContent(data).groups[0]!.lines.at(-1)!.belowMark.mm;
      expect(down).toBeCloseTo(cutMm * MM, 1);
    });
  }

  it('over generated usual cuff depths and hem allowances on both papers: every line on a strip, no page only a note', async () => {
    // The engine's usual ranges (src/lib/allowance/defaults.ts, from TRADE.md): cuffs 1 to 2 1/4 in
    // or 25 to 57 mm, hems 1 1/4 to 2 in or 32 to 51 mm.
    const leg = fc.oneof(
      fc
        .integer({ min: 8, max: 18 })
        .map((k): LegOrder => ({ side: 'left', finish: 'cuff', input: { unit: 'in', precision: 8, cuffDepth: `${k}/8`, available: 12 } })),
      fc
        .integer({ min: 25, max: 57 })
        .map((d): LegOrder => ({ side: 'left', finish: 'cuff', input: { unit: 'mm', precision: 8, cuffDepth: d, available: 300 } })),
      fc
        .integer({ min: 10, max: 16 })
        .map((k): LegOrder => ({ side: 'left', finish: 'hem', input: { unit: 'in', precision: 8, hemAllowance: `${k}/8`, available: 5 } })),
      fc
        .integer({ min: 32, max: 51 })
        .map((d): LegOrder => ({ side: 'left', finish: 'hem', input: { unit: 'mm', precision: 8, hemAllowance: d, available: 120 } })),
    );
    await fc.assert(
      fc.asyncProperty(leg, fc.constantFrom<PageSize>('LETTER', 'A4'), async (l, paper) => {
        const data = sheetOf(l, paper);
        const runs = textRuns(await renderCutSheet(data));
        expect(linesOnStrip(runs, data).filter((x) => typeof x === 'string')).toEqual([]);
        expect(noteOnlyPages(runs, data)).toEqual([]);
        expect(uncaptionedStrips(runs, data)).toEqual([]);
      }),
      { numRuns: 30 },
    );
  });
});
