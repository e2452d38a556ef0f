import Fraction from 'fraction.js';
import { describe, expect, it } from 'vitest';
import { Exact } from '@/lib/allowance/exact';
import { CUFF_LINE_NAMES, cuffLinePositions, linePositionList } from '@/lib/allowance/cuff-lines';

describe('cuffLinePositions', () => {
  it('three equal sections: d, 2d, 3d (TRADE.md: Seam2Seam 2014, 1½ in cuff → 4½ in)', () => {
    const d = Exact.from(new Fraction(3, 2));
    const p = cuffLinePositions(d, d, Exact.int(0));
    expect(linePositionList(p).map((f) => f.toFraction().toFraction(true))).toEqual(['0', '1 1/2', '3', '4 1/2']);
  });

  it("turn of cloth added at each fold: d + t, 2d + 2t, 2d + 2t + m (the brief's fold law)", () => {
    const p = cuffLinePositions(Exact.ratio(3, 2), Exact.int(1), Exact.ratio(1, 16));
    expect(linePositionList(p).map((f) => f.toFraction().toFraction(true))).toEqual(['0', '1 9/16', '3 1/8', '4 1/8']);
  });

  it('names the lines top to bottom', () => {
    expect(CUFF_LINE_NAMES).toEqual(['finished-edge', 'cuff-top', 'inner-fold', 'cut']);
  });
});
