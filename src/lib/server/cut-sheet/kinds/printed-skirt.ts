// The figures a skirt's or dress's block prints, in whole display steps (1/8 or 1/16 in, 0.5 mm)
// so every sum holds as printed, rounded to the safe side of the cloth (cut lower, never short):
// - the hem depth and turn-under: up (more cloth kept below the new line); cloth kept = their sum;
// - the new line below the marker's pins: up (the new line lower: longer, never short);
// - each place's pins above the present edge: down (the new line lower again);
//   the new line above the edge = pins − below-pins, the cutting line = new line − cloth kept;
// - the cloth below the edge: down, so the spare (cloth + cutting line) is never more than exact;
// - the hem's round: to the nearest step; the fullness to ease: up; its landing round = round − fullness;
// - the deepest hem that lies flat: down (the engine floors it already).
import type { Len, Precision, Unit } from '../../../allowance/types';
import type { HemPoint } from '../../../allowance/kind-types';
import type { SkirtPlan } from '../../../shared/fitting/skirt-fitting';
import { StepScale } from '../printed';

/** One place round the hem as printed. */
export interface PrintedSkirtPoint {
  at: HemPoint;
  pinAboveEdge: Len;
  /** pins − new line below the pins: + shorten by this above the present edge, − let down */
  newLineAboveEdge: Len;
  /** new line − cloth kept: the cutting line above the present edge (negative: below it, in the let-down hem) */
  cutAboveEdge: Len;
  cloth: Len | null;
  /** cloth + cutting line: what is left below the cutting line (negative: short by this) */
  spare: Len | null;
}

/** A skirt's plan as the sheet prints it. */
export interface PrintedSkirt {
  unit: Unit;
  precision: Precision;
  hemRound: Len;
  /** the finished hem's depth, as turned (or rolled; a facing keeps the depth asked) */
  depth: Len;
  turnUnder: Len;
  /** depth + turn-under: cloth kept below the new hem line, the strip's cutting line */
  keep: Len;
  fullness: Len | null;
  /** hem round − fullness */
  landing: Len | null;
  liesFlatTo: Len | null;
  level: { belowPins: Len; shoeRise: Len; points: PrintedSkirtPoint[] } | null;
}

const EPS = 1e-6;
const up = (x: number) => Math.ceil(x - EPS);
const down = (x: number) => Math.floor(x + EPS);
const near = (x: number) => Math.sign(x) * Math.floor(Math.abs(x) + 0.5 + EPS);

/** Works out every figure a skirt's block prints, in whole steps of the sheet (see the rules at the top). */
export function printedSkirt(plan: SkirtPlan, unit: Unit, precision: Precision): PrintedSkirt {
  const st = new StepScale(unit, precision);
  const f = plan.flared;
  const depth = up(st.of((f.finishDepth ?? f.hemDepth).mm));
  // A rolled hem turns its raw edge under too (rolled twice): the turn-under is kept below it as well.
  const turnUnder = up(st.of(f.turnUnder.mm));
  const keep = depth + turnUnder;
  const round = near(st.of(f.hemCircumference.mm));
  const fullness = f.shape === 'straight' ? null : up(st.of(Math.abs(f.fullness.mm)));
  let level: PrintedSkirt['level'] = null;
  if (plan.level) {
    const below = up(st.of(plan.level.newLineBelowPins.mm));
    level = {
      belowPins: st.len(below),
      shoeRise: st.len(near(st.of(plan.level.shoeRise.mm))),
      points: plan.level.points.map((p) => {
        const pin = down(st.of(p.pinAboveEdge.mm));
        const newLine = pin - below;
        const cut = newLine - keep;
        // The engine's spare is cloth + its cut; the cloth itself back out of it, then floored.
        const clothMm = p.spare === null ? null : p.spare.mm - p.cutAboveEdge.mm;
        const cloth = clothMm === null ? null : down(st.of(clothMm));
        return {
          at: p.at,
          pinAboveEdge: st.len(pin),
          newLineAboveEdge: st.len(newLine),
          cutAboveEdge: st.len(cut),
          cloth: cloth === null ? null : st.len(cloth),
          spare: cloth === null ? null : st.len(cloth + cut),
        };
      }),
    };
  }
  return {
    unit,
    precision,
    hemRound: st.len(round),
    depth: st.len(depth),
    turnUnder: st.len(turnUnder),
    keep: st.len(keep),
    fullness: fullness === null ? null : st.len(fullness),
    // Only a flare lands on a shorter round; a tapered skirt's is longer (its seams let out instead).
    landing: fullness === null || f.shape !== 'flared' ? null : st.len(round - fullness),
    liesFlatTo: f.liesFlatTo === null ? null : st.len(down(st.of(f.liesFlatTo.mm))),
    level,
  };
}
