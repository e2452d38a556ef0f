// Everything a person reads at the bench is set at 9 pt or more: strip labels, the drawing's
// scale note and line numbers, column headings, cautions, the QR code's caption. Read from the
// PDF's own text runs (pdf-runs.ts), over sheets of every kind and the batch's last page.
import { describe, expect, it } from 'vitest';
import { buildCutSheet, type LegOrder } from '@/lib/server/cut-sheet/build';
import { renderCutSheet, renderCutSheets } from '@/lib/server/cut-sheet/render';
import { textRuns } from './pdf-runs';
import { busyLegs, cuffInch, cuffMetric, hemSloped, sheet, UNSAVED } from './sheets';

// Common practice (no source): 9 pt is about the least a person reads comfortably at arm's length.
const LEAST_PT = 9;

function small(pdf: Uint8Array): string[] {
  return textRuns(pdf)
    .filter((r) => r.size < LEAST_PT - 1e-6)
    .map((r) => `${r.size} pt: ${r.text}`);
}

const twoLegs: LegOrder[] = [
  { side: 'left', finish: 'cuff', input: { unit: 'mm', cuffDepth: 40, available: 150 } },
  { side: 'right', finish: 'hem', input: { unit: 'mm', available: 90 } },
];

describe('no text under 9 pt', () => {
  for (const [name, data] of [
    ['a saved inch cuff', sheet([cuffInch])],
    ['an unsaved metric cuff', buildCutSheet(UNSAVED, [cuffMetric])],
    ['a sloped plain hem', sheet([hemSloped])],
    ['the fullest sheet, two strips side by side', sheet(busyLegs)],
    ['two legs finished differently, A4', { ...sheet(twoLegs), pageSize: 'A4' as const }],
  ] as const) {
    it(name, async () => {
      expect(small(await renderCutSheet(data))).toEqual([]);
    });
  }

  it("a batch's page of garments left out", async () => {
    expect(small(await renderCutSheets([sheet([cuffInch])], ['PH 7 Grey chinos: no fitting measurements yet']))).toEqual([]);
  });
});
