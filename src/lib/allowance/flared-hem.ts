// Skirt and dress hems: straight, A-line (gored) and circular.
//
// Geometry (derived here; written out in docs/KINDS.md). A flared skirt is a cone (a straight skirt
// the limit of one, a tapered skirt one opening upwards); its flat pattern is a ring sector of angle
// θ (2π for a full circle skirt), inner radius r (the waist) and outer radius R (the hem). A round
// at distance ρ from the cone's point is θ·ρ long, so:
//   the hem's round            C = θ·R
//   a round h above the hem    U = θ·(R − h)   ⇒   θ = (C − U) / h   (two rounds measured: exact)
//   turned up by a depth d, the hem's edge lands on the round θ·(R − d) = C − θ·d, so
//   the fullness to ease is    F = θ·d  (per unit of hem depth: θ; per unit of hem round: d / R)
// The fullness depends on θ and d only; a circle skirt (θ = 2π) has 2π·d to ease, an A-line little.
// It eases in flat while F is at most a fraction e of the round it lands on:
//   θ·d ≤ e·(C − θ·d)   ⇔   d ≤ e·R / (1 + e)        (the deepest hem that lies flat)
// Deeper than that the hem is turned narrower, rolled, or faced with a shaped facing (which lies
// flat at any depth: it is cut to the hem's own curve).
import { AllowanceError } from './allowance-error';
import { type Arith, exactArith, floatArith } from './kind-arith';
import { HEM_EASE_LIMIT, kindLength, NO_SOURCE } from './kind-defaults';
import type { FlaredHemInput, FlaredHemNoteCode, FlaredHemPlan, SkirtHemFinish } from './kind-types';
import { Exact } from './exact';
import { type Note, note } from './notes';
import { InputReader } from './read-input';
import { readChoice, readNumber } from './read-values';

/** Where the flared-hem rules come from, as printed beside them. */
export const FLARED_HEM_SOURCES = {
  geometry:
    'derived: a turned hem of depth d on a cone of flat-pattern angle θ carries θ·d of fullness (docs/KINDS.md); cross-checked in tests against the cone drawn in 3D',
  easeLimit: HEM_EASE_LIMIT.source,
  finish: `${NO_SOURCE}: narrower than a turned hem, roll it; deeper than lies flat, face it with a shaped facing`,
} as const;

const ONE = Exact.int(1);
const HUNDRED = Exact.int(100);

/** A skirt hem input read and checked: exact mm, and the flare as θ = k (measured) or k·π (circle, angle). */
export interface FlaredHemValues {
  unit: FlaredHemInput['unit'];
  precision: NonNullable<FlaredHemInput['precision']>;
  /** θ without its π (k), and whether π multiplies it */
  k: Exact;
  timesPi: boolean;
  /** the hem's round, or null when it comes from the waist and the skirt length */
  hem: Exact | null;
  waist: Exact | null;
  length: Exact | null;
  depth: Exact;
  turnUnder: Exact;
  ease: Exact;
  narrowest: Exact;
  rolled: Exact;
}

const FLARE_KINDS = ['straight', 'circle', 'angle', 'measured'] as const;

/** Read a skirt hem input field by field (errors carry the field name). */
export function readFlaredHemInput(input: FlaredHemInput, r: InputReader): FlaredHemValues {
  const flare = (typeof input.flare === 'object' && input.flare !== null ? input.flare : {}) as Record<string, unknown>;
  const kind = readChoice(r, flare.kind, 'flare.kind', FLARE_KINDS) ?? 'straight';
  let k = Exact.int(0);
  let timesPi = false;
  let hem = r.length(input.hemCircumference, 'hemCircumference', 'Hem round', { min: 'positive', required: kind === 'measured' });
  let waist: Exact | null = null;
  let length: Exact | null = null;
  if (kind === 'circle' || kind === 'angle') {
    timesPi = true;
    // θ = 2π·fraction, or π·degrees/180.
    const f = kind === 'circle' ? readNumber(r, flare.fraction, 'flare.fraction', { required: true, min: 0, above: true, max: 4 }) : null;
    const deg = kind === 'angle' ? readNumber(r, flare.degrees, 'flare.degrees', { required: true, min: 0, above: true, max: 1440 }) : null;
    k = f !== null ? f.twice() : deg !== null ? deg.div(Exact.int(180)) : ONE;
    const noHem = input.hemCircumference === undefined || input.hemCircumference === null || String(input.hemCircumference).trim() === '';
    if (noHem) {
      waist = r.length(input.waistCircumference, 'waistCircumference', 'Waist round', { min: 'positive', required: true });
      length = r.length(input.skirtLength, 'skirtLength', 'Skirt length', { min: 'positive', required: true });
    }
  } else if (kind === 'measured') {
    const upper = r.length(flare.upperCircumference, 'flare.upperCircumference', 'Upper round', { min: 'positive', required: true });
    const h = r.length(flare.heightAbove, 'flare.heightAbove', 'Height of the upper round', { min: 'positive', required: true });
    if (hem !== null && upper !== null && h !== null) k = hem.sub(upper).div(h);
  } else if (hem === null) {
    // A straight skirt's round only sizes the answer's round; 0 keeps the plan whole without it.
    hem = Exact.int(0);
  }
  const ease = readNumber(r, input.easeLimitPercent, 'easeLimitPercent', { min: 0, above: true, max: 100, below: true }, true);
  return {
    unit: r.unit,
    precision: r.precision,
    k,
    timesPi,
    hem,
    waist,
    length,
    depth: r.length(input.hemDepth, 'hemDepth', 'Hem depth', { min: 'positive' }) ?? kindLength('skirtHemDepth', r.unit),
    turnUnder: r.length(input.turnUnder, 'turnUnder', 'Turn-under', { min: 'non-negative' }) ?? kindLength('skirtTurnUnder', r.unit),
    ease: ease === null ? HEM_EASE_LIMIT.value : ease.div(HUNDRED),
    narrowest:
      r.length(input.narrowestTurnedHem, 'narrowestTurnedHem', 'Narrowest turned hem', { min: 'positive' }) ?? kindLength('narrowestTurnedHem', r.unit),
    rolled: r.length(input.rolledHemWidth, 'rolledHemWidth', 'Rolled hem width', { min: 'positive' }) ?? kindLength('rolledHemWidth', r.unit),
  };
}

/** Why these values make no skirt (the hem deeper than the skirt, or no round where it lands), or null. */
export function flaredHemShapeError(v: FlaredHemValues): AllowanceError | null {
  if (v.length !== null && v.depth.compare(v.length) >= 0) {
    return new AllowanceError('impossible-shape', 'The hem is as deep as the skirt is long.', 'hemDepth', { rule: 'hem-deeper-than-skirt' });
  }
  // The landing round C − θ·d must be more than 0 (a flared hem deeper than the pattern's radius has none).
  const landing = v.timesPi
    ? hemRound(v, floatArith(v.unit, v.precision)) - v.k.valueOf() * Math.PI * v.depth.valueOf()
    : v.hem!.sub(v.k.mul(v.depth)).valueOf();
  const straight = v.k.isZero() && !v.timesPi;
  if (!straight && !(landing > 0)) {
    return new AllowanceError('impossible-shape', 'The hem is deeper than the flare allows.', 'hemDepth', { rule: 'hem-past-pattern-point' });
  }
  return null;
}

function hemRound(v: FlaredHemValues, a: Arith<number>): number {
  if (v.hem !== null) return v.hem.valueOf();
  // C = θ·R with R = waist/θ + length: the waist's own round plus θ times the length.
  return a.add(v.waist!.valueOf(), v.k.valueOf() * Math.PI * v.length!.valueOf());
}

/**
 * Plan a skirt or dress hem from its round and its flare: the fullness a turned hem must ease in,
 * the deepest hem that still lies flat, and whether to turn it, turn it narrower, roll it or face it.
 */
export function planFlaredHem(input: FlaredHemInput): FlaredHemPlan {
  const r = new InputReader(input, false);
  const v = readFlaredHemInput(input, r);
  const shape = flaredHemShapeError(v);
  if (shape) throw shape;
  return v.timesPi ? flaredPlan(v, floatArith(v.unit, v.precision), v.k.valueOf() * Math.PI) : flaredPlan(v, exactArith(v.unit, v.precision), v.k);
}

// The plan over either arithmetic; θ is the flat pattern's angle in that arithmetic.
function flaredPlan<T>(v: FlaredHemValues, A: Arith<T>, theta: T): FlaredHemPlan {
  const C: T = v.hem !== null ? A.of(v.hem) : A.add(A.of(v.waist!), A.mul(theta, A.of(v.length!)));
  const d = A.of(v.depth);
  const F = A.mul(theta, d);
  const landing = A.sub(C, F);
  const sign = A.sign(theta);
  const e = A.of(v.ease);
  // R = C/θ and the deepest flat hem e·R/(1 + e), for a flare only.
  const R = sign > 0 ? A.div(C, theta) : null;
  const flatTo = R === null ? null : A.floorStep(A.div(A.mul(e, R), A.add(A.of(ONE), e)));
  const notes: Note<FlaredHemNoteCode>[] = [];
  let finish: SkirtHemFinish = 'turned';
  let finishDepth: T | null = d;
  if (flatTo !== null && A.compare(d, flatTo) > 0) {
    if (A.compare(flatTo, A.of(v.narrowest)) >= 0) {
      finish = 'turned-narrower';
      finishDepth = flatTo;
      notes.push(note('depth-reduced', { asked: A.len(d), liesFlatTo: A.len(flatTo) }));
      notes.push(note('face-to-keep-depth', { asked: A.len(d) }));
    } else if (A.compare(flatTo, A.of(v.rolled)) >= 0) {
      finish = 'rolled';
      finishDepth = A.of(v.rolled);
      notes.push(note('rolled-hem', { width: A.len(finishDepth), liesFlatTo: A.len(flatTo) }));
      notes.push(note('face-to-keep-depth', { asked: A.len(d) }));
    } else {
      finish = 'faced';
      finishDepth = null;
      notes.push(note('faced-hem', { asked: A.len(d), liesFlatTo: A.len(flatTo) }));
    }
  }
  if (finishDepth !== null && sign > 0 && finish !== 'rolled') {
    const eased = A.mul(theta, finishDepth);
    notes.unshift(note('ease-fullness', { fullness: A.len(eased), perDepth: A.num(theta) }));
  }
  if (sign < 0) {
    // Turned up, a tapered skirt's hem is shorter than the round it lands on: let its seams out inside the hem.
    notes.push(note('let-out-hem-seams', { total: A.len(A.sub(A.zero, F)) }));
  }
  if (finish !== 'rolled' && finishDepth !== null && A.compare(A.of(v.turnUnder), finishDepth) >= 0) {
    notes.push(note('turn-under-too-large', { turnUnder: A.len(A.of(v.turnUnder)) }));
  }
  const thetaNum = A.num(theta);
  return {
    kind: 'flared-hem',
    unit: v.unit,
    precision: v.precision,
    shape: sign > 0 ? 'flared' : sign < 0 ? 'tapered' : 'straight',
    hemDepth: A.len(d),
    turnUnder: A.len(A.of(v.turnUnder)),
    hemCircumference: A.len(C),
    slantRadius: R === null ? null : A.len(R),
    flareDegrees: v.timesPi ? v.k.mul(Exact.int(180)).valueOf() : (thetaNum * 180) / Math.PI,
    fullnessPerDepth: thetaNum,
    fullness: A.len(F),
    landingCircumference: A.len(landing),
    easePercent: A.sign(landing) > 0 ? (A.num(F) / A.num(landing)) * 100 : 0,
    liesFlatTo: flatTo === null ? null : A.len(flatTo),
    finish,
    finishDepth: finishDepth === null ? null : A.len(finishDepth),
    notes,
    cautions: ['needles-and-pins', 'iron-and-steam'],
    sources: FLARED_HEM_SOURCES,
  };
}
