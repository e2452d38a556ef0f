import type Fraction from 'fraction.js';
import { formatExact, roundRatio, stepRatio, stepsText } from './format-length';
import type { Len, Precision, Unit } from './types';

/** Makes Len values in one plan's unit and precision; `negate` shows −mm without building it. */
export type LenMaker = (mm: Fraction, negate?: boolean) => Len;

const SAFE = Number.MAX_SAFE_INTEGER;

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

/** The exact mm as the nearest JS number (the quick way while numerator and denominator are exact numbers). */
export function mmNumber(mm: Fraction): number {
  const n = Number(mm.n);
  const d = Number(mm.d);
  if (n <= SAFE && d <= SAFE) return mm.s < 0n ? -n / d : n / d;
  return fractionNumber(mm);
}

/** A Len maker for a unit and precision: exact mm as a number plus the display text. */
export function lenMaker(unit: Unit, precision: Precision): LenMaker {
  const [a, b] = stepRatio(unit, precision);
  return (mm, negate = false) => {
    // One BigInt-to-number conversion serves both the number and the text (the hot path of every plan).
    const n = Number(mm.n);
    const d = Number(mm.d);
    const neg = mm.n !== 0n && mm.s < 0n !== negate;
    const q = n <= SAFE && d <= SAFE ? roundRatio(n, d, a, b) : Number.NaN;
    if (Number.isNaN(q)) {
      const exact = negate ? mm.neg() : mm;
      return { mm: fractionNumber(exact), text: formatExact(exact, unit, precision) };
    }
    return { mm: neg ? -n / d : n / d, text: stepsText(q === 0 ? 0 : neg ? -q : q, unit, precision) };
  };
}

/**
 * Compare two exact lengths (b negated when asked), given their nearest numbers too: the numbers
 * settle it when clearly apart (each is within a rounding of its exact value), the Fractions when close.
 */
export function compareExact(a: Fraction, aMm: number, b: Fraction, bMm: number, negateB = false): number {
  const gap = aMm - bMm;
  const margin = 1e-12 * (1 + Math.abs(aMm) + Math.abs(bMm));
  if (gap > margin) return 1;
  if (gap < -margin) return -1;
  return a.compare(negateB ? b.neg() : b);
}
