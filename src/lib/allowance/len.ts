import type Fraction from 'fraction.js';
import { formatExact } from './format-length';
import type { Len, Precision, Unit } from './types';

/** Makes Len values in one plan's unit and precision. */
export type LenMaker = (mm: Fraction) => Len;

const SAFE = Number.MAX_SAFE_INTEGER;

/** The exact mm as the nearest JS number (the quick way while numerator and denominator are exact numbers). */
export function mmNumber(mm: Fraction): number {
  const n = Number(mm.n);
  const d = Number(mm.d);
  if (n <= SAFE && d <= SAFE) return mm.s < 0n ? -n / d : n / d;
  return mm.valueOf();
}

/** A Len maker for a unit and precision: exact mm as a number plus the display text. */
export function lenMaker(unit: Unit, precision: Precision): LenMaker {
  return (mm) => ({ mm: mmNumber(mm), text: formatExact(mm, unit, precision) });
}
