// The sheet adds up as printed: for every plan, each figure read back from the sheet's words is a
// whole number of display steps, each chalk line is the printed sections above it added up, the
// cloth check's spare is has − needs, a seam's work is twice each side's, and the cloth check
// rounds to the safe side (needs and short never under the exact figure, spare never over).
// Properties over sheetContent (the strings the PDF prints as they are); examples through the PDF.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseLength } from '@/lib/allowance';
import type { Unit } from '@/lib/allowance/types';
import { buildCutSheet, type LegOrder } from '@/lib/server/cut-sheet/build';
import { sheetContent, type SheetLegGroup } from '@/lib/server/cut-sheet/content';
import { renderCutSheet } from '@/lib/server/cut-sheet/render';
import { savedLegOrder } from '@/lib/server/fitting/saved-leg';
import { flatText, layoutText, pdfFile } from './poppler';
import { SHOP } from './sheets';

const LEN = String.raw`-?(?:\d+(?:\.\d+)?(?: \d+/\d+)?|\d+/\d+) (?:in|cm|mm)`;

/** The display step of a sheet in mm (1/8 or 1/16 in; 0.5 mm for cm and mm). */
function stepMm(unit: Unit, precision: number): number {
  return unit === 'in' ? 25.4 / precision : 0.5;
}

/** A printed length read back as a whole number of steps (fails when it is not one). */
function steps(text: string, unit: Unit, step: number): number {
  const n = parseLength(text.replace(/^-/, ''), unit).mm / step;
  expect(Math.abs(n - Math.round(n)), `${text} is a whole number of steps`).toBeLessThan(1e-6);
  return Math.round(n) * (text.startsWith('-') ? -1 : 1);
}

function grab(text: string, re: RegExp): string[] | null {
  const m = re.exec(text);
  return m ? m.slice(1) : null;
}

// Lengths typed in either unit, whatever the sheet's unit: an inch cuff on a cm sheet is the case in point.
const length = (inchSixtyFourths: [number, number], mmTenths: [number, number]) =>
  fc.oneof(
    fc.integer({ min: inchSixtyFourths[0], max: inchSixtyFourths[1] }).map((k) => `${k}/64 in`),
    fc.integer({ min: mmTenths[0], max: mmTenths[1] }).map((k) => `${k / 10} mm`),
  );

const scale = fc.constantFrom<[Unit, 8 | 16]>(['in', 8], ['in', 16], ['cm', 8], ['mm', 8]);

const cuffOrder = fc.record({
  scale,
  cuffDepth: length([40, 200], [100, 800]),
  hemSection: fc.option(length([40, 200], [100, 800]), { nil: undefined }),
  clothThickness: fc.option(length([0, 8], [0, 30]), { nil: undefined }),
  available: fc.option(length([0, 900], [0, 2300]), { nil: undefined }),
  taper: fc.option(
    fc.record({
      widthAtEdge: length([384, 640], [1000, 1600]),
      widthAbove: length([384, 704], [1000, 1800]),
      heightAbove: length([128, 640], [300, 1600]),
      seamAllowance: fc.option(length([0, 64], [0, 250]), { nil: undefined }),
      tolerance: fc.option(length([0, 16], [0, 40]), { nil: undefined }),
    }),
    { nil: undefined },
  ),
});

const hemOrder = fc.record({
  scale,
  hemAllowance: fc.option(length([40, 400], [100, 1000]), { nil: undefined }),
  slope: fc.option(length([0, 64], [0, 150]), { nil: undefined }),
  available: fc.option(length([0, 500], [0, 1300]), { nil: undefined }),
});

type CuffOrder = typeof cuffOrder extends fc.Arbitrary<infer T> ? T : never;
type HemOrder = typeof hemOrder extends fc.Arbitrary<infer T> ? T : never;

function cuffLeg(o: CuffOrder): LegOrder {
  const [unit, precision] = o.scale;
  const { scale: _s, taper, ...rest } = o;
  return { side: 'left', finish: 'cuff', input: { unit, precision, ...rest }, ...(taper ? { taper } : {}) };
}

function hemLeg(o: HemOrder): LegOrder {
  const [unit, precision] = o.scale;
  const { scale: _s, ...rest } = o;
  return { side: 'left', finish: 'hem', input: { unit, precision, ...rest } };
}

/** The sheet's one group, or null when the engine refuses the plan (widths giving no leg). */
function groupOf(leg: LegOrder): SheetLegGroup | null {
  try {
    return sheetContent(buildCutSheet(SHOP, [leg])).groups[0]!;
  } catch (e) {
    if ((e as Error).name === 'AllowanceError') return null;
    throw e;
  }
}

/** Every figure of a group's lines as steps: below the mark and above the raw edge. */
function lineSteps(g: SheetLegGroup, unit: Unit, step: number) {
  return g.lines.map((l) => ({
    below: steps(l.belowMark.text, unit, step),
    above: l.aboveRawEdge ? steps(l.aboveRawEdge.text, unit, step) : null,
  }));
}

/** The cloth check read back: needs, has and spare or short, each in steps. */
function clothSteps(g: SheetLegGroup, unit: Unit, step: number) {
  const t = g.cloth.text;
  const ok = grab(t, new RegExp(`needs (${LEN}) below the pin mark, has (${LEN}), (${LEN}) to spare\\.`));
  if (ok) return { needs: steps(ok[0]!, unit, step), has: steps(ok[1]!, unit, step), spare: steps(ok[2]!, unit, step), short: null };
  const short = grab(t, new RegExp(`Needs (${LEN}) below the pin mark, has (${LEN})\\. Short by (${LEN})\\.`));
  if (short) return { needs: steps(short[0]!, unit, step), has: steps(short[1]!, unit, step), spare: null, short: steps(short[2]!, unit, step) };
  const none = grab(t, new RegExp(`this plan needs (${LEN}) below the pin mark`));
  expect(none, t).not.toBeNull();
  return { needs: steps(none![0]!, unit, step), has: null, spare: null, short: null };
}

/** Has, needs and spare or short add up, and the raw-edge column is has − each line. */
function expectClothAddsUp(g: SheetLegGroup, unit: Unit, step: number) {
  const lines = lineSteps(g, unit, step);
  const c = clothSteps(g, unit, step);
  expect(c.needs).toBe(lines.at(-1)!.below);
  if (c.has === null) return;
  for (const l of lines) expect(l.above).toBe(c.has - l.below);
  if (c.spare !== null) expect(c.spare).toBe(c.has - c.needs);
  if (c.short !== null) {
    expect(c.short).toBe(c.needs - c.has);
    expect(c.short).toBeGreaterThan(0);
  }
}

/** Needs and short by never print under the exact figure, spare never over it. */
function expectSafeSide(g: SheetLegGroup, unit: Unit, step: number) {
  if (g.leg.finish === 'original') throw new Error('a kept factory hem has no cloth check');
  const p = g.leg.plan;
  const c = clothSteps(g, unit, step);
  const tiny = 1e-6;
  expect(c.needs * step).toBeGreaterThanOrEqual(p.required.mm - tiny);
  if (c.spare !== null) expect(c.spare * step).toBeLessThanOrEqual(p.spare!.mm + tiny);
  if (c.short !== null) expect(c.short * step).toBeGreaterThanOrEqual(p.shortBy!.mm - tiny);
  // The verdict is the engine's: a sheet never says "enough" of a short cloth, nor the reverse.
  if (p.enough !== null) expect(c.spare !== null).toBe(p.enough);
}

describe('every printed cuff adds up as printed', () => {
  it('each chalk line is the printed sections above it: cuff depth (+ turn of cloth), twice, then the third section', () => {
    fc.assert(
      fc.property(cuffOrder, (o) => {
        const g = groupOf(cuffLeg(o));
        if (!g) return;
        const [unit, precision] = o.scale;
        const step = stepMm(unit, precision);
        const d = steps(grab(g.title, new RegExp(`^Cuff, (${LEN}) deep$`))![0]!, unit, step);
        const t = grab(g.sections ?? '', new RegExp(`(${LEN}) turn of cloth at each fold`));
        const m = grab(g.sections ?? '', new RegExp(`third section (${LEN})`));
        const section = d + (t ? steps(t[0]!, unit, step) : 0);
        const third = m ? steps(m[0]!, unit, step) : d;
        expect(lineSteps(g, unit, step).map((l) => l.below)).toEqual([0, section, 2 * section, 2 * section + third]);
      }),
      { numRuns: 300 },
    );
  });

  it('spare = has − needs, short by = needs − has, and the raw-edge column is has − each line', () => {
    fc.assert(
      fc.property(cuffOrder, (o) => {
        const g = groupOf(cuffLeg(o));
        if (g) expectClothAddsUp(g, o.scale[0], stepMm(...o.scale));
      }),
      { numRuns: 300 },
    );
  });

  it('rounds the cloth check to the safe side, and never prints "Short by 0"', () => {
    fc.assert(
      fc.property(cuffOrder, (o) => {
        const g = groupOf(cuffLeg(o));
        if (!g) return;
        expectSafeSide(g, o.scale[0], stepMm(...o.scale));
        expect(g.cloth.text).not.toMatch(/Short by 0 (in|cm|mm)/);
      }),
      { numRuns: 300 },
    );
  });

  it('seam work: per seam = 2 × per side as printed, never "let out 0", never beside "no seam work needed"', () => {
    fc.assert(
      fc.property(
        cuffOrder.filter((o) => o.taper !== undefined),
        (o) => {
          const g = groupOf(cuffLeg(o));
          if (!g?.taper) return;
          const [unit, precision] = o.scale;
          // Each side may go to half the sheet's step in inches (1/16 on a sheet to 1/8).
          const half = stepMm(unit, unit === 'in' ? precision * 2 : precision);
          const words = [g.taper.summary, g.taper.work ?? '', ...g.warnings].join(' ');
          if (/no seam work needed/.test(words)) expect(words).not.toMatch(/let(ting)? out|take in/i);
          const work = g.taper.work ?? '';
          const seams = [...work.matchAll(new RegExp(`(?:let out|take in) (${LEN}) at line \\d`, 'g'))].map((m) => m[1]!);
          if (g.taper.work) expect(seams.length).toBeGreaterThan(0);
          // Each side's share, in the same order, the unit said once at the end.
          const sideList = /each side of the seam: (.*) each side\.$/.exec(work)?.[1] ?? '';
          const unitWord = / (in|cm|mm)$/.exec(sideList)?.[1] ?? unit;
          const sides = sideList ? sideList.replace(/ (in|cm|mm)$/, '').split(', ') : [];
          expect(sides).toHaveLength(seams.length);
          seams.forEach((seam, i) => {
            const perSeam = steps(seam, unit, half);
            expect(perSeam).toBeGreaterThan(0);
            expect(perSeam).toBe(2 * steps(`${sides[i]} ${unitWord}`, unit, half));
          });
          expect(words).not.toMatch(/(let out|take in) 0 (in|cm|mm)/);
        },
      ),
      { numRuns: 300 },
    );
  });
});

describe('every printed plain hem adds up as printed', () => {
  it('the cut is the allowance, the front lines are the back ones less the slope, and the cloth check adds up on the safe side', () => {
    fc.assert(
      fc.property(hemOrder, (o) => {
        const g = groupOf(hemLeg(o))!;
        const [unit, precision] = o.scale;
        const step = stepMm(unit, precision);
        const h = steps(grab(g.title, new RegExp(`^Plain hem, (${LEN}) allowance$`))![0]!, unit, step);
        expect(lineSteps(g, unit, step).map((l) => l.below)).toEqual([0, h]);
        if (g.slopeNote) {
          const [s, edge, edgeWhere, cut, cutWhere] = grab(
            g.slopeNote,
            new RegExp(`(${LEN}) lower at the back\\. At the front chalk the finished edge (${LEN}) (above|below) and the cutting line (${LEN}) (above|below)`),
          )!;
          const signed = (text: string, where: string) => steps(text, unit, step) * (where === 'above' ? -1 : 1);
          expect(signed(edge!, edgeWhere!)).toBe(-steps(s!, unit, step));
          expect(signed(cut!, cutWhere!)).toBe(h - steps(s!, unit, step));
        }
        expectClothAddsUp(g, unit, step);
        expectSafeSide(g, unit, step);
        expect(g.cloth.text).not.toMatch(/Short by 0 (in|cm|mm)/);
      }),
      { numRuns: 300 },
    );
  });
});

// Unwashed cloth on a plain or sloped hem, through the saved leg's order (savedLegOrder: the sheet's
// one way in). Cloth percents: SHRINKAGE_PERCENT (from memory) or the shop's own; rule derived
// (edge L·p/(1 − p), hem H/(1 − p), docs/KINDS.md).
const shrinkOrder = fc.record({
  scale,
  finish: fc.constantFrom<'plain' | 'slope'>('plain', 'slope'),
  cloth: fc.constantFrom('raw-denim', 'preshrunk-denim', 'unwashed-cotton', 'other'),
  percent: fc.integer({ min: 1, max: 150 }).map((k) => String(k / 10)),
  backPin: length([1280, 2560], [5000, 9000]),
  lengthToMark: fc.option(length([1280, 2560], [5000, 9000]), { nil: undefined }),
  hemAllowance: fc.option(length([40, 400], [100, 1000]), { nil: undefined }),
  slope: fc.option(length([0, 64], [0, 150]), { nil: undefined }),
  available: fc.option(length([0, 900], [0, 2300]), { nil: undefined }),
});

type ShrinkOrder = typeof shrinkOrder extends fc.Arbitrary<infer T> ? T : never;

function shrinkLeg(o: ShrinkOrder): LegOrder {
  const [unit, precision] = o.scale;
  const texts: Record<string, string | undefined> = {
    backPin: o.backPin,
    lengthToMark: o.lengthToMark,
    hemAllowance: o.hemAllowance,
    available: o.available,
    slope: o.finish === 'slope' ? o.slope : undefined,
    shrinkCloth: o.cloth,
    shrinkPercent: o.cloth === 'other' ? o.percent : undefined,
  };
  const values = Object.fromEntries(Object.entries(texts).flatMap(([k, v]) => (v === undefined ? [] : [[k, { text: v }]])));
  return savedLegOrder({ leg: 'left', unit, finish: o.finish, values }, unit, precision)!;
}

describe('every printed plain hem on unwashed cloth adds up as printed, its lines the shrink lines', () => {
  it('line 1 is the shrink allowance, line 2 that + the unwashed hem (the title’s), the shrink sums hold, the cloth check adds up on the safe side', () => {
    fc.assert(
      fc.property(shrinkOrder, (o) => {
        const g = groupOf(shrinkLeg(o))!;
        const [unit, precision] = o.scale;
        const step = stepMm(unit, precision);
        const h = steps(grab(g.title, new RegExp(`^Plain hem, (${LEN}) allowance$`))![0]!, unit, step);
        const shrink = (g.shrink ?? []).join(' ');
        const [pin, allowance, edge] = grab(
          shrink,
          new RegExp(`Pin mark (${LEN}) \\+ shrink allowance (${LEN}) = finished edge \\(line 1\\) chalked at (${LEN})\\.`),
        )!;
        const [edge2, hem, cut, cutBelow] = grab(
          shrink,
          new RegExp(`Finished edge (${LEN}) \\+ unwashed hem allowance (${LEN}) = cut \\(line 2\\) at (${LEN}), (${LEN}) below the pin mark\\.`),
        )!;
        const e = steps(allowance!, unit, step);
        expect(steps(pin!, unit, step) + e).toBe(steps(edge!, unit, step));
        expect(edge2).toBe(edge);
        expect(steps(hem!, unit, step)).toBe(h);
        expect(steps(edge!, unit, step) + h).toBe(steps(cut!, unit, step));
        // One set of lines: the plan's are the shrink figures.
        expect(lineSteps(g, unit, step).map((l) => l.below)).toEqual([e, e + h]);
        expect(steps(cutBelow!, unit, step)).toBe(e + h);
        if (g.slopeNote) {
          const [s, fe, feWhere, fc2, fcWhere] = grab(
            g.slopeNote,
            new RegExp(`(${LEN}) lower at the back\\. At the front chalk the finished edge (${LEN}) (above|below) and the cutting line (${LEN}) (above|below)`),
          )!;
          const signed = (text: string, where: string) => steps(text, unit, step) * (where === 'above' ? -1 : 1);
          expect(signed(fe!, feWhere!)).toBe(e - steps(s!, unit, step));
          expect(signed(fc2!, fcWhere!)).toBe(e + h - steps(s!, unit, step));
        }
        expectClothAddsUp(g, unit, step);
        expectSafeSide(g, unit, step);
        expect(g.cloth.text).not.toMatch(/Short by 0 (in|cm|mm)/);
      }),
      { numRuns: 300 },
    );
  });
});

describe('the cases from the shop floor, as printed on the PDF', () => {
  const cuff = (unit: Unit, available: string): LegOrder => ({ side: 'left', finish: 'cuff', input: { unit, precision: 8, cuffDepth: '1 1/2 in', available } });

  it('a 1 1/2 in cuff on a cm sheet: 3.8 cm, 3.8 cm and a 3.85 cm third section make the 11.45 cm cut; 12.05 − 11.45 = 0.6 cm to spare', async () => {
    // 1 in = 25.4 mm exactly (TRADE.md, NBS 1959): 1 1/2 in = 38.1 mm, shown to 0.05 cm as 3.8 cm;
    // three cuff depths (TRADE.md) = 114.3 mm, printed up to 11.45 cm; 4 3/4 in = 120.65 mm, printed down to 12.05 cm.
    const file = pdfFile(await renderCutSheet(buildCutSheet(SHOP, [cuff('cm', '4 3/4 in')])));
    const text = flatText(file);
    expect(text).toContain('Cuff, 3.8 cm deep · third section 3.85 cm');
    expect(layoutText(file)).toMatch(/11\.45 cm\s+below the/);
    expect(text).toContain('needs 11.45 cm below the pin mark, has 12.05 cm, 0.6 cm to spare.');
  });

  it('the same on a mm sheet: 38 + 38 + 38.5 = 114.5 mm, 120.5 − 114.5 = 6 mm to spare', async () => {
    const text = flatText(pdfFile(await renderCutSheet(buildCutSheet(SHOP, [cuff('mm', '4 3/4 in')]))));
    expect(text).toContain('Cuff, 38 mm deep · third section 38.5 mm');
    expect(text).toContain('needs 114.5 mm below the pin mark, has 120.5 mm, 6 mm to spare.');
  });

  it('a 1 1/2 in cuff with 4.49 in of cloth is short by 1/8 in, not by 0 in', async () => {
    // Three cuff depths = 4 1/2 in (TRADE.md); 4.49 in printed down to 4 3/8 in.
    const text = flatText(pdfFile(await renderCutSheet(buildCutSheet(SHOP, [cuff('in', '4.49')]))));
    expect(text).toContain('Needs 4 1/2 in below the pin mark, has 4 3/8 in. Short by 1/8 in.');
    expect(text).not.toMatch(/Short by 0 in/);
  });
});
