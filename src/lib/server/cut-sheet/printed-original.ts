// The figures a kept factory hem's block prints, in whole display steps so they add up as printed:
// the shortening, the factory hem's depth and the join's seam allowance are each rounded to the
// nearest step, and every line and sum is made from those three (cut away = shorten − 2 × seam
// allowance; join −h, leg cut a − h, band cut s − h − a, band top s − h, present edge s below the
// mark). Only the fold of a fold-only leg sits half-way, so it may take a half step.
import type { Len } from '../../allowance/types';
import type { OriginalHemLineName, OriginalHemPlan } from '../../allowance/kind-types';
import { StepScale } from './printed';

/** A kept factory hem's chalk line as printed: below the pin mark (negative above) and above the present edge. */
export interface PrintedOriginalLine {
  n: number;
  name: OriginalHemLineName;
  cut: boolean;
  belowMark: Len;
  abovePresentEdge: Len;
}

/** A kept factory hem's plan as the sheet prints it. */
export interface PrintedOriginal {
  /** from the printed figures: a shortening under twice the seam allowance is folded, not cut */
  method: OriginalHemPlan['method'];
  shortenBy: Len;
  factoryHem: Len;
  seamAllowance: Len;
  /** twice the seam allowance */
  seamTakes: Len;
  /** shorten − 2 × seam allowance (cut-and-join), else 0 */
  removed: Len;
  /** the fold-only tuck: half the shortening */
  tuck: Len | null;
  lines: PrintedOriginalLine[];
  /** each line below the join (the 1:1 strip's 0), in the lines' order */
  fromJoin: Len[];
  /** the flat difference at the join (leg less band top), each side's share in half steps; null without widths */
  taper: { mismatch: Len; perSeam: Len; perSide: Len; withinTolerance: boolean } | null;
}

const EPS = 1e-6;
const near = (x: number) => Math.sign(x) * Math.floor(Math.abs(x) + 0.5 + EPS);

/** Works out every figure a kept factory hem's block prints, in whole steps (see the rules at the top). */
export function printedOriginal(plan: OriginalHemPlan): PrintedOriginal {
  const st = new StepScale(plan.unit, plan.precision);
  // Half steps for what is halved (the fold, a side's share): 1/16 on a sheet to 1/8, 1/32 at most, else the step.
  const half = new StepScale(plan.unit, plan.unit === 'in' ? Math.min(32, plan.precision * 2) : plan.precision);
  const s = Math.max(1, near(st.of(plan.shortenBy.mm)));
  const h = Math.max(1, near(st.of(plan.factoryHem.mm)));
  const a = Math.max(1, near(st.of(plan.seamAllowance.mm)));
  const method: OriginalHemPlan['method'] = s - 2 * a >= 0 ? 'cut-and-join' : 'fold-only';
  const sMm = st.len(s).mm;
  const halfOf = (mm: number) => half.len(near(half.of(mm)));
  const positions: [OriginalHemLineName, Len][] =
    method === 'cut-and-join'
      ? [
          ['join', st.len(-h)],
          ['leg-cut', st.len(a - h)],
          ['band-cut', st.len(s - h - a)],
          ['band-top', st.len(s - h)],
          ['present-edge', st.len(s)],
        ]
      : [
          ['join', st.len(-h)],
          ['fold', halfOf(sMm / 2 - st.len(h).mm)],
          ['band-top', st.len(s - h)],
          ['present-edge', st.len(s)],
        ];
  const lines = positions.map(([name, below], i) => ({
    n: i + 1,
    name,
    cut: name === 'leg-cut' || name === 'band-cut',
    belowMark: below,
    // From the printed figures, so the two columns add up to the shortening on every line.
    abovePresentEdge: name === 'fold' ? halfOf(sMm - below.mm) : st.len(near(st.of(sMm - below.mm))),
  }));
  let taper: PrintedOriginal['taper'] = null;
  if (plan.taper) {
    const perSide = near(half.of(plan.taper.mismatch.mm / 2));
    taper = {
      mismatch: half.len(Math.abs(2 * perSide)),
      perSeam: half.len(Math.abs(2 * perSide)),
      perSide: half.len(Math.abs(perSide)),
      withinTolerance: plan.taper.withinTolerance,
    };
  }
  return {
    method,
    shortenBy: st.len(s),
    factoryHem: st.len(h),
    seamAllowance: st.len(a),
    seamTakes: st.len(2 * a),
    removed: st.len(method === 'cut-and-join' ? s - 2 * a : 0),
    tuck: method === 'fold-only' ? halfOf(sMm / 2) : null,
    lines,
    fromJoin: lines.map((l) => (l.name === 'fold' ? halfOf(l.belowMark.mm + st.len(h).mm) : st.len(near(st.of(l.belowMark.mm)) + h))),
    taper,
  };
}
