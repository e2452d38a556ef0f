import type Fraction from 'fraction.js';
import type { ExactDefaults } from './defaults';
import { floorSteps, stepRatio, stepsToMm } from './format-length';
import type { LenMaker } from './len';
import type { CuffAlternatives, Precision, Unit } from './types';

/** What the alternatives need of a short cuff plan. */
export interface AlternativesContext {
  available: Fraction;
  /** 2 × (cuff depth + turn of cloth): the inner fold's distance below the mark */
  innerFold: Fraction;
  clothThickness: Fraction;
  unit: Unit;
  precision: Precision;
  defaults: ExactDefaults;
  len: LenMaker;
}

// Shallowest and deepest cuff in whole display steps, per unit and precision: constants, worked out once.
const limits = new Map<string, [number, number]>();

function cuffLimitSteps(unit: Unit, precision: Precision, defaults: ExactDefaults): [number, number] {
  const key = `${unit}/${precision}`;
  let found = limits.get(key);
  if (found === undefined) {
    const [a, b] = stepRatio(unit, precision);
    found = [-floorSteps(defaults.shallowestCuff.neg(), a, b), floorSteps(defaults.maxCuffDepth, a, b)];
    limits.set(key, found);
  }
  return found;
}

/** The deepest three-equal-section cuff (exact mm, down to the display step) that fits, or null under the shallowest. */
export function deepestCuff(ctx: AlternativesContext): Fraction | null {
  const { available, clothThickness: t, unit, precision, defaults } = ctx;
  const room = t.n === 0n ? available : available.sub(t.mul(2));
  const [a, b] = stepRatio(unit, precision);
  const [shallowest, deepest] = cuffLimitSteps(unit, precision, defaults);
  const steps = Math.min(floorSteps(room, a, 3 * b), deepest);
  return steps < shallowest ? null : stepsToMm(steps, unit, precision);
}

/** What still fits when the cloth is short: a shallower cuff, a plain hem, or a faced cuff. */
export function cuffAlternatives(ctx: AlternativesContext): CuffAlternatives {
  const { available, innerFold, defaults, len } = ctx;
  const deepest = deepestCuff(ctx);
  // A faced cuff keeps the two outer sections in the trouser cloth; a seam joins the facing (from memory).
  const faced = innerFold.add(defaults.facingSeam);
  return {
    deepestCuff: deepest === null ? null : len(deepest),
    plainHem: { required: len(defaults.hemAllowance), fits: available.compare(defaults.hemAllowance) >= 0 },
    facedCuff: { required: len(faced), fits: available.compare(faced) >= 0 },
  };
}
