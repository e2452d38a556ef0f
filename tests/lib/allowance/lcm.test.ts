import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Exact, gcd, joinDenominator, lcm } from '@/lib/allowance/exact';

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

  // lcm and joinDenominator decide "b divides a" by a float quotient (whole exactly when it divides,
  // for safe integers); the oracle here is BigInt arithmetic.
  it('lcm and joinDenominator are the BigInt lcm, for divisors and not, up to 2^53 (arithmetic)', () => {
    const bigLcm = (a: bigint, b: bigint): bigint => {
      let [x, y] = [a, b];
      while (y !== 0n) [x, y] = [y, x % y];
      return (a / x) * b;
    };
    const pair = fc.oneof(
      fc.tuple(fc.integer({ min: 1, max: 2 ** 26 }), fc.integer({ min: 1, max: 2 ** 26 })),
      // b·k and b (divides), b·k ± 1 and b (does not), near 2^53
      fc
        .tuple(fc.integer({ min: 1, max: 2 ** 26 }), fc.integer({ min: 1, max: 2 ** 26 }), fc.constantFrom(0, 1, -1))
        .map(([b, k, e]) => [Math.max(1, b * k + e), b] as [number, number]),
      fc.tuple(fc.integer({ min: 1, max: 2 ** 20 }), fc.integer({ min: 1, max: 2 ** 32 })).map(([b, k]) => [b * k, b] as [number, number]),
    );
    fc.assert(
      fc.property(pair, fc.boolean(), ([a, b], swap) => {
        const [x, y] = swap ? [b, a] : [a, b];
        const want = bigLcm(BigInt(x), BigInt(y));
        if (want > BigInt(Number.MAX_SAFE_INTEGER)) return;
        expect(BigInt(lcm(x, y))).toBe(want);
        expect(BigInt(joinDenominator(x, y))).toBe(want);
      }),
      { numRuns: 5000 },
    );
  });
});
