import fc from 'fast-check';
import Fraction from 'fraction.js';
import { describe, expect, it } from 'vitest';
import { Exact } from '@/lib/allowance/exact';
import { fractionNumber, lenMaker } from '@/lib/allowance/len';

describe('Len', () => {
  it('holds the exact mm as the nearest number and the text in the unit (1 in = 25.4 mm, NBS 1959)', () => {
    expect(lenMaker('in', 16)(Exact.ratio(381, 10))).toEqual({ mm: 38.1, text: '1 1/2 in' });
    expect(lenMaker('cm', 16)(Exact.ratio(-77, 2))).toEqual({ mm: -38.5, text: '-3.85 cm' });
  });

  it('the mm number equals fraction.js valueOf, small or big', () => {
    fc.assert(
      fc.property(fc.bigInt({ min: -(10n ** 30n), max: 10n ** 30n }), fc.bigInt({ min: 1n, max: 10n ** 30n }), (n, d) => {
        const f = new Fraction(n, d);
        expect(Exact.from(f).valueOf()).toBe(f.valueOf());
      }),
    );
  });

  it('shows a negated length without building it: the same as formatting −mm', () => {
    fc.assert(
      fc.property(fc.integer({ min: -10_000_000, max: 10_000_000 }), fc.integer({ min: 1, max: 100_000 }), (n, d) => {
        const f = Exact.ratio(n, d);
        const len = lenMaker('in', 32);
        expect(len(f, true)).toEqual(len(f.neg()));
      }),
    );
  });
});

describe('fractionNumber', () => {
  it('gives the nearest number even past 1e308, where fraction.js valueOf gives NaN (arithmetic)', () => {
    const big = 10n ** 400n;
    const nearlyOne = new Fraction(big + 1n, big);
    expect(Number.isNaN(nearlyOne.valueOf())).toBe(true);
    expect(fractionNumber(nearlyOne)).toBe(1);
    expect(fractionNumber(new Fraction(-(3n * big), 2n * big))).toBe(-1.5);
    expect(fractionNumber(new Fraction(1n, big))).toBe(0);
  });
});
