import { Exact } from './exact';
import { formatExactQ } from './format-length';
import type { LengthRule } from './read-input';
import type { Len, Unit } from './types';
import { isMetric } from './units';

/** A range of usual values, inclusive. */
export interface Usual<T> {
  min: T;
  max: T;
}

/** A usual range held exactly, with its nearest numbers for quick comparisons. */
export interface ExactRange extends Usual<Exact> {
  minMm: number;
  maxMm: number;
}

/** The engine's defaults and usual ranges for one unit system, exact, in mm. */
export interface ExactDefaults {
  cuffTurnUnder: Exact;
  hemAllowance: Exact;
  hemTurnUnder: Exact;
  taperTolerance: Exact;
  facingSeam: Exact;
  shallowestCuff: Exact;
  /** cloth a third section needs above its turn-under to hold the stitch safely */
  safeStitch: Exact;
  onFoldWithin: Exact;
  /** a crease on the leg this close to the cuff top's height may show at its edge: stated, not guessed */
  nearCuffTop: Exact;
  /** onFoldWithin as a number, for the quick test before the exact one */
  onFoldWithinMm: number;
  maxCuffDepth: Exact;
  usualCuffDepth: ExactRange;
  usualHemAllowance: ExactRange;
}

const inch = (n: number, d = 1): Exact => Exact.ratio(n * 127, d * 5);
const mm = (n: number, d = 1): Exact => Exact.ratio(n, d);
const range = (min: Exact, max: Exact): ExactRange => ({ min, max, minMm: min.valueOf(), maxMm: max.valueOf() });

/** Why a cuff shallower than the shallowest is refused, after "Cuff depth must be at least …". */
export const SHALLOWEST_CUFF_WHY = 'a shallower cuff cannot be turned, pressed and tacked.';

// Inch figures from TRADE.md; metric ones are our own round numbers near them (NIST: convert, then round sensibly).
const IMPERIAL: ExactDefaults = {
  cuffTurnUnder: inch(1, 2),
  hemAllowance: inch(3, 2),
  hemTurnUnder: inch(1, 4),
  taperTolerance: inch(1, 8),
  facingSeam: inch(1, 2),
  // The smallest workable cuff (common practice, no source): shallower cannot be turned and tacked.
  shallowestCuff: inch(3, 4),
  // A third section keeps the turn-under and 1/4 in above it for the stitch (common practice, no source).
  safeStitch: inch(1, 4),
  onFoldWithin: inch(1, 16),
  // Work to an eighth: a cuff an eighth over or under shows (TRADE.md, common practice).
  nearCuffTop: inch(1, 8),
  onFoldWithinMm: 25.4 / 16,
  maxCuffDepth: inch(6),
  usualCuffDepth: range(inch(1), inch(9, 4)),
  usualHemAllowance: range(inch(5, 4), inch(2)),
};

const METRIC: ExactDefaults = {
  cuffTurnUnder: mm(12),
  hemAllowance: mm(40),
  hemTurnUnder: mm(6),
  taperTolerance: mm(3),
  facingSeam: mm(12),
  shallowestCuff: mm(20),
  safeStitch: mm(6),
  onFoldWithin: mm(3, 2),
  nearCuffTop: mm(3),
  onFoldWithinMm: 1.5,
  maxCuffDepth: mm(150),
  usualCuffDepth: range(mm(25), mm(57)),
  usualHemAllowance: range(mm(32), mm(51)),
};

/** The exact defaults for a unit: inch figures for 'in', metric ones for 'cm' and 'mm'. */
export function exactDefaults(unit: Unit): ExactDefaults {
  return isMetric(unit) ? METRIC : IMPERIAL;
}

const depthRule = (e: ExactDefaults): LengthRule => ({
  required: true,
  min: 'positive',
  least: { value: e.shallowestCuff, why: SHALLOWEST_CUFF_WHY, code: 'shallowest-cuff' },
  max: e.maxCuffDepth,
});
const IMPERIAL_DEPTH = depthRule(IMPERIAL);
const METRIC_DEPTH = depthRule(METRIC);

/** What a cuff depth must be in a unit (needed, more than 0, from the shallowest cuff to the deepest), made once per unit system. */
export function cuffDepthRule(unit: Unit): LengthRule {
  return isMetric(unit) ? METRIC_DEPTH : IMPERIAL_DEPTH;
}

/** Defaults and usual ranges of one unit, as lengths shown in that unit. */
export type PlanDefaults = { precision: 16 } & {
  [K in Exclude<keyof ExactDefaults, 'onFoldWithinMm'>]: ExactDefaults[K] extends ExactRange ? Usual<Len> : Len;
};

function lenOf(f: Exact, unit: Unit): Len {
  return { mm: f.valueOf(), text: formatExactQ(f, unit, 16) };
}

function shown(unit: Unit): PlanDefaults {
  const e = exactDefaults(unit);
  const l = (f: Exact): Len => lenOf(f, unit);
  return {
    precision: 16,
    cuffTurnUnder: l(e.cuffTurnUnder),
    hemAllowance: l(e.hemAllowance),
    hemTurnUnder: l(e.hemTurnUnder),
    taperTolerance: l(e.taperTolerance),
    facingSeam: l(e.facingSeam),
    shallowestCuff: l(e.shallowestCuff),
    safeStitch: l(e.safeStitch),
    onFoldWithin: l(e.onFoldWithin),
    nearCuffTop: l(e.nearCuffTop),
    maxCuffDepth: l(e.maxCuffDepth),
    usualCuffDepth: { min: l(e.usualCuffDepth.min), max: l(e.usualCuffDepth.max) },
    usualHemAllowance: { min: l(e.usualHemAllowance.min), max: l(e.usualHemAllowance.max) },
  };
}

/** The defaults the engine uses for each unit, ready to show (e.g. DEFAULTS.in.cuffTurnUnder.text = "1/2 in"). */
export const DEFAULTS: Readonly<Record<Unit, PlanDefaults>> = { in: shown('in'), cm: shown('cm'), mm: shown('mm') };

/** A usual cuff depth and a word on how it reads. */
export interface UsualCuffDepth {
  depth: Len;
  note: 'trim' | 'classic' | 'wide' | 'modern';
}

function usualDepths(unit: Unit): UsualCuffDepth[] {
  // TRADE.md: 1¼, 1½, 1¾ in, and 5 cm / 2 in as a modern standard; metric rounded to whole mm.
  const depths: [Exact, Exact, UsualCuffDepth['note']][] = [
    [inch(5, 4), mm(32), 'trim'],
    [inch(3, 2), mm(38), 'classic'],
    [inch(7, 4), mm(44), 'wide'],
    [inch(2), mm(50), 'modern'],
  ];
  return depths.map(([i, m, note]) => ({ depth: lenOf(isMetric(unit) ? m : i, unit), note }));
}

/** The usual cuff depths, per unit, for a picker. */
export const USUAL_CUFF_DEPTHS: Readonly<Record<Unit, readonly UsualCuffDepth[]>> = {
  in: usualDepths('in'),
  cm: usualDepths('cm'),
  mm: usualDepths('mm'),
};

/** The usual depths in words, inches listed and metric as a range, from the same figures: "1 1/4, 1 1/2 or 1 3/4 in, or 3.2–4.4 cm". */
export function usualCuffDepthsText(): string {
  const classic = (u: Unit) => USUAL_CUFF_DEPTHS[u].filter((d) => d.note !== 'modern').map((d) => d.depth.text);
  const inches = classic('in').map((t) => t.replace(/ in$/, ''));
  const cm = classic('cm');
  return `${inches.slice(0, -1).join(', ')} or ${inches.at(-1)} in, or ${cm[0]!.replace(/ cm$/, '')}–${cm.at(-1)}`;
}
