import fc from 'fast-check';
import Fraction from 'fraction.js';
import { describe, expect, it } from 'vitest';
import { AllowanceError, checkTaper, type TaperInput, type Unit } from '@/lib/allowance';

describe('checkTaper examples', () => {
  it('¼ in short in flat width is ½ in round the leg: ¼ in per seam, ⅛ in each side (TRADE.md: Fit For A Queen 2012)', () => {
    // 7 in flat at the edge, 8 in 24 in up: 1/24 in wider per inch up. A 1½ in cuff's cut lies 4½ in below the
    // mark, 6 in below the cuff top, so the leg there is 6/24 = ¼ in narrower than at the cuff top.
    const plan = checkTaper({ unit: 'in', cuffDepth: '1 1/2', widthAtEdge: 7, widthAbove: 8, heightAbove: 24 });
    const cut = plan.lines[3]!;
    expect(cut.name).toBe('cut');
    expect(cut.change.text).toBe('1/4 in');
    expect(cut.perSeam.text).toBe('1/4 in');
    expect(cut.perSide.text).toBe('1/8 in');
    // two seams, each adding ¼ in round: ½ in round the leg
    expect(2 * cut.perSeam.mm).toBeCloseTo(12.7, 9);
  });

  it('cuff-top width is the target: width 1½ in up on that leg is 7 1/16 in (arithmetic)', () => {
    const plan = checkTaper({ unit: 'in', cuffDepth: '1 1/2', widthAtEdge: 7, widthAbove: 8, heightAbove: 24 });
    expect(plan.targetWidth.text).toBe('7 1/16 in');
    expect(plan.lines.map((l) => l.width.text)).toEqual(['7 in', '6 15/16 in', '6 7/8 in', '6 13/16 in']);
    expect(plan.lines.map((l) => l.change.text)).toEqual(['1/16 in', '1/8 in', '3/16 in', '1/4 in']);
  });

  it('tolerance ⅛ in flat (common practice (no source)): ¼ in at the cut is beyond it, with advice to let out', () => {
    const plan = checkTaper({ unit: 'in', cuffDepth: '1 1/2', widthAtEdge: 7, widthAbove: 8, heightAbove: 24 });
    expect(plan.withinTolerance).toBe(false);
    expect(plan.feasible).toBeNull();
    expect(plan.warnings.map((w) => w.code)).toEqual(['taper-beyond-tolerance']);
    // The let-out starts one cuff depth ABOVE the finished edge (TRADE.md fold plan), not at the chalked
    // "Cuff top" line one depth below the mark: the message names the distances.
    expect(plan.warnings[0]!.message).toContain(
      'Let out the inseam and outseam from 1 1/2 in above the finished edge (the pin mark, line 1) down to the cutting line, 4 1/2 in below it, up to 1/8 in on each side of each seam',
    );
    expect(plan.warnings[0]!.message).not.toMatch(/from the cuff top/);
    expect(plan.warnings[0]!.message).toContain('1/8 in on each side');
  });

  it('a gentle taper stays within ⅛ in (common practice (no source))', () => {
    const plan = checkTaper({ unit: 'in', cuffDepth: '1 1/2', widthAtEdge: 8, widthAbove: '8 1/2', heightAbove: 24 });
    expect(plan.lines[3]!.change.text).toBe('1/8 in');
    expect(plan.withinTolerance).toBe(true);
    expect(plan.warnings).toEqual([]);
  });

  it('seam allowance: ⅛ in per side fits in ½ in, not in 1/16 in (arithmetic)', () => {
    const base: TaperInput = { unit: 'in', cuffDepth: '1 1/2', widthAtEdge: 7, widthAbove: 8, heightAbove: 24 };
    expect(checkTaper({ ...base, seamAllowance: '1/2' }).feasible).toBe(true);
    const tight = checkTaper({ ...base, seamAllowance: '1/16' });
    expect(tight.feasible).toBe(false);
    expect(tight.warnings.map((w) => w.code)).toContain('let-out-exceeds-seam-allowance');
    expect(tight.warnings.at(-1)!.message).toContain('1/16 in');
  });

  it('a leg that widens downwards asks to take in, and needs no seam allowance (arithmetic)', () => {
    const plan = checkTaper({ unit: 'in', cuffDepth: '1 1/2', widthAtEdge: 9, widthAbove: 8, heightAbove: 12, seamAllowance: 0 });
    expect(plan.lines[3]!.change.text).toBe('-1/2 in');
    expect(plan.feasible).toBe(true);
    expect(plan.warnings[0]!.message).toMatch(/Take in/);
  });

  it('within tolerance is feasible even with no seam allowance (flat-felled seams): nothing is let out (tolerance 1/8 in, common practice (no source))', () => {
    // 7 in flat at the edge, 7 1/8 in 24 in up: 1/32 in narrower at the cut, inside the 1/8 in tolerance
    const plan = checkTaper({ unit: 'in', cuffDepth: '1 1/2', widthAtEdge: 7, widthAbove: '7 1/8', heightAbove: 24, seamAllowance: 0 });
    expect(plan.withinTolerance).toBe(true);
    expect(plan.feasible).toBe(true);
    expect(plan.warnings.map((w) => w.code)).not.toContain('let-out-exceeds-seam-allowance');
  });

  it('metric tolerance 3 mm (common practice (no source))', () => {
    const plan = checkTaper({ unit: 'mm', cuffDepth: 40, widthAtEdge: 180, widthAbove: 200, heightAbove: 400 });
    // slope 1/20: the cut 120 mm below the mark is 160 mm below the cuff top → 8 mm
    expect(plan.lines[3]!.change.text).toBe('8 mm');
    expect(plan.lines[3]!.perSide.text).toBe('4 mm');
    expect(plan.withinTolerance).toBe(false);
  });

  it.each([
    [{ widthAtEdge: 0 }, 'widthAtEdge', 'not-positive'],
    [{ widthAbove: -3 }, 'widthAbove', 'not-positive'],
    [{ heightAbove: 0 }, 'heightAbove', 'not-positive'],
    [{ tolerance: '-1/8' }, 'tolerance', 'negative'],
    [{ seamAllowance: -1 }, 'seamAllowance', 'negative'],
    [{ widthAtEdge: 1, widthAbove: 30, heightAbove: 2 }, 'widthAbove', 'out-of-range'],
    // 1.5 mm at the edge, 220 mm 150 mm up: followed down to the cut there is no leg (arithmetic)
    [{ unit: 'mm', cuffDepth: 38, widthAtEdge: 1.5, widthAbove: 220, heightAbove: 150 }, 'widthAbove', 'out-of-range'],
    // under the shallowest workable cuff, 3/4 in (common practice, no source)
    [{ cuffDepth: 0.0001 }, 'cuffDepth', 'out-of-range'],
  ])('refuses %o in field %s (%s)', (fields, field, code) => {
    const input = { unit: 'in', cuffDepth: 1.5, widthAtEdge: 7, widthAbove: 8, heightAbove: 12, ...fields } as TaperInput;
    expect(() => checkTaper(input)).toThrow(AllowanceError);
    expect(() => checkTaper(input)).toThrow(expect.objectContaining({ field, code }));
  });
});

describe('checkTaper laws', () => {
  const arb = fc.record({
    unit: fc.constantFrom<Unit>('in', 'cm', 'mm'),
    // from the shallowest workable cuff (3/4 in / 20 mm; common practice, no source) up
    d: fc.integer({ min: 40, max: 80 }),
    // realistic legs (1/32 in or half-mm steps): 5 to 12 in flat, 1½ in narrower to 3 in wider 6 to 25 in up
    wEdge: fc.integer({ min: 160, max: 400 }),
    delta: fc.integer({ min: -48, max: 96 }),
    h: fc.integer({ min: 192, max: 800 }),
    t: fc.integer({ min: 0, max: 4 }),
    sa: fc.option(fc.integer({ min: 0, max: 32 })),
  });
  const step = (unit: Unit) => (unit === 'in' ? new Fraction(1, 32) : unit === 'mm' ? new Fraction(1, 2) : new Fraction(1, 20));
  const text = (unit: Unit, k: number) => step(unit).mul(k).toFraction(true);
  /** The generated leg as the taper check is asked it, with any further fields. */
  const leg = (g: { unit: Unit; d: number; wEdge: number; delta: number; h: number }, more: Partial<TaperInput> = {}): TaperInput => ({
    unit: g.unit,
    cuffDepth: text(g.unit, g.d),
    widthAtEdge: text(g.unit, g.wEdge),
    widthAbove: text(g.unit, g.wEdge + g.delta),
    heightAbove: text(g.unit, g.h),
    ...more,
  });

  it("after the change every line's width equals the target", () => {
    fc.assert(
      fc.property(arb, (g) => {
        const plan = checkTaper(leg(g, { clothThickness: text(g.unit, g.t) }));
        for (const l of plan.lines) expect(l.width.mm + l.change.mm).toBeCloseTo(plan.targetWidth.mm, 9);
      }),
    );
  });

  it('perSide · 2 = perSeam = change', () => {
    fc.assert(
      fc.property(arb, (g) => {
        const plan = checkTaper(leg(g));
        for (const l of plan.lines) {
          expect(l.perSeam.mm).toBe(l.change.mm);
          expect(l.perSide.mm * 2).toBeCloseTo(l.perSeam.mm, 12);
        }
      }),
    );
  });

  it('within tolerance ⇔ every |change| ≤ tolerance; feasible ⇔ within tolerance or the largest let-out per side ≤ seam allowance', () => {
    fc.assert(
      fc.property(arb, (g) => {
        const plan = checkTaper(leg(g, g.sa === null ? {} : { seamAllowance: text(g.unit, g.sa) }));
        const tol = g.unit === 'in' ? 25.4 / 8 : 3;
        expect(plan.withinTolerance).toBe(plan.lines.every((l) => Math.abs(l.change.mm) <= tol + 1e-9));
        expect(plan.warnings.some((w) => w.code === 'taper-beyond-tolerance')).toBe(!plan.withinTolerance);
        if (g.sa === null) {
          expect(plan.feasible).toBeNull();
          return;
        }
        const sa = step(g.unit).mul(g.sa).valueOf() * (g.unit === 'in' ? 25.4 : g.unit === 'cm' ? 10 : 1);
        expect(plan.feasible).toBe(plan.withinTolerance || Math.max(...plan.lines.map((l) => l.perSide.mm)) <= sa + 1e-9);
      }),
    );
  });
});
