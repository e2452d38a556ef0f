import { exactDefaults } from './defaults';
import { type Exact, ZERO } from './exact';
import { floorExactSteps, stepRatio, stepsToExact } from './format-length';
import { lenMaker } from './len';
import { InputReader } from './read-input';
import type { HemInput, HemLine, HemPlan, Len, PlanWarning, Precision, Unit } from './types';

/** A hem input read and checked: exact mm throughout. */
export interface HemValues {
  unit: Unit;
  precision: Precision;
  hemAllowance: Exact;
  turnUnder: Exact;
  available: Exact | null;
  slope: Exact;
  /** the finished edge below the pin mark (0: at the mark) */
  edge: Exact;
}

/** Read a plain hem input field by field (errors carry the field name). */
export function readHemInput(input: HemInput, r: InputReader): HemValues {
  const defaults = exactDefaults(r.unit);
  return {
    unit: r.unit,
    precision: r.precision,
    hemAllowance: r.length(input.hemAllowance, 'hemAllowance', 'Hem allowance', { min: 'positive' }) ?? defaults.hemAllowance,
    turnUnder: r.length(input.turnUnder, 'turnUnder', 'Turn-under', { min: 'non-negative' }) ?? defaults.hemTurnUnder,
    available: r.length(input.available, 'available', 'Cloth below the mark', { min: 'non-negative' }),
    slope: r.length(input.slope, 'slope', 'Slope', { min: 'non-negative' }) ?? ZERO,
    edge: r.length(input.edgeBelowMark, 'edgeBelowMark', 'Finished edge below the mark', { min: 'non-negative' }) ?? ZERO,
  };
}

/** Plan a plain hem: finished edge and cut at the back (where the pin is) and at the front, the cloth check and warnings; the edge may sit below the mark (unwashed cloth left long). */
export function planHem(input: HemInput): HemPlan {
  const v = readHemInput(input, new InputReader(input, false));
  const defaults = exactDefaults(v.unit);
  const len = lenMaker(v.unit, v.precision);
  const A = v.available;
  const E = v.edge;
  const positions: [HemLine['name'], Exact][] = [
    ['finished-edge', E],
    ['cut', E.add(v.hemAllowance)],
  ];
  const lines: HemLine[] = positions.map(([name, below], k) => ({
    n: (k + 1) as HemLine['n'],
    name,
    belowMark: len(below),
    frontBelowMark: len(below.sub(v.slope)),
    aboveRawEdge: A === null ? null : len(A.sub(below)),
  }));
  const warnings: PlanWarning[] = [];
  let enough: boolean | null = null;
  let spare: Len | null = null;
  let shortBy: Len | null = null;
  if (A !== null) {
    // The cloth must reach the cut: the edge's own drop below the mark first, then the hem.
    const rest = A.sub(E).sub(v.hemAllowance);
    enough = rest.sign() >= 0;
    if (enough) spare = len(rest);
    else {
      shortBy = len(rest.neg());
      const [a, b] = stepRatio(v.unit, v.precision);
      const below = A.sub(E);
      const most = below.sign() <= 0 ? ZERO : stepsToExact(floorExactSteps(below, a, b), v.unit, v.precision);
      const fits = most.isZero()
        ? 'Face the hem with a strip of other cloth.'
        : `A ${len(most).text} hem is the most that fits; for more, face the hem with a strip of other cloth.`;
      const lowered = E.isZero() ? '' : ` with its finished edge ${len(E).text} below the mark`;
      warnings.push({
        code: 'not-enough-cloth',
        message: `Not enough cloth for a ${len(v.hemAllowance).text} hem${lowered}: there is ${len(A).text} below the mark, short by ${shortBy.text}. ${fits}`,
        values: {
          finish: 'hem',
          allowance: len(v.hemAllowance).text,
          available: len(A).text,
          shortBy: shortBy.text,
          ...(most.isZero() ? {} : { most: len(most).text }),
          ...(E.isZero() ? {} : { edge: len(E).text }),
        },
      });
    }
  }
  const usual = defaults.usualHemAllowance;
  if (v.hemAllowance.compare(usual.min) < 0 || v.hemAllowance.compare(usual.max) > 0) {
    warnings.push({
      code: 'hem-allowance-unusual',
      message: `A ${len(v.hemAllowance).text} hem allowance is outside the usual ${len(usual.min).text} to ${len(usual.max).text}. Check it suits the cloth.`,
      values: { allowance: len(v.hemAllowance).text, min: len(usual.min).text, max: len(usual.max).text },
    });
  }
  if (v.turnUnder.compare(v.hemAllowance) >= 0) {
    warnings.push({
      code: 'turn-under-too-large',
      message: `The turn-under (${len(v.turnUnder).text}) is as deep as the whole hem allowance (${len(v.hemAllowance).text}): nothing is left for the hem. Make the turn-under narrower.`,
      values: { turnUnder: len(v.turnUnder).text, allowance: len(v.hemAllowance).text },
    });
  }
  return {
    kind: 'hem',
    unit: v.unit,
    precision: v.precision,
    hemAllowance: len(v.hemAllowance),
    turnUnder: len(v.turnUnder),
    slope: len(v.slope),
    lines,
    required: { ...lines[1]!.belowMark },
    enough,
    shortBy,
    spare,
    warnings,
  };
}
