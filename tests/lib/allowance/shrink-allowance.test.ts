import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { AllowanceError, KIND_DEFAULTS, type ShrinkInput, shrinkAllowance, validateShrinkInput } from '@/lib/allowance';

const IN = 25.4;

describe('shrinkAllowance examples', () => {
  it('raw denim 10% on a 30 in inseam: the edge 3 1/3 in below the mark, the 1 1/2 in hem cut 1 2/3 in, the cut 5 in down (from memory: 7–10% for raw denim; arithmetic)', () => {
    const plan = shrinkAllowance({ unit: 'in', cloth: 'raw-denim', lengthToMark: 30 });
    expect(plan.percent).toBe(10);
    expect(plan.percentSource).toBe(KIND_DEFAULTS.shrinkagePercent['raw-denim'].source);
    expect(plan.finishedEdgeBelowMark.mm).toBeCloseTo((30 * IN) / 9, 9);
    expect([plan.finishedEdgeBelowMark.text, plan.hemAllowanceUnwashed.text, plan.cutBelowMark.text]).toEqual(['3 5/16 in', '1 11/16 in', '5 in']);
    expect(plan.lengthAfterWash.text).toBe('30 in');
    expect(plan.notes.map((n) => n.code)).toEqual(['shrink-allowance', 'wash-first-advised']);
    expect(plan.cautions).toContain('hot-wash-and-dryer');
  });

  it('pre-shrunk denim 1% on 80 cm: 8 mm below the mark (from memory: compressive pre-shrinking, under 1% residual; arithmetic 800/99 mm)', () => {
    const plan = shrinkAllowance({ unit: 'cm', cloth: 'preshrunk-denim', lengthToMark: 80 });
    expect(plan.finishedEdgeBelowMark.mm).toBeCloseTo(800 / 99, 9);
    expect(plan.finishedEdgeBelowMark.text).toBe('0.8 cm');
  });

  it("prewashed cloth: nothing added; the shop's own 7.5% for other cloth, named as such (arithmetic)", () => {
    const none = shrinkAllowance({ unit: 'in', cloth: 'prewashed', lengthToMark: 30 });
    expect([none.finishedEdgeBelowMark.mm, none.notes[0]!.code]).toEqual([0, 'no-shrinkage']);
    const own = shrinkAllowance({ unit: 'mm', cloth: 'other', shrinkPercent: '7.5%', lengthToMark: 740 });
    expect([own.percent, own.percentSource, own.finishedEdgeBelowMark.text]).toEqual([7.5, "the shop's own figure", '60 mm']);
  });

  it.each([
    [{ cloth: 'silk' }, 'cloth', 'bad-choice'],
    [{ cloth: 'other' }, 'shrinkPercent', 'missing'],
    [{ shrinkPercent: 50 }, 'shrinkPercent', 'out-of-range'],
    [{ lengthToMark: 0 }, 'lengthToMark', 'not-positive'],
  ])('refuses %o in field %s (%s)', (fields, field, code) => {
    const input = { unit: 'in', cloth: 'raw-denim', lengthToMark: 30, ...fields } as ShrinkInput;
    expect(() => shrinkAllowance(input)).toThrow(AllowanceError);
    expect(() => shrinkAllowance(input)).toThrow(expect.objectContaining({ field, code }));
    expect(validateShrinkInput(input).map((e) => [e.field, e.code])).toContainEqual([field, code]);
  });
});

describe('shrinkAllowance laws', () => {
  const pct = fc.integer({ min: 0, max: 490 }).map((k) => k / 10);
  const length = fc.integer({ min: 160, max: 1600 }).map((k) => k / 32);
  const plan = (p: number, L: number) => shrinkAllowance({ unit: 'in', cloth: 'other', shrinkPercent: p, lengthToMark: L });

  it('monotone: more shrinkage or a longer leg ⇒ a larger allowance; none ⇒ none', () => {
    fc.assert(
      fc.property(pct, pct, length, length, (p, q, L, M) => {
        if (p < q) expect(plan(p, L).finishedEdgeBelowMark.mm).toBeLessThan(plan(q, L).finishedEdgeBelowMark.mm);
        if (L < M && p > 0) expect(plan(p, L).finishedEdgeBelowMark.mm).toBeLessThan(plan(p, M).finishedEdgeBelowMark.mm);
        expect(plan(0, L).finishedEdgeBelowMark.mm).toBe(0);
      }),
    );
  });

  it('washed, the leg shrinks back to the pinned length exactly; p × L alone would fall short', () => {
    fc.assert(
      fc.property(pct, length, (p, L) => {
        const r = plan(p, L);
        // Exactly: the same Len as the unshrunk length read straight from the input.
        expect(r.lengthAfterWash).toEqual(plan(0, L).lengthAfterWash);
        expect(r.lengthAfterWash.mm).toBeCloseTo(L * IN, 9);
        expect(r.finishedEdgeBelowMark.mm).toBeCloseTo((L * IN * p) / (100 - p), 9);
        if (p > 0) expect(r.finishedEdgeBelowMark.mm).toBeGreaterThan((L * IN * p) / 100);
      }),
    );
  });
});
