import Fraction from 'fraction.js';
import type { CuffLineName } from './types';

/** The four chalk lines of a cuff, exact mm below the pin mark, top to bottom. */
export interface CuffLinePositions {
  finishedEdge: Fraction;
  cuffTop: Fraction;
  innerFold: Fraction;
  cut: Fraction;
}

const ZERO = new Fraction(0);

/** Line names in order, numbered 1 to 4. */
export const CUFF_LINE_NAMES: readonly CuffLineName[] = ['finished-edge', 'cuff-top', 'inner-fold', 'cut'];

/** Where the lines fall for cuff depth d, third section m and turn of cloth t (taken at each fold). */
export function cuffLinePositions(d: Fraction, m: Fraction, t: Fraction): CuffLinePositions {
  const cuffTop = t.n === 0n ? d : d.add(t);
  const innerFold = cuffTop.add(cuffTop);
  return { finishedEdge: ZERO, cuffTop, innerFold, cut: innerFold.add(m) };
}

/** The positions as an array in line order. */
export function linePositionList(p: CuffLinePositions): [Fraction, Fraction, Fraction, Fraction] {
  return [p.finishedEdge, p.cuffTop, p.innerFold, p.cut];
}
