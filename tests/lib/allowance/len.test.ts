import fc from 'fast-check';
import Fraction from 'fraction.js';
import { describe, expect, it } from 'vitest';
import { lenMaker, mmNumber } from '@/lib/allowance/len';

describe('Len', () => {
  it('holds the exact mm as the nearest number and the text in the unit (1 in = 25.4 mm, NBS 1959)', () => {
    expect(lenMaker('in', 16)(new Fraction(381, 10))).toEqual({ mm: 38.1, text: '1 1/2 in' });
    expect(lenMaker('cm', 16)(new Fraction(-77, 2))).toEqual({ mm: -38.5, text: '-3.85 cm' });
  });

  it('the quick mm number equals fraction.js valueOf', () => {
    fc.assert(
      fc.property(fc.bigInt({ min: -(10n ** 30n), max: 10n ** 30n }), fc.bigInt({ min: 1n, max: 10n ** 30n }), (n, d) => {
        const f = new Fraction(n, d);
        expect(mmNumber(f)).toBe(f.valueOf());
      }),
    );
  });
});
