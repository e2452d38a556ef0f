// Exact lengths for the engine's hot path. A plan's lengths are small rationals (inputs in 1/16 in,
// 0.5 mm, decimals; 1 in = 127/5 mm), so they are held as a numerator and denominator in safe
// integers, which plain double arithmetic handles exactly and far faster than BigInt. Any step whose
// exact result would pass 2^53 is redone with fraction.js (BigInt) and the value stays big until a
// later result fits again: the answers are always exact, whatever is typed (1/3, 1e-3, huge sums).
import Fraction from 'fraction.js';

const SAFE = Number.MAX_SAFE_INTEGER;
const SAFE_BIG = BigInt(SAFE);

/** Greatest common divisor of two non-negative safe integers (Euclid; gcd(0, b) = b). */
export function gcd(a: number, b: number): number {
  while (b !== 0) {
    const t = a % b;
    a = b;
    b = t;
  }
  return a;
}

/** Least common multiple of two positive safe integers (past 2^53 it is only a bound: callers check). */
export function lcm(a: number, b: number): number {
  // Most denominators a plan meets divide one another (5, 10, 40, 80): one quotient decides. A
  // quotient of safe integers is whole exactly when it divides (a float % is a call to fmod).
  const q = a / b;
  if (Math.floor(q) === q) return a;
  const r = b / a;
  if (Math.floor(r) === r) return b;
  return (a / gcd(a, b)) * b;
}

/** lcm(D, d) while building up a common denominator D: no call when d divides D (typed lengths mostly share one). */
export function joinDenominator(D: number, d: number): number {
  // A quotient of safe integers is whole exactly when it divides.
  const q = D / d;
  return Math.floor(q) === q ? D : lcm(D, d);
}

/**
 * A Fraction as a JS number even when its numerator and denominator overflow a double: fraction.js's
 * valueOf divides Number(n) by Number(d), which is ∞/∞ = NaN past 1e308 and would flip a sign check.
 */
export function fractionNumber(f: Fraction): number {
  let n = f.n;
  let d = f.d;
  const bits = Math.max(n.toString(2).length, d.toString(2).length);
  if (bits > 1000) {
    // Drop the same low bits from both: the quotient keeps far more than a double's 53 bits.
    const shift = BigInt(bits - 1000);
    n >>= shift;
    d >>= shift;
    if (d === 0n) return f.s < 0n ? -Infinity : Infinity;
  }
  const q = Number(n) / Number(d);
  return f.s < 0n ? -q : q;
}

/**
 * An exact rational number (the engine's lengths, in mm). While it fits, `n`/`d` hold it in lowest
 * terms with 0 < d ≤ 2^53 − 1 and |n| ≤ 2^53 − 1, and `big` is null; otherwise `big` holds it and
 * `n`, `d` are 0 and 1. Immutable; the method names follow fraction.js.
 */
export class Exact {
  /** Not for callers: use Exact.ratio, Exact.int or Exact.from, which keep the invariant. */
  constructor(
    /** signed numerator in lowest terms (0 when big) */
    readonly n: number,
    /** positive denominator (1 when big) */
    readonly d: number,
    /** the value when it does not fit safe integers, else null */
    readonly big: Fraction | null,
  ) {}

  /** n/d for safe integers n and d ≠ 0, any signs, reduced here. */
  static ratio(n: number, d: number): Exact {
    if (d === 0) throw new RangeError('Division by zero');
    if (n === 0) return ZERO;
    if (!Number.isSafeInteger(n) || !Number.isSafeInteger(d)) throw new RangeError(`not safe integers: ${n}/${d}`);
    if (d < 0) {
      n = -n;
      d = -d;
    }
    const g = gcd(n < 0 ? -n : n, d);
    return g === 1 ? new Exact(n, d, null) : new Exact(n / g, d / g, null);
  }

  /** A whole number (a safe integer). */
  static int(n: number): Exact {
    return Exact.ratio(n, 1);
  }

  /** The same value as a fraction.js Fraction; held small again when it fits. */
  static from(f: Fraction): Exact {
    const n = f.n;
    const d = f.d;
    if (n <= SAFE_BIG && d <= SAFE_BIG) {
      if (n === 0n) return ZERO;
      return new Exact(f.s < 0n ? -Number(n) : Number(n), Number(d), null);
    }
    return new Exact(0, 1, f);
  }

  /** The value as a fraction.js Fraction (for callers outside the hot path). */
  toFraction(): Fraction {
    return this.big ?? new Fraction(this.n, this.d);
  }

  /** n·(D/d): this value as a numerator over D, for D a multiple of d (small values only). */
  over(D: number): number {
    return this.n * (D / this.d);
  }

  /** −1, 0 or 1. */
  sign(): -1 | 0 | 1 {
    if (this.big === null) return this.n > 0 ? 1 : this.n < 0 ? -1 : 0;
    return this.big.n === 0n ? 0 : this.big.s < 0n ? -1 : 1;
  }

  /** True when the value is 0. */
  isZero(): boolean {
    return this.big === null ? this.n === 0 : this.big.n === 0n;
  }

  /** The nearest JS number (the correctly rounded quotient while small; a close one when big, even past 1e308). */
  valueOf(): number {
    return this.big === null ? this.n / this.d : fractionNumber(this.big);
  }

  /** −this. */
  neg(): Exact {
    if (this.big !== null) return new Exact(0, 1, this.big.neg());
    return this.n === 0 ? this : new Exact(-this.n, this.d, null);
  }

  /** |this|. */
  abs(): Exact {
    if (this.big !== null) return this.big.s < 0n ? new Exact(0, 1, this.big.abs()) : this;
    return this.n < 0 ? new Exact(-this.n, this.d, null) : this;
  }

  /** this + o. */
  add(o: Exact): Exact {
    if (this.big === null && o.big === null) {
      const r = addSmall(this.n, this.d, o.n, o.d);
      if (r !== null) return r;
    }
    return Exact.from(this.toFraction().add(o.toFraction()));
  }

  /** this − o. */
  sub(o: Exact): Exact {
    if (this.big === null && o.big === null) {
      const r = addSmall(this.n, this.d, -o.n, o.d);
      if (r !== null) return r;
    }
    return Exact.from(this.toFraction().sub(o.toFraction()));
  }

  /** this × o. */
  mul(o: Exact): Exact {
    if (this.big === null && o.big === null) {
      const r = mulSmall(this.n, this.d, o.n, o.d);
      if (r !== null) return r;
    }
    return Exact.from(this.toFraction().mul(o.toFraction()));
  }

  /** this ÷ o (throws RangeError on 0, as fraction.js throws on division by zero). */
  div(o: Exact): Exact {
    if (o.isZero()) throw new RangeError('Division by zero');
    if (this.big === null && o.big === null) {
      const r = o.n < 0 ? mulSmall(this.n, this.d, -o.d, -o.n) : mulSmall(this.n, this.d, o.d, o.n);
      if (r !== null) return r;
    }
    return Exact.from(this.toFraction().div(o.toFraction()));
  }

  /** this ÷ 2. */
  half(): Exact {
    if (this.big === null) {
      if (this.n % 2 === 0) return this.n === 0 ? this : new Exact(this.n / 2, this.d, null);
      if (this.d * 2 <= SAFE) return new Exact(this.n, this.d * 2, null);
    }
    return Exact.from(this.toFraction().div(2));
  }

  /** this × 2. */
  twice(): Exact {
    if (this.big === null) {
      if (this.d % 2 === 0) return new Exact(this.n, this.d / 2, null);
      if (Math.abs(this.n * 2) <= SAFE) return new Exact(this.n * 2, this.d, null);
    }
    return Exact.from(this.toFraction().mul(2));
  }

  /** −1, 0 or 1 as this is less than, equal to or more than o. */
  compare(o: Exact): -1 | 0 | 1 {
    if (this.big === null && o.big === null) {
      if (this.d === o.d) return this.n < o.n ? -1 : this.n > o.n ? 1 : 0;
      const x = this.n * o.d;
      const y = o.n * this.d;
      if (Math.abs(x) <= SAFE && Math.abs(y) <= SAFE) return x < y ? -1 : x > y ? 1 : 0;
    }
    const c = this.toFraction().compare(o.toFraction());
    return c < 0 ? -1 : c > 0 ? 1 : 0;
  }

  /** True when both are the same number. */
  equals(o: Exact): boolean {
    return this.compare(o) === 0;
  }
}

// a/b + c/d in lowest terms (Knuth 4.5.1: only gcd(t, g) can remain), or null when a step passes 2^53.
function addSmall(a: number, b: number, c: number, d: number): Exact | null {
  if (b === d) {
    const t = a + c;
    if (Math.abs(t) > SAFE) return null;
    if (t === 0) return ZERO;
    if (b === 1) return new Exact(t, 1, null);
    const g = gcd(t < 0 ? -t : t, b);
    return g === 1 ? new Exact(t, b, null) : new Exact(t / g, b / g, null);
  }
  const g = gcd(b, d);
  const b1 = b / g;
  const d1 = d / g;
  const x = a * d1;
  const y = c * b1;
  const t = x + y;
  if (Math.abs(x) > SAFE || Math.abs(y) > SAFE || Math.abs(t) > SAFE) return null;
  if (t === 0) return ZERO;
  const g2 = g === 1 ? 1 : gcd(t < 0 ? -t : t, g);
  const den = b1 * (d / g2);
  if (den > SAFE) return null;
  return new Exact(g2 === 1 ? t : t / g2, den, null);
}

// (a/b)·(c/d) in lowest terms with d > 0, cancelling crosswise first; null when a product passes 2^53.
function mulSmall(a: number, b: number, c: number, d: number): Exact | null {
  if (a === 0 || c === 0) return ZERO;
  const g1 = gcd(a < 0 ? -a : a, d);
  const g2 = gcd(c < 0 ? -c : c, b);
  const n = (a / g1) * (c / g2);
  const den = (b / g2) * (d / g1);
  if (Math.abs(n) > SAFE || den > SAFE) return null;
  return new Exact(n, den, null);
}

/** 0, exactly. */
export const ZERO = new Exact(0, 1, null);
