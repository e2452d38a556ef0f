import { AllowanceError } from './allowance-error';
import { exactDefaults } from './defaults';
import { Exact, ZERO } from './exact';
import { lenMaker } from './len';
import { InputReader } from './read-input';
import type { HemTaperInput, PlanWarning, TaperLine, TaperPlan } from './types';

const ONE = Exact.int(1);

/** A hem taper input read and checked: exact mm throughout. */
export interface HemTaperValues {
  hemAllowance: Exact;
  widthAtEdge: Exact;
  widthAbove: Exact;
  heightAbove: Exact;
  seamAllowance: Exact | null;
  tolerance: Exact;
  /** measured flat at the cutting line on a let-down leg, or null to follow the taper down */
  widthAtCut: Exact | null;
  /** the finished edge below the pin mark, where widthAtEdge was measured (0: at the mark) */
  edge: Exact;
}

/** Read a hem taper input field by field (errors carry the field name). */
export function readHemTaperInput(input: HemTaperInput, r: InputReader): HemTaperValues {
  const defaults = exactDefaults(r.unit);
  const width = (value: unknown, field: string, label: string): Exact => r.length(value, field, label, { required: true, min: 'positive' }) ?? ONE;
  return {
    hemAllowance: r.length(input.hemAllowance, 'hemAllowance', 'Hem allowance', { min: 'positive' }) ?? defaults.hemAllowance,
    widthAtEdge: width(input.widthAtEdge, 'widthAtEdge', 'Width at the finished edge'),
    widthAbove: width(input.widthAbove, 'widthAbove', 'Width higher up'),
    heightAbove: width(input.heightAbove, 'heightAbove', 'Height of the upper width'),
    seamAllowance: r.length(input.seamAllowance, 'seamAllowance', 'Seam allowance', { min: 'non-negative' }),
    tolerance: r.length(input.tolerance, 'tolerance', 'Tolerance', { min: 'non-negative' }) ?? defaults.taperTolerance,
    widthAtCut: r.length(input.widthAtCut, 'widthAtCut', 'Width at the cutting line', { min: 'positive' }),
    edge: r.length(input.edgeBelowMark, 'edgeBelowMark', 'Finished edge below the mark', { min: 'non-negative' }) ?? ZERO,
  };
}

function slopeOf(v: HemTaperValues): Exact {
  return v.widthAbove.sub(v.widthAtEdge).div(v.heightAbove);
}

// The leg's width at the finished edge as chalked: measured at the pin mark, followed down the taper
// to an edge left below it (unwashed cloth).
function edgeWidthOf(v: HemTaperValues): Exact {
  return v.edge.isZero() ? v.widthAtEdge : v.widthAtEdge.sub(slopeOf(v).mul(v.edge));
}

/** Why these widths make no hem plan (no leg at the cut, or none at the hem's top), or null. */
export function hemTaperShapeError(v: HemTaperValues): AllowanceError | null {
  const rise = slopeOf(v).mul(v.hemAllowance);
  const edge = edgeWidthOf(v);
  // Measured at the cut (a let-down leg), only the leg the hem lies against must be there.
  const cutWidth = v.widthAtCut ?? edge.sub(rise);
  if (cutWidth.sign() <= 0 || edge.sign() <= 0 || edge.add(rise).sign() <= 0) {
    return new AllowanceError('out-of-range', 'Followed down to the cut, this taper gives no leg at all: check the two widths and the height.', 'widthAbove', {
      rule: 'no-leg-at-cut',
    });
  }
  return null;
}

/**
 * Check a tapered leg under a plain hem. Turned up, the allowance x below the finished edge lies
 * against the leg x above it, so it must be as wide as the leg there: the seams below the edge are
 * the mirror of the taper above (a hem cut on the leg's own taper is too narrow and will not lie flat).
 */
export function checkHemTaper(input: HemTaperInput): TaperPlan {
  const r = new InputReader(input, false);
  const v = readHemTaperInput(input, r);
  const shape = hemTaperShapeError(v);
  if (shape) throw shape;
  const len = lenMaker(r.unit, r.precision);
  const slope = slopeOf(v);
  const H = v.hemAllowance;
  const E = v.edge;
  const W = edgeWidthOf(v);
  // On a let-down leg the width at the cut is the one measured there: the old hem may flare below its fold.
  const cutWidth = v.widthAtCut ?? W.sub(slope.mul(H));
  const change = W.add(slope.mul(H)).sub(cutWidth);
  const size = change.abs();
  const withinTolerance = size.compare(v.tolerance) <= 0;
  const perSide = change.half();
  const line = (n: 1 | 2, below: Exact, width: Exact, ch: Exact): TaperLine => {
    const c = len(ch);
    const measured = n === 2 && v.widthAtCut !== null ? { measured: true } : {};
    return {
      n,
      name: n === 1 ? 'finished-edge' : 'cut',
      belowMark: len(below),
      width: len(width),
      change: c,
      perSeam: { ...c },
      perSide: len(ch.half()),
      ...measured,
    };
  };
  const lines = [line(1, E, W, ZERO), line(2, E.add(H), cutWidth, change)];
  const target = W.add(slope.mul(H));
  const warnings: PlanWarning[] = [];
  if (!withinTolerance) {
    const at = len(H).text;
    const by = len(size).text;
    const side = len(size.half()).text;
    warnings.push({
      code: 'taper-beyond-tolerance',
      message:
        change.sign() > 0
          ? `${v.widthAtCut ? `Measured at the cutting line (${len(v.widthAtCut).text} flat), the let-down leg is narrower than the leg above the edge` : 'The leg narrows towards the hem'}: turned up, the hem would be ${by} narrower (flat) than the leg it lies against. Let out the inseam and outseam below the finished edge, flaring out to ${by} more at the cutting line, ${at} below it (${side} on each side of each seam), so the hem lies flat.`
          : `${v.widthAtCut ? `Measured at the cutting line (${len(v.widthAtCut).text} flat), the let-down leg flares wider than the leg above the edge` : 'The leg widens towards the hem'}: turned up, the hem would be ${by} wider (flat) than the leg it lies against. Take in the inseam and outseam below the finished edge, to ${by} less at the cutting line, ${at} below it (${side} on each side of each seam), so the hem lies flat.`,
      values: { finish: 'hem', way: change.sign() > 0 ? 'out' : 'in', by, at, side, ...(v.widthAtCut ? { measured: len(v.widthAtCut).text } : {}) },
    });
  }
  const most = perSide.sign() > 0 ? perSide : ZERO;
  // Within tolerance no seam is touched, so even a seam with nothing to let out will do.
  const feasible = v.seamAllowance === null ? null : withinTolerance || most.compare(v.seamAllowance) <= 0;
  if (feasible === false) {
    warnings.push({
      code: 'let-out-exceeds-seam-allowance',
      message: `Letting out needs ${len(most).text} on each side of each seam, but the seam allowance is only ${len(v.seamAllowance!).text}. Choose a shallower hem or face it.`,
      values: { finish: 'hem', most: len(most).text, seamAllowance: len(v.seamAllowance!).text },
    });
  }
  return { kind: 'taper', finish: 'hem', unit: r.unit, precision: r.precision, targetWidth: len(target), lines, withinTolerance, feasible, warnings };
}
