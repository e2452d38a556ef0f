import Fraction from 'fraction.js';
import { AllowanceError } from './allowance-error';
import { formatExact } from './format-length';
import { Exact } from './exact';
import { fractionNumber } from './len';
import { type LengthTerm, readLengthTerms, termUnits } from './length-terms';
import type { Len, Precision, Unit } from './types';
import { isUnit, mmPerUnitRatio } from './units';

/** Largest length either way, in mm (200 in). */
export const LIMIT_MM = new Fraction(5080);

/** A term's exact value in mm, built straight with fraction.js (no expression evaluation). */
export function termMm(t: LengthTerm, unit: Unit): Fraction {
  const [a, b] = mmPerUnitRatio(unit);
  const whole = t.whole ?? '0';
  const dot = whole.indexOf('.');
  const wholeDigits = dot < 0 ? whole : whole.slice(0, dot) + whole.slice(dot + 1);
  const places = dot < 0 ? 0 : whole.length - dot - 1;
  const num = t.num ?? '0';
  const den = t.den ?? '1';
  // One construction for the whole term while the integers stay exact; BigInt beyond.
  if (wholeDigits.length + den.length <= 12 && num.length <= 12 && places <= 9) {
    const d = Number(den);
    const n = (Number(wholeDigits) * d + Number(num) * 10 ** places) * a;
    return new Fraction(t.sign * n, d * b * 10 ** places);
  }
  const d = BigInt(den);
  const n = (BigInt(wholeDigits) * d + BigInt(num) * 10n ** BigInt(places)) * BigInt(a);
  return new Fraction(BigInt(t.sign) * n, d * BigInt(b) * 10n ** BigInt(places));
}

/** termMm as an Exact: safe integers for everyday text ("1 1/2", "38.5"), fraction.js beyond. */
export function termExact(t: LengthTerm, unit: Unit): Exact {
  const whole = t.whole ?? '0';
  const num = t.num ?? '0';
  const den = t.den ?? '1';
  if (whole.length + den.length <= 12 && num.length <= 12) {
    const dot = whole.indexOf('.');
    const places = dot < 0 ? 0 : whole.length - dot - 1;
    const [a, b] = mmPerUnitRatio(unit);
    const wholeDigits = dot < 0 ? whole : whole.slice(0, dot) + whole.slice(dot + 1);
    const d = Number(den);
    const n = (Number(wholeDigits) * d + Number(num) * 10 ** places) * a;
    const dd = d * b * 10 ** places;
    if (Number.isSafeInteger(n) && Number.isSafeInteger(dd) && dd !== 0) return Exact.ratio(t.sign * n, dd);
  }
  return Exact.from(termMm(t, unit));
}

/** Smallest length told apart from nothing: a thousandth of a millimetre. */
export const LEAST_MM = new Fraction(1, 1000);

/** Check a length (mm) lies within ±200 in and is 0 or at least a thousandth of a mm; throws AllowanceError. */
export function checkRange(mm: Fraction): Fraction {
  // Below a thousandth of a mm a length is noise; held exactly its huge denominator overflows every float.
  if (mm.n !== 0n && mm.n * LEAST_MM.d < mm.d * LEAST_MM.n) {
    throw new AllowanceError('out-of-range', 'A length under a thousandth of a millimetre is not a length: type 0 or a real length.');
  }
  const v = mm.valueOf();
  // Exact comparison only near the limit.
  if ((v > 5079 || v < -5079) && mm.abs().compare(LIMIT_MM) > 0) {
    throw new AllowanceError('too-large', 'A length must be within 200 in (5080 mm) either way.');
  }
  return mm;
}

/** checkRange for an Exact (the same refusals and messages). */
export function checkRangeExact(mm: Exact): Exact {
  if (mm.big !== null) {
    checkRange(mm.big);
    return mm;
  }
  const n = mm.n < 0 ? -mm.n : mm.n;
  if (n !== 0 && n * 1000 < mm.d) checkRange(mm.toFraction());
  if (n > 5079 * mm.d) checkRange(mm.toFraction());
  return mm;
}

// The shapes nearly everything typed takes: "1", "1.5", ".5", "3/4", "1 1/2", each maybe with a "-"
// before it and spaces round it. Anything else (units, sums, ½, commas, odd spacing) goes through
// the full reader, which also gives every refusal its message.
const PLAIN = /^\s*(-?)(?:(\d{1,15}(?:\.\d{1,15})?|\.\d{1,15})|(?:(\d{1,15})\s+)?(\d{1,15})\/(\d{1,15}))\s*$/;

// The exact mm of plain text (the full reader's value for it), or null when the text is not plain or
// its digits pass the safe integers (the full reader then works it out with BigInt).
function plainExact(text: string, unit: Unit): Exact | null {
  if (text.length > 120) return null;
  const m = PLAIN.exec(text);
  if (m === null) return null;
  const [a, b] = mmPerUnitRatio(unit);
  const sign = m[1] === '-' ? -1 : 1;
  const decimal = m[2];
  let n: number;
  let d: number;
  if (decimal !== undefined) {
    const dot = decimal.indexOf('.');
    if (dot < 0) {
      n = Number(decimal);
      d = 1;
    } else {
      n = Number(decimal.slice(0, dot) + decimal.slice(dot + 1));
      d = 10 ** (decimal.length - dot - 1);
    }
  } else {
    d = Number(m[5]);
    const num = Number(m[4]);
    // 0 below the line, or a mixed number whose fraction is not under 1: the full reader says why.
    if (d === 0 || (m[3] !== undefined && num >= d)) return null;
    n = m[3] === undefined ? num : Number(m[3]) * d + num;
  }
  n *= a;
  d *= b;
  if (!Number.isSafeInteger(n) || !Number.isSafeInteger(d)) return null;
  return Exact.ratio(sign * n, d);
}

/** Typed text to an exact length in mm, as an Exact (parseExact's answer without building a Fraction for one term). */
export function readExact(text: string, unit: Unit): Exact {
  const plain = plainExact(text, unit);
  if (plain !== null) return checkRangeExact(plain);
  const terms = readLengthTerms(text);
  const units = termUnits(terms, unit);
  return checkRangeExact(terms.length === 1 ? termExact(terms[0]!, units[0]!) : Exact.from(evaluateTerms(terms, units)));
}

/**
 * Typed text to an exact length in mm: each term (a number, fraction or mixed number) built with
 * fraction.js and the terms added exactly. mathjs is left out on purpose: importing it costs about
 * half a second at server start; `parseExactWithMathjs` (length-expression.ts) checks this in tests.
 */
export function parseExact(text: string, unit: Unit): Fraction {
  const terms = readLengthTerms(text);
  const units = termUnits(terms, unit);
  let mm = termMm(terms[0]!, units[0]!);
  for (let k = 1; k < terms.length; k++) mm = mm.add(termMm(terms[k]!, units[k]!));
  return checkRange(mm);
}

/**
 * Typed text rewritten with every part's unit named ("30 + 5 mm" in an inch plan → "30 in + 5 mm"),
 * so it reads the same in a plan of another unit. Throws AllowanceError as parseLength does.
 */
export function withUnitsNamed(text: string, unit: Unit): string {
  const terms = readLengthTerms(text);
  const units = termUnits(terms, unit);
  return terms
    .map((t, k) => {
      const number = [t.whole, t.num === null ? null : `${t.num}/${t.den}`].filter((p) => p !== null).join(' ');
      const part = `${number} ${units[k]}`;
      return k === 0 ? (t.sign < 0 ? `-${part}` : part) : `${t.sign < 0 ? '-' : '+'} ${part}`;
    })
    .join(' ');
}

/** Read typed text ("1 1/2", "1½", "38 mm", "31 3/4 + 1/8") as a length; the unit is the plan's unless named. */
export function parseLength(text: string, unit: Unit, precision: Precision = 16): Len {
  if (typeof text !== 'string') throw new AllowanceError('not-a-length', 'A length must be given as text.');
  if (!isUnit(unit)) throw new AllowanceError('bad-unit', 'The unit must be in, cm or mm.', 'unit');
  const mm = parseExact(text, unit);
  return { mm: fractionNumber(mm), text: formatExact(mm, unit, precision) };
}
