import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { AllowanceError, type HemInput, planHem, type Unit } from '@/lib/allowance';

const codes = (input: HemInput) => planHem(input).warnings.map((w) => w.code);

describe('planHem examples', () => {
  it('defaults: 1½ in allowance with ¼ in turn-under (TRADE.md: powersewing.com, 1¼ to 2 in, turn-under ¼ in)', () => {
    const plan = planHem({ unit: 'in' });
    expect(plan.hemAllowance.text).toBe('1 1/2 in');
    expect(plan.turnUnder.text).toBe('1/4 in');
    expect(plan.slope.text).toBe('0 in');
    expect(plan.required.text).toBe('1 1/2 in');
    expect(plan.lines.map((l) => [l.name, l.belowMark.text, l.frontBelowMark.text])).toEqual([
      ['finished-edge', '0 in', '0 in'],
      ['cut', '1 1/2 in', '1 1/2 in'],
    ]);
    expect(plan.warnings).toEqual([]);
  });

  it('½ in lower at the back than the front: front lines sit ½ in higher (TRADE.md: Goodheart-Willcox 2012, p. 459)', () => {
    const plan = planHem({ unit: 'in', slope: '1/2' });
    expect(plan.lines.map((l) => l.frontBelowMark.text)).toEqual(['-1/2 in', '1 in']);
    expect(plan.lines.map((l) => l.belowMark.text)).toEqual(['0 in', '1 1/2 in']);
  });

  it('metric defaults 40 mm and 6 mm (our round numbers near 1½ in and ¼ in, TRADE.md powersewing.com)', () => {
    const plan = planHem({ unit: 'cm', slope: 12 / 10 });
    expect(plan.hemAllowance.text).toBe('4 cm');
    expect(plan.turnUnder.text).toBe('0.6 cm');
    expect(plan.lines.map((l) => l.frontBelowMark.text)).toEqual(['-1.2 cm', '2.8 cm']);
  });

  it('cloth check: 1 in below the mark is ½ in short of a 1½ in hem (arithmetic)', () => {
    const plan = planHem({ unit: 'in', available: 1 });
    expect([plan.enough, plan.shortBy?.text, plan.spare]).toEqual([false, '1/2 in', null]);
    expect(plan.warnings[0]!.code).toBe('not-enough-cloth');
    expect(plan.warnings[0]!.message).toContain('1 in hem is the most that fits');
    expect(plan.lines.map((l) => l.aboveRawEdge?.text)).toEqual(['1 in', '-1/2 in']);
    const ok = planHem({ unit: 'in', available: '2 1/4' });
    expect([ok.enough, ok.spare?.text, ok.shortBy]).toEqual([true, '3/4 in', null]);
  });

  it('no cloth at all: face the hem (common practice (no source))', () => {
    expect(planHem({ unit: 'in', available: 0 }).warnings[0]!.message).toMatch(/^Not enough cloth.*Face the hem/);
  });

  it('warns outside the usual 1¼ to 2 in (TRADE.md: powersewing.com)', () => {
    expect(codes({ unit: 'in', hemAllowance: '1 1/4' })).toEqual([]);
    expect(codes({ unit: 'in', hemAllowance: 2 })).toEqual([]);
    expect(codes({ unit: 'in', hemAllowance: 1 })).toEqual(['hem-allowance-unusual']);
    expect(codes({ unit: 'in', hemAllowance: '2 1/8' })).toEqual(['hem-allowance-unusual']);
  });

  it('warns when the turn-under takes the whole allowance (arithmetic)', () => {
    expect(codes({ unit: 'in', hemAllowance: '1 1/2', turnUnder: '1 1/2' })).toEqual(['turn-under-too-large']);
  });

  it.each([
    [{ hemAllowance: 0 }, 'hemAllowance', 'not-positive'],
    [{ turnUnder: -1 }, 'turnUnder', 'negative'],
    [{ slope: '-1/2' }, 'slope', 'negative'],
    [{ available: 'lots' }, 'available', 'not-a-length'],
  ])('refuses %o in field %s (%s)', (fields, field, code) => {
    expect(() => planHem({ unit: 'in', ...fields })).toThrow(AllowanceError);
    expect(() => planHem({ unit: 'in', ...fields })).toThrow(expect.objectContaining({ field, code }));
  });
});

describe('planHem laws', () => {
  const arb = fc.record({
    unit: fc.constantFrom<Unit>('in', 'cm', 'mm'),
    h: fc.integer({ min: 1, max: 128 }),
    slope: fc.integer({ min: 0, max: 32 }),
    a: fc.option(fc.integer({ min: 0, max: 200 })),
  });
  const value = (unit: Unit, k: number) => (unit === 'in' ? k / 32 : unit === 'mm' ? k / 2 : k / 20);

  it('front = back − slope on every line, and the cut lies one allowance below the finished edge', () => {
    fc.assert(
      fc.property(arb, ({ unit, h, slope }) => {
        const plan = planHem({ unit, hemAllowance: value(unit, h), slope: value(unit, slope) });
        for (const l of plan.lines) expect(l.belowMark.mm - l.frontBelowMark.mm).toBeCloseTo(plan.slope.mm, 9);
        expect(plan.lines[1]!.belowMark.mm - plan.lines[0]!.belowMark.mm).toBe(plan.hemAllowance.mm);
        expect(plan.required).toEqual(plan.lines[1]!.belowMark);
      }),
    );
  });

  it('enough ⇔ spare ≥ 0, with shortBy and spare consistent', () => {
    fc.assert(
      fc.property(arb, ({ unit, h, a }) => {
        const plan = planHem({ unit, hemAllowance: value(unit, h), ...(a === null ? {} : { available: value(unit, a) }) });
        if (a === null) {
          expect([plan.enough, plan.spare, plan.shortBy]).toEqual([null, null, null]);
          return;
        }
        expect(plan.enough).toBe(a >= h);
        expect(plan.enough).toBe(plan.spare !== null && plan.spare.mm >= 0);
        expect(plan.enough).toBe(plan.shortBy === null);
        const diff = plan.enough ? plan.spare!.mm : -plan.shortBy!.mm;
        expect(diff).toBeCloseTo(plan.lines[0]!.aboveRawEdge!.mm - plan.required.mm, 9);
      }),
    );
  });
});
