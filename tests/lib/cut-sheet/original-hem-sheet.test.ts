// Jeans kept on their factory hem, on the cut sheet: every figure of the block adds up as printed
// (shorten = cut away + 2 × seam allowance; each line from the three printed figures; from the pin
// mark and above the present edge sum to the shortening), in every unit and precision; the PDF
// carries the lines, both cuts, the sum, the steps, the cautions and the 1:1 strip from the join,
// with no two runs of text touching.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseLength } from '@/lib/allowance';
import type { Unit } from '@/lib/allowance/types';
import { buildCutSheet, type LegOrder } from '@/lib/server/cut-sheet/build';
import { sheetContent } from '@/lib/server/cut-sheet/content';
import { sheetStripColumns } from '@/lib/server/cut-sheet/CutSheet';
import { TICK_LABEL } from '@/lib/server/cut-sheet/chalk-guide';
import { renderCutSheet } from '@/lib/server/cut-sheet/render';
import { crowdedRuns, textRuns } from './pdf-runs';
import { flatText, pdfFile } from './poppler';
import { SHOP } from './sheets';

const scale = fc.constantFrom<[Unit, 8 | 16 | 32]>(['in', 8], ['in', 16], ['in', 32], ['cm', 8], ['mm', 8]);

// Typed in mm or inches whatever the sheet's unit (a fitting in one unit printed in another).
const length = (inchSixtyFourths: [number, number], mmTenths: [number, number]) =>
  fc.oneof(
    fc.integer({ min: inchSixtyFourths[0], max: inchSixtyFourths[1] }).map((k) => `${k}/64 in`),
    fc.integer({ min: mmTenths[0], max: mmTenths[1] }).map((k) => `${k / 10} mm`),
  );

const jeans = fc.record({
  scale,
  shortenBy: length([8, 640], [20, 1600]),
  factoryHem: length([16, 96], [50, 250]),
  seamAllowance: fc.option(length([8, 48], [30, 120]), { nil: undefined }),
});

function order(o: typeof jeans extends fc.Arbitrary<infer T> ? T : never): LegOrder {
  const [unit, precision] = o.scale;
  const { scale: _s, seamAllowance, ...rest } = o;
  return { side: 'left', finish: 'original', input: { unit, precision, ...rest, ...(seamAllowance ? { seamAllowance } : {}) } };
}

/** A printed length read back as a whole number of half steps (the fold and a side's share may take a half). */
function halfSteps(text: string, unit: Unit, precision: number): number {
  const step = unit === 'in' ? 25.4 / Math.min(32, precision * 2) : 0.5;
  const n = parseLength(text.replace(/^-/, ''), unit).mm / step;
  expect(Math.abs(n - Math.round(n)), `${text} is a whole number of half steps`).toBeLessThan(1e-6);
  return Math.round(n) * (text.startsWith('-') ? -1 : 1);
}

describe('a kept factory hem adds up as printed', () => {
  it('shorten = cut away + 2 × seam allowance, every line from the printed figures, from the mark + above the edge = shorten', () => {
    fc.assert(
      fc.property(jeans, (o) => {
        const [unit, precision] = o.scale;
        const g = sheetContent(buildCutSheet(SHOP, [order(o)])).groups[0]!;
        const pp = g.original!.printed;
        const n = (t: string) => halfSteps(t, unit, precision);
        const [s, h, a] = [n(pp.shortenBy.text), n(pp.factoryHem.text), n(pp.seamAllowance.text)];
        expect(n(pp.seamTakes.text)).toBe(2 * a);
        const at = Object.fromEntries(pp.lines.map((l) => [l.name, n(l.belowMark.text)]));
        expect(at.join).toBe(-h);
        expect(at['band-top']).toBe(s - h);
        expect(at['present-edge']).toBe(s);
        if (pp.method === 'cut-and-join') {
          expect(n(pp.removed.text)).toBe(s - 2 * a);
          expect(at['leg-cut']).toBe(at.join! + a);
          expect(at['band-cut']).toBe(at['band-top']! - a);
          // The cloth between the two cuts is what the sum says is cut away.
          expect(at['band-cut']! - at['leg-cut']!).toBe(n(pp.removed.text));
          expect(g.original!.sum).toContain(`${pp.shortenBy.text} = ${pp.removed.text} cut away`);
        } else {
          expect(s).toBeLessThan(2 * a);
          expect(pp.lines.some((l) => l.cut)).toBe(false);
        }
        for (const l of pp.lines) expect(n(l.belowMark.text) + n(l.abovePresentEdge.text)).toBe(s);
        // The strip's 0 is the join: each tick is the line's distance below it, the pin mark at h.
        for (const tick of g.original!.strip) expect(tick.belowMark.mm).toBeGreaterThanOrEqual(0);
      }),
      { numRuns: 300 },
    );
  });
});

// Check values worked by hand from the method (docs/KINDS.md, derived): 2 in off, factory hem 5/8,
// seam allowance 3/8 (the engine's default, common practice (no source)): join 5/8 above the mark,
// leg cut 1/4 above, band cut 2 − 5/8 − 3/8 = 1 below, band top 1 3/8 below, edge 2 below; cut away
// 2 − 2 × 3/8 = 1 1/4.
const JEANS: LegOrder = {
  side: 'left',
  finish: 'original',
  input: { unit: 'in', precision: 8, shortenBy: '2', factoryHem: '5/8', widthAtEdge: '8', widthAbove: '9', heightAbove: '10' },
};

describe('the printed sheet of jeans kept on their factory hem', () => {
  it('prints the chalk lines from the pin mark, both cuts, the seam allowance taken twice, the steps and the cautions', async () => {
    const pdf = await renderCutSheet(buildCutSheet({ ...SHOP, garment: 'Indigo jeans' }, [JEANS]));
    const text = flatText(pdfFile(pdf));
    for (const words of [
      'Original hem kept, factory hem 5/8 in deep',
      'Join (the new seam)',
      '5/8 in above',
      'CUT · Cut the leg',
      '1/4 in above',
      'CUT · Cut off the hem band',
      '1 in below',
      '1 3/8 in below',
      'Shorten by 2 in = 1 1/4 in cut away + the seam allowance taken twice (2 × 3/8 in = 3/4 in).',
      // Taper (derived, docs/KINDS.md): slope (9 − 8)/10 over the 2 in shortened = 1/5 in, beyond the
      // 1/8 in tolerance (TRADE.md); each side 1/10 in printed to the nearest 1/16 = 1/8, the seam twice that.
      'the leg and the band top differ by 1/4 in flat',
      'take the leg in 1/4 in at each seam (1/8 in each side)',
      'stitch 3/8 in from the edge',
      'Iron and steam burn',
      'Shears, blades, seam rippers',
      'Needles and pins',
      'a denim needle',
      "Your shop's own practice",
      '0 on the join, 5/8 in above the pin mark',
      '▼ top on the join',
      '▶ pin mark',
    ])
      expect(text).toContain(words);
  });

  it('lays out without two runs of text touching, in every unit, both papers, left and right legs apart', async () => {
    const other: LegOrder = { ...JEANS, side: 'right', input: { unit: 'in', precision: 8, shortenBy: '5/8', factoryHem: '1/2' } };
    for (const [unit, precision] of [
      ['in', 16],
      ['cm', 8],
      ['mm', 8],
    ] as const)
      for (const pageSize of ['LETTER', 'A4'] as const) {
        const legs: LegOrder[] = [
          { ...JEANS, input: { ...JEANS.input, unit, precision } },
          { ...other, input: { ...other.input, unit, precision } },
        ];
        const pdf = await renderCutSheet(buildCutSheet({ ...SHOP, pageSize }, legs));
        expect(crowdedRuns(textRuns(pdf), 2).map(([a, b]) => `${a.text} | ${b.text}`)).toEqual([]);
      }
  });

  it('lays the 1:1 strip from the join: labels of close lines one below the other, a bar through a label set on white', () => {
    const [strip] = sheetStripColumns(buildCutSheet(SHOP, [JEANS])).column;
    const ticks = strip!.segment.ticks;
    // 1 in = 72 pt: the join at 0, the leg cut 3/8 in = 27 pt below it, the pin mark 5/8 in = 45 pt.
    expect(ticks.map((t) => [t.name, Math.round(t.y * 1000) / 1000])).toEqual([
      ['join', 0],
      ['CUT leg', 27],
      ['pin mark', 45],
      ['CUT band', 117],
      ['band top', 144],
      ['present edge', 189],
    ]);
    for (let k = 1; k < ticks.length; k++) expect(ticks[k]!.labelY).toBeGreaterThanOrEqual(ticks[k - 1]!.labelY + TICK_LABEL - 1);
    expect(ticks.filter((t) => t.crossed).map((t) => t.name)).toEqual(['CUT leg']);
  });

  it('folds instead of cutting when less than twice the seam allowance comes off', () => {
    // 5/8 in off with a 3/8 in seam allowance: under 3/4, so fold (docs/KINDS.md, derived).
    const g = sheetContent(buildCutSheet(SHOP, [{ ...JEANS, input: { unit: 'in', precision: 8, shortenBy: '5/8', factoryHem: '1/2' } }])).groups[0]!;
    expect(g.original!.printed.method).toBe('fold-only');
    expect(g.lines.map((l) => l.name)).toEqual(['Join (the new seam)', 'Fold', 'Top of the factory hem’s stitching', 'Present edge']);
    // Fold half-way between the join (1/2 above) and the band top (1/8 below): 3/16 above the mark.
    expect(g.lines[1]!.belowMark.text).toBe('-3/16 in');
  });
});
