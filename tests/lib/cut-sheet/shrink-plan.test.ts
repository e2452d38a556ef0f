// Unwashed cloth on a plain or sloped hem makes ONE set of lines: the hem plan itself has its
// finished edge the printed shrink allowance below the pin mark and the unwashed hem allowance, so
// its chalk lines, cloth check, taper check and 1:1 strip are the shrink figures, and the sheet's
// shrink lines explain them (a sheet printing the plain plan's cut above the shrink cut leaves the
// trousers short after the wash). The garment page's live plan is asked through the same function.
// Figures: raw denim 10 % (SHRINKAGE_PERCENT, from memory: the top of the 7–10 % range); the rule
// is derived (a length shrinking by p ends at L when made L/(1 − p): docs/KINDS.md); 1 in = 72 pt
// (PostScript point, TRADE.md).
import { describe, expect, it } from 'vitest';
import { planHem } from '@/lib/allowance';
import type { HemInput } from '@/lib/allowance/types';
import { buildCutSheet } from '@/lib/server/cut-sheet/build';
import { guideStrips } from '@/lib/server/cut-sheet/chalk-guide';
import { legGeometry } from '@/lib/server/cut-sheet/leg-geometry';
import { sheetContent, type SheetLegGroup } from '@/lib/server/cut-sheet/content';
import { savedLegOrder, type StoredLeg } from '@/lib/server/fitting/saved-leg';
import { legHemTaperRequest, legMainRequest } from '@/lib/shared/leg-plan';
import { blankLeg, type LegValues } from '@/lib/shared/measurement-request';
import { SHOP } from './sheets';

// Invented pair of raw jeans: a 30 in inseam pinned at 31 1/2 in, 1 1/2 in hem.
const RAW = { backPin: '31 1/2', hemAllowance: '1 1/2', shrinkCloth: 'raw-denim', lengthToMark: '30' };

function stored(values: Record<string, string>, finish: StoredLeg['finish'] = 'plain'): StoredLeg {
  return { leg: 'left', unit: 'in', finish, values: Object.fromEntries(Object.entries(values).map(([k, v]) => [k, { text: v }])) };
}

function groupOf(values: Record<string, string>, finish: StoredLeg['finish'] = 'plain'): SheetLegGroup {
  const order = savedLegOrder(stored(values, finish), 'in', 8)!;
  return sheetContent(buildCutSheet(SHOP, [order])).groups[0]!;
}

// Every line the block prints (title, lines, cloth, shrink lines, taper, warnings), as one text.
function printedWords(g: SheetLegGroup): string {
  const lines = g.lines.map((l) => `${l.n} ${l.name} ${l.belowMark.text} ${l.aboveRawEdge?.text ?? ''}`);
  return [g.title, ...lines, g.cloth.text, ...(g.shrink ?? []), g.slopeNote ?? '', g.taper?.summary ?? '', g.taper?.work ?? '', ...g.warnings].join('\n');
}

describe('raw denim on a plain hem: the plan is the shrink plan', () => {
  it('chalks the finished edge 3 3/8 in and cuts 5 1/8 in below the pin mark, a 1 3/4 in hem; no 1 1/2 in cut anywhere', () => {
    // By hand (eighths): 30 × 0.1/0.9 = 3.33 → 3 3/8 up; 1 1/2/0.9 = 1.67 → 1 3/4 up; 3 3/8 + 1 3/4 = 5 1/8.
    const g = groupOf({ ...RAW, available: '6' });
    expect(g.title).toBe('Plain hem, 1 3/4 in allowance');
    expect(g.lines.map((l) => [l.n, l.belowMark.text])).toEqual([
      [1, '3 3/8 in'],
      [2, '5 1/8 in'],
    ]);
    // 6 in of cloth below the mark: 6 − 3 3/8 = 2 5/8 above the raw edge at line 1, 6 − 5 1/8 = 7/8 at the cut.
    expect(g.lines.map((l) => l.aboveRawEdge?.text)).toEqual(['2 5/8 in', '7/8 in']);
    expect(g.cloth.text).toBe('Cloth check: needs 5 1/8 in below the pin mark, has 6 in, 7/8 in to spare.');
    // The shrink lines explain the plan's own lines, with the same figures.
    expect(g.shrink).toContain('Pin mark 31 1/2 in + shrink allowance 3 3/8 in = finished edge (line 1) chalked at 34 7/8 in.');
    expect(g.shrink).toContain('Finished edge 34 7/8 in + unwashed hem allowance 1 3/4 in = cut (line 2) at 36 5/8 in, 5 1/8 in below the pin mark.');
    const words = printedWords(g);
    expect(words).not.toMatch(/replace/);
    // The plain plan's figures (edge at the mark, cut 1 1/2 in below it) print nowhere.
    expect(words).not.toMatch(/(^|\D)1 1\/2 in/);
    expect(g.lines.some((l) => l.belowMark.mm === 0)).toBe(false);
  });

  it('puts the 1:1 strip’s cut mark 5 1/8 in below its top (the pin mark), the edge mark 3 3/8 in', () => {
    const g = groupOf({ ...RAW, available: '6' });
    const [strip] = guideStrips([g], 'in', 10_000);
    const ticks = strip!.segments.flatMap((s) => s.ticks.map((t) => ({ ...t, y: t.y + s.from })));
    // 1 in = 72 pt: 3 3/8 in = 243 pt, 5 1/8 in = 369 pt.
    expect(ticks.map((t) => [t.cut, t.text, Math.round(t.y * 1000) / 1000])).toEqual([
      [false, '3 3/8 in', 243],
      [true, '5 1/8 in', 369],
    ]);
  });

  it('draws the leg ending at the raw edge 6 in below the mark, not 6 in below the lowered edge', () => {
    const leg = buildCutSheet(SHOP, [savedLegOrder(stored({ ...RAW, available: '6' }), 'in', 8)!]).legs[0]!;
    if (leg.finish !== 'hem') throw new Error('a plain hem');
    const g = legGeometry(leg, 200, 400);
    const [edge, cut] = g.lines.map((l) => l.y) as [number, number];
    const rawY = g.outline[1]![1];
    // Raw edge to line 1 over line 1 to line 2: (6 − 3 3/8) / 1 3/4 = 1.5 (plain arithmetic).
    expect((rawY - edge) / (cut - edge)).toBeCloseTo(1.5, 9);
  });

  it('warns NOT ENOUGH CLOTH when the cloth covers the plain cut (1 1/2 in) but not the shrink cut (5 1/8 in)', () => {
    // 4 in below the mark: a plain 1 1/2 in hem would fit with 2 1/2 in to spare; the shrink cut
    // needs 5 1/8 in: short by 1 1/8 in (by hand). What fits below the lowered edge: 4 − 3 3/8 = 5/8 in.
    const plain = groupOf({ backPin: '31 1/2', hemAllowance: '1 1/2', available: '4' });
    expect(plain.cloth.ok).toBe(true);
    const g = groupOf({ ...RAW, available: '4' });
    expect(g.cloth.ok).toBe(false);
    expect(g.cloth.text).toBe('NOT ENOUGH CLOTH: do not cut. Needs 5 1/8 in below the pin mark, has 4 in. Short by 1 1/8 in.');
    const order = savedLegOrder(stored({ ...RAW, available: '4' }), 'in', 8)!;
    const plan = planHem(order.input as HemInput);
    expect(plan.enough).toBe(false);
    expect(plan.shortBy?.text).toBe('1 1/8 in');
    expect(plan.warnings.find((w) => w.code === 'not-enough-cloth')?.message).toBe(
      'Not enough cloth for a 1 3/4 in hem with its finished edge 3 3/8 in below the mark: there is 4 in below the mark, short by 1 1/8 in. A 5/8 in hem is the most that fits; for more, face the hem with a strip of other cloth.',
    );
  });

  it('checks a tapered leg at the lowered edge: the taper followed down 3 3/8 in, the hem 1 3/4 in below it', () => {
    // Invented widths: 8 in flat at the pin mark, 9 in 10 in above: the leg narrows 1/10 in per inch
    // down. At the edge 3 3/8 in lower: 8 − 0.3375 = 7.6625 in; the hem (1 3/4 in) must match the
    // leg 1 3/4 in above the edge: 7.6625 + 0.175 = 7.8375 in; the leg at the cut 7.6625 − 0.175 = 7.4875 in (by hand).
    const g = groupOf({ ...RAW, widthAtEdge: '8', widthAbove: '9', heightAbove: '10' });
    const order = savedLegOrder(stored({ ...RAW, widthAtEdge: '8', widthAbove: '9', heightAbove: '10' }), 'in', 8)!;
    const taper = buildCutSheet(SHOP, [order]).legs[0]!;
    if (taper.finish !== 'hem' || !taper.taper) throw new Error('a plain hem with its taper check');
    expect(taper.taper.input).toMatchObject({ edgeBelowMark: '3 3/8 in', hemAllowance: '1 3/4 in' });
    const [edge, cut] = taper.taper.plan.lines;
    expect(edge!.belowMark.mm).toBeCloseTo(3.375 * 25.4, 9);
    expect(edge!.width.mm).toBeCloseTo(7.6625 * 25.4, 9);
    expect(cut!.belowMark.mm).toBeCloseTo(5.125 * 25.4, 9);
    expect(cut!.width.mm).toBeCloseTo(7.4875 * 25.4, 9);
    expect(taper.taper.plan.targetWidth.mm).toBeCloseTo(7.8375 * 25.4, 9);
    expect(g.taper?.summary).toMatch(/the leg 1 3\/4 in above the edge/);
  });

  it('prewashed cloth (no shrinkage) and a cuff keep the plan as typed', () => {
    const g = groupOf({ ...RAW, shrinkCloth: 'prewashed', available: '6' });
    expect(g.lines.map((l) => l.belowMark.text)).toEqual(['0 in', '1 1/2 in']);
  });
});

describe('the garment page’s live plan asks for the same lines (one function: withShrink)', () => {
  const leg: LegValues = { ...blankLeg('plain'), ...RAW, available: '6', widthAtEdge: '8', widthAbove: '9', heightAbove: '10' };

  it('sends the lowered edge and the unwashed hem; planned, its lines are the sheet’s', () => {
    const request = legMainRequest(leg, 'in', 8)!;
    expect(request).toMatchObject({ kind: 'hem', edgeBelowMark: '3 3/8 in', hemAllowance: '1 3/4 in' });
    const { kind: _k, ...input } = request as HemInput & { kind: string };
    const page = planHem(input as HemInput);
    const sheet = buildCutSheet(SHOP, [savedLegOrder(stored({ ...RAW, available: '6', widthAtEdge: '8', widthAbove: '9', heightAbove: '10' }), 'in', 8)!])
      .legs[0]!;
    expect(page).toEqual(sheet.plan);
  });

  it('asks the taper check (in half steps) at the plan’s own edge and hem, rounded at the plan’s eighths', () => {
    expect(legHemTaperRequest(leg, 'in', 16, { planPrecision: 8 })).toMatchObject({ precision: 16, edgeBelowMark: '3 3/8 in', hemAllowance: '1 3/4 in' });
  });
});
