import type { Exact } from './exact';
import type { ExactDefaults } from './defaults';
import { floorExactSteps, stepRatio, stepsToExact } from './format-length';
import type { LenMaker, RatioLenMaker } from './len';
import type { CuffAlternatives, Precision, Unit } from './types';

/** What the alternatives need of a short cuff plan. */
export interface AlternativesContext {
  available: Exact;
  /** the depth asked for: every cuff offered is shallower */
  cuffDepth: Exact;
  /** the third section asked for, and the turn-under it must hold */
  hemSection: Exact;
  turnUnder: Exact;
  /** 2 × (cuff depth + turn of cloth): the inner fold's distance below the mark */
  innerFold: Exact;
  clothThickness: Exact;
  unit: Unit;
  precision: Precision;
  defaults: ExactDefaults;
  len: LenMaker;
}

// Shallowest and deepest cuff in whole display steps, per unit and precision: constants, worked out once.
const limits: ([number, number] | undefined)[] = [];

/** The shallowest and deepest cuff in whole display steps of a unit and precision (worked out once each). */
export function cuffLimitSteps(unit: Unit, precision: Precision, defaults: ExactDefaults): [number, number] {
  // Indexed by a small number per unit and precision (inch precisions are 8, 16, 32; mm 1, cm 2).
  const key = unit === 'in' ? precision : unit === 'mm' ? 1 : 2;
  let found = limits[key];
  if (found === undefined) {
    const [a, b] = stepRatio(unit, precision);
    found = [-floorExactSteps(defaults.shallowestCuff.neg(), a, b), floorExactSteps(defaults.maxCuffDepth, a, b)];
    limits[key] = found;
  }
  return found;
}

/** The deepest three-equal-section cuff (exact mm, down to the display step) that fits, shallower than asked, or null under the shallowest. */
export function deepestCuff(ctx: Omit<AlternativesContext, 'hemSection' | 'turnUnder'>): Exact | null {
  const { available, cuffDepth, clothThickness: t, unit, precision, defaults } = ctx;
  const room = t.isZero() ? available : available.sub(t.add(t));
  const [a, b] = stepRatio(unit, precision);
  const [shallowest, deepest] = cuffLimitSteps(unit, precision, defaults);
  // Whole steps strictly under the asked depth: ceil(d / step) − 1. A "shallower" cuff is never as deep.
  const under = -floorExactSteps(cuffDepth.neg(), a, b) - 1;
  const steps = Math.min(floorExactSteps(room, a, 3 * b), deepest, under);
  return steps < shallowest ? null : stepsToExact(steps, unit, precision);
}

/**
 * The longest third section (down to the display step) that keeps the asked cuff depth and fits,
 * shorter than asked, holding the turn-under and a safe stitch above it, its stitching no higher than
 * the cuff top; else null.
 */
export function shorterSection(ctx: AlternativesContext): Exact | null {
  const { available, innerFold, hemSection, turnUnder, unit, precision, defaults } = ctx;
  const [a, b] = stepRatio(unit, precision);
  let room = stepsToExact(floorExactSteps(available.sub(innerFold), a, b), unit, precision);
  // No longer than the cuff and its turn-under, or the stitching would show above the cuff top.
  const highest = stepsToExact(floorExactSteps(ctx.cuffDepth.add(turnUnder), a, b), unit, precision);
  if (room.compare(highest) > 0) room = highest;
  const least = turnUnder.add(defaults.safeStitch);
  if (room.compare(least) < 0 || room.compare(hemSection) >= 0) return null;
  return room;
}

/** What still fits when the cloth is short: the same cuff on a shorter third section, a shallower cuff, a plain hem, or a faced cuff. */
export function cuffAlternatives(ctx: AlternativesContext): CuffAlternatives {
  const { available, innerFold, defaults, len } = ctx;
  const deepest = deepestCuff(ctx);
  const section = shorterSection(ctx);
  // A faced cuff keeps the two outer sections in the trouser cloth; a seam joins the facing (from memory).
  const faced = innerFold.add(defaults.facingSeam);
  return {
    shorterSection: section === null ? null : len(section),
    deepestCuff: deepest === null ? null : len(deepest),
    plainHem: { required: len(defaults.hemAllowance), fits: available.compare(defaults.hemAllowance) >= 0 },
    facedCuff: { required: len(faced), fits: available.compare(faced) >= 0 },
  };
}

/** What quickAlternatives needs: the short plan's lengths as integers over one denominator D mm. */
export interface QuickAlternativesContext {
  available: number;
  cuffDepth: number;
  hemSection: number;
  turnUnder: number;
  innerFold: number;
  clothThickness: number;
  /** the unit's safe stitch, facing seam and plain hem allowance over D */
  safeStitch: number;
  facingSeam: number;
  hemAllowance: number;
  D: number;
  unit: Unit;
  precision: Precision;
  defaults: ExactDefaults;
  ratio: RatioLenMaker;
}

// floor(n / d) for safe integers n and d > 0, exactly (the float quotient corrected by the remainder).
function floorDiv(n: number, d: number): number {
  let q = Math.floor(n / d);
  const r = n - q * d;
  if (r < 0) q -= 1;
  else if (r >= d) q += 1;
  return q;
}

/** cuffAlternatives on integers over one denominator (quickCuff's short plans): the same offers, lengths and texts. */
export function quickAlternatives(c: QuickAlternativesContext): CuffAlternatives {
  const { available: A, cuffDepth: d, turnUnder: u, innerFold, D, ratio } = c;
  const [a, b] = stepRatio(c.unit, c.precision);
  // One display step is b/a mm = b·D/a over D: a length x over D is x·a/(b·D) steps.
  const bD = b * D;
  const [shallowest, deepest] = cuffLimitSteps(c.unit, c.precision, c.defaults);
  const under = -floorDiv(-d * a, bD) - 1;
  const cuffSteps = Math.min(floorDiv((A - 2 * c.clothThickness) * a, 3 * bD), deepest, under);
  // The longest third section: whole steps of the room below the inner fold, no higher than the cuff and its turn-under.
  const sectionSteps = Math.min(floorDiv((A - innerFold) * a, bD), floorDiv((d + u) * a, bD));
  // steps·b/a mm against x/D mm: steps·b·D against x·a.
  const fitsSection = sectionSteps * bD >= (u + c.safeStitch) * a && sectionSteps * bD < c.hemSection * a;
  const faced = innerFold + c.facingSeam;
  return {
    shorterSection: fitsSection ? ratio(sectionSteps * b, a) : null,
    deepestCuff: cuffSteps < shallowest ? null : ratio(cuffSteps * b, a),
    plainHem: { required: ratio(c.hemAllowance, D), fits: A >= c.hemAllowance },
    facedCuff: { required: ratio(faced, D), fits: A >= faced },
  };
}
