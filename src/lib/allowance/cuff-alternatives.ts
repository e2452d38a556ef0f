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

/** The deepest three-equal-section cuff (exact mm, down to the display step) that fits, or null under the shallowest. */
export function deepestCuff(ctx: AlternativesContext): Fraction | null {
  const { available, clothThickness: t, unit, precision, defaults } = ctx;
  const room = t.n === 0n ? available : available.sub(t.mul(2));
  const [a, b] = stepRatio(unit, precision);
  let depth = stepsToMm(floorSteps(room, a, 3 * b), unit, precision);
  if (depth.compare(defaults.maxCuffDepth) > 0) depth = defaults.maxCuffDepth;
  return depth.compare(defaults.shallowestCuff) < 0 ? null : depth;
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
