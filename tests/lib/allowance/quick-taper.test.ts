// checkTaper answers a leg followed down on plain integers over one common denominator
// (quickTaper) and anything else on Exact values (exactTaper). Both must give the same plan to the
// last mm digit and letter: the Exact path is the reference here, itself held to fraction.js by exact.test.ts.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { exactTaper, quickTaper, readTaperInput } from '@/lib/allowance/check-taper';
import { InputReader } from '@/lib/allowance/read-input';
import type { TaperInput, Unit } from '@/lib/allowance';

// Lengths typed as a shop would (whole, fractions, decimals) and some no shop would (thirds, sevenths, long decimals).
const fractionText = (whole: number, num: number, den: number) => (num === 0 ? `${whole}` : `${whole} ${num % den}/${den}`);
const length = (lo: number, hi: number) =>
  fc.oneof(
    fc.tuple(fc.integer({ min: lo, max: hi }), fc.integer({ min: 0, max: 31 }), fc.constantFrom(2, 4, 8, 16, 32)).map(([w, n, d]) => fractionText(w, n % d, d)),
    fc.tuple(fc.integer({ min: lo, max: hi }), fc.integer({ min: 0, max: 999 })).map(([w, f]) => `${w}.${f}`),
    fc.tuple(fc.integer({ min: lo, max: hi }), fc.integer({ min: 1, max: 12 }), fc.constantFrom(3, 7, 13, 127)).map(([w, n, d]) => fractionText(w, n % d, d)),
  );

// Ranges per unit that make a leg (cuff depth, widths, height, seam, tolerance, thickness, third section).
const RANGES: Record<Unit, number[][]> = {
  in: [
    [1, 2],
    [5, 12],
    [5, 13],
    [6, 25],
    [0, 1],
    [0, 1],
    [0, 0],
    [1, 3],
  ],
  cm: [
    [3, 5],
    [13, 30],
    [13, 33],
    [15, 63],
    [0, 2],
    [0, 1],
    [0, 0],
    [3, 7],
  ],
  mm: [
    [25, 55],
    [130, 300],
    [130, 330],
    [150, 630],
    [0, 20],
    [0, 5],
    [0, 1],
    [25, 70],
  ],
};
const leg = fc.constantFrom<Unit>('in', 'cm', 'mm').chain((unit) => {
  const [depth, edge, above, height, seam, tolerance, thickness, section] = RANGES[unit].map(([lo, hi]) => length(lo!, hi!));
  return fc.record({
    unit: fc.constant(unit),
    precision: fc.constantFrom(8, 16, 32, undefined),
    depth: depth!,
    edge: edge!,
    above: above!,
    height: height!,
    seam: fc.option(seam!),
    tolerance: fc.option(tolerance!),
    thickness: fc.option(thickness!),
    section: fc.option(section!),
  });
});

function input(g: {
  unit: Unit;
  precision: 8 | 16 | 32 | undefined;
  depth: string;
  edge: string;
  above: string;
  height: string;
  seam: string | null;
  tolerance: string | null;
  thickness: string | null;
  section: string | null;
}): TaperInput {
  const i: TaperInput = { unit: g.unit, cuffDepth: g.depth, widthAtEdge: g.edge, widthAbove: g.above, heightAbove: g.height };
  if (g.precision !== undefined) i.precision = g.precision;
  if (g.seam !== null) i.seamAllowance = g.seam;
  if (g.tolerance !== null) i.tolerance = g.tolerance;
  if (g.thickness !== null) i.clothThickness = g.thickness;
  if (g.section !== null) i.hemSection = g.section;
  return i;
}

describe('quickTaper gives exactTaper’s plan', () => {
  it('the same plan, or null where the Exact path refuses the shape (arithmetic: both exact)', () => {
    let quick = 0;
    let planned = 0;
    fc.assert(
      fc.property(leg, (g) => {
        const i = input(g);
        let v;
        try {
          v = readTaperInput(i, new InputReader(i, false));
        } catch {
          return; // refused field by field before either path runs
        }
        let exact;
        try {
          exact = exactTaper(v);
        } catch {
          expect(quickTaper(v)).toBeNull();
          return;
        }
        planned += 1;
        const q = quickTaper(v);
        if (q === null) return;
        quick += 1;
        expect(q).toStrictEqual(exact);
      }),
      { numRuns: 2000 },
    );
    // Most legs take the quick path; three-place decimals and 127ths on several fields pass 2^53 there.
    expect(quick).toBeGreaterThan(planned * 0.5);
  });

  it('a leg typed in sixteenths, tenths or half-mm always takes the quick path', () => {
    for (const i of [
      { unit: 'in', cuffDepth: '1 7/16', widthAtEdge: '7 5/8', widthAbove: '9 1/4', heightAbove: '17', seamAllowance: '5/16', clothThickness: '1/32' },
      { unit: 'cm', cuffDepth: '4.5', widthAtEdge: '19.5', widthAbove: '23.25', heightAbove: '41', seamAllowance: '1.2' },
      { unit: 'mm', cuffDepth: '38.5', widthAtEdge: '196', widthAbove: '231.5', heightAbove: '415', tolerance: '2.5' },
    ] satisfies TaperInput[]) {
      const v = readTaperInput(i, new InputReader(i, false));
      expect(quickTaper(v)).toStrictEqual(exactTaper(v));
    }
  });

  it('a let-down leg (width measured at the cut) is left to the Exact path', () => {
    const i: TaperInput = { unit: 'in', cuffDepth: '1 1/2', widthAtEdge: '7', widthAbove: '8', heightAbove: '12', widthAtCut: '7 3/8' };
    expect(quickTaper(readTaperInput(i, new InputReader(i, false)))).toBeNull();
  });

  it('lengths past the safe integers are left to the Exact path, and it still answers', () => {
    // 1/8191 and 1/131071 (primes) over 1/524287: the common denominator passes 2^53.
    const i: TaperInput = { unit: 'mm', cuffDepth: '40 1/8191', widthAtEdge: '200 1/131071', widthAbove: '220 1/524287', heightAbove: '300 1/2147483647' };
    const v = readTaperInput(i, new InputReader(i, false));
    expect(quickTaper(v)).toBeNull();
    expect(exactTaper(v).lines).toHaveLength(4);
  });
});
