import Fraction from 'fraction.js';
import { Exact } from './exact';

const DECIMAL = /^(-?)(\d+)(?:\.(\d+))?(?:e([+-]?\d+))?$/;
const SAFE = Number.MAX_SAFE_INTEGER;

/**
 * A finite JS number times a/b, reading the number as the shortest decimal that prints as it
 * (0.1 → 1/10, 1.5 → 3/2). fraction.js's own number constructor approximates, which would not be exact.
 */
export function fractionFromNumber(x: number, a = 1, b = 1): Fraction {
  if (Number.isInteger(x) && Math.abs(x * a) <= SAFE) return new Fraction(x * a, b);
  // Fewest decimal places that give back x: the same digits String(x) prints, without building a string.
  if (Math.abs(x) < 1e6) {
    for (let p = 10; p <= 1e9; p *= 10) {
      const n = Math.round(x * p);
      if (n / p === x) {
        if (Math.abs(n * a) > SAFE) break;
        return new Fraction(n * a, p * b);
      }
    }
  }
  const m = DECIMAL.exec(String(x));
  if (m === null) throw new RangeError(`not a finite number: ${x}`);
  return fractionFromDecimal(m[1] === '-', m[2]!, m[3] ?? '', m[4] === undefined ? 0 : Number(m[4]))
    .mul(a)
    .div(b);
}

/** fractionFromNumber as an Exact: safe integers all the way for everyday inputs (1.5, 0.0625, 38). */
export function exactFromNumber(x: number, a = 1, b = 1): Exact {
  if (Number.isInteger(x) && Math.abs(x * a) <= SAFE) return Exact.ratio(x * a, b);
  if (Math.abs(x) < 1e6) {
    for (let p = 10; p <= 1e9; p *= 10) {
      const n = Math.round(x * p);
      if (n / p === x) {
        if (Math.abs(n * a) > SAFE || p * b > SAFE) break;
        return Exact.ratio(n * a, p * b);
      }
    }
  }
  return Exact.from(fractionFromNumber(x, a, b));
}

/** An exact Fraction from the digits of a decimal: sign, whole digits, decimal digits, power of ten. */
export function fractionFromDecimal(negative: boolean, whole: string, decimals: string, exp = 0): Fraction {
  const scale = decimals.length - exp;
  const digits = whole + decimals;
  // Small values stay in plain numbers: fraction.js is quicker without BigInts to build.
  if (digits.length <= 15 && scale >= 0 && scale <= 15) {
    const n = Number(digits);
    return new Fraction(negative ? -n : n, 10 ** scale);
  }
  let n = BigInt(digits);
  if (negative) n = -n;
  return scale >= 0 ? new Fraction(n, 10n ** BigInt(scale)) : new Fraction(n * 10n ** BigInt(-scale), 1n);
}
