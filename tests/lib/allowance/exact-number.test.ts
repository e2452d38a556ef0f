import fc from 'fast-check';
import Fraction from 'fraction.js';
import { describe, expect, it } from 'vitest';
import { fractionFromDecimal, fractionFromNumber } from '@/lib/allowance/exact-number';

// The law: a JS number means the decimal it prints as. Checked against fraction.js reading String(x).
function fromPrinted(x: number): Fraction {
  const s = String(x);
  const m = /^(-?)(\d+)(?:\.(\d+))?(?:e([+-]?\d+))?$/.exec(s)!;
  const digits = BigInt(m[2]! + (m[3] ?? ''));
  const scale = (m[3] ?? '').length - Number(m[4] ?? 0);
  const value = scale >= 0 ? new Fraction(digits, 10n ** BigInt(scale)) : new Fraction(digits * 10n ** BigInt(-scale), 1n);
  return m[1] === '-' ? value.neg() : value;
}

describe('fractionFromNumber', () => {
  it.each([
    [0.1, 1n, 10n],
    [1.5, 3n, 2n],
    [38.1, 381n, 10n],
    [1e-7, 1n, 10_000_000n],
    [-0.79375, 127n, 160n],
  ])('%s is exactly %s/%s (arithmetic)', (x, n, d) => {
    const f = fractionFromNumber(x);
    expect(f.n).toBe(n);
    expect(f.d).toBe(d);
    expect(f.s).toBe(x < 0 ? -1n : 1n);
  });

  it('a number is the decimal it prints as', () => {
    fc.assert(
      fc.property(fc.double({ noNaN: true, noDefaultInfinity: true, min: -1e12, max: 1e12 }), (x) => {
        expect(fractionFromNumber(x).equals(fromPrinted(x))).toBe(true);
      }),
    );
  });

  it('scaling by a/b is exact: x·a/b', () => {
    fc.assert(
      fc.property(fc.double({ noNaN: true, noDefaultInfinity: true, min: -1e6, max: 1e6 }), fc.constantFrom([127, 5], [10, 1], [1, 1]), (x, [a, b]) => {
        expect(fractionFromNumber(x, a, b).equals(fromPrinted(x).mul(a).div(b))).toBe(true);
      }),
    );
  });

  it('fractionFromDecimal reads digits exactly, also beyond 15 digits', () => {
    expect(fractionFromDecimal(false, '12345678901234567890', '5').equals(new Fraction(123456789012345678905n, 10n))).toBe(true);
    expect(fractionFromDecimal(true, '1', '25').equals(new Fraction(-5, 4))).toBe(true);
    expect(fractionFromDecimal(false, '15', '', 2).equals(new Fraction(1500))).toBe(true);
  });
});
