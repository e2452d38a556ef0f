import { creaseLanding, creaseWarning, quickCreaseLanding } from './crease-landing';
import { cuffAlternatives, quickAlternatives } from './cuff-alternatives';
import { CUFF_LINE_NAMES, cuffLinePositions, linePositionList } from './cuff-lines';
import { cuffDepthRule, type ExactDefaults, exactDefaults } from './defaults';
import { type Exact, joinDenominator, lcm, ZERO } from './exact';
import { type LenMaker, lenMaker, ratioLenMaker } from './len';
import { InputReader, type LengthRule } from './read-input';
import type { CuffInput, CuffLine, CuffLineName, CuffPlan, Len, PlanWarning, Precision, Unit } from './types';

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
  // An absent optional field reads as null without the call (most plans leave four of these out).
  const { hemSection, turnUnder, available, clothThickness, oldCrease, slope } = input;
  return {
    unit: r.unit,
    precision: r.precision,
    cuffDepth: d,
    hemSection: (hemSection === undefined ? null : r.length(hemSection, 'hemSection', 'Third section', POSITIVE)) ?? d,
    turnUnder: (turnUnder === undefined ? null : r.length(turnUnder, 'turnUnder', 'Turn-under', NON_NEGATIVE)) ?? defaults.cuffTurnUnder,
    available: available === undefined ? null : r.length(available, 'available', 'Cloth below the mark', NON_NEGATIVE),
    clothThickness: (clothThickness === undefined ? null : r.length(clothThickness, 'clothThickness', 'Turn of cloth', NON_NEGATIVE)) ?? ZERO,
    oldCrease: oldCrease === undefined ? null : r.length(oldCrease, 'oldCrease', 'Old crease', ANY),
    slope: slope === undefined ? null : r.length(slope, 'slope', 'Slope', ANY),
  };
}

/** The plan's lengths as shown, beside the exact values. */
interface Shown {
  depth: Len;
  section: Len;
  turnUnder: Len;
}

/** Which of the cuff's own warnings apply, worked out exactly by either path. */
interface CuffChecks {
  /** third section ≤ turn-under */
  sectionTooSmall: boolean;
  /** third section − turn-under > cuff depth */
  stitchingShows: boolean;
  /** the usual depths as shown, when the depth is outside them (else null) */
  unusual: [string, string] | null;
  /** |slope| as shown, when a slope was asked (else null) */
  slope: string | null;
}

function cuffWarnings(c: CuffChecks, shown: Shown): PlanWarning[] {
  const warnings: PlanWarning[] = [];
  if (c.sectionTooSmall) {
    warnings.push({
      code: 'third-section-too-small',
      message: `The third section (${shown.section.text}) is no deeper than the turn-under (${shown.turnUnder.text}): nothing is left to hold the cuff inside. Make the third section deeper or the turn-under narrower.`,
      values: { section: shown.section.text, turnUnder: shown.turnUnder.text },
    });
  }
  // The turned-under edge's stitching sits (third section − turn-under) above the bottom: over the cuff top it shows.
  if (c.stitchingShows) {
    warnings.push({
      code: 'stitching-above-cuff',
      message: `The third section (${shown.section.text}) less the turn-under (${shown.turnUnder.text}) is deeper than the ${shown.depth.text} cuff: the stitching would show above the cuff. Make the third section shorter.`,
      values: { section: shown.section.text, turnUnder: shown.turnUnder.text, depth: shown.depth.text },
    });
  }
  if (c.unusual !== null) {
    warnings.push({
      code: 'cuff-depth-unusual',
      message: `A ${shown.depth.text} cuff is outside the usual ${c.unusual[0]} to ${c.unusual[1]}. Check the depth with the customer.`,
      values: { depth: shown.depth.text, min: c.unusual[0], max: c.unusual[1] },
    });
  }
  if (c.slope !== null) {
    warnings.push({
      code: 'slope-on-cuff',
      message: `Cuffs are made level, so the ${c.slope} slope was left out: this plan is level all round.`,
      values: { slope: c.slope },
    });
  }
  return warnings;
}

function exactChecks(v: CuffValues, defaults: ExactDefaults, len: LenMaker): CuffChecks {
  const usual = defaults.usualCuffDepth;
  const unusual = v.cuffDepth.compare(usual.min) < 0 || v.cuffDepth.compare(usual.max) > 0;
  return {
    sectionTooSmall: v.hemSection.compare(v.turnUnder) <= 0,
    stitchingShows: v.hemSection.sub(v.turnUnder).compare(v.cuffDepth) > 0,
    unusual: unusual ? [len(usual.min).text, len(usual.max).text] : null,
    slope: v.slope !== null && !v.slope.isZero() ? len(v.slope.abs()).text : null,
  };
}

function shortMessage(required: Len, available: Len, shortBy: Len, depth: Len, alt: NonNullable<CuffPlan['alternatives']>): string {
  // Joined as it goes (no list to join): this message is built for every short plan.
  let fits = '';
  if (alt.shorterSection !== null) fits = `the ${depth.text} cuff with a ${alt.shorterSection.text} third section`;
  if (alt.deepestCuff !== null) fits += `${fits === '' ? '' : '; '}a ${alt.deepestCuff.text} cuff with three equal sections`;
  if (alt.facedCuff.fits) fits += `${fits === '' ? '' : '; '}a faced cuff (${alt.facedCuff.required.text} of this cloth and a facing)`;
  if (alt.plainHem.fits) fits += `${fits === '' ? '' : '; '}a plain hem (${alt.plainHem.required.text})`;
  const what = fits !== '' ? `What still fits: ${fits}.` : `Not even a plain hem (${alt.plainHem.required.text}) fits: face the hem with other cloth.`;
  return `Not enough cloth: the cuff needs ${required.text} below the mark and there is ${available.text}, short by ${shortBy.text}. ${what}`;
}

/** Plan a cuff from a pin mark: the four chalk lines, the cloth check, the old crease and the warnings. */
export function planCuff(input: CuffInput): CuffPlan {
  const v = readCuffInput(input, new InputReader(input, false));
  return quickCuff(v) ?? exactCuff(v);
}

// Past this common denominator quickCuff leaves the plan to exactCuff: every length is within
// 5,080 mm, so its numerator over D (and a few summed) stays far under 2^53.
const QUICK_DENOMINATOR = 2 ** 30;

// The denominators quickCuff meets among a unit's defaults (usual depths, on-fold and near-cuff-top,
// and for short cloth the safe stitch, facing seam and plain hem), made once.
function defaultsDenominator(unit: Unit): number {
  const e = exactDefaults(unit);
  const quick = lcm(lcm(e.usualCuffDepth.min.d, e.usualCuffDepth.max.d), lcm(e.onFoldWithin.d, e.nearCuffTop.d));
  return lcm(quick, lcm(lcm(e.safeStitch.d, e.facingSeam.d), e.hemAllowance.d));
}
const DEFAULTS_DENOMINATOR: Record<Unit, number> = { in: defaultsDenominator('in'), cm: defaultsDenominator('cm'), mm: defaultsDenominator('mm') };
const [EDGE, TOP, INNER, CUT] = CUFF_LINE_NAMES as [CuffLineName, CuffLineName, CuffLineName, CuffLineName];

/**
 * planCuff's answer worked out on plain integers over one common denominator D (the lines, the cloth
 * check, the warnings and the old crease; no Exact built or reduced per step), or null when a value
 * is big or D passes 2^30: exactCuff then answers. Every Len, text and verdict is exactCuff's.
 */
export function quickCuff(v: CuffValues): CuffPlan | null {
  const { cuffDepth, hemSection, turnUnder, available, clothThickness, oldCrease, slope } = v;
  if (cuffDepth.big || hemSection.big || turnUnder.big || clothThickness.big) return null;
  if (available?.big || oldCrease?.big || slope?.big) return null;
  const D = quickDenominator(v);
  if (!(D <= QUICK_DENOMINATOR)) return null;
  const defaults = exactDefaults(v.unit);
  const usual = defaults.usualCuffDepth;
  const ratio = ratioLenMaker(v.unit, v.precision);
  const d = cuffDepth.over(D);
  const m = hemSection.over(D);
  const u = turnUnder.over(D);
  const cuffTop = d + clothThickness.over(D);
  const innerFold = 2 * cuffTop;
  const cutAt = innerFold + m;
  const A = available === null ? null : available.over(D);
  // Spelled out, not looped: no list of positions to index, the names read once (EDGE … CUT).
  const top = ratio(cuffTop, D);
  const cut = ratio(cutAt, D);
  const lines: CuffLine[] = [
    { n: 1, name: EDGE, belowMark: ratio(0, D), aboveRawEdge: A === null ? null : ratio(A, D) },
    { n: 2, name: TOP, belowMark: top, aboveRawEdge: A === null ? null : ratio(A - cuffTop, D) },
    { n: 3, name: INNER, belowMark: ratio(innerFold, D), aboveRawEdge: A === null ? null : ratio(A - innerFold, D) },
    { n: 4, name: CUT, belowMark: cut, aboveRawEdge: A === null ? null : ratio(A - cutAt, D) },
  ];
  const depth = clothThickness.isZero() ? { mm: top.mm, text: top.text } : ratio(d, D);
  const section = hemSection === cuffDepth ? { mm: depth.mm, text: depth.text } : ratio(m, D);
  const shown = { depth, section, turnUnder: ratio(u, D) };
  const unusual = d < usual.min.over(D) || d > usual.max.over(D);
  const s = slope === null ? 0 : slope.over(D);
  const warnings = cuffWarnings(
    {
      sectionTooSmall: m <= u,
      stitchingShows: m - u > d,
      unusual: unusual ? [ratio(usual.min.over(D), D).text, ratio(usual.max.over(D), D).text] : null,
      slope: s === 0 ? null : ratio(s < 0 ? -s : s, D).text,
    },
    shown,
  );
  const plan = cuffPlan(v, shown, lines, { mm: cut.mm, text: cut.text }, warnings);
  if (A !== null) {
    const rest = A - cutAt;
    plan.enough = rest >= 0;
    if (plan.enough) {
      const above = lines[3]!.aboveRawEdge!;
      plan.spare = { mm: above.mm, text: above.text };
    } else {
      plan.shortBy = ratio(-rest, D);
      plan.alternatives = quickAlternatives({
        available: A,
        cuffDepth: d,
        hemSection: m,
        turnUnder: u,
        innerFold,
        clothThickness: cuffTop - d,
        safeStitch: defaults.safeStitch.over(D),
        facingSeam: defaults.facingSeam.over(D),
        hemAllowance: defaults.hemAllowance.over(D),
        D,
        unit: v.unit,
        precision: v.precision,
        defaults,
        ratio,
      });
      notEnough(plan);
    }
  }
  if (oldCrease !== null) {
    const landing = quickCreaseLanding(oldCrease.over(D), {
      d,
      cuffTop,
      innerFold,
      cut: cutAt,
      onFoldWithin: defaults.onFoldWithin.over(D),
      nearCuffTop: defaults.nearCuffTop.over(D),
      D,
      ratio,
    });
    plan.creaseLands = landing;
    if (landing.visible) warnings.push(creaseWarning(landing));
  }
  return plan;
}

// The least common denominator of a cuff's lengths and its unit's defaults (past 2^53 only a bound).
function quickDenominator(v: CuffValues): number {
  const { available, oldCrease, slope } = v;
  let D = DEFAULTS_DENOMINATOR[v.unit];
  D = joinDenominator(D, v.cuffDepth.d);
  D = joinDenominator(D, v.hemSection.d);
  D = joinDenominator(D, v.turnUnder.d);
  D = joinDenominator(D, v.clothThickness.d);
  if (available !== null) D = joinDenominator(D, available.d);
  if (oldCrease !== null) D = joinDenominator(D, oldCrease.d);
  if (slope !== null) D = joinDenominator(D, slope.d);
  return D;
}

// The plan without its cloth check (filled in by the caller when the cloth is known).
function cuffPlan(v: CuffValues, shown: Shown, lines: CuffLine[], required: Len, warnings: PlanWarning[]): CuffPlan {
  return {
    kind: 'cuff',
    unit: v.unit,
    precision: v.precision,
    cuffDepth: shown.depth,
    hemSection: shown.section,
    turnUnder: shown.turnUnder,
    lines,
    required,
    enough: null,
    shortBy: null,
    spare: null,
    alternatives: null,
    warnings,
  };
}

// A short plan's not-enough-cloth warning, first among the warnings.
function notEnough(plan: CuffPlan): void {
  const alt = plan.alternatives!;
  const message = shortMessage(plan.required, plan.lines[0]!.aboveRawEdge!, plan.shortBy!, plan.cuffDepth, alt);
  const values: Record<string, string> = {
    finish: 'cuff',
    required: plan.required.text,
    available: plan.lines[0]!.aboveRawEdge!.text,
    shortBy: plan.shortBy!.text,
    depth: plan.cuffDepth.text,
    plain: alt.plainHem.required.text,
  };
  // Only what fits is named, in the message's order.
  if (alt.shorterSection !== null) values.shorter = alt.shorterSection.text;
  if (alt.deepestCuff !== null) values.deepest = alt.deepestCuff.text;
  if (alt.facedCuff.fits) values.faced = alt.facedCuff.required.text;
  if (alt.plainHem.fits) values.plainFits = 'yes';
  plan.warnings.unshift({ code: 'not-enough-cloth', message, values });
}

/** planCuff on Exact values: any input, however big or finely divided. */
export function exactCuff(v: CuffValues): CuffPlan {
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
  const section = v.hemSection === v.cuffDepth ? { mm: depth.mm, text: depth.text } : len(v.hemSection);
  const shown = { depth, section, turnUnder: len(v.turnUnder) };
  const warnings = cuffWarnings(exactChecks(v, defaults, len), shown);
  const plan = cuffPlan(v, shown, lines, { mm: cut.mm, text: cut.text }, warnings);
  if (A !== null && rest !== null) {
    // Decided on the exact value: a float of it can be 0 or NaN (1e-310, huge denominators) and flip the check.
    plan.enough = rest.sign() >= 0;
    if (plan.enough) {
      const above = lines[3]!.aboveRawEdge!;
      plan.spare = { mm: above.mm, text: above.text };
    } else {
      plan.shortBy = len(rest, true);
      plan.alternatives = cuffAlternatives({
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
      notEnough(plan);
    }
  }
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
    if (landing.visible) warnings.push(creaseWarning(landing));
  }
  return plan;
}
