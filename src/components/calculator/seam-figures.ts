// A taper line's seam work as the calculator shows it, rounded the way the cut sheet prints it
// (src/lib/server/cut-sheet/printed.ts): each side to the nearest half step in inches (the seam then stays
// on the shop's step) or to 0.5 mm, and the seam twice that, so per side × 2 = per seam as shown.
// The words say let out or take in; the figures are sizes, never signed.
import { formatLength } from '@/lib/allowance/format-length';
import type { Precision, Unit } from '@/lib/allowance/types';

/** What the seam asks, and its figures as shown. */
export interface SeamFigures {
  verb: 'let out' | 'take in' | 'leave';
  perSeam: string;
  perSide: string;
}

/** The side step in mm and the precision to show it at. */
function sideStep(unit: Unit, precision: Precision): { mm: number; precision: Precision } {
  if (unit !== 'in') return { mm: 0.5, precision };
  const side = (precision === 8 ? 16 : 32) as Precision;
  return { mm: 25.4 / side, precision: side };
}

/** The figures for a flat change of `changeMm` (+ let out, − take in). */
export function seamFigures(changeMm: number, unit: Unit, precision: Precision): SeamFigures {
  const step = sideStep(unit, precision);
  const steps = Math.round(Math.abs(changeMm) / 2 / step.mm);
  const side = steps * step.mm;
  const verb = steps === 0 ? 'leave' : changeMm > 0 ? 'let out' : 'take in';
  return { verb, perSeam: formatLength(2 * side, { unit, precision: step.precision }), perSide: formatLength(side, { unit, precision: step.precision }) };
}
