import fc from 'fast-check';
import Fraction from 'fraction.js';
import { describe, expect, it } from 'vitest';
import { AllowanceError, type CuffInput, type CuffPlan, formatLength, planCuff, type Unit } from '@/lib/allowance';

const lineTexts = (plan: CuffPlan) => plan.lines.map((l) => l.belowMark.text);
const codes = (plan: CuffPlan) => plan.warnings.map((w) => w.code);

describe('planCuff: published examples', () => {
  it('1½ in cuff: cut 4½ in below the mark, folds at 1½ and 3 in (TRADE.md: Seam2Seam 2014; Permanent Style 2020, "three times the height of the cuff")', () => {
    const plan = planCuff({ unit: 'in', cuffDepth: '1 1/2' });
    expect(lineTexts(plan)).toEqual(['0 in', '1 1/2 in', '3 in', '4 1/2 in']);
    expect(plan.required.text).toBe('4 1/2 in');
    expect(plan.required.mm).toBe(114.3);
    expect(plan.lines.map((l) => l.name)).toEqual(['finished-edge', 'cuff-top', 'inner-fold', 'cut']);
    expect(plan.warnings).toEqual([]);
  });

  it('2 × cuff depth + 1 in hem: 1¼ in cuff → 3½ in (TRADE.md: learning-alterations.com)', () => {
    const plan = planCuff({ unit: 'in', cuffDepth: '1¼', hemSection: 1 });
    expect(plan.required.text).toBe('3 1/2 in');
    expect(lineTexts(plan)).toEqual(['0 in', '1 1/4 in', '2 1/2 in', '3 1/2 in']);
  });

  it('2 × cuff depth + ½ in: 2½ in cuff → 5½ in (TRADE.md: climbingthewillow.com 2014)', () => {
    const plan = planCuff({ unit: 'in', cuffDepth: 2.5, hemSection: '1/2' });
    expect(plan.required.text).toBe('5 1/2 in');
    // 2½ in is over the usual 1 to 2¼ in (TRADE.md: Encyclopedia of Men's Clothes; Permanent Style 2020)
    expect(codes(plan)).toContain('cuff-depth-unusual');
    // a ½ in third section with the ½ in turn-under leaves nothing (TRADE.md common practice: turn-under about ½ in)
    expect(codes(plan)).toContain('third-section-too-small');
  });

  it('permanent turn-ups need 4½ to 5 in: 1½ and 1⅝ in cuffs fall inside (TRADE.md: Dellafera, Modern Tailoring, 1949)', () => {
    for (const depth of ['1 1/2', '1 5/8']) {
      const required = planCuff({ unit: 'in', cuffDepth: depth }).required.mm;
      expect(required).toBeGreaterThanOrEqual(4.5 * 25.4);
      expect(required).toBeLessThanOrEqual(5 * 25.4);
    }
  });

  it('metric: a 40 mm cuff needs 120 mm, a 5 cm cuff 15 cm (TRADE.md three-times rule; 5 cm modern standard, Permanent Style 2020)', () => {
    expect(planCuff({ unit: 'mm', cuffDepth: 40 }).required.text).toBe('120 mm');
    const cm = planCuff({ unit: 'cm', cuffDepth: '5' });
    expect(lineTexts(cm)).toEqual(['0 cm', '5 cm', '10 cm', '15 cm']);
    expect(cm.turnUnder.text).toBe('1.2 cm');
  });

  it('turn-under defaults to ½ in, 12 mm metric (TRADE.md common practice: about ½ in on a cuff inner edge)', () => {
    expect(planCuff({ unit: 'in', cuffDepth: 1.5 }).turnUnder.text).toBe('1/2 in');
    expect(planCuff({ unit: 'mm', cuffDepth: 38 }).turnUnder.text).toBe('12 mm');
  });

  it("usual depths 1¼, 1½, 1¾, 2 in raise no depth warning; ¾ and 2½ in do (TRADE.md: Encyclopedia of Men's Clothes; Permanent Style 2020)", () => {
    for (const d of ['1 1/4', '1 1/2', '1 3/4', '2', '1', '2 1/4']) expect(codes(planCuff({ unit: 'in', cuffDepth: d }))).not.toContain('cuff-depth-unusual');
    for (const d of ['3/4', '2 1/2']) expect(codes(planCuff({ unit: 'in', cuffDepth: d }))).toContain('cuff-depth-unusual');
  });

  it("a cuff is planned level even when a slope is asked for (TRADE.md: Encyclopedia of Men's Clothes, cuffs hemmed level)", () => {
    const plan = planCuff({ unit: 'in', cuffDepth: 1.5, slope: '1/2' });
    expect(codes(plan)).toEqual(['slope-on-cuff']);
    expect(plan.warnings[0]!.message).toContain('1/2 in');
    expect(lineTexts(plan)).toEqual(['0 in', '1 1/2 in', '3 in', '4 1/2 in']);
    expect(codes(planCuff({ unit: 'in', cuffDepth: 1.5, slope: 0 }))).toEqual([]);
  });

  it('turn of cloth is taken at each fold: 1½ in cuff with 1/16 in → lines at 1 9/16, 3 1/8, 4 5/8 in (arithmetic on the fold plan)', () => {
    const plan = planCuff({ unit: 'in', cuffDepth: 1.5, clothThickness: '1/16' });
    expect(lineTexts(plan)).toEqual(['0 in', '1 9/16 in', '3 1/8 in', '4 5/8 in']);
  });
});

describe('planCuff: cloth check', () => {
  it('enough cloth: 5 in below the mark for a 1½ in cuff leaves ½ in spare (arithmetic on the three-times rule)', () => {
    const plan = planCuff({ unit: 'in', cuffDepth: '1 1/2', available: 5 });
    expect(plan.enough).toBe(true);
    expect(plan.spare?.text).toBe('1/2 in');
    expect(plan.shortBy).toBeNull();
    expect(plan.alternatives).toBeNull();
    expect(plan.lines.map((l) => l.aboveRawEdge?.text)).toEqual(['5 in', '3 1/2 in', '2 in', '1/2 in']);
  });

  it('exactly enough: no spare left, still enough (arithmetic)', () => {
    const plan = planCuff({ unit: 'in', cuffDepth: '1 1/2', available: '4 1/2' });
    expect(plan.enough).toBe(true);
    expect(plan.spare?.text).toBe('0 in');
  });

  it('short by ½ in: a 1 5/16 in cuff, a plain hem (1½ in, powersewing.com) and a faced cuff (3½ in, from memory) still fit', () => {
    const plan = planCuff({ unit: 'in', cuffDepth: '1 1/2', available: 4 });
    expect(plan.enough).toBe(false);
    expect(plan.shortBy?.text).toBe('1/2 in');
    expect(plan.spare).toBeNull();
    // 4 in / 3 = 1.333 in, down to the 1/16: 1 5/16 in (arithmetic)
    expect(plan.alternatives?.deepestCuff?.text).toBe('1 5/16 in');
    expect(plan.alternatives?.plainHem).toEqual({ required: { mm: 38.1, text: '1 1/2 in' }, fits: true });
    expect(plan.alternatives?.facedCuff).toEqual({ required: { mm: 88.9, text: '3 1/2 in' }, fits: true });
    expect(plan.lines[3]!.aboveRawEdge?.text).toBe('-1/2 in');
    const warning = plan.warnings.find((w) => w.code === 'not-enough-cloth')!;
    expect(warning.message).toContain('short by 1/2 in');
    expect(warning.message).toContain('1 5/16 in cuff');
  });

  it('far too short: no cuff of ½ in or more fits and the message says to face the hem (arithmetic)', () => {
    const plan = planCuff({ unit: 'in', cuffDepth: 1.5, available: 1 });
    expect(plan.alternatives?.deepestCuff).toBeNull();
    expect(plan.alternatives?.plainHem.fits).toBe(false);
    expect(plan.alternatives?.facedCuff.fits).toBe(false);
    expect(plan.warnings[0]!.message).toMatch(/face the hem/);
  });

  it('a shallower cuff is shallower: 1¼ in asked, third section 2¼ in, 4 11/16 in of cloth offers 1 3/16 in, never 1 9/16 in (arithmetic)', () => {
    const plan = planCuff({ unit: 'in', cuffDepth: '1 1/4', hemSection: '2 1/4', available: '4 11/16' });
    expect(plan.enough).toBe(false);
    // 1¼ in less one 1/16 step (the three-times rule would allow 4 11/16 / 3 = 1 9/16 in)
    expect(plan.alternatives?.deepestCuff?.text).toBe('1 3/16 in');
  });

  it("short cloth first offers the customer's depth on a shorter third section: 1½ in cuff in 4 1/4 in keeps 1½ in with 1¼ in (arithmetic; turn-under ½ in + ¼ in stitch, common practice (no source))", () => {
    const plan = planCuff({ unit: 'in', cuffDepth: '1 1/2', available: '4 1/4' });
    expect(plan.alternatives?.shorterSection?.text).toBe('1 1/4 in');
    const message = plan.warnings.find((w) => w.code === 'not-enough-cloth')!.message;
    expect(message).toContain('the 1 1/2 in cuff with a 1 1/4 in third section');
    expect(message.indexOf('third section')).toBeLessThan(message.indexOf('three equal sections'));
    // 3 in + 3/4 in is the least: turn-under 1/2 in and 1/4 in to stitch (common practice (no source))
    expect(planCuff({ unit: 'in', cuffDepth: '1 1/2', available: '3 3/4' }).alternatives?.shorterSection?.text).toBe('3/4 in');
    expect(planCuff({ unit: 'in', cuffDepth: '1 1/2', available: '3 11/16' }).alternatives?.shorterSection).toBeNull();
    // the offer never puts the stitching above the cuff: at most cuff depth + turn-under, 1 3/4 in for a 1¼ in cuff
    expect(planCuff({ unit: 'in', cuffDepth: '1 1/4', hemSection: '2 1/4', available: '4 11/16' }).alternatives?.shorterSection?.text).toBe('1 3/4 in');
  });

  it('warns when the third section less the turn-under is deeper than the cuff: the stitching would show (fold arithmetic)', () => {
    const codes = (i: Partial<CuffInput>) => planCuff({ unit: 'in', cuffDepth: '1 1/4', ...i }).warnings.map((w) => w.code);
    // 2 in − 1/2 in = 1 1/2 in > 1 1/4 in
    expect(codes({ hemSection: '2' })).toContain('stitching-above-cuff');
    // 1 3/4 in − 1/2 in = 1 1/4 in: level with the cuff top, not above it
    expect(codes({ hemSection: '1 3/4' })).not.toContain('stitching-above-cuff');
    expect(codes({})).not.toContain('stitching-above-cuff');
  });

  it('a turn of cloth of 1e-310 is refused, not turned into a float that flips the cloth check (our rule: under 1/1000 mm is no length)', () => {
    expect(() => planCuff({ unit: 'in', cuffDepth: 1.5, available: 5, clothThickness: 1e-310 })).toThrow(
      expect.objectContaining({ field: 'clothThickness', code: 'out-of-range' }),
    );
    expect(() => planCuff({ unit: 'mm', cuffDepth: 38, available: 5, clothThickness: '1/10000' })).toThrow(/thousandth of a millimetre/);
    // 0 stays 0, and a thousandth of a mm is still a length
    expect(planCuff({ unit: 'in', cuffDepth: 1.5, available: 5, clothThickness: 0 }).enough).toBe(true);
    expect(planCuff({ unit: 'mm', cuffDepth: 38, available: 115, clothThickness: '0.001' }).enough).toBe(true);
  });

  it('metric shortfall rounds the deepest cuff down to 0.5 mm: 100 mm → 33 mm (100/3 = 33.33; arithmetic)', () => {
    const plan = planCuff({ unit: 'mm', cuffDepth: 40, available: 100 });
    expect(plan.shortBy?.text).toBe('20 mm');
    expect(plan.alternatives?.deepestCuff?.text).toBe('33 mm');
    expect(plan.alternatives?.plainHem.required.text).toBe('40 mm');
    expect(plan.alternatives?.facedCuff.required.text).toBe('92 mm');
  });
});

describe('planCuff: refusals carry the field', () => {
  it.each([
    [{ cuffDepth: 0 }, 'cuffDepth', 'not-positive'],
    [{ cuffDepth: -1 }, 'cuffDepth', 'not-positive'],
    [{ cuffDepth: '6 1/16' }, 'cuffDepth', 'out-of-range'],
    [{ cuffDepth: Number.NaN }, 'cuffDepth', 'not-a-length'],
    [{ cuffDepth: Infinity }, 'cuffDepth', 'not-a-length'],
    [{ cuffDepth: undefined }, 'cuffDepth', 'missing'],
    [{ cuffDepth: '' }, 'cuffDepth', 'missing'],
    [{ cuffDepth: 'abc' }, 'cuffDepth', 'not-a-length'],
    [{ cuffDepth: 1.5, hemSection: 0 }, 'hemSection', 'not-positive'],
    [{ cuffDepth: 1.5, turnUnder: '-1/4' }, 'turnUnder', 'negative'],
    [{ cuffDepth: 1.5, available: -1 }, 'available', 'negative'],
    [{ cuffDepth: 1.5, clothThickness: -0.1 }, 'clothThickness', 'negative'],
    [{ cuffDepth: 1.5, oldCrease: '1/0' }, 'oldCrease', 'divide-by-zero'],
    [{ cuffDepth: 1.5, available: 201 }, 'available', 'too-large'],
    [{ cuffDepth: 1.5, available: true as unknown as number }, 'available', 'not-a-length'],
  ])('%o → %s (%s)', (fields, field, code) => {
    let caught: unknown;
    try {
      planCuff({ unit: 'in', ...fields } as CuffInput);
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(AllowanceError);
    expect(caught).toMatchObject({ field, code });
    expect((caught as Error).message).toMatch(/\w/);
  });

  it('refuses a bad unit and precision', () => {
    expect(() => planCuff({ unit: 'yd' as Unit, cuffDepth: 1 })).toThrow(expect.objectContaining({ field: 'unit', code: 'bad-unit' }));
    expect(() => planCuff({ unit: 'in', precision: 10 as 8, cuffDepth: 1 })).toThrow(expect.objectContaining({ field: 'precision' }));
    expect(() => planCuff(null as unknown as CuffInput)).toThrow(AllowanceError);
  });

  it('refuses a cuff under the shallowest workable, 3/4 in or 20 mm (common practice, no source): 0.0001 is no "0 in cuff"', () => {
    for (const [unit, depth] of [
      ['in', 0.0001],
      ['in', '11/16'],
      ['mm', 19.5],
      ['cm', '1.9'],
    ] as const) {
      expect(() => planCuff({ unit, cuffDepth: depth })).toThrow(expect.objectContaining({ field: 'cuffDepth', code: 'out-of-range' }));
    }
    expect(() => planCuff({ unit: 'in', cuffDepth: 0.0001 })).toThrow(/at least 3\/4 in/);
    expect(planCuff({ unit: 'in', cuffDepth: '3/4' }).cuffDepth.text).toBe('3/4 in');
    expect(planCuff({ unit: 'mm', cuffDepth: 20 }).cuffDepth.text).toBe('20 mm');
  });

  it('allows a 6 in cuff at most, 150 mm metric (our limit)', () => {
    expect(planCuff({ unit: 'in', cuffDepth: 6 }).cuffDepth.text).toBe('6 in');
    expect(() => planCuff({ unit: 'mm', cuffDepth: 150.5 })).toThrow(/at most 150 mm/);
  });
});

// ---- properties -------------------------------------------------------------------------------

/** A cuff in whole 1/32 in (inch plans) or half mm (metric), with the exact mm beside it. */
interface Gen {
  unit: Unit;
  /** exact mm of one generated step */
  stepMm: Fraction;
  d: number;
  m: number | null;
  u: number | null;
  t: number;
  a: number | null;
  asText: boolean;
}

const genArb: fc.Arbitrary<Gen> = fc
  .record({
    unit: fc.constantFrom<Unit>('in', 'cm', 'mm'),
    // from the shallowest workable cuff (20 mm, 3/4 in; common practice, no source) up, in 1/32 in or 0.5 mm steps
    d: fc.integer({ min: 40, max: 150 }),
    m: fc.option(fc.integer({ min: 1, max: 150 })),
    u: fc.option(fc.integer({ min: 0, max: 40 })),
    t: fc.integer({ min: 0, max: 4 }),
    a: fc.option(fc.integer({ min: 0, max: 800 })),
    asText: fc.boolean(),
  })
  .map((g) => ({ ...g, stepMm: g.unit === 'in' ? new Fraction(254, 320) : new Fraction(1, 2) }));

/** The generated value as the plan's input: a number in the plan's unit or the same as text. */
function asInput(g: Gen, steps: number): number | string {
  const inUnit = g.unit === 'in' ? new Fraction(steps, 32) : g.unit === 'mm' ? new Fraction(steps, 2) : new Fraction(steps, 20);
  if (!g.asText) return inUnit.valueOf();
  return g.unit === 'in' ? `${steps}/32` : inUnit.toString();
}

function inputOf(g: Gen, withT = true): CuffInput {
  return {
    unit: g.unit,
    cuffDepth: asInput(g, g.d),
    ...(g.m === null ? {} : { hemSection: asInput(g, g.m) }),
    ...(g.u === null ? {} : { turnUnder: asInput(g, g.u) }),
    ...(withT && g.t > 0 ? { clothThickness: asInput(g, g.t) } : {}),
    ...(g.a === null ? {} : { available: asInput(g, g.a) }),
  };
}

const mmOf = (g: Gen, steps: number) => g.stepMm.mul(steps);

describe('planCuff laws', () => {
  it('lines strictly ordered', () => {
    fc.assert(
      fc.property(genArb, (g) => {
        const mms = planCuff(inputOf(g)).lines.map((l) => l.belowMark.mm);
        for (let k = 1; k < 4; k++) expect(mms[k]!).toBeGreaterThan(mms[k - 1]!);
      }),
    );
  });

  it('required = 2 × cuff depth + third section (t = 0)', () => {
    fc.assert(
      fc.property(genArb, (g) => {
        const plan = planCuff(inputOf(g, false));
        const expected = mmOf(g, 2 * g.d + (g.m ?? g.d));
        expect(plan.required.mm).toBe(expected.valueOf());
      }),
    );
  });

  it('required = 2 × (cuff depth + turn of cloth) + third section', () => {
    fc.assert(
      fc.property(genArb, (g) => {
        const plan = planCuff(inputOf(g));
        expect(plan.required.mm).toBe(mmOf(g, 2 * (g.d + g.t) + (g.m ?? g.d)).valueOf());
        expect(plan.lines[1]!.belowMark.mm).toBe(mmOf(g, g.d + g.t).valueOf());
      }),
    );
  });

  it('enough ⇔ spare ≥ 0, and shortBy/spare are consistent with available − required', () => {
    fc.assert(
      fc.property(genArb, (g) => {
        const plan = planCuff(inputOf(g));
        if (g.a === null) {
          expect([plan.enough, plan.spare, plan.shortBy, plan.alternatives]).toEqual([null, null, null, null]);
          expect(plan.lines.every((l) => l.aboveRawEdge === null)).toBe(true);
          return;
        }
        const rest = mmOf(g, g.a).sub(mmOf(g, 2 * (g.d + g.t) + (g.m ?? g.d)));
        expect(plan.enough).toBe(rest.compare(0) >= 0);
        expect(plan.enough).toBe(plan.spare !== null && plan.spare.mm >= 0);
        if (plan.enough) {
          expect(plan.shortBy).toBeNull();
          expect(plan.spare!.mm).toBe(rest.valueOf());
          expect(plan.alternatives).toBeNull();
        } else {
          expect(plan.spare).toBeNull();
          expect(plan.shortBy!.mm).toBe(rest.neg().valueOf());
          expect(plan.shortBy!.mm).toBeGreaterThan(0);
          expect(plan.alternatives).not.toBeNull();
          expect(plan.warnings.map((w) => w.code)).toContain('not-enough-cloth');
        }
        for (const line of plan.lines) expect(line.aboveRawEdge!.mm).toBeCloseTo(mmOf(g, g.a).valueOf() - line.belowMark.mm, 9);
      }),
    );
  });

  it('the deepest cuff offered fits with three equal sections and one display step more would not fit or would not be shallower', () => {
    fc.assert(
      fc.property(genArb, (g) => {
        const alt = planCuff(inputOf(g)).alternatives;
        if (alt === null || alt.deepestCuff === null) return;
        const available = mmOf(g, g.a!);
        const t = mmOf(g, g.t);
        const deep = mmOf(g, 0).add(alt.deepestCuff.mm.toString());
        const step = g.unit === 'in' ? new Fraction(254, 160) : new Fraction(1, 2);
        expect(deep.mul(3).add(t.mul(2)).compare(available)).toBeLessThanOrEqual(0);
        const more = deep.add(step);
        expect(more.mul(3).add(t.mul(2)).compare(available) > 0 || more.compare(mmOf(g, g.d)) >= 0).toBe(true);
      }),
    );
  });

  it('alternatives are always smaller than what was asked, and fit', () => {
    fc.assert(
      fc.property(genArb, (g) => {
        const plan = planCuff(inputOf(g));
        const alt = plan.alternatives;
        if (alt === null) return;
        if (alt.deepestCuff !== null) expect(alt.deepestCuff.mm).toBeLessThan(plan.cuffDepth.mm);
        if (alt.shorterSection !== null) {
          expect(alt.shorterSection.mm).toBeLessThan(plan.hemSection.mm);
          expect(alt.shorterSection.mm).toBeGreaterThanOrEqual(plan.turnUnder.mm);
          expect(plan.lines[2]!.belowMark.mm + alt.shorterSection.mm).toBeLessThanOrEqual(mmOf(g, g.a!).valueOf() + 1e-9);
        }
      }),
    );
  });

  it('every Len text is its mm formatted in the plan unit and precision', () => {
    const lens = (x: unknown): { mm: number; text: string }[] =>
      x === null || typeof x !== 'object' ? [] : 'mm' in x && 'text' in x ? [x as { mm: number; text: string }] : Object.values(x).flatMap(lens);
    fc.assert(
      fc.property(genArb, fc.constantFrom<8 | 16 | 32>(8, 16, 32), (g, precision) => {
        const plan = planCuff({ ...inputOf(g), precision, oldCrease: asInput(g, g.d + 3) });
        const all = lens(plan);
        expect(all.length).toBeGreaterThanOrEqual(8);
        for (const len of all) expect(len.text).toBe(formatLength(len.mm, { unit: g.unit, precision }));
      }),
    );
  });
});

// ---- the fold, simulated independently ---------------------------------------------------------

/**
 * Follow one point of the cloth, s below the pin mark (leg above at s < 0), through the two folds:
 * first to the inside at the cuff top (s = d), then up at the finished edge (y = 0).
 * Returns its height above the finished edge, how many times it was turned over, and whether the
 * second fold carried it up outside the leg.
 */
function simulateFold(s: number, d: number): { h: number; flips: number; outside: boolean } {
  let y = s;
  let flips = 0;
  if (s > d) {
    y = 2 * d - s;
    flips += 1;
  }
  if (y > 0) return { h: y, flips: flips + 1, outside: true };
  return { h: -y, flips, outside: false };
}

describe('the fold simulation agrees with every plan', () => {
  const near = (a: number, b: number) => expect(Math.abs(a - b)).toBeLessThan(1e-9);

  it('line 1 and line 3 at the bottom, line 2 at the cuff top, the cut and turned-under edge inside the leg', () => {
    fc.assert(
      fc.property(genArb, (g) => {
        const plan = planCuff(inputOf(g, false));
        const d = plan.cuffDepth.mm;
        const [l1, l2, l3, cut] = plan.lines.map((l) => l.belowMark.mm) as [number, number, number, number];
        near(simulateFold(l1, d).h, 0);
        near(simulateFold(l3, d).h, 0);
        near(simulateFold(l2, d).h, d);
        // nothing of the cuff rises above its top
        for (let k = 0; k <= 20; k++) expect(simulateFold((l3 * k) / 20, d).h).toBeLessThanOrEqual(d + 1e-9);
        // the outer face (section 2) is turned over twice: right side out
        const face = simulateFold((l2 + l3) / 2, d);
        expect(face).toMatchObject({ flips: 2, outside: true });
        // the raw edge stays inside the leg, a third section up
        const edge = simulateFold(cut, d);
        expect(edge.outside).toBe(false);
        near(edge.h, plan.hemSection.mm);
        const turned = simulateFold(cut - plan.turnUnder.mm, d);
        if (plan.turnUnder.mm < plan.hemSection.mm) {
          expect(turned.outside).toBe(false);
          expect(turned.h).toBeGreaterThan(0);
        } else {
          expect(plan.warnings.map((w) => w.code)).toContain('third-section-too-small');
        }
      }),
    );
  });

  it('an old crease lands where the simulated fold puts it', () => {
    const within = (g: Gen) => (g.unit === 'in' ? 25.4 / 16 : 1.5);
    // a crease on the leg within 1/8 in (3 mm) of the cuff top's height may show (TRADE.md: work to an eighth)
    const nearTop = (g: Gen) => (g.unit === 'in' ? 25.4 / 8 : 3);
    fc.assert(
      fc.property(genArb, fc.integer({ min: -300, max: 700 }), (g, c) => {
        const input = { ...inputOf(g, false), oldCrease: asInput(g, c) };
        const plan = planCuff(input);
        const landing = plan.creaseLands!;
        const s = mmOf(g, c).valueOf();
        const d = plan.cuffDepth.mm;
        const [l1, l2, l3, cut] = plan.lines.map((l) => l.belowMark.mm) as [number, number, number, number];
        const sim = simulateFold(s, d);
        const onFold = [l1, l2, l3].some((f) => Math.abs(s - f) <= within(g) + 1e-9);
        let expected: string;
        if (onFold) expected = 'on-fold';
        else if (s > cut + 1e-9) expected = 'cut-away';
        else if (s < 0) expected = Math.abs(sim.h - d) <= nearTop(g) + 1e-9 ? 'at-cuff-top' : sim.h > d ? 'leg-visible' : 'behind-cuff';
        else if (sim.outside && sim.flips === 1) expected = 'behind-cuff';
        else if (sim.outside && sim.flips === 2) expected = 'cuff-face';
        else expected = 'inside';
        expect(landing.place).toBe(expected);
        expect(landing.visible).toBe(expected === 'leg-visible' || expected === 'at-cuff-top' || expected === 'cuff-face');
        if (expected !== 'on-fold' && expected !== 'cut-away') near(landing.heightAboveEdge.mm, sim.h);
        expect(plan.warnings.some((w) => w.code === 'old-crease-visible')).toBe(landing.visible);
      }),
    );
  });
});
