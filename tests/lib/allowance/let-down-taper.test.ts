// A let-down leg: below the old fold the old hem's allowance often flares, so the width measured
// flat at the cutting line (widthAtCut) is used there instead of the taper followed down. The base
// leg is TRADE.md's tapered example (7 in flat at the edge, 8 in 24 in up: "¼ in short in flat
// width is ½ in round the leg", Fit For A Queen 2012); the let-down figures are arithmetic on it.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkHemTaper, checkTaper, validateHemTaperInput, validateTaperInput, type TaperInput, type Unit } from '@/lib/allowance';

const cuff: TaperInput = { unit: 'in', cuffDepth: '1 1/2', widthAtEdge: 7, widthAbove: 8, heightAbove: 24 };

describe('checkTaper on a let-down leg (width measured at the cutting line)', () => {
  it('uses the measured width at the cut: 7 3/8 in there takes in 5/16 in, where followed down it would let out 1/4 in (arithmetic)', () => {
    // Old fold 3 in below the mark: lines 1–3 (0, 1 1/2, 3 in) are on the taper; the cut (4 1/2 in) is below the fold.
    const followed = checkTaper(cuff);
    expect(followed.lines[3]!.change.text).toBe('1/4 in');
    const plan = checkTaper({ ...cuff, widthAtCut: '7 3/8', oldCrease: 3 });
    expect(plan.targetWidth.text).toBe('7 1/16 in');
    expect(plan.lines.map((l) => l.width.text)).toEqual(['7 in', '6 15/16 in', '6 7/8 in', '7 3/8 in']);
    expect(plan.lines.map((l) => l.change.text)).toEqual(['1/16 in', '1/8 in', '3/16 in', '-5/16 in']);
    expect(plan.lines.map((l) => l.measured ?? false)).toEqual([false, false, false, true]);
    expect(plan.withinTolerance).toBe(false);
  });

  it('without the old fold, joins the edge width straight to the measured one: 7 3/4 in at the cut gives 7 1/4 and 7 1/2 in between (arithmetic)', () => {
    const plan = checkTaper({ ...cuff, widthAtCut: '7 3/4' });
    expect(plan.lines.map((l) => l.width.text)).toEqual(['7 in', '7 1/4 in', '7 1/2 in', '7 3/4 in']);
    expect(plan.lines.map((l) => l.change.text)).toEqual(['1/16 in', '-3/16 in', '-7/16 in', '-11/16 in']);
    expect(plan.warnings[0]!.message).toContain('Take in the inseam and outseam');
  });

  it('a flat width at the cut of 0 is refused on its own field', () => {
    const input = { ...cuff, widthAtCut: 0 };
    expect(() => checkTaper(input)).toThrow(expect.objectContaining({ field: 'widthAtCut', code: 'not-positive' }));
    expect(validateTaperInput(input).map((e) => e.field)).toEqual(['widthAtCut']);
  });

  it('measured, the cut no longer has to follow the taper down: 1.5 mm at the edge, 220 mm 150 mm up has a leg at a measured cut (arithmetic)', () => {
    const steep = { unit: 'mm' as const, cuffDepth: 38, widthAtEdge: 200, widthAbove: 220, heightAbove: 10 };
    // Followed down 114 mm below the edge: 200 − 2 × 114 < 0, no leg.
    expect(validateTaperInput(steep).map((e) => e.field)).toEqual(['widthAbove']);
    expect(validateTaperInput({ ...steep, widthAtCut: 190 })).toEqual([]);
    // …unless the old fold lies where the taper has already run out.
    expect(validateTaperInput({ ...steep, widthAtCut: 190, oldCrease: 110 }).map((e) => e.field)).toEqual(['widthAbove']);
  });

  it('law: measuring the width the taper gives at the cut changes no line', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 200, max: 320 }),
        fc.integer({ min: -16, max: 32 }),
        fc.integer({ min: 192, max: 800 }),
        fc.option(fc.integer({ min: -64, max: 200 }), { nil: undefined }),
        (w, delta, h, fold) => {
          // sixteenths of an inch; the cut of a 1 1/2 in cuff is 4 1/2 in (72 sixteenths) below the mark
          const base = {
            unit: 'in' as const,
            precision: 32 as const,
            cuffDepth: '1 1/2',
            widthAtEdge: `${w}/16`,
            widthAbove: `${w + delta}/16`,
            heightAbove: `${h}/16`,
          };
          const followed = checkTaper(base);
          const measured = checkTaper({ ...base, widthAtCut: `${w * h - 72 * delta}/${16 * h}`, oldCrease: fold === undefined ? undefined : `${fold}/16` });
          expect(measured.lines.map((l) => [l.width.mm, l.change.mm])).toEqual(followed.lines.map((l) => [l.width.mm, l.change.mm]));
          expect(measured.withinTolerance).toBe(followed.withinTolerance);
        },
      ),
    );
  });

  it('law: above the old fold the taper holds; at the cut the width is the one measured, and width + change is the target', () => {
    fc.assert(
      fc.property(
        fc.constantFrom<Unit>('in', 'cm', 'mm'),
        fc.integer({ min: 160, max: 400 }),
        fc.integer({ min: -24, max: 48 }),
        fc.integer({ min: 192, max: 800 }),
        fc.integer({ min: 160, max: 400 }),
        fc.integer({ min: 0, max: 200 }),
        (unit, w, delta, h, cut, fold) => {
          const step = unit === 'in' ? 1 / 32 : unit === 'mm' ? 0.5 : 0.05;
          const base = {
            unit,
            cuffDepth: unit === 'in' ? 1.5 : unit === 'mm' ? 38 : 3.8,
            widthAtEdge: w * step,
            widthAbove: (w + delta) * step,
            heightAbove: h * step,
          };
          const followed = checkTaper(base);
          const plan = checkTaper({ ...base, widthAtCut: cut * step, oldCrease: fold * step });
          const foldMm = fold * step * (unit === 'in' ? 25.4 : unit === 'cm' ? 10 : 1);
          plan.lines.forEach((l, k) => {
            expect(l.width.mm + l.change.mm).toBeCloseTo(plan.targetWidth.mm, 9);
            if (l.name !== 'cut' && l.belowMark.mm <= foldMm) expect(l.width.mm).toBeCloseTo(followed.lines[k]!.width.mm, 9);
          });
          expect(plan.lines[3]!.width.mm).toBeCloseTo(cut * step * (unit === 'in' ? 25.4 : unit === 'cm' ? 10 : 1), 9);
        },
      ),
    );
  });
});

describe('checkHemTaper on a let-down leg', () => {
  const hem = { unit: 'in' as const, widthAtEdge: 7, widthAbove: 8, heightAbove: 12 };

  it('an old hem flared to 7 1/8 in at the cut already lies flat under a 1 1/2 in hem; followed down it would need 1/4 in let out (arithmetic)', () => {
    expect(checkHemTaper(hem).lines[1]!.change.text).toBe('1/4 in');
    const plan = checkHemTaper({ ...hem, widthAtCut: '7 1/8' });
    expect(plan.lines.map((l) => [l.name, l.width.text, l.change.text, l.measured ?? false])).toEqual([
      ['finished-edge', '7 in', '0 in', false],
      ['cut', '7 1/8 in', '0 in', true],
    ]);
    expect(plan.withinTolerance).toBe(true);
    expect(plan.warnings).toEqual([]);
  });

  it('flared past the leg above (7 1/2 in at the cut): take in 3/8 in at each seam, 3/16 in each side (arithmetic)', () => {
    const plan = checkHemTaper({ ...hem, widthAtCut: '7 1/2', seamAllowance: 0 });
    expect(plan.lines[1]!.change.text).toBe('-3/8 in');
    expect(plan.lines[1]!.perSide.text).toBe('-3/16 in');
    expect(plan.withinTolerance).toBe(false);
    expect(plan.feasible).toBe(true);
    expect(plan.warnings[0]!.message).toContain('Take in the inseam and outseam below the finished edge');
    // The leg narrows (7 in at the edge, 8 in above); it is the old hem that flares: say that, not "the leg widens".
    expect(plan.warnings[0]!.message).toMatch(/^Measured at the cutting line \(7 1\/2 in flat\), the let-down leg flares wider than the leg above the edge: /);
  });

  it('a negative width at the cut is refused on its own field; a measured cut makes widths that run out below the edge plannable', () => {
    expect(validateHemTaperInput({ ...hem, widthAtCut: '-7' }).map((e) => e.field)).toEqual(['widthAtCut']);
    const steep = { unit: 'mm' as const, hemAllowance: 40, widthAtEdge: 20, widthAbove: 220, heightAbove: 20 };
    expect(validateHemTaperInput(steep).map((e) => e.field)).toEqual(['widthAbove']);
    expect(validateHemTaperInput({ ...steep, widthAtCut: 180 })).toEqual([]);
  });

  it('law: the measured cut width plus the change is the width one hem allowance above the edge', () => {
    fc.assert(
      fc.property(
        fc.constantFrom<Unit>('in', 'cm', 'mm'),
        fc.integer({ min: 160, max: 400 }),
        fc.integer({ min: -48, max: 96 }),
        fc.integer({ min: 192, max: 800 }),
        fc.integer({ min: 20, max: 80 }),
        fc.integer({ min: 120, max: 480 }),
        (unit, w, delta, h, hemDepth, cut) => {
          const step = unit === 'in' ? 1 / 32 : unit === 'mm' ? 0.5 : 0.05;
          const base = { unit, widthAtEdge: w * step, widthAbove: (w + delta) * step, heightAbove: h * step, hemAllowance: hemDepth * step };
          const plan = checkHemTaper({ ...base, widthAtCut: cut * step });
          expect(plan.targetWidth.mm).toBeCloseTo(checkHemTaper(base).targetWidth.mm, 9);
          expect(plan.lines[1]!.width.mm + plan.lines[1]!.change.mm).toBeCloseTo(plan.targetWidth.mm, 9);
          expect(plan.lines[1]!.measured).toBe(true);
        },
      ),
    );
  });
});
