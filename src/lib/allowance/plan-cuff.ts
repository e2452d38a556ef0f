import { creaseLanding } from './crease-landing';
import { cuffAlternatives } from './cuff-alternatives';
import { CUFF_LINE_NAMES, cuffLinePositions, linePositionList } from './cuff-lines';
import { cuffDepthRule, type ExactDefaults, exactDefaults } from './defaults';
import { type Exact, ZERO } from './exact';
import { type LenMaker, lenMaker } from './len';
import { InputReader, type LengthRule } from './read-input';
import type { CuffInput, CuffLine, CuffPlan, Len, PlanWarning, Precision, Unit } from './types';

/** A cuff input read and checked: exact mm throughout. */
export interface CuffValues {
  unit: Unit;
  precision: Precision;
  cuffDepth: Exact;
  hemSection: Exact;
  turnUnder: Exact;
  available: Exact | null;
  clothThickness: Exact;
  oldCrease: Exact | null;
  slope: Exact | null;
}

const POSITIVE: LengthRule = { min: 'positive' };
const NON_NEGATIVE: LengthRule = { min: 'non-negative' };
const ANY: LengthRule = {};

/** Read a cuff input field by field (errors carry the field name). */
export function readCuffInput(input: CuffInput, r: InputReader): CuffValues {
  const defaults = exactDefaults(r.unit);
  const cuffDepth = r.length(input.cuffDepth, 'cuffDepth', 'Cuff depth', cuffDepthRule(r.unit));
  const d = cuffDepth ?? defaults.usualCuffDepth.min;
  return {
    unit: r.unit,
    precision: r.precision,
    cuffDepth: d,
    hemSection: r.length(input.hemSection, 'hemSection', 'Third section', POSITIVE) ?? d,
    turnUnder: r.length(input.turnUnder, 'turnUnder', 'Turn-under', NON_NEGATIVE) ?? defaults.cuffTurnUnder,
    available: r.length(input.available, 'available', 'Cloth below the mark', NON_NEGATIVE),
    clothThickness: r.length(input.clothThickness, 'clothThickness', 'Turn of cloth', NON_NEGATIVE) ?? ZERO,
    oldCrease: r.length(input.oldCrease, 'oldCrease', 'Old crease', ANY),
    slope: r.length(input.slope, 'slope', 'Slope', ANY),
  };
}

/** The plan's lengths as shown, beside the exact values. */
interface Shown {
  depth: Len;
  section: Len;
  turnUnder: Len;
}

function cuffWarnings(v: CuffValues, shown: Shown, defaults: ExactDefaults, len: LenMaker): PlanWarning[] {
  const warnings: PlanWarning[] = [];
  if (v.hemSection.compare(v.turnUnder) <= 0) {
    warnings.push({
      code: 'third-section-too-small',
      message: `The third section (${shown.section.text}) is no deeper than the turn-under (${shown.turnUnder.text}): nothing is left to hold the cuff inside. Make the third section deeper or the turn-under narrower.`,
    });
  }
  // The turned-under edge's stitching sits (third section − turn-under) above the bottom: over the cuff top it shows.
  if (v.hemSection.sub(v.turnUnder).compare(v.cuffDepth) > 0) {
    warnings.push({
      code: 'stitching-above-cuff',
      message: `The third section (${shown.section.text}) less the turn-under (${shown.turnUnder.text}) is deeper than the ${shown.depth.text} cuff: the stitching would show above the cuff. Make the third section shorter.`,
    });
  }
  const usual = defaults.usualCuffDepth;
  if (v.cuffDepth.compare(usual.min) < 0 || v.cuffDepth.compare(usual.max) > 0) {
    warnings.push({
      code: 'cuff-depth-unusual',
      message: `A ${shown.depth.text} cuff is outside the usual ${len(usual.min).text} to ${len(usual.max).text}. Check the depth with the customer.`,
    });
  }
  if (v.slope !== null && !v.slope.isZero()) {
    warnings.push({
      code: 'slope-on-cuff',
      message: `Cuffs are made level, so the ${len(v.slope.abs()).text} slope was left out: this plan is level all round.`,
    });
  }
  return warnings;
}

function shortMessage(required: Len, available: Len, shortBy: Len, depth: Len, alt: NonNullable<CuffPlan['alternatives']>): string {
  const fits: string[] = [];
  if (alt.shorterSection !== null) fits.push(`the ${depth.text} cuff with a ${alt.shorterSection.text} third section`);
  if (alt.deepestCuff !== null) fits.push(`a ${alt.deepestCuff.text} cuff with three equal sections`);
  if (alt.facedCuff.fits) fits.push(`a faced cuff (${alt.facedCuff.required.text} of this cloth and a facing)`);
  if (alt.plainHem.fits) fits.push(`a plain hem (${alt.plainHem.required.text})`);
  const what =
    fits.length > 0
      ? `What still fits: ${fits.join('; ')}.`
      : `Not even a plain hem (${alt.plainHem.required.text}) fits: face the hem with other cloth.`;
  return `Not enough cloth: the cuff needs ${required.text} below the mark and there is ${available.text}, short by ${shortBy.text}. ${what}`;
}

/** Plan a cuff from a pin mark: the four chalk lines, the cloth check, the old crease and the warnings. */
export function planCuff(input: CuffInput): CuffPlan {
  const v = readCuffInput(input, new InputReader(input, false));
  const defaults = exactDefaults(v.unit);
  const len = lenMaker(v.unit, v.precision);
  const positions = cuffLinePositions(v.cuffDepth, v.hemSection, v.clothThickness);
  const A = v.available;
  const below = linePositionList(positions);
  // Above the raw edge = A − below the mark; for the finished edge that is A itself.
  const lines: CuffLine[] = [];
  let rest: Exact | null = null;
  for (let k = 0; k < 4; k++) {
    const b = below[k]!;
    const above = A === null ? null : k === 0 ? A : A.sub(b);
    if (k === 3) rest = above;
    lines.push({ n: (k + 1) as CuffLine['n'], name: CUFF_LINE_NAMES[k]!, belowMark: len(b), aboveRawEdge: above === null ? null : len(above) });
  }
  // The same exact values are not formatted twice (copies, so no two plan fields share an object).
  const top = lines[1]!.belowMark;
  const cut = lines[3]!.belowMark;
  const depth = positions.cuffTop === v.cuffDepth ? { mm: top.mm, text: top.text } : len(v.cuffDepth);
  const required = { mm: cut.mm, text: cut.text };
  const section = v.hemSection === v.cuffDepth ? { mm: depth.mm, text: depth.text } : len(v.hemSection);
  const turnUnder = len(v.turnUnder);
  const warnings = cuffWarnings(v, { depth, section, turnUnder }, defaults, len);
  let enough: boolean | null = null;
  let spare: Len | null = null;
  let shortBy: Len | null = null;
  let alternatives: CuffPlan['alternatives'] = null;
  if (A !== null && rest !== null) {
    // Decided on the exact value: a float of it can be 0 or NaN (1e-310, huge denominators) and flip the check.
    enough = rest.sign() >= 0;
    if (enough) {
      const above = lines[3]!.aboveRawEdge!;
      spare = { mm: above.mm, text: above.text };
    } else {
      shortBy = len(rest, true);
      alternatives = cuffAlternatives({
        available: A,
        cuffDepth: v.cuffDepth,
        hemSection: v.hemSection,
        turnUnder: v.turnUnder,
        innerFold: positions.innerFold,
        clothThickness: v.clothThickness,
        unit: v.unit,
        precision: v.precision,
        defaults,
        len,
      });
      warnings.unshift({ code: 'not-enough-cloth', message: shortMessage(required, lines[0]!.aboveRawEdge!, shortBy, depth, alternatives) });
    }
  }
  const plan: CuffPlan = {
    kind: 'cuff',
    unit: v.unit,
    precision: v.precision,
    cuffDepth: depth,
    hemSection: section,
    turnUnder,
    lines,
    required,
    enough,
    shortBy,
    spare,
    alternatives,
    warnings,
  };
  if (v.oldCrease !== null) {
    const landing = creaseLanding(v.oldCrease, {
      cuffDepth: v.cuffDepth,
      cuffDepthMm: depth.mm,
      lines: positions,
      linesMm: [lines[0]!.belowMark.mm, top.mm, lines[2]!.belowMark.mm, cut.mm],
      onFoldWithin: defaults.onFoldWithin,
      onFoldWithinMm: defaults.onFoldWithinMm,
      nearCuffTop: defaults.nearCuffTop,
      len,
    });
    plan.creaseLands = landing;
    if (landing.visible) warnings.push({ code: 'old-crease-visible', message: landing.message });
  }
  return plan;
}
