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

// The plain reader's place in the text, and the value and count of the digits it read last (module
// state rather than a closure per length read; nothing else touches them).
let i = 0;
let v = 0;
let k = 0;

// Reads up to 15 digits of text from i into v (their count in k); false when none or too many.
function digits(text: string): boolean {
  v = 0;
  k = 0;
  for (let c = text.charCodeAt(i); c >= 48 && c <= 57; c = text.charCodeAt(i)) {
    if (++k > 15) return false;
    v = v * 10 + (c - 48);
    i++;
  }
  return k > 0;
}

// ASCII white space, as the full reader skips it (any other character sends the text to the full reader).
function isSpace(c: number): boolean {
  return c === 32 || (c >= 9 && c <= 13);
}

// The shapes nearly everything typed takes: "1", "1.5", ".5", "3/4", "1 1/2", each maybe with a "-"
// before it and ASCII spaces round it, up to 15 digits a number. The exact mm of such text (the full
// reader's value for it), or null for anything else (units, sums, ½, commas, odd spacing) or digits
// past the safe integers: the full reader then works it out, or says why not.
function plainExact(text: string, unit: Unit): Exact | null {
  const end = text.length;
  if (end > 120) return null;
  i = 0;
  while (i < end && isSpace(text.charCodeAt(i))) i++;
  let sign = 1;
  if (text.charCodeAt(i) === 45) {
    sign = -1;
    i++;
  }
  let n: number;
  let d = 1;
  const first = text.charCodeAt(i);
  if (first === 46) {
    i++;
    if (!digits(text)) return null;
    n = v;
    d = 10 ** k;
  } else {
    if (!digits(text)) return null;
    n = v;
    const c = text.charCodeAt(i);
    if (c === 46) {
      i++;
      if (!digits(text)) return null;
      d = 10 ** k;
      n = n * d + v;
    } else if (c === 47) {
      i++;
      if (!digits(text) || v === 0) return null;
      d = v;
    } else if (isSpace(c)) {
      while (i < end && isSpace(text.charCodeAt(i))) i++;
      if (i < end) {
        const whole = n;
        if (!digits(text)) return null;
        const num = v;
        if (text.charCodeAt(i) !== 47) return null;
        i++;
        // 0 below the line, or a fraction not under 1 in a mixed number: the full reader says why.
        if (!digits(text) || v === 0 || num >= v) return null;
        d = v;
        n = whole * d + num;
      }
    }
  }
  while (i < end && isSpace(text.charCodeAt(i))) i++;
  if (i !== end) return null;
  const [a, b] = mmPerUnitRatio(unit);
  n *= a;
  d *= b;
  if (!Number.isSafeInteger(n) || !Number.isSafeInteger(d)) return null;
  return Exact.ratio(sign * n, d);
}

// Typed texts already read, per unit (in, cm, mm), to their checked exact mm: a plan reads the cuff
// depth for its cuff and again for its taper, and a batch of sheets or a day's fittings repeats the
// same few dozen texts. Bounded: emptied when full, so any stream of texts holds at most READ_MEMO
// entries per unit. Only texts that read cleanly are kept (an error is worked out again each time).
const READ_MEMO = 512;
const MEMO_TEXT_LENGTH = 40;
const readMemo: Record<Unit, Map<string, Exact>> = { in: new Map(), cm: new Map(), mm: new Map() };

/** The texts readExact has read cleanly in a unit, to its answers (the memo itself, read-only: look up, never set). */
export function keptTexts(unit: Unit): ReadonlyMap<string, Exact> {
  return readMemo[unit];
}

/** Typed text to an exact length in mm, as an Exact (parseExact's answer without building a Fraction for one term). */
export function readExact(text: string, unit: Unit): Exact {
  if (text.length > MEMO_TEXT_LENGTH) return readExactFresh(text, unit);
  const memo = readMemo[unit];
  let mm = memo.get(text);
  if (mm === undefined) {
    mm = readExactFresh(text, unit);
    if (memo.size >= READ_MEMO) memo.clear();
    memo.set(text, mm);
  }
  return mm;
}

function readExactFresh(text: string, unit: Unit): Exact {
  const plain = plainExact(text, unit);
  if (plain !== null) return checkRangeExact(plain);
  const terms = readLengthTerms(text);
  const units = termUnits(terms, unit);
  // As parseExact: each term exact, the terms added exactly (no mathjs).
  let mm = termExact(terms[0]!, units[0]!);
  for (let k = 1; k < terms.length; k++) mm = mm.add(termExact(terms[k]!, units[k]!));
  return checkRangeExact(mm);
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
