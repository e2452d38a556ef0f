// The calculator's taper figures add up as shown (issue: "take in -3/8 in", and a per-side figure
// that did not double to the per-seam one at 1/8 in): words say the direction, figures are sizes,
// and per side × 2 = per seam as printed, the rounding the cut sheet uses (printed.ts).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseLength } from '@/lib/allowance';
import type { Precision, Unit } from '@/lib/allowance/types';
import { seamFigures } from '@/components/calculator/seam-figures';

const mmOf = (text: string, unit: Unit) => parseLength(text, unit).mm;

describe('seamFigures', () => {
  it('take in 3/8 in at a seam is 3/16 in each side, with no minus sign (arithmetic: 3/8 ÷ 2)', () => {
    expect(seamFigures(-9.525, 'in', 8)).toEqual({ verb: 'take in', perSeam: '3/8 in', perSide: '3/16 in' });
    expect(seamFigures(9.525, 'in', 8)).toEqual({ verb: 'let out', perSeam: '3/8 in', perSide: '3/16 in' });
    // 1 in = 25.4 mm exactly (docs/TRADE.md, NBS 1959): 7 mm at a seam is 3.5 mm each side.
    expect(seamFigures(-7, 'mm', 16)).toEqual({ verb: 'take in', perSeam: '7 mm', perSide: '3.5 mm' });
  });

  it('nothing to do reads "leave" with zero figures', () => {
    expect(seamFigures(0.1, 'in', 8).verb).toBe('leave');
    expect(seamFigures(-0.1, 'mm', 16).verb).toBe('leave');
  });

  it('law: per side × 2 = per seam as shown, sizes never signed, within half a side step of exact', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -120, max: 120, noNaN: true }),
        fc.constantFrom<Unit>('in', 'cm', 'mm'),
        fc.constantFrom<Precision>(8, 16, 32),
        (change, unit, precision) => {
          const f = seamFigures(change, unit, precision);
          expect(f.perSeam + f.perSide).not.toMatch(/[-−]/);
          const seam = mmOf(f.perSeam, unit);
          const side = mmOf(f.perSide, unit);
          expect(seam).toBeCloseTo(2 * side, 9);
          const step = unit === 'in' ? 25.4 / (precision === 8 ? 16 : 32) : 0.5;
          expect(Math.abs(side - Math.abs(change) / 2)).toBeLessThanOrEqual(step / 2 + 1e-9);
          expect(f.verb === 'leave').toBe(side === 0);
        },
      ),
      { numRuns: 2000 },
    );
  });
});
