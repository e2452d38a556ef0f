import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Exact, gcd, lcm } from '@/lib/allowance/exact';

describe('lcm and Exact.over (the quick paths’ common denominator)', () => {
  it('lcm is a multiple of both, and the least: a·b / gcd(a, b) (arithmetic)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 1e6 }), fc.integer({ min: 1, max: 1e6 }), (a, b) => {
        const m = lcm(a, b);
        expect(m % a).toBe(0);
        expect(m % b).toBe(0);
        expect(m).toBe((a * b) / gcd(a, b));
      }),
    );
    expect([lcm(80, 5), lcm(5, 80), lcm(40, 80), lcm(20, 80), lcm(6, 10)]).toEqual([80, 80, 80, 80, 30]);
  });

  it('over(D) is the numerator over D: 3/2 over 80 is 120/80 (arithmetic)', () => {
    expect(Exact.ratio(3, 2).over(80)).toBe(120);
    expect(Exact.ratio(-127, 40).over(80)).toBe(-254);
  });
});
