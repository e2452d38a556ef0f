import { AllowanceError } from './allowance-error';
import { CUFF_LINE_NAMES, cuffLinePositions, linePositionList } from './cuff-lines';
import { cuffDepthRule, exactDefaults } from './defaults';
import { Exact, joinDenominator, ZERO } from './exact';
import { type LenMaker, lenMaker, ratioLenMaker } from './len';
import { letDownShapeError, letDownWidth, type LetDownWidths } from './let-down-width';
import { InputReader, type LengthRule } from './read-input';
import type { PlanWarning, Precision, TaperInput, TaperLine, TaperPlan, Unit } from './types';

/** A taper input read and checked: exact mm throughout. */
export interface TaperValues {
  unit: Unit;
  precision: Precision;
  cuffDepth: Exact;
  hemSection: Exact;
  widthAtEdge: Exact;
  widthAbove: Exact;
  heightAbove: Exact;
  seamAllowance: Exact | null;
  tolerance: Exact;
  clothThickness: Exact;
  /** measured flat at the cutting line on a let-down leg, or null to follow the taper down */
  widthAtCut: Exact | null;
  /** the old hem fold below the mark, where the taper stops holding on a let-down leg */
  oldFold: Exact | null;
}

const ONE = Exact.int(1);

const POSITIVE: LengthRule = { min: 'positive' };
const NON_NEGATIVE: LengthRule = { min: 'non-negative' };
const WIDTH: LengthRule = { required: true, min: 'positive' };

/** Read a taper input field by field (errors carry the field name). */
export function readTaperInput(input: TaperInput, r: InputReader): TaperValues {
  const defaults = exactDefaults(r.unit);
  const d = r.length(input.cuffDepth, 'cuffDepth', 'Cuff depth', cuffDepthRule(r.unit)) ?? defaults.usualCuffDepth.min;
  // An absent optional field reads as null without the call (a cut sheet's leg leaves five of these out).
  const { hemSection, tolerance, clothThickness, widthAtCut, oldCrease } = input;
  return {
    unit: r.unit,
    precision: r.precision,
    cuffDepth: d,
    hemSection: (hemSection === undefined ? null : r.length(hemSection, 'hemSection', 'Third section', POSITIVE)) ?? d,
    widthAtEdge: r.length(input.widthAtEdge, 'widthAtEdge', 'Width at the finished edge', WIDTH) ?? ONE,
    widthAbove: r.length(input.widthAbove, 'widthAbove', 'Width higher up', WIDTH) ?? ONE,
    heightAbove: r.length(input.heightAbove, 'heightAbove', 'Height of the upper width', WIDTH) ?? ONE,
    seamAllowance: r.length(input.seamAllowance, 'seamAllowance', 'Seam allowance', NON_NEGATIVE),
    tolerance: (tolerance === undefined ? null : r.length(tolerance, 'tolerance', 'Tolerance', NON_NEGATIVE)) ?? defaults.taperTolerance,
    clothThickness: (clothThickness === undefined ? null : r.length(clothThickness, 'clothThickness', 'Turn of cloth', NON_NEGATIVE)) ?? ZERO,
    widthAtCut: widthAtCut === undefined ? null : r.length(widthAtCut, 'widthAtCut', 'Width at the cutting line', POSITIVE),
    oldFold: oldCrease === undefined ? null : r.length(oldCrease, 'oldCrease', 'Old crease'),
  };
}

/** How much the flat width grows per unit of height: the taper through the two measurements, followed straight on below the edge. */
export function taperSlope(v: TaperValues): Exact {
  return v.widthAbove.sub(v.widthAtEdge).div(v.heightAbove);
}

// The let-down leg's widths below the old fold, when the width at the cut was measured.
function letDownOf(v: TaperValues, slope: Exact, cut: Exact): LetDownWidths | null {
  return v.widthAtCut === null ? null : { widthAtEdge: v.widthAtEdge, slope, cut, widthAtCut: v.widthAtCut, oldFold: v.oldFold };
}

function isPositive(f: Exact): boolean {
  return f.sign() > 0;
}

/** The taper's shape worked out once: its slope, the width to keep, and the chalk lines below the mark. */
interface TaperShape {
  slope: Exact;
  /** slope × cuff depth: how much wider the leg is at the cuff top's height than at the finished edge */
  rise: Exact;
  target: Exact;
  positions: [Exact, Exact, Exact, Exact];
}

function taperShape(v: TaperValues): TaperShape {
  const slope = taperSlope(v);
  const rise = slope.mul(v.cuffDepth);
  return {
    slope,
    rise,
    target: v.widthAtEdge.add(rise),
    positions: linePositionList(cuffLinePositions(v.cuffDepth, v.hemSection, v.clothThickness)),
  };
}

// The shape check on a shape already worked out (checkTaper uses the same shape for its lines).
function shapeErrorOf(v: TaperValues, { slope, target, positions }: TaperShape): AllowanceError | null {
  if (!isPositive(target)) {
    return new AllowanceError('out-of-range', 'These widths give no leg at the cuff top: check the two widths and the height.', 'widthAbove', {
      rule: 'no-leg-at-cuff-top',
    });
  }
  const cut = positions[3];
  // Measured at the cut, the taper need only reach the old fold (the measured width is positive).
  const letDown = letDownOf(v, slope, cut);
  if (letDown) return letDownShapeError(letDown);
  // The width is straight in the height, so the lowest line (the cut) is the narrowest or widest: check it.
  if (!isPositive(v.widthAtEdge.sub(slope.mul(cut))) || !isPositive(v.widthAtEdge)) {
    return new AllowanceError('out-of-range', 'Followed down to the cut, this taper gives no leg at all: check the two widths and the height.', 'widthAbove', {
      rule: 'no-leg-at-cut',
    });
  }
  return null;
}

/**
 * Why these widths make no plan (the taper followed down gives no leg at the cuff top or at a line),
 * or null. Checked on save too, so a fitting that cannot be planned is never kept.
 */
export function taperShapeError(v: TaperValues): AllowanceError | null {
  return shapeErrorOf(v, taperShape(v));
}

/** Check a tapered leg under a cuff: the work at each chalk line to keep the cuff-top width straight down. */
export function checkTaper(input: TaperInput): TaperPlan {
  const v = readTaperInput(input, new InputReader(input, false));
  return quickTaper(v) ?? exactTaper(v);
}

/** What the warnings need: the worst change (as shown, halved per side), and the most let out per side. */
interface TaperVerdict {
  withinTolerance: boolean;
  /** the worst change lets out (the leg narrows below the cuff top) */
  wider: boolean;
  /** |worst change| as shown, and half of it ('' within tolerance: not shown) */
  by: string;
  side: string;
  /** the cut's depth below the mark as shown ('' within tolerance) */
  cutText: string;
  feasible: boolean | null;
  /** the most let out on each side of a seam, as shown ('' unless not feasible) */
  most: string;
}

function taperWarnings(v: TaperValues, len: LenMaker, t: TaperVerdict): PlanWarning[] {
  const warnings: PlanWarning[] = [];
  if (!t.withinTolerance) {
    // "From the cuff top" is ambiguous on the chalked leg: line 2, "Cuff top", is one depth BELOW the
    // mark, but the width to keep is one depth ABOVE the finished edge. Name the distances instead.
    const from = len(v.cuffDepth).text;
    const span = `from ${from} above the finished edge (the pin mark, line 1) down to the cutting line, ${t.cutText} below it`;
    warnings.push({
      code: 'taper-beyond-tolerance',
      message: t.wider
        ? `The leg narrows below where the cuff top will sit (${from} above the finished edge): at worst ${t.by} narrower (flat) than there. Let out the inseam and outseam ${span}, up to ${t.side} on each side of each seam, so the cuff lies flat.`
        : `The leg widens below where the cuff top will sit (${from} above the finished edge): at worst ${t.by} wider (flat) than there. Take in the inseam and outseam ${span}, up to ${t.side} on each side of each seam, so the cuff lies flat.`,
      values: { finish: 'cuff', way: t.wider ? 'out' : 'in', from, by: t.by, cut: t.cutText, side: t.side },
    });
  }
  if (t.feasible === false) {
    const seamAllowance = len(v.seamAllowance!).text;
    warnings.push({
      code: 'let-out-exceeds-seam-allowance',
      message: `Letting out needs ${t.most} on each side of each seam, but the seam allowance is only ${seamAllowance}. Choose a shallower cuff or a plain hem.`,
      values: { finish: 'cuff', most: t.most, seamAllowance },
    });
  }
  return warnings;
}

// Past this a product of two of quickTaper's integers could pass 2^53; a sum of two stays under it.
const HALF_SAFE = Number.MAX_SAFE_INTEGER / 2;

/**
 * checkTaper's answer worked out on plain integers over one common denominator (no Exact built per
 * line, no gcd per step), for the leg followed down (no width measured at the cut). Null when a value
 * is big or a product could pass 2^53, or when the shape is refused: exactTaper then answers or
 * throws. Every length, text and verdict is the one exactTaper gives (a Len does not depend on
 * n/d being reduced).
 */
export function quickTaper(v: TaperValues): TaperPlan | null {
  const { cuffDepth, hemSection, clothThickness, widthAtEdge, widthAbove, heightAbove, tolerance, seamAllowance } = v;
  if (v.widthAtCut !== null || cuffDepth.big || hemSection.big || clothThickness.big || widthAtEdge.big || widthAbove.big || heightAbove.big || tolerance.big)
    return null;
  if (seamAllowance?.big) return null;
  // The lengths as numerators over D mm (D: the least common denominator of their denominators).
  let D = joinDenominator(joinDenominator(joinDenominator(cuffDepth.d, hemSection.d), clothThickness.d), widthAtEdge.d);
  D = joinDenominator(joinDenominator(D, widthAbove.d), tolerance.d);
  if (seamAllowance !== null) D = joinDenominator(D, seamAllowance.d);
  if (D > HALF_SAFE) return null;
  const E = widthAtEdge.over(D);
  const dd = cuffDepth.over(D);
  const cuffTop = dd + clothThickness.over(D);
  const below = [0, cuffTop, 2 * cuffTop, 2 * cuffTop + hemSection.over(D)] as const;
  // slope = (widthAbove − widthAtEdge) / heightAbove = sN / (sD · D); every line's value is over CD = sD · D.
  const Aw = widthAbove.over(D);
  const sN = (Aw - E) * heightAbove.d;
  const sD = D * heightAbove.n;
  const CD = sD * D;
  const edge = E * sD;
  const cut = below[3];
  const rise = sN * dd;
  const deepest = sN * (dd + cut);
  const tol = tolerance.over(D) * sD;
  const seam = seamAllowance === null ? 0 : 2 * seamAllowance.over(D) * sD;
  const limit = Math.max(Math.abs(E), Math.abs(Aw), Math.abs(sN), cut, 2 * CD, Math.abs(edge), Math.abs(sN * cut), Math.abs(deepest), tol, seam);
  if (!(limit <= HALF_SAFE)) return null;
  // The shape checks of shapeErrorOf: a leg at the cuff top and at the cut (exactTaper says why not).
  if (edge + rise <= 0 || edge - sN * cut <= 0 || E <= 0) return null;
  const len = lenMaker(v.unit, v.precision);
  const ratio = ratioLenMaker(v.unit, v.precision);
  const target = edge + rise;
  let worst = 0;
  let mostPerSide = 0;
  let withinTolerance = true;
  const lines: TaperLine[] = [];
  for (let k = 0; k < 4; k++) {
    const b = below[k]!;
    // The change that brings the line back to the target: slope × (cuff depth + below), over CD.
    const change = k === 0 ? rise : sN * (dd + b);
    const size = change < 0 ? -change : change;
    if (size > (worst < 0 ? -worst : worst)) worst = change;
    if (size > tol) withinTolerance = false;
    if (k === 0 || change > mostPerSide) mostPerSide = change;
    const changeLen = ratio(change, CD);
    lines.push({
      n: (k + 1) as TaperLine['n'],
      name: CUFF_LINE_NAMES[k]!,
      belowMark: ratio(b, D),
      width: ratio(target - change, CD),
      change: changeLen,
      perSeam: { mm: changeLen.mm, text: changeLen.text },
      perSide: ratio(change, 2 * CD),
    });
  }
  const worstSize = worst < 0 ? -worst : worst;
  const feasible = seamAllowance === null ? null : withinTolerance || mostPerSide <= seam;
  const warnings = taperWarnings(v, len, {
    withinTolerance,
    wider: worst > 0,
    by: withinTolerance ? '' : ratio(worstSize, CD).text,
    side: withinTolerance ? '' : ratio(worstSize, 2 * CD).text,
    cutText: withinTolerance ? '' : ratio(cut, D).text,
    feasible,
    most: feasible === false ? ratio(mostPerSide, 2 * CD).text : '',
  });
  return { kind: 'taper', unit: v.unit, precision: v.precision, targetWidth: ratio(target, CD), lines, withinTolerance, feasible, warnings };
}

/** checkTaper on Exact values: any input, a let-down leg, and every refusal of the shape. */
export function exactTaper(v: TaperValues): TaperPlan {
  const shape = taperShape(v);
  const shapeError = shapeErrorOf(v, shape);
  if (shapeError) throw shapeError;
  const len = lenMaker(v.unit, v.precision);
  const { slope, rise, target, positions } = shape;
  const letDown = letDownOf(v, slope, positions[3]);
  let worst = ZERO;
  let worstSize = ZERO;
  let mostPerSide: Exact | null = null;
  let withinTolerance = true;
  const lines: TaperLine[] = [];
  for (let k = 0; k < 4; k++) {
    const below = positions[k]!;
    // A line below the mark sits at height −below; the change is what brings it back to the target.
    const measured = letDown && letDownWidth(letDown, below);
    const change = measured ? target.sub(measured) : k === 0 ? rise : slope.mul(v.cuffDepth.add(below));
    const perSide = change.half();
    const size = change.abs();
    if (size.compare(worstSize) > 0) {
      worst = change;
      worstSize = size;
    }
    if (size.compare(v.tolerance) > 0) withinTolerance = false;
    if (mostPerSide === null || perSide.compare(mostPerSide) > 0) mostPerSide = perSide;
    const changeLen = len(change);
    const line: TaperLine = {
      n: (k + 1) as TaperLine['n'],
      name: CUFF_LINE_NAMES[k]!,
      belowMark: len(below),
      width: len(target.sub(change)),
      change: changeLen,
      perSeam: { mm: changeLen.mm, text: changeLen.text },
      perSide: len(perSide),
    };
    if (letDown && k === 3) line.measured = true;
    lines.push(line);
  }
  const most = mostPerSide ?? ZERO;
  const feasible = v.seamAllowance === null ? null : withinTolerance || most.compare(v.seamAllowance) <= 0;
  const warnings = taperWarnings(v, len, {
    withinTolerance,
    wider: worst.sign() > 0,
    by: withinTolerance ? '' : len(worstSize).text,
    side: withinTolerance ? '' : len(worstSize.half()).text,
    cutText: withinTolerance ? '' : len(positions[3]!).text,
    feasible,
    most: feasible === false ? len(most).text : '',
  });
  return { kind: 'taper', unit: v.unit, precision: v.precision, targetWidth: len(target), lines, withinTolerance, feasible, warnings };
}
