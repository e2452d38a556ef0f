import { Exact } from './exact';
import { formatExactQ, roundRatio, STEPS_TEXT_RANGE, stepRatio, stepsText, stepsTextTable } from './format-length';
import type { Len, Precision, Unit } from './types';

export { fractionNumber } from './exact';

/** Makes Len values in one plan's unit and precision; `negate` shows −mm without building it. */
export type LenMaker = (mm: Exact, negate?: boolean) => Len;

/** Makes Len values from n/d mm for safe integers n and d > 0, in lowest terms or not (same Len either way). */
export type RatioLenMaker = (n: number, d: number) => Len;

const RANGE = STEPS_TEXT_RANGE;

// n/d mm as a Len, one step being b/a mm; the kept texts in `table`. Every shown length goes through
// here, so it is one small plain function the makers below call (and the compiler inlines): the
// rare lengths past the safe integers go to bigRatioLen.
function ratioLen(n: number, d: number, unit: Unit, precision: Precision, a: number, b: number, table: (string | undefined)[]): Len {
  // `n === 0 ? 0` keeps a −0 (a negative times 0) from showing as mm: -0.
  const abs = n < 0 ? -n : n === 0 ? 0 : n;
  // Steps = abs·a / (d·b) rounded, ties up (NaN past the safe integers). Neither the steps nor the
  // nearest number (a correctly rounded quotient of two exact integers) depend on n/d being reduced.
  const q = roundRatio(abs, d, a, b);
  if (Number.isNaN(q)) return bigRatioLen(n, d, unit, precision);
  const steps = q === 0 ? 0 : n < 0 ? -q : q;
  const text = (steps >= -RANGE && steps <= RANGE ? table[steps + RANGE] : undefined) ?? stepsText(steps, unit, precision);
  return { mm: n < 0 ? -abs / d : abs / d, text };
}

// ratioLen past the safe integers, through Exact.
function bigRatioLen(n: number, d: number, unit: Unit, precision: Precision): Len {
  const exact = Exact.ratio(n, d);
  return { mm: exact.valueOf(), text: formatExactQ(exact, unit, precision) };
}

function makeRatioLen(unit: Unit, precision: Precision): RatioLenMaker {
  const [a, b] = stepRatio(unit, precision);
  const table = stepsTextTable(unit, precision);
  return (n, d) => ratioLen(n, d, unit, precision, a, b, table);
}

function makeLen(unit: Unit, precision: Precision): LenMaker {
  const [a, b] = stepRatio(unit, precision);
  const table = stepsTextTable(unit, precision);
  return (mm, negate = false) => {
    if (mm.big === null) return ratioLen(negate ? -mm.n : mm.n, mm.d, unit, precision, a, b, table);
    const exact = negate ? mm.neg() : mm;
    return { mm: exact.valueOf(), text: formatExactQ(exact, unit, precision) };
  };
}

function makers(unit: Unit): Record<Precision, [LenMaker, RatioLenMaker]> {
  const pair = (p: Precision): [LenMaker, RatioLenMaker] => [makeLen(unit, p), makeRatioLen(unit, p)];
  return { 8: pair(8), 16: pair(16), 32: pair(32) };
}

// One maker per unit and precision, made once: plans share them instead of making closures.
const MAKERS: Record<Unit, Record<Precision, [LenMaker, RatioLenMaker]>> = { in: makers('in'), cm: makers('cm'), mm: makers('mm') };

/** The Len maker for a unit and precision: exact mm as a number plus the display text. */
export function lenMaker(unit: Unit, precision: Precision): LenMaker {
  return MAKERS[unit][precision][0];
}

/** The Len maker for n/d mm given as two safe integers (no Exact built), in a unit and precision. */
export function ratioLenMaker(unit: Unit, precision: Precision): RatioLenMaker {
  return MAKERS[unit][precision][1];
}
