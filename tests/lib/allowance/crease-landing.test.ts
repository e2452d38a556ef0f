import Fraction from 'fraction.js';
import { describe, expect, it } from 'vitest';
import { creaseLanding, creaseWarning } from '@/lib/allowance/crease-landing';
import { Exact } from '@/lib/allowance/exact';
import { cuffLinePositions, linePositionList } from '@/lib/allowance/cuff-lines';
import { lenMaker } from '@/lib/allowance/len';

const inch = (n: number, d = 1) => new Fraction(n, d).mul(new Fraction(127, 5));

function land(creaseIn: Fraction, unit: 'in' | 'mm' = 'in') {
  // A 1½ in cuff, three equal sections: lines at 0, 1½, 3 and 4½ in (TRADE.md: Seam2Seam 2014)
  const d = inch(3, 2);
  const lines = cuffLinePositions(Exact.from(d), Exact.from(d), Exact.int(0));
  const x = Exact.from;
  return creaseLanding(x(creaseIn), {
    cuffDepth: x(d),
    cuffDepthMm: d.valueOf(),
    onFoldWithinMm: unit === 'in' ? 25.4 / 16 : 1.5,
    lines,
    linesMm: linePositionList(lines).map((f) => f.valueOf()),
    onFoldWithin: x(unit === 'in' ? inch(1, 16) : new Fraction(3, 2)),
    // work to an eighth (TRADE.md common practice); 3 mm metric
    nearCuffTop: x(unit === 'in' ? inch(1, 8) : new Fraction(3)),
    len: lenMaker(unit, 16),
  });
}

// creaseWarning spells out { place, ...values } for the hot path, without a spread:
// the same entries in the same order, for every visible place, every 1/32 in from 4 in above the mark to 6 in below.
describe('creaseWarning', () => {
  it('is the landing’s message with { place, ...values }, key order and all (arithmetic)', () => {
    const seen = new Set<string>();
    for (const unit of ['in', 'mm'] as const) {
      for (let k = -128; k <= 192; k++) {
        const l = land(inch(k, 32), unit);
        if (!l.visible) continue;
        seen.add(l.place);
        const w = creaseWarning(l);
        expect(w.code).toBe('old-crease-visible');
        expect(w.message).toBe(l.message);
        expect(Object.entries(w.values!)).toEqual(Object.entries({ place: l.place, ...l.values }));
      }
    }
    expect([...seen].sort()).toEqual(['at-cuff-top', 'cuff-face', 'leg-visible']);
  });
});

// Heights follow the fold plan in TRADE.md ("The cuff, as a fold plan"); numbers are its arithmetic.
describe('creaseLanding', () => {
  it.each([
    [inch(-2), 'leg-visible', '2 in', true],
    [inch(-3, 2), 'at-cuff-top', '1 1/2 in', true],
    [inch(-23, 16), 'at-cuff-top', '1 7/16 in', true],
    [inch(-13, 8), 'at-cuff-top', '1 5/8 in', true],
    [inch(-27, 16), 'leg-visible', '1 11/16 in', true],
    [inch(-21, 16), 'behind-cuff', '1 5/16 in', false],
    [inch(-1), 'behind-cuff', '1 in', false],
    [inch(3, 4), 'behind-cuff', '3/4 in', false],
    [inch(2), 'cuff-face', '1 in', true],
    [inch(5, 2), 'cuff-face', '1/2 in', true],
    [inch(15, 4), 'inside', '3/4 in', false],
    [inch(5), 'cut-away', '2 in', false],
    [inch(1, 32), 'on-fold', '0 in', false],
    [inch(-1, 16), 'on-fold', '0 in', false],
    [inch(25, 16), 'on-fold', '1 1/2 in', false],
    [inch(47, 16), 'on-fold', '0 in', false],
    [inch(3, 32), 'behind-cuff', '3/32 in', false],
  ])('an old crease %s mm below the mark: %s at %s', (crease, place, height, visible) => {
    const l = land(crease);
    expect(l.place).toBe(place);
    expect(l.visible).toBe(visible);
    if (height.includes('/32')) expect(l.heightAboveEdge.mm).toBeCloseTo(crease.valueOf(), 9);
    else expect(l.heightAboveEdge.text).toBe(height);
    expect(l.message.length).toBeGreaterThan(20);
  });

  it('tells the tailor to press the crease out when it shows, with the height in the plan unit', () => {
    const l = land(inch(-2));
    expect(l.message).toContain('2 in above the finished edge');
    expect(l.message).toMatch(/[Pp]ress or steam/);
    expect(land(inch(2)).message).toMatch(/face of the cuff/);
  });

  it('takes a crease within 1.5 mm of a fold in metric plans, not 2 mm (our tolerance, 1/16 in ≈ 1.6 mm)', () => {
    expect(land(new Fraction(3, 2), 'mm').place).toBe('on-fold');
    expect(land(new Fraction(2), 'mm').place).toBe('behind-cuff');
  });

  it('a crease at the cuff-top height and one 1/16 in lower get the same verdict, with the 1/8 in tolerance stated and the customer told it may not press out (TRADE.md: work to an eighth)', () => {
    const at = land(inch(-3, 2));
    const lower = land(inch(-23, 16));
    expect([at.place, at.visible]).toEqual([lower.place, lower.visible]);
    for (const l of [at, lower]) {
      expect(l.message).toContain('within 1/8 in of the cuff top');
      expect(l.message).toContain('Tell the customer it may not press out.');
    }
    expect(land(inch(-2)).message).toContain('Tell the customer it may not press out.');
    expect(land(inch(2)).message).toContain('Tell the customer it may not press out.');
  });

  it('names the fold it falls on', () => {
    expect(land(inch(3, 2)).message).toContain('cuff top');
    expect(land(inch(3)).message).toContain('inner fold');
    expect(land(new Fraction(0)).message).toContain('finished edge');
  });
});
