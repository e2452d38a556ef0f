import Fraction from 'fraction.js';
import { AllowanceError } from './allowance-error';
import { Exact } from './exact';
import { fractionFromNumber } from './exact-number';
import type { Precision, Unit } from './types';
import { isPrecision, isUnit } from './units';

/** An inch length split for drawing a stacked fraction: sign, whole inches, and a reduced num/den. */
export interface SplitFraction {
  /** -1, 0 (rounds to zero) or 1 */
  sign: -1 | 0 | 1;
  whole: number;
  /** 0 when the length is whole inches */
  num: number;
  /** 1 when the length is whole inches, else a power of two up to the precision */
  den: number;
}

/** Largest |mm| formatLength takes: keeps every step count an exact JS integer. */
export const FORMAT_LIMIT_MM = 1e12;

const SAFE = Number.MAX_SAFE_INTEGER;

/** Round n·a / (d·b) to the nearest integer, ties up, for non-negative exact integers n, d (or NaN past 2^53). */
export function roundRatio(n: number, d: number, a: number, b: number): number {
  const num = n * a;
  const den = d * b;
  if (!(num <= SAFE && den <= SAFE)) return Number.NaN;
  let q = Math.floor(num / den);
  let r = num - q * den;
  if (r < 0) {
    q -= 1;
    r += den;
  } else if (r >= den) {
    q += 1;
    r -= den;
  }
  return 2 * r >= den ? q + 1 : q;
}

/**
 * Round (mm · a / b) to the nearest integer, ties away from zero, exactly.
 * Plain numbers while they stay exact integers (the hot path); BigInt beyond. The answer is a
 * JS number, so it is exact while the step count stays below 2^53 (formatLength keeps it there).
 */
export function roundSteps(mm: Fraction, a: number, b: number): number {
  let q = roundRatio(Number(mm.n), Number(mm.d), a, b);
  if (Number.isNaN(q)) {
    const bn = mm.n * BigInt(a);
    const bd = mm.d * BigInt(b);
    let bq = bn / bd;
    if (2n * (bn - bq * bd) >= bd) bq += 1n;
    q = Number(bq);
  }
  return q === 0 ? 0 : mm.s < 0n ? -q : q;
}

/** Round (mm · a / b) down (towards −∞) to an integer, exactly. */
export function floorSteps(mm: Fraction, a: number, b: number): number {
  const num = Number(mm.n) * a;
  const den = Number(mm.d) * b;
  if (num <= SAFE && den <= SAFE) {
    let q = Math.floor(num / den);
    const r = num - q * den;
    if (r < 0) q -= 1;
    else if (r >= den) q += 1;
    if (mm.s > 0n) return q;
    return q * den === num ? -q : -q - 1;
  }
  const bn = mm.s * mm.n * BigInt(a);
  const bd = mm.d * BigInt(b);
  let q = bn / bd;
  if (q * bd > bn) q -= 1n;
  return Number(q);
}

/** roundSteps for an Exact: plain numbers while small, fraction.js when big. */
export function roundExactSteps(mm: Exact, a: number, b: number): number {
  if (mm.big !== null) return roundSteps(mm.big, a, b);
  const n = mm.n;
  if (n === 0) return 0;
  const q = roundRatio(n < 0 ? -n : n, mm.d, a, b);
  if (Number.isNaN(q)) return roundSteps(mm.toFraction(), a, b);
  return q === 0 ? 0 : n < 0 ? -q : q;
}

/** floorSteps for an Exact: plain numbers while small, fraction.js when big. */
export function floorExactSteps(mm: Exact, a: number, b: number): number {
  if (mm.big !== null) return floorSteps(mm.big, a, b);
  const num = mm.n * a;
  const den = mm.d * b;
  if (Math.abs(num) > SAFE || den > SAFE) return floorSteps(mm.toFraction(), a, b);
  let q = Math.floor(num / den);
  // The float quotient can be one off either way: correct it with the exact remainder.
  const r = num - q * den;
  if (r < 0) q -= 1;
  else if (r >= den) q += 1;
  return q;
}

/** Exact mm of a whole number of display steps, as an Exact. */
export function stepsToExact(steps: number, unit: Unit, precision: Precision): Exact {
  const [a, b] = stepRatio(unit, precision);
  return Exact.ratio(steps * b, a);
}

/** The display step of a unit as (a, b): one step is b/a mm (1/p in = 127/(5p) mm; 0.5 mm metric). */
export function stepRatio(unit: Unit, precision: Precision): [number, number] {
  return unit === 'in' ? [5 * precision, 127] : [2, 1];
}

/** Exact mm of a whole number of display steps. */
export function stepsToMm(steps: number, unit: Unit, precision: Precision): Fraction {
  const [a, b] = stepRatio(unit, precision);
  return new Fraction(steps * b, a);
}

function inchText(steps: number, precision: number): string {
  if (steps === 0) return '0 in';
  const abs = steps < 0 ? -steps : steps;
  const whole = Math.floor(abs / precision);
  let num = abs - whole * precision;
  let den = precision;
  while (num !== 0 && num % 2 === 0) {
    num /= 2;
    den /= 2;
  }
  const sign = steps < 0 ? '-' : '';
  if (num === 0) return `${sign}${whole} in`;
  return whole === 0 ? `${sign}${num}/${den} in` : `${sign}${whole} ${num}/${den} in`;
}

function mmText(halfMm: number): string {
  const abs = halfMm < 0 ? -halfMm : halfMm;
  const sign = halfMm < 0 ? '-' : '';
  return abs % 2 === 0 ? `${sign}${abs / 2} mm` : `${sign}${(abs - 1) / 2}.5 mm`;
}

function cmText(halfMm: number): string {
  const abs = halfMm < 0 ? -halfMm : halfMm;
  const sign = halfMm < 0 ? '-' : '';
  const hundredths = abs * 5;
  const whole = Math.floor(hundredths / 100);
  const rest = hundredths - whole * 100;
  if (rest === 0) return `${sign}${whole} cm`;
  if (rest % 10 === 0) return `${sign}${whole}.${rest / 10} cm`;
  return `${sign}${whole}.${rest < 10 ? '0' : ''}${rest} cm`;
}

function buildText(steps: number, unit: Unit, precision: Precision): string {
  if (unit === 'in') return inchText(steps, precision);
  return unit === 'mm' ? mmText(steps) : cmText(steps);
}

// Texts of step counts within ±200 in (±10,160 half-mm) are kept once made, per unit and precision:
// every plan shows the same few dozen lengths, and building "1 9/16 in" each time was a plan's main cost.
const TEXT_RANGE = 10_240;
const texts: ((string | undefined)[] | undefined)[] = [];

/** The kept texts of one unit and precision, indexed by steps + STEPS_TEXT_RANGE (filled as stepsText makes them). */
export function stepsTextTable(unit: Unit, precision: Precision): (string | undefined)[] {
  const t = unit === 'in' ? precision : unit === 'mm' ? 1 : 2;
  return (texts[t] ??= new Array<string | undefined>(2 * TEXT_RANGE + 1).fill(undefined));
}

/** Step counts within ± this have their texts kept in stepsTextTable. */
export const STEPS_TEXT_RANGE = TEXT_RANGE;

/** The display text of a signed whole number of display steps. */
export function stepsText(steps: number, unit: Unit, precision: Precision): string {
  if (steps < -TEXT_RANGE || steps > TEXT_RANGE) return buildText(steps, unit, precision);
  return (stepsTextTable(unit, precision)[steps + TEXT_RANGE] ??= buildText(steps, unit, precision));
}

/** Format an exact length (mm) in a unit, rounded to the display step. */
export function formatExact(mm: Fraction, unit: Unit, precision: Precision = 16): string {
  const [a, b] = stepRatio(unit, precision);
  return stepsText(roundSteps(mm, a, b), unit, precision);
}

/** formatExact for an Exact. */
export function formatExactQ(mm: Exact, unit: Unit, precision: Precision = 16): string {
  const [a, b] = stepRatio(unit, precision);
  return stepsText(roundExactSteps(mm, a, b), unit, precision);
}

function exactFromDisplayNumber(mm: number): Fraction {
  if (!Number.isFinite(mm)) throw new AllowanceError('not-a-length', 'A length must be a finite number.');
  if (Math.abs(mm) > FORMAT_LIMIT_MM) throw new AllowanceError('too-large', 'This length is too large to show.');
  return fractionFromNumber(mm);
}

// Callers outside TypeScript (islands fed from JSON, scripts) can pass anything: 'ft' or 12 would print nonsense.
function checkPrecision(precision: unknown): Precision {
  if (precision === undefined) return 16;
  if (!isPrecision(precision)) throw new AllowanceError('bad-precision', 'Show inches to 1/8, 1/16 or 1/32.');
  return precision;
}

/** Show millimetres in a unit: inches to the nearest 1/precision ("1 9/16 in"), mm to 0.5 mm, cm to 0.05 cm. */
export function formatLength(mm: number, opts: { unit: Unit; precision?: Precision }): string {
  if (typeof opts !== 'object' || opts === null || !isUnit(opts.unit)) {
    throw new AllowanceError('bad-unit', 'Choose a unit: in, cm or mm.');
  }
  return formatExact(exactFromDisplayNumber(mm), opts.unit, checkPrecision(opts.precision));
}

/** Millimetres as inches rounded to 1/precision, split for a stacked fraction (same rounding as formatLength). */
export function splitFraction(mm: number, precision: Precision = 16): SplitFraction {
  checkPrecision(precision);
  const steps = roundSteps(exactFromDisplayNumber(mm), 5 * precision, 127);
  const abs = Math.abs(steps);
  const whole = Math.floor(abs / precision);
  let num = abs - whole * precision;
  let den: number = precision;
  while (num !== 0 && num % 2 === 0) {
    num /= 2;
    den /= 2;
  }
  if (num === 0) den = 1;
  return { sign: steps === 0 ? 0 : steps < 0 ? -1 : 1, whole, num, den };
}
