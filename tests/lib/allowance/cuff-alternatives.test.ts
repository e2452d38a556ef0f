import Fraction from 'fraction.js';
import { describe, expect, it } from 'vitest';
import { cuffAlternatives, deepestCuff } from '@/lib/allowance/cuff-alternatives';
import { exactDefaults } from '@/lib/allowance/defaults';
import { Exact } from '@/lib/allowance/exact';
import { lenMaker } from '@/lib/allowance/len';

const inch = (n: number, d = 1) => new Fraction(n, d).mul(new Fraction(127, 5));

function ctx(available: Fraction, d: Fraction, t = new Fraction(0), precision: 8 | 16 = 16) {
  const x = Exact.from;
  return {
    available: x(available),
    cuffDepth: x(d),
    hemSection: x(d),
    turnUnder: x(inch(1, 2)),
    innerFold: x(d.add(t).mul(2)),
    clothThickness: x(t),
    unit: 'in' as const,
    precision,
    defaults: exactDefaults('in'),
    len: lenMaker('in', precision),
  };
}

describe('cuff alternatives', () => {
  it('deepest three-section cuff in 4 in: 1 5/16 in at 1/16, 1 1/4 in at 1/8 (4/3 in rounded down; arithmetic)', () => {
    expect(lenMaker('in', 16)(deepestCuff(ctx(inch(4), inch(3, 2)))!).text).toBe('1 5/16 in');
    expect(lenMaker('in', 8)(deepestCuff(ctx(inch(4), inch(3, 2), new Fraction(0), 8))!).text).toBe('1 1/4 in');
  });

  it('turn of cloth comes off first: 4 in with 1/8 in per fold leaves 1 1/4 in (arithmetic)', () => {
    expect(lenMaker('in', 16)(deepestCuff(ctx(inch(4), inch(3, 2), inch(1, 8)))!).text).toBe('1 1/4 in');
  });

  it('offers no cuff under the shallowest workable, 3/4 in (common practice (no source))', () => {
    expect(lenMaker('in', 16)(deepestCuff(ctx(inch(9, 4), inch(3, 2)))!).text).toBe('3/4 in');
    expect(deepestCuff(ctx(inch(35, 16), inch(3, 2)))).toBeNull();
  });

  it('plain hem 1½ in (TRADE.md: powersewing.com, 1¼ to 2 in) and faced cuff 2d + ½ in seam (from memory)', () => {
    const alt = cuffAlternatives(ctx(inch(3), inch(3, 2)));
    expect(alt.plainHem).toEqual({ required: { mm: 38.1, text: '1 1/2 in' }, fits: true });
    expect(alt.facedCuff).toEqual({ required: { mm: 88.9, text: '3 1/2 in' }, fits: false });
  });
});
