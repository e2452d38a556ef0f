// One set of formulas, two kinds of number: exact (Exact) when the geometry is rational (flare
// measured as two rounds and a height), floating point when a circle's π is in it (a flare given
// as a fraction of a circle or an angle). The formulas are written once over this interface.
import { type Exact, ZERO } from './exact';
import { floorExactSteps, stepRatio, stepsToExact } from './format-length';
import { lenMaker } from './len';
import { numberLen } from './notes';
import type { Len, Precision, Unit } from './types';

/** The arithmetic a kind's formulas need, over exact or floating numbers. */
export interface Arith<T> {
  of(x: Exact): T;
  add(a: T, b: T): T;
  sub(a: T, b: T): T;
  mul(a: T, b: T): T;
  div(a: T, b: T): T;
  /** −1, 0 or 1 */
  sign(a: T): -1 | 0 | 1;
  compare(a: T, b: T): -1 | 0 | 1;
  num(a: T): number;
  len(a: T): Len;
  /** the value rounded down to the display step */
  floorStep(a: T): T;
  zero: T;
}

/** Exact arithmetic in a unit and precision. */
export function exactArith(unit: Unit, precision: Precision): Arith<Exact> {
  const len = lenMaker(unit, precision);
  const [a, b] = stepRatio(unit, precision);
  return {
    of: (x) => x,
    add: (x, y) => x.add(y),
    sub: (x, y) => x.sub(y),
    mul: (x, y) => x.mul(y),
    div: (x, y) => x.div(y),
    sign: (x) => x.sign(),
    compare: (x, y) => x.compare(y),
    num: (x) => x.valueOf(),
    len: (x) => len(x),
    floorStep: (x) => stepsToExact(floorExactSteps(x, a, b), unit, precision),
    zero: ZERO,
  };
}

// Floating values this close to a step are taken as on it: π-bearing results are never exactly on one.
const STEP_SLACK = 1e-9;

/** Floating arithmetic in a unit and precision (lengths still shown through the exact rounding). */
export function floatArith(unit: Unit, precision: Precision): Arith<number> {
  const [a, b] = stepRatio(unit, precision);
  const sign = (x: number): -1 | 0 | 1 => (x > 0 ? 1 : x < 0 ? -1 : 0);
  return {
    of: (x) => x.valueOf(),
    add: (x, y) => x + y,
    sub: (x, y) => x - y,
    mul: (x, y) => x * y,
    div: (x, y) => x / y,
    sign,
    compare: (x, y) => sign(x - y),
    num: (x) => x,
    len: (x) => numberLen(x, unit, precision),
    floorStep: (x) => (Math.floor((x * a) / b + STEP_SLACK) * b) / a,
    zero: 0,
  };
}
