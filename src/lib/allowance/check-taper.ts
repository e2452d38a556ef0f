import { AllowanceError } from './allowance-error';
import { CUFF_LINE_NAMES, cuffLinePositions, linePositionList } from './cuff-lines';
import { cuffDepthRule, exactDefaults } from './defaults';
import { Exact, ZERO } from './exact';
import { lenMaker } from './len';
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
  const d =
    r.length(input.cuffDepth, 'cuffDepth', 'Cuff depth', cuffDepthRule(r.unit)) ??
    defaults.usualCuffDepth.min;
  return {
    unit: r.unit,
    precision: r.precision,
    cuffDepth: d,
    hemSection: r.length(input.hemSection, 'hemSection', 'Third section', POSITIVE) ?? d,
    widthAtEdge: r.length(input.widthAtEdge, 'widthAtEdge', 'Width at the finished edge', WIDTH) ?? ONE,
    widthAbove: r.length(input.widthAbove, 'widthAbove', 'Width higher up', WIDTH) ?? ONE,
    heightAbove: r.length(input.heightAbove, 'heightAbove', 'Height of the upper width', WIDTH) ?? ONE,
    seamAllowance: r.length(input.seamAllowance, 'seamAllowance', 'Seam allowance', NON_NEGATIVE),
    tolerance: r.length(input.tolerance, 'tolerance', 'Tolerance', NON_NEGATIVE) ?? defaults.taperTolerance,
    clothThickness: r.length(input.clothThickness, 'clothThickness', 'Turn of cloth', NON_NEGATIVE) ?? ZERO,
    widthAtCut: r.length(input.widthAtCut, 'widthAtCut', 'Width at the cutting line', POSITIVE),
    oldFold: r.length(input.oldCrease, 'oldCrease', 'Old crease'),
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
    return new AllowanceError('out-of-range', 'These widths give no leg at the cuff top: check the two widths and the height.', 'widthAbove');
  }
  const cut = positions[3];
  // Measured at the cut, the taper need only reach the old fold (the measured width is positive).
  const letDown = letDownOf(v, slope, cut);
  if (letDown) return letDownShapeError(letDown);
  // The width is straight in the height, so the lowest line (the cut) is the narrowest or widest: check it.
  if (!isPositive(v.widthAtEdge.sub(slope.mul(cut))) || !isPositive(v.widthAtEdge)) {
    return new AllowanceError('out-of-range', 'Followed down to the cut, this taper gives no leg at all: check the two widths and the height.', 'widthAbove');
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
  const warnings: PlanWarning[] = [];
  const most = mostPerSide ?? ZERO;
  if (!withinTolerance) {
    const wider = worst.sign() > 0;
    const by = len(worstSize).text;
    const side = len(worstSize.half()).text;
    // "From the cuff top" is ambiguous on the chalked leg: line 2, "Cuff top", is one depth BELOW the
    // mark, but the width to keep is one depth ABOVE the finished edge. Name the distances instead.
    const from = len(v.cuffDepth).text;
    const to = len(positions[3]!).text;
    const span = `from ${from} above the finished edge (the pin mark, line 1) down to the cutting line, ${to} below it`;
    warnings.push({
      code: 'taper-beyond-tolerance',
      message: wider
        ? `The leg narrows below where the cuff top will sit (${from} above the finished edge): at worst ${by} narrower (flat) than there. Let out the inseam and outseam ${span}, up to ${side} on each side of each seam, so the cuff lies flat.`
        : `The leg widens below where the cuff top will sit (${from} above the finished edge): at worst ${by} wider (flat) than there. Take in the inseam and outseam ${span}, up to ${side} on each side of each seam, so the cuff lies flat.`,
    });
  }
  const feasible = v.seamAllowance === null ? null : withinTolerance || most.compare(v.seamAllowance) <= 0;
  if (feasible === false) {
    warnings.push({
      code: 'let-out-exceeds-seam-allowance',
      message: `Letting out needs ${len(most).text} on each side of each seam, but the seam allowance is only ${len(v.seamAllowance!).text}. Choose a shallower cuff or a plain hem.`,
    });
  }
  return { kind: 'taper', unit: v.unit, precision: v.precision, targetWidth: len(target), lines, withinTolerance, feasible, warnings };
}
