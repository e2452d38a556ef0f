import { AllowanceError } from './allowance-error';
import { type Exact, ZERO } from './exact';

/** A leg's widths below the mark once the width at the cutting line was measured (a let-down leg). */
export interface LetDownWidths {
  widthAtEdge: Exact;
  /** flat width gained per unit of height (the taper) */
  slope: Exact;
  /** the cutting line, below the mark */
  cut: Exact;
  /** measured flat at the cutting line */
  widthAtCut: Exact;
  /** the old hem fold below the mark, when noted (negative above it) */
  oldFold: Exact | null;
}

// Where the taper stops holding: at the old fold, kept between the finished edge and the cut.
function knotOf(w: LetDownWidths): Exact {
  const fold = w.oldFold ?? ZERO;
  if (fold.sign() < 0) return ZERO;
  return fold.compare(w.cut) > 0 ? w.cut : fold;
}

/**
 * The flat width `below` the mark on a let-down leg: the old hem's allowance often flares below the
 * old fold, so there the width runs straight from the taper's width at the fold to the one measured
 * at the cut, instead of the taper followed down. Null where the taper still holds (at or above the
 * fold; without a noted fold, the finished edge stands for it).
 */
export function letDownWidth(w: LetDownWidths, below: Exact): Exact | null {
  if (below.equals(w.cut)) return w.widthAtCut;
  const knot = knotOf(w);
  if (below.compare(knot) <= 0) return null;
  const atKnot = w.widthAtEdge.sub(w.slope.mul(knot));
  return atKnot.add(w.widthAtCut.sub(atKnot).mul(below.sub(knot)).div(w.cut.sub(knot)));
}

/** Why the taper followed down to the old fold gives no leg there, or null (the measured width is joined to it). */
export function letDownShapeError(w: LetDownWidths): AllowanceError | null {
  const atKnot = w.widthAtEdge.sub(w.slope.mul(knotOf(w)));
  if (atKnot.sign() > 0) return null;
  return new AllowanceError(
    'out-of-range',
    'Followed down to the old fold, this taper gives no leg at all: check the two widths and the height.',
    'widthAbove',
    { rule: 'no-leg-at-old-fold' },
  );
}
