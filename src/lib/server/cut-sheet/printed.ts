// The figures a sheet prints, worked out in whole display steps (1/8 or 1/16 in, 0.5 mm) so that
// every sum on the page holds as printed: each chalk line is the printed sections above it added
// up, the cloth check's spare is has − needs, a seam's work is twice each side's. The engine keeps
// lengths exact and rounds each one on its own, which is right on a screen and wrong on a page a
// tailor adds up with a pencil ("Cuff 3.8 cm deep", cut at 11.45 cm).
// Rounding, the safe way round wherever cloth is at stake:
// - cuff depth, turn of cloth, slope and the taper's widths: to the nearest step;
// - the cutting line (what the plan needs): up, so it is never less than the exact need; on a
//   cuff the third section (inside, out of sight) takes the difference;
// - the cloth below the mark (has): down, so spare is never more and short never less than exact;
// - a plain hem's finished edge left below the mark for unwashed cloth: up (never short after the wash);
// - a seam's work: each side to the nearest half step in inches (1/16 on a sheet to 1/8), the
//   sheet's step in metric, and the seam twice that.
import { formatLength, parseLength } from '../../allowance/index';
import type { CuffLineName, HemLineName, Len, Precision, Unit } from '../../allowance/types';
import type { CuffLeg, HemLeg } from '../../shared/cut-sheet-types';

/** A printed chalk line: distances in whole steps, as text and in mm. */
export interface PrintedLine {
  n: number;
  name: CuffLineName | HemLineName;
  belowMark: Len;
  aboveRawEdge: Len | null;
  /** a plain hem's front, below the back pin mark (negative above it) */
  frontBelowMark: Len | null;
}

/** The cloth check as printed: spare = has − needs, short by = needs − has. */
export interface PrintedCloth {
  enough: boolean | null;
  needs: Len;
  has: Len | null;
  spare: Len | null;
  shortBy: Len | null;
}

/** One chalk line's seam work on a tapered leg, as printed: per seam = 2 × per side. */
export interface PrintedSeamWork {
  n: number;
  name: CuffLineName;
  /** +1 let out, −1 take in, 0 nothing to do at this step */
  sign: -1 | 0 | 1;
  perSeam: Len;
  perSide: Len;
}

/** A leg's plan as the sheet prints it. */
export interface PrintedPlan {
  unit: Unit;
  precision: Precision;
  /** cuff depth (cuff) or hem allowance (hem) */
  depth: Len;
  /** the cuff's turn of cloth at each fold, when there is one */
  turnOfCloth: Len | null;
  /** the cuff's third section, inner fold to cut */
  thirdSection: Len | null;
  slope: Len | null;
  turnUnder: Len;
  lines: PrintedLine[];
  cloth: PrintedCloth;
  alternatives: {
    /** the customer's cuff depth with a shorter third section, rounded down so it fits as printed */
    shorterSection: Len | null;
    deepestCuff: Len | null;
    plainHem: { required: Len; fits: boolean };
    facedCuff: { required: Len; fits: boolean };
  } | null;
  taper: {
    target: Len;
    lines: PrintedSeamWork[];
    /** false when no line has work to print (within tolerance, or under half a step everywhere) */
    work: boolean;
    /** the most let out on each side, beyond the seam allowance (printed down), when it is */
    beyondSeamAllowance: { perSide: Len; seamAllowance: Len } | null;
  } | null;
}

// The plan's mm are the nearest JS numbers to exact fractions; a millionth of a step absorbs that.
const EPS = 1e-6;
/** A count of steps to the nearest whole step (halves away from 0). */
export const near = (x: number) => Math.sign(x) * Math.floor(Math.abs(x) + 0.5 + EPS);
/** A count of steps up to a whole step (never under the exact figure). */
export const up = (x: number) => Math.ceil(x - EPS);
/** A count of steps down to a whole step (never over the exact figure). */
export const down = (x: number) => Math.floor(x + EPS);

/** Lengths in whole steps of one unit and precision. */
export class StepScale {
  readonly mm: number;
  constructor(
    readonly unit: Unit,
    readonly precision: number,
  ) {
    this.mm = unit === 'in' ? 25.4 / precision : 0.5;
  }

  /** How many steps a length in mm is, unrounded. */
  of(mm: number): number {
    return mm / this.mm;
  }

  /** A whole number of steps as printed. */
  len(steps: number): Len {
    const mm = steps * this.mm;
    // formatLength rounds to its step; an exact step count comes back as itself.
    return { mm, text: formatLength(mm, { unit: this.unit, precision: this.precision as Precision }) };
  }
}

function cloth(st: StepScale, needs: number, availableMm: number | null, enough: boolean | null): PrintedCloth {
  const needsLen = st.len(needs);
  if (availableMm === null || enough === null) return { enough: null, needs: needsLen, has: null, spare: null, shortBy: null };
  if (enough) {
    // Enough by the exact figures but under a step to spare: the raw edge is on the cutting line.
    const has = Math.max(down(st.of(availableMm)), needs);
    return { enough: true, needs: needsLen, has: st.len(has), spare: st.len(has - needs), shortBy: null };
  }
  const has = down(st.of(availableMm));
  return { enough: false, needs: needsLen, has: st.len(has), spare: null, shortBy: st.len(Math.max(1, needs - has)) };
}

function linesOf(st: StepScale, names: (CuffLineName | HemLineName)[], below: number[], has: Len | null, front: number[] | null): PrintedLine[] {
  const hasSteps = has === null ? null : near(st.of(has.mm));
  return below.map((b, k) => ({
    n: k + 1,
    name: names[k]!,
    belowMark: st.len(b),
    aboveRawEdge: hasSteps === null ? null : st.len(hasSteps - b),
    frontBelowMark: front === null ? null : st.len(front[k]!),
  }));
}

function seamAllowanceMm(leg: CuffLeg | HemLeg): number | null {
  if (leg.finish !== 'cuff' || !leg.taper || leg.taper.input.seamAllowance === undefined) return null;
  try {
    return parseLength(String(leg.taper.input.seamAllowance), leg.taper.input.unit).mm;
  } catch {
    return null;
  }
}

function taperOf(leg: CuffLeg | HemLeg, st: StepScale): PrintedPlan['taper'] {
  if (leg.finish !== 'cuff' || !leg.taper) return null;
  const t = leg.taper.plan;
  // Each side in half steps for inches (the seam then stays on the sheet's step), whole steps metric.
  const side = new StepScale(st.unit, st.unit === 'in' ? st.precision * 2 : st.precision);
  const lines = t.lines.map((l) => {
    const perSide = near(side.of(l.change.mm / 2));
    return {
      n: l.n,
      name: l.name,
      sign: Math.sign(perSide) as -1 | 0 | 1,
      perSeam: side.len(Math.abs(2 * perSide)),
      perSide: side.len(Math.abs(perSide)),
    };
  });
  const work = !t.withinTolerance && lines.some((l) => l.sign !== 0);
  let beyond: NonNullable<PrintedPlan['taper']>['beyondSeamAllowance'] = null;
  const allowance = seamAllowanceMm(leg);
  if (work && t.feasible === false && allowance !== null) {
    const most = lines.reduce((m, l) => (l.sign > 0 && l.perSide.mm > m.mm ? l.perSide : m), side.len(0));
    beyond = { perSide: most, seamAllowance: side.len(down(side.of(allowance))) };
  }
  return { target: st.len(near(st.of(t.targetWidth.mm))), lines, work, beyondSeamAllowance: beyond };
}

/** Works out every figure one cuff's or plain hem's block prints, in whole steps (see the rules at the top; a kept factory hem: printed-original.ts). */
export function printedPlan(leg: CuffLeg | HemLeg): PrintedPlan {
  const p = leg.plan;
  const st = new StepScale(p.unit, p.precision);
  // The cloth below the mark: the first line's distances both ways (a hem's edge may sit below the mark).
  const first = p.lines[0];
  const available = first?.aboveRawEdge ? first.aboveRawEdge.mm + first.belowMark.mm : null;
  const turnUnder = st.len(near(st.of(p.turnUnder.mm)));
  if (p.kind === 'hem') {
    const h = up(st.of(p.hemAllowance.mm));
    const s = near(st.of(p.slope.mm));
    // The finished edge below the pin mark (unwashed cloth left long; else 0): already whole steps
    // as the shrink lines print it, so edge + hem is the cut the lines and the strip show.
    const e = up(st.of(p.lines[0]?.belowMark.mm ?? 0));
    const c = cloth(st, e + h, available, p.enough);
    return {
      unit: p.unit,
      precision: p.precision,
      depth: st.len(h),
      turnOfCloth: null,
      thirdSection: null,
      slope: st.len(s),
      turnUnder,
      lines: linesOf(st, ['finished-edge', 'cut'], [e, e + h], c.has, [e - s, e + h - s]),
      cloth: c,
      alternatives: null,
      taper: null,
    };
  }
  const [, top, fold, cut] = p.lines.map((l) => l.belowMark.mm) as [number, number, number, number];
  const d = Math.max(1, near(st.of(p.cuffDepth.mm)));
  const t = near(st.of(top - p.cuffDepth.mm));
  const inner = 2 * (d + t);
  // The third section takes what rounding the sections above left, so the cut is never above the exact one.
  const m = Math.max(up(st.of(cut) - inner), near(st.of(cut - fold)), 1);
  const c = cloth(st, inner + m, available, p.enough);
  let alternatives: PrintedPlan['alternatives'] = null;
  if (p.alternatives && c.has) {
    const has = near(st.of(c.has.mm));
    const alt = p.alternatives;
    const deepest = alt.deepestCuff === null ? null : Math.min(near(st.of(alt.deepestCuff.mm)), Math.floor((has - 2 * t) / 3));
    const needs = (mm: number, fits: boolean) => {
      const req = up(st.of(mm));
      return { required: st.len(req), fits: fits && req <= has };
    };
    const shorter = alt.shorterSection === null ? null : Math.min(Math.floor(st.of(alt.shorterSection.mm) + 1e-6), has - inner);
    alternatives = {
      shorterSection: shorter === null || shorter < 1 ? null : st.len(shorter),
      deepestCuff: deepest === null || deepest < 1 ? null : st.len(deepest),
      plainHem: needs(alt.plainHem.required.mm, alt.plainHem.fits),
      facedCuff: needs(alt.facedCuff.required.mm, alt.facedCuff.fits),
    };
  }
  return {
    unit: p.unit,
    precision: p.precision,
    depth: st.len(d),
    turnOfCloth: t === 0 ? null : st.len(t),
    thirdSection: st.len(m),
    slope: null,
    turnUnder,
    lines: linesOf(st, ['finished-edge', 'cuff-top', 'inner-fold', 'cut'], [0, d + t, inner, inner + m], c.has, null),
    cloth: c,
    alternatives,
    taper: taperOf(leg, st),
  };
}
