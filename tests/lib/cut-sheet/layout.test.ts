// The sheet as laid out: no two runs of text on one line closer than 2 pt (two columns of figures
// must never read as one number, "0 mm120.5 mm"), over generated sheets in every unit and
// precision, from everyday cuffs to the longest figures the engine takes. Runs are read from
// the PDF's content streams (pdf-runs.ts): word boxes cannot tell a space from a gap between runs.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Unit } from '@/lib/allowance/types';
import { buildCutSheet, type LegOrder } from '@/lib/server/cut-sheet/build';
import { renderCutSheet } from '@/lib/server/cut-sheet/render';
import { crowdedRuns, textRuns } from './pdf-runs';
import { SHOP } from './sheets';

const scales: [Unit, 8 | 16 | 32][] = [
  ['in', 8],
  ['in', 16],
  ['in', 32],
  ['cm', 8],
  ['mm', 8],
];

const leg = fc.record({
  scale: fc.constantFrom(...scales),
  finish: fc.constantFrom('cuff', 'hem'),
  depthMm: fc.integer({ min: 200, max: 700 }).map((k) => k / 10),
  // Cloth below the mark up to the engine's 200 in limit: the widest figures a table can hold.
  availableMm: fc.option(
    fc.oneof(fc.integer({ min: 0, max: 3000 }), fc.integer({ min: 0, max: 50800 })).map((k) => k / 10),
    { nil: undefined },
  ),
  pageSize: fc.constantFrom<'LETTER' | 'A4'>('LETTER', 'A4'),
});

function order(o: typeof leg extends fc.Arbitrary<infer T> ? T : never): LegOrder {
  const [unit, precision] = o.scale;
  const available = o.availableMm === undefined ? {} : { available: `${o.availableMm} mm` };
  return o.finish === 'cuff'
    ? { side: 'left', finish: 'cuff', input: { unit, precision, cuffDepth: `${o.depthMm} mm`, ...available } }
    : { side: 'left', finish: 'hem', input: { unit, precision, hemAllowance: `${o.depthMm} mm`, ...available } };
}

function describeCrowded(pdf: Uint8Array): string[] {
  return crowdedRuns(textRuns(pdf), 2).map(([a, b, gap]) => `"${a.text}" and "${b.text}" ${gap.toFixed(2)} pt apart (page ${a.page})`);
}

describe('no two runs of text touch on a line', () => {
  for (const [unit, precision] of scales) {
    it(`a 1 1/2 in cuff with 4 3/4 in of cloth printed in ${unit}${unit === 'in' ? ` to 1/${precision}` : ''}`, async () => {
      // The case from the shop: "0 cm12.05 cm", "0 mm120.5 mm" on the metric sheets.
      const pdf = await renderCutSheet(
        buildCutSheet(SHOP, [{ side: 'left', finish: 'cuff', input: { unit, precision, cuffDepth: '1 1/2 in', available: '4 3/4 in' } }]),
      );
      expect(describeCrowded(pdf)).toEqual([]);
    });
  }

  it('a 20 mm cuff with 3228.6 mm of cloth on Letter: the leg drawing scales past 1:16 and stays off the steps', async () => {
    const pdf = await renderCutSheet({
      ...buildCutSheet(SHOP, [order({ scale: ['in', 8], finish: 'cuff', depthMm: 20, availableMm: 3228.6, pageSize: 'LETTER' })]),
      pageSize: 'LETTER',
    });
    expect(describeCrowded(pdf)).toEqual([]);
  });

  it('over generated sheets: cuffs and hems, every unit and precision, both papers, figures up to 200 in', async () => {
    await fc.assert(
      fc.asyncProperty(leg, async (o) => {
        const pdf = await renderCutSheet({ ...buildCutSheet(SHOP, [order(o)]), pageSize: o.pageSize });
        expect(describeCrowded(pdf)).toEqual([]);
      }),
      // A fixed seed keeps CI steady; the case a random run found is kept as its own example below.
      { numRuns: 25, seed: 20261203 },
    );
  });
});
