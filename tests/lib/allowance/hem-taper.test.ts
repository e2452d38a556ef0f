import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkHemTaper, validateHemTaperInput, type Unit } from '@/lib/allowance';

// The turned-up hem lies against the leg as high as it is deep: cut on the leg's own taper it is too
// narrow there (TRADE.md: "tapered leg: ¼ in short in flat width is ½ in round the leg", Fit For A
// Queen 2012). The figures below are arithmetic on that mirror rule.
describe('checkHemTaper: a plain hem on a tapered leg', () => {
  it('7 in flat at the edge, 8 in 12 in up, 1½ in hem: let out 1/4 in at the cut, 1/8 in each side (arithmetic)', () => {
    const plan = checkHemTaper({ unit: 'in', widthAtEdge: 7, widthAbove: 8, heightAbove: 12 });
    expect(plan.finish).toBe('hem');
    expect(plan.lines.map((l) => [l.name, l.width.text, l.change.text])).toEqual([
      ['finished-edge', '7 in', '0 in'],
      ['cut', '6 7/8 in', '1/4 in'],
    ]);
    expect(plan.targetWidth.text).toBe('7 1/8 in');
    expect(plan.lines[1]!.perSide.text).toBe('1/8 in');
    expect(plan.withinTolerance).toBe(false);
    expect(plan.warnings[0]!.message).toContain('Let out the inseam and outseam below the finished edge');
    expect(plan.warnings[0]!.message).toContain('so the hem lies flat');
  });

  it('a gentle taper stays within the 1/8 in tolerance (common practice (no source)) and is feasible with no seam allowance', () => {
    // 7 in, 8 in 24 in up, 1½ in hem: 2 × 1.5/24 = 1/8 in
    const plan = checkHemTaper({ unit: 'in', widthAtEdge: 7, widthAbove: 8, heightAbove: 24, seamAllowance: 0 });
    expect(plan.withinTolerance).toBe(true);
    expect(plan.feasible).toBe(true);
    expect(plan.warnings).toEqual([]);
  });

  it('refuses widths that give no leg at the cut, on widthAbove', () => {
    const input = { unit: 'mm' as const, hemAllowance: 40, widthAtEdge: 1.5, widthAbove: 220, heightAbove: 150 };
    expect(() => checkHemTaper(input)).toThrow(expect.objectContaining({ field: 'widthAbove', code: 'out-of-range' }));
    expect(validateHemTaperInput(input).map((e) => e.field)).toEqual(['widthAbove']);
  });

  it('law: the allowance at the cut, after the change, is as wide as the leg one hem allowance above the edge', () => {
    fc.assert(
      fc.property(
        fc.constantFrom<Unit>('in', 'cm', 'mm'),
        fc.integer({ min: 160, max: 400 }),
        fc.integer({ min: -48, max: 96 }),
        fc.integer({ min: 192, max: 800 }),
        fc.integer({ min: 20, max: 80 }),
        (unit, w, delta, h, hem) => {
          const step = unit === 'in' ? 1 / 32 : unit === 'mm' ? 0.5 : 0.05;
          const plan = checkHemTaper({ unit, widthAtEdge: w * step, widthAbove: (w + delta) * step, heightAbove: h * step, hemAllowance: hem * step });
          const cut = plan.lines[1]!;
          expect(cut.width.mm + cut.change.mm).toBeCloseTo(plan.targetWidth.mm, 9);
          expect(plan.lines[0]!.change.mm).toBe(0);
        },
      ),
    );
  });
});
