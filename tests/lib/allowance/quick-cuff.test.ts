// planCuff answers on plain integers over one common denominator (quickCuff) when the values allow,
// else on Exact values (exactCuff). Both must give the same plan to the last mm digit and letter:
// the Exact path is the reference here, itself held to fraction.js by exact.test.ts.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { exactCuff, quickCuff, readCuffInput } from '@/lib/allowance/plan-cuff';
import { InputReader } from '@/lib/allowance/read-input';
import type { CuffInput, Unit } from '@/lib/allowance';

// Lengths typed as a shop would (whole, fractions, decimals) and some no shop would (thirds, 127ths, long decimals).
const fractionText = (sign: string, whole: number, num: number, den: number) => (num === 0 ? `${sign}${whole}` : `${sign}${whole} ${num}/${den}`);
const length = (lo: number, hi: number, signed = false) =>
  fc.tuple(signed ? fc.constantFrom('', '-') : fc.constant('')).chain(([sign]) =>
    fc.oneof(
      fc
        .tuple(fc.integer({ min: lo, max: hi }), fc.integer({ min: 0, max: 31 }), fc.constantFrom(2, 4, 8, 16, 32))
        .map(([w, n, d]) => fractionText(sign, w, n % d, d)),
      fc.tuple(fc.integer({ min: lo, max: hi }), fc.integer({ min: 0, max: 999 })).map(([w, f]) => `${sign}${w}.${f}`),
      fc
        .tuple(fc.integer({ min: lo, max: hi }), fc.integer({ min: 1, max: 126 }), fc.constantFrom(3, 7, 13, 127))
        .map(([w, n, d]) => fractionText(sign, w, n % d, d)),
    ),
  );

// Ranges per unit (cuff depth, cloth below the mark, old crease, third section, turn-under, turn of cloth, slope).
const RANGES: Record<Unit, number[][]> = {
  in: [
    [0, 3],
    [2, 8],
    [0, 6],
    [0, 3],
    [0, 1],
    [0, 0],
    [0, 1],
  ],
  cm: [
    [2, 7],
    [5, 20],
    [0, 15],
    [1, 7],
    [0, 2],
    [0, 0],
    [0, 2],
  ],
  mm: [
    [20, 70],
    [50, 200],
    [0, 150],
    [10, 70],
    [0, 20],
    [0, 1],
    [0, 20],
  ],
};
const cuff = fc.constantFrom<Unit>('in', 'cm', 'mm').chain((unit) => {
  const [depth, available, crease, section, turnUnder, thickness, slope] = RANGES[unit]!.map(([lo, hi]) => [lo!, hi!] as const);
  return fc.record({
    unit: fc.constant(unit),
    precision: fc.constantFrom(8, 16, 32, undefined),
    depth: length(...depth!),
    available: fc.option(length(...available!)),
    crease: fc.option(length(...crease!, true)),
    section: fc.option(length(...section!)),
    turnUnder: fc.option(length(...turnUnder!)),
    thickness: fc.option(length(...thickness!)),
    slope: fc.option(length(...slope!, true), { freq: 8 }),
  });
});

type Generated = { unit: Unit; precision: 8 | 16 | 32 | undefined; depth: string } & Record<
  'available' | 'crease' | 'section' | 'turnUnder' | 'thickness' | 'slope',
  string | null
>;

function input(g: Generated): CuffInput {
  const i: CuffInput = { unit: g.unit, cuffDepth: g.depth };
  if (g.precision !== undefined) i.precision = g.precision;
  if (g.available !== null) i.available = g.available;
  if (g.crease !== null) i.oldCrease = g.crease;
  if (g.section !== null) i.hemSection = g.section;
  if (g.turnUnder !== null) i.turnUnder = g.turnUnder;
  if (g.thickness !== null) i.clothThickness = g.thickness;
  if (g.slope !== null) i.slope = g.slope;
  return i;
}

describe('quickCuff gives exactCuff’s plan', () => {
  it('the same plan for every cuff both can plan (arithmetic: both exact)', () => {
    let quick = 0;
    let planned = 0;
    fc.assert(
      fc.property(cuff, (g) => {
        const i = input(g);
        let v;
        try {
          v = readCuffInput(i, new InputReader(i, false));
        } catch {
          return; // refused field by field before either path runs
        }
        planned += 1;
        const q = quickCuff(v);
        if (q === null) return;
        quick += 1;
        expect(q).toStrictEqual(exactCuff(v));
        expect(JSON.stringify(q)).toBe(JSON.stringify(exactCuff(v)));
      }),
      { numRuns: 3000 },
    );
    expect(quick).toBeGreaterThan(planned * 0.8);
  });

  it('every crease landing and the short-cloth alternatives come up (the generator reaches them)', () => {
    const places = new Set<string>();
    let short = 0;
    fc.assert(
      fc.property(cuff, (g) => {
        const i = input(g);
        try {
          const v = readCuffInput(i, new InputReader(i, false));
          const q = quickCuff(v);
          if (q?.creaseLands) places.add(q.creaseLands.place);
          if (q?.alternatives) short += 1;
        } catch {
          /* refused */
        }
      }),
      { numRuns: 3000 },
    );
    expect([...places].sort()).toEqual(['at-cuff-top', 'behind-cuff', 'cuff-face', 'cut-away', 'inside', 'leg-visible', 'on-fold']);
    expect(short).toBeGreaterThan(50);
  });

  it('values past the safe integers are left to the Exact path, and it still answers', () => {
    const i: CuffInput = { unit: 'mm', cuffDepth: '40 1/8191', available: '150 1/131071', oldCrease: '30 1/524287' };
    const v = readCuffInput(i, new InputReader(i, false));
    expect(quickCuff(v)).toBeNull();
    expect(exactCuff(v).lines).toHaveLength(4);
  });
});
