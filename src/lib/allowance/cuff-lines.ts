import { type Exact, ZERO } from './exact';
import type { CuffLineName } from './types';

/** The four chalk lines of a cuff, exact mm below the pin mark, top to bottom. */
export interface CuffLinePositions {
  finishedEdge: Exact;
  cuffTop: Exact;
  innerFold: Exact;
  cut: Exact;
}

/** Line names in order, numbered 1 to 4. */
export const CUFF_LINE_NAMES: readonly CuffLineName[] = ['finished-edge', 'cuff-top', 'inner-fold', 'cut'];

/** Where the lines fall for cuff depth d, third section m and turn of cloth t (taken at each fold). */
export function cuffLinePositions(d: Exact, m: Exact, t: Exact): CuffLinePositions {
  const cuffTop = t.isZero() ? d : d.add(t);
  const innerFold = cuffTop.twice();
  return { finishedEdge: ZERO, cuffTop, innerFold, cut: innerFold.add(m) };
}

/** The positions as an array in line order. */
export function linePositionList(p: CuffLinePositions): [Exact, Exact, Exact, Exact] {
  return [p.finishedEdge, p.cuffTop, p.innerFold, p.cut];
}
