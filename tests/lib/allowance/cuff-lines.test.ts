import Fraction from 'fraction.js';
import { describe, expect, it } from 'vitest';
import { CUFF_LINE_NAMES, cuffLinePositions, linePositionList } from '@/lib/allowance/cuff-lines';

describe('cuffLinePositions', () => {
  it('three equal sections: d, 2d, 3d (TRADE.md: Seam2Seam 2014, 1½ in cuff → 4½ in)', () => {
    const d = new Fraction(3, 2);
    const p = cuffLinePositions(d, d, new Fraction(0));
    expect(linePositionList(p).map((f) => f.toFraction(true))).toEqual(['0', '1 1/2', '3', '4 1/2']);
  });

  it('turn of cloth added at each fold: d + t, 2d + 2t, 2d + 2t + m (the brief\'s fold law)', () => {
    const p = cuffLinePositions(new Fraction(3, 2), new Fraction(1), new Fraction(1, 16));
    expect(linePositionList(p).map((f) => f.toFraction(true))).toEqual(['0', '1 9/16', '3 1/8', '4 1/8']);
  });

  it('names the lines top to bottom', () => {
    expect(CUFF_LINE_NAMES).toEqual(['finished-edge', 'cuff-top', 'inner-fold', 'cut']);
  });
});
