import type { Exact } from './exact';
import { formatExactQ, STEPS_TEXT_RANGE, stepRatio, stepsText, stepsTextTable } from './format-length';
import type { Len, Precision, Unit } from './types';

export { fractionNumber } from './exact';

/** Makes Len values in one plan's unit and precision; `negate` shows −mm without building it. */
export type LenMaker = (mm: Exact, negate?: boolean) => Len;

const SAFE = Number.MAX_SAFE_INTEGER;
// Read once into a local constant: every shown length checks it.
const RANGE = STEPS_TEXT_RANGE;

function makeLen(unit: Unit, precision: Precision): LenMaker {
  const [a, b] = stepRatio(unit, precision);
  const table = stepsTextTable(unit, precision);
  return (mm, negate = false) => {
    if (mm.big === null) {
      const n = mm.n;
      const d = mm.d;
      const abs = n < 0 ? -n : n;
      // Steps = abs·a / (d·b) rounded, ties up (roundRatio, inline: this is every shown length's cost).
      const num = abs * a;
      const den = d * b;
      if (num <= SAFE && den <= SAFE) {
        let q = Math.floor(num / den);
        let r = num - q * den;
        if (r < 0) {
          q -= 1;
          r += den;
        } else if (r >= den) {
          q += 1;
          r -= den;
        }
        if (2 * r >= den) q += 1;
        const neg = n < 0 !== negate && n !== 0;
        const steps = q === 0 ? 0 : neg ? -q : q;
        const text = (steps >= -RANGE && steps <= RANGE ? table[steps + RANGE] : undefined) ?? stepsText(steps, unit, precision);
        return { mm: neg ? -abs / d : abs / d, text };
      }
    }
    const exact = negate ? mm.neg() : mm;
    return { mm: exact.valueOf(), text: formatExactQ(exact, unit, precision) };
  };
}

// One maker per unit and precision, made once: plans share them instead of making closures.
const MAKERS: Record<Unit, Record<Precision, LenMaker>> = {
  in: { 8: makeLen('in', 8), 16: makeLen('in', 16), 32: makeLen('in', 32) },
  cm: { 8: makeLen('cm', 8), 16: makeLen('cm', 16), 32: makeLen('cm', 32) },
  mm: { 8: makeLen('mm', 8), 16: makeLen('mm', 16), 32: makeLen('mm', 32) },
};

/** The Len maker for a unit and precision: exact mm as a number plus the display text. */
export function lenMaker(unit: Unit, precision: Precision): LenMaker {
  return MAKERS[unit][precision];
}
