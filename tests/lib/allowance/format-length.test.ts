import convert from 'convert-units';
import fc from 'fast-check';
import Fraction from 'fraction.js';
import { describe, expect, it } from 'vitest';
import { AllowanceError } from '@/lib/allowance';
import { floorSteps, formatExact, formatLength, roundSteps, splitFraction } from '@/lib/allowance/format-length';

describe('formatLength examples', () => {
  it.each([
    // 40 mm = 1.5748 in: 1 5/8 to the nearest 1/8, 1 9/16 to the nearest 1/16 (arithmetic; convert-units below)
    [40, 'in', 8, '1 5/8 in'],
    [40, 'in', 16, '1 9/16 in'],
    // 1 in = 25.4 mm exactly (NBS 1959), so these are exact inch values
    [50.8, 'in', 16, '2 in'],
    [15.875, 'in', 16, '5/8 in'],
    [-6.35, 'in', 16, '-1/4 in'],
    [0, 'in', 16, '0 in'],
    [39.6875, 'in', 16, '1 9/16 in'],
    [39.6875, 'in', 32, '1 9/16 in'],
    [0.79375, 'in', 32, '1/32 in'],
    [114.3, 'in', 8, '4 1/2 in'],
    // metric: mm to 0.5 mm, cm to 0.05 cm (our display rule; arithmetic)
    [38, 'mm', 16, '38 mm'],
    [38.5, 'mm', 16, '38.5 mm'],
    [38.1, 'mm', 16, '38 mm'],
    [38, 'cm', 16, '3.8 cm'],
    [38.5, 'cm', 16, '3.85 cm'],
    [40, 'cm', 16, '4 cm'],
    [0.5, 'cm', 16, '0.05 cm'],
    [-12, 'cm', 16, '-1.2 cm'],
    [914.4, 'cm', 16, '91.45 cm'],
  ] as const)('%s mm in %s at 1/%s is "%s" (arithmetic)', (mm, unit, precision, text) => {
    expect(formatLength(mm, { unit, precision })).toBe(text);
  });

  it('40 mm agrees with convert-units: 1.5748 in lies nearer 1 5/8 than 1 1/2 and nearer 1 9/16 than 1 5/8 (convert-units)', () => {
    const inches = convert(40).from('mm').to('in');
    expect(Math.abs(inches - 13 / 8)).toBeLessThan(Math.abs(inches - 12 / 8));
    expect(Math.abs(inches - 25 / 16)).toBeLessThan(Math.abs(inches - 26 / 16));
    expect(formatLength(40, { unit: 'in', precision: 8 })).toBe('1 5/8 in');
  });

  it('ties round away from zero (our display rule)', () => {
    // 1/32 in is exactly half a 1/16 step
    expect(formatLength(0.79375, { unit: 'in', precision: 16 })).toBe('1/16 in');
    expect(formatLength(-0.79375, { unit: 'in', precision: 16 })).toBe('-1/16 in');
    expect(formatLength(0.25, { unit: 'mm' })).toBe('0.5 mm');
    expect(formatLength(-0.25, { unit: 'mm' })).toBe('-0.5 mm');
    expect(formatLength(38.75, { unit: 'cm' })).toBe('3.9 cm');
  });

  it('never shows "-0"', () => {
    expect(formatLength(-0.1, { unit: 'in' })).toBe('0 in');
    expect(formatLength(-0.2, { unit: 'mm' })).toBe('0 mm');
    expect(formatLength(-0.2, { unit: 'cm' })).toBe('0 cm');
  });

  it('refuses a unit or precision it does not know, instead of printing nonsense (our rule: in, cm, mm; 1/8, 1/16, 1/32)', () => {
    const bad = (opts: unknown) => () => formatLength(25.4, opts as { unit: 'in' });
    expect(bad({ unit: 'ft' })).toThrow(expect.objectContaining({ code: 'bad-unit' }));
    expect(bad({ unit: 'in', precision: 12 })).toThrow(expect.objectContaining({ code: 'bad-precision' }));
    expect(bad({ unit: 'mm', precision: 12 })).toThrow(expect.objectContaining({ code: 'bad-precision' }));
    expect(bad(null)).toThrow(AllowanceError);
    expect(() => splitFraction(25.4, 12 as 16)).toThrow(expect.objectContaining({ code: 'bad-precision' }));
  });

  it('refuses NaN, Infinity and absurd sizes with an AllowanceError', () => {
    for (const bad of [Number.NaN, Infinity, -Infinity, 1e300]) {
      expect(() => formatLength(bad, { unit: 'in' })).toThrow(AllowanceError);
    }
  });
});

describe('splitFraction', () => {
  it.each([
    // arithmetic on 1 in = 25.4 mm (NBS 1959)
    [39.6875, 16, { sign: 1, whole: 1, num: 9, den: 16 }],
    [40, 8, { sign: 1, whole: 1, num: 5, den: 8 }],
    [50.8, 16, { sign: 1, whole: 2, num: 0, den: 1 }],
    [-6.35, 16, { sign: -1, whole: 0, num: 1, den: 4 }],
    [0.1, 16, { sign: 0, whole: 0, num: 0, den: 1 }],
  ] as const)('%s mm at 1/%s (arithmetic)', (mm, precision, parts) => {
    expect(splitFraction(mm, precision)).toEqual(parts);
  });

  it('agrees with formatLength for every length (same rounding)', () => {
    fc.assert(
      fc.property(fc.integer({ min: -200_000, max: 200_000 }), fc.constantFrom(8, 16, 32) as fc.Arbitrary<8 | 16 | 32>, (k, p) => {
        const mm = k / 40;
        const s = splitFraction(mm, p);
        const frac = s.num === 0 ? '' : `${s.num}/${s.den}`;
        const body = s.whole === 0 ? frac || '0' : frac ? `${s.whole} ${frac}` : `${s.whole}`;
        expect(formatLength(mm, { unit: 'in', precision: p })).toBe(`${s.sign < 0 ? '-' : ''}${body} in`);
      }),
    );
  });
});

describe('step rounding laws', () => {
  it('rounded steps lie within half a step of the exact value, ties away from zero (small and BigInt-sized values)', () => {
    const big = fc.bigInt({ min: -(10n ** 24n), max: 10n ** 24n });
    const small = fc.bigInt({ min: -(10n ** 9n), max: 10n ** 9n });
    fc.assert(
      fc.property(
        fc.oneof(big, small),
        fc.oneof(fc.bigInt({ min: 10n ** 9n, max: 10n ** 20n }), fc.bigInt({ min: 1n, max: 1000n })),
        fc.integer({ min: 1, max: 200 }),
        fc.integer({ min: 1, max: 200 }),
        (n, d, a, b) => {
          const f = new Fraction(n, d);
          const exact = f.mul(a).div(b);
          // roundSteps answers a JS number: exact while the step count stays a safe integer
          fc.pre(exact.abs().compare(Number.MAX_SAFE_INTEGER - 1) < 0);
          const q = roundSteps(f, a, b);
          const gap = exact.sub(q).abs().compare(new Fraction(1, 2));
          expect(gap).toBeLessThanOrEqual(0);
          if (gap === 0) expect(Math.abs(q)).toBeGreaterThan(exact.abs().valueOf());
        },
      ),
    );
  });

  it('floor steps never exceed the exact value and are within one step of it', () => {
    fc.assert(
      fc.property(fc.integer({ min: -1e9, max: 1e9 }), fc.integer({ min: 1, max: 1e6 }), (n, d) => {
        const f = new Fraction(n, d);
        const q = floorSteps(f, 80, 127);
        const exact = f.mul(80).div(127);
        expect(exact.compare(q)).toBeGreaterThanOrEqual(0);
        expect(exact.sub(q).compare(1)).toBeLessThan(0);
      }),
    );
  });

  it('formatExact of an exact inch fraction shows that fraction (1 in = 25.4 mm, NBS 1959)', () => {
    expect(formatExact(new Fraction(127, 80), 'in', 16)).toBe('1/16 in');
    expect(formatExact(new Fraction(127 * 49, 80), 'in', 16)).toBe('3 1/16 in');
  });
});
