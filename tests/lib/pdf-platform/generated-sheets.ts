// Many different cut sheets for the "same with and without the speed patches" tests: generated
// with fast-check from a fixed seed (so a failure names a sheet that comes back), every part of
// the page varied (units, cuff or hem, one or two legs, tapers, old creases, short cloth, paper,
// free text in other scripts, overfull pages). Invented shop, staff and garments.
import fc from 'fast-check';
import { buildCutSheet, type LegOrder } from '@/lib/server/cut-sheet/build';
import type { CutSheetData } from '@/lib/shared/cut-sheet-types';

const GARMENTS = [
  'Navy wool flannel trousers',
  'Crêpe trousers, café wash',
  'Grey worsted suit trousers',
  'Тёмные брюки',
  'بنطال كحلي',
  '藏青色西裤',
  '남색 정장 바지',
  'Olive moleskin trousers',
];
const STAFF = ['Sam Ortiz', 'Priya Navarro', 'Jonah Whitcombe', 'Ilse Dahlgren'];

const inchLeg = (side: 'left' | 'right') =>
  fc.oneof(
    fc.record({
      side: fc.constant(side),
      finish: fc.constant('cuff' as const),
      input: fc.record({
        unit: fc.constant('in' as const),
        precision: fc.constantFrom(8 as const, 16 as const),
        cuffDepth: fc.integer({ min: 20, max: 36 }).map((n) => `${n}/16`),
        available: fc.integer({ min: 48, max: 120 }).map((n) => `${n}/16`),
        oldCrease: fc.option(
          fc.integer({ min: -8, max: 48 }).map((n) => `${n}/16`),
          { nil: undefined },
        ),
      }),
      taper: fc.option(
        fc.record({
          widthAtEdge: fc.constantFrom(7, 7.25, 7.5),
          widthAbove: fc.constantFrom(8, 8.5, 9),
          heightAbove: fc.constantFrom(5, 6, 8),
          seamAllowance: fc.constantFrom(0.5, 1),
        }),
        { nil: undefined },
      ),
    }),
    fc.record({
      side: fc.constant(side),
      finish: fc.constant('hem' as const),
      input: fc.record({
        unit: fc.constant('in' as const),
        precision: fc.constant(8 as const),
        slope: fc.constantFrom(0, 0.25, 0.5),
        available: fc.integer({ min: 16, max: 64 }).map((n) => `${n}/16`),
      }),
    }),
  );

const mmLeg = (side: 'left' | 'right') =>
  fc.record({
    side: fc.constant(side),
    finish: fc.constant('cuff' as const),
    input: fc.record({ unit: fc.constant('mm' as const), cuffDepth: fc.integer({ min: 30, max: 55 }), available: fc.integer({ min: 90, max: 200 }) }),
    taper: fc.option(
      fc.record({
        widthAtEdge: fc.constantFrom(190, 200),
        widthAbove: fc.constantFrom(215, 230),
        heightAbove: fc.constantFrom(150, 200),
        seamAllowance: fc.constant(15),
      }),
      { nil: undefined },
    ),
  });

const legs: fc.Arbitrary<LegOrder[]> = fc.oneof(
  fc.tuple(inchLeg('left')).map((l) => l as LegOrder[]),
  fc.tuple(inchLeg('left'), inchLeg('right')).map((l) => l as LegOrder[]),
  fc.tuple(mmLeg('left'), mmLeg('right')).map((l) => l as LegOrder[]),
);

const sheetArb = fc.record({
  legs,
  ticket: fc.integer({ min: 1000, max: 9999 }),
  garment: fc.constantFrom(...GARMENTS),
  assignee: fc.constantFrom(...STAFF),
  pageSize: fc.constantFrom('LETTER' as const, 'A4' as const),
  existingFinish: fc.constantFrom(undefined, 'cuff' as const, 'plain-hem' as const),
});

/** `count` different cut sheets the engine accepts, the same ones on every run. */
export function generatedSheets(count: number, seed = 1207): CutSheetData[] {
  const out: CutSheetData[] = [];
  for (const s of fc.sample(sheetArb, { numRuns: count * 4, seed })) {
    if (out.length === count) break;
    try {
      const data = buildCutSheet(
        {
          shop: 'Hartley & Sons Alterations',
          ticket: String(s.ticket),
          garment: s.garment,
          due: '2025-03-14',
          assignee: s.assignee,
          link: `https://cuffwright.example/garments/${s.ticket}`,
        },
        s.legs,
      );
      out.push({ ...data, pageSize: s.pageSize, ...(s.existingFinish ? { existingFinish: s.existingFinish } : {}) });
    } catch {
      // A plan the engine refuses (a taper it cannot make): not a sheet anyone could print.
    }
  }
  return out;
}
