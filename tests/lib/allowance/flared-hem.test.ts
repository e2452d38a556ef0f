import fc from 'fast-check';
import type Fraction from 'fraction.js';
import { all, create } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { AllowanceError, type FlaredHemInput, planFlaredHem, validateFlaredHemInput } from '@/lib/allowance';

const math = create(all!, { number: 'Fraction' });
const mathNumbers = create(all!);
const IN = 25.4;

// An independent computation: the skirt drawn as a cone in 3D (half-angle α with sin α = θ/2π, the
// flat pattern's angle θ rolled up) and each round measured as a polygon of N points on it.
function coneRound(waistRound: number, slantFromWaist: number, fraction: number, N = 20000): number {
  const sinA = fraction; // θ/2π for θ = 2π·fraction
  const radius = waistRound / (2 * Math.PI) + slantFromWaist * sinA;
  const z = -slantFromWaist * Math.sqrt(1 - sinA * sinA);
  let perimeter = 0;
  let [px, py] = [radius, 0];
  for (let k = 1; k <= N; k++) {
    const phi = (2 * Math.PI * k) / N;
    const [x, y] = [radius * Math.cos(phi), radius * Math.sin(phi)];
    perimeter += Math.hypot(x - px, y - py, z - z);
    [px, py] = [x, y];
  }
  return perimeter;
}

describe('planFlaredHem examples', () => {
  it('full circle skirt, 1 in hem: 2π in to ease, about 6 5/16 in (derived geometry; mathjs 2·pi·1 in cross-check)', () => {
    const plan = planFlaredHem({ unit: 'in', flare: { kind: 'circle', fraction: 1 }, hemCircumference: 180, hemDepth: 1 });
    expect(plan.fullnessPerDepth).toBeCloseTo(2 * Math.PI, 12);
    expect(plan.fullness.mm).toBeCloseTo(Number(mathNumbers.evaluate('2 * pi * 25.4')), 9);
    expect(plan.fullness.text).toBe('6 5/16 in');
    expect(plan.flareDegrees).toBe(360);
  });

  it('half circle: π·d to ease; a ½ in hem about 1 9/16 in (derived geometry)', () => {
    const plan = planFlaredHem({ unit: 'in', flare: { kind: 'circle', fraction: '1/2' }, hemCircumference: 120, hemDepth: '1/2' });
    expect(plan.fullness.mm).toBeCloseTo(Math.PI * 12.7, 9);
    expect(plan.fullness.text).toBe('1 9/16 in');
    expect(plan.finish).toBe('turned');
    expect(plan.notes.map((n) => n.code)).toEqual(['ease-fullness']);
  });

  it('straight skirt: no fullness at any depth, a 2 in hem as asked (common practice (no source))', () => {
    const plan = planFlaredHem({ unit: 'in', flare: { kind: 'straight' }, hemCircumference: 40 });
    expect([plan.shape, plan.fullness.mm, plan.liesFlatTo, plan.finish, plan.finishDepth?.text]).toEqual(['straight', 0, null, 'turned', '2 in']);
    expect(plan.notes).toEqual([]);
  });

  it('A-line measured: 38 in round 20 in above a 60 in hem flares 1.1 in per inch; 2 in hem has 2 1/5 in to ease (arithmetic; mathjs Fraction)', () => {
    const plan = planFlaredHem({ unit: 'in', flare: { kind: 'measured', upperCircumference: 38, heightAbove: 20 }, hemCircumference: 60, hemDepth: 2 });
    expect(plan.fullnessPerDepth).toBe(1.1);
    const theirs = math.evaluate('(60 - 38) / 20 * 2 * 127/5') as Fraction;
    expect(plan.fullness.mm).toBe(theirs.valueOf());
    expect(plan.fullness.text).toBe('2 3/16 in');
    // 3% ease limit (common practice (no source)): R = 60/1.1 in, deepest flat = 0.03·R/1.03 ≈ 1.589 in → 1 9/16 in.
    expect(plan.liesFlatTo?.text).toBe('1 9/16 in');
    expect(plan.finish).toBe('turned-narrower');
    expect(plan.notes.map((n) => n.code)).toEqual(['ease-fullness', 'depth-reduced', 'face-to-keep-depth']);
  });

  it('knee-length circle skirt from the waist: 28 in waist, 24 in long, 1 in asked → 13/16 in lies flat (3% limit, common practice (no source))', () => {
    const plan = planFlaredHem({ unit: 'in', flare: { kind: 'circle', fraction: 1 }, waistCircumference: 28, skirtLength: 24, hemDepth: 1 });
    // R = 28/2π + 24 ≈ 28.456 in; 0.03·R/1.03 ≈ 0.8288 in.
    expect(plan.slantRadius!.mm / IN).toBeCloseTo(28 / (2 * Math.PI) + 24, 9);
    expect(plan.liesFlatTo?.text).toBe('13/16 in');
    expect(plan.finish).toBe('turned-narrower');
  });

  it('a tiny circle (doll or frill) too full to turn: rolled, or faced when not even a roll lies flat (common practice (no source))', () => {
    const rolled = planFlaredHem({ unit: 'in', flare: { kind: 'circle', fraction: 1 }, hemCircumference: 40, hemDepth: 1 });
    expect([rolled.finish, rolled.finishDepth?.text]).toEqual(['rolled', '1/8 in']);
    const faced = planFlaredHem({ unit: 'in', flare: { kind: 'circle', fraction: 1 }, hemCircumference: 20, hemDepth: 2 });
    expect([faced.finish, faced.finishDepth]).toEqual(['faced', null]);
  });

  it('a tapered (pegged) skirt: the turned-up hem is short of its round: let out 1 cm in the hem (arithmetic)', () => {
    const plan = planFlaredHem({ unit: 'cm', flare: { kind: 'measured', upperCircumference: 100, heightAbove: 50 }, hemCircumference: 90, hemDepth: 5 });
    expect(plan.shape).toBe('tapered');
    expect(plan.notes).toEqual([{ code: 'let-out-hem-seams', values: { total: { mm: 10, text: '1 cm' } } }]);
  });

  it('the shop may change the ease limit: 6% lets the A-line keep its 2 in hem (arithmetic)', () => {
    const plan = planFlaredHem({
      unit: 'in',
      flare: { kind: 'measured', upperCircumference: 38, heightAbove: 20 },
      hemCircumference: 60,
      hemDepth: 2,
      easeLimitPercent: '6%',
    });
    expect(plan.finish).toBe('turned');
  });

  it.each([
    [{ flare: { kind: 'circle', fraction: 0 }, hemCircumference: 100 }, 'flare.fraction', 'out-of-range'],
    [{ flare: { kind: 'oval' }, hemCircumference: 100 }, 'flare.kind', 'bad-choice'],
    [{ flare: { kind: 'angle', degrees: 'wide' }, hemCircumference: 100 }, 'flare.degrees', 'not-a-number'],
    [{ flare: { kind: 'measured', heightAbove: 10 }, hemCircumference: 100 }, 'flare.upperCircumference', 'missing'],
    [{ flare: { kind: 'circle', fraction: 1 } }, 'waistCircumference', 'missing'],
    [{ flare: { kind: 'circle', fraction: 1 }, waistCircumference: 28, skirtLength: 2, hemDepth: 2 }, 'hemDepth', 'impossible-shape'],
    [{ flare: { kind: 'measured', upperCircumference: 10, heightAbove: 10 }, hemCircumference: 30, hemDepth: 20 }, 'hemDepth', 'impossible-shape'],
  ])('refuses %o in field %s (%s)', (fields, field, code) => {
    const input = { unit: 'in', ...fields } as FlaredHemInput;
    expect(() => planFlaredHem(input)).toThrow(AllowanceError);
    expect(() => planFlaredHem(input)).toThrow(expect.objectContaining({ field, code }));
    expect(validateFlaredHemInput(input).map((e) => [e.field, e.code])).toContainEqual([field, code]);
  });

  it('validation collects every field and finds nothing wrong in a good input', () => {
    expect(validateFlaredHemInput({ unit: 'in', flare: { kind: 'circle', fraction: 2 }, hemCircumference: 150 })).toEqual([]);
    const errors = validateFlaredHemInput({ unit: 'in', flare: { kind: 'circle', fraction: -1 }, hemCircumference: 'x', hemDepth: 0 });
    expect(errors.map((e) => e.field)).toEqual(['hemCircumference', 'flare.fraction', 'hemDepth']);
  });
});

describe('planFlaredHem against the cone drawn in 3D (independent floating geometry)', () => {
  it('hem round and landing round agree with polygons on the cone to 1e-6 relative', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 24, max: 40 }),
        fc.integer({ min: 16, max: 40 }),
        fc.constantFrom(1 / 4, 1 / 2, 3 / 4, 1),
        fc.integer({ min: 1, max: 8 }),
        (waist, length, fraction, eighths) => {
          const depth = eighths / 8;
          const plan = planFlaredHem({ unit: 'in', flare: { kind: 'circle', fraction }, waistCircumference: waist, skirtLength: length, hemDepth: depth });
          const hem = coneRound(waist * IN, length * IN, fraction);
          const landing = coneRound(waist * IN, (length - depth) * IN, fraction);
          expect(Math.abs(plan.hemCircumference.mm - hem) / hem).toBeLessThan(1e-6);
          expect(Math.abs(plan.landingCircumference.mm - landing) / landing).toBeLessThan(1e-6);
          expect(Math.abs(plan.fullness.mm - (hem - landing)) / (hem - landing)).toBeLessThan(1e-4);
        },
      ),
      { numRuns: 40 },
    );
  });
});

describe('planFlaredHem laws', () => {
  const depthArb = fc.integer({ min: 1, max: 48 }).map((k) => k / 16);

  it('deeper hem ⇒ more fullness (any flare)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 16 }).map((k) => k / 4),
        depthArb,
        depthArb,
        (fraction, a, b) => {
          fc.pre(a < b);
          const at = (d: number) => planFlaredHem({ unit: 'in', flare: { kind: 'circle', fraction }, hemCircumference: 190, hemDepth: d }).fullness.mm;
          expect(at(a)).toBeLessThan(at(b));
        },
      ),
    );
  });

  it('fuller flare ⇒ more fullness at the same depth', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 720 }), fc.integer({ min: 1, max: 720 }), depthArb, (a, b, d) => {
        fc.pre(a < b);
        const at = (deg: number) => planFlaredHem({ unit: 'in', flare: { kind: 'angle', degrees: deg }, hemCircumference: 190, hemDepth: d }).fullness.mm;
        expect(at(a)).toBeLessThan(at(b));
      }),
    );
  });

  it('zero flare ⇒ zero ease, whatever the depth (straight, or two equal rounds measured)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 20, max: 120 }), fc.integer({ min: 1, max: 30 }), depthArb, (round, h, d) => {
        for (const flare of [{ kind: 'straight' } as const, { kind: 'measured', upperCircumference: round, heightAbove: h } as const]) {
          const plan = planFlaredHem({ unit: 'in', flare, hemCircumference: round, hemDepth: d });
          expect([plan.fullness.mm, plan.fullnessPerDepth, plan.liesFlatTo, plan.finish]).toEqual([0, 0, null, 'turned']);
        }
      }),
    );
  });

  it('measured flare is exact: fullness = (C − U)/h · d, as mathjs works it in fractions', () => {
    fc.assert(
      fc.property(fc.integer({ min: 30, max: 120 }), fc.integer({ min: 20, max: 60 }), fc.integer({ min: 4, max: 30 }), depthArb, (c, u, h, d) => {
        fc.pre(c > u);
        const plan = planFlaredHem({ unit: 'in', flare: { kind: 'measured', upperCircumference: u, heightAbove: h }, hemCircumference: c, hemDepth: d });
        const theirs = math.evaluate(`(${c} - ${u}) / ${h} * ${d * 16} / 16 * 127 / 5`) as Fraction;
        expect(plan.fullness.mm).toBe(theirs.valueOf());
      }),
    );
  });

  it('liesFlatTo is the deepest display step whose fullness eases within the limit (checked against the definition, not the closed form)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 8 }).map((k) => k / 4),
        fc.integer({ min: 60, max: 190 }),
        fc.integer({ min: 1, max: 10 }),
        (fraction, round, pct) => {
          const plan = planFlaredHem({ unit: 'in', flare: { kind: 'circle', fraction }, hemCircumference: round, easeLimitPercent: pct });
          const theta = 2 * Math.PI * fraction;
          const C = round * IN;
          const eases = (d: number) => (theta * d) / (C - theta * d) <= pct / 100 + 1e-12;
          const flat = plan.liesFlatTo!.mm;
          if (flat > 0) expect(eases(flat)).toBe(true);
          expect(eases(flat + IN / 16)).toBe(false);
        },
      ),
    );
  });

  it('turned as asked ⇔ the asked depth lies flat; otherwise narrower, rolled or faced in that order', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 8 }).map((k) => k / 4),
        fc.integer({ min: 20, max: 190 }),
        depthArb,
        (fraction, round, d) => {
          fc.pre(round - 2 * Math.PI * fraction * d > 0);
          const plan = planFlaredHem({ unit: 'in', flare: { kind: 'circle', fraction }, hemCircumference: round, hemDepth: d });
          const flat = plan.liesFlatTo!.mm;
          expect(plan.finish === 'turned').toBe(d * IN <= flat);
          if (plan.finish === 'turned-narrower') expect(flat).toBeGreaterThanOrEqual(IN / 2);
          if (plan.finish === 'rolled') expect([flat >= IN / 8, flat < IN / 2]).toEqual([true, true]);
          if (plan.finish === 'faced') expect(flat).toBeLessThan(IN / 8);
        },
      ),
    );
  });
});
