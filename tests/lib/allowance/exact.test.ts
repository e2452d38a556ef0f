import fc from 'fast-check';
import Fraction from 'fraction.js';
import { describe, expect, it } from 'vitest';
import { Exact, gcd } from '@/lib/allowance/exact';
import { exactFromNumber, fractionFromNumber } from '@/lib/allowance/exact-number';
import { floorExactSteps, floorSteps, formatExact, formatExactQ, roundExactSteps, roundSteps } from '@/lib/allowance/format-length';
import { readLengthTerms } from '@/lib/allowance/length-terms';
import { checkRange, checkRangeExact, parseExact, readExact, termExact, termMm } from '@/lib/allowance/parse-length';

// The judge throughout is fraction.js (BigInt, exact): the integer layer must give the same numbers.
const SAFE = BigInt(Number.MAX_SAFE_INTEGER);
const TWO53 = 2n ** 53n;

// Numerators and denominators from tiny to well past 2^53, with many near the edge where the fast path gives way.
const bigPart = fc.oneof(
  fc.bigInt({ min: 0n, max: 1000n }),
  fc.bigInt({ min: 0n, max: 10n ** 9n }),
  fc.bigInt({ min: TWO53 - 1000n, max: TWO53 + 1000n }),
  fc.bigInt({ min: 2n ** 26n - 100n, max: 2n ** 27n + 100n }),
  fc.bigInt({ min: 0n, max: 10n ** 30n }),
);
const fractionArb = fc
  .tuple(
    fc.boolean(),
    bigPart,
    bigPart.map((d) => (d === 0n ? 1n : d)),
  )
  .map(([neg, n, d]) => new Fraction(neg ? -n : n, d));
// Lengths as plans meet them: inch fractions and decimals times 127/5, half-millimetres, odd typed fractions.
const lengthArb = fc.oneof(
  fc.tuple(fc.integer({ min: -6400, max: 6400 }), fc.constantFrom(8, 16, 32, 64)).map(([k, p]) => new Fraction(k * 127, p * 5)),
  fc.integer({ min: -10160, max: 10160 }).map((k) => new Fraction(k, 2)),
  fc.tuple(fc.integer({ min: -1e6, max: 1e6 }), fc.integer({ min: 1, max: 1e4 })).map(([n, d]) => new Fraction(n, d)),
);
const anyArb = fc.oneof(fractionArb, lengthArb);

/** The Exact is the Fraction, and held small exactly when it fits, in lowest terms. */
function same(e: Exact, f: Fraction): void {
  expect(e.toFraction().equals(f)).toBe(true);
  const fits = f.n <= SAFE && f.d <= SAFE;
  expect(e.big === null).toBe(fits);
  if (fits) {
    expect(e.n).toBe(f.n === 0n ? 0 : Number(f.s * f.n));
    expect(e.d).toBe(Number(f.d));
    expect(gcd(Math.abs(e.n), e.d)).toBe(1);
    expect(Object.is(e.n, -0)).toBe(false);
  }
}

describe('Exact: the safe-integer layer agrees with fraction.js', () => {
  it('every operation gives the same value as fraction.js, small or past 2^53 (fallback)', () => {
    fc.assert(
      fc.property(anyArb, anyArb, (a, b) => {
        const x = Exact.from(a);
        const y = Exact.from(b);
        same(x, a);
        same(x.add(y), a.add(b));
        same(x.sub(y), a.sub(b));
        same(x.mul(y), a.mul(b));
        if (b.n !== 0n) same(x.div(y), a.div(b));
        else expect(() => x.div(y)).toThrow(RangeError);
        same(x.neg(), a.neg());
        same(x.abs(), a.abs());
        same(x.half(), a.div(2));
        same(x.twice(), a.mul(2));
        expect(x.compare(y)).toBe(Math.sign(a.compare(b)));
        expect(x.equals(y)).toBe(a.equals(b));
        expect(x.sign()).toBe(a.n === 0n ? 0 : Number(a.s));
        expect(x.isZero()).toBe(a.n === 0n);
      }),
      { numRuns: 2000 },
    );
  });

  it('the nearest number is the correctly rounded quotient while small, and fraction.js valueOf past 2^53', () => {
    fc.assert(
      fc.property(anyArb, (a) => {
        expect(Exact.from(a).valueOf()).toBe(a.valueOf());
      }),
    );
  });

  it('products and sums just past 2^53 fall back instead of rounding (arithmetic)', () => {
    const big = Exact.ratio(Number.MAX_SAFE_INTEGER, 1);
    expect(big.add(Exact.int(1)).big).not.toBeNull();
    expect(big.add(Exact.int(1)).toFraction().equals(new Fraction(TWO53))).toBe(true);
    const p = Exact.ratio(2 ** 27 + 1, 3).mul(Exact.ratio(2 ** 27 + 3, 7));
    expect(p.toFraction().equals(new Fraction((2n ** 27n + 1n) * (2n ** 27n + 3n), 21n))).toBe(true);
    // and back to small once a result fits again
    expect(big.add(Exact.int(1)).sub(Exact.int(2)).big).toBeNull();
    expect(
      Exact.ratio(1, 2 ** 30)
        .mul(Exact.ratio(1, 2 ** 30))
        .mul(Exact.int(2 ** 40))
        .equals(Exact.ratio(1, 2 ** 20)),
    ).toBe(true);
  });

  it('arithmetic laws: commutative, associative, distributive, inverses', () => {
    fc.assert(
      fc.property(anyArb, anyArb, anyArb, (a, b, c) => {
        const [x, y, z] = [Exact.from(a), Exact.from(b), Exact.from(c)];
        expect(x.add(y).equals(y.add(x))).toBe(true);
        expect(x.mul(y).equals(y.mul(x))).toBe(true);
        expect(
          x
            .add(y)
            .add(z)
            .equals(x.add(y.add(z))),
        ).toBe(true);
        expect(
          x
            .mul(y)
            .mul(z)
            .equals(x.mul(y.mul(z))),
        ).toBe(true);
        expect(x.mul(y.add(z)).equals(x.mul(y).add(x.mul(z)))).toBe(true);
        expect(x.sub(x).isZero()).toBe(true);
        expect(x.add(y).sub(y).equals(x)).toBe(true);
        if (!y.isZero()) expect(x.div(y).mul(y).equals(x)).toBe(true);
        expect(x.half().twice().equals(x)).toBe(true);
        expect(x.neg().neg().equals(x)).toBe(true);
      }),
      { numRuns: 500 },
    );
  });

  it('ratio reduces, normalises the sign and refuses non-integers and 0 below the line', () => {
    expect([Exact.ratio(6, -4).n, Exact.ratio(6, -4).d]).toEqual([-3, 2]);
    expect(Object.is(Exact.ratio(-0, 5).n, 0)).toBe(true);
    expect(() => Exact.ratio(1, 0)).toThrow(RangeError);
    expect(() => Exact.ratio(1.5, 2)).toThrow(RangeError);
    expect(() => Exact.ratio(2 ** 53, 1)).toThrow(RangeError);
  });
});

describe('the engine helpers on Exact agree with their fraction.js versions', () => {
  const scale = fc.constantFrom<[number, number]>([40, 127], [80, 127], [160, 127], [2, 1], [5, 1]);

  it('rounding and flooring to display steps', () => {
    fc.assert(
      fc.property(anyArb, scale, (a, [p, q]) => {
        if (a.abs().compare(1e12) > 0) return;
        const x = Exact.from(a);
        expect(roundExactSteps(x, p, q)).toBe(roundSteps(a, p, q));
        expect(floorExactSteps(x, p, q)).toBe(floorSteps(a, p, q));
        expect(formatExactQ(x, 'in', 32)).toBe(formatExact(a, 'in', 32));
        expect(formatExactQ(x, 'cm', 16)).toBe(formatExact(a, 'cm', 16));
      }),
      { numRuns: 1000 },
    );
  });

  it('numbers typed in a unit (any double, times 127/5, 10 or 1)', () => {
    const unit = fc.constantFrom<[number, number]>([127, 5], [10, 1], [1, 1]);
    const x = fc.oneof(
      fc.double({ noNaN: true, noDefaultInfinity: true }),
      fc.integer({ min: -8000, max: 8000 }).map((k) => k / 64),
      fc.integer({ min: -99999, max: 99999 }).map((k) => k / 1000),
    );
    fc.assert(
      fc.property(x, unit, (v, [a, b]) => {
        same(exactFromNumber(v, a, b), fractionFromNumber(v, a, b));
      }),
      { numRuns: 1000 },
    );
  });

  it('typed terms and the range check', () => {
    const text = fc.oneof(
      fc.tuple(fc.nat(300), fc.nat(99), fc.integer({ min: 1, max: 128 })).map(([w, n, d]) => `${w} ${n % d}/${d}`),
      fc.tuple(fc.nat(9999), fc.nat(99999)).map(([w, f]) => `${w}.${f}`),
      fc.tuple(fc.nat(10 ** 11), fc.integer({ min: 1, max: 10 ** 11 })).map(([n, d]) => `${n}/${d}`),
      fc.stringMatching(/^[0-9]{1,20}(\.[0-9]{1,14})?$/),
    );
    fc.assert(
      fc.property(text, fc.constantFrom('in' as const, 'cm' as const, 'mm' as const), (t, unit) => {
        const terms = readLengthTerms(t);
        const f = termMm(terms[0]!, unit);
        const e = termExact(terms[0]!, unit);
        same(e, f);
        let fromFraction: unknown = null;
        let fromExact: unknown = null;
        try {
          checkRange(f);
        } catch (err) {
          fromFraction = (err as Error).message;
        }
        try {
          checkRangeExact(e);
        } catch (err) {
          fromExact = (err as Error).message;
        }
        expect(fromExact).toBe(fromFraction);
      }),
      { numRuns: 1000 },
    );
  });

  it('plain typed text read by the quick pattern gives what the full reader gives, refusals included', () => {
    const digits = fc.stringMatching(/^[0-9]{1,17}$/);
    const space = fc.constantFrom('', ' ', '  ', '\t', '\u00a0', '\u200b');
    const text = fc.oneof(
      fc.tuple(space, fc.constantFrom('', '-', '- ', '+'), digits, space).map(([s1, sign, w, s2]) => `${s1}${sign}${w}${s2}`),
      fc.tuple(fc.constantFrom('', '-'), fc.option(digits), digits).map(([sign, w, f]) => `${sign}${w ?? ''}.${f}`),
      fc
        .tuple(fc.constantFrom('', '-'), fc.option(digits), space, digits, digits)
        .map(([sign, w, sp, n, d]) => `${sign}${w === null ? '' : `${w}${sp || ' '}`}${n}/${d}`),
      fc.tuple(fc.nat(40), fc.nat(40), fc.nat(40)).map(([w, n, d]) => `${w} ${n}/${d}`),
      fc.constantFrom('1 1/2 in', '38 mm', '1½', '1-1/2', '3,8', '1 1/2 + 1/8', '', ' ', '.', '5.', '1/0', '1 3/3', '0 0/1'),
    );
    const outcome = (f: () => Fraction) => {
      try {
        return f().toFraction();
      } catch (e) {
        return `${(e as { code?: string }).code}: ${(e as Error).message}`;
      }
    };
    fc.assert(
      fc.property(text, fc.constantFrom('in' as const, 'cm' as const, 'mm' as const), (t, unit) => {
        expect(outcome(() => readExact(t, unit).toFraction())).toBe(outcome(() => parseExact(t, unit)));
      }),
      { numRuns: 2000 },
    );
  });
});

describe('readExact remembers texts it has read', () => {
  it('keeps each unit apart, stays right past its bound, and refuses bad text every time', () => {
    // 1 1/2 in = 38.1 mm = 381/10 (1 in = 25.4 mm exactly, NIST SP 811); 1 1/2 cm = 15 mm; 1 1/2 mm as typed.
    for (let round = 0; round < 2; round++) {
      expect(readExact('1 1/2', 'in').toFraction().equals(new Fraction(381, 10))).toBe(true);
      expect(readExact('1 1/2', 'cm').toFraction().equals(new Fraction(15))).toBe(true);
      expect(readExact('1 1/2', 'mm').toFraction().equals(new Fraction(3, 2))).toBe(true);
      expect(() => readExact('1 1/0', 'in')).toThrow();
    }
    // More distinct texts than the memo holds (512 per unit): each still reads as parseExact reads it.
    for (let k = 1; k <= 1200; k++) {
      const t = (k / 10).toFixed(1);
      expect(readExact(t, 'in').toFraction().equals(parseExact(t, 'in'))).toBe(true);
    }
    expect(readExact('1 1/2', 'in').toFraction().equals(new Fraction(381, 10))).toBe(true);
  });
});
